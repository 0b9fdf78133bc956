package org.plateward.reactor;

import org.plateward.thermo.Species;

/**
 * The reduced-order counter-current plate reactor: dx/dt = f(x, u, p), y = h(x, u, p).
 *
 * <p>State x: areal enthalpy e_j of one plate in each of N cells, J/m2 ({@link PlateEnthalpy}).
 * Inputs u: the {@link OperatingPoint}. Parameters p: {@link ModelParameters}. Given the
 * plate temperatures, both gases are quasi-steady and are marched in their own flow
 * directions (reforming +z from z = 0, combustion -z from z = L). The plate balance per cell:
 *
 * <pre>
 *   de_j/dt = (Q_ref,j + Q_comb,j) / (2 W dz_j)                       surface reaction minus convection
 *           + [G_{j-1/2}(T_{j-1} - T_j) + G_{j+1/2}(T_{j+1} - T_j)] / dz_j   axial conduction
 *           - U (T_j - T_amb)                                           heat loss
 * </pre>
 *
 * per plate (each channel pair holds two plates, each with one reforming and one combustion
 * face); G is the series conductance of the two half cells (steel and buffer in parallel);
 * the plate ends are adiabatic. Gas-wall heat transfer uses fully developed laminar flow
 * between parallel plates, h = Nu k / D_h with D_h = 2 gap and Nu = 7.54 (uniform wall
 * temperature, Shah and London 1978); mass transfer to the combustion washcoat uses the same
 * number as Sherwood number (heat and mass transfer analogy), so the heat-transfer multiplier
 * of {@link ModelParameters} scales both.
 *
 * <p>Not thread-safe: it keeps per-cell caches. Use one instance per thread.
 */
public final class PlateReactorModel {
  /** Nusselt number for fully developed laminar flow between parallel plates, uniform wall temperature (Shah and London 1978). */
  public static final double NUSSELT_UNIFORM_WALL_TEMP = 7.541;

  /**
   * Numerical and transport options.
   *
   * @param nusselt Nusselt (and Sherwood) number of both channels
   * @param multiplierOnMassTransfer whether the heat-transfer multiplier of {@link
   *     ModelParameters} also scales the Sherwood number of the combustion washcoat. By the heat
   *     and mass transfer analogy a plant whose Nusselt number differs from the model's differs
   *     in its Sherwood number by the same factor, so a multiplier that stands for that ratio
   *     scales both. On by default (the estimator and calibration both use it); off only to
   *     compare with the heat-transfer-only variant.
   */
  public record Options(double nusselt, boolean multiplierOnMassTransfer) {
    public static final Options DEFAULT = new Options(NUSSELT_UNIFORM_WALL_TEMP);

    /** The multiplier on heat and mass transfer (the analogy). */
    public Options(double nusselt) {
      this(nusselt, true);
    }

    /** This Nusselt number with the multiplier on heat transfer only. */
    public Options withMultiplierOnHeatTransferOnly() {
      return new Options(nusselt, false);
    }

    /** This Nusselt number with the multiplier on heat and mass transfer. */
    public Options withMultiplierOnMassTransfer() {
      return new Options(nusselt, true);
    }
  }

  private static final int NS = Species.COUNT;
  private static final double AIR_O2 = 0.2095;

  private final UnitSpec spec;
  private final Grid grid;
  private final PlateEnthalpy plate;
  private final ReformingChannel reforming;
  private final CombustionChannel combustion;
  private final int n;
  private final double[] cellAreaPerPairM2;
  private final double[] dz;
  private final double widthM;
  private final double ambientK;

  public PlateReactorModel(UnitSpec spec) {
    this(spec, Grid.forUnit(spec.geometry(), spec.grid()), Options.DEFAULT);
  }

  public PlateReactorModel(UnitSpec spec, Grid grid, Options options) {
    this.spec = spec;
    this.grid = grid;
    this.n = grid.cells();
    if (n < 3) {
      throw new IllegalArgumentException("the model needs at least 3 cells, got " + n);
    }
    Geometry g = spec.geometry();
    this.plate = new PlateEnthalpy(g, spec.plate(), spec.buffer());
    this.reforming = new ReformingChannel(
        g, grid, spec.catalyst().reformingLoadingKgPerM2(), options.nusselt());
    this.combustion = new CombustionChannel(g, grid, options.nusselt(), options.multiplierOnMassTransfer());
    this.widthM = g.widthM();
    this.ambientK = spec.heatLoss().ambientK();
    this.dz = new double[n];
    this.cellAreaPerPairM2 = new double[n];
    for (int j = 0; j < n; j++) {
      dz[j] = grid.widthM(j);
      cellAreaPerPairM2[j] = 2.0 * widthM * dz[j];
    }
  }

