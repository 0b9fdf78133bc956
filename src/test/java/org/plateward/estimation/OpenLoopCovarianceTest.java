package org.plateward.estimation;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * The open-loop covariance behind the observability diagnostic: propagated exactly as P is but
 * never updated. Checked against the scalar Riccati recursion (analytic) and against a second
 * filter that receives no measurement at all.
 */
class OpenLoopCovarianceTest {

  @Test
  void discreteRandomWalksMatchTheScalarRecursions() {
    // x1, x2 independent random walks (Φ = I, Q_d = diag(q1, q2)); only x1 is measured
    double q1 = 0.3;
    double q2 = 0.2;
    double r = 0.5;
    double p1 = 4.0;
    double p2 = 9.0;
    FilterSettings fs = FilterSettings.defaults().withGating(false);
    LinearDynamics none = new LinearDynamics(new double[2][2], new double[2][1]);
    ExtendedKalmanFilter ekf = new ExtendedKalmanFilter(none, new double[2][2], fs, 0.0,
        new double[] {0.0, 0.0}, new double[][] {{p1, 0.0}, {0.0, p2}});
    ekf.restartOpenLoopCovariance();
    LinearMeasurement h = new LinearMeasurement(new double[][] {{1.0, 0.0}});
    double[][] phi = {{1.0, 0.0}, {0.0, 1.0}};
    double[][] qd = {{q1, 0.0}, {0.0, q2}};
    double riccati = p1;
    int steps = 40;
    for (int k = 0; k < steps; k++) {
      ekf.propagateLinear(phi, null, qd, 1.0);
      ekf.update(h, new double[] {0.1 * k}, new boolean[] {true}, new double[][] {{r}}, new double[] {0.0});
      double prior = riccati + q1; // P⁻ = P + q
      riccati = prior * r / (prior + r); // P⁺ = P⁻ R / (P⁻ + R)
    }
    double[] open = ekf.openLoopVariances();
    double[][] p = ekf.covariance();
    // open loop: P0 + K q for each random walk
    assertThat(open[0]).isCloseTo(p1 + steps * q1, within(1e-12));
    assertThat(open[1]).isCloseTo(p2 + steps * q2, within(1e-12));
    assertThat(p[0][0]).isCloseTo(riccati, within(1e-12));
    // the unmeasured walk: the measurements removed nothing
    assertThat(p[1][1]).isCloseTo(open[1], within(1e-12));
    assertThat(1.0 - p[0][0] / open[0]).isGreaterThan(0.95);
  }

  @Test
  void continuousOpenLoopEqualsAFilterThatIsNeverUpdated() {
    // a damped oscillator observed in position only
    double[][] a = {{0.0, 1.0}, {-0.4, -0.3}};
    double[][] b = {{0.0}, {1.0}};
    double[][] q = {{0.01, 0.0}, {0.0, 0.05}};
    double[][] p0 = {{1.0, 0.2}, {0.2, 2.0}};
    FilterSettings fs = FilterSettings.defaults().withGating(false).withMaxSubstepS(0.1);
    ExtendedKalmanFilter updated = new ExtendedKalmanFilter(new LinearDynamics(a, b), q, fs, 0.0,
        new double[] {1.0, 0.0}, p0);
    ExtendedKalmanFilter blind = new ExtendedKalmanFilter(new LinearDynamics(a, b), q, fs, 0.0,
        new double[] {1.0, 0.0}, p0);
    updated.restartOpenLoopCovariance();
    LinearMeasurement h = new LinearMeasurement(new double[][] {{1.0, 0.0}});
    for (int k = 0; k < 30; k++) {
      updated.propagate(new double[] {0.0}, 0.5);
      blind.propagate(new double[] {0.0}, 0.5);
      updated.update(h, new double[] {Math.cos(0.5 * k)}, new boolean[] {true}, new double[][] {{0.04}},
          new double[] {0.0});
    }
    double[][] open = updated.openLoopCovariance();
    double[][] never = blind.covariance();
    for (int i = 0; i < 2; i++) {
      for (int j = 0; j < 2; j++) {
        assertThat(open[i][j]).isCloseTo(never[i][j], within(1e-10 * (1 + Math.abs(never[i][j]))));
      }
    }
    assertThat(updated.covariance()[0][0]).isLessThan(0.1 * open[0][0]);
  }

  @Test
  void coarseOpenLoopKeepsRandomWalksExactAndSlowModesClose() {
    // x1 a random walk, x2 a slow first-order decay (τ = 2000 s); coarse 60 s open-loop steps
    // against a filter that is never updated (exact sub-steps of 1 s): the walk's variance
    // P0 + q t exactly, the slow mode within h/τ = 3 % (implicit Euler is first order; analytic
    // P(t) = P0 e^(−2t/τ) + q τ/2 (1 − e^(−2t/τ)) = 6.158 at 600 s, measured 6.058)
    double[][] a = {{0.0, 0.0}, {0.0, -1.0 / 2000.0}};
    double[][] b = {{0.0}, {0.0}};
    double[][] q = {{0.02, 0.0}, {0.0, 0.01}};
    double[][] p0 = {{1.0, 0.0}, {0.0, 3.0}};
    FilterSettings fs = FilterSettings.defaults().withGating(false).withMaxSubstepS(1.0);
    ExtendedKalmanFilter coarse = new ExtendedKalmanFilter(new LinearDynamics(a, b), q, fs, 0.0,
        new double[] {0.0, 0.0}, p0);
    ExtendedKalmanFilter blind = new ExtendedKalmanFilter(new LinearDynamics(a, b), q, fs, 0.0,
        new double[] {0.0, 0.0}, p0);
    coarse.openLoopStepS(60.0);
    coarse.restartOpenLoopCovariance();
    LinearMeasurement h = new LinearMeasurement(new double[][] {{1.0, 1.0}});
    for (int k = 0; k < 600; k++) {
      coarse.propagate(new double[] {0.0}, 1.0);
      blind.propagate(new double[] {0.0}, 1.0);
      coarse.update(h, new double[] {0.0}, new boolean[] {true}, new double[][] {{0.1}}, new double[] {0.0});
    }
    double[] open = coarse.openLoopVariances();
    assertThat(open[0]).isCloseTo(1.0 + 0.02 * 600, within(1e-9));
    double analytic = 3.0 * Math.exp(-0.6) + 0.01 * 1000.0 * (1.0 - Math.exp(-0.6));
    assertThat(blind.covariance()[1][1]).isCloseTo(analytic, within(1e-3 * analytic));
    assertThat(open[1]).isCloseTo(analytic, within(0.03 * analytic));
    assertThat(coarse.covariance()[0][0]).isLessThan(0.5 * open[0]);
  }
}
