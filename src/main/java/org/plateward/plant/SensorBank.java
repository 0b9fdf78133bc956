package org.plateward.plant;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;
import org.plateward.signals.StatusName;

/**
 * Turns true boundary values into readings, frame by frame: first-order lag, seeded Gaussian
 * noise, the scenario's sensor faults, quantisation, and the analyzer's sampling with dead time
 * (see {@link SensorSpec} and {@link SensorSuite}). Faults act on the reading in this order:
 * drift (bias growing at a constant rate from the fault's start), spikes (single frames, random
 * times with the given mean interval, random sign), quantisation, stuck (the reading freezes at
 * its value on the fault's first frame, status stays Good: a stuck sensor does not know it),
 * dropout (quality BAD, value missing). The first analyzer result published after a dropout of
 * that analyzer channel is marked UNCERTAIN (the instrument is re-stabilising).
 *
 * <p>Every signal has its own random stream derived from the seed, so adding a fault to one
 * signal leaves the noise of all others unchanged. Not thread-safe.
 */
public final class SensorBank {
  private static final long GOLDEN = 0x9E3779B97F4A7C15L;

  private final SensorSuite suite;
  private final double dtS;
  private final Random[] noise = new Random[Signal.COUNT];
  private final double[] lagged = new double[Signal.COUNT];
  /** Systematic error of each meter for this run (standard normal draw, scaled in measure). */
  private final double[] accuracyDraw = new double[Signal.COUNT];
  private final double[] alpha = new double[Signal.COUNT];
  private final List<List<ScenarioEvent>> faults = new ArrayList<>();
  private final Map<ScenarioEvent, Random> spikeStreams = new java.util.IdentityHashMap<>();
  private final Map<ScenarioEvent, Double> stuckValue = new java.util.IdentityHashMap<>();
  private final long periodSteps;
  private final long deadSteps;
  private final ArrayDeque<PendingSample> pending = new ArrayDeque<>();
  private final boolean[] analyzerWasOut = new boolean[Signal.COUNT];
  private final boolean[] analyzerPublished = new boolean[Signal.COUNT];
  private boolean first = true;

  private record PendingSample(long dueFrame, double[] valuesSi) {}

  public SensorBank(SensorSuite suite, double samplePeriodS, long seed, List<ScenarioEvent> events) {
    this.suite = suite;
    this.dtS = samplePeriodS;
    for (Signal s : Signal.values()) {
      noise[s.ordinal()] = new Random(seed ^ (GOLDEN * (s.ordinal() + 1)));
      // a stream of its own, so the noise streams are those of a plant without systematic errors
      // (SplittableRandom mixes its seed: java.util.Random's first draws from seeds that differ
      // in a few bits are correlated)
      accuracyDraw[s.ordinal()] = new java.util.SplittableRandom(seed ^ (GOLDEN * (2000 + s.ordinal()))).nextGaussian();
      double tau = suite.spec(s).lagS();
      alpha[s.ordinal()] = tau > 0.0 ? 1.0 - Math.exp(-dtS / tau) : 1.0;
      faults.add(new ArrayList<>());
    }
    int index = 0;
    for (ScenarioEvent ev : events) {
      index++;
      if (ev.kind().isUpset()) {
        continue;
      }
      for (Signal s : ev.targets()) {
        faults.get(s.ordinal()).add(ev);
      }
      if (ev.kind() == EventKind.SPIKES) {
        spikeStreams.put(ev, new Random(seed ^ (GOLDEN * (1000 + index))));
      }
    }
    this.periodSteps = Math.max(1, Math.round(suite.analyzerPeriodS() / dtS));
    this.deadSteps = Math.max(0, Math.round(suite.analyzerDeadTimeS() / dtS));
  }

  /**
   * Readings of frame {@code k} at time {@code tS}.
   *
   * @param trueSi true boundary values in SI, indexed by signal ordinal
   * @param valuesSi receives the readings in SI (NaN when missing)
   * @param quality receives the quality of each reading
   * @param status receives explicit status names (analyzer frames without a new sample)
   */
  public void read(long k, double tS, double[] trueSi, double[] valuesSi, Quality[] quality,
      Map<Signal, StatusName> status) {
    status.clear();
    for (Signal s : Signal.values()) {
      int i = s.ordinal();
      lagged[i] = first ? trueSi[i] : lagged[i] + (trueSi[i] - lagged[i]) * alpha[i];
    }
    first = false;
    for (Signal s : Signal.values()) {
      if (s.kind() == Signal.Kind.ANALYZER) {
        continue;
      }
      int i = s.ordinal();
      double edge = measure(s, lagged[i], tS);
      if (isDroppedOut(s, tS)) {
        valuesSi[i] = Double.NaN;
        quality[i] = Quality.BAD;
      } else {
        valuesSi[i] = s.unit().toSi(edge);
        quality[i] = Quality.GOOD;
      }
    }
    analyzer(k, tS, valuesSi, quality, status);
  }

