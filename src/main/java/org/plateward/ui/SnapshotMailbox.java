package org.plateward.ui;

import java.util.List;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * The hand-over from the feed's thread to the FX thread: the feed offers every snapshot (never
 * a {@code Platform.runLater} per frame), and the window's pulse takes a bounded batch each
 * time it runs. Lock-free. A producer that may outrun the window (a replay at full speed) waits
 * while more than {@code capacity} snapshots are queued; a live feed never comes near it.
 */
public final class SnapshotMailbox {
  private final ConcurrentLinkedQueue<Snapshot> queue = new ConcurrentLinkedQueue<>();
  private final AtomicInteger size = new AtomicInteger();
  private final int capacity;
  private volatile boolean closed;

  /** @param capacity snapshots queued before {@link #offer} waits, &gt; 0 */
  public SnapshotMailbox(int capacity) {
    this.capacity = capacity;
  }

  /** Queues one snapshot; waits (1 ms steps) while the queue is full, unless closed. */
  public void offer(Snapshot s) {
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
