package org.plateward.reactor;

/**
 * The slowly drifting parameters the estimator tracks as augmented states, and calibration
 * fits.
 *
 * @param reformingActivity multiplier on the Xu-Froment rate constants, dimensionless
 * @param combustionActivity multiplier on the combustion surface rate constant, dimensionless
 * @param heatLossCoefficientWPerM2K heat loss per plate plan area, W/(m2 K)
 * @param heatTransferMultiplier multiplier on the Nusselt number, so on the gas-wall heat-transfer
 *     coefficients and (Sh = Nu) on the mass transfer to the combustion washcoat
 */
public record ModelParameters(
    double reformingActivity,
    double combustionActivity,
    double heatLossCoefficientWPerM2K,
    double heatTransferMultiplier) {

  /** The nominal values of the configured unit. */
  public static ModelParameters nominal(UnitSpec spec) {
    return new ModelParameters(
        spec.catalyst().reformingActivity(),
        spec.catalyst().combustionActivity(),
        spec.heatLoss().coefficientWPerM2K(),
        1.0);
  }

  public ModelParameters withReformingActivity(double a) {
    return new ModelParameters(a, combustionActivity, heatLossCoefficientWPerM2K, heatTransferMultiplier);
  }

  public ModelParameters withCombustionActivity(double a) {
    return new ModelParameters(reformingActivity, a, heatLossCoefficientWPerM2K, heatTransferMultiplier);
  }

  public ModelParameters withHeatLoss(double u) {
    return new ModelParameters(reformingActivity, combustionActivity, u, heatTransferMultiplier);
  }

  public ModelParameters withHeatTransferMultiplier(double m) {
    return new ModelParameters(reformingActivity, combustionActivity, heatLossCoefficientWPerM2K, m);
  }
}
