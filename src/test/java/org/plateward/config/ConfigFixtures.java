package org.plateward.config;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;

/** The demo file, the broken copies, and an independent way to find a line in them. */
public final class ConfigFixtures {
  public static final Path DEMO = Path.of("config", "plateward.toml");

  private ConfigFixtures() {}

  /** A broken copy under src/test/resources/config. */
  public static Path broken(String name) {
    return Path.of("src", "test", "resources", "config", name + ".toml");
  }

  /**
   * The 1-based number of the first line matching {@code regex}, found by a plain search of
   * the text (independent of the loader's own scanner).
   */
  public static int lineOf(Path file, String regex) {
    try {
      List<String> lines = Files.readAllLines(file);
      Pattern p = Pattern.compile(regex);
      for (int i = 0; i < lines.size(); i++) {
        if (p.matcher(lines.get(i)).find()) {
          return i + 1;
        }
      }
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    throw new AssertionError("no line matches " + regex + " in " + file);
  }

  /**
   * One broken file and the first error expected from it.
   *
   * @param name file name without extension
   * @param lineRegex regex of the line the error must be reported on
   * @param field expected field
   * @param messagePart expected part of the message
   */
  public record Case(String name, String lineRegex, String field, String messagePart) {
    public Path file() {
      return broken(name);
    }

    /** The expected {@code file:line: field: } prefix. */
    public String prefix() {
      return file() + ":" + lineOf(file(), lineRegex) + ": " + field + ": ";
    }

    @Override
    public String toString() {
      return name;
    }
  }

  /** Every broken file with the error it must produce. */
  public static List<Case> cases() {
    return List.of(
        new Case("missing-field", "^\\[geometry\\]", "geometry.buffer_thickness",
            "missing; add it to the [geometry] table"),
        new Case("wrong-unit", "^reforming_pressure", "operating_point.reforming_pressure",
            "wrong unit: expected a unit of absolute pressure (Pa, kPa, MPa, bar)"),
        new Case("plain-number", "^length", "geometry.length", "needs a unit"),
        new Case("negative-thickness", "^buffer_thickness", "geometry.buffer_thickness",
            "must be positive, got \"-0.5 mm\""),
        new Case("zero-gap", "^reforming_gap", "geometry.reforming_gap", "must be positive, got \"0 mm\""),
        new Case("negative-flow", "^fuel_flow", "operating_point.fuel_flow", "must be positive"),
        new Case("melt-below-inlet", "^melting_point", "buffer.melting_point",
            "must be above operating_point.reforming_inlet_temp"),
        new Case("melt-above-limit", "^melting_point", "buffer.melting_point",
            "must be below the plate material limit"),
        new Case("too-few-cells", "^cells", "model.cells", "must be at least 3, got 2"),
        new Case("coating-outside", "^combustion_coating", "geometry.combustion_coating[0]",
            "must lie within the plate"),
        new Case("coating-reversed", "start = \"500 mm\"", "geometry.reforming_coating[1]",
            "start must be before end"),
        new Case("feed-sum", "^\\[feed_gas\\]", "feed_gas", "must sum to 1 (within 1e-6), got 1.01"),
        new Case("channel-pairs", "^channel_pairs", "geometry.channel_pairs", "must be at least 1, got 0"),
        new Case("mushy-band", "^mushy_band", "buffer.mushy_band", "at most 10 K"),
        new Case("syntax-error", "^width = \"200 mm[^\"]*$", "TOML syntax", "Newline not permitted"),
        new Case("misspelt-key", "^\\[geometry\\]", "geometry.width", "missing"),
        new Case("missing-table", "^# BROKEN", "catalyst", "missing table [catalyst]"),
        new Case("misspelt-table", "^# BROKEN", "catalyst", "the file has a table [catalist]"),
        new Case("many-errors", "^buffer_thickness", "geometry.buffer_thickness", "must be positive"));
  }
}
