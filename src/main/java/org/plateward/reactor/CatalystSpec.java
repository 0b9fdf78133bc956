package org.plateward.reactor;

/**
 * The two washcoats. Nominal activity multipliers are 1; the estimator tracks their drift.
 *
 * @param reformingLoadingKgPerM2 mass of nickel reforming catalyst per coated face area, kg/m2
 * @param reformingActivity activity multiplier on the Xu-Froment rate constants (includes the
 *     washcoat effectiveness), dimensionless
 * @param combustionActivity active-surface multiplier on the first-order combustion rate
 *     constant per coated face area, dimensionless
 */
public record CatalystSpec(
    double reformingLoadingKgPerM2, double reformingActivity, double combustionActivity) {}
