package org.plateward.config;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.catchThrowableOfType;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.plateward.reactor.UnitSpec;
import org.plateward.reactor.Zone;

class UnitConfigLoaderTest {
  private static final double NM3_H_TO_MOL_S = 1.0 / 22.41396954e-3 / 3600.0; // CODATA 2018 Vm
  private static final double KG_H_STEAM_TO_MOL_S = 1.0 / 3600.0 / 18.01528e-3; // M(H2O), IUPAC

  @Test
  void theDemoUnitLoadsInSi() throws Exception {
    UnitSpec u = UnitConfigLoader.load(ConfigFixtures.DEMO);
    assertThat(u.name()).isEqualTo("TM-PR1");
    assertThat(u.site()).isNotBlank();
    var g = u.geometry();
    assertThat(g.lengthM()).isCloseTo(0.600, within(1e-12));
    assertThat(g.widthM()).isCloseTo(0.200, within(1e-12));
    assertThat(g.reformingGapM()).isCloseTo(2.0e-3, within(1e-15));
    assertThat(g.plateThicknessM()).isCloseTo(1.2e-3, within(1e-15));
    assertThat(g.bufferThicknessM()).isCloseTo(0.6e-3, within(1e-15));
    assertThat(g.channelPairs()).isEqualTo(24);
    assertThat(g.reformingCoating()).containsExactly(new Zone(0.0, 0.5));
    assertThat(g.combustionCoating()).hasSize(1);
    assertThat(g.combustionCoating().get(0).startM()).isCloseTo(0.050, within(1e-12));
    assertThat(g.combustionCoating().get(0).endM()).isCloseTo(0.500, within(1e-12));
    // copper: ITS-90 freezing point 1357.77 K (Preston-Thomas 1990) and JANAF Cu-001 latent
    // heat 206.7 kJ/kg, both REFERENCES.md §4
    assertThat(u.buffer().meltingPointK()).isEqualTo(1357.77);
    assertThat(u.buffer().latentHeatJPerKg()).isCloseTo(206.7e3, within(1e-6));
    assertThat(u.buffer().mushyBandK()).isEqualTo(2.0);
    assertThat(u.plate().materialLimitK()).isCloseTo(1150 + 273.15, within(1e-9));
    assertThat(u.catalyst().reformingLoadingKgPerM2()).isCloseTo(0.015, within(1e-12));
    assertThat(u.heatLoss().ambientK()).isCloseTo(298.15, within(1e-9));
    var op = u.operatingPoint();
    assertThat(op.reformingGasFlowMolPerS()).isCloseTo(19.5 * NM3_H_TO_MOL_S, within(1e-9));
    assertThat(op.steamFlowMolPerS()).isCloseTo(44 * KG_H_STEAM_TO_MOL_S, within(1e-9));
    assertThat(op.reformingInletTempK()).isCloseTo(833.15, within(1e-9));
    assertThat(op.reformingPressurePa()).isCloseTo(320e3, within(1e-6));
    assertThat(op.airFlowMolPerS()).isCloseTo(230 * NM3_H_TO_MOL_S, within(1e-9));
    assertThat(op.combustionPressurePa()).isCloseTo(130e3, within(1e-6));
    var f = u.feedGas();
    assertThat(f.methane() + f.hydrogen() + f.carbonDioxide() + f.nitrogen()).isCloseTo(1.0, within(1e-12));
    assertThat(u.grid().cells()).isEqualTo(80);
    assertThat(u.grid().refinement()).isCloseTo(3.5, within(1e-12));
    assertThat(u.grid().refinementWidthM()).isCloseTo(0.040, within(1e-12));
  }

  @Test
  void theDemoSteamToCarbonRatioIsNearThree() throws Exception {
    // issue 2 asks for S/C near 3 (common practice for nickel reforming catalysts)
    var u = UnitConfigLoader.load(ConfigFixtures.DEMO);
    double sc = u.operatingPoint().steamFlowMolPerS()
        / (u.operatingPoint().reformingGasFlowMolPerS() * u.feedGas().methane());
    assertThat(sc).isBetween(2.5, 3.5);
  }

