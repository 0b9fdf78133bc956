package org.plateward.history;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.locks.LockSupport;
import org.plateward.history.HistoryException.Problem;
import org.plateward.signals.Frame;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Keeps history: producers call the non-blocking {@code append} methods, which only enqueue;
 * one writer thread owns the only write connection and commits what is queued in one
 * transaction at least every {@link HistorySettings#batchInterval()} (or as soon as
 * {@link HistorySettings#maxBatchEntries()} wait).
 *
 * <h2>Queues</h2>
 * Frames, estimates and gaps share one bounded queue; alarm events, operator actions and runs
 * (the audit trail) have their own, so a flood of frames never pushes out an audit record. When
 * a queue is full the new entry is refused, counted in {@link HistoryHealth#droppedEntries()},
 * and the append returns false; it never blocks. An audit entry wakes the writer at once and is
 * committed with {@code synchronous=FULL}, so it survives a power loss as well as a crash; the
 * high-rate tables commit with {@code synchronous=NORMAL} (consistent after any crash; the
 * last batches may be lost on power loss).
 *
 * <h2>Faults</h2>
 * The recorder never throws for a database fault. When the file cannot be opened or written
 * (read-only, full, damaged, newer schema) {@link #health()} turns NOT_KEEPING with the reason,
 * the writer keeps draining the queues and counts what it could not store in
 * {@link HistoryHealth#unstoredEntries()}, and for faults that may clear (read-only, full, I/O)
 * it tries again every {@link HistorySettings#retryInterval()}. A failed transaction is rolled
 * back, so rows already stored are untouched. When writing succeeds again a {@link GapRow}
 * covering the entries that were not kept is stored with the reason.
 */
public final class HistoryRecorder implements AutoCloseable {
  private static final Logger LOG = LoggerFactory.getLogger(HistoryRecorder.class);

  /** When idle, the writer truncates the -wal file this often (auto-checkpoints run anyway). */
  private static final long CHECKPOINT_INTERVAL_NANOS = TimeUnit.MINUTES.toNanos(10);

  private final HistorySettings settings;
  private final SchemaMigrator migrator;
  private final Path file;
  private final ArrayBlockingQueue<Object> measurements;
  private final ArrayBlockingQueue<Object> audit;
  private final ConcurrentLinkedQueue<Runnable> tasks = new ConcurrentLinkedQueue<>();
  private final Thread writer;
  private final Object progress = new Object();

  private final AtomicLong attempts = new AtomicLong();
  private final AtomicLong dropped = new AtomicLong();
  private volatile long handled;
  private volatile long stored;
  private volatile long unstored;
  private volatile long flushTarget;
  private volatile boolean closing;
  private volatile HistoryHealth.State state = HistoryHealth.State.OK;
  private volatile String reason;
  private volatile Instant since;

  // writer thread only
  private Connection conn;
  private RowWriter rows;
  private boolean permanentFault;
  private long nextRetryNanos;
  private long unkeptFromMs = Long.MAX_VALUE;
  private long unkeptToMs = Long.MIN_VALUE;
  private String unkeptReason;

  private HistoryRecorder(HistorySettings settings, SchemaMigrator migrator) {
    this.settings = settings;
    this.migrator = migrator;
    this.file = settings.databaseFile();
    this.measurements = new ArrayBlockingQueue<>(settings.queueCapacity());
    this.audit = new ArrayBlockingQueue<>(Math.max(1000, settings.queueCapacity() / 10));
    this.writer = new Thread(this::runWriter, "history-writer");
    this.writer.setDaemon(true);
  }

  /**
   * Opens (creating or migrating) the history file and starts the writer. Never throws for a
   * database fault: check {@link #health()}.
   */
  public static HistoryRecorder start(HistorySettings settings) {
    return start(settings, new SchemaMigrator(HistorySchema.MIGRATIONS));
  }

  static HistoryRecorder start(HistorySettings settings, SchemaMigrator migrator) {
    HistoryRecorder r = new HistoryRecorder(settings, migrator);
    r.open();
    r.writer.start();
    return r;
  }

  /** The settings in use. */
  public HistorySettings settings() {
    return settings;
  }

  /** Queues a frame (every signal that is not MISSING becomes one sample row). */
  public boolean appendFrame(Frame frame) {
    return offer(measurements, frame);
  }

  /** Queues an estimate. */
  public boolean appendEstimate(EstimateRow estimate) {
    return offer(measurements, estimate);
  }

  /** Queues a period without data. */
  public boolean appendGap(GapRow gap) {
    return offer(measurements, gap);
  }

  /** Queues an alarm transition for the audit trail; committed at once with full durability. */
  public boolean appendAlarmEvent(AlarmEventRow event) {
    return offer(audit, event);
  }

  /** Queues an operator action for the audit trail; committed at once with full durability. */
  public boolean appendOperatorAction(OperatorActionRow action) {
    return offer(audit, action);
  }

  /** Queues a fuel-trim suggestion; committed at once with full durability, like the audit trail. */
  public boolean appendSuggestion(SuggestionRow suggestion) {
    return offer(audit, suggestion);
  }

  /** Queues the record of a run. */
  public boolean appendRun(RunRow run) {
    return offer(audit, run);
  }

  private boolean offer(ArrayBlockingQueue<Object> q, Object entry) {
    attempts.incrementAndGet();
    if (closing || !q.offer(entry)) {
      dropped.incrementAndGet();
      return false;
    }
    if (q == audit || q.size() >= settings.maxBatchEntries()) {
      LockSupport.unpark(writer);
    }
    return true;
  }

  /** The current state and counters. */
  public HistoryHealth health() {
    long wal = 0;
    try {
      Path w = Path.of(file + "-wal");
      wal = Files.exists(w) ? Files.size(w) : 0;
    } catch (IOException | UncheckedIOException e) {
      wal = -1;
    }
    return new HistoryHealth(state, reason, since, stored, dropped.get(), unstored,
        measurements.size() + audit.size(), wal);
  }

  /**
   * Waits until every entry appended before this call is stored or counted as unstored.
   *
   * @param timeout the longest wait
   * @return true when done, false on timeout
   */
  public boolean flush(Duration timeout) {
    long target = attempts.get();
    flushTarget = Math.max(flushTarget, target);
    LockSupport.unpark(writer);
    long deadline = System.nanoTime() + timeout.toNanos();
    synchronized (progress) {
      while (completed() < target) {
        long left = deadline - System.nanoTime();
        if (left <= 0 || !writer.isAlive()) {
          return completed() >= target;
        }
        try {
          TimeUnit.NANOSECONDS.timedWait(progress, left);
        } catch (InterruptedException e) {
          Thread.currentThread().interrupt();
          return false;
        }
      }
    }
    return true;
  }

  private long completed() {
    return handled + dropped.get();
  }

  /**
   * Asks the writer to apply retention and downsampling as of {@code now}. Runs on the writer
   * thread between batches; the caller runs it periodically (for example hourly).
   *
   * @return completes with what was done, or exceptionally with a {@link HistoryException}
   */
  public CompletableFuture<PruneReport> prune(Instant now) {
    CompletableFuture<PruneReport> f = new CompletableFuture<>();
    submit(() -> runPrune(now, f), f);
    return f;
  }

  /**
   * Asks the writer for a consistent copy of the history file (SQLite {@code VACUUM INTO}),
   * safe while history is being written, and checks that the copy passes
   * {@code integrity_check}. Copying the file alone while the WAL holds frames is not safe.
   *
   * @param target the new file; it must not exist
   * @return completes with {@code target}, or exceptionally with a {@link HistoryException}
   */
  public CompletableFuture<Path> backupTo(Path target) {
    CompletableFuture<Path> f = new CompletableFuture<>();
    submit(() -> runBackup(target, f), f);
    return f;
  }

  private void submit(Runnable task, CompletableFuture<?> f) {
    if (closing) {
      f.completeExceptionally(new IllegalStateException("history recorder is closed"));
      return;
    }
    tasks.add(() -> {
      try {
        task.run();
      } catch (RuntimeException e) {
        f.completeExceptionally(e);
      }
    });
    LockSupport.unpark(writer);
    if (!writer.isAlive()) {
      f.completeExceptionally(new IllegalStateException("history writer is not running"));
    }
  }

  /** Stores everything queued, checkpoints the WAL into the file and closes. */
  @Override
  public void close() {
    closing = true;
    LockSupport.unpark(writer);
    try {
      writer.join(TimeUnit.SECONDS.toMillis(30));
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    }
    if (writer.isAlive()) {
      LOG.warn("history writer did not finish within 30 s; {} entries still queued",
          measurements.size() + audit.size());
    }
  }

  // ---- writer thread ----

  private void open() {
    try {
      conn = HistoryDatabase.openWriter(file, migrator, settings.maxDatabaseBytes());
      rows = new RowWriter(conn);
    } catch (HistoryException e) {
      fault(e);
    } catch (SQLException e) {
      fault(SqliteFaults.of(file, "preparing statements", e));
    }
  }

  private void runWriter() {
    List<Object> batch = new ArrayList<>();
    long interval = settings.batchInterval().toNanos();
    long last = System.nanoTime();
    long lastCheckpoint = last;
    while (true) {
      boolean stop = closing;
      long now = System.nanoTime();
      boolean due = stop
          || !audit.isEmpty()
          || measurements.size() >= settings.maxBatchEntries()
          || now - last >= interval
          || completed() < flushTarget
          || !tasks.isEmpty();
      if (!due) {
        LockSupport.parkNanos(this, interval - (now - last));
        continue;
      }
      last = now;
      drainAndWrite(batch);
      Runnable task;
      while ((task = tasks.poll()) != null) {
        task.run();
        drainAndWrite(batch);
      }
      if (stop && audit.isEmpty() && measurements.isEmpty()) {
        break;
      }
      if (conn != null && audit.isEmpty() && measurements.isEmpty()
          && now - lastCheckpoint >= CHECKPOINT_INTERVAL_NANOS) {
        checkpoint();
        lastCheckpoint = System.nanoTime();
      }
    }
    Runnable task;
    while ((task = tasks.poll()) != null) {
      task.run(); // completes after the last batch; prune and backup still have the connection
    }
    shutdown();
  }

  private void drainAndWrite(List<Object> batch) {
    while (true) {
      batch.clear();
      audit.drainTo(batch);
      measurements.drainTo(batch, settings.maxBatchEntries());
      if (batch.isEmpty()) {
        return;
      }
      write(batch);
      if (measurements.size() < settings.maxBatchEntries() && audit.isEmpty()) {
        return;
      }
    }
  }

  private void write(List<Object> batch) {
    if (conn == null && !reopen()) {
      notKept(batch);
      return;
    }
    if (state != HistoryHealth.State.OK && System.nanoTime() < nextRetryNanos) {
      notKept(batch);
      return;
    }
    boolean hasAudit = false;
    for (Object e : batch) {
      if (e instanceof AlarmEventRow || e instanceof OperatorActionRow || e instanceof RunRow
          || e instanceof SuggestionRow) {
        hasAudit = true;
        break;
      }
    }
    try (Statement s = conn.createStatement()) {
      if (hasAudit) {
        s.execute("PRAGMA synchronous = FULL");
      }
      s.execute("BEGIN IMMEDIATE");
      try {
        if (unkeptReason != null) {
          rows.write(List.of(new GapRow(Instant.ofEpochMilli(unkeptFromMs),
              Instant.ofEpochMilli(Math.max(unkeptFromMs, unkeptToMs)),
              "history not kept: " + unkeptReason)));
        }
        rows.write(batch);
        s.execute("COMMIT");
      } catch (SQLException e) {
        rows.reset();
        try {
          s.execute("ROLLBACK");
        } catch (SQLException ignored) {
          // SQLite may already have rolled back (for example on SQLITE_FULL)
        }
        throw e;
      } finally {
        if (hasAudit) {
          s.execute("PRAGMA synchronous = NORMAL");
        }
      }
      stored += batch.size();
      unkeptReason = null;
      unkeptFromMs = Long.MAX_VALUE;
      unkeptToMs = Long.MIN_VALUE;
      if (state != HistoryHealth.State.OK) {
        LOG.info("history is kept again in {}", file);
        state = HistoryHealth.State.OK;
        reason = null;
        since = null;
      }
      progressed(batch.size());
    } catch (SQLException e) {
      HistoryException h = SqliteFaults.of(file, "writing", e);
      fault(h);
      if (!h.problem().retryable()) {
        dropConnection();
        permanentFault = true;
      }
      notKept(batch);
    }
  }

  private boolean reopen() {
    if (permanentFault || closing || System.nanoTime() < nextRetryNanos) {
      return false;
    }
    open();
    return conn != null;
  }

  private void notKept(List<Object> batch) {
    for (Object e : batch) {
      long t = timeMs(e);
      unkeptFromMs = Math.min(unkeptFromMs, t);
      unkeptToMs = Math.max(unkeptToMs, t);
    }
    unkeptReason = reason;
    unstored += batch.size();
    progressed(batch.size());
  }

  private void progressed(int n) {
    synchronized (progress) {
      handled += n;
      progress.notifyAll();
    }
  }

  private void fault(HistoryException e) {
    nextRetryNanos = System.nanoTime() + settings.retryInterval().toNanos();
    if (e.problem() == Problem.NEWER_SCHEMA || e.problem() == Problem.CORRUPT
        || e.problem() == Problem.NOT_A_HISTORY) {
      permanentFault = true;
    }
    if (state == HistoryHealth.State.OK || !e.getMessage().equals(reason)) {
      LOG.warn("history is not being kept: {}", e.getMessage());
    }
    if (state == HistoryHealth.State.OK) {
      since = Instant.now();
    }
    reason = e.getMessage();
    state = HistoryHealth.State.NOT_KEEPING;
  }

  private void runPrune(Instant now, CompletableFuture<PruneReport> f) {
    if (conn == null) {
      f.completeExceptionally(new HistoryException(Problem.IO,
          "cannot prune: history is not being kept: " + reason));
      return;
    }
    List<Object> batch = new ArrayList<>();
    try {
      PruneReport r = new Pruner(conn, settings, () -> drainAndWrite(batch)).prune(now);
      LOG.info("history pruned as of {}: {}", now, r);
      f.complete(r);
    } catch (SQLException e) {
      f.completeExceptionally(SqliteFaults.of(file, "pruning", e));
    }
  }

  private void runBackup(Path target, CompletableFuture<Path> f) {
    if (conn == null) {
      f.completeExceptionally(new HistoryException(Problem.IO,
          "cannot back up: history is not being kept: " + reason));
      return;
    }
    if (Files.exists(target)) {
      f.completeExceptionally(new HistoryException(Problem.CANNOT_OPEN,
          "backup target " + target + " exists already"));
      return;
    }
    try (PreparedStatement p = conn.prepareStatement("VACUUM INTO ?")) {
      p.setString(1, target.toAbsolutePath().toString());
      p.execute();
    } catch (SQLException e) {
      f.completeExceptionally(SqliteFaults.of(target, "backing up " + file, e));
      return;
    }
    try (Connection copy = HistoryDatabase.openReader(target);
        Statement s = copy.createStatement();
        ResultSet r = s.executeQuery("PRAGMA integrity_check")) {
      String verdict = r.next() ? r.getString(1) : "";
      if ("ok".equals(verdict)) {
        f.complete(target);
      } else {
        f.completeExceptionally(new HistoryException(Problem.CORRUPT,
            "backup " + target + " fails integrity_check: " + verdict));
      }
    } catch (HistoryException e) {
      f.completeExceptionally(e);
    } catch (SQLException e) {
      f.completeExceptionally(SqliteFaults.of(target, "checking the backup", e));
    }
  }

  private void checkpoint() {
    try (Statement s = conn.createStatement()) {
      s.execute("PRAGMA wal_checkpoint(TRUNCATE)");
    } catch (SQLException e) {
      LOG.debug("idle WAL checkpoint did not complete: {}", e.getMessage());
    }
  }

  private void shutdown() {
    if (conn != null) {
      checkpoint();
    }
    dropConnection();
    synchronized (progress) {
      progress.notifyAll();
    }
  }

  private void dropConnection() {
    if (rows != null) {
      rows.close();
      rows = null;
    }
    HistoryDatabase.closeQuietly(conn);
    conn = null;
  }

  private static long timeMs(Object e) {
    if (e instanceof Frame f) {
      return f.time().toEpochMilli();
    } else if (e instanceof EstimateRow r) {
      return r.time().toEpochMilli();
    } else if (e instanceof AlarmEventRow a) {
      return a.time().toEpochMilli();
    } else if (e instanceof OperatorActionRow a) {
      return a.time().toEpochMilli();
    } else if (e instanceof RunRow r) {
      return r.started().toEpochMilli();
    } else if (e instanceof GapRow g) {
      return g.end().toEpochMilli();
    } else if (e instanceof SuggestionRow g) {
      return g.time().toEpochMilli();
    }
    return System.currentTimeMillis();
  }
}
