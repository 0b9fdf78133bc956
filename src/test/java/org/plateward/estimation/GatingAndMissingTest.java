package org.plateward.estimation;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

/** Gating, missing data and the per-state variance reduction (observability) figure. */
class GatingAndMissingTest {
  // constant-velocity model: x = [position, velocity], three redundant position sensors
  private static final double[][] A = {{0.0, 1.0}, {0.0, 0.0}};
  private static final double[][] Q = {{0.0, 0.0}, {0.0, 0.01}};
  private static final double[][] H = {{1.0, 0.0}, {1.0, 0.0}, {1.0, 0.0}};
  private static final double[][] R = TestMath.diag(0.04, 0.04, 0.04);

  private static ExtendedKalmanFilter filter() {
    return new ExtendedKalmanFilter(new LinearDynamics(A, null), Q,
        FilterSettings.defaults().withMaxSubstepS(0.1), 0.0, new double[2],
        TestMath.diag(1.0, 1.0));
  }

  @Test
  void tenSigmaOutlierIsGatedAndReported() {
    final ExtendedKalmanFilter ekf = filter();
    final LinearMeasurement meas = new LinearMeasurement(H);
    final Well19937c rng = new Well19937c(1000);
    for (int k = 0; k < 30; k++) {
      ekf.propagate(new double[0], 1.0);
      ekf.update(meas, noisy(rng, 0.0), TestMath.all(3), R, new double[0]);
    }
    ekf.propagate(new double[0], 1.0);
    // S_11 = (H P⁻ Hᵀ)_11 + R_11 = P⁻_00 + R_11 for a sensor of position (linear H)
    final double sigma = Math.sqrt(ekf.covariance()[0][0] + R[1][1]);
    final double[] z2 = noisy(rng, 0.0);
    z2[1] += 10.0 * sigma;
    final StepResult res = ekf.update(meas, z2, TestMath.all(3), R, new double[0]);
    assertThat(res.channelStatus()[1]).isEqualTo(ChannelStatus.GATED_SINGLE);
    assertThat(res.channelStatus()[0]).isEqualTo(ChannelStatus.USED);
    assertThat(res.channelStatus()[2]).isEqualTo(ChannelStatus.USED);
    assertThat(res.usedChannels()).containsExactly(0, 2);
    // its normalised innovation is about 10σ (>> √χ²₁(0.9973) = 3.0)
    assertThat(res.normalisedInnovation()[1]).isGreaterThan(8.0);
    // one outlier is an outlier, not a drift: the winsorised CUSUM stays quiet
    assertThat(res.driftAlarms()).isEmpty();
  }

  @Test
  void jointGateRemovesChannelsUntilTheNisPasses() {
    final ExtendedKalmanFilter ekf = filter();
    final LinearMeasurement meas = new LinearMeasurement(H);
    // prior P = I, S_ii = 1 + 0.04 with S_ij = 1: three equal 2.9σ-sized deviations of
    // alternating sign pass the single gate (2.9² < χ²₁(0.9973) = 8.81) but not the joint one
    final double s = Math.sqrt(1.04);
    final StepResult res = ekf.update(meas, new double[] {2.9 * s, -2.9 * s, 2.8 * s},
        TestMath.all(3), R, new double[0]);
    assertThat(res.count(ChannelStatus.GATED_SINGLE)).isZero();
    assertThat(res.count(ChannelStatus.GATED_JOINT)).isGreaterThanOrEqualTo(1);
    final double bound = new ChiSquaredDistribution(res.usedCount()).inverseCumulativeProbability(
        0.9973);
    assertThat(res.nis()).isLessThanOrEqualTo(bound);
  }

  @Test
  void missingMeasurementsAreSkippedAndUncertaintyGrows() {
    final ExtendedKalmanFilter ekf = filter();
    final LinearMeasurement meas = new LinearMeasurement(H);
    final Well19937c rng = new Well19937c(1000);
    for (int k = 0; k < 20; k++) {
      ekf.propagate(new double[0], 1.0);
      ekf.update(meas, noisy(rng, 0.0), TestMath.all(3), R, new double[0]);
    }
    double prevPos = ekf.covariance()[0][0];
    double prevVel = ekf.covariance()[1][1];
    for (int k = 0; k < 10; k++) {
      ekf.propagate(new double[0], 1.0);
      final double[] stateBefore = ekf.state();
      final StepResult res = ekf.update(meas, noisy(rng, 0.0), new boolean[3], R,
          new double[0]);
      assertThat(res.count(ChannelStatus.MISSING)).isEqualTo(3);
      assertThat(res.usedCount()).isZero();
      assertThat(res.state()).containsExactly(stateBefore);
      // with no data P grows through propagation alone: Ṗ = AP + PAᵀ + Q > 0 here
      assertThat(res.covariance()[0][0]).isGreaterThan(prevPos);
      assertThat(res.covariance()[1][1]).isGreaterThan(prevVel);
      prevPos = res.covariance()[0][0];
      prevVel = res.covariance()[1][1];
    }
  }

  @Test
  void varianceReductionShowsWhichStatesTheMeasurementPinsDown() {
    // two independent states, only the first measured, R = P11: P⁺11 = P R/(P+R) = P/2, so
    // the reduction is exactly 1/2 (scalar Kalman update) and 0 for the unmeasured state
    final ExtendedKalmanFilter ekf = new ExtendedKalmanFilter(
        new LinearDynamics(new double[2][2], null), new double[2][2], FilterSettings.defaults(),
        0.0, new double[2], TestMath.diag(2.0, 3.0));
    final StepResult res = ekf.update(new LinearMeasurement(new double[][] {{1.0, 0.0}}),
        new double[] {0.1}, new boolean[] {true}, new double[][] {{2.0}}, new double[0]);
    assertThat(res.varianceReduction()[0]).isCloseTo(0.5, within(1e-15));
    assertThat(res.varianceReduction()[1]).isCloseTo(0.0, within(1e-15));
  }

  private static double[] noisy(Well19937c rng, double truth) {
    return new double[] {truth + 0.2 * rng.nextGaussian(), truth + 0.2 * rng.nextGaussian(),
        truth + 0.2 * rng.nextGaussian()};
  }
}
