package org.plateward.softsensor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.time.Instant;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The twin score's figures on hand-made frames, against values worked out by hand. */
class TwinScoreTest {
  private static Estimate estimate(double peakC, double sdK, double tteS) {
    double nan = Double.NaN;
    return new Estimate(Instant.EPOCH, peakC + 273.15, sdK, 0.48, 0.0, 0.0, 0.0, nan, tteS, 10.0, 1.0, 1,
        EstimatorStatus.OK, "", 1, 0, 0.5, 0, 5, 0, 1, 0, 0, 0,
        new double[0], new double[0], new double[0], Map.of());
  }

  private static Map<String, Double> truth(double peakC, double tteS) {
    return Map.of("truth_peak_plate_temp_c", peakC, "truth_time_to_exhaust_s", tteS);
  }

  @Test
  void biasRmseCoverageAndTheSignedExhaustError() {
    TwinScore s = new TwinScore(0.0);
    // peak errors +1, -3, +5 K with sigma 2 K: bias +1 K, RMSE sqrt(35/3), 2 of 3 inside 2 sigma;
    // forecasts of a 100 s melt-through 90, 120 and 105 s: signed errors -10, +20, +5 %
    s.add(0, estimate(1001, 2, 90), truth(1000, 100));
    s.add(1, estimate(997, 2, 120), truth(1000, 100));
    s.add(2, estimate(1005, 2, 105), truth(1000, 100));
    assertThat(s.peakBiasK()).isCloseTo(1.0, within(1e-9));
    assertThat(s.peakRmseK()).isCloseTo(Math.sqrt(35.0 / 3.0), within(1e-9));
    assertThat(s.coverage()).isCloseTo(2.0 / 3.0, within(1e-12));
    assertThat(s.exhaustMedianSignedRelError()).isCloseTo(0.05, within(1e-9));
    assertThat(s.exhaustWithin10Pct()).isCloseTo(2.0 / 3.0, within(1e-12));
    assertThat(s.exhaustWorstRelError()).isCloseTo(0.2, within(1e-9));
  }
}
