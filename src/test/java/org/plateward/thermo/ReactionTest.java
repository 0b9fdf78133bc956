package org.plateward.thermo;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.EnumSource;

class ReactionTest {

  /**
   * Standard reaction enthalpies at 298.15 K computed from NIST-JANAF ΔfH° (Chase 1998),
   * REFERENCES.md §3 [C from V1]; kJ/mol.
   */
  @ParameterizedTest(name = "{0}")
  @CsvSource({
    "STEAM_REFORMING, 206.17",
    "WATER_GAS_SHIFT, -41.17",
    "DRY_COMBINED, 165.00",
    "METHANE_COMBUSTION, -802.30"
  })
  void enthalpyAt298MatchesJanaf(Reaction r, double dhKJ) {
    // 0.03 kJ/mol: the JANAF values are given to 0.01 kJ/mol and the WebBook's H constants
    // (Shomate) round the formation enthalpies to ~3 J/mol per species.
    assertThat(r.enthalpyJPerMol(298.15) * 1e-3).isCloseTo(dhKJ, within(0.03));
  }

  /** ΔH° at 800 and 1000 K from the JANAF tables, REFERENCES.md §3 [C]; kJ/mol to 0.1. */
  @ParameterizedTest(name = "{0} at {1} K")
  @CsvSource({
    "STEAM_REFORMING, 800, 222.8",
    "STEAM_REFORMING, 1000, 225.7",
    "WATER_GAS_SHIFT, 800, -36.8",
    "WATER_GAS_SHIFT, 1000, -34.8"
  })
  void enthalpyAtTemperatureMatchesJanaf(Reaction r, double tempK, double dhKJ) {
    assertThat(r.enthalpyJPerMol(tempK) * 1e-3).isCloseTo(dhKJ, within(0.1));
  }

  /**
   * log10 K from the JANAF log Kf columns (Chase 1998), REFERENCES.md §3 [C], 1 bar standard
   * state (K_SMR in bar²). Tolerance 0.005 in log10 K, i.e. 1.2 % in K or about 0.08 kJ/mol in
   * ΔG° at 800 K: the table is rounded to 0.001 and the Shomate fits deviate from JANAF by a
   * few J/mol per species. It is four times tighter than the 5.5 % spread of the Twigg
   * correlation, so a wrong sign convention or a wrong standard state would fail.
   */
  @ParameterizedTest(name = "{0} at {1} K")
  @CsvSource({
    "STEAM_REFORMING, 800, -1.509",
    "STEAM_REFORMING, 1000, 1.419",
    "STEAM_REFORMING, 1200, 3.391",
    "WATER_GAS_SHIFT, 800, 0.626",
    "WATER_GAS_SHIFT, 1000, 0.158",
    "WATER_GAS_SHIFT, 1200, -0.136",
    "DRY_COMBINED, 800, -0.883",
    "DRY_COMBINED, 1000, 1.577",
    "DRY_COMBINED, 1200, 3.255"
  })
  void equilibriumConstantMatchesJanaf(Reaction r, double tempK, double log10K) {
    assertThat(Math.log10(r.equilibriumConstant(tempK))).isCloseTo(log10K, within(0.005));
  }

  /**
   * The Twigg (Catalyst Handbook, 2nd ed. 1989) correlations, REFERENCES.md §1 [V2], deviate
   * from JANAF by ≤ 5.5 % over 800–1200 K [C]; our K must agree within 6 %.
   */
  @ParameterizedTest
  @CsvSource({"800", "900", "1000", "1100", "1200"})
  void equilibriumConstantAgreesWithTwiggCorrelation(double tempK) {
    double k1Twigg = Math.exp(-26830.0 / tempK + 30.114);
    double k2Twigg = Math.exp(4400.0 / tempK - 4.036);
    assertThat(Reaction.STEAM_REFORMING.equilibriumConstant(tempK) / k1Twigg)
        .isCloseTo(1.0, within(0.06));
    assertThat(Reaction.WATER_GAS_SHIFT.equilibriumConstant(tempK) / k2Twigg)
        .isCloseTo(1.0, within(0.06));
  }

  @ParameterizedTest
  @EnumSource(Reaction.class)
  void stoichiometryConservesElementsAndMass(Reaction r) {
    double[] nu = r.stoichiometry();
    assertThat(nu).hasSize(Species.COUNT);
    int c = 0;
    int h = 0;
    int o = 0;
    int n = 0;
    double mass = 0.0;
    for (Species sp : Species.values()) {
      double v = nu[sp.ordinal()];
      assertThat(v).isEqualTo(Math.rint(v));
      c += (int) v * sp.carbonAtoms();
      h += (int) v * sp.hydrogenAtoms();
      o += (int) v * sp.oxygenAtoms();
      n += (int) v * sp.nitrogenAtoms();
      mass += v * sp.molarMassKgPerMol();
    }
    assertThat(new int[] {c, h, o, n}).containsExactly(0, 0, 0, 0);
    // Mass conservation with the molar masses (an independent check on the atom counts).
    assertThat(mass).isCloseTo(0.0, within(1e-12));
  }

  @ParameterizedTest
  @EnumSource(Reaction.class)
  void reactionPropertiesAreConsistent(Reaction r) {
    // Hess's law: III = I + II, checked below for DRY_COMBINED; here van 't Hoff:
    // d ln K / dT = ΔH°/(R T²), central difference at 900 K.
    double t = 900.0;
    double dt = 0.01;
    double dlnK = (Math.log(r.equilibriumConstant(t + dt))
        - Math.log(r.equilibriumConstant(t - dt))) / (2 * dt);
    double expected = r.enthalpyJPerMol(t) / (IdealGasThermo.R_J_PER_MOL_K * t * t);
    assertThat(dlnK).isCloseTo(expected, within(1e-5 * Math.abs(expected)));
    // The copy cannot change the reaction.
    r.stoichiometry()[0] = 99.0;
    assertThat(r.stoichiometricCoefficient(0)).isNotEqualTo(99.0);
  }

  @ParameterizedTest
  @CsvSource({"300", "800", "1200"})
  void reactionThreeIsSumOfOneAndTwo(double tempK) {
    // Hess's law for Xu–Froment III = I + II: K3 = K1 K2, ΔH3 = ΔH1 + ΔH2.
    double k3 = Reaction.DRY_COMBINED.equilibriumConstant(tempK);
    double k1k2 = Reaction.STEAM_REFORMING.equilibriumConstant(tempK)
        * Reaction.WATER_GAS_SHIFT.equilibriumConstant(tempK);
    assertThat(k3 / k1k2).isCloseTo(1.0, within(1e-10));
    assertThat(Reaction.DRY_COMBINED.enthalpyJPerMol(tempK))
        .isCloseTo(Reaction.STEAM_REFORMING.enthalpyJPerMol(tempK)
            + Reaction.WATER_GAS_SHIFT.enthalpyJPerMol(tempK), within(1e-6));
  }
}
