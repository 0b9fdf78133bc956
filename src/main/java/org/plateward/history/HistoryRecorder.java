package org.plateward.history;

import java.nio.file.Path;
import java.sql.Connection;
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

  private final HistorySettings settings;
  private final SchemaMigrator migrator;
  private final Path file;
  private final ArrayBlockingQueue<Object> measurements;
  private final ArrayBlockingQueue<Object> audit;
  private final ConcurrentLinkedQueue<PruneRequest> pruneRequests = new ConcurrentLinkedQueue<>();
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

  private record PruneRequest(Instant now, CompletableFuture<PruneReport> result) {}

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
    return new HistoryHealth(state, reason, since, stored, dropped.get(), unstored,
        measurements.size() + audit.size());
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
    if (closing) {
      f.completeExceptionally(new IllegalStateException("history recorder is closed"));
      return f;
    }
    pruneRequests.add(new PruneRequest(now, f));
    LockSupport.unpark(writer);
    return f;
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
    while (true) {
      boolean stop = closing;
      long now = System.nanoTime();
      boolean due = stop
          || !audit.isEmpty()
          || measurements.size() >= settings.maxBatchEntries()
          || now - last >= interval
          || completed() < flushTarget
          || !pruneRequests.isEmpty();
      if (!due) {
        LockSupport.parkNanos(this, interval - (now - last));
        continue;
      }
      last = now;
      drainAndWrite(batch);
      PruneRequest p;
      while ((p = pruneRequests.poll()) != null) {
        runPrune(p, batch);
      }
      if (stop && audit.isEmpty() && measurements.isEmpty()) {
        break;
      }
    }
    PruneRequest p;
    while ((p = pruneRequests.poll()) != null) {
      p.result().completeExceptionally(new IllegalStateException("history recorder closed"));
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
      if (e instanceof AlarmEventRow || e instanceof OperatorActionRow || e instanceof RunRow) {
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

  private void runPrune(PruneRequest p, List<Object> batch) {
    if (conn == null) {
      p.result().completeExceptionally(new HistoryException(Problem.IO,
          "cannot prune: history is not being kept: " + reason));
      return;
    }
    try {
      PruneReport r = new Pruner(conn, settings, () -> drainAndWrite(batch)).prune(p.now());
      LOG.info("history pruned as of {}: {}", p.now(), r);
      p.result().complete(r);
    } catch (SQLException e) {
      p.result().completeExceptionally(SqliteFaults.of(file, "pruning", e));
    } catch (RuntimeException e) {
      p.result().completeExceptionally(e);
    }
  }

  private void shutdown() {
    if (conn != null) {
      try (Statement s = conn.createStatement()) {
        s.execute("PRAGMA wal_checkpoint(TRUNCATE)");
      } catch (SQLException e) {
        LOG.warn("history checkpoint on close failed: {}", e.getMessage());
      }
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
    }
    return System.currentTimeMillis();
  }
}
