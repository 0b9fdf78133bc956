package org.plateward.config;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.history.HistorySettings;

class HistoryConfigReaderTest {
  @TempDir Path dir;

  private Path withHistory(String section) throws Exception {
    String demo = Files.readString(ConfigFixtures.DEMO);
    Path f = dir.resolve("plateward.toml");
    Files.writeString(f, demo + "\n" + section);
    return f;
  }

  /** 1-based line of the first line of {@code f} that starts with {@code prefix}. */
  private static int line(Path f, String prefix) throws Exception {
    List<String> lines = Files.readAllLines(f);
    for (int i = 0; i < lines.size(); i++) {
      if (lines.get(i).startsWith(prefix)) {
        return i + 1;
      }
    }
    throw new AssertionError(prefix);
  }

  @Test
  void withoutAHistoryTableTheDefaultsApply() throws Exception {
    HistorySettings h = PlatewardConfig.load(ConfigFixtures.DEMO).history();
    assertThat(h).isEqualTo(HistorySettings.defaults());
    assertThat(h.databaseFile()).isEqualTo(Path.of("data", "plateward.db"));
  }

  @Test
  void everyKeyIsReadInItsUnit() throws Exception {
    Path f = withHistory("""
        [history]
        path = "var/h.db"
        raw_retention = "7 d"
        summary_retention = "365 d"
        summary_span = "5 min"
        batch_interval = "100 ms"
        queue_capacity = 5000
        max_size = "2.5 GB"
        """);
    HistorySettings h = PlatewardConfig.load(f).history();
    assertThat(h.databaseFile()).isEqualTo(Path.of("var/h.db"));
    assertThat(h.rawRetention()).isEqualTo(Duration.ofDays(7));
    assertThat(h.summaryRetention()).isEqualTo(Duration.ofDays(365));
    assertThat(h.summarySpan()).isEqualTo(Duration.ofMinutes(5));
    assertThat(h.batchInterval()).isEqualTo(Duration.ofMillis(100));
    assertThat(h.queueCapacity()).isEqualTo(5000);
    assertThat(h.maxDatabaseBytes()).isEqualTo(2_500_000_000L);
  }

  @Test
  void badValuesAreReportedWithFileLineAndField() throws Exception {
    Path f = withHistory("""
        [history]
        raw_retention = 30
        summary_retention = "10 d"
        batch_interval = "2 s"
        summary_span = "1 fortnight"
        raw_retension = "1 d"
        """);
    InvalidConfigException e =
        catchThrowableOfType(InvalidConfigException.class, () -> PlatewardConfig.load(f));
    List<String> msgs = e.errors().stream().map(ConfigError::format).toList();
    assertThat(msgs).contains(
        f + ":" + line(f, "raw_retention") + ": history.raw_retention: needs a unit: write it"
            + " as text such as \"30 d\" (units of duration: ms, s, min, h, d), got 30",
        f + ":" + line(f, "batch_interval") + ": history.batch_interval: must be at most 1 s"
            + " (it bounds what a crash can lose), got \"2 s\"",
        f + ":" + line(f, "raw_retension") + ": history.raw_retension: unknown key; did you"
            + " mean \"raw_retention\"?");
    assertThat(msgs).anySatisfy(m -> assertThat(m)
        .startsWith(f + ":" + line(f, "summary_span") + ": history.summary_span: unknown unit"
            + " \"fortnight\""));
  }
}