  private void analyzer(long k, double tS, double[] valuesSi, Quality[] quality, Map<Signal, StatusName> status) {
    if (k % periodSteps == 0) {
      double[] sample = new double[Signal.COUNT];
      Arrays.fill(sample, Double.NaN);
      for (Signal s : Signal.values()) {
        if (s.kind() == Signal.Kind.ANALYZER && !isDroppedOut(s, tS)) {
          sample[s.ordinal()] = s.unit().toSi(measure(s, lagged[s.ordinal()], tS));
        }
      }
      pending.addLast(new PendingSample(k + deadSteps, sample));
    }
    double[] due = null;
    while (!pending.isEmpty() && pending.peekFirst().dueFrame() <= k) {
      due = pending.pollFirst().valuesSi();
    }
    for (Signal s : Signal.values()) {
      if (s.kind() != Signal.Kind.ANALYZER) {
        continue;
      }
      int i = s.ordinal();
      if (isDroppedOut(s, tS)) {
        valuesSi[i] = Double.NaN;
        quality[i] = Quality.BAD;
        analyzerWasOut[i] = true;
      } else if (due != null && !Double.isNaN(due[i])) {
        valuesSi[i] = due[i];
        quality[i] = analyzerWasOut[i] ? Quality.UNCERTAIN : Quality.GOOD;
        analyzerWasOut[i] = false;
        analyzerPublished[i] = true;
      } else {
        valuesSi[i] = Double.NaN;
        quality[i] = Quality.MISSING;
        if (analyzerPublished[i]) { // before the first result the status is Bad_WaitingForInitialData
          status.put(s, analyzerWasOut[i] ? StatusName.BAD_NO_COMMUNICATION : StatusName.UNCERTAIN_LAST_USABLE_VALUE);
        }
      }
    }
  }

  /** One reading in the edge unit: lagged value, noise, drift, spikes, quantisation, stuck. */
  private double measure(Signal s, double laggedSi, double tS) {
    int i = s.ordinal();
    SensorSpec spec = suite.spec(s);
    double edge = s.unit().fromSi(laggedSi);
    double scale = spec.relativeNoise() ? Math.abs(edge) : 1.0;
    edge += spec.accuracySd() * scale * accuracyDraw[i]; // the meter's systematic error
    edge += spec.noiseSd() * scale * noise[i].nextGaussian(); // drawn every frame, so the stream never shifts
    double edgePerSi = 1.0 / (s.unit().toSi(1.0) - s.unit().toSi(0.0));
    ScenarioEvent stuck = null;
    for (ScenarioEvent ev : faults.get(i)) {
      switch (ev.kind()) {
        case DRIFT -> {
          if (ev.activeAt(tS)) {
            edge += ev.magnitude() * edgePerSi * (tS - ev.atS()); // bias = rate (t - t0)
          }
        }
        case SPIKES -> {
          if (ev.activeAt(tS)) {
            Random r = spikeStreams.get(ev);
            double u = r.nextDouble(); // one draw per frame while active: P(spike) = dt / interval
            double sign = r.nextBoolean() ? 1.0 : -1.0;
            if (u < dtS / ev.intervalS()) {
              edge += sign * ev.magnitude() * edgePerSi;
            }
          }
        }
        case STUCK -> {
          if (ev.activeAt(tS)) {
            stuck = ev;
          }
        }
        default -> { }
      }
    }
    if (spec.quantum() > 0.0) {
      edge = spec.quantum() * Math.rint(edge / spec.quantum());
    }
    if (stuck != null) {
      Double held = stuckValue.get(stuck);
      if (held == null) {
        stuckValue.put(stuck, edge);
      } else {
        edge = held;
      }
    }
    return edge;
  }

  private boolean isDroppedOut(Signal s, double tS) {
    for (ScenarioEvent ev : faults.get(s.ordinal())) {
      if (ev.kind() == EventKind.DROPOUT && ev.activeAt(tS)) {
        return true;
      }
    }
    return false;
  }

  /** An empty status map for {@link #read}. */
  static Map<Signal, StatusName> newStatusMap() {
    return new EnumMap<>(Signal.class);
  }
}
