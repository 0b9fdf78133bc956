package org.plateward.thermo;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.EnumSource;

class IdealGasThermoTest {

  /**
   * NIST-JANAF Thermochemical Tables (Chase 1998), tables C-067, H-064, C-093, C-095, H-050,
   * O-029, N-023, as transcribed in /work/shared/REFERENCES.md §3 [V1 primary]: ΔfH°(298.15)
   * kJ/mol, Cp(298.15) and Cp(1000 K) J/(mol K).
   */
  @ParameterizedTest(name = "{0}")
  @CsvSource({
    "CH4, -74.873, 35.639, 71.795",
    "H2O, -241.826, 33.590, 41.268",
    "CO, -110.527, 29.142, 33.183",
    "CO2, -393.522, 37.129, 54.308",
    "H2, 0.0, 28.836, 30.205",
    "O2, 0.0, 29.376, 34.870",
    "N2, 0.0, 29.124, 32.697"
  })
  void matchesJanafHeatCapacityAndFormationEnthalpy(
      Species sp, double dfhKJ, double cp298, double cp1000) {
    // The WebBook states its Shomate fits reproduce JANAF cp to <= 0.01 J/(mol K)
    // (REFERENCES.md §3); 0.015 allows for the rounding of the tabulated values.
    assertThat(IdealGasThermo.heatCapacityJPerMolK(sp, 298.15)).isCloseTo(cp298, within(0.015));
    assertThat(IdealGasThermo.heatCapacityJPerMolK(sp, 1000.0)).isCloseTo(cp1000, within(0.015));
    // JANAF convention: h(298.15 K) = ΔfH°; the Shomate F/H coefficients round to ~3 J/mol.
    assertThat(IdealGasThermo.enthalpyJPerMol(sp, 298.15)).isCloseTo(dfhKJ * 1e3, within(10.0));
  }

  /**
   * S°(298.15 K, 1 bar) from the NIST-JANAF tables (Chase 1998) — values from memory [M], not
   * in REFERENCES.md; the published reaction-level check is through K below.
   */
  @ParameterizedTest(name = "{0}")
  @CsvSource({
    "CH4, 186.251",
    "H2O, 188.834",
    "CO, 197.660",
    "CO2, 213.785",
    "H2, 130.680",
    "O2, 205.152",
    "N2, 191.609"
  })
  void entropyAt298MatchesJanafFromMemory(Species sp, double s298) {
    assertThat(IdealGasThermo.entropyJPerMolK(sp, 298.15)).isCloseTo(s298, within(0.1));
  }

  @ParameterizedTest
  @EnumSource(Species.class)
  void enthalpyAndEntropyAreConsistentWithHeatCapacity(Species sp) {
    // Analytic identities: dh/dT = cp and ds/dT = cp/T (central differences, step 0.01 K),
    // checked over 250–3000 K including the extrapolated range below the fit.
    for (double t = 250.0; t <= 3000.0; t += 37.0) {
      double dt = 0.01;
      double dh = (IdealGasThermo.enthalpyJPerMol(sp, t + dt)
          - IdealGasThermo.enthalpyJPerMol(sp, t - dt)) / (2 * dt);
      double ds = (IdealGasThermo.entropyJPerMolK(sp, t + dt)
          - IdealGasThermo.entropyJPerMolK(sp, t - dt)) / (2 * dt);
      double cp = IdealGasThermo.heatCapacityJPerMolK(sp, t);
      assertThat(dh).as("dh/dT at %s K", t).isCloseTo(cp, within(1e-4 * cp));
      assertThat(ds * t).as("T ds/dT at %s K", t).isCloseTo(cp, within(1e-4 * cp));
      double g = IdealGasThermo.gibbsJPerMol(sp, t);
      assertThat(g).isCloseTo(
          IdealGasThermo.enthalpyJPerMol(sp, t) - t * IdealGasThermo.entropyJPerMolK(sp, t),
          within(1e-6 * Math.abs(g) + 1e-6));
    }
  }

