package org.plateward.history;

import static org.assertj.core.api.Assertions.assertThat;
import static org.plateward.history.HistoryFixtures.T0;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;

class HistoryRoundTripTest {
  @TempDir Path dir;

  @Test
  void framesEstimatesEventsActionsRunsAndGapsComeBackAsWritten() throws Exception {
    Path file = dir.resolve("h.db");
    List<Frame> frames = new ArrayList<>();
    List<EstimateRow> estimates = new ArrayList<>();
    for (int i = 0; i < 120; i++) {
      Instant t = T0.plusSeconds(i);
      frames.add(i % 7 == 3 ? HistoryFixtures.mixedFrame(t) : HistoryFixtures.frame(t));
      estimates.add(HistoryFixtures.estimate(t, 60));
    }
    AlarmEventRow alarm = new AlarmEventRow(T0.plusSeconds(10), "peak_plate_temp_high",
        "NORMAL->UNACK_ACTIVE", "high", 1350.5, 1340.0, "hidden peak above limit");
    AlarmEventRow noValue = new AlarmEventRow(T0.plusSeconds(11), "history_not_kept",
        "NORMAL->UNACK_ACTIVE", "low", Double.NaN, Double.NaN, "history is not being kept");
    OperatorActionRow ack = new OperatorActionRow(T0.plusSeconds(20), "op1", "acknowledge",
        "peak_plate_temp_high", "seen, reducing fuel", null);
    OperatorActionRow shelve = new OperatorActionRow(T0.plusSeconds(30), "op2", "shelve",
        "analyzer_stale", "analyzer in maintenance", T0.plusSeconds(30 + 3600));
    RunRow run = new RunRow("run-1", T0, SourceKind.DEMO, "config/plateward.toml",
        "demo unit", "0.1.0");
    GapRow gap = new GapRow(T0.plusSeconds(200), T0.plusSeconds(260), "connection lost");

    try (HistoryRecorder r = HistoryRecorder.start(HistoryFixtures.settings(file))) {
      assertThat(r.appendRun(run)).isTrue();
      for (int i = 0; i < frames.size(); i++) {
        r.appendFrame(frames.get(i));
        r.appendEstimate(estimates.get(i));
      }
      r.appendAlarmEvent(alarm);
      r.appendAlarmEvent(noValue);
      r.appendOperatorAction(ack);
      r.appendOperatorAction(shelve);
      r.appendGap(gap);
      assertThat(r.flush(Duration.ofSeconds(10))).isTrue();
      assertThat(r.health().ok()).isTrue();
      assertThat(r.health().storedEntries()).isEqualTo(1 + 240 + 4 + 1);
    }

    // independent check: the sample rows counted with plain SQL equal the non-MISSING values
    long expectedSamples = 0;
    for (Frame f : frames) {
      for (Signal s : Signal.values()) {
        expectedSamples += f.quality(s) == Quality.MISSING ? 0 : 1;
      }
    }
    assertThat(HistoryFixtures.count(file, "SELECT count(*) FROM samples"))
        .isEqualTo(expectedSamples);

    try (HistoryReader h = HistoryReader.open(file)) {
      List<Frame> back = h.frames(T0, T0.plusSeconds(120));
      assertThat(back).hasSize(frames.size());
      for (int i = 0; i < frames.size(); i++) {
        assertThat(HistoryFixtures.sameValues(back.get(i), frames.get(i)))
            .as("frame %d", i).isTrue();
      }
      assertThat(h.frames(T0.plusSeconds(10), T0.plusSeconds(20))).hasSize(10);

      List<EstimateRow> est = h.estimates(T0, T0.plusSeconds(120));
      assertThat(est).hasSize(estimates.size());
      for (int i = 0; i < est.size(); i++) {
        EstimateRow a = est.get(i);
        EstimateRow e = estimates.get(i);
        assertThat(a.time()).isEqualTo(e.time());
        assertThat(a.peakPlateTempK()).isEqualTo(e.peakPlateTempK());
        assertThat(a.timeToExhaustS()).isNaN();
        assertThat(a.status()).isEqualTo("tracking");
        assertThat(a.statusReason()).isNull();
        assertThat(a.parameters()).isEqualTo(e.parameters());
        double[] tk = a.cellTempK();
        double[] ek = e.cellTempK();
        assertThat(tk).hasSize(60);
        for (int j = 0; j < 60; j++) {
          // independent check: the stored profile is the IEEE 754 binary32 rounding of the
          // value (JLS 5.1.3 narrowing), so it equals (double) (float) x and is within the
          // binary32 unit roundoff 2^-24 of x
          assertThat(tk[j]).isEqualTo((double) (float) ek[j]);
          assertThat(Math.abs(tk[j] - ek[j])).isLessThanOrEqualTo(Math.abs(ek[j]) * 0x1p-24);
          assertThat(a.cellMeltFraction()[j]).isEqualTo((double) (float) e.cellMeltFraction()[j]);
        }
      }
      assertThat(h.alarmEvents(T0, T0.plusSeconds(120))).containsExactly(alarm, noValue);
      assertThat(h.operatorActions(T0, T0.plusSeconds(120))).containsExactly(ack, shelve);
      assertThat(h.runs()).containsExactly(run);
      assertThat(h.gaps(T0.plusSeconds(230), T0.plusSeconds(240))).containsExactly(gap);
      assertThat(h.gaps(T0, T0.plusSeconds(199))).isEmpty();
    }
  }

