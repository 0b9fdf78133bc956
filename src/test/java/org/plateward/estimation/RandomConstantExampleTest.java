package org.plateward.estimation;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

/**
 * Welch &amp; Bishop, "An Introduction to the Kalman Filter", UNC-Chapel Hill TR 95-041, §3.3:
 * estimating a random constant. A = H = 1, Q = 1e-5, R = 0.1² = 0.01, x̂₀ = 0, P₀ = 1, truth
 * −0.37727. The covariance recursion does not depend on the measurements.
 */
class RandomConstantExampleTest {

  @Test
  void covarianceFollowsTheClosedScalarRecursion() {
    final double q = 1e-5;
    final double r = 0.01;
    final ExtendedKalmanFilter ekf = new ExtendedKalmanFilter(
        new LinearDynamics(new double[][] {{0.0}}, null), new double[][] {{0.0}},
        FilterSettings.defaults().withGating(false), 0.0, new double[] {0.0},
        new double[][] {{1.0}});
    final LinearMeasurement meas = new LinearMeasurement(new double[][] {{1.0}});
    final Well19937c rng = new Well19937c(1000);
    double pExact = 1.0;
    double p50 = Double.NaN;
    for (int k = 1; k <= 50; k++) {
      // independent scalar recursion (Welch & Bishop eqs. 1.9-1.13 with A = H = 1)
      final double pMinus = pExact + q;
      final double gain = pMinus / (pMinus + r);
      pExact = (1 - gain) * pMinus;

      ekf.propagateLinear(new double[][] {{1.0}}, null, new double[][] {{q}}, 1.0);
      final double z = -0.37727 + 0.1 * rng.nextGaussian();
      final StepResult res = ekf.update(meas, new double[] {z}, new boolean[] {true},
          new double[][] {{r}}, new double[0]);
      assertThat(res.covariance()[0][0]).isCloseTo(pExact, within(1e-15));
      p50 = res.covariance()[0][0];
    }
    // P after 50 steps, computed by the recursion above: 3.39211e-4 (the text's remark
    // "settled to approximately 0.0002" does not match the exact recursion, REFERENCES.md §6)
    assertThat(p50).isCloseTo(3.39211e-4, within(1e-9));
    System.out.printf("RandomConstant: P50=%.10e%n", p50);
    // analytic steady state of the scalar Riccati equation P = (P+Q)R/(P+Q+R):
    // P² + Q P − Q R = 0 → P∞ = (−Q + √(Q² + 4QR))/2 = 3.11267e-4
    for (int k = 0; k < 5000; k++) {
      ekf.propagateLinear(new double[][] {{1.0}}, null, new double[][] {{q}}, 1.0);
      ekf.update(meas, new double[] {-0.37727}, new boolean[] {true}, new double[][] {{r}},
          new double[0]);
    }
    final double pInf = (-q + Math.sqrt(q * q + 4 * q * r)) / 2;
    assertThat(ekf.covariance()[0][0]).isCloseTo(pInf, within(1e-15));
  }
}
