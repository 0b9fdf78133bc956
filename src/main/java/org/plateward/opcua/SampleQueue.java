package org.plateward.opcua;

import java.util.ArrayDeque;
import java.util.List;

/**
 * A bounded hand-off from the OPC UA client's callbacks to our own threads. {@link #offer} never
 * blocks: when the queue is full it drops the oldest sample and counts it, so a slow consumer
 * cannot stall the client's publish loop.
 */
public final class SampleQueue {
  private final int capacity;
  private final ArrayDeque<Sample> queue;
  private long dropped;

  /** @param capacity most samples held; at least 1 */
  public SampleQueue(int capacity) {
    if (capacity < 1) {
      throw new IllegalArgumentException("capacity must be at least 1: " + capacity);
    }
    this.capacity = capacity;
    this.queue = new ArrayDeque<>(Math.min(capacity, 4096));
  }

  /** Adds a sample, dropping the oldest when full. Never blocks beyond a short lock. */
  public synchronized void offer(Sample s) {
    if (queue.size() == capacity) {
      queue.pollFirst();
      dropped++;
    }
    queue.addLast(s);
  }

  /** Moves every queued sample to {@code out}, oldest first; returns how many. */
  public synchronized int drainTo(List<Sample> out) {
    int n = queue.size();
    out.addAll(queue);
    queue.clear();
    return n;
  }

  /** Samples waiting (a health metric). */
  public synchronized int depth() {
    return queue.size();
  }

  /** Samples dropped on overflow since start. */
  public synchronized long dropped() {
    return dropped;
  }
}
