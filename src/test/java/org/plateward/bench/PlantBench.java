package org.plateward.bench;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.plateward.config.PlatewardConfig;
import org.plateward.plant.EventKind;
import org.plateward.plant.PlantSample;
import org.plateward.plant.Scenario;
import org.plateward.plant.ScenarioEvent;
import org.plateward.plant.SensorSuite;
import org.plateward.plant.SimulatedPlant;
import org.plateward.plant.TruthSettings;
import org.plateward.reactor.ModelEvaluation;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.UnitSpec;

/**
 * Cost of one simulated second of the plant at 1 s frames (truth step, outputs, sensors), and of
 * the one model evaluation inside it; real-time factor = 1 s / (time per frame). Short by design:
 * {@code mvn -o -q test-compile exec:exec@bench -Dbench.args="PlantBench -f 1 -wi 3 -i 5 -w 1s -r 1s"}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class PlantBench {
  @Param({"200"})
  int cells;

  private SimulatedPlant plant;
  private UnitSpec unit;
  private ModelEvaluation eval;
  private double[] e;
  private ModelParameters p;

  @Setup
  public void setUp() throws Exception {
    unit = PlatewardConfig.load(Path.of("config", "plateward.toml")).unit();
    // a fuel surge keeps the plate moving (and melting) during the measurement
    ScenarioEvent surge = new ScenarioEvent(EventKind.FUEL_SURGE, 0, List.of(), null, 0.06, 60, 1e9, Double.NaN, Double.NaN);
    Scenario sc = new Scenario("bench", 1, Instant.parse("2031-01-01T00:00:00Z"), 1e9, 1.0,
        TruthSettings.defaults().withCells(cells), SensorSuite.defaults(), List.of(surge));
    plant = new SimulatedPlant(unit, sc);
    eval = plant.plate().model().newEvaluation();
    e = plant.plate().enthalpyJPerM2();
    p = ModelParameters.nominal(unit);
  }

  /** One frame: one implicit-conduction step, one output evaluation, sensors. */
  @Benchmark
  public PlantSample frame() {
    return plant.next();
  }

  /** One evaluation of the model (both channel marches) at a fixed state. */
  @Benchmark
  public ModelEvaluation modelEvaluate() {
    plant.plate().model().evaluate(e, unit.operatingPoint(), p, eval);
    return eval;
  }
}
