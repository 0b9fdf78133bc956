package org.plateward.advisor;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.plateward.config.UnitConfigLoader;
import org.plateward.estimation.FilterSettings;
import org.plateward.reactor.PlateReactorModel;
import org.plateward.replay.ReplayFrameSource;
import org.plateward.signals.Frame;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.SoftSensorSettings;

/**
 * Less fuel cannot make the plate hotter: the advisor's spread forecast of the peak over the
 * horizon falls (or stays) as the fuel trim deepens, from the soft sensor's posterior at the fuel
 * surge's melt-through (1530 s into the recording, the hottest cell just fully melted, its
 * neighbours on the plateau). With 400 K forecast steps the sigma-point marches ran away there:
 * a 5 % trim forecast a mean peak of 1556 K against 1420 K holding, and the advisor said no trim
 * within bounds would do.
 */
class TrimMonotonicityTest {
  @Test
  void theForecastPeakFallsAsTheTrimDeepensAtTheMeltThrough() throws Exception {
    var unit = UnitConfigLoader.load(Path.of("config/plateward.toml"));
    ReactorSoftSensor sensor = new ReactorSoftSensor(unit, SoftSensorSettings.defaults(), FilterSettings.defaults());
    try (var src = ReplayFrameSource.open(Path.of("replay-data", "fuel-surge.csv"))) {
      Frame f = src.next();
      long t0 = f.time().getEpochSecond();
      while (f != null && f.time().getEpochSecond() - t0 <= 1530) {
        sensor.accept(f);
        f = src.next();
      }
    }
    SpreadForecast sf = new SpreadForecast(new PlateReactorModel(unit, sensor.model().grid(), PlateReactorModel.Options.DEFAULT));
    sf.setBelief(PosteriorBelief.of(sensor), sensor.heldInputs());
    double before = Double.POSITIVE_INFINITY;
    double beforeUpper = Double.POSITIVE_INFINITY;
    for (double trim : new double[] {0.0, -0.02, -0.05, -0.10, -0.15}) {
      SpreadOutlook o = sf.forecast(trim, 2.0, 900.0);
      // 0.5 K for the march's own discretisation
      assertThat(o.peakMeanK()).as("forecast peak at trim %.2f", trim).isLessThanOrEqualTo(before + 0.5);
      assertThat(o.peakUpperK()).as("upper bound at trim %.2f", trim).isLessThanOrEqualTo(beforeUpper + 0.5);
      before = o.peakMeanK();
      beforeUpper = o.peakUpperK();
    }
  }
}
