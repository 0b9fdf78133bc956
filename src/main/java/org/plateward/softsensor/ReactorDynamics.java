package org.plateward.softsensor;

import java.util.Arrays;
import org.plateward.estimation.Dynamics;
import org.plateward.reactor.ModelEvaluation;
import org.plateward.reactor.ModelOutputs;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.OperatingPoint;
import org.plateward.reactor.PlateReactorModel;

/**
 * The plate reactor as the estimator sees it: f over the augmented state of {@link StateLayout},
 * inputs u = the eight {@link OperatingPoint} components in SI, in record order.
 *
 * <p><b>Jacobian refresh.</b> f is evaluated on every call (one march of each channel). The
 * Jacobian, structured finite differences over the cells plus one evaluation per parameter, is
 * held and only rebuilt when it may have gone stale: after {@code refreshS} seconds of
 * propagation, when any cell temperature moved more than {@code refreshK} since the last build,
 * when any cell entered or left the melting band (dT/de jumps by a factor of about 60 there),
 * when an input moved more than 2 % (flows) or 5 K (temperatures), or a parameter more than 2 %.
 * The filter reuses Φ while {@link #jacobianVersion()} does not change.
 */
public final class ReactorDynamics implements Dynamics {
  private static final int[] LAG_OUTPUT = {
    ModelOutputs.REF_OUTLET_TEMP_K, ModelOutputs.COMB_OUTLET_TEMP_K,
    ModelOutputs.PLATE_END_INLET_K, ModelOutputs.PLATE_END_OUTLET_K
  };
  /** Analyzer outputs, in the order of the clone slots. */
  static final int[] ANALYZER_OUTPUT = {
    ModelOutputs.REF_DRY_CH4, ModelOutputs.REF_DRY_CO, ModelOutputs.REF_DRY_CO2,
    ModelOutputs.REF_DRY_H2, ModelOutputs.COMB_DRY_O2
  };

  private final PlateReactorModel model;
  private final StateLayout layout;
  private final int n;
  private final int cells;
  private final double capacity;
  private final double[] lagS;
  private final double refreshS;
  private final double refreshK;
  private final double inputErrorTimeS;
  private final double[] uEff = new double[8];

  private final double[] e;
  private final double[] eScratch;
  private final ModelEvaluation base;
  private final ModelEvaluation scratch;
  private final double[][] dfde;
  private final double[][] dhde;
  /** Held Jacobian of f, n×n. */
  private final double[][] held;
  /** Held Jacobian of the model outputs y (SI) with respect to the state, 9×n. */
  private final double[][] heldOutputs;
  private final double[] refTempK;
  private final boolean[] refInBand;
  /** σ of each cell's enthalpy state (K of sensible heat); null: point linearisation. */
  private double[] cellSdK;
  private final double[] plateSlope;
  private final double[] meltSlope;
  private final double[] refSlope;
  private final double[] refU = new double[8];
  private final double[] refP = new double[4];
  private long version = -1;
  private double sinceRefreshS;
  private double lastStepS = 1.0;
  private long builds;

  /**
   * @param model the reduced-order model on the estimator's grid
   * @param layout state layout (its cell count must match the model)
   * @param lagS time constants of the four lagged sensors, s (see {@link StateLayout#lag})
   * @param refreshS longest time a Jacobian is held, s
   * @param refreshK largest cell-temperature change a Jacobian is held over, K
   */
  public ReactorDynamics(PlateReactorModel model, StateLayout layout, double[] lagS, double refreshS, double refreshK) {
    this(model, layout, lagS, refreshS, refreshK, 300.0);
  }

  /**
   * @param inputErrorTimeS correlation time of the systematic input errors, s
   */
  public ReactorDynamics(PlateReactorModel model, StateLayout layout, double[] lagS, double refreshS, double refreshK,
      double inputErrorTimeS) {
    if (layout.cells() != model.cells()) {
      throw new IllegalArgumentException("layout has " + layout.cells() + " cells, model " + model.cells());
    }
    this.model = model;
    this.layout = layout;
    this.n = layout.size();
    this.cells = model.cells();
    this.capacity = model.plate().sensibleJPerM2K();
    this.plateSlope = new double[model.cells()];
    this.meltSlope = new double[model.cells()];
    this.refSlope = new double[model.cells()];
    this.lagS = lagS.clone();
    this.refreshS = refreshS;
    this.refreshK = refreshK;
    this.inputErrorTimeS = inputErrorTimeS;
    e = new double[cells];
    eScratch = new double[cells];
    base = model.newEvaluation();
    scratch = model.newEvaluation();
    dfde = new double[cells][cells];
    dhde = new double[ModelOutputs.COUNT][cells];
    held = new double[n][n];
    heldOutputs = new double[ModelOutputs.COUNT][n];
    refTempK = new double[cells];
    refInBand = new boolean[cells];
  }

