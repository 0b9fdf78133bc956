package org.plateward.kinetics;

import org.plateward.thermo.IdealGasThermo;
import org.plateward.thermo.Reaction;
import org.plateward.thermo.Species;

/**
 * Intrinsic steam-reforming and water-gas-shift kinetics on Ni/MgAl2O4 of Xu &amp; Froment
 * (1989), "Methane steam reforming, methanation and water-gas shift: I. Intrinsic kinetics",
 * AIChE J. 35(1), 88–96, doi:10.1002/aic.690350109.
 *
 * <pre>
 *   r1 = k1/pH2^2.5 (pCH4 pH2O − pH2^3 pCO / K1) / DEN²          CH4 + H2O  ⇌ CO + 3 H2
 *   r2 = k2/pH2     (pCO pH2O  − pH2 pCO2 / K2)  / DEN²          CO + H2O   ⇌ CO2 + H2
 *   r3 = k3/pH2^3.5 (pCH4 pH2O² − pH2^4 pCO2 / (K1 K2)) / DEN²   CH4 + 2H2O ⇌ CO2 + 4 H2
 *   DEN = 1 + K_CO pCO + K_H2 pH2 + K_CH4 pCH4 + K_H2O pH2O / pH2
 * </pre>
 *
 * Partial pressures in bar. Rate and adsorption constants are the paper's Table 6,
 * k = A exp(−E/RT), K = A exp(−ΔH/RT), with R = 8.314 J/(mol K) as in the fit; the rate
 * constants are converted from kmol/(kg_cat h) to mol/(kg_cat s) (factor 1/3.6). The
 * equilibrium constants K1 (bar²) and K2 (−) are exp(−ΔG°/RT) from {@link IdealGasThermo}, the
 * same values as {@link Reaction#equilibriumConstant} (NIST-JANAF thermochemistry), not a
 * fitted correlation, so the rates vanish exactly at
 * the thermodynamic equilibrium of the same thermo the reactor energy balance uses.
 *
 * <p>Table 6 is for the paper's reference (partly aged) catalyst; fresh catalyst was 2.246×
 * more active. <b>Activity multipliers are not applied here</b>: the caller multiplies r1–r3
 * (or k1–k3) by its own per-catalyst activity.
 *
 * <p>Hydrogen floor: {@link #rates} uses max(pH2, {@value #PH2_FLOOR_BAR} bar) everywhere in
 * the expressions, so the 1/pH2^2.5 and 1/pH2^3.5 terms stay finite at a hydrogen-free inlet
 * (rates there are then very large but finite, as the model predicts physically). Other
 * partial pressures are used as given.
 *
 * <p>The paper's validity range: 773–848 K for the reforming runs, 573–673 K for methanation
 * and reverse shift, 3–15 bar.
 */
public final class XuFromentKinetics {

  /** Number of temperature-dependent constants filled by {@link #constants}. */
  public static final int CONSTANTS = 9;

  /** Index of k1, mol bar^0.5 / (kg_cat s). */
  public static final int K1_RATE = 0;
  /** Index of k2, mol / (kg_cat s bar). */
  public static final int K2_RATE = 1;
  /** Index of k3, mol bar^0.5 / (kg_cat s). */
  public static final int K3_RATE = 2;
  /** Index of K_CO, 1/bar. */
  public static final int K_CO = 3;
  /** Index of K_H2, 1/bar. */
  public static final int K_H2 = 4;
  /** Index of K_CH4, 1/bar. */
  public static final int K_CH4 = 5;
  /** Index of K_H2O, dimensionless. */
  public static final int K_H2O = 6;
  /** Index of the steam-reforming equilibrium constant K1, bar². */
  public static final int K1_EQ = 7;
  /** Index of the water-gas-shift equilibrium constant K2, dimensionless. */
  public static final int K2_EQ = 8;

  /** Lower bound applied to pH2 in {@link #rates}, bar. */
  public static final double PH2_FLOOR_BAR = 1e-6;

  /** Gas constant used in the Xu–Froment fits, J/(mol K). */
  static final double R_FIT = 8.314;

  /** kmol/(kg h) → mol/(kg s). */
  private static final double PER_HOUR_KMOL_TO_MOL_PER_S = 1000.0 / 3600.0;

  // Xu & Froment (1989) Table 6: pre-exponential factors and energies (J/mol).
  static final double A_K1 = 4.225e15; // kmol bar^0.5 / (kg h)
  static final double E_K1 = 240.1e3;
  static final double A_K2 = 1.955e6; // kmol / (kg h bar)
  static final double E_K2 = 67.13e3;
  static final double A_K3 = 1.020e15; // kmol bar^0.5 / (kg h)
  static final double E_K3 = 243.9e3;
  static final double A_KCO = 8.23e-5; // 1/bar
  static final double DH_KCO = -70.65e3;
  static final double A_KH2 = 6.12e-9; // 1/bar
  static final double DH_KH2 = -82.90e3;
  static final double A_KCH4 = 6.65e-4; // 1/bar
  static final double DH_KCH4 = -38.28e3;
  static final double A_KH2O = 1.77e5; // dimensionless
  static final double DH_KH2O = 88.68e3;

  // Pre-converted to mol/(kg s): k = A' exp(−E/(R T)).
  private static final double A_K1_SI = A_K1 * PER_HOUR_KMOL_TO_MOL_PER_S;
  private static final double A_K2_SI = A_K2 * PER_HOUR_KMOL_TO_MOL_PER_S;
  private static final double A_K3_SI = A_K3 * PER_HOUR_KMOL_TO_MOL_PER_S;

