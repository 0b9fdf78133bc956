package org.plateward.ui;

import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.plateward.advisor.TrimSuggestion;
import org.plateward.alarms.AlarmEvent;
import org.plateward.alarms.AlarmStatus;
import org.plateward.estimation.ChannelStatus;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.EstimatorStatus;

/**
 * Everything the window has received, in columns of primitives (one entry per frame): the
 * estimate figures ({@link Trace}), every signal's value and quality, the cell profiles as
 * floats, the estimator status and reason, and the alarm transitions. About 1 kB per frame with
 * 60 cells, so a day at 1 Hz is under 100 MB. Owned by the FX thread (not thread-safe).
 */
public final class Timeline {
  private int size;
  private double[] timeS = new double[1024];
  private final double[][] traces = new double[Trace.values().length][1024];
  private final double[][] signals = new double[Signal.COUNT][1024];
  private byte[][] quality = new byte[Signal.COUNT][1024];
  private byte[][] fast = new byte[4][1024];
  private byte[] status = new byte[1024];
  private String[] reason = new String[1024];
  private float[][] cellTempK = new float[1024][];
  private float[][] cellTempSdK = new float[1024][];
  private float[][] cellMelt = new float[1024][];
  private Object[] observability = new Object[1024];
  private Object[] alarms = new Object[1024];
  private Object[] advice = new Object[1024];
  private final List<AlarmEvent> events = new ArrayList<>();
  private Estimate lastEstimate;
  private long version;

  /** Counts every change (append or update), so a view knows when to redraw. */
  public long version() {
    return version;
  }

  /** Frames held. */
  public int size() {
    return size;
  }

  /**
   * Appends one snapshot; times must not go backwards. A snapshot of the same estimate as the
   * last one (the feed re-sends it after an operator action) only replaces the alarm statuses
   * and adds the action's transitions.
   */
  public void append(Snapshot s) {
    Estimate e = s.estimate();
    version++;
    if (size > 0 && e == lastEstimate) {
      alarms[size - 1] = s.alarms();
      advice[size - 1] = s.advice();
      events.addAll(s.events());
      return;
    }
    lastEstimate = e;
    double t = seconds(e.time());
    if (size > 0 && t < timeS[size - 1]) {
      throw new IllegalArgumentException("snapshot at " + e.time() + " is before the last one held");
    }
    grow();
    int i = size;
    timeS[i] = t;
    double[] tr = {e.peakPlateTempK(), e.peakPlateTempSdK(), e.peakPositionM(), e.bufferMeltFraction(),
        e.bufferMeltFractionSd(), e.maxCellMeltFraction(), e.timeToExhaustS(), e.timeToExhaustSdS(), e.nis(),
        e.nisDof()};
    for (int k = 0; k < tr.length; k++) {
      traces[k][i] = tr[k];
    }
    double[] pred = s.predictedSi();
    for (int k = 0; k < 4; k++) {
      traces[Trace.predicted(k).ordinal()][i] = pred[k];
    }
    Frame f = s.frame();
    for (Signal sig : Signal.values()) {
      signals[sig.ordinal()][i] = f == null ? Double.NaN : f.valueSi(sig);
      quality[sig.ordinal()][i] = (byte) (f == null ? Quality.MISSING.ordinal() : f.quality(sig).ordinal());
    }
    ChannelStatus[] cs = s.fastStatus();
    for (int k = 0; k < 4; k++) {
      fast[k][i] = (byte) (cs == null ? -1 : cs[k].ordinal());
    }
    status[i] = (byte) e.status().ordinal();
    String r = e.reason() == null ? "" : e.reason();
    reason[i] = i > 0 && r.equals(reason[i - 1]) ? reason[i - 1] : r;
    cellTempK[i] = floats(e.cellPlateTempK());
    cellTempSdK[i] = floats(e.cellPlateTempSdK());
    cellMelt[i] = floats(e.cellMeltFraction());
    Map<String, Double> obs = e.observability();
    observability[i] = i > 0 && obs.equals(observability[i - 1]) ? observability[i - 1] : obs;
    alarms[i] = i > 0 && sameAlarms(s.alarms(), alarms(i - 1)) ? alarms[i - 1] : s.alarms();
    advice[i] = s.advice();
    events.addAll(s.events());
    size++;
  }

  private static boolean sameAlarms(List<AlarmStatus> a, List<AlarmStatus> b) {
    if (a.size() != b.size()) {
      return false;
    }
    for (int k = 0; k < a.size(); k++) {
      AlarmStatus x = a.get(k);
      AlarmStatus y = b.get(k);
      if (x.kind() != y.kind() || x.state() != y.state() || x.conditionActive() != y.conditionActive()
          || !Objects.equals(x.shelvedUntil(), y.shelvedUntil()) || !Objects.equals(x.reason(), y.reason())) {
        return false;
      }
    }
    return true; // judged values may differ slightly; the state is what the list shows
  }

