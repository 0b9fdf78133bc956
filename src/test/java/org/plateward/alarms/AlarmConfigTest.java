package org.plateward.alarms;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.config.AlarmConfigReader;
import org.plateward.config.ConfigError;
import org.plateward.config.InvalidConfigException;

/**
 * The {@code [alarms]} table: the demo file, unit conversion (0 degC = 273.15 K exactly, by the
 * definition of the Celsius scale), and bad input reported as {@code file:line: field: message}
 * with nothing returned.
 */
class AlarmConfigTest {
  static final Path DEMO = Path.of("config", "plateward.toml");
  @TempDir Path dir;

  private Path demoWith(String from, String to) throws Exception {
    String text = Files.readString(DEMO);
    assertThat(text).contains(from);
    Path f = dir.resolve("alarms.toml");
    int at = text.indexOf(from); // the first occurrence only
    Files.writeString(f, text.substring(0, at) + to + text.substring(at + from.length()));
    return f;
  }

  private static int line(Path f, String prefix) throws Exception {
    List<String> lines = Files.readAllLines(f);
    for (int i = 0; i < lines.size(); i++) {
      if (lines.get(i).startsWith(prefix)) {
        return i + 1;
      }
    }
    throw new AssertionError(prefix);
  }

  private static List<String> errors(Path f) {
    InvalidConfigException e =
        catchThrowableOfType(InvalidConfigException.class, () -> AlarmConfigReader.load(f));
    assertThat(e).as("the file must be refused").isNotNull();
    return e.errors().stream().map(ConfigError::format).toList();
  }

  @Test
  void theDemoFileLoadsInSi() throws Exception {
    AlarmSettings s = AlarmConfigReader.load(DEMO);
    assertThat(s.kSigma()).isEqualTo(2.0);
    assertThat(s.floodCount()).isEqualTo(AlarmSettings.PUBLISHED_FLOOD_COUNT);
    assertThat(s.floodWindow()).isEqualTo(Duration.ofMinutes(10));
    AlarmDefinition h = s.definition(AlarmKind.PEAK_HIGH);
    assertThat(h.limit()).isCloseTo(1110 + 273.15, within(1e-9));
    assertThat(h.deadband()).isEqualTo(5.0);
    assertThat(h.priority()).isEqualTo(Priority.PROMPT);
    assertThat(h.onDelay()).isEqualTo(Duration.ofSeconds(10));
    assertThat(s.definition(AlarmKind.MELT_HIGH).limit()).isCloseTo(0.8, within(1e-12));
    assertThat(s.definition(AlarmKind.MELT_HIGH).deadband()).isCloseTo(0.05, within(1e-12));
    assertThat(s.definition(AlarmKind.EXHAUST_LOW).limit()).isEqualTo(600.0);
    assertThat(s.definition(AlarmKind.CONNECTION_LOST).limit()).isNaN();
    assertThat(s.definitions().values()).allSatisfy(d -> assertThat(d.enabled()).isTrue());
  }

  @Test
  void kelvinAndAPlainFractionAreAccepted() throws Exception {
    Path f = demoWith("limit = \"1110 degC\"", "limit = \"1383.15 K\"");
    Files.writeString(f, Files.readString(f).replace("limit = \"80 %\"", "limit = 0.8"));
    AlarmSettings s = AlarmConfigReader.load(f);
    assertThat(s.definition(AlarmKind.PEAK_HIGH).limit()).isCloseTo(1383.15, within(1e-9));
    assertThat(s.definition(AlarmKind.MELT_HIGH).limit()).isEqualTo(0.8);
  }

  @Test
  void aLimitWithTheWrongUnitIsRefused() throws Exception {
    Path f = demoWith("limit = \"1110 degC\"", "limit = \"1110 s\"");
    assertThat(errors(f)).containsExactly(f + ":" + line(f, "limit = \"1110 s\"")
        + ": alarms.peak_high.limit: wrong unit: expected a unit of temperature (K, degC), got"
        + " \"1110 s\" (\"s\" is a unit of time)");
  }

