package org.plateward.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Duration;
import java.time.Instant;
import java.util.Comparator;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.plateward.history.EstimateRow;
import org.plateward.history.HistoryRecorder;
import org.plateward.history.HistorySettings;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;

/**
 * History ingest through the batched writer on this machine's disk: the score is sample values
 * per second (17 per frame), each invocation appending {@value #FRAMES} frames and waiting for
 * them to be committed. At trial setup it also writes one hour of the live pattern — one frame
 * of 17 signals and one estimate with a 60-cell profile per second — and prints the file size
 * scaled to a day.
 *
 * <p>Results on the shared 2-core development machine (ext4, sqlite-jdbc 3.54.1.0, JDK 17,
 * {@code -f 1 -wi 1 -i 3}): about 300,000 values/s (iterations 287k-319k); 97.7 MB per day per
 * reactor at 1 Hz, of which estimates 59.3 MB and samples 38.6 MB (about 26 bytes a sample,
 * 690 bytes an estimate).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 1, time = 5)
@Measurement(iterations = 3, time = 5)
public class HistoryBench {
  static final int FRAMES = 2000;
  static final int CELLS = 60;

  private Path dir;
  private HistoryRecorder recorder;
  private Frame[] frames;
  private long nextMs;

  @Setup
  public void setUp() throws Exception {
    dir = Files.createTempDirectory("history-bench");
    reportBytesPerDay(dir.resolve("day.db"));
    recorder = HistoryRecorder.start(HistorySettings.at(dir.resolve("ingest.db")));
    if (!recorder.health().ok()) {
      throw new IllegalStateException(recorder.health().reason());
    }
    Random rnd = new Random(7);
    frames = new Frame[FRAMES];
    for (int i = 0; i < FRAMES; i++) {
      frames[i] = frame(Instant.EPOCH, rnd);
    }
    nextMs = Instant.parse("2026-01-01T00:00:00Z").toEpochMilli();
  }

  @Benchmark
  @OperationsPerInvocation(FRAMES * 17)
  public long ingestValues() {
    for (int i = 0; i < FRAMES; i++) {
      Frame f = frames[i];
      recorder.appendFrame(new Frame(Instant.ofEpochMilli(nextMs++), f.valuesSi(), f.quality()));
    }
    if (!recorder.flush(Duration.ofSeconds(60))) {
      throw new IllegalStateException("flush timed out");
    }
    return recorder.health().storedEntries();
  }

  @TearDown
  public void tearDown() throws IOException {
    recorder.close();
    if (recorder.health().droppedEntries() + recorder.health().unstoredEntries() > 0) {
      throw new IllegalStateException("entries lost in the benchmark: " + recorder.health());
    }
    try (Stream<Path> s = Files.walk(dir)) {
      s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
    }
  }

  private static Frame frame(Instant t, Random rnd) {
    double[] v = new double[Signal.COUNT];
    Quality[] q = new Quality[Signal.COUNT];
    for (int i = 0; i < Signal.COUNT; i++) {
      v[i] = 300.0 + 1000.0 * rnd.nextDouble();
      q[i] = Quality.GOOD;
    }
    return new Frame(t, v, q);
  }

  private static EstimateRow estimate(Instant t, Random rnd) {
    double[] temp = new double[CELLS];
    double[] melt = new double[CELLS];
    for (int j = 0; j < CELLS; j++) {
      temp[j] = 900.0 + 500.0 * rnd.nextDouble();
      melt[j] = rnd.nextDouble();
    }
    return new EstimateRow(t, 1300 + rnd.nextDouble(), 5 * rnd.nextDouble(), 0.3, 0.4, 0.01,
        0.9, 3600 * rnd.nextDouble(), 60 * rnd.nextDouble(), rnd.nextDouble(), "tracking", null,
        Map.of("ua_scale", rnd.nextDouble(), "activity", rnd.nextDouble()), temp, melt);
  }

  /** Writes one hour at 1 Hz and prints the bytes it takes, scaled to a day. */
  static void reportBytesPerDay(Path file) throws Exception {
    Random rnd = new Random(11);
    Instant t0 = Instant.parse("2026-01-01T00:00:00Z");
    long emptyBytes;
    try (HistoryRecorder r = HistoryRecorder.start(HistorySettings.at(file))) {
      r.flush(Duration.ofSeconds(10));
    }
    emptyBytes = Files.size(file);
    int seconds = 3600;
    try (HistoryRecorder r = HistoryRecorder.start(HistorySettings.at(file))) {
      for (int s = 0; s < seconds; s++) {
        Instant t = t0.plusSeconds(s);
        r.appendFrame(frame(t, rnd));
        r.appendEstimate(estimate(t, rnd));
      }
      r.flush(Duration.ofSeconds(60));
    }
    long bytes = Files.size(file) - emptyBytes;
    double perDay = bytes * (86_400.0 / seconds);
    StringBuilder tables = new StringBuilder();
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath());
        Statement st = c.createStatement();
        ResultSet rs = st.executeQuery("SELECT name, sum(pgsize) FROM dbstat GROUP BY name"
            + " ORDER BY 2 DESC")) {
      while (rs.next()) {
        if (rs.getLong(2) > 100_000) {
          tables.append(String.format(" %s %.1f MB/d;", rs.getString(1),
              rs.getLong(2) * (86_400.0 / seconds) / 1e6));
        }
      }
    } catch (SQLException e) {
      tables.append(" (per-table sizes unavailable: ").append(e.getMessage()).append(')');
    }
    System.out.printf("%nHISTORY bytes per day per reactor at 1 Hz (17 signals + one estimate"
        + " with a %d-cell profile per second): %.1f MB/day (%.0f bytes per second);%s%n",
        CELLS, perDay / 1e6, perDay / 86_400.0, tables);
  }
}
