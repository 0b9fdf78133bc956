package org.plateward.estimation;

import static org.assertj.core.api.Assertions.assertThat;

import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

/**
 * Innovation-based Q inflation. Oracle: the χ² NIS band (Bar-Shalom et al. 2001, §5.4) and the
 * true/model Q ratio of the simulation.
 */
class AdaptiveProcessNoiseTest {

  @Test
  void underestimatedProcessNoiseIsInflatedUntilTheInnovationsAreConsistent() {
    final double qTrue = 1.0;
    final double qModel = 0.01; // 100× too small
    final double[] off = run(qTrue, qModel, false);
    final double[] on = run(qTrue, qModel, true);
    System.out.printf("AdaptiveQ: NIS/dof off=%.3f on=%.3f, mean lambda=%.1f (true ratio 100)%n",
        off[0], on[0], on[1]);
    assertThat(off[0]).isGreaterThan(1.5); // inconsistent: innovations far larger than S says
    assertThat(on[0]).isBetween(0.8, 1.25);
    assertThat(on[1]).isBetween(30.0, 200.0);
  }

  @Test
  void correctProcessNoiseIsLeftNearlyAlone() {
    final double[] on = run(0.1, 0.1, true);
    System.out.printf("AdaptiveQ: correct Q -> NIS/dof=%.3f mean lambda=%.2f%n", on[0], on[1]);
    assertThat(on[1]).isBetween(1.0, 1.5);
    assertThat(on[0]).isBetween(0.85, 1.15);
  }

  /** Random walk seen through one sensor (σ = 1); returns {mean NIS, mean λ} of steps 500..3000. */
  private static double[] run(double qTrue, double qModel, boolean adaptive) {
    final ExtendedKalmanFilter ekf = new ExtendedKalmanFilter(
        new LinearDynamics(new double[][] {{0.0}}, null), new double[][] {{qModel}},
        FilterSettings.defaults().withGating(false).withAdaptiveProcessNoise(adaptive, 60, 200),
        0.0, new double[1], new double[][] {{1.0}});
    final LinearMeasurement meas = new LinearMeasurement(new double[][] {{1.0}});
    final Well19937c rng = new Well19937c(1000);
    double x = 0;
    double nis = 0;
    double lambda = 0;
    int count = 0;
    for (int k = 1; k <= 3000; k++) {
      x += Math.sqrt(qTrue) * rng.nextGaussian();
      ekf.propagate(new double[0], 1.0);
      final StepResult res = ekf.update(meas, new double[] {x + rng.nextGaussian()},
          new boolean[] {true}, new double[][] {{1.0}}, new double[0]);
      if (k > 500) {
        nis += res.nis();
        lambda += res.processNoiseInflation();
        count++;
      }
    }
    return new double[] {nis / count, lambda / count};
  }
}