  public PlateReactorModel model() {
    return model;
  }

  public StateLayout layout() {
    return layout;
  }

  /** Sensible areal heat capacity C that scales the enthalpy states, J/(m2 K). */
  public double capacityJPerM2K() {
    return capacity;
  }

  /** The operating point of an input vector u (SI, record order). */
  public static OperatingPoint operatingPoint(double[] u) {
    return new OperatingPoint(u[0], u[1], u[2], u[3], u[4], u[5], u[6], u[7]);
  }

  /** The input vector of an operating point. */
  public static double[] inputs(OperatingPoint op) {
    return new double[] {
      op.reformingGasFlowMolPerS(), op.steamFlowMolPerS(), op.reformingInletTempK(), op.reformingPressurePa(),
      op.fuelFlowMolPerS(), op.airFlowMolPerS(), op.combustionInletTempK(), op.combustionPressurePa()
    };
  }

  /** Model parameters held in the state x. */
  public ModelParameters parameters(double[] x) {
    return new ModelParameters(
        x[layout.reformingActivity()], x[layout.combustionActivity()], x[layout.heatLoss()], x[layout.heatTransfer()]);
  }

  /** Areal enthalpy of cell j in state x, J/m2. */
  public double enthalpyJPerM2(double[] x, int j) {
    return x[j] * capacity;
  }

  /**
   * The inputs the model sees in state x: the measured u corrected by the input-error states,
   * u_i (1 + b_i) for flows, u_i + b_i for temperatures (SI).
   */
  public double[] correctedInputs(double[] x, double[] u) {
    double[] c = new double[8];
    correctInto(x, u, c);
    return c;
  }

  private void correctInto(double[] x, double[] u, double[] out) {
    System.arraycopy(u, 0, out, 0, 8);
    for (int q = 0; q < StateLayout.INPUT_ERRORS; q++) {
      int i = StateLayout.ERROR_INPUTS[q];
      double b = x[layout.inputError(q)];
      out[i] = StateLayout.temperatureInput(i) ? u[i] + b : u[i] * (1.0 + b);
    }
  }

  /** Evaluates the model at state x and inputs u (measured; corrected here) into {@code out}. */
  public void evaluateModel(double[] x, double[] u, ModelEvaluation out) {
    for (int j = 0; j < cells; j++) {
      e[j] = x[j] * capacity;
    }
    correctInto(x, u, uEff);
    model.evaluate(e, operatingPoint(uEff), parameters(x), out);
  }

  @Override
  public int stateSize() {
    return n;
  }

  @Override
  public void derivative(double[] x, double[] u, double[] dxdt) {
    evaluateModel(x, u, base);
    fillDerivative(x, base, dxdt);
  }

  private void fillDerivative(double[] x, ModelEvaluation ev, double[] dxdt) {
    Arrays.fill(dxdt, 0.0);
    for (int j = 0; j < cells; j++) {
      dxdt[j] = ev.enthalpyRateWPerM2(j) / capacity;
    }
    for (int k = 0; k < StateLayout.LAGS; k++) {
      int l = layout.lag(k);
      dxdt[l] = (ev.output(LAG_OUTPUT[k]) - x[l]) / lagS[k];
    }
    for (int q = 0; q < StateLayout.INPUT_ERRORS; q++) {
      int b = layout.inputError(q);
      dxdt[b] = -x[b] / inputErrorTimeS;
    }
  }

  @Override
  public void jacobian(double[] x, double[] u, double[][] dfdx) {
    evaluateModel(x, u, base);
    rebuild(x, u);
    copyHeld(dfdx);
  }

  @Override
  public void evaluate(double[] x, double[] u, double[] dxdt, double[][] dfdx) {
    evaluateModel(x, u, base);
    fillDerivative(x, base, dxdt);
    sinceRefreshS += lastStepS;
    if (stale(u, x)) {
      rebuild(x, u);
    }
    copyHeld(dfdx);
  }