  @Test
  void fileIsInWalModeWithTheDocumentedHeaderBytes() throws Exception {
    Path file = dir.resolve("wal.db");
    try (HistoryRecorder r = HistoryRecorder.start(HistoryFixtures.settings(file))) {
      r.appendFrame(HistoryFixtures.frame(T0));
      assertThat(r.flush(Duration.ofSeconds(10))).isTrue();
      // the -wal file exists while the writer is open (SQLite WAL documentation, "the WAL file")
      assertThat(Files.exists(dir.resolve("wal.db-wal"))).isTrue();
      assertThat(HistoryFixtures.text(file, "PRAGMA journal_mode")).isEqualTo("wal");
    }
    // independent check: SQLite file format, section 1.3 "The database header": bytes 18 and 19
    // (file format write and read version) are 1 for rollback journal, 2 for WAL
    byte[] header = new byte[100];
    try (InputStream in = Files.newInputStream(file)) {
      assertThat(in.readNBytes(header, 0, 100)).isEqualTo(100);
    }
    assertThat(new String(header, 0, 15, java.nio.charset.StandardCharsets.US_ASCII))
        .isEqualTo("SQLite format 3");
    assertThat(header[18]).isEqualTo((byte) 2);
    assertThat(header[19]).isEqualTo((byte) 2);
    // bytes 68..71: application id, big-endian
    int appId = ((header[68] & 0xff) << 24) | ((header[69] & 0xff) << 16)
        | ((header[70] & 0xff) << 8) | (header[71] & 0xff);
    assertThat(appId).isEqualTo(HistorySchema.APPLICATION_ID);
    assertThat(HistoryFixtures.text(file, "PRAGMA integrity_check")).isEqualTo("ok");
  }

  @Test
  void anAlarmEventIsCommittedWithoutWaitingForTheBatchInterval() throws Exception {
    Path file = dir.resolve("audit.db");
    HistorySettings s = HistoryFixtures.settings(file)
        .withBatching(Duration.ofMillis(1000), 100_000, 10_000);
    try (HistoryRecorder r = HistoryRecorder.start(s)) {
      r.appendFrame(HistoryFixtures.frame(T0));
      Thread.sleep(50);
      long t0 = System.nanoTime();
      r.appendAlarmEvent(new AlarmEventRow(T0, "a", "NORMAL->UNACK_ACTIVE", "high", 1, 0, "m"));
      long seen = 0;
      // polled through a second, independent connection
      while (seen == 0 && System.nanoTime() - t0 < 2_000_000_000L) {
        seen = HistoryFixtures.count(file, "SELECT count(*) FROM alarm_events");
      }
      long waitedMs = (System.nanoTime() - t0) / 1_000_000;
      assertThat(seen).isEqualTo(1);
      assertThat(waitedMs).as("ms until the alarm event was visible").isLessThan(500);
    }
  }

  @Test
  void aBackupTakenWhileWritingIsAConsistentCopy() throws Exception {
    Path file = dir.resolve("live.db");
    Path copy = dir.resolve("copy.db");
    List<Frame> frames = new ArrayList<>();
    try (HistoryRecorder r = HistoryRecorder.start(HistoryFixtures.settings(file))) {
      for (int i = 0; i < 500; i++) {
        Frame f = HistoryFixtures.frame(T0.plusSeconds(i));
        frames.add(f);
        r.appendFrame(f);
      }
      assertThat(r.flush(Duration.ofSeconds(10))).isTrue();
      assertThat(r.backupTo(copy).get(30, java.util.concurrent.TimeUnit.SECONDS)).isEqualTo(copy);
      r.appendFrame(HistoryFixtures.frame(T0.plusSeconds(1000)));
      assertThat(r.health().walBytes()).isGreaterThanOrEqualTo(0);
      assertThat(r.backupTo(copy)).failsWithin(Duration.ofSeconds(30));
    }
    // independent check: SQLite's integrity_check on the copy, and the frames it holds
    assertThat(HistoryFixtures.text(copy, "PRAGMA integrity_check")).isEqualTo("ok");
    try (HistoryReader h = HistoryReader.open(copy)) {
      List<Frame> back = h.frames(T0, T0.plusSeconds(2000));
      assertThat(back).hasSize(500);
      for (int i = 0; i < 500; i++) {
        assertThat(HistoryFixtures.sameValues(back.get(i), frames.get(i))).isTrue();
      }
    }
  }
}
