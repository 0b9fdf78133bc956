package org.plateward.thermo;

/**
 * Ideal-gas heat capacity, enthalpy, entropy and Gibbs energy of the seven {@link Species}.
 *
 * <p><b>Data.</b> NIST Chemistry WebBook (SRD 69) Shomate coefficients, which NIST fitted to
 * the NIST-JANAF Thermochemical Tables (Chase, M.W. Jr., 1998, J. Phys. Chem. Ref. Data
 * Monograph 9). With t = T/1000:
 *
 * <pre>
 *   cp  = A + B t + C t^2 + D t^3 + E/t^2                        [J/(mol K)]
 *   h   = 1000 (A t + B t^2/2 + C t^3/3 + D t^4/4 - E/t + F)     [J/mol]
 *   s   = A ln t + B t + C t^2/2 + D t^3/3 - E/(2 t^2) + G       [J/(mol K)]
 *   g   = h - T s
 * </pre>
 *
 * The WebBook's H coefficient equals the standard formation enthalpy, so h above is the
 * absolute enthalpy in the JANAF convention: h(298.15 K) = ΔfH°(298.15 K), elements in their
 * reference state have h(298.15 K) = 0. The entropy is the absolute third-law entropy at the
 * 1 bar standard state. Pressure does not enter (ideal gas).
 *
 * <p><b>Temperature ranges.</b> Each species uses the WebBook's own range split:
 *
 * <pre>
 *   CH4  298-1300-6000 K        CO   298-1300-6000 K       CO2  298-1200-6000 K
 *   H2   298-1000-2500-6000 K   O2   100-700-2000-6000 K   N2   100-500-2000-6000 K
 *   H2O  500-1700-6000 K (the low fit is used down to 298 K; it reproduces the JANAF
 *        cp at 298.15 K to 0.01 J/(mol K), see IdealGasThermoTest)
 * </pre>
 *
 * At a range boundary the published fits differ by up to 13 J/mol in h (CH4 at 1300 K) and
 * 0.19 J/(mol K) in cp. To keep h, s and g continuous for Newton solvers and Jacobians, the F
 * and G of each upper range are shifted once, at class load, so that h and s of the upper fit
 * equal those of the lower fit at the boundary; the lowest range is used exactly as
 * published. cp keeps its (small) published step at the boundaries.
 *
 * <p><b>Outside the fitted ranges</b> (below the lowest limit, e.g. 250 K for CH4, or above
 * 6000 K) cp is held at its value at the nearest limit and h and s are integrated with that
 * constant cp: h = h(Tb) + cp(Tb)(T - Tb), s = s(Tb) + cp(Tb) ln(T/Tb). Values stay finite
 * and continuous; between 250 and 298 K the error is below about 1 J/(mol K) in cp.
 *
 * <p>All methods are static, allocation-free, and take the species as its ordinal. A
 * non-positive or NaN temperature throws {@link IllegalArgumentException}.
 */
public final class IdealGasThermo {

  /** Molar gas constant (CODATA 2018, exact), J/(mol K). */
  public static final double R_J_PER_MOL_K = 8.314462618;

  /**
   * Shomate coefficient rows: A, B, C, D, E, F, G (F, G continuity-adjusted, see class doc),
   * then derived constants (see {@link #extend}).
   */
  private static final double[][][] COEF = new double[Species.COUNT][][];

  /** Range limits per species: {T0, T1, ..., Tn}; range r covers [T_r, T_(r+1)]. */
  private static final double[][] LIMITS = new double[Species.COUNT][];

  /** Values at the lowest and highest fit limits, for the constant-cp extrapolation. */
  private static final double[] CP_LO = new double[Species.COUNT];
  private static final double[] H_LO = new double[Species.COUNT];
  private static final double[] S_LO = new double[Species.COUNT];
  private static final double[] CP_HI = new double[Species.COUNT];
  private static final double[] H_HI = new double[Species.COUNT];
  private static final double[] S_HI = new double[Species.COUNT];

  /** Largest |h| shift applied at a range boundary, J/mol (reported by tests). */
  static final double[] MAX_BOUNDARY_SHIFT_H = new double[Species.COUNT];

