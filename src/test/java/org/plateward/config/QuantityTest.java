package org.plateward.config;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class QuantityTest {

  // SI prefixes and the degree Celsius: BIPM, The International System of Units (SI Brochure),
  // 9th ed. 2019, Table 7 (prefixes) and section 2.3.4 (t/degC = T/K - 273.15); bar = 1e5 Pa
  // is from Table 8 of the same brochure. These are exact by definition.
  @ParameterizedTest
  @CsvSource({
    "600 mm, LENGTH, 0.6",
    "60 cm, LENGTH, 0.6",
    "0.6 m, LENGTH, 0.6",
    "600mm, LENGTH, 0.6",
    "1.2e-3 m, LENGTH, 0.0012",
    "560 degC, TEMPERATURE, 833.15",
    "560 °C, TEMPERATURE, 833.15",
    "-40 degC, TEMPERATURE, 233.15",
    "1357.77 K, TEMPERATURE, 1357.77",
    "2 K, TEMPERATURE_DIFFERENCE, 2",
    "320 kPa, PRESSURE, 320000",
    "3.2 bar, PRESSURE, 320000",
    "0.32 MPa, PRESSURE, 320000",
    "8.96 g/cm3, DENSITY, 8960",
    "0.47 kJ/(kg K), SPECIFIC_HEAT, 470",
    "470 J/kg/K, SPECIFIC_HEAT, 470",
    "470 J/(kg·K), SPECIFIC_HEAT, 470",
    "340 W/(m K), CONDUCTIVITY, 340",
    "206.7 kJ/kg, LATENT_HEAT, 206700",
    "50 g/m2, AREAL_MASS, 0.05",
    "5 W/(m2 K), HEAT_TRANSFER_COEFFICIENT, 5",
    "3.6 kmol/h, GAS_FLOW, 1",
  })
  void convertsToSiByTheDefinitionOfTheUnit(String text, Dimension dim, double expectedSi) {
    assertThat(Quantity.parse(text, dim).valueSi()).isCloseTo(expectedSi, within(1e-9 * Math.max(1, expectedSi)));
  }

  @Test
  void normalCubicMetresUseTheIdealGasMolarVolumeAtZeroCelsiusAndOneAtmosphere() {
    // CODATA 2018: molar volume of an ideal gas at 273.15 K and 101.325 kPa,
    // Vm = 22.413 969 54... L/mol (exact, since R is exact in the 2019 SI); compared to 1e-9.
    double vmM3PerMol = 22.41396954e-3;
    double expectedMolPerS = 1.0 / vmM3PerMol / 3600.0;
    assertThat(Quantity.parse("1 Nm3/h", Dimension.GAS_FLOW).valueSi())
        .isCloseTo(expectedMolPerS, within(1e-9 * expectedMolPerS));
    assertThat(Quantity.parse("19.5 Nm³/h", Dimension.GAS_FLOW).valueSi())
        .isCloseTo(19.5 * expectedMolPerS, within(1e-9 * 19.5 * expectedMolPerS));
  }

  @Test
  void steamMassFlowUsesTheMolarMassOfWater() {
    // standard atomic weights (IUPAC 1997, as used by NIST-JANAF): H 1.00794, O 15.9994 g/mol
    double mWaterKgPerMol = (2 * 1.00794 + 15.9994) * 1e-3;
    double expected = 38.0 / 3600.0 / mWaterKgPerMol;
    assertThat(Quantity.parse("38 kg/h", Dimension.STEAM_FLOW).valueSi())
        .isCloseTo(expected, within(1e-9 * expected));
    assertThat(Quantity.parse("1 kg/s", Dimension.STEAM_FLOW).valueSi())
        .isCloseTo(1.0 / mWaterKgPerMol, within(1e-9 / mWaterKgPerMol));
  }

  @Test
  void aUnitOfAnotherDimensionIsRefusedNamingTheExpectedDimensionAndItsUnits() {
    assertThatThrownBy(() -> Quantity.parse("320 degC", Dimension.PRESSURE))
        .isInstanceOf(QuantityFormatException.class)
        .hasMessageContaining("absolute pressure")
        .hasMessageContaining("Pa, kPa, MPa, bar")
        .hasMessageContaining("\"degC\" is a unit of temperature");
  }

  @Test
  void anUnknownUnitIsNamedAsSuch() {
    assertThatThrownBy(() -> Quantity.parse("3 furlong", Dimension.LENGTH))
        .hasMessageContaining("\"furlong\" is not a known unit")
        .hasMessageContaining("m, cm, mm");
  }

  @Test
  void aNumberWithoutUnitOrTextWithoutNumberIsRefused() {
    assertThatThrownBy(() -> Quantity.parse("600", Dimension.LENGTH)).hasMessageStartingWith("has no unit");
    assertThatThrownBy(() -> Quantity.parse("long", Dimension.LENGTH))
        .hasMessageContaining("expected a number followed by a unit of length");
    assertThatThrownBy(() -> Quantity.parse("", Dimension.LENGTH)).isInstanceOf(QuantityFormatException.class);
  }

  @Test
  void unitsAreCaseSensitiveWherePrefixesDiffer() {
    // "mPa" (millipascal) is not "MPa" (megapascal); refusing it beats guessing
    assertThatThrownBy(() -> Quantity.parse("1 mPa", Dimension.PRESSURE)).isInstanceOf(QuantityFormatException.class);
  }

  @Test
  void aSymbolSharedByTwoDimensionsMeansTheSameInBoth() {
    for (Dimension a : Dimension.values()) {
      for (Dimension.UnitOfMeasure u : a.units()) {
        for (Dimension b : Dimension.accepting(u.symbol())) {
          Dimension.UnitOfMeasure other = b.find(u.symbol());
          assertThat(other.scale()).as(u.symbol() + " in " + a + " and " + b).isEqualTo(u.scale());
          assertThat(other.offset()).as(u.symbol() + " in " + a + " and " + b).isEqualTo(u.offset());
        }
      }
    }
  }
}
