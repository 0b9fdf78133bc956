package org.plateward.thermo;

/**
 * The seven gas species of the reforming and combustion channels. The ordinal is the index
 * into every per-species {@code double[COUNT]} array in Plateward (mole fractions, molar
 * flows, partial pressures), so the order below is fixed.
 *
 * <p>Molar masses are the IUPAC conventional atomic weights summed over the formula
 * (C 12.011, H 1.008, O 15.999, N 14.007 g/mol; CIAAW 2013 abridged values): they agree with
 * the molar masses printed in the NIST-JANAF tables (Chase 1998) to within 0.01 %.
 */
public enum Species {
  /** Methane. */
  CH4(1, 4, 0, 0),
  /** Water vapour (ideal gas, always the gas phase in Plateward). */
  H2O(0, 2, 1, 0),
  /** Carbon monoxide. */
  CO(1, 0, 1, 0),
  /** Carbon dioxide. */
  CO2(1, 0, 2, 0),
  /** Hydrogen. */
  H2(0, 2, 0, 0),
  /** Oxygen. */
  O2(0, 0, 2, 0),
  /** Nitrogen (inert here). */
  N2(0, 0, 0, 2);

  /** Number of species; the length of every per-species array. */
  public static final int COUNT = 7;

  private static final Species[] VALUES = values();

  private static final double C_G_PER_MOL = 12.011;
  private static final double H_G_PER_MOL = 1.008;
  private static final double O_G_PER_MOL = 15.999;
  private static final double N_G_PER_MOL = 14.007;

  private final int carbon;
  private final int hydrogen;
  private final int oxygen;
  private final int nitrogen;
  private final double molarMassKgPerMol;

  Species(int carbon, int hydrogen, int oxygen, int nitrogen) {
    this.carbon = carbon;
    this.hydrogen = hydrogen;
    this.oxygen = oxygen;
    this.nitrogen = nitrogen;
    this.molarMassKgPerMol =
        1e-3
            * (carbon * C_G_PER_MOL
                + hydrogen * H_G_PER_MOL
                + oxygen * O_G_PER_MOL
                + nitrogen * N_G_PER_MOL);
  }

  /** @return molar mass in kg/mol */
  public double molarMassKgPerMol() {
    return molarMassKgPerMol;
  }

  /** @return carbon atoms per molecule */
  public int carbonAtoms() {
    return carbon;
  }

  /** @return hydrogen atoms per molecule */
  public int hydrogenAtoms() {
    return hydrogen;
  }

  /** @return oxygen atoms per molecule */
  public int oxygenAtoms() {
    return oxygen;
  }

  /** @return nitrogen atoms per molecule */
  public int nitrogenAtoms() {
    return nitrogen;
  }

  /**
   * The species with a given index, without the array copy of {@code values()}.
   *
   * @param index the ordinal, 0..COUNT-1
   * @return the species
   */
  public static Species of(int index) {
    return VALUES[index];
  }
}