  /**
   * Change of a cell's spread slope dT/de, as a share of the sensible slope 1/C, that makes the
   * held Jacobian stale (a relative test rebuilt it on every small change of a cell on the
   * plateau, where the slope is about 1/60 of 1/C: 444 builds on the fuel surge, 273 now, 265 without the spread).
   */
  static final double SLOPE_TOLERANCE = 0.25;
  /**
   * Linearise T(e) and φ(e) over each cell's spread rather than at the mean (statistical
   * linearisation, Gelb 1974; {@link CellSpread}). Near the
   * melting band the point slope jumps between 1/C outside and about 1/60 of it inside; the
   * spread slope moves smoothly, so a cell whose enthalpy may lie on either side keeps the
   * measurements' hold on it, and the covariance does not collapse when the mean crosses an
   * edge. Far from the band it equals the point slope. Null: linearise at the mean.
   *
   * @param sdK σ of each cell's enthalpy state, K of sensible heat (copied)
   */
  public void cellSpread(double[] sdK) {
    cellSdK = sdK == null ? null : sdK.clone();
  }

  /** dT/de of cell j over its spread ({@link CellSpread#slopes}); dφ/de into {@code melt[j]} if given. */
  private double spreadSlopes(int j, double meanK, double[] melt) {
    double sl = CellSpread.slopes(model.plate(), capacity, meanK, cellSdK[j], meltOne);
    if (melt != null) {
      melt[j] = meltOne[0];
    }
    return sl;
  }

  private final double[] meltOne = new double[1];

  /** Step length the filter uses, s (for the age of the held Jacobian). */
  public void stepLengthS(double h) {
    this.lastStepS = h;
  }

  /** Forces a rebuild on the next call. */
  public void invalidate() {
    version = version < 0 ? -1 : version;
    sinceRefreshS = Double.POSITIVE_INFINITY;
  }

  private boolean stale(double[] u, double[] x) {
    if (version < 0 || sinceRefreshS >= refreshS) {
      return true;
    }
    for (int j = 0; j < cells; j++) {
      double t = base.plateTempK(j);
      if (Math.abs(t - refTempK[j]) > refreshK) {
        return true;
      }
      double phi = base.meltFraction(j);
      if ((phi > 0.0 && phi < 1.0) != refInBand[j]) {
        return true;
      }
    }
    if (cellSdK != null) {
      for (int j = 0; j < cells; j++) {
        double sl = spreadSlopes(j, x[j], null);
        double ref = refSlope[j];
        if (Math.abs(sl - ref) > SLOPE_TOLERANCE / capacity) {
          return true;
        }
      }
    }
    correctInto(x, u, uEff);
    for (int i = 0; i < 8; i++) {
      boolean temp = StateLayout.temperatureInput(i);
      double d = Math.abs(uEff[i] - refU[i]);
      if (temp ? d > 5.0 : d > 0.02 * Math.abs(refU[i])) {
        return true;
      }
    }
    ModelParameters p = parameters(x);
    double[] pv = {p.reformingActivity(), p.combustionActivity(), p.heatLossCoefficientWPerM2K(), p.heatTransferMultiplier()};
    for (int i = 0; i < 4; i++) {
      if (Math.abs(pv[i] - refP[i]) > 0.02 * Math.abs(refP[i])) {
        return true;
      }
    }
    return false;
  }

