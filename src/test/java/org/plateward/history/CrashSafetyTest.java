package org.plateward.history;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * A child JVM keeping history at 1 kHz is killed with SIGKILL; on reopen the file passes
 * integrity_check, the stored frames are a gap-free prefix of what the child appended, and
 * everything the child had appended at least 1 s before the kill is there.
 */
class CrashSafetyTest {
  private static final Logger LOG = LoggerFactory.getLogger(CrashSafetyTest.class);

  @TempDir Path dir;

  private record Report(long receivedMs, long frameMs) {}

  @Test
  void sigkillLosesAtMostAboutOneSecondAndLeavesAConsistentFile() throws Exception {
    Path file = dir.resolve("crash.db");
    String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
    Process child = new ProcessBuilder(java, "-Xmx256m", "-cp",
        System.getProperty("java.class.path"), CrashLoggerChild.class.getName(), file.toString())
        .redirectError(ProcessBuilder.Redirect.DISCARD).start();
    List<Report> reports = new ArrayList<>();
    List<String> health = new ArrayList<>();
    CountDownLatch ready = new CountDownLatch(1);
    Thread readerThread = new Thread(() -> {
      try (BufferedReader in = new BufferedReader(
          new InputStreamReader(child.getInputStream(), StandardCharsets.UTF_8))) {
        String line;
        while ((line = in.readLine()) != null) {
          if (line.startsWith("A ")) {
            synchronized (reports) {
              reports.add(new Report(System.currentTimeMillis(), Long.parseLong(line.substring(2))));
            }
          } else if (line.startsWith("H ")) {
            synchronized (health) {
              health.add(line);
            }
          } else {
            synchronized (health) {
              health.add(line);
            }
            ready.countDown();
          }
        }
      } catch (java.io.IOException e) {
        // the child's pipe closes when it is killed
      }
    });
    readerThread.start();
    try {
      assertThat(ready.await(60, TimeUnit.SECONDS)).as("child started").isTrue();
      Thread.sleep(3500);
    } finally {
      long killMs = System.currentTimeMillis();
      // Process.destroyForcibly sends SIGKILL on Linux (java.lang.ProcessImpl/ProcessHandleImpl)
      child.destroyForcibly();
      assertThat(child.waitFor(30, TimeUnit.SECONDS)).isTrue();
      readerThread.join(5000);
      assertThat(child.exitValue()).as("killed by SIGKILL: 128 + 9").isEqualTo(137);
      check(file, reports, health, killMs);
    }
  }

  private static void check(Path file, List<Report> reports, List<String> health, long killMs)
      throws Exception {
    assertThat(health).as("child output").contains("READY");
    // independent check: SQLite's own consistency check over every page after WAL recovery
    assertThat(HistoryFixtures.text(file, "PRAGMA integrity_check")).isEqualTo("ok");
    long first = HistoryFixtures.count(file, "SELECT min(time_ms) FROM samples");
    long last = HistoryFixtures.count(file, "SELECT max(time_ms) FROM samples");
    long distinct = HistoryFixtures.count(file, "SELECT count(DISTINCT time_ms) FROM samples");
    // one frame per millisecond and nothing dropped: the stored frames have no hole
    assertThat(distinct).isEqualTo(last - first + 1);
    String lastHealth = health.stream().filter(h -> h.startsWith("H ")).reduce((a, b) -> b)
        .orElseThrow();
    assertThat(lastHealth.split(" ")[1]).as("dropped entries in the child").isEqualTo("0");
    long mustHave = Long.MIN_VALUE;
    long lastReported = Long.MIN_VALUE;
    synchronized (reports) {
      for (Report r : reports) {
        lastReported = Math.max(lastReported, r.frameMs());
        if (r.receivedMs() <= killMs - 1000) {
          mustHave = Math.max(mustHave, r.frameMs());
        }
      }
    }
    LOG.info("crash test: {} frames stored, last stored {} ms before the kill, {} ms behind the"
        + " child's last report; {}", distinct, killMs - last, lastReported - last, lastHealth);
    assertThat(mustHave).as("child reported frames more than 1 s before the kill")
        .isGreaterThan(Long.MIN_VALUE);
    assertThat(last).as("frames appended at least 1 s before the kill are stored")
        .isGreaterThanOrEqualTo(mustHave);
    try (HistoryRecorder r = HistoryRecorder.start(HistoryFixtures.settings(file))) {
      assertThat(r.health().ok()).as(r.health().reason()).isTrue();
      assertThat(r.flush(Duration.ofSeconds(10))).isTrue();
    }
    try (HistoryReader h = HistoryReader.open(file)) {
      assertThat(h.estimates(java.time.Instant.ofEpochMilli(first),
          java.time.Instant.ofEpochMilli(last + 1))).hasSizeGreaterThan(100);
    }
  }
}
