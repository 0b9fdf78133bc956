package org.plateward.config;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.advisor.TrimSettings;

/**
 * The [advisor] section of config/plateward.toml: read in SI, defaults equal to the built-in
 * ones, and bad values refused as a whole with file:line: field: message.
 */
class AdvisorConfigTest {
  static final Path DEMO = Path.of("config", "plateward.toml");
  /** [alarms.peak_high] limit of the demo file. */
  static final double PEAK_HIGH_K = 1110 + 273.15;
  @TempDir Path dir;

  private Path demoWith(String from, String to) throws Exception {
    String text = Files.readString(DEMO);
    int at = text.indexOf(from, text.indexOf("[advisor]"));
    assertThat(at).as(from).isPositive();
    Path f = dir.resolve("plateward.toml");
    Files.writeString(f, text.substring(0, at) + to + text.substring(at + from.length()));
    return f;
  }

  private static int line(Path f, String prefix) throws Exception {
    List<String> lines = Files.readAllLines(f);
    int adv = lines.indexOf("[advisor]");
    for (int i = adv; i < lines.size(); i++) {
      if (lines.get(i).startsWith(prefix)) {
        return i + 1;
      }
    }
    throw new AssertionError(prefix);
  }

  private static List<String> errors(Path f) {
    InvalidConfigException e = catchThrowableOfType(InvalidConfigException.class, () -> PlatewardConfig.load(f));
    assertThat(e).as("the file must be refused").isNotNull();
    return e.errors().stream().map(ConfigError::format).toList();
  }

  @Test
  void theDemoFileGivesTodaysDefaults() throws Exception {
    TrimSettings s = PlatewardConfig.load(DEMO).advisor();
    // the demo file writes the built-in defaults out in engineering units: they must read back equal
    assertThat(s).isEqualTo(TrimSettings.defaults(PEAK_HIGH_K));
    assertThat(s.minTrim()).isCloseTo(-0.15, within(1e-12));
    assertThat(s.horizonS()).isEqualTo(900.0);
    assertThat(s.minIntervalS()).isEqualTo(120.0);
    assertThat(s.forecastEveryS()).isEqualTo(30.0);
  }

  @Test
  void withoutTheSectionTheDefaultsTakeThePeakHighLimit() throws Exception {
    String text = Files.readString(DEMO);
    Path f = dir.resolve("no-advisor.toml");
    Files.writeString(f, text.substring(0, text.indexOf("[advisor]")));
    assertThat(PlatewardConfig.load(f).advisor()).isEqualTo(TrimSettings.defaults(PEAK_HIGH_K));
  }

  @Test
  void aWrongUnitIsRefusedWithFileLineAndField() throws Exception {
    Path f = demoWith("peak_limit = \"1110 degC\"", "peak_limit = \"1110 kPa\"");
    List<String> e = errors(f);
    assertThat(e).hasSize(1);
    assertThat(e.get(0)).startsWith(f + ":" + line(f, "peak_limit") + ": advisor.peak_limit: ");
  }

  @Test
  void aNegativeIntervalIsRefused() throws Exception {
    Path f = demoWith("min_interval = \"2 min\"", "min_interval = \"-2 min\"");
    assertThat(errors(f)).containsExactly(
        f + ":" + line(f, "min_interval") + ": advisor.min_interval: must not be negative, got \"-2 min\"");
  }

  @Test
  void boundsThatExcludeZeroAreRefused() throws Exception {
    Path f = demoWith("min_trim = \"-15 %\"", "min_trim = \"2 %\"");
    List<String> e = errors(f);
    assertThat(e).hasSize(1);
    assertThat(e.get(0)).startsWith(f + ":" + line(f, "min_trim") + ": advisor.min_trim: ")
        .contains("must include 0 %");
    Path g = demoWith("max_trim = \"0 %\"", "max_trim = \"-1 %\"");
    assertThat(errors(g).get(0)).contains("advisor.max_trim").contains("must include 0 %");
  }

  @Test
  void aMisspeltKeyGetsADidYouMean() throws Exception {
    Path f = demoWith("deadband = \"3 K\"", "deadbnad = \"3 K\"");
    assertThat(errors(f)).containsExactly(
        f + ":" + line(f, "deadbnad") + ": advisor.deadbnad: unknown key; did you mean \"deadband\"?");
  }

  @Test
  void aTrimWithoutItsPercentSignIsRefused() throws Exception {
    Path f = demoWith("min_trim = \"-15 %\"", "min_trim = -0.15");
    assertThat(errors(f).get(0)).contains("advisor.min_trim").contains("per cent");
  }
}
