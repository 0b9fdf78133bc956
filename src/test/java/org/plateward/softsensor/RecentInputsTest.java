package org.plateward.softsensor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** The held inputs of a forecast: a window mean, checked against the arithmetic mean and σ/√N. */
class RecentInputsTest {
  @Test
  void meanOverTheWindowOnly() {
    RecentInputs r = new RecentInputs(2, 30.0, 64);
    assertThat(r.mean(0)).isNaN();
    for (int t = 0; t < 100; t++) {
      r.add(0, t, t); // a ramp: the last 30 values are 70..99, mean 84.5
    }
    assertThat(r.mean(0)).isEqualTo(84.5);
    assertThat(r.mean(1)).isNaN();
    // a signal that went silent keeps the mean of its last window
    r.add(1, 5.0, 2.0);
    r.add(1, 6.0, 4.0);
    assertThat(r.mean(1)).isEqualTo(3.0);
  }

  @Test
  void meterNoiseFallsAsOneOverRootN() {
    // white noise of σ = 0.5 % on a reading of 1: the 30-frame mean has σ = 0.5 %/√30 (0.091 %)
    double sd = sampledSd(11, r -> r.mean(0));
    // 2000 independent window means: the sample σ is within about 5 % of the true one
    assertThat(sd).isCloseTo(0.005 / Math.sqrt(30), within(0.1 * 0.005 / Math.sqrt(30)));
  }

  @Test
  void presentFollowsARampWithoutLag() {
    RecentInputs r = new RecentInputs(1, 30.0, 64);
    assertThat(r.present(0)).isNaN();
    r.add(0, 0.0, 5.0);
    assertThat(r.present(0)).isEqualTo(5.0); // one value: itself
    for (int t = 1; t < 100; t++) {
      r.add(0, t, 2.0 * t);
    }
    // the least-squares line through an exact ramp is the ramp: its newest value, 198
    assertThat(r.present(0)).isCloseTo(198.0, within(1e-9));
    // the mean lags by half the window (mean of 140..198 = 169)
    assertThat(r.mean(0)).isCloseTo(169.0, within(1e-9));
  }

  @Test
  void presentIsThePlateauOnceTheRampHasEnded() {
    RecentInputs r = new RecentInputs(1, 30.0, 256);
    for (int t = 0; t <= 200; t++) {
      r.add(0, t, t < 100 ? 1.0 + 0.0005 * t : 1.05); // a 5 % ramp over 100 s, then held
      if (t == 110) {
        // 10 s into the plateau the one-window line spans the kink: between ramp and plateau
        assertThat(r.present(0)).isBetween(1.04, 1.06);
      }
    }
    // 100 s of plateau: the mean over the flat 60 s, exactly the plateau
    assertThat(r.present(0)).isCloseTo(1.05, within(1e-12));
  }

  @Test
  void presentOfASteadyNoisyInputIsALongMean() {
    // N frames of white noise σ: a mean has σ/√N (0.091 % for 30, 0.046 % for 120); the line's
    // end point σ √((4N − 2)/(N(N + 1))) (0.18 % for 30). A steady input is held by the
    // 120-frame mean, except when a 2-standard-error trend test trips by chance (5 %)
    double sd = sampledSd(12, r -> r.present(0));
    assertThat(sd).isBetween(0.9 * 0.005 / Math.sqrt(120), 0.005 / Math.sqrt(30));
  }

  /**
   * Readings 1 + 0.5 % white noise at 1 Hz for 60,000 s; the RMS deviation from 1 of
   * {@code estimate} taken once per disjoint 30 s window (2000 independent samples).
   */
  private static double sampledSd(long seed, java.util.function.ToDoubleFunction<RecentInputs> estimate) {
    SplittableRandom rnd = new SplittableRandom(seed);
    RecentInputs r = new RecentInputs(1, 30.0, 256);
    double sum2 = 0.0;
    int samples = 0;
    for (int t = 0; t < 60_000; t++) {
      r.add(0, t, 1.0 + 0.005 * gauss(rnd));
      if (t >= 30 && t % 30 == 29) {
        double d = estimate.applyAsDouble(r) - 1.0;
        sum2 += d * d;
        samples++;
      }
    }
    return Math.sqrt(sum2 / samples);
  }

  private static double gauss(SplittableRandom r) {
    double u = r.nextDouble();
    double v = r.nextDouble();
    return Math.sqrt(-2.0 * Math.log(1.0 - u)) * Math.cos(2.0 * Math.PI * v);
  }
}
