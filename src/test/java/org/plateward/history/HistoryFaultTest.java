package org.plateward.history;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.plateward.history.HistoryFixtures.T0;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.signals.Frame;

class HistoryFaultTest {
  @TempDir Path dir;

  private static List<Frame> storeSome(Path file, int n) throws Exception {
    List<Frame> frames = new ArrayList<>();
    try (HistoryRecorder r = HistoryRecorder.start(HistoryFixtures.settings(file))) {
      for (int i = 0; i < n; i++) {
        Frame f = HistoryFixtures.frame(T0.plusSeconds(i));
        frames.add(f);
        r.appendFrame(f);
      }
      assertThat(r.flush(Duration.ofSeconds(10))).isTrue();
    }
    return frames;
  }

  /** What was stored before a fault reads back unchanged and the file passes integrity_check. */
  private static void assertIntact(Path file, List<Frame> stored) throws Exception {
    // independent check: SQLite's own integrity_check over every page and index
    assertThat(HistoryFixtures.text(file, "PRAGMA integrity_check")).isEqualTo("ok");
    try (HistoryReader h = HistoryReader.open(file)) {
      List<Frame> back = h.frames(T0, T0.plusSeconds(stored.size()));
      assertThat(back).hasSize(stored.size());
      for (int i = 0; i < stored.size(); i++) {
        assertThat(HistoryFixtures.sameValues(back.get(i), stored.get(i))).isTrue();
      }
    }
  }

  @Test
  @SuppressWarnings("try") // the protections act by being open
  void aReadOnlyFileIsReportedAndAppendsGoOnWithoutThrowing() throws Exception {
    Path file = dir.resolve("ro.db");
    List<Frame> stored = storeSome(file, 30);
    String before = SchemaMigrationTest.sha256(file);
    try (WriteProtection p1 = WriteProtection.of(file); WriteProtection p2 = WriteProtection.of(dir)) {
      try (HistoryRecorder r = HistoryRecorder.start(HistoryFixtures.settings(file))) {
        HistoryHealth h = r.health();
        assertThat(h.state()).isEqualTo(HistoryHealth.State.NOT_KEEPING);
        assertThat(h.reason()).contains(file.toString()).containsAnyOf("read-only", "cannot open");
        for (int i = 0; i < 50; i++) {
          assertThat(r.appendFrame(HistoryFixtures.frame(T0.plusSeconds(100 + i)))).isTrue();
        }
        assertThat(r.flush(Duration.ofSeconds(10))).isTrue();
        assertThat(r.health().unstoredEntries()).isEqualTo(50);
        assertThat(r.health().storedEntries()).isZero();
        assertThat(r.health().state()).isEqualTo(HistoryHealth.State.NOT_KEEPING);
      }
    }
    assertThat(SchemaMigrationTest.sha256(file)).isEqualTo(before);
    assertIntact(file, stored);
  }

  @Test
  @SuppressWarnings("try")
  void aReadOnlyFolderIsReportedAndHistoryResumesWithAGapWhenItIsWritableAgain()
      throws Exception {
    Path folder = Files.createDirectory(dir.resolve("data"));
    Path file = folder.resolve("plateward.db");
    HistoryRecorder r;
    try (WriteProtection p = WriteProtection.of(folder)) {
      r = HistoryRecorder.start(HistoryFixtures.settings(file));
      assertThat(r.health().state()).isEqualTo(HistoryHealth.State.NOT_KEEPING);
      assertThat(r.health().reason()).contains(file.toString());
      for (int i = 0; i < 20; i++) {
        assertThat(r.appendFrame(HistoryFixtures.frame(T0.plusSeconds(i)))).isTrue();
      }
      assertThat(r.flush(Duration.ofSeconds(10))).isTrue();
      assertThat(r.health().unstoredEntries()).isEqualTo(20);
    }
    try {
      // the folder is writable again: the writer's next retry (200 ms here) opens the file
      Thread.sleep(400);
      for (int i = 20; i < 40; i++) {
        r.appendFrame(HistoryFixtures.frame(T0.plusSeconds(i)));
      }
      assertThat(r.flush(Duration.ofSeconds(10))).isTrue();
      assertThat(r.health().ok()).as(r.health().reason()).isTrue();
      assertThat(r.health().storedEntries()).isEqualTo(20);
    } finally {
      r.close();
    }
    try (HistoryReader h = HistoryReader.open(file)) {
      assertThat(h.frames(T0, T0.plusSeconds(40))).hasSize(20);
      List<GapRow> gaps = h.gaps(T0, T0.plusSeconds(40));
      assertThat(gaps).hasSize(1);
      assertThat(gaps.get(0).start()).isEqualTo(T0);
      assertThat(gaps.get(0).end()).isEqualTo(T0.plusSeconds(19));
      assertThat(gaps.get(0).reason()).startsWith("history not kept: ");
    }
  }

