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
}