  @Test
  void aTimeLimitInATemperatureUnitAndAMeltLimitInKelvinAreRefused() throws Exception {
    Path f = demoWith("limit = \"10 min\"", "limit = \"10 K\"");
    Files.writeString(f, Files.readString(f).replace("limit = \"80 %\"", "limit = \"80 K\""));
    List<String> e = errors(f);
    assertThat(e).hasSize(2);
    assertThat(e.get(0)).startsWith(f + ":" + line(f, "limit = \"80 K\"")
        + ": alarms.melt_high.limit: a fraction is a plain number");
    assertThat(e.get(1)).startsWith(f + ":" + line(f, "limit = \"10 K\"")
        + ": alarms.exhaust_low.limit: wrong unit: expected a unit of time");
  }

  @Test
  void aNegativeDelayIsRefused() throws Exception {
    Path f = demoWith("on_delay = \"5 s\"", "on_delay = \"-5 s\"");
    assertThat(errors(f)).containsExactly(f + ":" + line(f, "on_delay = \"-5 s\"")
        + ": alarms.peak_high_high.on_delay: must not be negative, got \"-5 s\"");
  }

  @Test
  void anUnknownPriorityIsRefusedWithTheKnownOnes() throws Exception {
    Path f = demoWith("priority = \"immediate\"", "priority = \"imediate\"");
    assertThat(errors(f)).containsExactly(f + ":" + line(f, "priority = \"imediate\"")
        + ": alarms.peak_high_high.priority: unknown priority \"imediate\" (one of: immediate,"
        + " prompt, routine, notice); did you mean \"immediate\"?");
  }

  @Test
  void structuralMistakesAreReported() throws Exception {
    Path f = demoWith("[alarms.history_not_kept]\npriority = \"notice\"",
        "[alarms.history_not_kept]\npriority = \"notice\"\nlimit = \"1 s\"\nenabled = \"yes\"");
    Files.writeString(f, Files.readString(f)
        .replace("limit = \"1135 degC\"", "limit = \"1100 degC\"")
        .replace("k_sigma = 2.0", "k_sigma = -2.0\nk_sigmas = 3"));
    List<String> e = errors(f);
    assertThat(e).contains(
        f + ":" + line(f, "k_sigma =") + ": alarms.k_sigma: must not be negative, got -2",
        f + ":" + line(f, "k_sigmas") + ": alarms.k_sigmas: unknown key; did you mean"
            + " \"k_sigma\"?",
        f + ":" + line(f, "limit = \"1100 degC\"") + ": alarms.peak_high_high.limit: must be"
            + " above peak_high.limit (1383.15 K), got 1373.15 K",
        f + ":" + line(f, "limit = \"1 s\"") + ": alarms.history_not_kept.limit: history_not_kept"
            + " is a yes/no alarm and takes no limit",
        f + ":" + line(f, "enabled = \"yes\"") + ": alarms.history_not_kept.enabled: must be true"
            + " or false, got \"yes\"");
  }

  @Test
  void aMissingAlarmTableIsReported() throws Exception {
    String text = Files.readString(DEMO);
    int cut = text.indexOf("[alarms.history_not_kept]");
    Path f = dir.resolve("alarms.toml");
    Files.writeString(f, text.substring(0, cut));
    assertThat(errors(f)).containsExactly(f + ":" + line(f, "[alarms]")
        + ": alarms.history_not_kept: missing table [alarms.history_not_kept]; write enabled ="
        + " false in it to turn the alarm off");
  }

  @Test
  void aRefusedFileLeavesTheSettingsInUseAlone() throws Exception {
    AlarmSettings inUse = AlarmConfigReader.load(DEMO);
    Path bad = demoWith("on_delay = \"5 s\"", "on_delay = \"-5 s\"");
    AlarmSettings after = inUse;
    try {
      after = AlarmConfigReader.load(bad);
    } catch (InvalidConfigException expected) {
      // the caller keeps what it had
    }
    assertThat(after).isSameAs(inUse);
    assertThat(after).isEqualTo(AlarmConfigReader.load(DEMO));
  }
}
