package org.plateward.kinetics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.plateward.thermo.Reaction;

class XuFromentKineticsTest {

  private static java.util.List<Double> boxed(double[] values) {
    return java.util.Arrays.stream(values).boxed().toList();
  }

  private static double[] constants(double tempK) {
    double[] c = new double[XuFromentKinetics.CONSTANTS];
    XuFromentKinetics.constants(tempK, c);
    return c;
  }

  private static double[] rates(double tempK, double ch4, double h2o, double co, double co2,
      double h2) {
    double[] r = new double[3];
    XuFromentKinetics.rates(constants(tempK), ch4, h2o, co, co2, h2, r);
    return r;
  }

  /**
   * One rate set computed here by hand from Xu &amp; Froment (1989), AIChE J. 35, 88, Table 6
   * (A and E as printed, R = 8.314, rates in kmol/(kg h), converted at the end), at 823 K,
   * pCH4 = 2, pH2O = 6, pCO = 0.1, pCO2 = 0.5, pH2 = 1 bar. The equilibrium constants are
   * exp(−ΔG°/RT) from the JANAF-checked thermo (see ReactionTest).
   */
  @Test
  void matchesHandComputationFromTable6() {
    double t = 823.0;
    double rt = 8.314 * t;
    double k1 = 4.225e15 * Math.exp(-240.1e3 / rt);
    double k2 = 1.955e6 * Math.exp(-67.13e3 / rt);
    double k3 = 1.020e15 * Math.exp(-243.9e3 / rt);
    double kCo = 8.23e-5 * Math.exp(70.65e3 / rt);
    double kH2 = 6.12e-9 * Math.exp(82.90e3 / rt);
    double kCh4 = 6.65e-4 * Math.exp(38.28e3 / rt);
    double kH2o = 1.77e5 * Math.exp(-88.68e3 / rt);
    double eq1 = Reaction.STEAM_REFORMING.equilibriumConstant(t);
    double eq2 = Reaction.WATER_GAS_SHIFT.equilibriumConstant(t);
    double ch4 = 2;
    double h2o = 6;
    double co = 0.1;
    double co2 = 0.5;
    double h2 = 1;
    double den = 1 + kCo * co + kH2 * h2 + kCh4 * ch4 + kH2o * h2o / h2;
    double r1 = k1 / Math.pow(h2, 2.5) * (ch4 * h2o - Math.pow(h2, 3) * co / eq1) / (den * den);
    double r2 = k2 / h2 * (co * h2o - h2 * co2 / eq2) / (den * den);
    double r3 = k3 / Math.pow(h2, 3.5)
        * (ch4 * h2o * h2o - Math.pow(h2, 4) * co2 / (eq1 * eq2)) / (den * den);
    double toSi = 1000.0 / 3600.0; // kmol/(kg h) -> mol/(kg s)

    double[] r = rates(t, ch4, h2o, co, co2, h2);
    assertThat(r[0]).isCloseTo(r1 * toSi, within(1e-12 * Math.abs(r1)));
    assertThat(r[1]).isCloseTo(r2 * toSi, within(1e-12 * Math.abs(r2)));
    assertThat(r[2]).isCloseTo(r3 * toSi, within(1e-12 * Math.abs(r3)));
    // Far from equilibrium here: all three run forward.
    assertThat(boxed(r)).allSatisfy(v -> assertThat(v).isPositive());
  }

  /**
   * Table 5 of Xu &amp; Froment (1989), values at the reference temperature (648 K for k1–k3,
   * K_CO, K_H2; 823 K for K_CH4, K_H2O), REFERENCES.md §1 [V2]. A exp(−E/RT_ref) reproduces
   * them within 1.5 % (the limit set by printing E to 0.1 kJ/mol); the transcription typos
   * listed there (k1 4.255e15, k2 1.995e6) would fail this.
   */
  @Test
  void reproducesTable5AtReferenceTemperatures() {
    double[] c648 = constants(648.0);
    double[] c823 = constants(823.0);
    double toTable = 3.6; // mol/(kg s) -> kmol/(kg h)
    assertThat(c648[XuFromentKinetics.K1_RATE] * toTable / 1.842e-4).isCloseTo(1, within(0.015));
    assertThat(c648[XuFromentKinetics.K2_RATE] * toTable / 7.558).isCloseTo(1, within(0.015));
    assertThat(c648[XuFromentKinetics.K3_RATE] * toTable / 2.193e-5).isCloseTo(1, within(0.015));
    assertThat(c648[XuFromentKinetics.K_CO] / 40.91).isCloseTo(1, within(0.015));
    assertThat(c648[XuFromentKinetics.K_H2] / 0.02960).isCloseTo(1, within(0.015));
    assertThat(c823[XuFromentKinetics.K_CH4] / 0.1791).isCloseTo(1, within(0.015));
    assertThat(c823[XuFromentKinetics.K_H2O] / 0.4152).isCloseTo(1, within(0.015));
  }

