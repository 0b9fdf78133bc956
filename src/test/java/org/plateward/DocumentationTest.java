package org.plateward;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.dataformat.toml.TomlMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.plateward.config.Dimension;
import org.plateward.signals.Signal;

/** The README's tables must say what the code does. */
class DocumentationTest {
  private static String readme() throws Exception {
    return Files.readString(Path.of("README.md"));
  }

  @Test
  void theSignalTableListsEverySignalWithItsMeaningAndUnit() throws Exception {
    String readme = readme();
    for (Signal s : Signal.values()) {
      assertThat(readme).as(s.id())
          .contains("| `" + s.id() + "` | " + s.meaning() + " | " + s.unit().label() + " |");
    }
  }

  @Test
  void theUnitTableListsEveryAcceptedUnit() throws Exception {
    String readme = readme();
    for (Dimension d : Dimension.values()) {
      for (Dimension.UnitOfMeasure u : d.units()) {
        assertThat(readme).as(d + " " + u.symbol()).contains("`" + u.symbol() + "`");
      }
    }
  }

  @Test
  void theTableListCoversEveryTableAndKeyOfTheDemoFile() throws Exception {
    String readme = readme();
    JsonNode root = new TomlMapper().readTree(Files.readString(Path.of("config", "plateward.toml")));
    root.properties().forEach(table -> {
      int row = readme.indexOf("| `[" + table.getKey() + "]` |");
      assertThat(row).as(table.getKey()).isPositive();
      String line = readme.substring(row, readme.indexOf('\n', row));
      table.getValue().fieldNames().forEachRemaining(
          key -> assertThat(line).as(table.getKey() + "." + key).contains("`" + key + "`"));
    });
  }
}
