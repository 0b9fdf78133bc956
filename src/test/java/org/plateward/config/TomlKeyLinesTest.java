package org.plateward.config;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.dataformat.toml.TomlMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class TomlKeyLinesTest {
  private static final String TEXT = String.join("\n",
      "# comment with [brackets] and key = value",       // 1
      "title = \"a # not a comment = [x]\"",              // 2
      "",                                                 // 3
      "[geometry]   # trailing comment",                  // 4
      "length = \"600 mm\"",                              // 5
      "zones = [",                                        // 6
      "  { start = \"0 mm\", end = \"1 mm\" },  # first", // 7
      "",                                                 // 8
      "  {start='2 mm',  end = '3 mm'},",                 // 9
      "  # inline tables stay on one line in TOML 1.0",  // 10
      "]",                                                // 11
      "notes = \"\"\"two",                                // 12
      "lines [not.a.table]\"\"\"",                        // 13
      "after = 1",                                        // 14
      "[ \"quoted.table\" . inner ]",                     // 15
      "a.b = 2",                                          // 16
      "\"key with space\" = 3",                           // 17
      "[[runs]]",                                         // 18
      "n = 1",                                            // 19
      "[[runs]]",                                         // 20
      "n = 2",                                            // 21
      "");

  @Test
  void findsTheLineOfEveryKindOfKey() {
    TomlKeyLines k = TomlKeyLines.scan(TEXT);
    assertThat(k.lineOf("title")).isEqualTo(2);
    assertThat(k.lineOf("geometry")).isEqualTo(4);
    assertThat(k.lineOf("geometry.length")).isEqualTo(5);
    assertThat(k.lineOf("geometry.zones")).isEqualTo(6);
    assertThat(k.lineOf("geometry.zones[0]")).isEqualTo(7);
    assertThat(k.lineOf("geometry.zones[0].end")).isEqualTo(7);
    assertThat(k.lineOf("geometry.zones[1]")).isEqualTo(9);
    assertThat(k.lineOf("geometry.zones[1].start")).isEqualTo(9);
    assertThat(k.lineOf("geometry.zones[1].end")).isEqualTo(9);
    assertThat(k.lineOf("geometry.zones[2]")).isEqualTo(-1);
    assertThat(k.lineOf("geometry.notes")).isEqualTo(12);
    assertThat(k.lineOf("geometry.after")).isEqualTo(14);
    assertThat(k.lineOf("quoted.table.inner")).isEqualTo(15);
    assertThat(k.lineOf("quoted.table.inner.a.b")).isEqualTo(16);
    assertThat(k.lineOf("quoted.table.inner.key with space")).isEqualTo(17);
    assertThat(k.lineOf("runs[0].n")).isEqualTo(19);
    assertThat(k.lineOf("runs[1].n")).isEqualTo(21);
    assertThat(k.lineOf("not.a.table")).isEqualTo(-1);
    assertThat(k.lineOf("absent")).isEqualTo(-1);
  }

  @Test
  void theTestTextIsValidToml() throws Exception {
    // the scanner is only run on text the parser accepted; make sure the sample is such text
    JsonNode root = new TomlMapper().readTree(TEXT);
    assertThat(root.at("/geometry/zones/1/end").asText()).isEqualTo("3 mm");
    assertThat(root.at("/quoted.table/inner/a/b").asInt()).isEqualTo(2);
  }

  @Test
  void everyKeyTheParserSeesInTheDemoFileHasALineThatNamesIt() throws Exception {
    // cross-check against the TOML parser: each leaf of its tree must be found, on a line
    // whose text contains the leaf's key
    Path file = Path.of("config", "plateward.toml");
    String text = Files.readString(file);
    List<String> lines = text.lines().toList();
    TomlKeyLines k = TomlKeyLines.scan(text);
    List<String> leaves = new ArrayList<>();
    collect(new TomlMapper().readTree(text), "", leaves);
    assertThat(leaves).hasSizeGreaterThan(40);
    for (String path : leaves) {
      int line = k.lineOf(path);
      assertThat(line).as(path).isPositive();
      String key = path.substring(path.lastIndexOf('.') + 1);
      assertThat(lines.get(line - 1)).as(path).contains(key + " =");
    }
  }

  private static void collect(JsonNode n, String path, List<String> out) {
    if (n.isObject()) {
      n.properties().forEach(e -> collect(e.getValue(), path.isEmpty() ? e.getKey() : path + "." + e.getKey(), out));
    } else if (n.isArray()) {
      for (int i = 0; i < n.size(); i++) {
        collect(n.get(i), path + "[" + i + "]", out);
      }
    } else {
      out.add(path);
    }
  }
}