  static {
    // NIST WebBook SRD 69, Shomate A, B, C, D, E, F, G (H = ΔfH° is implied by F; see doc).
    define(Species.CH4, new double[] {298, 1300, 6000},
        new double[] {-0.703029, 108.4773, -42.52157, 5.862788, 0.678565, -76.84376, 158.7163},
        new double[] {85.81217, 11.26467, -2.114146, 0.138190, -26.42221, -153.5327, 224.4143});
    define(Species.H2O, new double[] {298, 1700, 6000},
        new double[] {30.09200, 6.832514, 6.793435, -2.534480, 0.082139, -250.8810, 223.3967},
        new double[] {41.96426, 8.622053, -1.499780, 0.098119, -11.15764, -272.1797, 219.7809});
    define(Species.CO, new double[] {298, 1300, 6000},
        new double[] {25.56759, 6.096130, 4.054656, -2.671301, 0.131021, -118.0089, 227.3665},
        new double[] {35.15070, 1.300095, -0.205921, 0.013550, -3.282780, -127.8375, 231.7120});
    define(Species.CO2, new double[] {298, 1200, 6000},
        new double[] {24.99735, 55.18696, -33.69137, 7.948387, -0.136638, -403.6075, 228.2431},
        new double[] {58.16639, 2.720074, -0.492289, 0.038844, -6.447293, -425.9186, 263.6125});
    define(Species.H2, new double[] {298, 1000, 2500, 6000},
        new double[] {33.066178, -11.363417, 11.432816, -2.772874, -0.158558, -9.980797,
            172.707974},
        new double[] {18.563083, 12.257357, -2.859786, 0.268238, 1.977990, -1.147438,
            156.288133},
        new double[] {43.413560, -4.293079, 1.272428, -0.096876, -20.533862, -38.515158,
            162.081354});
    define(Species.O2, new double[] {100, 700, 2000, 6000},
        new double[] {31.32234, -20.23531, 57.86644, -36.50624, -0.007374, -8.903471, 246.7945},
        new double[] {30.03235, 8.772972, -3.988133, 0.788313, -0.741599, -11.32468, 236.1663},
        new double[] {20.91111, 10.72071, -2.020498, 0.146449, 9.245722, 5.337651, 237.6185});
    define(Species.N2, new double[] {100, 500, 2000, 6000},
        new double[] {28.98641, 1.853978, -9.647459, 16.63537, 0.000117, -8.671914, 226.4168},
        new double[] {19.50583, 19.88705, -8.598535, 1.369784, 0.527601, -4.935202, 212.3900},
        new double[] {35.51872, 1.128728, -0.196103, 0.014662, -4.553760, -18.97091, 224.9810});
  }

  private IdealGasThermo() {}

  private static void define(Species sp, double[] limits, double[]... ranges) {
    int i = sp.ordinal();
    double[][] c = new double[ranges.length][];
    for (int r = 0; r < ranges.length; r++) {
      c[r] = extend(ranges[r]);
    }
    // Continuity: shift F (kJ/mol) and G of range r+1 so h and s match range r at the boundary.
    for (int r = 0; r + 1 < c.length; r++) {
      double tb = limits[r + 1];
      double dh = hFit(c[r], tb) - hFit(c[r + 1], tb);
      double ds = sFit(c[r], tb) - sFit(c[r + 1], tb);
      c[r + 1][5] += dh * 1e-3;
      c[r + 1][6] += ds;
      MAX_BOUNDARY_SHIFT_H[i] = Math.max(MAX_BOUNDARY_SHIFT_H[i], Math.abs(dh));
    }
    COEF[i] = c;
    LIMITS[i] = limits;
    double lo = limits[0];
    double hi = limits[limits.length - 1];
    CP_LO[i] = cpFit(c[0], lo);
    H_LO[i] = hFit(c[0], lo);
    S_LO[i] = sFit(c[0], lo);
    double[] last = c[c.length - 1];
    CP_HI[i] = cpFit(last, hi);
    H_HI[i] = hFit(last, hi);
    S_HI[i] = sFit(last, hi);
  }

  /**
   * A, B, C, D, E, F, G followed by the integration constants used in h and s: [7] B/2,
   * [8] C/3, [9] D/4, [10] C/2, [11] D/3, so the hot path multiplies instead of dividing.
   */
  private static double[] extend(double[] published) {
    double[] a = java.util.Arrays.copyOf(published, 12);
    a[7] = 0.5 * a[1];
    a[8] = a[2] / 3.0;
    a[9] = 0.25 * a[3];
    a[10] = 0.5 * a[2];
    a[11] = a[3] / 3.0;
    return a;
  }

  // --- the Shomate forms for one coefficient row (t = T/1000) ---

