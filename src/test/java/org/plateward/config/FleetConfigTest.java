package org.plateward.config;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.signals.Signal;

/**
 * Fleet files: the example under config/examples/fleet loads, the single-unit file keeps its
 * meaning, and each fleet error comes as file:line: field: message. Expected lines are found
 * by a plain text search of the file (ConfigFixtures.lineOf), not by the loader's scanner.
 */
class FleetConfigTest {
  static final Path EXAMPLE = Path.of("config", "examples", "fleet");

  @TempDir Path dir;

  private Path fleet(String text) throws Exception {
    Path f = dir.resolve("fleet.toml");
    Files.writeString(f, text);
    return f;
  }

  private static String example(String name) {
    return EXAMPLE.resolve(name).toAbsolutePath().toString();
  }

  @Test
  void theExampleLoadsWithTwoUnitsEachWithItsOwnTagMap() throws Exception {
    FleetConfig f = FleetConfig.load(EXAMPLE.resolve("fleet.toml"));
    assertThat(f.listsUnits()).isTrue();
    assertThat(f.ids()).containsExactly("tm-pr2", "tm-pr3");
    assertThat(f.unit("tm-pr2").unit().name()).isEqualTo("TM-PR2");
    assertThat(f.unit("tm-pr3").unit().name()).isEqualTo("TM-PR3");
    assertThat(f.unit("tm-pr3").unit().grid().cells()).isEqualTo(30);
    Set<String> nodes = new HashSet<>();
    for (FleetConfig.FleetUnit u : f.units()) {
      assertThat(u.opcua().tags()).hasSize(Signal.COUNT);
      u.opcua().tags().values().forEach(t -> nodes.add(t.nodeId()));
    }
    assertThat(nodes).hasSize(2 * Signal.COUNT);
    assertThat(f.unit("tm-pr2").opcuaFile().getFileName().toString()).isEqualTo("tm-pr2-opcua.toml");
  }

  @Test
  void theSingleUnitFileIsOneUnitAsBefore() throws Exception {
    FleetConfig f = FleetConfig.load(ConfigFixtures.DEMO);
    assertThat(f.listsUnits()).isFalse();
    assertThat(f.ids()).containsExactly("TM-PR1");
    assertThat(f.units().get(0).unit()).isEqualTo(PlatewardConfig.load(ConfigFixtures.DEMO).unit());
    assertThat(f.units().get(0).opcua()).isNull();
  }

  @Test
  void aFleetFileGivenToASingleUnitCommandSaysSoOnce() throws Exception {
    Path f = EXAMPLE.resolve("fleet.toml");
    var e = catchThrowableOfType(InvalidConfigException.class, () -> PlatewardConfig.load(f));
    assertThat(e.errors()).hasSize(1);
    assertThat(e.errors().get(0).format())
        .startsWith(f + ":" + ConfigFixtures.lineOf(f, "^\\[\\[units\\]\\]") + ": units: this file lists several units");
  }

  @Test
  void aDuplicateUnitIdIsReportedAtTheSecondId() throws Exception {
    Path f = fleet("[[units]]\nid = \"north-1\"\nconfig = \"" + example("tm-pr2.toml") + "\"\nopcua = \""
        + example("tm-pr2-opcua.toml") + "\"\n\n[[units]]\nid = \"north-1\"\nconfig = \"" + example("tm-pr3.toml") + "\"\n");
    var e = catchThrowableOfType(InvalidConfigException.class, () -> FleetConfig.load(f));
    assertThat(e.errors()).extracting(ConfigError::format).containsExactly(
        f + ":7: units[1].id: duplicate unit id \"north-1\": already used by units[0] (line 2)");
    assertThat(ConfigFixtures.lineOf(f, "^id = \"north-1\"")).isEqualTo(2);
  }

  @Test
  void aUnitWithoutATagMapIsReportedAtItsEntry() throws Exception {
    Path f = fleet("# two units\n[[units]]\nid = \"a\"\nconfig = \"" + example("tm-pr3.toml") + "\"\n\n[[units]]\nid = \"b\"\nconfig = \""
        + example("tm-pr2.toml") + "\"\n");
    var e = catchThrowableOfType(InvalidConfigException.class, () -> FleetConfig.load(f));
    int line = 6; // the second [[units]] header
    assertThat(Files.readAllLines(f).get(line - 1)).isEqualTo("[[units]]");
    assertThat(e.errors()).hasSize(1);
    assertThat(e.errors().get(0).format()).startsWith(f + ":" + line + ": units[1].opcua: missing: unit \"b\" has no tag map");
  }

