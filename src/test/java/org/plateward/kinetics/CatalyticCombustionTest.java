package org.plateward.kinetics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class CatalyticCombustionTest {

  /**
   * k_s = s0 √(RT/(2π M_CH4)) with s0 = 0.01 from the Pt mechanism of Deutschmann et al. (1996),
   * REFERENCES.md §2b [C from V1]: 2.569, 2.872, 3.146 m/s (printed to 4 digits, so 0.05 %).
   */
  @ParameterizedTest
  @CsvSource({"800, 2.569", "1000, 2.872", "1200, 3.146"})
  void surfaceRateConstantMatchesReference(double tempK, double ksMPerS) {
    assertThat(CatalyticCombustion.surfaceRateConstantMPerS(tempK))
        .isCloseTo(ksMPerS, within(5e-4 * ksMPerS));
  }

  @Test
  void seriesResistancesCombineAsReciprocals() {
    // 1/k_eff = 1/k_s + 1/k_m (resistances in series).
    assertThat(CatalyticCombustion.effectiveRateConstantMPerS(2.0, 2.0)).isEqualTo(1.0);
    assertThat(CatalyticCombustion.effectiveRateConstantMPerS(3.0, 0.1))
        .isCloseTo(1.0 / (1.0 / 3.0 + 1.0 / 0.1), within(1e-15));
    // Limits: no surface reaction, no mass transfer.
    assertThat(CatalyticCombustion.effectiveRateConstantMPerS(0.0, 0.1)).isZero();
    assertThat(CatalyticCombustion.effectiveRateConstantMPerS(0.0, 0.0)).isZero();
    // Very fast surface: mass-transfer limited.
    assertThat(CatalyticCombustion.effectiveRateConstantMPerS(1e12, 0.05))
        .isCloseTo(0.05, within(1e-12));
  }
}