  private static double cpFit(double[] a, double tempK) {
    double t = tempK * 1e-3;
    return a[0] + t * (a[1] + t * (a[2] + t * a[3])) + a[4] / (t * t);
  }

  private static double hFit(double[] a, double tempK) {
    double t = tempK * 1e-3;
    // h/1000 = A t + B t^2/2 + C t^3/3 + D t^4/4 - E/t + F
    return 1e3 * (t * (a[0] + t * (a[7] + t * (a[8] + t * a[9]))) - a[4] / t + a[5]);
  }

  private static double sFit(double[] a, double tempK) {
    double t = tempK * 1e-3;
    return sFit(a, t, Math.log(t));
  }

  private static double sFit(double[] a, double t, double lnT) {
    // s = A ln t + B t + C t^2/2 + D t^3/3 - E/(2 t^2) + G
    return a[0] * lnT + t * (a[1] + t * (a[10] + t * a[11])) - 0.5 * a[4] / (t * t) + a[6];
  }

  private static double[] row(int species, double tempK) {
    double[] lim = LIMITS[species];
    double[][] c = COEF[species];
    int last = c.length - 1;
    for (int r = 0; r < last; r++) {
      if (tempK <= lim[r + 1]) {
        return c[r];
      }
    }
    return c[last];
  }

  private static void checkTemp(double tempK) {
    if (!(tempK > 0.0) || tempK == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException("temperature must be finite and > 0 K, got " + tempK);
    }
  }

  private static double lowLimit(int species) {
    return LIMITS[species][0];
  }

  private static double highLimit(int species) {
    double[] lim = LIMITS[species];
    return lim[lim.length - 1];
  }

  /**
   * Ideal-gas molar heat capacity at constant pressure.
   *
   * @param species species ordinal ({@link Species#ordinal()})
   * @param tempK temperature, K
   * @return cp, J/(mol K)
   */
  public static double heatCapacityJPerMolK(int species, double tempK) {
    checkTemp(tempK);
    if (tempK < lowLimit(species)) {
      return CP_LO[species];
    }
    if (tempK > highLimit(species)) {
      return CP_HI[species];
    }
    return cpFit(row(species, tempK), tempK);
  }

  /**
   * Absolute molar enthalpy, JANAF convention: h(298.15 K) = ΔfH°(298.15 K).
   *
   * @param species species ordinal
   * @param tempK temperature, K
   * @return h, J/mol
   */
  public static double enthalpyJPerMol(int species, double tempK) {
    checkTemp(tempK);
    double lo = lowLimit(species);
    if (tempK < lo) {
      return H_LO[species] + CP_LO[species] * (tempK - lo);
    }
    double hi = highLimit(species);
    if (tempK > hi) {
      return H_HI[species] + CP_HI[species] * (tempK - hi);
    }
    return hFit(row(species, tempK), tempK);
  }

  /**
   * Absolute molar entropy at the 1 bar standard state.
   *
   * @param species species ordinal
   * @param tempK temperature, K
   * @return s°, J/(mol K)
   */
  public static double entropyJPerMolK(int species, double tempK) {
    checkTemp(tempK);
    return entropyChecked(species, tempK, Math.log(tempK * 1e-3));
  }

  /** Entropy with ln(T/1000) supplied by the caller (one log shared across species). */
  private static double entropyChecked(int species, double tempK, double lnT) {
    double lo = lowLimit(species);
    if (tempK < lo) {
      return S_LO[species] + CP_LO[species] * Math.log(tempK / lo);
    }
    double hi = highLimit(species);
    if (tempK > hi) {
      return S_HI[species] + CP_HI[species] * Math.log(tempK / hi);
    }
    return sFit(row(species, tempK), tempK * 1e-3, lnT);
  }

  /**
   * Molar Gibbs energy g = h − T s° at the 1 bar standard state (JANAF enthalpy convention).
   *
   * @param species species ordinal
   * @param tempK temperature, K
   * @return g°, J/mol
   */
  public static double gibbsJPerMol(int species, double tempK) {
    checkTemp(tempK);
    return gibbsChecked(species, tempK, Math.log(tempK * 1e-3));
  }

  private static double gibbsChecked(int species, double tempK, double lnT) {
    return enthalpyJPerMol(species, tempK) - tempK * entropyChecked(species, tempK, lnT);
  }