  /** Rebuilds the held Jacobian at (x, u); {@code base} must hold the model at (x, u). */
  private void rebuild(double[] x, double[] u) {
    double[] uc = correctedInputs(x, u);
    OperatingPoint op = operatingPoint(uc);
    ModelParameters p = parameters(x);
    for (int j = 0; j < cells; j++) {
      e[j] = x[j] * capacity;
    }
    if (cellSdK != null) {
      for (int j = 0; j < cells; j++) {
        refSlope[j] = spreadSlopes(j, x[j], meltSlope);
        plateSlope[j] = refSlope[j];
      }
      model.jacobian(e, op, p, base, dfde, dhde, plateSlope, meltSlope);
    } else {
      model.jacobian(e, op, p, base, dfde, dhde);
    }
    for (double[] row : held) {
      Arrays.fill(row, 0.0);
    }
    for (double[] row : heldOutputs) {
      Arrays.fill(row, 0.0);
    }
    // d(e_k/C)/dt / d(e_j/C) = de_k/dt / de_j; dy/dx_j = dy/de_j C
    for (int k = 0; k < cells; k++) {
      System.arraycopy(dfde[k], 0, held[k], 0, cells);
    }
    for (int m = 0; m < ModelOutputs.COUNT; m++) {
      for (int j = 0; j < cells; j++) {
        heldOutputs[m][j] = dhde[m][j] * capacity;
      }
    }
    // parameter columns by one-sided differences (one evaluation each)
    int[] pIdx = {layout.reformingActivity(), layout.combustionActivity(), layout.heatLoss(), layout.heatTransfer()};
    for (int q = 0; q < 4; q++) {
      double v = x[pIdx[q]];
      double step = 1e-4 * Math.max(Math.abs(v), 1e-2);
      ModelParameters pp = switch (q) {
        case 0 -> p.withReformingActivity(v + step);
        case 1 -> p.withCombustionActivity(v + step);
        case 2 -> p.withHeatLoss(v + step);
        default -> p.withHeatTransferMultiplier(v + step);
      };
      model.evaluate(e, op, pp, scratch);
      for (int k = 0; k < cells; k++) {
        held[k][pIdx[q]] = (scratch.enthalpyRateWPerM2(k) - base.enthalpyRateWPerM2(k)) / capacity / step;
      }
      for (int m = 0; m < ModelOutputs.COUNT; m++) {
        heldOutputs[m][pIdx[q]] = (scratch.output(m) - base.output(m)) / step;
      }
    }
    // input-error columns: one evaluation each with the corrected input moved
    for (int q = 0; q < StateLayout.INPUT_ERRORS; q++) {
      int i = StateLayout.ERROR_INPUTS[q];
      int col = layout.inputError(q);
      boolean temp = StateLayout.temperatureInput(i);
      double step = temp ? 0.1 : 1e-3; // K, or relative
      double[] up = uc.clone();
      up[i] = temp ? uc[i] + step : uc[i] + step * u[i];
      model.evaluate(e, operatingPoint(up), p, scratch);
      for (int k = 0; k < cells; k++) {
        held[k][col] = (scratch.enthalpyRateWPerM2(k) - base.enthalpyRateWPerM2(k)) / capacity / step;
      }
      for (int m = 0; m < ModelOutputs.COUNT; m++) {
        heldOutputs[m][col] = (scratch.output(m) - base.output(m)) / step;
      }
      held[col][col] = -1.0 / inputErrorTimeS;
    }
    // lags: dl/dt = (y(x) - l) / tau
    for (int k = 0; k < StateLayout.LAGS; k++) {
      int l = layout.lag(k);
      double[] dy = heldOutputs[LAG_OUTPUT[k]];
      for (int j = 0; j < n; j++) {
        held[l][j] = dy[j] / lagS[k];
      }
      held[l][l] = -1.0 / lagS[k];
    }
    for (int j = 0; j < cells; j++) {
      refTempK[j] = base.plateTempK(j);
      double phi = base.meltFraction(j);
      refInBand[j] = phi > 0.0 && phi < 1.0;
    }
    System.arraycopy(uc, 0, refU, 0, 8);
    refP[0] = p.reformingActivity();
    refP[1] = p.combustionActivity();
    refP[2] = p.heatLossCoefficientWPerM2K();
    refP[3] = p.heatTransferMultiplier();
    sinceRefreshS = 0.0;
    version = ++builds;
  }

  private void copyHeld(double[][] dfdx) {
    for (int i = 0; i < n; i++) {
      System.arraycopy(held[i], 0, dfdx[i], 0, n);
    }
  }

  @Override
  public long jacobianVersion() {
    return version;
  }

  /** Number of Jacobian builds so far. */
  public long builds() {
    return builds;
  }

  /**
   * The held Jacobian of model output {@code index} (SI units per state unit), length n. Valid
   * after the first propagation.
   */
  public double[] outputJacobian(int index) {
    return heldOutputs[index].clone();
  }

  /** The held Jacobian of f (n×n, not a copy: read only). */
  double[][] heldJacobian() {
    return held;
  }

  /**
   * dT/de per cell the held Jacobian's cell columns were built with (K per J/m2): the spread
   * slopes, or null when they were taken at the mean.
   */
  double[] heldPlateSlopes() {
    return cellSdK == null ? null : refSlope.clone();
  }

  double[][] heldOutputs() {
    return heldOutputs;
  }

  /** Scratch evaluation at the last point f was evaluated. */
  ModelEvaluation lastEvaluation() {
    return base;
  }

  /** The input Jacobian ∂f/∂u_i of the cell rows at (x, u), by one evaluation per input. */
  public double[][] inputJacobian(double[] x, double[] u, int[] inputs) {
    double[][] b = new double[inputs.length][n];
    evaluateModel(x, u, base);
    double[] f0 = new double[n];
    fillDerivative(x, base, f0);
    double[] uu = u.clone();
    double[] f1 = new double[n];
    for (int q = 0; q < inputs.length; q++) {
      int i = inputs[q];
      double step = StateLayout.temperatureInput(i) ? 0.1 : 1e-3 * Math.abs(u[i]);
      uu[i] = u[i] + step;
      evaluateModel(x, uu, scratch);
      fillDerivative(x, scratch, f1);
      for (int k = 0; k < n; k++) {
        b[q][k] = (f1[k] - f0[k]) / step;
      }
      uu[i] = u[i];
    }
    return b;
  }
}
