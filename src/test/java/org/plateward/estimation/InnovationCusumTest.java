package org.plateward.estimation;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

/** CUSUM on normalised innovations: false-alarm rate and drift detection. */
class InnovationCusumTest {

  @Test
  void inControlRunLengthMatchesSiegmundsApproximation() {
    // Siegmund (1985) ARL for a one-sided CUSUM on N(μ,1): (e^{−2Δb} + 2Δb − 1)/(2Δ²),
    // Δ = μ − k, b = h + 1.166. μ = 0, k = 0.5, h = 5: 938.5; two-sided 1/(2/938.5) = 469.
    final double k = 0.5;
    final double h = 5.0;
    final double b = h + 1.166;
    final double delta = -k;
    final double oneSided = (Math.exp(-2 * delta * b) + 2 * delta * b - 1) / (2 * delta * delta);
    final double twoSided = oneSided / 2;
    final Well19937c rng = new Well19937c(1000);
    final InnovationCusum cusum = new InnovationCusum(1, k, h, Double.POSITIVE_INFINITY, 0.0);
    int alarms = 0;
    final int samples = 400_000;
    for (int i = 1; i <= samples; i++) {
      if (cusum.add(0, rng.nextGaussian(), i) != null) {
        alarms++;
        cusum.reset(0);
      }
    }
    final double arl = (double) samples / alarms;
    System.out.printf("CUSUM: in-control ARL observed=%.1f Siegmund=%.1f (%d alarms)%n", arl,
        twoSided, alarms);
    assertThat(arl).isBetween(0.85 * twoSided, 1.15 * twoSided);
  }

  @Test
  void rampBiasOnOneChannelIsFlaggedAndACleanRunIsNot() {
    final int flagged05 = detectionDelay(0.5, 1001);
    final int flagged005 = detectionDelay(0.05, 1002);
    System.out.printf("CUSUM: 0.5σ/step ramp flagged after %d steps, 0.05σ/step after %d%n",
        flagged05, flagged005);
    // h = 8, k = 0.5 (defaults, in-control ARL ≈ 9,500 updates per channel by Siegmund)
    assertThat(flagged05).isBetween(1, 12);
    assertThat(flagged005).isBetween(1, 60);
  }

  /**
   * A slowly moving level seen by three redundant sensors (σ = 1); from step 300 sensor 1 reads
   * high by rate·σ per step. Returns the steps from the ramp start to the alarm on channel 1,
   * and checks that the first 300 clean steps raised nothing.
   */
  private static int detectionDelay(double ratePerStep, int seed) {
    final double[][] r = TestMath.diag(1.0, 1.0, 1.0);
    final LinearMeasurement meas = new LinearMeasurement(new double[][] {{1}, {1}, {1}});
    final ExtendedKalmanFilter ekf = new ExtendedKalmanFilter(
        new LinearDynamics(new double[][] {{0.0}}, null), new double[][] {{0.01}},
        FilterSettings.defaults(), 0.0, new double[1], new double[][] {{1.0}});
    final Well19937c rng = new Well19937c(seed);
    double level = 0.0;
    final int start = 300;
    for (int k = 1; k <= start + 200; k++) {
      level += 0.1 * rng.nextGaussian();
      ekf.propagate(new double[0], 1.0);
      final double bias = k > start ? ratePerStep * (k - start) : 0.0;
      final double[] z = {level + rng.nextGaussian(), level + bias + rng.nextGaussian(),
          level + rng.nextGaussian()};
      final StepResult res = ekf.update(meas, z, TestMath.all(3), r, new double[0]);
      final List<DriftAlarm> alarms = res.driftAlarms();
      if (k <= start) {
        assertThat(alarms).as("false alarm at step %d", k).isEmpty();
      } else if (!alarms.isEmpty()) {
        final DriftAlarm a = alarms.get(0);
        assertThat(alarms).hasSize(1);
        assertThat(a.channel()).isEqualTo(1);
        assertThat(a.direction()).isEqualTo(+1);
        // the change-point estimate lies at or after the true start, before the alarm
        assertThat(a.sinceTimeS()).isBetween((double) start - 5, a.raisedAtTimeS());
        return k - start;
      }
    }
    return -1;
  }
}
