package org.plateward.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code plateward check} on a fleet file: every unit summarised, or its errors with exit 2. */
class CheckFleetTest {
  static final Path FLEET = Path.of("config", "examples", "fleet", "fleet.toml");

  @Test
  void theExampleFleetIsValidAndEachUnitIsSummarised() {
    var r = PlatewardCommandTest.run("check", "-c", FLEET.toString());
    assertThat(r.exit()).as(r.err()).isZero();
    assertThat(r.out()).contains(FLEET + ": valid, 2 units")
        .contains("unit tm-pr2 (" + org.plateward.signals.Signal.COUNT + " tags from")
        .contains("unit tm-pr3 (" + org.plateward.signals.Signal.COUNT + " tags from")
        .contains("TM-PR2 at Tarnmoor").contains("TM-PR3 at Tarnmoor").contains("30 cells");
  }

  @Test
  void aRepeatedIdExitsTwoWithItsLine(@TempDir Path dir) throws Exception {
    Path f = dir.resolve("fleet.toml");
    Files.writeString(f, Files.readString(FLEET).replace("id = \"tm-pr3\"", "id = \"tm-pr2\"")
        .replace("config = \"tm-pr", "config = \"" + FLEET.toAbsolutePath().getParent() + "/tm-pr")
        .replace("opcua = \"tm-pr", "opcua = \"" + FLEET.toAbsolutePath().getParent() + "/tm-pr"));
    var r = PlatewardCommandTest.run("check", "-c", f.toString());
    assertThat(r.exit()).isEqualTo(PlatewardCommand.EXIT_BAD_INPUT);
    int line = org.plateward.config.ConfigFixtures.lineOf(f, "^id = \"tm-pr2\"\\s*$");
    java.util.List<String> lines = Files.readAllLines(f);
    int second = line;
    for (int i = line; i < lines.size(); i++) {
      if (lines.get(i).startsWith("id = \"tm-pr2\"")) {
        second = i + 1;
      }
    }
    assertThat(r.err()).contains(f + ":" + second + ": units[1].id: duplicate unit id \"tm-pr2\"");
  }
}