  @Test
  void twoUnitsClaimingOneNodeAreReportedAtTheLaterUnitsTag() throws Exception {
    // a copy of TM-PR2's tag map where one tag was pasted from TM-PR3's skid
    Path tags = dir.resolve("pasted-opcua.toml");
    Files.writeString(tags, Files.readString(EXAMPLE.resolve("tm-pr2-opcua.toml"))
        .replace("s=Skid-R2/Combustion/OutletTemperature", "s=Skid-R3/Combustion/OutletTemperature"));
    Path f = fleet("[[units]]\nid = \"tm-pr3\"\nconfig = \"" + example("tm-pr3.toml") + "\"\n\n[[units]]\nid = \"tm-pr2\"\nconfig = \""
        + example("tm-pr2.toml") + "\"\nopcua = \"pasted-opcua.toml\"\n");
    var e = catchThrowableOfType(InvalidConfigException.class, () -> FleetConfig.load(f));
    int line = ConfigFixtures.lineOf(tags, "s=Skid-R3/Combustion/OutletTemperature");
    int theirs = ConfigFixtures.lineOf(EXAMPLE.resolve("tm-pr3.toml"), "s=Skid-R3/Combustion/OutletTemperature");
    assertThat(e.errors()).hasSize(1);
    assertThat(e.errors().get(0).format()).isEqualTo(tags + ":" + line
        + ": opcua.tags.comb_outlet_temp_c.node: node \"nsu=urn:plateward:sim-plant;s=Skid-R3/Combustion/OutletTemperature\""
        + " on opc.tcp://127.0.0.1:4841/plateward/plant is already claimed by unit \"tm-pr3\" ("
        + EXAMPLE.resolve("tm-pr3.toml").toAbsolutePath() + ":" + theirs + ", its comb_outlet_temp_c); each unit reads its own nodes");
  }

  @Test
  void twoUnitsReadingOneTagFileAreToldSoOnce() throws Exception {
    Path f = fleet("[[units]]\nid = \"a\"\nconfig = \"" + example("tm-pr2.toml") + "\"\nopcua = \"" + example("tm-pr2-opcua.toml")
        + "\"\n[[units]]\nid = \"b\"\nconfig = \"" + example("tm-pr2.toml") + "\"\nopcua = \"" + example("tm-pr2-opcua.toml") + "\"\n");
    var e = catchThrowableOfType(InvalidConfigException.class, () -> FleetConfig.load(f));
    assertThat(e.errors()).extracting(ConfigError::format).singleElement().asString()
        .startsWith(f + ":8: units[1].opcua: reads the same tag map"); // line 8: the second entry's opcua
  }

  @Test
  void aMisspeltKeyAndAMissingFileAreReportedWithTheirLines() throws Exception {
    Path f = fleet("[[units]]\nid = \"a\"\nconfig = \"nowhere.toml\"\nopcau = \"x.toml\"\n");
    var e = catchThrowableOfType(InvalidConfigException.class, () -> FleetConfig.load(f));
    assertThat(e.errors()).extracting(ConfigError::format).containsExactly(
        f + ":3: units[0].config: no such file \"nowhere.toml\" (looked for " + dir.resolve("nowhere.toml") + ")",
        f + ":4: units[0].opcau: unknown key; did you mean \"opcua\"?");
  }

  @Test
  void errorsInsideAUnitsOwnFileCarryThatFile() throws Exception {
    Path unit = dir.resolve("bad-unit.toml");
    Files.writeString(unit, Files.readString(EXAMPLE.resolve("tm-pr2.toml")).replace("cells = 30", "cells = 2"));
    Path f = fleet("[[units]]\nid = \"a\"\nconfig = \"bad-unit.toml\"\nopcua = \"" + example("tm-pr2-opcua.toml") + "\"\n");
    var e = catchThrowableOfType(InvalidConfigException.class, () -> FleetConfig.load(f));
    assertThat(e.errors()).extracting(ConfigError::format).containsExactly(
        unit + ":" + ConfigFixtures.lineOf(unit, "^cells = 2") + ": model.cells: must be at least 3, got 2");
  }
}