  /**
   * Σ ν_i g°_i at one temperature, sharing one logarithm across the species. Package-private
   * helper for {@link Reaction}.
   *
   * @param nu stoichiometric coefficients per species index
   * @param tempK temperature, K
   * @return ΔG°, J/mol
   */
  static double sumGibbsJPerMol(double[] nu, double tempK) {
    checkTemp(tempK);
    double lnT = Math.log(tempK * 1e-3);
    double sum = 0.0;
    for (int i = 0; i < Species.COUNT; i++) {
      double v = nu[i];
      if (v != 0.0) {
        sum += v * gibbsChecked(i, tempK, lnT);
      }
    }
    return sum;
  }

  /**
   * Σ ν_i h_i at one temperature. Package-private helper for {@link Reaction}.
   *
   * @param nu stoichiometric coefficients per species index
   * @param tempK temperature, K
   * @return ΔH°, J/mol
   */
  static double sumEnthalpyJPerMol(double[] nu, double tempK) {
    double sum = 0.0;
    for (int i = 0; i < Species.COUNT; i++) {
      double v = nu[i];
      if (v != 0.0) {
        sum += v * enthalpyJPerMol(i, tempK);
      }
    }
    return sum;
  }

  /**
   * Absolute enthalpies of all species at one temperature, into a caller-owned array.
   *
   * @param tempK temperature, K
   * @param outJPerMol receives h_i, J/mol, at index {@link Species#ordinal()}; length ≥ 7
   */
  public static void enthalpiesJPerMol(double tempK, double[] outJPerMol) {
    for (int i = 0; i < Species.COUNT; i++) {
      outJPerMol[i] = enthalpyJPerMol(i, tempK);
    }
  }

  /**
   * Standard Gibbs energies g° = h − T s° of all species at one temperature, into a
   * caller-owned array; the powers and logarithm of T are shared across the species.
   *
   * @param tempK temperature, K
   * @param outJPerMol receives g°_i, J/mol, at index {@link Species#ordinal()}; length ≥ 7
   */
  public static void gibbsEnergiesJPerMol(double tempK, double[] outJPerMol) {
    checkTemp(tempK);
    double t = tempK * 1e-3;
    double lnT = Math.log(t);
    double invT = 1.0 / t;
    for (int i = 0; i < Species.COUNT; i++) {
      if (tempK < lowLimit(i) || tempK > highLimit(i)) {
        outJPerMol[i] = gibbsChecked(i, tempK, lnT);
        continue;
      }
      double[] a = row(i, tempK);
      // h/1000 = A t + B t^2/2 + C t^3/3 + D t^4/4 - E/t + F
      double hK = t * (a[0] + t * (a[7] + t * (a[8] + t * a[9]))) - a[4] * invT + a[5];
      // s = A ln t + B t + C t^2/2 + D t^3/3 - E/(2 t^2) + G
      double s =
          a[0] * lnT + t * (a[1] + t * (a[10] + t * a[11])) - 0.5 * a[4] * invT * invT + a[6];
      outJPerMol[i] = 1e3 * hK - tempK * s;
    }
  }

  /**
   * Heat capacities of all species at one temperature, into a caller-owned array.
   *
   * @param tempK temperature, K
   * @param outJPerMolK receives cp_i, J/(mol K); length ≥ 7
   */
  public static void heatCapacitiesJPerMolK(double tempK, double[] outJPerMolK) {
    for (int i = 0; i < Species.COUNT; i++) {
      outJPerMolK[i] = heatCapacityJPerMolK(i, tempK);
    }
  }

  /**
   * Ideal-gas cp.
   *
   * @param species the species
   * @param tempK temperature, K
   * @return cp, J/(mol K)
   */
  public static double heatCapacityJPerMolK(Species species, double tempK) {
    return heatCapacityJPerMolK(species.ordinal(), tempK);
  }

  /**
   * Absolute enthalpy (JANAF convention).
   *
   * @param species the species
   * @param tempK temperature, K
   * @return h, J/mol
   */
  public static double enthalpyJPerMol(Species species, double tempK) {
    return enthalpyJPerMol(species.ordinal(), tempK);
  }

  /**
   * Absolute entropy at 1 bar.
   *
   * @param species the species
   * @param tempK temperature, K
   * @return s°, J/(mol K)
   */
  public static double entropyJPerMolK(Species species, double tempK) {
    return entropyJPerMolK(species.ordinal(), tempK);
  }

  /**
   * Gibbs energy g = h − T s° at 1 bar.
   *
   * @param species the species
   * @param tempK temperature, K
   * @return g°, J/mol
   */
  public static double gibbsJPerMol(Species species, double tempK) {
    return gibbsJPerMol(species.ordinal(), tempK);
  }
}
