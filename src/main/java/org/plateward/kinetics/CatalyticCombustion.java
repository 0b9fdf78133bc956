package org.plateward.kinetics;

import org.plateward.thermo.Species;

/**
 * Catalytic methane combustion on platinum, first order in methane:
 * r = k_s(T) · C_CH4 per unit active surface, in mol/(m² s) with C_CH4 in mol/m³.
 *
 * <p>k_s is the collision-limited adsorption rate of methane on a bare platinum surface,
 * k_s = s0 √(R T / (2π M_CH4)), with the initial sticking coefficient s0 = 0.01 of the Pt
 * CH4/O2 surface mechanism of Deutschmann, Schmidt, Behrendt &amp; Warnatz (1996), Proc.
 * Combust. Inst. 26, 1747–1754. This reduction assumes a mostly bare surface (lean, hot; site
 * coverage θ_Pt ≈ 1) and no Motz–Wise correction. There is no activation energy: the rate
 * grows as √T, and in a plate channel it is usually limited by external mass transfer, which
 * {@link #effectiveRateConstantMPerS} combines in series.
 *
 * <p><b>Activity multipliers are not applied here</b>; the caller multiplies k_s by its
 * per-catalyst activity (and by the active-to-geometric area ratio) before combining it with
 * mass transfer.
 */
public final class CatalyticCombustion {

  /** Initial sticking coefficient of CH4 on Pt (Deutschmann et al. 1996). */
  public static final double STICKING_COEFFICIENT = 0.01;

  /** Molar gas constant, J/(mol K) (CODATA 2018). */
  private static final double R = 8.314462618;

  /** s0 √(R / (2π M)), so k_s = COEF √T. */
  private static final double COEF =
      STICKING_COEFFICIENT * Math.sqrt(R / (2.0 * Math.PI * Species.CH4.molarMassKgPerMol()));

  private CatalyticCombustion() {}

  /**
   * Surface rate constant k_s = s0 √(R T / (2π M_CH4)).
   *
   * @param tempK surface temperature, K
   * @return k_s, m/s (rate per unit active area per unit gas concentration)
   */
  public static double surfaceRateConstantMPerS(double tempK) {
    if (!(tempK > 0.0)) {
      throw new IllegalArgumentException("temperature must be > 0 K, got " + tempK);
    }
    return COEF * Math.sqrt(tempK);
  }

  /**
   * Series combination of surface reaction and external mass transfer,
   * k_eff = 1/(1/k_s + 1/k_m) = k_s k_m / (k_s + k_m). Zero if either is zero.
   *
   * @param surfaceMPerS surface rate constant k_s, m/s (≥ 0)
   * @param massTransferMPerS mass-transfer coefficient k_m, m/s (≥ 0)
   * @return k_eff, m/s
   */
  public static double effectiveRateConstantMPerS(double surfaceMPerS, double massTransferMPerS) {
    double sum = surfaceMPerS + massTransferMPerS;
    return sum > 0.0 ? surfaceMPerS * massTransferMPerS / sum : 0.0;
  }
}
