package org.plateward.plant;

/**
 * How the simulated plant differs from the configured unit the estimator believes in.
 *
 * @param cells cells of the fine truth grid (uniform), at least 200 for a recording
 * @param nusselt Nusselt (and Sherwood) number of the truth channels; the model uses
 *     {@link org.plateward.reactor.PlateReactorModel#NUSSELT_UNIFORM_WALL_TEMP} = 7.541 (uniform
 *     wall temperature), the plant a value between that and 8.235 (uniform heat flux, Shah and
 *     London 1978), because the real wall boundary condition lies between the two
 * @param heatLossWPerM2K true heat-loss coefficient per plate plan area, W/(m2 K)
 * @param reformingDeactivationTimeS e-folding time of the slow background decline of reforming
 *     activity, s (infinite for none)
 * @param substeps integrator steps per sample period (at least 1)
 */
public record TruthSettings(
    int cells,
    double nusselt,
    double heatLossWPerM2K,
    double reformingDeactivationTimeS,
    int substeps) {
  /** Default truth grid. */
  public static final int DEFAULT_CELLS = 200;
  /**
   * Default plant Nusselt number: 7.9, about 5 % above the model's 7.541 and below the
   * uniform-heat-flux value 8.235 (Shah and London 1978, parallel plates).
   */
  public static final double DEFAULT_NUSSELT = 7.9;
  /** Default true heat-loss coefficient, W/(m2 K): 6 % above the demo unit's configured 5. */
  public static final double DEFAULT_HEAT_LOSS_W_PER_M2K = 5.3;
  /** Default background deactivation: e-folding in 4000 h (a few per mille over a day). */
  public static final double DEFAULT_DEACTIVATION_TIME_S = 4000.0 * 3600.0;

  public TruthSettings {
    if (cells < 3) {
      throw new IllegalArgumentException("the truth grid needs at least 3 cells, got " + cells);
    }
    if (!(nusselt > 0.0) || !(heatLossWPerM2K >= 0.0) || !(reformingDeactivationTimeS > 0.0)) {
      throw new IllegalArgumentException("truth settings out of range");
    }
    if (substeps < 1) {
      throw new IllegalArgumentException("substeps must be at least 1, got " + substeps);
    }
  }

  /** The defaults above with one integrator step per sample. */
  public static TruthSettings defaults() {
    return new TruthSettings(
        DEFAULT_CELLS, DEFAULT_NUSSELT, DEFAULT_HEAT_LOSS_W_PER_M2K, DEFAULT_DEACTIVATION_TIME_S, 1);
  }

  public TruthSettings withCells(int n) {
    return new TruthSettings(n, nusselt, heatLossWPerM2K, reformingDeactivationTimeS, substeps);
  }

  public TruthSettings withSubsteps(int s) {
    return new TruthSettings(cells, nusselt, heatLossWPerM2K, reformingDeactivationTimeS, s);
  }
}
