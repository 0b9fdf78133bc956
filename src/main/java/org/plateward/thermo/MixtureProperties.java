package org.plateward.thermo;

/**
 * Heat capacity and transport properties of ideal-gas mixtures of the seven {@link Species}
 * at low density (the dilute-gas limit; pressure enters only the diffusivities).
 *
 * <h2>Pure species</h2>
 * <ul>
 *   <li><b>Viscosity</b>, all species except water: Chapman–Enskog,
 *       μ = 26.69 √(M T) / (σ² Ω_v) μP (M in g/mol, σ in Å), with the Neufeld, Janzen &amp; Aziz
 *       (1972) fit of the collision integral
 *       Ω_v = 1.16145 T*^−0.14874 + 0.52487 e^(−0.77320 T*) + 2.16178 e^(−2.43787 T*),
 *       T* = kT/ε; Lennard-Jones σ and ε/k from Svehla (1962, NASA TR R-132) as tabulated in
 *       Poling, Prausnitz &amp; O'Connell, <i>The Properties of Gases and Liquids</i>, 5th ed.
 *       (2001), Appendix B [values from memory; checked through the handbook viscosities in
 *       MixturePropertiesTest].</li>
 *   <li><b>Water</b> (polar, poorly served by a Lennard-Jones model): the dilute-gas terms of
 *       the IAPWS formulations, viscosity IAPWS 2008 (Huber et al. 2009, J. Phys. Chem. Ref.
 *       Data 38, 101) μ0 = 100 √T̄ / Σ H_k T̄^−k μPa s and conductivity IAPWS 2011 (Huber et al.
 *       2012, J. Phys. Chem. Ref. Data 41, 033102) λ0 = √T̄ / Σ L_k T̄^−k mW/(m K),
 *       T̄ = T / 647.096 K.</li>
 *   <li><b>Thermal conductivity</b>, all species except water: the modified Eucken correlation,
 *       λ M / (μ c_v) = 1.32 + 1.77 R / c_v (Poling et al. 2001, §10-3), with c_v = c_p − R from
 *       {@link IdealGasThermo}. Typical error 5–10 % (larger for CO2 at low T).</li>
 * </ul>
 *
 * <h2>Mixing rules</h2>
 * <ul>
 *   <li><b>cp</b>: mole-fraction average, c_p = Σ x_i c_p,i / Σ x_i.</li>
 *   <li><b>Viscosity</b>: Wilke (1950), μ = Σ_i x_i μ_i / Σ_j x_j Φ_ij with
 *       Φ_ij = [1 + (μ_i/μ_j)^½ (M_j/M_i)^¼]² / [8 (1 + M_i/M_j)]^½.</li>
 *   <li><b>Thermal conductivity</b>: Wassiljewa's equation, λ = Σ_i x_i λ_i / Σ_j x_j A_ij, with
 *       the Mason–Saxena (1958) modification A_ij = ε Φ_ij (the Wilke Φ_ij above) and ε = 1.0,
 *       as recommended in Poling et al. (2001), §10-6.</li>
 *   <li><b>Binary diffusivity</b>: Fuller, Schettler &amp; Giddings (1966),
 *       D_AB = 0.00143 T^1.75 / (p M_AB^½ [Σv_A^⅓ + Σv_B^⅓]²) cm²/s (T in K, p in bar,
 *       M_AB = 2/(1/M_A + 1/M_B) in g/mol), with the atomic and molecular diffusion volumes of
 *       Fuller et al. as tabulated in Poling et al. (2001) Table 11-1 (CH4 = C + 4 H).</li>
 *   <li><b>Diffusivity in a mixture</b>: Blanc's law in Wilke's (1950) form for a species
 *       diffusing through a stagnant mixture, D_im = (1 − x_i) / Σ_(j≠i) x_j/D_ij. When the
 *       other species are absent (1 − x_i &lt; 1e−12) the Fuller self-diffusivity D_ii is
 *       returned instead.</li>
 * </ul>
 *
 * <p>Mole fractions are read from a {@code double[7]} indexed by {@link Species#ordinal()};
 * they need not be normalised (every rule above is homogeneous of degree zero in x) but must
 * be non-negative with a positive sum. The methods are static and allocation-free; the
 * pure-species scratch values live in a per-thread buffer, so the class is thread-safe.
 */
public final class MixtureProperties {

  private static final int N = Species.COUNT;

  /** Lennard-Jones σ, Å (Svehla 1962 via Poling et al. 2001, App. B); H2O unused. */
  private static final double[] SIGMA_ANGSTROM = {3.758, 2.641, 3.690, 3.941, 2.827, 3.467, 3.798};