  @ParameterizedTest
  @ValueSource(doubles = {700.0, 823.0, 950.0, 1100.0})
  void eachRateChangesSignThroughItsEquilibrium(double tempK) {
    // Law of mass action: each driving force vanishes where Q = K (K from JANAF thermo).
    double k1 = Reaction.STEAM_REFORMING.equilibriumConstant(tempK);
    double k2 = Reaction.WATER_GAS_SHIFT.equilibriumConstant(tempK);
    double ch4 = 2;
    double h2o = 6;
    double h2 = 1.5;
    // Reaction I: pCO at equilibrium = pCH4 pH2O K1 / pH2^3.
    double coEq = ch4 * h2o * k1 / (h2 * h2 * h2);
    assertThat(rates(tempK, ch4, h2o, 0.95 * coEq, 0.5, h2)[0]).isPositive();
    assertThat(rates(tempK, ch4, h2o, 1.05 * coEq, 0.5, h2)[0]).isNegative();
    // Reaction II: pCO2 at equilibrium = pCO pH2O K2 / pH2.
    double co = 0.1;
    double co2Eq2 = co * h2o * k2 / h2;
    assertThat(rates(tempK, ch4, h2o, co, 0.95 * co2Eq2, h2)[1]).isPositive();
    assertThat(rates(tempK, ch4, h2o, co, 1.05 * co2Eq2, h2)[1]).isNegative();
    // Reaction III: pCO2 at equilibrium = pCH4 pH2O^2 K1 K2 / pH2^4.
    double co2Eq3 = ch4 * h2o * h2o * k1 * k2 / (h2 * h2 * h2 * h2);
    assertThat(rates(tempK, ch4, h2o, co, 0.95 * co2Eq3, h2)[2]).isPositive();
    assertThat(rates(tempK, ch4, h2o, co, 1.05 * co2Eq3, h2)[2]).isNegative();
  }

  @ParameterizedTest
  @ValueSource(doubles = {750.0, 900.0, 1050.0})
  void allRatesVanishAtJointEquilibriumAndReverseTogether(double tempK) {
    double k1 = Reaction.STEAM_REFORMING.equilibriumConstant(tempK);
    double k2 = Reaction.WATER_GAS_SHIFT.equilibriumConstant(tempK);
    double ch4 = 1.0;
    double h2o = 3.0;
    double h2 = 4.0;
    double co = ch4 * h2o * k1 / (h2 * h2 * h2);
    double co2 = co * h2o * k2 / h2;
    double[] atEq = rates(tempK, ch4, h2o, co, co2, h2);
    // More hydrogen pushes all three backwards, less pushes them forwards (Le Chatelier).
    double[] moreH2 = rates(tempK, ch4, h2o, co, co2, 1.02 * h2);
    double[] lessH2 = rates(tempK, ch4, h2o, co, co2, 0.98 * h2);
    assertThat(boxed(moreH2)).allSatisfy(v -> assertThat(v).isNegative());
    assertThat(boxed(lessH2)).allSatisfy(v -> assertThat(v).isPositive());
    // At equilibrium the rates are round-off compared with those of a 2 % perturbation.
    for (int i = 0; i < 3; i++) {
      assertThat(Math.abs(atEq[i])).isLessThan(1e-9 * Math.abs(lessH2[i]));
    }
  }

  @Test
  void equilibriumConstantsComeFromThermoAndAgreeWithTwigg() {
    double[] c = constants(823.0);
    assertThat(c[XuFromentKinetics.K1_EQ] / Reaction.STEAM_REFORMING.equilibriumConstant(823.0))
        .isCloseTo(1.0, within(1e-12));
    assertThat(c[XuFromentKinetics.K2_EQ] / Reaction.WATER_GAS_SHIFT.equilibriumConstant(823.0))
        .isCloseTo(1.0, within(1e-12));
    // Twigg (Catalyst Handbook 1989) correlation, REFERENCES.md §1 [V2]: within 6 % of JANAF.
    assertThat(c[XuFromentKinetics.K1_EQ] / Math.exp(-26830.0 / 823.0 + 30.114))
        .isCloseTo(1.0, within(0.06));
  }

  @Test
  void hydrogenFreeFeedGivesFiniteRates() {
    double[] r = rates(823.0, 3.0, 9.0, 0.0, 0.0, 0.0);
    assertThat(boxed(r)).allSatisfy(v -> assertThat(v).isFinite());
    assertThat(r[0]).isPositive();
    assertThat(r[1]).isZero(); // no CO yet, no shift
    assertThat(r[2]).isPositive();
    // The floor is what is used: pH2 = 0 and pH2 = floor give the same rates.
    double[] rf = rates(823.0, 3.0, 9.0, 0.0, 0.0, XuFromentKinetics.PH2_FLOOR_BAR);
    assertThat(r).containsExactly(rf);
  }

  @ParameterizedTest
  @CsvSource({"2.0, 4.0", "0.5, 1.0"})
  void activityIsNotApplied(double ch4, double h2o) {
    // Rates are linear in k_i: doubling k1..k3 by hand doubles r1..r3, nothing else changes.
    double[] c = constants(850.0);
    double[] r = new double[3];
    XuFromentKinetics.rates(c, ch4, h2o, 0.2, 0.3, 1.0, r);
    for (int i = 0; i < 3; i++) {
      c[i] *= 2.0;
    }
    double[] r2 = new double[3];
    XuFromentKinetics.rates(c, ch4, h2o, 0.2, 0.3, 1.0, r2);
    for (int i = 0; i < 3; i++) {
      assertThat(r2[i]).isCloseTo(2.0 * r[i], within(1e-15 * Math.abs(r[i])));
    }
  }
}
