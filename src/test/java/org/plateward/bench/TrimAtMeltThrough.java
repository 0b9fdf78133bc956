package org.plateward.bench;

import java.nio.file.Path;
import java.util.Locale;
import org.plateward.advisor.PosteriorBelief;
import org.plateward.advisor.SpreadForecast;
import org.plateward.config.UnitConfigLoader;
import org.plateward.estimation.FilterSettings;
import org.plateward.reactor.PlateReactorModel;
import org.plateward.replay.ReplayFrameSource;
import org.plateward.signals.Frame;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.SoftSensorSettings;

/** Study (not a test): the advisor's spread forecast for a few trims at a given time of a recording. */
public final class TrimAtMeltThrough {
  private TrimAtMeltThrough() {}

  public static void main(String[] args) throws Exception {
    var unit = UnitConfigLoader.load(Path.of("config/plateward.toml"));
    String rec = args.length > 0 ? args[0] : "fuel-surge";
    double atS = args.length > 1 ? Double.parseDouble(args[1]) : 1530;
    ReactorSoftSensor sensor = new ReactorSoftSensor(unit, SoftSensorSettings.defaults(), FilterSettings.defaults());
    try (var src = ReplayFrameSource.open(Path.of("replay-data", rec + ".csv"))) {
      Frame f = src.next();
      long t0 = f.time().getEpochSecond();
      while (f != null && f.time().getEpochSecond() - t0 <= atS) {
        sensor.accept(f);
        f = src.next();
      }
    }
    SpreadForecast sf = new SpreadForecast(new PlateReactorModel(unit, sensor.model().grid(), PlateReactorModel.Options.DEFAULT));
    sf.setBelief(PosteriorBelief.of(sensor), sensor.heldInputs());
    for (double trim : new double[] {0.0, -0.02, -0.05, -0.10, -0.15}) {
      var o = sf.forecast(trim, 2.0, 900.0);
      System.out.printf(Locale.ROOT, "trim %+.2f: %s%n", trim, o);
    }
  }
}