  /** Lennard-Jones ε/k, K (same source); H2O unused. */
  private static final double[] EPS_K = {148.6, 809.1, 91.7, 195.2, 59.7, 106.7, 71.4};

  /** Fuller diffusion volumes, dimensionless (Poling et al. 2001, Table 11-1). */
  private static final double[] DIFFUSION_VOLUME = {
    15.9 + 4 * 2.31, // CH4 from atomic increments C 15.9, H 2.31
    13.1, // H2O
    18.0, // CO
    26.9, // CO2
    6.12, // H2
    16.3, // O2
    18.5 // N2
  };

  /** IAPWS 2008 dilute-gas viscosity coefficients H0..H3. */
  private static final double[] IAPWS_H = {1.67752, 2.20462, 0.6366564, -0.241605};

  /** IAPWS 2011 dilute-gas conductivity coefficients L0..L4. */
  private static final double[] IAPWS_L = {
    2.443221e-3, 1.323095e-2, 6.770357e-3, -3.454586e-3, 4.096266e-4
  };

  private static final double WATER_CRITICAL_TEMP_K = 647.096;

  private static final int H2O = Species.H2O.ordinal();

  private static final double[] MOLAR_MASS_KG = new double[N];
  /** 26.69e-7 √M / σ², so μ = CE_PREFACTOR √T / Ω_v in Pa s. */
  private static final double[] CE_PREFACTOR = new double[N];
  private static final double[] INV_EPS_K = new double[N];
  /** (M_j/M_i)^¼ at [i*N + j]. */
  private static final double[] MASS_RATIO_QUARTER = new double[N * N];
  /** 1/√(8 (1 + M_i/M_j)) at [i*N + j]. */
  private static final double[] PHI_DENOM_INV = new double[N * N];
  /** Fuller: 1e-4 * 0.00143 * 1e5 / (√M_AB [..]²), so D = c T^1.75 / p[Pa] in m²/s. */
  private static final double[] FULLER_COEF = new double[N * N];

  private static final ThreadLocal<double[]> SCRATCH =
      ThreadLocal.withInitial(() -> new double[3 * N]);

  static {
    for (int i = 0; i < N; i++) {
      double mG = Species.of(i).molarMassKgPerMol() * 1e3;
      MOLAR_MASS_KG[i] = mG * 1e-3;
      CE_PREFACTOR[i] = 26.69e-7 * Math.sqrt(mG) / (SIGMA_ANGSTROM[i] * SIGMA_ANGSTROM[i]);
      INV_EPS_K[i] = 1.0 / EPS_K[i];
    }
    for (int i = 0; i < N; i++) {
      double mi = MOLAR_MASS_KG[i] * 1e3;
      for (int j = 0; j < N; j++) {
        double mj = MOLAR_MASS_KG[j] * 1e3;
        MASS_RATIO_QUARTER[i * N + j] = Math.sqrt(Math.sqrt(mj / mi));
        PHI_DENOM_INV[i * N + j] = 1.0 / Math.sqrt(8.0 * (1.0 + mi / mj));
        double mAb = 2.0 / (1.0 / mi + 1.0 / mj);
        double vSum = Math.cbrt(DIFFUSION_VOLUME[i]) + Math.cbrt(DIFFUSION_VOLUME[j]);
        // 0.00143 cm^2/s bar -> 1e-4 m^2/cm^2 * 1e5 Pa/bar = 10 m^2 Pa/s
        FULLER_COEF[i * N + j] = 0.00143 * 10.0 / (Math.sqrt(mAb) * vSum * vSum);
      }
    }
  }

  private MixtureProperties() {}

  /**
   * Pure-species dilute-gas viscosity (see the class doc for the correlations).
   *
   * @param species species ordinal
   * @param tempK temperature, K
   * @return μ, Pa s
   */
  public static double pureViscosityPaS(int species, double tempK) {
    checkTemp(tempK);
    if (species == H2O) {
      double tr = tempK / WATER_CRITICAL_TEMP_K;
      double inv = 1.0 / tr;
      double sum = IAPWS_H[0] + inv * (IAPWS_H[1] + inv * (IAPWS_H[2] + inv * IAPWS_H[3]));
      return 1e-4 * Math.sqrt(tr) / sum; // 100 √T̄/Σ μPa s
    }
    double ts = tempK * INV_EPS_K[species];
    // Neufeld et al. (1972): Ω = A T*^-B + C e^(-D T*) + E e^(-F T*)
    double omega = 1.16145 * Math.exp(-0.14874 * Math.log(ts))
        + 0.52487 * Math.exp(-0.77320 * ts)
        + 2.16178 * Math.exp(-2.43787 * ts);
    return CE_PREFACTOR[species] * Math.sqrt(tempK) / omega;
  }

