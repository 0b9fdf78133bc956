package org.plateward.history;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.plateward.history.HistoryFixtures.T0;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SchemaMigrationTest {
  @TempDir Path dir;

  @Test
  void anEmptyVersionZeroFileGetsEveryTable() throws Exception {
    Path file = dir.resolve("v0.db");
    try (Connection c = HistoryFixtures.plainConnection(file); Statement s = c.createStatement()) {
      s.execute("PRAGMA user_version = 0"); // creates a valid, empty SQLite file
      s.execute("VACUUM");
    }
    assertThat(Files.size(file)).isPositive();
    try (HistoryRecorder r = HistoryRecorder.start(HistoryFixtures.settings(file))) {
      assertThat(r.health().ok()).as(r.health().reason()).isTrue();
    }
    // independent check: the catalogue in sqlite_schema lists every table of the brief
    List<String> tables = new ArrayList<>();
    try (Connection c = HistoryFixtures.plainConnection(file); Statement s = c.createStatement();
        ResultSet r = s.executeQuery(
            "SELECT name FROM sqlite_schema WHERE type = 'table' ORDER BY name")) {
      while (r.next()) {
        tables.add(r.getString(1));
      }
    }
    assertThat(tables).contains("schema_version", "signals", "samples", "sample_summaries",
        "estimates", "alarm_events", "operator_actions", "runs", "gaps", "advisor_suggestions");
    assertThat(HistoryFixtures.count(file, "SELECT max(version) FROM schema_version"))
        .isEqualTo(HistorySchema.currentVersion());
    assertThat(HistoryFixtures.count(file, "SELECT count(*) FROM signals"))
        .isEqualTo(org.plateward.signals.Signal.COUNT);
  }

  @Test
  void anOlderFileIsMigratedAndKeepsItsData() throws Exception {
    Path file = dir.resolve("v1.db");
    try (HistoryRecorder r = HistoryRecorder.start(HistoryFixtures.settings(file),
        new SchemaMigrator(List.of(HistorySchema.V1)))) {
      r.appendFrame(HistoryFixtures.frame(T0));
      r.appendFrame(HistoryFixtures.frame(T0.plusSeconds(1)));
      assertThat(r.flush(Duration.ofSeconds(10))).isTrue();
    }
    Migration v2 = new Migration(2, "operator host column",
        List.of("ALTER TABLE operator_actions ADD COLUMN host TEXT"));
    List<Migration> steps = List.of(HistorySchema.V1, v2);
    try (HistoryRecorder r = HistoryRecorder.start(HistoryFixtures.settings(file),
        new SchemaMigrator(steps))) {
      assertThat(r.health().ok()).as(r.health().reason()).isTrue();
    }
    assertThat(HistoryFixtures.count(file, "SELECT max(version) FROM schema_version"))
        .isEqualTo(2);
    assertThat(HistoryFixtures.count(file, "SELECT count(*) FROM schema_version")).isEqualTo(2);
    // independent check: PRAGMA table_info reports the new column
    assertThat(HistoryFixtures.count(file,
        "SELECT count(*) FROM pragma_table_info('operator_actions') WHERE name = 'host'"))
        .isEqualTo(1);
    assertThat(HistoryFixtures.count(file, "SELECT count(DISTINCT time_ms) FROM samples"))
        .isEqualTo(2);
  }

  @Test
  void aNewerFileIsRefusedWithAClearMessageAndLeftUntouched() throws Exception {
    Path file = dir.resolve("v99.db");
    try (HistoryRecorder r = HistoryRecorder.start(HistoryFixtures.settings(file))) {
      r.appendFrame(HistoryFixtures.frame(T0));
      assertThat(r.flush(Duration.ofSeconds(10))).isTrue();
    }
    try (Connection c = HistoryFixtures.plainConnection(file); Statement s = c.createStatement()) {
      s.execute("INSERT INTO schema_version VALUES (99, 0, 'from the future')");
      s.execute("PRAGMA wal_checkpoint(TRUNCATE)");
    }
    String before = sha256(file);
    try (HistoryRecorder r = HistoryRecorder.start(HistoryFixtures.settings(file))) {
      HistoryHealth h = r.health();
      assertThat(h.state()).isEqualTo(HistoryHealth.State.NOT_KEEPING);
      assertThat(h.reason()).contains("schema version 99").contains("newer than version " + HistorySchema.currentVersion())
          .contains(file.toString());
      assertThat(r.appendFrame(HistoryFixtures.frame(T0.plusSeconds(5)))).isTrue();
      assertThat(r.flush(Duration.ofSeconds(10))).isTrue();
      assertThat(r.health().unstoredEntries()).isEqualTo(1);
    }
    assertThatThrownBy(() -> HistoryReader.open(file))
        .isInstanceOf(HistoryException.class)
        .hasMessageContaining("schema version 99")
        .satisfies(e -> assertThat(((HistoryException) e).problem())
            .isEqualTo(HistoryException.Problem.NEWER_SCHEMA));
    assertThat(sha256(file)).isEqualTo(before);
  }

  @Test
  void aForeignDatabaseIsNotTakenOver() throws Exception {
    Path file = dir.resolve("other.db");
    try (Connection c = HistoryFixtures.plainConnection(file); Statement s = c.createStatement()) {
      s.execute("CREATE TABLE invoices (id INTEGER PRIMARY KEY)");
    }
    String before = sha256(file);
    try (HistoryRecorder r = HistoryRecorder.start(HistoryFixtures.settings(file))) {
      assertThat(r.health().state()).isEqualTo(HistoryHealth.State.NOT_KEEPING);
      assertThat(r.health().reason()).contains("not a Plateward history");
    }
    assertThat(sha256(file)).isEqualTo(before);
  }

  static String sha256(Path file) throws Exception {
    return HexFormat.of().formatHex(
        MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
  }
}
