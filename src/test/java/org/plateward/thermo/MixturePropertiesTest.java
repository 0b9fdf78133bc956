package org.plateward.thermo;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class MixturePropertiesTest {

  private static final int CH4 = Species.CH4.ordinal();
  private static final int H2O = Species.H2O.ordinal();
  private static final int CO2 = Species.CO2.ordinal();
  private static final int H2 = Species.H2.ordinal();
  private static final int O2 = Species.O2.ordinal();
  private static final int N2 = Species.N2.ordinal();

  private static double[] x(int a, double xa, int b, double xb) {
    double[] x = new double[Species.COUNT];
    x[a] = xa;
    x[b] = xb;
    return x;
  }

  /** Dry air as N2/O2 with argon lumped into N2 (the difference is below 0.5 % in μ and λ). */
  private static double[] air() {
    return x(N2, 0.79, O2, 0.21);
  }

  /**
   * Incropera, DeWitt, Bergman &amp; Lavine, Fundamentals of Heat and Mass Transfer, Table A.4
   * (air and nitrogen at 1 atm) — values from memory [M]: air 300 K μ = 184.6e-7 Pa s,
   * λ = 26.3e-3 W/(m K); air 1000 K μ = 424.4e-7, λ = 66.7e-3; N2 300 K μ = 178.2e-7,
   * λ = 25.9e-3. Tolerances: 4 % in μ (Chapman–Enskog with Svehla's parameters plus Wilke),
   * 5 % in λ (modified Eucken plus Mason–Saxena), the stated accuracy class of these methods
   * in Poling et al. (2001).
   */
  @ParameterizedTest(name = "{0} at {1} K")
  @CsvSource({
    "air, 300, 184.6e-7, 26.3e-3",
    "air, 1000, 424.4e-7, 66.7e-3",
    "N2, 300, 178.2e-7, 25.9e-3"
  })
  void matchesHandbookAirAndNitrogen(String gas, double tempK, double mu, double lambda) {
    double[] xs = gas.equals("air") ? air() : x(N2, 1.0, O2, 0.0);
    assertThat(MixtureProperties.viscosityPaS(xs, tempK)).isCloseTo(mu, within(0.04 * mu));
    assertThat(MixtureProperties.thermalConductivityWPerMK(xs, tempK))
        .isCloseTo(lambda, within(0.05 * lambda));
  }

  /**
   * Dilute steam at 1000 K from the IAPWS 2008 viscosity and IAPWS 2011 conductivity releases'
   * zero-density terms (evaluated by hand here from T̄ = 1000/647.096): μ0 = 37.61 μPa s,
   * λ0 = 95.8 mW/(m K). Steam-table value at 1 bar, 1000 K (from memory [M]): about 37.6 μPa s.
   */
  @Test
  void steamMatchesIapwsDiluteGasTerms() {
    double tr = 1000.0 / 647.096;
    double mu0 = 100 * Math.sqrt(tr)
        / (1.67752 + 2.20462 / tr + 0.6366564 / (tr * tr) - 0.241605 / (tr * tr * tr)) * 1e-6;
    assertThat(MixtureProperties.pureViscosityPaS(H2O, 1000.0)).isCloseTo(mu0, within(1e-12));
    assertThat(mu0).isCloseTo(37.6e-6, within(0.2e-6));
    assertThat(MixtureProperties.pureThermalConductivityWPerMK(H2O, 1000.0))
        .isCloseTo(95.8e-3, within(0.2e-3));
  }

  /**
   * Measured binary diffusivities at 1 atm as tabulated by Marrero &amp; Mason (1972), J. Phys.
   * Chem. Ref. Data 1, 3, and reproduced in Poling et al. (2001) Table 11-2 — values from
   * memory [M]: CO2–N2 at 298 K 0.167 cm²/s, H2–N2 at 298 K 0.784 cm²/s. Fuller's method is
   * quoted with about 5 % average error (Poling et al. 2001, §11-4); tolerance 5 %.
   */
  @ParameterizedTest
  @CsvSource({"CO2, N2, 0.167e-4", "H2, N2, 0.784e-4"})
  void fullerMatchesMeasuredBinaryDiffusivity(Species a, Species b, double dM2PerS) {
    double d = MixtureProperties.binaryDiffusivityM2PerS(a.ordinal(), b.ordinal(), 298.0, 101325);
    assertThat(d).isCloseTo(dM2PerS, within(0.05 * dM2PerS));
  }

  @Test
  void binaryDiffusivityIsSymmetricAndScalesAsFullerSays() {
    double d1 = MixtureProperties.binaryDiffusivityM2PerS(CH4, H2O, 800, 2e5);
    assertThat(MixtureProperties.binaryDiffusivityM2PerS(H2O, CH4, 800, 2e5)).isEqualTo(d1);
    // D ∝ T^1.75 / p (Fuller et al. 1966).
    double d2 = MixtureProperties.binaryDiffusivityM2PerS(CH4, H2O, 1600, 4e5);
    assertThat(d2 / d1).isCloseTo(Math.pow(2.0, 1.75) / 2.0, within(1e-12));
  }

  @Test
  void blancReducesToBinaryAndHandlesPureLimit() {
    // Binary mixture: D_im = (1 - x_i) / (x_j / D_ij) = D_ij for any composition.
    double dBin = MixtureProperties.binaryDiffusivityM2PerS(CH4, N2, 900, 3e5);
    double dMix = MixtureProperties.diffusivityInMixtureM2PerS(CH4, x(CH4, 0.3, N2, 0.7), 900, 3e5);
    assertThat(dMix).isCloseTo(dBin, within(1e-12 * dBin));
    // Trace species in an equimolar two-gas carrier: harmonic mean of the binaries.
    double[] xs = x(H2, 0.5, H2O, 0.5);
    double dA = MixtureProperties.binaryDiffusivityM2PerS(CH4, H2, 900, 3e5);
    double dB = MixtureProperties.binaryDiffusivityM2PerS(CH4, H2O, 900, 3e5);
    assertThat(MixtureProperties.diffusivityInMixtureM2PerS(CH4, xs, 900, 3e5))
        .isCloseTo(2.0 / (1.0 / dA + 1.0 / dB), within(1e-12 * dA));
    // Pure species: the self-diffusivity instead of 0/0.
    double[] pure = x(CH4, 1.0, N2, 0.0);
    assertThat(MixtureProperties.diffusivityInMixtureM2PerS(CH4, pure, 900, 3e5))
        .isEqualTo(MixtureProperties.binaryDiffusivityM2PerS(CH4, CH4, 900, 3e5));
  }

  @Test
  void mixingRulesReduceToPureSpeciesAndIgnoreNormalisation() {
    for (int i = 0; i < Species.COUNT; i++) {
      double[] pure = new double[Species.COUNT];
      pure[i] = 1.0;
      // Wilke: Φ_ii = [1 + 1]² / √16 = 1, so a pure gas returns its own value.
      assertThat(MixtureProperties.viscosityPaS(pure, 700))
          .isCloseTo(MixtureProperties.pureViscosityPaS(i, 700), within(1e-15));
      assertThat(MixtureProperties.thermalConductivityWPerMK(pure, 700))
          .isCloseTo(MixtureProperties.pureThermalConductivityWPerMK(i, 700), within(1e-14));
      assertThat(MixtureProperties.heatCapacityJPerMolK(pure, 700))
          .isEqualTo(IdealGasThermo.heatCapacityJPerMolK(i, 700));
    }
    double[] a = {0.1, 0.3, 0.05, 0.05, 0.4, 0.0, 0.1};
    double[] b = new double[7];
    for (int i = 0; i < 7; i++) {
      b[i] = 2.5 * a[i];
    }
    assertThat(MixtureProperties.viscosityPaS(b, 900))
        .isCloseTo(MixtureProperties.viscosityPaS(a, 900), within(1e-18));
    assertThat(MixtureProperties.heatCapacityJPerMolK(b, 900))
        .isCloseTo(MixtureProperties.heatCapacityJPerMolK(a, 900), within(1e-10));
  }

  @Test
  void mixtureCpIsTheMoleAverage() {
    double[] xs = x(CH4, 0.25, H2O, 0.75);
    double expected = 0.25 * IdealGasThermo.heatCapacityJPerMolK(Species.CH4, 800)
        + 0.75 * IdealGasThermo.heatCapacityJPerMolK(Species.H2O, 800);
    assertThat(MixtureProperties.heatCapacityJPerMolK(xs, 800)).isCloseTo(expected, within(1e-12));
  }

  @Test
  void rejectsBadInput() {
    assertThatThrownBy(() -> MixtureProperties.viscosityPaS(new double[7], 500))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("positive sum");
    assertThatThrownBy(() -> MixtureProperties.viscosityPaS(x(CO2, -0.1, N2, 1.1), 500))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("CO2");
    assertThatThrownBy(() -> MixtureProperties.binaryDiffusivityM2PerS(0, 1, 500, 0.0))
        .isInstanceOf(IllegalArgumentException.class);
  }
}
