package org.plateward.advisor;

import org.plateward.reactor.Grid;
import org.plateward.reactor.HiddenPeak;
import org.plateward.reactor.ModelEvaluation;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.OperatingPoint;
import org.plateward.reactor.PlateEnthalpy;
import org.plateward.reactor.PlateReactorModel;
import org.plateward.softsensor.ExhaustForecast;
import org.plateward.thermo.Species;

/**
 * Open-loop forecast of the plate under a fuel-flow trim: from a plate state, the inputs with
 * the fuel flow scaled by (1 + trim), and the parameters held, the plate is marched with the
 * linearly implicit steps of {@link ExhaustForecast#march} (Jacobian taken once per state, at
 * the untrimmed inputs, and re-used for every trim).
 *
 * <p>Upper bound: peakUpper = max_t T_peak(t) + k σ, with σ the standard deviation of the
 * present peak estimate carried unchanged along the horizon. This is the simple bound; it
 * ignores how the spread grows or shrinks over the horizon.
 *
 * <p>Not thread-safe.
 */
public final class TrimForecast {
  private final PlateReactorModel model;
  private final ExhaustForecast stepper;
  private final ModelEvaluation ev;
  private final int n;
  private double[] e0;
  private OperatingPoint u0;
  private ModelParameters p0;

  public TrimForecast(PlateReactorModel model) {
    this.model = model;
    this.stepper = new ExhaustForecast(model);
    this.ev = model.newEvaluation();
    this.n = model.cells();
  }

  /** The model the forecast runs on. */
  public PlateReactorModel model() {
    return model;
  }

  /**
   * Sets the state to forecast from and builds the Jacobian there (one model Jacobian).
   *
   * @param eJPerM2 plate enthalpy per cell, J/m2 (copied)
   * @param u present inputs (untrimmed)
   * @param p present parameters
   */
  public void setState(double[] eJPerM2, OperatingPoint u, ModelParameters p) {
    if (eJPerM2.length != n) {
      throw new IllegalArgumentException("state has " + eJPerM2.length + " cells, the model " + n);
    }
    e0 = eJPerM2.clone();
    u0 = u;
    p0 = p;
    double[][] j = new double[n][n];
    model.evaluate(e0, u, p, ev);
    model.jacobian(e0, u, p, ev, j, null);
    stepper.setJacobian(j, e0);
  }

  /**
   * Forecast for one trim from the state of the last {@link #setState}.
   *
   * @param trim relative fuel-flow change (−0.1 = 10 % less fuel)
   * @param peakSdK standard deviation of the present peak estimate, K (0 for a perfect twin)
   * @param kSigma multiplier k of the upper bound
   * @param horizonS horizon, s
   */
  public TrimOutlook forecast(double trim, double peakSdK, double kSigma, double horizonS) {
    if (e0 == null) {
      throw new IllegalStateException("setState first");
    }
    if (!(trim > -1.0) || !Double.isFinite(trim)) {
      throw new IllegalArgumentException("trim must be finite and above -1 (no negative fuel), got " + trim);
    }
    OperatingPoint u = trimmed(u0, trim);
    PlateEnthalpy plate = model.plate();
    Grid grid = model.grid();
    double[] tK = new double[n];
    double[] peak = {Double.NEGATIVE_INFINITY};
    double[] melt = {0.0};
    double[] end = stepper.march(e0, u, p0, horizonS, (t, e) -> {
      for (int j = 0; j < n; j++) {
        tK[j] = plate.tempK(e[j]);
        melt[0] = Math.max(melt[0], plate.meltFraction(e[j]));
      }
      peak[0] = Math.max(peak[0], HiddenPeak.of(grid, tK).tempK());
    });
    model.evaluate(end, u, p0, ev);
    int ch4 = Species.CH4.ordinal();
    double conversion = 1.0 - ev.reformingFlowMolPerS(n, ch4) / ev.reformingFlowMolPerS(0, ch4);
    return new TrimOutlook(trim, peak[0], peak[0] + kSigma * peakSdK, melt[0], conversion, horizonS, peakSdK);
  }

  /** The inputs with the fuel flow scaled by (1 + trim), everything else unchanged. */
  public static OperatingPoint trimmed(OperatingPoint u, double trim) {
    return new OperatingPoint(u.reformingGasFlowMolPerS(), u.steamFlowMolPerS(), u.reformingInletTempK(),
        u.reformingPressurePa(), u.fuelFlowMolPerS() * (1.0 + trim), u.airFlowMolPerS(),
        u.combustionInletTempK(), u.combustionPressurePa());
  }
}
