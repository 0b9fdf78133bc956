package org.plateward.estimation;

import static org.assertj.core.api.Assertions.assertThat;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.RealMatrix;
import org.junit.jupiter.api.Test;

/**
 * Continuous-discrete propagation on a linear ODE dx/dt = A x + w against the exact
 * discretisation: Φ = e^{AT} and Q_d = ∫₀ᵀ e^{As} Q e^{Aᵀs} ds by Van Loan's block exponential
 * (Van Loan 1978), computed independently in the test. The linearly implicit Euler step is first
 * order, so halving the sub-step should halve the error.
 */
class PropagationConvergenceTest {
  private static final double[][] A = {{-1.0, 0.5, 0.0}, {-0.3, -2.0, 1.0}, {0.2, 0.0, -0.5}};
  private static final double[][] Q = {{0.2, 0.05, 0.0}, {0.05, 0.1, 0.0}, {0.0, 0.0, 0.3}};
  private static final double[] X0 = {1.0, -2.0, 0.5};
  private static final double T = 1.0;

  @Test
  void implicitEulerConvergesToTheMatrixExponentialAtFirstOrder() {
    final RealMatrix[] exact = TestMath.vanLoan(
        new Array2DRowRealMatrix(A), new Array2DRowRealMatrix(Q), T);
    final RealMatrix phi = exact[0];
    final double[] xExact = phi.operate(X0);
    final double[][] pExact = phi.multiply(phi.transpose()).add(exact[1]).getData(); // P0 = I

    double prevX = Double.NaN;
    double prevP = Double.NaN;
    for (int steps = 8; steps <= 512; steps *= 2) {
      final ExtendedKalmanFilter ekf = new ExtendedKalmanFilter(new LinearDynamics(A, null), Q,
          FilterSettings.defaults().withMaxSubstepS(T / steps), 0.0, X0,
          TestMath.diag(1, 1, 1));
      ekf.propagate(new double[0], T);
      final double ex = TestMath.maxAbsDiff(ekf.state(), xExact);
      final double ep = TestMath.maxAbsDiff(ekf.covariance(), pExact);
      if (!Double.isNaN(prevX)) {
        final double rx = prevX / ex;
        final double rp = prevP / ep;
        System.out.printf("Propagation: substeps=%d err_x=%.3e (ratio %.3f) err_P=%.3e"
            + " (ratio %.3f)%n", steps, ex, rx, ep, rp);
        // first-order method: ratio → 2 (analytic property of implicit Euler)
        if (steps >= 64) {
          assertThat(rx).isBetween(1.9, 2.1);
          assertThat(rp).isBetween(1.9, 2.1);
        }
      }
      prevX = ex;
      prevP = ep;
    }
    assertThat(prevX).isLessThan(3e-3);
    assertThat(prevP).isLessThan(3e-3);
  }
}