  private static float[] floats(double[] d) {
    float[] f = new float[d.length];
    for (int k = 0; k < d.length; k++) {
      f[k] = (float) d[k];
    }
    return f;
  }

  private void grow() {
    if (size < timeS.length) {
      return;
    }
    int n = timeS.length * 2;
    timeS = Arrays.copyOf(timeS, n);
    for (int k = 0; k < traces.length; k++) {
      traces[k] = Arrays.copyOf(traces[k], n);
    }
    for (int k = 0; k < signals.length; k++) {
      signals[k] = Arrays.copyOf(signals[k], n);
      quality[k] = Arrays.copyOf(quality[k], n);
    }
    for (int k = 0; k < 4; k++) {
      fast[k] = Arrays.copyOf(fast[k], n);
    }
    status = Arrays.copyOf(status, n);
    reason = Arrays.copyOf(reason, n);
    cellTempK = Arrays.copyOf(cellTempK, n);
    cellTempSdK = Arrays.copyOf(cellTempSdK, n);
    cellMelt = Arrays.copyOf(cellMelt, n);
    observability = Arrays.copyOf(observability, n);
    alarms = Arrays.copyOf(alarms, n);
    advice = Arrays.copyOf(advice, n);
  }

  /** Seconds since the epoch of an instant. */
  public static double seconds(Instant t) {
    return t.getEpochSecond() + 1e-9 * t.getNano();
  }

  /** The instant of epoch seconds (millisecond resolution). */
  public static Instant instant(double epochS) {
    return Instant.ofEpochMilli(Math.round(epochS * 1000.0));
  }

  /** Frame times, epoch s; the array is live (read only the first {@link #size()} entries). */
  public double[] timesS() {
    return timeS;
  }

  /** One estimate figure per frame, SI (live array, first {@link #size()} entries). */
  public double[] trace(Trace t) {
    return traces[t.ordinal()];
  }

  /** One signal's value per frame, SI (live array, first {@link #size()} entries). */
  public double[] signal(Signal s) {
    return signals[s.ordinal()];
  }

  /** Time of frame i, epoch s. */
  public double timeS(int i) {
    return timeS[i];
  }

  /** Index of the last frame at or before t (0 when t precedes everything; -1 when empty). */
  public int indexAt(double tS) {
    if (size == 0) {
      return -1;
    }
    int k = MinMaxDecimator.firstAtOrAfter(timeS, size, tS);
    if (k < size && timeS[k] == tS) {
      return k;
    }
    return Math.max(0, k - 1);
  }

  public double value(Trace t, int i) {
    return traces[t.ordinal()][i];
  }

  public double value(Signal s, int i) {
    return signals[s.ordinal()][i];
  }

  public Quality quality(Signal s, int i) {
    return Quality.values()[quality[s.ordinal()][i]];
  }

  /** What the filter step did with frame-rate channel k at frame i; null before the first step. */
  public ChannelStatus fastStatus(int k, int i) {
    byte b = fast[k][i];
    return b < 0 ? null : ChannelStatus.values()[b];
  }

  public EstimatorStatus status(int i) {
    return EstimatorStatus.values()[status[i]];
  }

  public String reason(int i) {
    return reason[i];
  }

  /** Cell plate temperatures at frame i, K (empty before the estimator started). */
  public float[] cellTempK(int i) {
    return cellTempK[i];
  }

  public float[] cellTempSdK(int i) {
    return cellTempSdK[i];
  }

  public float[] cellMelt(int i) {
    return cellMelt[i];
  }

  @SuppressWarnings("unchecked")
  public Map<String, Double> observability(int i) {
    return (Map<String, Double>) observability[i];
  }

  @SuppressWarnings("unchecked")
  public List<AlarmStatus> alarms(int i) {
    return (List<AlarmStatus>) alarms[i];
  }

  public TrimSuggestion advice(int i) {
    return (TrimSuggestion) advice[i];
  }

  /** Every alarm transition received, in order. */
  public List<AlarmEvent> events() {
    return events;
  }

  /** The first alarm transition strictly after t that annunciates or clears, or null. */
  public AlarmEvent nextEventAfter(double tS) {
    for (AlarmEvent ev : events) {
      if (seconds(ev.time()) > tS + 1e-6 && (ev.to().annunciated() || ev.from().annunciated())) {
        return ev;
      }
    }
    return null;
  }
}