  static Stream<ConfigFixtures.Case> cases() {
    return ConfigFixtures.cases().stream();
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("cases")
  void eachBrokenFileIsRefusedWithFileLineAndField(ConfigFixtures.Case c) {
    InvalidConfigException e =
        catchThrowableOfType(InvalidConfigException.class, () -> PlatewardConfig.load(c.file()));
    assertThat(e).as(c.name()).isNotNull();
    assertThat(e.errors().get(0).format()).startsWith(c.prefix()).contains(c.messagePart());
  }

  @Test
  void everyProblemIsReportedNotJustTheFirst() {
    Path file = ConfigFixtures.broken("many-errors");
    var e = catchThrowableOfType(InvalidConfigException.class, () -> PlatewardConfig.load(file));
    assertThat(e.errors()).extracting(ConfigError::field)
        .containsExactly("geometry.buffer_thickness", "operating_point.reforming_pressure", "model.cells");
    assertThat(e.errors()).extracting(ConfigError::line).containsExactly(
        ConfigFixtures.lineOf(file, "^buffer_thickness"),
        ConfigFixtures.lineOf(file, "^reforming_pressure"),
        ConfigFixtures.lineOf(file, "^cells"));
  }

  @Test
  void aMeltingPointBelowBothInletsGivesTwoErrors() {
    var e = catchThrowableOfType(InvalidConfigException.class,
        () -> PlatewardConfig.load(ConfigFixtures.broken("melt-below-inlet")));
    assertThat(e.errors()).extracting(ConfigError::message).hasSize(2)
        .anySatisfy(m -> assertThat(m).contains("reforming_inlet_temp"))
        .anySatisfy(m -> assertThat(m).contains("combustion_inlet_temp"));
  }

  @Test
  void aMisspeltKeyGetsADidYouMean() {
    Path file = ConfigFixtures.broken("misspelt-key");
    var e = catchThrowableOfType(InvalidConfigException.class, () -> PlatewardConfig.load(file));
    assertThat(e.errors()).extracting(ConfigError::format).contains(
        file + ":" + ConfigFixtures.lineOf(file, "^widht") + ": geometry.widht: unknown key; did you mean \"width\"?");
  }

  @Test
  void loadingWritesNothing() throws Exception {
    Path file = ConfigFixtures.broken("many-errors");
    byte[] before = Files.readAllBytes(file);
    FileTime mtime = Files.getLastModifiedTime(file);
    assertThatThrownBy(() -> PlatewardConfig.load(file)).isInstanceOf(InvalidConfigException.class);
    assertThat(Files.readAllBytes(file)).isEqualTo(before);
    assertThat(Files.getLastModifiedTime(file)).isEqualTo(mtime);
  }

  @Test
  void aMissingFileIsReportedByName(@TempDir Path dir) {
    Path file = dir.resolve("nothing-here.toml");
    var e = catchThrowableOfType(InvalidConfigException.class, () -> PlatewardConfig.load(file));
    assertThat(e.errors().get(0).format()).isEqualTo(file + ": no such file");
    assertThat(Files.exists(file)).isFalse();
  }

  @Test
  void tablesOwnedByLaterSectionsAreLeftAlone(@TempDir Path dir) throws Exception {
    Path file = dir.resolve("with-extra.toml");
    Files.writeString(file, Files.readString(ConfigFixtures.DEMO)
        + "\n[display]\nnote = \"read by a later version\"\n[history]\npath = \"x.db\"\n");
    assertThat(PlatewardConfig.load(file).unit().name()).isEqualTo("TM-PR1");
  }

  @Test
  void anUnknownKeyInsideAZoneIsReported(@TempDir Path dir) throws Exception {
    Path file = dir.resolve("zone-typo.toml");
    Files.writeString(file, Files.readString(ConfigFixtures.DEMO).replace(
        "{ start = \"50 mm\", end = \"500 mm\" }", "{ start = \"50 mm\", edn = \"500 mm\" }"));
    var e = catchThrowableOfType(InvalidConfigException.class, () -> PlatewardConfig.load(file));
    int line = ConfigFixtures.lineOf(file, "^combustion_coating");
    assertThat(e.errors()).extracting(ConfigError::format).containsExactly(
        file + ":" + line + ": geometry.combustion_coating[0].end: missing; every zone needs a start and an end",
        file + ":" + line + ": geometry.combustion_coating[0].edn: unknown key; did you mean \"end\"?");
  }

  @Test
  void overlappingZonesAndTemperaturesBelowAbsoluteZeroAreRefused(@TempDir Path dir) throws Exception {
    Path file = dir.resolve("overlap.toml");
    Files.writeString(file, Files.readString(ConfigFixtures.DEMO)
        .replace("reforming_coating = [{ start = \"0 mm\", end = \"500 mm\" }]",
            "reforming_coating = [{ start = \"0 mm\", end = \"300 mm\" }, { start = \"200 mm\", end = \"600 mm\" }]")
        .replace("ambient = \"25 degC\"", "ambient = \"-300 degC\""));
    var e = catchThrowableOfType(InvalidConfigException.class, () -> PlatewardConfig.load(file));
    assertThat(e.errors()).extracting(ConfigError::field)
        .containsExactly("geometry.reforming_coating[1]", "heat_loss.ambient");
    assertThat(e.errors().get(0).message()).contains("overlaps geometry.reforming_coating[0]");
    assertThat(e.errors().get(1).message()).contains("above absolute zero");
  }

  @Test
  void wholeNumbersMustBeWhole(@TempDir Path dir) throws Exception {
    Path file = dir.resolve("cells.toml");
    Files.writeString(file, Files.readString(ConfigFixtures.DEMO).replace("cells = 80", "cells = 40.5"));
    var e = catchThrowableOfType(InvalidConfigException.class, () -> PlatewardConfig.load(file));
    assertThat(e.errors()).extracting(ConfigError::format)
        .containsExactly(file + ":" + ConfigFixtures.lineOf(file, "^cells") + ": model.cells: must be a whole number, got 40.5");
  }

  @Test
  void everyBrokenFixtureIsCovered() throws Exception {
    // a fixture without a case would be a test nobody runs
    try (Stream<Path> files = Files.list(ConfigFixtures.broken("x").getParent())) {
      List<String> names = files.map(p -> p.getFileName().toString().replace(".toml", "")).sorted().toList();
      assertThat(names).containsExactlyInAnyOrderElementsOf(
          ConfigFixtures.cases().stream().map(ConfigFixtures.Case::name).toList());
    }
  }
}
