package org.plateward.history;

import java.nio.file.Path;
import java.time.Duration;
import java.util.Objects;

/**
 * How history is kept: the {@code [history]} section of the configuration.
 *
 * @param databaseFile the SQLite file (default {@code data/plateward.db})
 * @param rawRetention how long raw samples and every estimate are kept
 * @param summaryRetention how long the downsampled summaries (and the thinned estimates) are kept
 * @param summarySpan the downsampling interval: raw samples older than {@code rawRetention}
 *     become one min/max/mean row per signal and span, and estimates are thinned to the last
 *     one of each span
 * @param batchInterval the writer commits at least this often (so at most about this much is
 *     lost when the process is killed); at most 1 s
 * @param maxBatchEntries the writer commits when this many entries wait (a frame is one entry)
 * @param queueCapacity entries the queue holds; further appends are refused and counted
 * @param maxDatabaseBytes cap on the database file size in bytes (0 = none): a full file is
 *     reported like a full disk
 * @param retryInterval how long the writer waits before it tries again after a database fault
 */
public record HistorySettings(
    Path databaseFile,
    Duration rawRetention,
    Duration summaryRetention,
    Duration summarySpan,
    Duration batchInterval,
    int maxBatchEntries,
    int queueCapacity,
    long maxDatabaseBytes,
    Duration retryInterval) {
  /** The default database file. */
  public static final Path DEFAULT_FILE = Path.of("data", "plateward.db");

  public HistorySettings {
    Objects.requireNonNull(databaseFile, "databaseFile");
    positive(rawRetention, "rawRetention");
    positive(summaryRetention, "summaryRetention");
    positive(summarySpan, "summarySpan");
    positive(batchInterval, "batchInterval");
    positive(retryInterval, "retryInterval");
    if (batchInterval.compareTo(Duration.ofSeconds(1)) > 0) {
      throw new IllegalArgumentException("batchInterval must be at most 1 s, got " + batchInterval);
    }
    if (summaryRetention.compareTo(rawRetention) < 0) {
      throw new IllegalArgumentException("summaryRetention must not be shorter than rawRetention");
    }
    if (maxBatchEntries < 1 || queueCapacity < 1 || maxDatabaseBytes < 0) {
      throw new IllegalArgumentException("batch size and queue capacity must be positive");
    }
  }

  private static void positive(Duration d, String name) {
    Objects.requireNonNull(d, name);
    if (d.isNegative() || d.isZero()) {
      throw new IllegalArgumentException(name + " must be positive, got " + d);
    }
  }

  /** Defaults: 30 d raw, 730 d of 1-min summaries, commits every 250 ms or 2000 entries. */
  public static HistorySettings defaults() {
    return at(DEFAULT_FILE);
  }

  /** The defaults with another database file. */
  public static HistorySettings at(Path databaseFile) {
    return new HistorySettings(databaseFile, Duration.ofDays(30), Duration.ofDays(730),
        Duration.ofMinutes(1), Duration.ofMillis(250), 2000, 200_000, 0L, Duration.ofSeconds(5));
  }

  public HistorySettings withRetention(Duration raw, Duration summaries, Duration span) {
    return new HistorySettings(databaseFile, raw, summaries, span, batchInterval, maxBatchEntries,
        queueCapacity, maxDatabaseBytes, retryInterval);
  }

  public HistorySettings withBatching(Duration interval, int maxEntries, int capacity) {
    return new HistorySettings(databaseFile, rawRetention, summaryRetention, summarySpan, interval,
        maxEntries, capacity, maxDatabaseBytes, retryInterval);
  }

  public HistorySettings withMaxDatabaseBytes(long bytes) {
    return new HistorySettings(databaseFile, rawRetention, summaryRetention, summarySpan,
        batchInterval, maxBatchEntries, queueCapacity, bytes, retryInterval);
  }

  public HistorySettings withRetryInterval(Duration retry) {
    return new HistorySettings(databaseFile, rawRetention, summaryRetention, summarySpan,
        batchInterval, maxBatchEntries, queueCapacity, maxDatabaseBytes, retry);
  }
}
