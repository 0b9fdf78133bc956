package org.plateward.reactor;

import org.plateward.kinetics.CatalyticCombustion;
import org.plateward.kinetics.XuFromentKinetics;
import org.plateward.thermo.IdealGasThermo;
import org.plateward.thermo.MixtureProperties;
import org.plateward.thermo.Species;

/**
 * Temperature tables of everything the channel marches need per cell, built once from the
 * thermo and kinetics packages and read by linear interpolation on a 0.5 K grid: species
 * enthalpy and heat capacity, pure-species conductivity and Wilke's interaction factors (for
 * the Wassiljewa-Mason-Saxena mixing rule), the Xu-Froment constants and the combustion surface
 * rate constant. The interpolation error is below 1e-5 relative for the Arrhenius terms
 * (their curvature (E/RT^2)^2 h^2/8) and far smaller for the thermo; every caller in the
 * model uses the same tables, so the energy balance still closes to rounding.
 */
final class GasTables {
  static final double MIN_K = 200.0;
  static final double MAX_K = 2600.0;
  private static final double STEP_K = 0.5;
  private static final double INV_STEP = 1.0 / STEP_K;
  private static final int NODES = (int) Math.round((MAX_K - MIN_K) / STEP_K) + 1;
  private static final int NS = Species.COUNT;
  private static final int NC = XuFromentKinetics.CONSTANTS;

  private static final double[] H = new double[NODES * NS];
  private static final double[] CP = new double[NODES * NS];
  private static final double[] LAMBDA = new double[NODES * NS];
  private static final double[] PHI = new double[NODES * NS * NS];
  private static final double[] XF = new double[NODES * NC];
  private static final double[] KS = new double[NODES];

  static {
    double[] c = new double[NC];
    for (int i = 0; i < NODES; i++) {
      double t = MIN_K + i * STEP_K;
      for (int k = 0; k < NS; k++) {
        H[i * NS + k] = IdealGasThermo.enthalpyJPerMol(k, t);
        CP[i * NS + k] = IdealGasThermo.heatCapacityJPerMolK(k, t);
        LAMBDA[i * NS + k] = MixtureProperties.pureThermalConductivityWPerMK(k, t);
        for (int m = 0; m < NS; m++) {
          PHI[(i * NS + k) * NS + m] = MixtureProperties.wilkePhi(k, m, t);
        }
      }
      XuFromentKinetics.constants(t, c);
      System.arraycopy(c, 0, XF, i * NC, NC);
      KS[i] = CatalyticCombustion.surfaceRateConstantMPerS(t);
    }
  }

  private GasTables() {}

  /** Fills {@code out[0..n)} by interpolating {@code table} (n values per node) at T. */
  private static void interpolate(double[] table, int n, double tempK, double[] out) {
    double u = (clamp(tempK) - MIN_K) * INV_STEP;
    int i = Math.min((int) u, NODES - 2);
    double w = u - i;
    int a = i * n;
    int b = a + n;
    for (int k = 0; k < n; k++) {
      out[k] = table[a + k] + w * (table[b + k] - table[a + k]);
    }
  }

  private static double clamp(double tempK) {
    if (!(tempK >= MIN_K && tempK <= MAX_K)) {
      if (Double.isNaN(tempK)) {
        throw new IllegalArgumentException("temperature is NaN");
      }
      return tempK < MIN_K ? MIN_K : MAX_K;
    }
    return tempK;
  }

  /** Species molar enthalpies h_k(T), J/mol. */
  static void enthalpies(double tempK, double[] out) {
    interpolate(H, NS, tempK, out);
  }

  /** Species molar heat capacities cp_k(T), J/(mol K). */
  static void heatCapacities(double tempK, double[] out) {
    interpolate(CP, NS, tempK, out);
  }

  /** The nine Xu-Froment constants at T (see {@link XuFromentKinetics#constants}). */
  static void xuFromentConstants(double tempK, double[] out) {
    interpolate(XF, NC, tempK, out);
  }

  /** Combustion surface rate constant at T, m/s. */
  static double combustionSurfaceRateMPerS(double tempK) {
    double u = (clamp(tempK) - MIN_K) / STEP_K;
    int i = Math.min((int) u, NODES - 2);
    double w = u - i;
    return KS[i] + w * (KS[i + 1] - KS[i]);
  }

  /**
   * Mixture thermal conductivity at T by the Wassiljewa-Mason-Saxena rule, W/(m K): pure
   * conductivities interpolated, Wilke's factors taken at the nearest node (they vary with T
   * only through viscosity ratios, well under 1e-4 over a quarter kelvin).
   */
  static double conductivityWPerMK(double[] moleFractions, double tempK, double[] scratch) {
    interpolate(LAMBDA, NS, tempK, scratch);
    int node = (int) Math.round((clamp(tempK) - MIN_K) / STEP_K);
    return MixtureProperties.thermalConductivityWPerMK(moleFractions, scratch, PHI, node * NS * NS);
  }
}