  private static final int CH4 = Species.CH4.ordinal();
  private static final int H2O = Species.H2O.ordinal();
  private static final int CO = Species.CO.ordinal();
  private static final int CO2 = Species.CO2.ordinal();
  private static final int H2 = Species.H2.ordinal();

  private XuFromentKinetics() {}

  /**
   * Fills the temperature-dependent constants: out[0..2] = k1, k2, k3 (mol, kg_cat, s, bar
   * units as in the index constants), out[3..6] = K_CO, K_H2, K_CH4 (1/bar), K_H2O (−),
   * out[7] = K1 (bar²), out[8] = K2 (−). K3 = K1·K2 is not stored.
   *
   * @param tempK catalyst temperature, K
   * @param out receives the constants; length ≥ {@link #CONSTANTS}
   */
  public static void constants(double tempK, double[] out) {
    if (out.length < CONSTANTS) {
      throw new IllegalArgumentException("constants array needs " + CONSTANTS + " slots");
    }
    // Equilibrium first, using out[0..6] as scratch for the species Gibbs energies:
    // ln K = -ΔG°/(R T), ΔG°_I = g_CO + 3 g_H2 - g_CH4 - g_H2O,
    // ΔG°_II = g_CO2 + g_H2 - g_CO - g_H2O
    // (the same sums as Reaction.STEAM_REFORMING / WATER_GAS_SHIFT, shared logarithm).
    IdealGasThermo.gibbsEnergiesJPerMol(tempK, out);
    double gCh4 = out[CH4];
    double gH2o = out[H2O];
    double gCo = out[CO];
    double gCo2 = out[CO2];
    double gH2 = out[H2];
    double invRtThermo = 1.0 / (IdealGasThermo.R_J_PER_MOL_K * tempK);
    out[K1_EQ] = Math.exp(-(gCo + 3.0 * gH2 - gCh4 - gH2o) * invRtThermo);
    out[K2_EQ] = Math.exp(-(gCo2 + gH2 - gCo - gH2o) * invRtThermo);
    double invRt = 1.0 / (R_FIT * tempK);
    out[K1_RATE] = A_K1_SI * Math.exp(-E_K1 * invRt);
    out[K2_RATE] = A_K2_SI * Math.exp(-E_K2 * invRt);
    out[K3_RATE] = A_K3_SI * Math.exp(-E_K3 * invRt);
    out[K_CO] = A_KCO * Math.exp(-DH_KCO * invRt);
    out[K_H2] = A_KH2 * Math.exp(-DH_KH2 * invRt);
    out[K_CH4] = A_KCH4 * Math.exp(-DH_KCH4 * invRt);
    out[K_H2O] = A_KH2O * Math.exp(-DH_KH2O * invRt);
  }

  /**
   * Rates of reactions I, II and III per kilogram of catalyst at reference activity.
   *
   * @param constants the array filled by {@link #constants} at the catalyst temperature
   * @param pCH4Bar methane partial pressure, bar
   * @param pH2OBar steam partial pressure, bar
   * @param pCOBar carbon monoxide partial pressure, bar
   * @param pCO2Bar carbon dioxide partial pressure, bar
   * @param pH2Bar hydrogen partial pressure, bar (floored at {@value #PH2_FLOOR_BAR})
   * @param outMolPerKgS receives r1, r2, r3 in mol/(kg_cat s); length ≥ 3. Species rates:
   *     CH4 consumed r1 + r3, CO formed r1 − r2, CO2 formed r2 + r3, H2 formed 3r1 + r2 + 4r3,
   *     H2O consumed r1 + r2 + 2r3
   */
  public static void rates(
      double[] constants,
      double pCH4Bar,
      double pH2OBar,
      double pCOBar,
      double pCO2Bar,
      double pH2Bar,
      double[] outMolPerKgS) {
    double pH2 = pH2Bar > PH2_FLOOR_BAR ? pH2Bar : PH2_FLOOR_BAR;
    double invH2 = 1.0 / pH2;
    double pH2sq = pH2 * pH2;
    double invH2pow25 = invH2 * invH2 / Math.sqrt(pH2); // pH2^-2.5
    double k1Eq = constants[K1_EQ];
    double k2Eq = constants[K2_EQ];
    double den = 1.0
        + constants[K_CO] * pCOBar
        + constants[K_H2] * pH2
        + constants[K_CH4] * pCH4Bar
        + constants[K_H2O] * pH2OBar * invH2;
    double invDen2 = 1.0 / (den * den);
    double drive1 = pCH4Bar * pH2OBar - pH2sq * pH2 * pCOBar / k1Eq;
    double drive2 = pCOBar * pH2OBar - pH2 * pCO2Bar / k2Eq;
    double drive3 = pCH4Bar * pH2OBar * pH2OBar - pH2sq * pH2sq * pCO2Bar / (k1Eq * k2Eq);
    outMolPerKgS[0] = constants[K1_RATE] * invH2pow25 * drive1 * invDen2;
    outMolPerKgS[1] = constants[K2_RATE] * invH2 * drive2 * invDen2;
    outMolPerKgS[2] = constants[K3_RATE] * invH2pow25 * invH2 * drive3 * invDen2;
  }
}