  public UnitSpec spec() {
    return spec;
  }

  public Grid grid() {
    return grid;
  }

  public PlateEnthalpy plate() {
    return plate;
  }

  /** Number of states N. */
  public int cells() {
    return n;
  }

  /** A fresh workspace sized for this model. */
  public ModelEvaluation newEvaluation() {
    return new ModelEvaluation(n);
  }

  /** Fills {@code e} with the enthalpy of a plate at uniform temperature {@code tempK}. */
  public void uniformState(double tempK, double[] e) {
    java.util.Arrays.fill(e, plate.enthalpyJPerM2(tempK));
  }

  /** Evaluates f and h at (e, u, p) into {@code out}. */
  public void evaluate(double[] e, OperatingPoint u, ModelParameters p, ModelEvaluation out) {
    for (int j = 0; j < n; j++) {
      out.plateK[j] = plate.tempK(e[j]);
      out.melt[j] = plate.meltFraction(e[j]);
    }
    setInlets(u, out.reforming, out.combustion);
    reforming.march(out.plateK, p.reformingActivity(), p.heatTransferMultiplier(),
        u.reformingPressurePa(), 0, -1, out.reforming);
    combustion.march(out.plateK, p.combustionActivity(), p.heatTransferMultiplier(),
        u.combustionPressurePa(), n - 1, -1, out.combustion);
    double loss = p.heatLossCoefficientWPerM2K();
    for (int j = 0; j < n; j++) {
      out.local[j] = localRate(j, out.plateK, out.melt, loss);
      out.dedt[j] = (out.reforming.heatToPlateW[j] + out.combustion.heatToPlateW[j]) / cellAreaPerPairM2[j]
          + out.local[j];
    }
    fillOutputs(out.reforming, out.combustion, out.plateK, out.outputs);
  }

  /**
   * The Jacobians df/de (N x N) and dh/de (9 x N) by one-sided finite differences, exploiting
   * the march structure: a change of cell j's plate alters the reforming gas only downstream
   * of j and the combustion gas only from j on towards z = 0, so each column re-marches
   * N + 1 cells from stored face states and reuses every other cell's cached rate constants.
   * {@code base} must hold {@link #evaluate} at the same (e, u, p).
   *
   * @param dfde receives df/de, 1/s
   * @param dhde receives dh/de (may be null), output unit per J/m2
   */
  public void jacobian(
      double[] e, OperatingPoint u, ModelParameters p, ModelEvaluation base, double[][] dfde,
      double[][] dhde) {
    jacobian(e, u, p, base, dfde, dhde, null, null);
  }

  /**
   * As {@link #jacobian(double[], OperatingPoint, ModelParameters, ModelEvaluation, double[][],
   * double[][])}, with the plate temperature and melt fraction of cell j moved along given
   * slopes dT/de and dφ/de instead of through the map T(e), φ(e) at the point (a statistical
   * linearisation of the map over a spread of enthalpy, Gelb 1974, where the point slope jumps
   * at the melting band's edges). A NaN slope, or null arrays, use the map at the point.
   *
   * @param plateSlopeKPerJ dT/de per cell, K per J/m2 (null: the map)
   * @param meltSlopePerJ dφ/de per cell, per J/m2 (null: the map)
   */
  public void jacobian(
      double[] e, OperatingPoint u, ModelParameters p, ModelEvaluation base, double[][] dfde,
      double[][] dhde, double[] plateSlopeKPerJ, double[] meltSlopePerJ) {
    double loss = p.heatLossCoefficientWPerM2K();
    double[] tK = base.plateScratch;
    double[] phi = base.meltScratch;
    System.arraycopy(base.plateK, 0, tK, 0, n);
    System.arraycopy(base.melt, 0, phi, 0, n);
    ChannelState rs = base.reformingScratch;
    ChannelState cs = base.combustionScratch;
    double[] y = new double[ModelOutputs.COUNT];
    for (int j = 0; j < n; j++) {
      double step = 1e-3 * plate.sensibleJPerM2K(); // one millikelvin of sensible heat
      double ej = e[j] + step;
      if (plateSlopeKPerJ != null && Double.isFinite(plateSlopeKPerJ[j])) {
        tK[j] = base.plateK[j] + plateSlopeKPerJ[j] * step;
        phi[j] = base.melt[j] + meltSlopePerJ[j] * step;
      } else {
        tK[j] = plate.tempK(ej);
        phi[j] = plate.meltFraction(ej);
      }
      rs.copyFace(base.reforming, j);
      reforming.march(tK, p.reformingActivity(), p.heatTransferMultiplier(), u.reformingPressurePa(), j, j, rs);
      cs.copyFace(base.combustion, j + 1);
      combustion.march(tK, p.combustionActivity(), p.heatTransferMultiplier(), u.combustionPressurePa(), j, j, cs);
      for (int k = 0; k < n; k++) {
        double qr = k >= j ? rs.heatToPlateW[k] : base.reforming.heatToPlateW[k];
        double qc = k <= j ? cs.heatToPlateW[k] : base.combustion.heatToPlateW[k];
        double local = (k >= j - 1 && k <= j + 1) ? localRate(k, tK, phi, loss) : base.local[k];
        double f = (qr + qc) / cellAreaPerPairM2[k] + local;
        dfde[k][j] = (f - base.dedt[k]) / step;
      }
      if (dhde != null) {
        fillOutputs(rs, cs, tK, y); // reforming outlet at face N of rs, combustion outlet at face 0 of cs
        for (int m = 0; m < ModelOutputs.COUNT; m++) {
          dhde[m][j] = (y[m] - base.outputs[m]) / step;
        }
      }
      tK[j] = base.plateK[j];
      phi[j] = base.melt[j];
    }
  }

