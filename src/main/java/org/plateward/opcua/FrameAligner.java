package org.plateward.opcua;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.Map;
import java.util.Set;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;

/**
 * Turns irregular samples into {@link Frame}s on a fixed clock. Deterministic and free of I/O:
 * the caller supplies every sample and asks for each frame time, so the same logic serves live
 * data and tests.
 *
 * <p>Rules, per signal:
 *
 * <ul>
 *   <li>a sample is placed at its {@link Sample#alignmentTime()} (SourceTimestamp, else
 *       ServerTimestamp, else receive time); when the SourceTimestamp is more than the skew limit
 *       away from the local receive time, the sample is placed at its receive time and the signal
 *       is flagged as clock-skewed;
 *   <li>the frame at time t holds the latest sample placed at or before t;
 *   <li>when that sample is older than {@code staleMultiple × samplingInterval}, the signal is
 *       MISSING (NaN) and flagged stale — a held value is never passed on as fresh;
 *   <li>{@link #invalidate(Instant)} (connection lost) forgets every sample placed before the
 *       instant, so a value from before an outage cannot reappear after it.
 * </ul>
 */
public final class FrameAligner {
  private final Map<Signal, Duration> staleLimit = new EnumMap<>(Signal.class);
  private final Duration skewLimit;
  /** Samples per signal in order of placement time; the head is the latest at or before the last frame. */
  private final Map<Signal, ArrayDeque<Placed>> pending = new EnumMap<>(Signal.class);
  private final boolean[] everSeen = new boolean[Signal.COUNT];
  private int samplesSinceFrame;

  /** Most samples kept per signal between frames (newer ones push the oldest out). */
  static final int MAX_PENDING = 256;

  private record Placed(Sample sample, Instant at, boolean skewed) {}

  /**
   * @param samplingIntervalS per measured signal, the (revised) sampling interval, s; signals not
   *     in the map are never measured and always MISSING
   * @param staleMultiple a signal is stale after this many sampling intervals without a sample
   * @param skewLimitS SourceTimestamp vs receive time beyond this is flagged, s
   * @param framePeriodS the frame period, s; the stale limit is at least one frame period
   */
  public FrameAligner(
      Map<Signal, Double> samplingIntervalS, double staleMultiple, double skewLimitS, double framePeriodS) {
    if (!(staleMultiple >= 1.0) || !(skewLimitS > 0.0) || !(framePeriodS > 0.0)) {
      throw new IllegalArgumentException("stale multiple >= 1, skew limit and frame period > 0");
    }
    for (var e : samplingIntervalS.entrySet()) {
      double limitS = Math.max(staleMultiple * e.getValue(), framePeriodS);
      staleLimit.put(e.getKey(), Duration.ofNanos(Math.round(limitS * 1e9)));
    }
    this.skewLimit = Duration.ofNanos(Math.round(skewLimitS * 1e9));
  }

  /** Takes one sample, in any order. */
  public void accept(Sample s) {
    if (!staleLimit.containsKey(s.signal())) {
      return;
    }
    Instant at = s.alignmentTime();
    boolean skew = false;
    if (s.sourceTime() != null
        && Duration.between(s.receivedAt(), s.sourceTime()).abs().compareTo(skewLimit) > 0) {
      at = s.receivedAt();
      skew = true;
    }
    ArrayDeque<Placed> d = pending.computeIfAbsent(s.signal(), k -> new ArrayDeque<>());
    Placed p = new Placed(s, at, skew);
    if (d.isEmpty() || !at.isBefore(d.peekLast().at())) {
      d.addLast(p);
    } else {
      // rare: out of order; re-insert sorted
      List<Placed> all = new ArrayList<>(d);
      int k = all.size();
      while (k > 0 && all.get(k - 1).at().isAfter(at)) {
        k--;
      }
      all.add(k, p);
      d.clear();
      d.addAll(all);
    }
    while (d.size() > MAX_PENDING) {
      d.pollFirst();
    }
    everSeen[s.signal().ordinal()] = true;
    samplesSinceFrame++;
  }

  /** Forgets every sample placed before {@code t} (the connection was lost at t). */
  public void invalidate(Instant t) {
    for (ArrayDeque<Placed> d : pending.values()) {
      while (!d.isEmpty() && d.peekFirst().at().isBefore(t)) {
        d.pollFirst();
      }
    }
  }

  /**
   * The frame at time {@code t}.
   *
   * @param t frame time (end of the frame interval)
   */
  public AlignedFrame frameAt(Instant t) {
    double[] v = new double[Signal.COUNT];
    Quality[] q = new Quality[Signal.COUNT];
    Arrays.fill(v, Double.NaN);
    Arrays.fill(q, Quality.MISSING);
    Set<Signal> stale = EnumSet.noneOf(Signal.class);
    Set<Signal> skew = EnumSet.noneOf(Signal.class);
    for (Signal s : Signal.values()) {
      int i = s.ordinal();
      Duration limit = staleLimit.get(s);
      if (limit == null) {
        continue;
      }
      ArrayDeque<Placed> d = pending.get(s);
      while (d != null && d.size() > 1 && !d.stream().skip(1).findFirst().get().at().isAfter(t)) {
        d.pollFirst(); // superseded by a later sample at or before t
      }
      Placed x = d == null ? null : d.peekFirst();
      if (x == null || x.at().isAfter(t)) {
        if (everSeen[i]) {
          stale.add(s);
        }
        continue;
      }
      if (Duration.between(x.at(), t).compareTo(limit) > 0) {
        stale.add(s);
        continue;
      }
      v[i] = x.sample().quality() == Quality.MISSING ? Double.NaN : x.sample().valueSi();
      q[i] = x.sample().quality();
      if (x.skewed()) {
        skew.add(s);
      }
    }
    int used = samplesSinceFrame;
    samplesSinceFrame = 0;
    return new AlignedFrame(new Frame(t, v, q), stale, skew, used);
  }
}
