package org.plateward.ui;

import java.util.List;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * The hand-over from the feed's thread to the FX thread: the feed offers every snapshot (never
 * a {@code Platform.runLater} per frame), and the window's pulse takes a bounded batch each
 * time it runs. Lock-free. When more than {@code capacity} snapshots are queued, a replay (which
 * may outrun the window at full speed) waits, while a live feed never blocks the estimator: the
 * oldest queued snapshot is dropped and counted instead.
 */
public final class SnapshotMailbox {
  private final ConcurrentLinkedQueue<Snapshot> queue = new ConcurrentLinkedQueue<>();
  private final AtomicInteger size = new AtomicInteger();
  private final int capacity;
  private final boolean waitWhenFull;
  private final java.util.concurrent.atomic.AtomicLong dropped = new java.util.concurrent.atomic.AtomicLong();
  private volatile boolean closed;

  /**
   * @param capacity snapshots queued before the queue counts as full, &gt; 0
   * @param waitWhenFull true: {@link #offer} waits while full (replay); false: it drops the
   *     oldest queued snapshot (live)
   */
  public SnapshotMailbox(int capacity, boolean waitWhenFull) {
    this.capacity = capacity;
    this.waitWhenFull = waitWhenFull;
  }

  /** Snapshots dropped because the window fell behind (live feeds only). */
  public long dropped() {
    return dropped.get();
  }

  /** Queues one snapshot; when full, waits (1 ms steps, unless closed) or drops the oldest. */
  public void offer(Snapshot s) {
    if (!waitWhenFull) {
      while (size.get() >= capacity && queue.poll() != null) {
        size.decrementAndGet();
        dropped.incrementAndGet();
      }
      queue.add(s);
      size.incrementAndGet();
      return;
    }
    while (size.get() >= capacity && !closed) {
      try {
        Thread.sleep(1);
      } catch (InterruptedException e) {
        Thread.currentThread().interrupt();
        return;
      }
    }
    queue.add(s);
    size.incrementAndGet();
  }

  /**
   * Moves up to {@code max} queued snapshots, oldest first, into {@code into}.
   *
   * @return how many were moved
   */
  public int drainTo(List<Snapshot> into, int max) {
    int n = 0;
    Snapshot s;
    while (n < max && (s = queue.poll()) != null) {
      size.decrementAndGet();
      into.add(s);
      n++;
    }
    return n;
  }

  /** Snapshots waiting. */
  public int pending() {
    return size.get();
  }

  /** Lets a waiting producer go; later offers no longer wait. */
  public void close() {
    closed = true;
  }
}
