package org.plateward.plant;

import java.util.EnumMap;
import java.util.Map;
import org.plateward.reactor.ModelEvaluation;
import org.plateward.reactor.ModelOutputs;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.OperatingPoint;
import org.plateward.reactor.UnitSpec;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;
import org.plateward.signals.StatusName;

/**
 * The simulated plant running one scenario: frame 0 is the steady state of the truth at the
 * scenario's initial inputs; each further frame advances the truth plate by one sample period
 * with the inputs and parameters of the interval's start (so the evaluation made for the
 * previous frame's outputs is also the step's f: one model evaluation per frame), then reads
 * the instruments.
 * Deterministic; not thread-safe.
 */
public final class SimulatedPlant {
  private final Scenario scenario;
  private final UpsetSchedule schedule;
  private final TruthPlate plate;
  private final SensorBank sensors;
  private final double dtS;
  private final long frames;
  private final double[] trueSi = new double[Signal.COUNT];
  private final double[] valuesSi = new double[Signal.COUNT];
  private final Quality[] quality = new Quality[Signal.COUNT];
  private final Map<Signal, StatusName> status = new EnumMap<>(Signal.class);
  private long next;
  private OperatingPoint lastU;
  private ModelParameters lastP;

  /** Builds the plant and solves its initial steady state (a few seconds at 200 cells). */
  public SimulatedPlant(UnitSpec unit, Scenario scenario) {
    this.scenario = scenario;
    this.schedule = new UpsetSchedule(unit, scenario.truth(), scenario.events());
    this.plate = new TruthPlate(unit, scenario.truth(), schedule.inputsAt(0.0), schedule.parametersAt(0.0));
    this.sensors = new SensorBank(scenario.sensors(), scenario.samplePeriodS(), scenario.seed(), scenario.events());
    this.dtS = scenario.samplePeriodS();
    this.frames = scenario.frames();
  }

  public Scenario scenario() {
    return scenario;
  }

  public TruthPlate plate() {
    return plate;
  }

  public UpsetSchedule schedule() {
    return schedule;
  }

  /** Frames in the run. */
  public long frames() {
    return frames;
  }

  public boolean hasNext() {
    return next < frames;
  }

  /** The next frame. */
  public PlantSample next() {
    if (!hasNext()) {
      throw new java.util.NoSuchElementException("the scenario has ended after " + frames + " frames");
    }
    long k = next++;
    double t = k * dtS;
    if (k > 0) {
      // inputs and parameters held at the interval's start (their ramps last a minute or more)
      plate.advanceFromLastEvaluation(lastP, lastU, dtS, scenario.truth().substeps());
    }
    OperatingPoint u = schedule.inputsAt(t);
    ModelParameters p = schedule.parametersAt(t);
    ModelEvaluation ev = plate.evaluate(u, p);
    lastU = u;
    lastP = p;
    boundary(u, ev);
    sensors.read(k, t, trueSi, valuesSi, quality, status);
    TruthPlate.HiddenTruth h = plate.hiddenTruth();
    PlantSample.Truth truth = new PlantSample.Truth(
        h.peakTempK(), h.peakPositionM(), h.meltFraction(), h.maxCellMeltFraction(),
        p.reformingActivity(), p.combustionActivity(), p.heatLossCoefficientWPerM2K(), trueSi);
    Frame frame = new Frame(scenario.start().plusNanos(Math.round(t * 1e9)), valuesSi, quality);
    return new PlantSample(k, t, frame, status, truth);
  }

  private void boundary(OperatingPoint u, ModelEvaluation ev) {
    trueSi[Signal.REF_GAS_FLOW.ordinal()] = u.reformingGasFlowMolPerS();
    trueSi[Signal.REF_STEAM_FLOW.ordinal()] = u.steamFlowMolPerS();
    trueSi[Signal.REF_INLET_TEMP.ordinal()] = u.reformingInletTempK();
    trueSi[Signal.REF_PRESSURE.ordinal()] = u.reformingPressurePa();
    trueSi[Signal.FUEL_FLOW.ordinal()] = u.fuelFlowMolPerS();
    trueSi[Signal.AIR_FLOW.ordinal()] = u.airFlowMolPerS();
    trueSi[Signal.COMB_INLET_TEMP.ordinal()] = u.combustionInletTempK();
    trueSi[Signal.COMB_PRESSURE.ordinal()] = u.combustionPressurePa();
    for (int m = 0; m < ModelOutputs.COUNT; m++) {
      trueSi[ModelOutputs.signal(m).ordinal()] = ev.output(m);
    }
  }
}