  private double localRate(int j, double[] tK, double[] phi, double lossWPerM2K) {
    double cond = 0.0;
    if (j > 0) {
      cond += interfaceConductance(j - 1, j, phi) * (tK[j - 1] - tK[j]);
    }
    if (j < n - 1) {
      cond += interfaceConductance(j, j + 1, phi) * (tK[j + 1] - tK[j]);
    }
    return cond / dz[j] - lossWPerM2K * (tK[j] - ambientK);
  }

  /** Series conductance between the centres of cells a and a + 1, W/(m2 K) times m. */
  private double interfaceConductance(int a, int b, double[] phi) {
    double ra = 0.5 * dz[a] / plate.axialConductanceWPerK(phi[a]);
    double rb = 0.5 * dz[b] / plate.axialConductanceWPerK(phi[b]);
    return 1.0 / (ra + rb);
  }

  /** Inlet flows per channel from the unit totals. */
  void setInlets(OperatingPoint u, ChannelState ref, ChannelState comb) {
    int pairs = spec.geometry().channelPairs();
    FeedGas fg = spec.feedGas();
    double gas = u.reformingGasFlowMolPerS() / pairs;
    double[] f = ref.flows;
    java.util.Arrays.fill(f, 0, NS, 0.0);
    f[Species.CH4.ordinal()] = gas * fg.methane();
    f[Species.H2.ordinal()] = gas * fg.hydrogen();
    f[Species.CO2.ordinal()] = gas * fg.carbonDioxide();
    f[Species.N2.ordinal()] = gas * fg.nitrogen();
    f[Species.H2O.ordinal()] = u.steamFlowMolPerS() / pairs;
    ref.tempK[0] = u.reformingInletTempK();
    int in = n * NS;
    double[] c = comb.flows;
    java.util.Arrays.fill(c, in, in + NS, 0.0);
    double air = u.airFlowMolPerS() / pairs;
    c[in + Species.CH4.ordinal()] = u.fuelFlowMolPerS() / pairs;
    c[in + Species.O2.ordinal()] = air * AIR_O2;
    c[in + Species.N2.ordinal()] = air * (1.0 - AIR_O2);
    comb.tempK[n] = u.combustionInletTempK();
  }

  private void fillOutputs(ChannelState ref, ChannelState comb, double[] tK, double[] y) {
    int o = n * NS;
    double[] f = ref.flows;
    double dry = GasFlux.total(f, o) - f[o + Species.H2O.ordinal()];
    y[ModelOutputs.REF_OUTLET_TEMP_K] = ref.tempK[n];
    y[ModelOutputs.REF_DRY_CH4] = f[o + Species.CH4.ordinal()] / dry;
    y[ModelOutputs.REF_DRY_CO] = f[o + Species.CO.ordinal()] / dry;
    y[ModelOutputs.REF_DRY_CO2] = f[o + Species.CO2.ordinal()] / dry;
    y[ModelOutputs.REF_DRY_H2] = f[o + Species.H2.ordinal()] / dry;
    double[] c = comb.flows;
    double cdry = GasFlux.total(c, 0) - c[Species.H2O.ordinal()];
    y[ModelOutputs.COMB_OUTLET_TEMP_K] = comb.tempK[0];
    y[ModelOutputs.COMB_DRY_O2] = c[Species.O2.ordinal()] / cdry;
    y[ModelOutputs.PLATE_END_INLET_K] = tK[0];
    y[ModelOutputs.PLATE_END_OUTLET_K] = tK[n - 1];
  }
}
