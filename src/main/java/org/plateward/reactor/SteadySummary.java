package org.plateward.reactor;

import org.plateward.thermo.Species;

/**
 * The key figures of the unit's steady state at its configured operating point, found from a
 * hot start (lit branch) and checked for being lit.
 *
 * @param peakPlateTempK hidden peak plate temperature, K
 * @param peakPositionM its position from the reforming inlet, m
 * @param refOutletTempK reformed gas outlet temperature, K
 * @param combOutletTempK flue gas outlet temperature, K
 * @param methaneConversion reforming-side methane conversion, 0..1
 * @param combMethaneConversion combustion-side methane conversion, 0..1
 * @param bufferMeltFraction length-weighted overall melt fraction, 0..1
 * @param maxCellMeltFraction largest melt fraction of any cell, 0..1
 * @param energyBalanceRelError relative steady-state energy imbalance (in - out - loss over duty)
 * @param elementBalanceRelError relative atom imbalance (worst of C, H, O, N)
 * @param cells number of cells
 * @param iterations solver iterations
 * @param plateTempK the plate profile, K
 * @param cellCentresM the cell centres, m
 */
public record SteadySummary(
    double peakPlateTempK,
    double peakPositionM,
    double refOutletTempK,
    double combOutletTempK,
    double methaneConversion,
    double combMethaneConversion,
    double bufferMeltFraction,
    double maxCellMeltFraction,
    double energyBalanceRelError,
    double elementBalanceRelError,
    int cells,
    int iterations,
    double[] plateTempK,
    double[] cellCentresM) {

  /** Hot start for the lit branch, K. */
  public static final double HOT_START_K = 1250.0;

  /** Solves the steady state of {@code model} at (u, p) and summarises it. */
  public static SteadySummary solve(PlateReactorModel model, OperatingPoint u, ModelParameters p) {
    double[] e0 = new double[model.cells()];
    model.uniformState(HOT_START_K, e0);
    SteadyStateSolver.Result r = new SteadyStateSolver(model).solve(u, p, e0);
    return of(model, u, p, r.enthalpyJPerM2(), r.iterations());
  }

  /** Summarises the state {@code e}. */
  public static SteadySummary of(PlateReactorModel model, OperatingPoint u, ModelParameters p, double[] e, int iterations) {
    ModelEvaluation ev = model.newEvaluation();
    model.evaluate(e, u, p, ev);
    int n = model.cells();
    int ns = Species.COUNT;
    int ch4 = Species.CH4.ordinal();
    HiddenPeak peak = HiddenPeak.of(model.grid(), ev.plateK);
    double melt = 0.0;
    double maxMelt = 0.0;
    for (int j = 0; j < n; j++) {
      melt += ev.melt[j] * model.grid().widthM(j);
      maxMelt = Math.max(maxMelt, ev.melt[j]);
    }
    double[] centres = new double[n];
    for (int j = 0; j < n; j++) {
      centres[j] = model.grid().centreM(j);
    }
    return new SteadySummary(
        peak.tempK(),
        peak.positionM(),
        ev.outputs[ModelOutputs.REF_OUTLET_TEMP_K],
        ev.outputs[ModelOutputs.COMB_OUTLET_TEMP_K],
        1.0 - ev.reforming.flows[n * ns + ch4] / ev.reforming.flows[ch4],
        1.0 - ev.combustion.flows[ch4] / ev.combustion.flows[n * ns + ch4],
        melt / model.grid().lengthM(),
        maxMelt,
        UnitBalances.steadyEnergyRelativeError(model, ev, p),
        UnitBalances.elementRelativeError(model, ev),
        n,
        iterations,
        ev.plateK.clone(),
        centres);
  }
}
