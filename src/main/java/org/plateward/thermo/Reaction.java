package org.plateward.thermo;

/**
 * The gas-phase reactions of the plate reformer, with standard reaction properties from
 * {@link IdealGasThermo} (ideal gas, 1 bar standard state, water as vapour).
 *
 * <p>Stoichiometric coefficients are per species index ({@link Species#ordinal()}), negative
 * for reactants, per mole of reaction as written.
 */
public enum Reaction {
  /** Steam reforming, CH4 + H2O ⇌ CO + 3 H2 (Xu–Froment reaction I). */
  STEAM_REFORMING(-1, -1, 1, 0, 3, 0, 0),
  /** Water-gas shift, CO + H2O ⇌ CO2 + H2 (Xu–Froment reaction II). */
  WATER_GAS_SHIFT(0, -1, -1, 1, 1, 0, 0),
  /** Combined reforming to CO2, CH4 + 2 H2O ⇌ CO2 + 4 H2 (Xu–Froment reaction III). */
  DRY_COMBINED(-1, -2, 0, 1, 4, 0, 0),
  /** Complete methane combustion, CH4 + 2 O2 → CO2 + 2 H2O(g). */
  METHANE_COMBUSTION(-1, 2, 0, 1, 0, -2, 0);

  private final double[] nu;

  Reaction(double ch4, double h2o, double co, double co2, double h2, double o2, double n2) {
    this.nu = new double[] {ch4, h2o, co, co2, h2, o2, n2};
  }

  /**
   * Standard reaction enthalpy ΔH°(T) = Σ ν_i h_i(T).
   *
   * @param tempK temperature, K
   * @return ΔH°, J per mole of reaction (positive = endothermic)
   */
  public double enthalpyJPerMol(double tempK) {
    return IdealGasThermo.sumEnthalpyJPerMol(nu, tempK);
  }

  /**
   * Standard reaction Gibbs energy ΔG°(T) = Σ ν_i g°_i(T) at 1 bar.
   *
   * @param tempK temperature, K
   * @return ΔG°, J per mole of reaction
   */
  public double gibbsJPerMol(double tempK) {
    return IdealGasThermo.sumGibbsJPerMol(nu, tempK);
  }

  /**
   * Equilibrium constant K = exp(−ΔG°/RT) with the 1 bar standard state, so in partial
   * pressures in bar raised to Σν (bar² for steam reforming and for {@link #DRY_COMBINED},
   * dimensionless for the shift and for combustion).
   *
   * @param tempK temperature, K
   * @return K, bar^(Σν)
   */
  public double equilibriumConstant(double tempK) {
    return Math.exp(-gibbsJPerMol(tempK) / (IdealGasThermo.R_J_PER_MOL_K * tempK));
  }

  /**
   * Stoichiometric coefficients per species index (a fresh copy; the caller may keep it).
   *
   * @return ν_i, negative for reactants
   */
  public double[] stoichiometry() {
    return nu.clone();
  }

  /**
   * One stoichiometric coefficient, without copying.
   *
   * @param species species ordinal
   * @return ν_species
   */
  public double stoichiometricCoefficient(int species) {
    return nu[species];
  }

  /** @return Σ ν_i, the change in moles of gas per mole of reaction */
  public double moleChange() {
    double s = 0.0;
    for (double v : nu) {
      s += v;
    }
    return s;
  }
}
