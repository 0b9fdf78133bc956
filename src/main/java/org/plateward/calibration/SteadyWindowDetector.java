package org.plateward.calibration;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.plateward.reactor.ModelOutputs;
import org.plateward.reactor.OperatingPoint;
import org.plateward.signals.Frame;
import org.plateward.signals.Signal;

/**
 * Finds the steady windows of a recording (see {@link SteadinessTolerances}). Frames are fed in
 * time order with {@link #accept}; only block sums are kept (17 signals per block), so a day at
 * 1 Hz costs some 1,500 blocks. Then {@link #windows} scans the blocks greedily: from each block
 * the run is extended while every signal's block means stay inside their band; a run at least
 * the minimum duration long is a window, and the scan continues after it.
 *
 * <p>A block in which a fast signal (inputs and the four temperatures) has no usable value ends
 * a run; the analyzer reports only every period, so a block without an analyzer value is skipped
 * for that signal. Blocks must follow each other without a missing block.
 */
public final class SteadyWindowDetector {
  private final SteadinessTolerances tol;
  private final List<Block> blocks = new ArrayList<>();
  private Instant origin;
  private Instant lastTime;

  private static final class Block {
    final long index;
    final double[] sum = new double[Signal.COUNT];
    final int[] count = new int[Signal.COUNT];
    Instant first;
    Instant last;
    int frames;

    Block(long index) {
      this.index = index;
    }

    boolean complete() {
      for (Signal s : Signal.values()) {
        if (s.kind() != Signal.Kind.ANALYZER && count[s.ordinal()] == 0) {
          return false;
        }
      }
      return true;
    }

    double mean(Signal s) {
      int n = count[s.ordinal()];
      return n == 0 ? Double.NaN : sum[s.ordinal()] / n;
    }
  }

  public SteadyWindowDetector(SteadinessTolerances tol) {
    this.tol = tol;
  }

  public SteadinessTolerances tolerances() {
    return tol;
  }

  /**
   * Adds one frame.
   *
   * @throws IllegalArgumentException when frames go back in time
   */
  public void accept(Frame f) {
    if (lastTime != null && f.time().isBefore(lastTime)) {
      throw new IllegalArgumentException("frames went back in time: " + f.time() + " after " + lastTime);
    }
    lastTime = f.time();
    if (origin == null) {
      origin = f.time();
    }
    long idx = Math.floorDiv(f.time().toEpochMilli() - origin.toEpochMilli(), Math.round(tol.blockS() * 1000.0));
    Block b = blocks.isEmpty() ? null : blocks.get(blocks.size() - 1);
    if (b == null || b.index != idx) {
      b = new Block(idx);
      b.first = f.time();
      blocks.add(b);
    }
    b.last = f.time();
    b.frames++;
    for (Signal s : Signal.values()) {
      if (f.usable(s)) {
        b.sum[s.ordinal()] += f.valueSi(s);
        b.count[s.ordinal()]++;
      }
    }
  }

  /** Frames seen so far. */
  public long frames() {
    long n = 0;
    for (Block b : blocks) {
      n += b.frames;
    }
    return n;
  }

  /**
   * The longest steady run seen by the last {@link #windows} call, for the message when no
   * window is long enough.
   *
   * @param durationS its length, s
   * @param from its first frame's time (null when no block was complete)
   * @param endedBy the signal whose band it left, or null when the data ended or a block was
   *     incomplete
   */
  public record LongestRun(double durationS, Instant from, Signal endedBy) {}

  private LongestRun longest = new LongestRun(0.0, null, null);
  private Signal breaker;

  /** The longest steady run of the last {@link #windows} call. */
  public LongestRun longestRun() {
    return longest;
  }

