package org.plateward.ui;

import java.util.Arrays;

/**
 * How long each of the window's pulses kept the FX thread busy (taking snapshots in, moving the
 * replay cursor, redrawing the view on show), kept in a ring of the last few thousand pulses.
 * Written and read on the FX thread.
 */
public final class PulseTimings {
  private final long[] ns;
  private long count;

  /** @param capacity pulses kept */
  public PulseTimings(int capacity) {
    this.ns = new long[capacity];
  }

  /** Records one pulse's busy time, ns. */
  public void add(long busyNs) {
    ns[(int) (count % ns.length)] = busyNs;
    count++;
  }

  /** Pulses recorded in total. */
  public long count() {
    return count;
  }

  /** Forgets every pulse. */
  public void clear() {
    count = 0;
  }

  /**
   * The q-quantile of the busy time over the pulses kept, ms (nearest rank); NaN when none.
   *
   * @param q in [0, 1]
   */
  public double quantileMs(double q) {
    int n = (int) Math.min(count, ns.length);
    if (n == 0) {
      return Double.NaN;
    }
    long[] s = Arrays.copyOf(ns, n);
    Arrays.sort(s);
    int rank = (int) Math.ceil(q * n) - 1;
    return s[Math.max(0, Math.min(n - 1, rank))] / 1e6;
  }
}
