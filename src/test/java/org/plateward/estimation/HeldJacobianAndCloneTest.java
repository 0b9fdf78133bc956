package org.plateward.estimation;

import static org.assertj.core.api.Assertions.assertThat;

import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

/**
 * The held-Jacobian propagation and stochastic cloning for delayed measurements.
 *
 * <p>Oracles: (1) the held-Φ path must give the LU path's numbers (the same implicit-Euler
 * arithmetic, Φ formed explicitly); (2) for a linear model, cloning the predicted measurement at
 * its sample time and fusing the delayed value later gives the same final state and covariance
 * as a filter that fused the value at its own time (Roumeliotis &amp; Burdick 2002, stochastic
 * cloning: exact for linear Gaussian systems), up to the tiny jitter δ.
 */
class HeldJacobianAndCloneTest {
  private static final double[][] A = {{-0.2, 0.1, 0.0}, {0.05, -0.1, 0.02}, {0.0, 0.3, -0.4}};
  private static final double[][] B = {{1.0}, {0.0}, {0.2}};

  /** The same linear dynamics, declaring a Jacobian that never changes. */
  private static final class HeldLinear implements Dynamics {
    private final LinearDynamics inner;
    private final int extra;

    HeldLinear(double[][] a, double[][] b, int extraHeldStates) {
      this.extra = extraHeldStates;
      int n = a.length + extraHeldStates;
      double[][] aa = new double[n][n];
      double[][] bb = new double[n][b[0].length];
      for (int i = 0; i < a.length; i++) {
        System.arraycopy(a[i], 0, aa[i], 0, a.length);
        bb[i] = b[i].clone();
      }
      inner = new LinearDynamics(aa, bb);
    }

    @Override
    public int stateSize() {
      return inner.stateSize();
    }

    @Override
    public void derivative(double[] x, double[] u, double[] dxdt) {
      inner.derivative(x, u, dxdt);
    }

    @Override
    public void jacobian(double[] x, double[] u, double[][] dfdx) {
      inner.jacobian(x, u, dfdx);
    }

    @Override
    public long jacobianVersion() {
      return 7L;
    }
  }

  @Test
  void heldTransitionMatchesTheLuPath() {
    double[][] q = TestMath.diag(0.01, 0.002, 0.005);
    var lu = new ExtendedKalmanFilter(new LinearDynamics(A, B), q, FilterSettings.defaults(), 0.0,
        new double[] {1, -1, 0.5}, TestMath.diag(1, 2, 3));
    var held = new ExtendedKalmanFilter(new HeldLinear(A, B, 0), q, FilterSettings.defaults(), 0.0,
        new double[] {1, -1, 0.5}, TestMath.diag(1, 2, 3));
    LinearMeasurement h = new LinearMeasurement(new double[][] {{1, 0, 0}});
    for (int k = 0; k < 50; k++) {
      double[] u = {Math.sin(0.1 * k)};
      lu.propagate(u, 1.0);
      held.propagate(u, 1.0);
      double[] z = {0.3 * Math.cos(0.2 * k)};
      lu.update(h, z, new boolean[] {true}, new double[][] {{0.01}}, u);
      held.update(h, z, new boolean[] {true}, new double[][] {{0.01}}, u);
    }
    assertThat(TestMath.maxAbsDiff(lu.state(), held.state())).isLessThan(1e-12);
    assertThat(TestMath.maxAbsDiff(lu.covariance(), held.covariance())).isLessThan(1e-12);
    assertThat(held.transitionBuilds()).isEqualTo(1);
  }

  @Test
  void cloneAndDelayedFusionEqualsOnTimeFusion() {
    double[][] q3 = TestMath.diag(0.01, 0.002, 0.005);
    double[][] q4 = TestMath.diag(0.01, 0.002, 0.005, 0.0);
    LinearMeasurement fast3 = new LinearMeasurement(new double[][] {{1, 0, 0}});
    LinearMeasurement fast4 = new LinearMeasurement(new double[][] {{1, 0, 0, 0}});
    LinearMeasurement analyzer3 = new LinearMeasurement(new double[][] {{0, 0, 1}});
    LinearMeasurement analyzer4 = new LinearMeasurement(new double[][] {{0, 0, 1, 0}});
    LinearMeasurement clone4 = new LinearMeasurement(new double[][] {{0, 0, 0, 1}});
    var onTime = new ExtendedKalmanFilter(new LinearDynamics(A, B), q3, FilterSettings.defaults(), 0.0,
        new double[3], TestMath.diag(1, 1, 1));
    var cloned = new ExtendedKalmanFilter(new HeldLinear(A, B, 1), q4, FilterSettings.defaults(), 0.0,
        new double[4], TestMath.diag(1, 1, 1, 1));
    Well19937c rng = new Well19937c(11);
    double[] pending = null;
    final double jitter = 1e-12;
    for (int k = 1; k <= 40; k++) {
      double[] u = {Math.sin(0.05 * k)};
      onTime.propagate(u, 1.0);
      cloned.propagate(u, 1.0);
      double[] zf = {0.2 * rng.nextGaussian()};
      onTime.update(fast3, zf, new boolean[] {true}, new double[][] {{0.01}}, u);
      cloned.update(fast4, zf, new boolean[] {true}, new double[][] {{0.01}}, u);
      if (k == 12) {
        // sample drawn now; its value is fused on time by one filter, 6 s later by the other
        pending = new double[] {0.4 + 0.05 * rng.nextGaussian()};
        onTime.update(analyzer3, pending, new boolean[] {true}, new double[][] {{0.002}}, u);
        cloned.captureClone(analyzer4, new int[] {3}, u, jitter);
      }
      if (k == 18) {
        cloned.update(clone4, pending, new boolean[] {true}, new double[][] {{0.002}}, u);
      }
    }
    double[] xa = onTime.state();
    double[] xb = cloned.state();
    double[][] pa = onTime.covariance();
    double[][] pb = cloned.covariance();
    for (int i = 0; i < 3; i++) {
      assertThat(xb[i]).isCloseTo(xa[i], org.assertj.core.data.Offset.offset(1e-9));
      for (int j = 0; j < 3; j++) {
        assertThat(pb[i][j]).isCloseTo(pa[i][j], org.assertj.core.data.Offset.offset(1e-9));
      }
    }
  }
}
