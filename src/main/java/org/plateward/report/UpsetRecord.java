package org.plateward.report;

import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.plateward.history.AlarmEventRow;

/**
 * Everything an upset report is drawn from, gathered one estimate at a time: the scalar series
 * (every estimate: about 100 bytes each, under 1 MB for 2 h at 1 Hz), the profiles at the key
 * moments (start, hottest moment, first melt-through, end) and the alarm events.
 */
public final class UpsetRecord {
  /** A cell counts as melted through at this melt fraction. */
  public static final double MELT_THROUGH = 0.999;

  /** One profile snapshot. */
  public record Snapshot(String label, ReportPoint point) {}

  private final List<Instant> times = new ArrayList<>();
  private final List<double[]> values = new ArrayList<>(); // peak, sd, pos, melt, maxMelt, tte, tteSd
  private final Map<String, Long> statusCounts = new LinkedHashMap<>();
  private final List<AlarmEventRow> alarms = new ArrayList<>();
  private ReportPoint first;
  private ReportPoint hottest;
  private ReportPoint meltThrough;
  private ReportPoint last;

  /** Adds the next estimate (time order). */
  public void add(ReportPoint p) {
    times.add(p.time());
    values.add(new double[] {p.peakTempK(), p.peakTempSdK(), p.peakPositionM(), p.meltFraction(),
        p.maxCellMeltFraction(), p.timeToExhaustS(), p.timeToExhaustSdS()});
    statusCounts.merge(p.status(), 1L, Long::sum);
    boolean running = Double.isFinite(p.peakTempK()) && p.cellTempK().length > 0;
    if (running && first == null) {
      first = p;
    }
    if (running && (hottest == null || p.peakTempK() > hottest.peakTempK())) {
      hottest = p;
    }
    if (running && meltThrough == null && p.maxCellMeltFraction() >= MELT_THROUGH) {
      meltThrough = p;
    }
    if (running) {
      last = p;
    }
  }

  /** Adds one alarm event (time order). */
  public void addAlarm(AlarmEventRow e) {
    alarms.add(e);
  }

  public int size() {
    return times.size();
  }

  public List<Instant> times() {
    return List.copyOf(times);
  }

  /** One series: 0 peak K, 1 peak σ K, 2 position m, 3 melt, 4 max-cell melt, 5 tte s, 6 tte σ s. */
  public double[] series(int k) {
    double[] s = new double[values.size()];
    for (int i = 0; i < s.length; i++) {
      s[i] = values.get(i)[k];
    }
    return s;
  }

  public List<AlarmEventRow> alarms() {
    return List.copyOf(alarms);
  }

  public Map<String, Long> statusCounts() {
    return new LinkedHashMap<>(statusCounts);
  }

  /** The profile snapshots: start, hottest moment, first melt-through (if any), end. */
  public List<Snapshot> snapshots() {
    List<Snapshot> s = new ArrayList<>();
    if (first != null) {
      s.add(new Snapshot("start", first));
    }
    if (hottest != null) {
      s.add(new Snapshot("hottest (peak maximum)", hottest));
    }
    if (meltThrough != null) {
      s.add(new Snapshot("first melt-through", meltThrough));
    }
    if (last != null) {
      s.add(new Snapshot("end", last));
    }
    return s;
  }

  public ReportPoint hottest() {
    return hottest;
  }

  public ReportPoint meltThrough() {
    return meltThrough;
  }
}
