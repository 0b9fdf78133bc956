package org.plateward.advisor;

import java.nio.file.Path;
import org.plateward.config.PlatewardConfig;
import org.plateward.config.ScenarioLoader;
import org.plateward.plant.ConductionImplicitStepper;
import org.plateward.plant.Scenario;
import org.plateward.plant.TruthPlate;
import org.plateward.plant.UpsetSchedule;
import org.plateward.reactor.HiddenPeak;
import org.plateward.reactor.ModelEvaluation;
import org.plateward.reactor.OperatingPoint;
import org.plateward.reactor.PlateReactorModel;
import org.plateward.reactor.UnitSpec;

/**
 * The plant of config/scenarios/fuel-surge.toml (invented scenario, our own simulator): its truth
 * plate advanced with the scenario's true inputs, stepped exactly as the simulated plant steps it
 * (1 s frames, the truth's substeps), without the instruments.
 */
final class FuelSurgeTwin {
  final UnitSpec unit;
  final Scenario scenario;
  final UpsetSchedule schedule;
  final TruthPlate plate;
  double timeS;

  FuelSurgeTwin() throws Exception {
    unit = PlatewardConfig.load(Path.of("config", "plateward.toml")).unit();
    scenario = ScenarioLoader.load(Path.of("config", "scenarios", "fuel-surge.toml"));
    schedule = new UpsetSchedule(unit, scenario.truth(), scenario.events());
    plate = new TruthPlate(unit, scenario.truth(), schedule.inputsAt(0.0), schedule.parametersAt(0.0));
  }

  /** Runs the plant with its scheduled inputs until {@code untilS}. */
  void runTo(double untilS) {
    double dt = scenario.samplePeriodS();
    while (timeS < untilS - 1e-9) {
      plate.advance(schedule.inputsAt(timeS), schedule.parametersAt(timeS), dt, scenario.truth().substeps());
      timeS += dt;
    }
  }

  /**
   * From a copy of the present true state, the true peak plate temperature max over
   * {@code horizonS} with the scheduled inputs and the fuel scaled by (1 + trim), K.
   */
  double truePeakMaxK(double trim, double horizonS) {
    return truePeakMaxK(plate, schedule, scenario, timeS, trim, horizonS);
  }

  /** The same for any truth plate of this scenario at time {@code timeS}. */
  static double truePeakMaxK(TruthPlate plate, UpsetSchedule schedule, Scenario scenario, double timeS, double trim,
      double horizonS) {
    PlateReactorModel model = plate.model();
    ConductionImplicitStepper stepper = new ConductionImplicitStepper(model);
    ModelEvaluation ev = model.newEvaluation();
    double[] e = plate.enthalpyJPerM2();
    double dt = scenario.samplePeriodS();
    int sub = scenario.truth().substeps();
    double max = Double.NEGATIVE_INFINITY;
    for (double t = timeS; t < timeS + horizonS - 1e-9; t += dt) {
      OperatingPoint u = TrimForecast.trimmed(schedule.inputsAt(t), trim);
      for (int k = 0; k < sub; k++) {
        stepper.step(e, u, schedule.parametersAt(t), dt / sub);
      }
      model.evaluate(e, u, schedule.parametersAt(t), ev);
      max = Math.max(max, HiddenPeak.of(model.grid(), ev.plateTempK()).tempK());
    }
    return max;
  }
}