  /** The steady windows found in the frames so far, in time order. */
  public List<SteadyWindow> windows() {
    List<SteadyWindow> out = new ArrayList<>();
    int minBlocks = (int) Math.ceil(tol.minDurationS() / tol.blockS() - 1e-9);
    longest = new LongestRun(0.0, null, null);
    int i = 0;
    while (i < blocks.size()) {
      breaker = null;
      int end = extend(i);
      if (end > i) {
        double d = (blocks.get(end - 1).last.toEpochMilli() - blocks.get(i).first.toEpochMilli()) / 1000.0;
        if (d > longest.durationS()) {
          longest = new LongestRun(d, blocks.get(i).first, breaker);
        }
      }
      if (end - i >= minBlocks) {
        out.add(window(i, end));
        i = end;
      } else {
        i++;
      }
    }
    return out;
  }

  /** The end (exclusive) of the longest steady run starting at block {@code start}. */
  private int extend(int start) {
    if (!blocks.get(start).complete()) {
      return start;
    }
    double[] lo = new double[Signal.COUNT];
    double[] hi = new double[Signal.COUNT];
    double[] ref = new double[Signal.COUNT];
    java.util.Arrays.fill(lo, Double.POSITIVE_INFINITY);
    java.util.Arrays.fill(hi, Double.NEGATIVE_INFINITY);
    java.util.Arrays.fill(ref, Double.NaN);
    int j = start;
    while (j < blocks.size()) {
      Block b = blocks.get(j);
      if (!b.complete() || (j > start && b.index != blocks.get(j - 1).index + 1)) {
        break;
      }
      boolean inside = true;
      for (Signal s : Signal.values()) {
        double m = b.mean(s);
        if (Double.isNaN(m)) {
          continue;
        }
        int k = s.ordinal();
        if (Double.isNaN(ref[k])) {
          ref[k] = m;
        }
        double l = Math.min(lo[k], m);
        double h = Math.max(hi[k], m);
        if (h - l > tol.bandSi(s, ref[k])) {
          inside = false;
          breaker = s;
          break;
        }
      }
      if (!inside) {
        break;
      }
      for (Signal s : Signal.values()) {
        double m = b.mean(s);
        if (!Double.isNaN(m)) {
          lo[s.ordinal()] = Math.min(lo[s.ordinal()], m);
          hi[s.ordinal()] = Math.max(hi[s.ordinal()], m);
        }
      }
      j++;
    }
    return j;
  }

  private SteadyWindow window(int from, int to) {
    double[] sum = new double[Signal.COUNT];
    int[] cnt = new int[Signal.COUNT];
    int frames = 0;
    for (int j = from; j < to; j++) {
      Block b = blocks.get(j);
      frames += b.frames;
      for (int k = 0; k < Signal.COUNT; k++) {
        sum[k] += b.sum[k];
        cnt[k] += b.count[k];
      }
    }
    double[] mean = new double[Signal.COUNT];
    for (int k = 0; k < Signal.COUNT; k++) {
      mean[k] = cnt[k] == 0 ? Double.NaN : sum[k] / cnt[k];
    }
    OperatingPoint u = new OperatingPoint(
        mean[Signal.REF_GAS_FLOW.ordinal()], mean[Signal.REF_STEAM_FLOW.ordinal()],
        mean[Signal.REF_INLET_TEMP.ordinal()], mean[Signal.REF_PRESSURE.ordinal()],
        mean[Signal.FUEL_FLOW.ordinal()], mean[Signal.AIR_FLOW.ordinal()],
        mean[Signal.COMB_INLET_TEMP.ordinal()], mean[Signal.COMB_PRESSURE.ordinal()]);
    double[] y = new double[ModelOutputs.COUNT];
    int[] n = new int[ModelOutputs.COUNT];
    for (int m = 0; m < ModelOutputs.COUNT; m++) {
      int k = ModelOutputs.signal(m).ordinal();
      y[m] = mean[k];
      n[m] = cnt[k];
    }
    return new SteadyWindow(blocks.get(from).first, blocks.get(to - 1).last, frames, u, y, n);
  }
}