  /**
   * Pure-species dilute-gas thermal conductivity (see the class doc).
   *
   * @param species species ordinal
   * @param tempK temperature, K
   * @return λ, W/(m K)
   */
  public static double pureThermalConductivityWPerMK(int species, double tempK) {
    return pureConductivity(species, tempK, pureViscosityPaS(species, tempK));
  }

  private static double pureConductivity(int species, double tempK, double viscosityPaS) {
    if (species == H2O) {
      double tr = tempK / WATER_CRITICAL_TEMP_K;
      double inv = 1.0 / tr;
      double sum = IAPWS_L[0]
          + inv * (IAPWS_L[1] + inv * (IAPWS_L[2] + inv * (IAPWS_L[3] + inv * IAPWS_L[4])));
      return 1e-3 * Math.sqrt(tr) / sum;
    }
    double r = IdealGasThermo.R_J_PER_MOL_K;
    double cv = IdealGasThermo.heatCapacityJPerMolK(species, tempK) - r;
    // modified Eucken: λ M/(μ cv) = 1.32 + 1.77 R/cv
    return viscosityPaS * (1.32 * cv + 1.77 * r) / MOLAR_MASS_KG[species];
  }

  /**
   * Mixture molar heat capacity, c_p = Σ x_i c_p,i / Σ x_i.
   *
   * @param moleFractions x_i per species index, length 7
   * @param tempK temperature, K
   * @return c_p, J/(mol K)
   */
  public static double heatCapacityJPerMolK(double[] moleFractions, double tempK) {
    double sum = 0.0;
    double xs = 0.0;
    for (int i = 0; i < N; i++) {
      double x = moleFractions[i];
      if (x != 0.0) {
        sum += x * IdealGasThermo.heatCapacityJPerMolK(i, tempK);
        xs += x;
      }
    }
    return sum / checkSum(xs);
  }

  /**
   * Mixture viscosity by Wilke's rule.
   *
   * @param moleFractions x_i per species index, length 7
   * @param tempK temperature, K
   * @return μ, Pa s
   */
  public static double viscosityPaS(double[] moleFractions, double tempK) {
    double[] s = SCRATCH.get();
    fillPure(moleFractions, tempK, s, false);
    double mu = 0.0;
    for (int i = 0; i < N; i++) {
      double x = moleFractions[i];
      if (x != 0.0) {
        mu += x * s[i] / phiSum(i, moleFractions, s);
      }
    }
    return mu;
  }

  /**
   * Mixture thermal conductivity by Wassiljewa's equation with the Mason–Saxena modification.
   *
   * @param moleFractions x_i per species index, length 7
   * @param tempK temperature, K
   * @return λ, W/(m K)
   */
  public static double thermalConductivityWPerMK(double[] moleFractions, double tempK) {
    double[] s = SCRATCH.get();
    fillPure(moleFractions, tempK, s, true);
    double lambda = 0.0;
    for (int i = 0; i < N; i++) {
      double x = moleFractions[i];
      if (x != 0.0) {
        lambda += x * s[2 * N + i] / phiSum(i, moleFractions, s);
      }
    }
    return lambda;
  }

  /**
   * Wilke's interaction factor Φ_ij = [1 + (μ_i/μ_j)^½ (M_j/M_i)^¼]² / [8 (1 + M_i/M_j)]^½ at T,
   * for callers that tabulate it.
   *
   * @param i species ordinal
   * @param j species ordinal
   * @param tempK temperature, K
   * @return Φ_ij, dimensionless
   */
  public static double wilkePhi(int i, int j, double tempK) {
    double a = 1.0 + Math.sqrt(pureViscosityPaS(i, tempK) / pureViscosityPaS(j, tempK)) * MASS_RATIO_QUARTER[i * N + j];
    return a * a * PHI_DENOM_INV[i * N + j];
  }

  /**
   * Mixture thermal conductivity by the same Wassiljewa–Mason–Saxena rule, λ = Σ_i x_i λ_i /
   * Σ_j x_j Φ_ij, from pure-species conductivities and Φ_ij the caller already has.
   *
   * @param moleFractions x_i per species index, length 7, non-negative
   * @param pureConductivityWPerMK λ_i at the temperature, W/(m K), length 7
   * @param phi Φ_ij at the temperature, row-major 7 × 7 starting at {@code phiOffset}
   * @param phiOffset index of Φ_00 in {@code phi}
   * @return λ, W/(m K)
   */
  public static double thermalConductivityWPerMK(
      double[] moleFractions, double[] pureConductivityWPerMK, double[] phi, int phiOffset) {
    double lambda = 0.0;
    for (int i = 0; i < N; i++) {
      double x = moleFractions[i];
      if (x != 0.0) {
        double sum = 0.0;
        int row = phiOffset + i * N;
        for (int j = 0; j < N; j++) {
          double xj = moleFractions[j];
          if (xj != 0.0) {
            sum += xj * phi[row + j];
          }
        }
        lambda += x * pureConductivityWPerMK[i] / sum;
      }
    }
    return lambda;
  }



