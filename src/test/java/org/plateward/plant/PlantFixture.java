package org.plateward.plant;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import org.plateward.config.PlatewardConfig;
import org.plateward.reactor.UnitSpec;

/** The demo unit and small scenarios built in code for the plant tests. */
final class PlantFixture {
  static final Instant T0 = Instant.parse("2031-01-01T00:00:00Z");

  private PlantFixture() {}

  static UnitSpec unit() {
    try {
      return PlatewardConfig.load(Path.of("config", "plateward.toml")).unit();
    } catch (Exception e) {
      throw new IllegalStateException(e);
    }
  }

  static Scenario scenario(double durationS, int cells, List<ScenarioEvent> events) {
    return new Scenario("test", 7, T0, durationS, 1.0, TruthSettings.defaults().withCells(cells),
        SensorSuite.defaults(), events);
  }

  static ScenarioEvent upset(EventKind kind, double atS, double magnitude, double rampS, double durationS) {
    return new ScenarioEvent(kind, atS, List.of(), null, magnitude, rampS, durationS, Double.NaN, Double.NaN);
  }
}
