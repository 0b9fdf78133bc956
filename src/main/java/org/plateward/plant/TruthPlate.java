package org.plateward.plant;

import org.plateward.reactor.Grid;
import org.plateward.reactor.HiddenPeak;
import org.plateward.reactor.ModelEvaluation;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.OperatingPoint;
import org.plateward.reactor.PlateReactorModel;
import org.plateward.reactor.SteadyStateSolver;
import org.plateward.reactor.SteadySummary;
import org.plateward.reactor.UnitSpec;

/**
 * The physical state of the simulated unit: the reactor physics of {@link PlateReactorModel} on a
 * fine uniform grid with the plant's own Nusselt number, advanced in time by {@link
 * ConductionImplicitStepper}. Not thread-safe.
 */
public final class TruthPlate {
  private final PlateReactorModel model;
  private final ConductionImplicitStepper stepper;
  private final ModelEvaluation eval;
  private final double[] e;
  private final double[] widthM;
  private final double lengthM;

  /**
   * Starts at the steady state (lit branch, hot start) of the truth at (u0, p0).
   *
   * @param unit the configured unit (geometry, materials, catalyst loading)
   * @param truth the plant's grid and transport mismatch
   */
  public TruthPlate(UnitSpec unit, TruthSettings truth, OperatingPoint u0, ModelParameters p0) {
    Grid grid = Grid.uniform(unit.geometry().lengthM(), truth.cells());
    this.model = new PlateReactorModel(unit, grid, new PlateReactorModel.Options(truth.nusselt()));
    this.stepper = new ConductionImplicitStepper(model);
    this.eval = model.newEvaluation();
    int n = model.cells();
    this.widthM = new double[n];
    for (int j = 0; j < n; j++) {
      widthM[j] = grid.widthM(j);
    }
    this.lengthM = grid.lengthM();
    double[] hot = new double[n];
    model.uniformState(SteadySummary.HOT_START_K, hot);
    this.e = new SteadyStateSolver(model).solve(u0, p0, hot).enthalpyJPerM2();
  }

  public PlateReactorModel model() {
    return model;
  }

  /** Copy of the areal plate enthalpies, J/m2. */
  public double[] enthalpyJPerM2() {
    return e.clone();
  }

  /** Advances the plate by {@code dtS} in {@code substeps} equal steps at constant (u, p). */
  public void advance(OperatingPoint u, ModelParameters p, double dtS, int substeps) {
    double h = dtS / substeps;
    for (int k = 0; k < substeps; k++) {
      stepper.step(e, u, p, h);
    }
  }

  /**
   * Advances by {@code dtS} in {@code substeps} steps at constant (u, p), where the last {@link
   * #evaluate} was made at the current state with these same u and p (its f is reused).
   */
  public void advanceFromLastEvaluation(ModelParameters p, OperatingPoint u, double dtS, int substeps) {
    double h = dtS / substeps;
    stepper.step(e, p, h, eval);
    for (int k = 1; k < substeps; k++) {
      stepper.step(e, u, p, h);
    }
  }

  /** Evaluates f, outputs and profiles at the current state into the plate's workspace. */
  public ModelEvaluation evaluate(OperatingPoint u, ModelParameters p) {
    model.evaluate(e, u, p, eval);
    return eval;
  }

  /** The hidden-state figures of the last {@link #evaluate}. */
  public HiddenTruth hiddenTruth() {
    int n = model.cells();
    double[] plateK = eval.plateTempK();
    HiddenPeak peak = HiddenPeak.of(model.grid(), plateK);
    double melt = 0.0;
    double max = 0.0;
    for (int j = 0; j < n; j++) {
      double phi = eval.meltFraction(j);
      melt += phi * widthM[j];
      max = Math.max(max, phi);
    }
    return new HiddenTruth(peak.tempK(), peak.positionM(), melt / lengthM, max);
  }

  /**
   * The hidden quantities the estimator infers.
   *
   * @param peakTempK hottest plate temperature, K
   * @param peakPositionM its position from the reforming inlet, m
   * @param meltFraction length-weighted overall melt fraction of the buffer layer
   * @param maxCellMeltFraction largest melt fraction of any cell
   */
  public record HiddenTruth(double peakTempK, double peakPositionM, double meltFraction, double maxCellMeltFraction) {}
}