  /** Fills s[0..6] = μ_i, s[7..13] = √μ_i and optionally s[14..20] = λ_i for present species. */
  private static void fillPure(double[] x, double tempK, double[] s, boolean conductivity) {
    double xs = 0.0;
    for (int i = 0; i < N; i++) {
      double xi = x[i];
      if (xi < 0.0) {
        throw new IllegalArgumentException("mole fraction of " + Species.of(i) + " is " + xi);
      }
      if (xi != 0.0) {
        double mu = pureViscosityPaS(i, tempK);
        s[i] = mu;
        s[N + i] = Math.sqrt(mu);
        if (conductivity) {
          s[2 * N + i] = pureConductivity(i, tempK, mu);
        }
        xs += xi;
      }
    }
    checkSum(xs);
  }

  /** Σ_j x_j Φ_ij, Φ_ij = [1 + √(μ_i/μ_j) (M_j/M_i)^¼]² / √(8(1 + M_i/M_j)). */
  private static double phiSum(int i, double[] x, double[] s) {
    double sqrtMuI = s[N + i];
    double sum = 0.0;
    int row = i * N;
    for (int j = 0; j < N; j++) {
      double xj = x[j];
      if (xj != 0.0) {
        double a = 1.0 + sqrtMuI / s[N + j] * MASS_RATIO_QUARTER[row + j];
        sum += xj * a * a * PHI_DENOM_INV[row + j];
      }
    }
    return sum;
  }

  /**
   * Binary diffusion coefficient by Fuller, Schettler &amp; Giddings (1966).
   *
   * @param a species ordinal
   * @param b species ordinal
   * @param tempK temperature, K
   * @param pressurePa total pressure, Pa
   * @return D_ab, m²/s
   */
  public static double binaryDiffusivityM2PerS(int a, int b, double tempK, double pressurePa) {
    checkTemp(tempK);
    if (!(pressurePa > 0.0)) {
      throw new IllegalArgumentException("pressure must be > 0 Pa, got " + pressurePa);
    }
    return FULLER_COEF[a * N + b] * t175(tempK) / pressurePa;
  }

  /** T^1.75 = T √T ⁴√T. */
  private static double t175(double tempK) {
    double sq = Math.sqrt(tempK);
    return tempK * sq * Math.sqrt(sq);
  }

  /**
   * Effective diffusivity of one species through the mixture, Blanc's law in Wilke's form
   * D_im = (1 − x_i) / Σ_(j≠i) x_j/D_ij (see the class doc for the pure-species limit).
   *
   * @param species species ordinal
   * @param moleFractions x_j per species index, length 7
   * @param tempK temperature, K
   * @param pressurePa total pressure, Pa
   * @return D_im, m²/s
   */
  public static double diffusivityInMixtureM2PerS(
      int species, double[] moleFractions, double tempK, double pressurePa) {
    checkTemp(tempK);
    if (!(pressurePa > 0.0)) {
      throw new IllegalArgumentException("pressure must be > 0 Pa, got " + pressurePa);
    }
    double scale = t175(tempK) / pressurePa;
    double others = 0.0;
    double xs = 0.0;
    double sum = 0.0;
    int row = species * N;
    for (int j = 0; j < N; j++) {
      double xj = moleFractions[j];
      if (xj < 0.0) {
        throw new IllegalArgumentException("mole fraction of " + Species.of(j) + " is " + xj);
      }
      xs += xj;
      if (j != species && xj != 0.0) {
        others += xj;
        sum += xj / FULLER_COEF[row + j];
      }
    }
    checkSum(xs);
    if (others < 1e-12 * xs) {
      return FULLER_COEF[row + species] * scale;
    }
    // (others/xs) / (sum/(xs * scale)) = others * scale / sum
    return others * scale / sum;
  }

  private static double checkSum(double xs) {
    if (!(xs > 0.0)) {
      throw new IllegalArgumentException("mole fractions must have a positive sum, got " + xs);
    }
    return xs;
  }

  private static void checkTemp(double tempK) {
    if (!(tempK > 0.0) || tempK == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException("temperature must be finite and > 0 K, got " + tempK);
    }
  }
}
