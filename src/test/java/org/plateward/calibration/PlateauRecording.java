package org.plateward.calibration;

import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.plateward.config.PlatewardConfig;
import org.plateward.plant.EventKind;
import org.plateward.plant.PlantSample;
import org.plateward.plant.Scenario;
import org.plateward.plant.ScenarioEvent;
import org.plateward.plant.SensorSuite;
import org.plateward.plant.SimulatedPlant;
import org.plateward.plant.TruthSettings;
import org.plateward.reactor.CatalystSpec;
import org.plateward.reactor.UnitSpec;

/**
 * A short recording of Plateward's simulated plant (invented data) with steady plateaus: the
 * plant's catalysts are set away from the configured unit's, its truth settings are the
 * defaults (200 cells, Nu 7.9, heat loss 5.3 W/(m2 K)), and the fuel and the feed step between
 * long holds.
 */
final class PlateauRecording {
  static final Instant T0 = Instant.parse("2031-04-02T06:00:00Z");
  /** The plant's reforming activity at t = 0 (configured unit: 1.0). */
  static final double PLANT_REFORMING_ACTIVITY = 0.85;
  /** The plant's combustion activity (configured unit: 0.5). */
  static final double PLANT_COMBUSTION_ACTIVITY = 0.42;
  static final double HOLD_S = 1200.0;

  final UnitSpec configured;
  final UnitSpec plantUnit;
  final Scenario scenario;
  final List<PlantSample> samples = new ArrayList<>();  // read-only once run

  private PlateauRecording(UnitSpec configured, UnitSpec plantUnit, Scenario scenario) {
    this.configured = configured;
    this.plantUnit = plantUnit;
    this.scenario = scenario;
  }

  static UnitSpec demoUnit() {
    try {
      return PlatewardConfig.load(Path.of("config", "plateward.toml")).unit();
    } catch (Exception e) {
      throw new IllegalStateException(e);
    }
  }

  /**
   * Runs the plant through four 20 min plateaus: base; fuel -4 %; fuel -4 % with the feed -6 %;
   * fuel -7.8 % (two -4 % steps). No plateau melts the buffer layer.
   */
  static synchronized PlateauRecording run() {
    if (cached == null) {
      cached = simulate();
    }
    return cached;
  }

  private static PlateauRecording cached;

  private static PlateauRecording simulate() {
    UnitSpec u = demoUnit();
    CatalystSpec c = u.catalyst();
    UnitSpec plant = new UnitSpec(u.name(), u.site(), u.geometry(), u.plate(), u.buffer(),
        new CatalystSpec(c.reformingLoadingKgPerM2(), PLANT_REFORMING_ACTIVITY, PLANT_COMBUSTION_ACTIVITY),
        u.heatLoss(), u.feedGas(), u.operatingPoint(), u.grid());
    List<ScenarioEvent> ev = List.of(
        step(EventKind.FUEL_SURGE, HOLD_S, -0.04, 1e9),
        step(EventKind.FEED_DROP, 2 * HOLD_S, 0.06, HOLD_S),
        step(EventKind.FUEL_SURGE, 3 * HOLD_S, -0.04, 1e9));
    Scenario s = new Scenario("calibration-plateaus", 11, T0, 4 * HOLD_S, 1.0, TruthSettings.defaults(),
        // meters without systematic error: a meter offset is indistinguishable from a parameter
        // change in boundary data, so recovery of known parameters is tested without one
        SensorSuite.defaults().withoutSystematicErrors(), ev);
    PlateauRecording r = new PlateauRecording(u, plant, s);
    SimulatedPlant p = new SimulatedPlant(plant, s);
    while (p.hasNext()) {
      r.samples.add(p.next());
    }
    return r;
  }

  /** Writes the recording as a replay file (with the truth columns). */
  void write(Path file) throws java.io.IOException {
    org.plateward.plant.PlantRecorder rec = new org.plateward.plant.PlantRecorder();
    samples.forEach(rec.sink());
    rec.write(file, scenario, "built in PlateauRecording", configured.name());
  }

  private static ScenarioEvent step(EventKind kind, double atS, double magnitude, double durationS) {
    return new ScenarioEvent(kind, atS, List.of(), null, magnitude, 60.0, durationS, Double.NaN, Double.NaN);
  }
}