  @ParameterizedTest
  @EnumSource(Species.class)
  void valuesAreContinuousAcrossRangeBoundariesAndExtrapolation(Species sp) {
    // Boundaries of the WebBook range splits and of the constant-cp extrapolation.
    double[] boundaries = {100, 298, 500, 700, 1000, 1200, 1300, 1700, 2000, 2500, 6000};
    for (double tb : boundaries) {
      double lo = tb * (1 - 1e-12);
      double hi = tb * (1 + 1e-12);
      assertThat(IdealGasThermo.enthalpyJPerMol(sp, hi))
          .as("h jump at %s K", tb)
          // 1e-4 J/mol: far below the published fits' own 0.1–13 J/mol boundary mismatch.
          .isCloseTo(IdealGasThermo.enthalpyJPerMol(sp, lo), within(1e-4));
      assertThat(IdealGasThermo.entropyJPerMolK(sp, hi))
          .as("s jump at %s K", tb)
          .isCloseTo(IdealGasThermo.entropyJPerMolK(sp, lo), within(1e-8));
      // cp keeps the published step; the largest is CH4 at 1300 K, 0.19 J/(mol K).
      assertThat(IdealGasThermo.heatCapacityJPerMolK(sp, hi))
          .isCloseTo(IdealGasThermo.heatCapacityJPerMolK(sp, lo), within(0.2));
    }
    // The F/G shifts that make h continuous stay below 13 J/mol (published fits' own mismatch).
    assertThat(IdealGasThermo.MAX_BOUNDARY_SHIFT_H[sp.ordinal()]).isLessThan(13.0);
    // Finite from 250 K to 1800 K, the range the reactor model uses, and beyond.
    for (double t : new double[] {50, 250, 1800, 7000}) {
      assertThat(IdealGasThermo.enthalpyJPerMol(sp, t)).isFinite();
      assertThat(IdealGasThermo.gibbsJPerMol(sp, t)).isFinite();
    }
  }

  @Test
  void batchEvaluationsMatchSingleSpeciesOnes() {
    double[] g = new double[Species.COUNT];
    double[] h = new double[Species.COUNT];
    double[] cp = new double[Species.COUNT];
    for (double t : new double[] {250, 298.15, 450, 999, 1000, 1250, 1800, 2600}) {
      IdealGasThermo.gibbsEnergiesJPerMol(t, g);
      IdealGasThermo.enthalpiesJPerMol(t, h);
      IdealGasThermo.heatCapacitiesJPerMolK(t, cp);
      for (Species sp : Species.values()) {
        int i = sp.ordinal();
        double gi = IdealGasThermo.gibbsJPerMol(sp, t);
        assertThat(g[i]).as("%s at %s K", sp, t).isCloseTo(gi, within(1e-9 * Math.abs(gi)));
        assertThat(h[i]).isEqualTo(IdealGasThermo.enthalpyJPerMol(sp, t));
        assertThat(cp[i]).isEqualTo(IdealGasThermo.heatCapacityJPerMolK(sp, t));
      }
    }
  }

  @Test
  void rejectsNonPhysicalTemperature() {
    assertThatThrownBy(() -> IdealGasThermo.enthalpyJPerMol(Species.CH4, 0.0))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> IdealGasThermo.gibbsJPerMol(Species.CH4, Double.NaN))
        .isInstanceOf(IllegalArgumentException.class);
  }

  /**
   * Molar masses printed in the NIST-JANAF tables (Chase 1998), g/mol — values from memory
   * [M]; CH4 16.0425 also in REFERENCES.md §9.
   */
  @ParameterizedTest(name = "{0}")
  @CsvSource({
    "CH4, 16.0425",
    "H2O, 18.0153",
    "CO, 28.0104",
    "CO2, 44.0098",
    "H2, 2.01588",
    "O2, 31.9988",
    "N2, 28.0134"
  })
  void molarMassesMatchJanaf(Species sp, double gPerMol) {
    assertThat(sp.molarMassKgPerMol() * 1e3).isCloseTo(gPerMol, within(1e-4 * gPerMol));
  }

  @Test
  void speciesOrderIsTheIndexContract() {
    assertThat(Species.COUNT).isEqualTo(Species.values().length);
    assertThat(Species.values())
        .containsExactly(Species.CH4, Species.H2O, Species.CO, Species.CO2, Species.H2,
            Species.O2, Species.N2);
  }
}