  @Test
  void aFullDatabaseIsReportedKeepsCountingAndDamagesNothing() throws Exception {
    Path file = dir.resolve("full.db");
    // a 300 kB cap stands in for a full disk: SQLite reports SQLITE_FULL for both
    HistorySettings s = HistoryFixtures.settings(file).withMaxDatabaseBytes(300_000)
        .withBatching(Duration.ofMillis(50), 100, 10_000);
    List<Frame> appended = new ArrayList<>();
    long storedAtFault;
    try (HistoryRecorder r = HistoryRecorder.start(s)) {
      assertThat(r.health().ok()).isTrue();
      int i = 0;
      while (r.health().ok() && i < 200_000) {
        for (int k = 0; k < 100; k++, i++) {
          Frame f = HistoryFixtures.frame(T0.plusSeconds(i));
          appended.add(f);
          assertThat(r.appendFrame(f)).isTrue();
        }
        r.flush(Duration.ofSeconds(10));
      }
      HistoryHealth h = r.health();
      assertThat(h.state()).isEqualTo(HistoryHealth.State.NOT_KEEPING);
      assertThat(h.reason()).contains("is full");
      storedAtFault = h.storedEntries();
      assertThat(storedAtFault).isPositive();
      for (int k = 0; k < 100; k++) {
        assertThat(r.appendFrame(HistoryFixtures.frame(T0.plusSeconds(i + k)))).isTrue();
      }
      assertThat(r.flush(Duration.ofSeconds(10))).isTrue();
      assertThat(r.health().unstoredEntries()).isGreaterThanOrEqualTo(100);
      assertThat(r.health().storedEntries()).isEqualTo(storedAtFault);
    }
    // every frame the recorder counted as stored is there, unchanged, and nothing else
    assertThat(HistoryFixtures.count(file, "SELECT count(DISTINCT time_ms) FROM samples"))
        .isEqualTo(storedAtFault);
    assertIntact(file, appended.subList(0, (int) storedAtFault));
  }

  @Test
  void aCorruptFileIsReportedAndLeftUntouched() throws Exception {
    Path file = dir.resolve("corrupt.db");
    byte[] junk = new byte[16384];
    new Random(42).nextBytes(junk);
    Files.write(file, junk);
    try (HistoryRecorder r = HistoryRecorder.start(HistoryFixtures.settings(file))) {
      assertThat(r.health().state()).isEqualTo(HistoryHealth.State.NOT_KEEPING);
      assertThat(r.health().reason()).contains("not a readable SQLite database")
          .contains("left untouched");
      assertThat(r.appendEstimate(HistoryFixtures.estimate(Instant.now(), 60))).isTrue();
      assertThat(r.flush(Duration.ofSeconds(10))).isTrue();
      assertThat(r.health().unstoredEntries()).isEqualTo(1);
    }
    assertThat(Files.readAllBytes(file)).isEqualTo(junk);
    assertThatThrownBy(() -> HistoryReader.open(file))
        .isInstanceOf(HistoryException.class)
        .satisfies(e -> assertThat(((HistoryException) e).problem())
            .isEqualTo(HistoryException.Problem.CORRUPT));
  }

  @Test
  void aFullQueueRefusesAndCountsInsteadOfBlocking() throws Exception {
    Path file = dir.resolve("queue.db");
    HistorySettings s = HistoryFixtures.settings(file)
        .withBatching(Duration.ofMillis(1000), 100_000, 50);
    int accepted = 0;
    int n = 5000;
    try (HistoryRecorder r = HistoryRecorder.start(s)) {
      long t0 = System.nanoTime();
      for (int i = 0; i < n; i++) {
        accepted += r.appendFrame(HistoryFixtures.frame(T0.plusMillis(i))) ? 1 : 0;
      }
      long appendNanos = System.nanoTime() - t0;
      assertThat(r.flush(Duration.ofSeconds(10))).isTrue();
      HistoryHealth h = r.health();
      assertThat(h.droppedEntries()).isEqualTo(n - accepted).isPositive();
      assertThat(h.storedEntries()).isEqualTo(accepted);
      // 5000 appends against a 50-entry queue return at once: well under the 1 s batch interval
      assertThat(appendNanos).isLessThan(Duration.ofMillis(900).toNanos());
    }
    assertThat(HistoryFixtures.count(file, "SELECT count(DISTINCT time_ms) FROM samples"))
        .isEqualTo(accepted);
  }
}
