package org.plateward.report;

import java.awt.Color;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.plateward.alarms.AlarmKind;
import org.plateward.alarms.AlarmSettings;
import org.plateward.history.AlarmEventRow;
import org.plateward.plot.Chart;
import org.plateward.reactor.UnitSpec;

/**
 * The report's plots, headless, each {@value #WIDTH} x {@value #HEIGHT} pixels; temperatures in
 * degC, fractions in %, times in minutes from the period start. Limits are drawn in.
 */
public final class ReportPlots {
  public static final int WIDTH = 1000;
  public static final int HEIGHT = 460;
  /** The files written, in order. */
  public static final List<String> FILES = List.of("profiles.png", "hidden-peak.png", "melt-fraction.png",
      "time-to-exhaust.png", "alarm-timeline.png");

  private static final Color[] SNAPSHOT = {Chart.DATA2, Chart.LIMIT, new Color(0xC0, 0x6A, 0x00), Chart.DATA};

  private ReportPlots() {}

  /** Writes every plot into {@code dir}. */
  public static void write(Path dir, UpsetRecord r, UnitSpec unit, double[] cellCentresM, AlarmSettings alarms)
      throws IOException {
    List<Instant> t = r.times();
    Instant t0 = t.isEmpty() ? Instant.EPOCH : t.get(0);
    double[] x = new double[t.size()];
    for (int i = 0; i < x.length; i++) {
      x[i] = (t.get(i).toEpochMilli() - t0.toEpochMilli()) / 60000.0;
    }
    String xLabel = "minutes from " + t0;
    double limitC = unit.plate().materialLimitK() - 273.15;
    double meltC = unit.buffer().meltingPointK() - 273.15;

    // profile snapshots
    Chart prof = new Chart("Plate temperature profile at key moments (" + unit.name() + ")",
        "distance from the reforming inlet, mm", "degC");
    int k = 0;
    for (UpsetRecord.Snapshot s : r.snapshots()) {
      double[] tk = s.point().cellTempK();
      double[] sd = s.point().cellTempSdK();
      double[] z = new double[tk.length];
      double[] c = new double[tk.length];
      for (int j = 0; j < tk.length; j++) {
        z[j] = 1000 * (j < cellCentresM.length ? cellCentresM[j] : Double.NaN);
        c[j] = tk[j] - 273.15;
      }
      Color col = SNAPSHOT[k++ % SNAPSHOT.length];
      if (sd.length == tk.length) {
        double[] lo = new double[tk.length];
        double[] hi = new double[tk.length];
        for (int j = 0; j < tk.length; j++) {
          lo[j] = c[j] - sd[j];
          hi[j] = c[j] + sd[j];
        }
        prof.band(z, lo, hi, new Color(col.getRed(), col.getGreen(), col.getBlue(), 0x38), "");
      }
      prof.line(z, c, col, s.label() + " " + s.point().time());
    }
    prof.horizontal(limitC, Chart.LIMIT, "material limit").horizontal(meltC, Chart.DATA2, "buffer melting point");
    prof.writePng(WIDTH, HEIGHT, dir.resolve(FILES.get(0)));

    // hidden peak ± sigma
    double[][] pkBand = meanAndBand(r.series(0), r.series(1), -273.15, 1.0, Double.NEGATIVE_INFINITY);
    double[] pc = pkBand[0];
    double[] lo = pkBand[1];
    double[] hi = pkBand[2];
    Chart pk = new Chart("Hidden peak plate temperature ± σ (estimate)", xLabel, "degC")
        .band(x, lo, hi, Chart.BAND, "± σ")
        .line(x, pc, Chart.DATA, "hidden peak")
        .horizontal(limitC, Chart.LIMIT, "material limit")
        .horizontal(meltC, Chart.DATA2, "buffer melting point");
    if (alarms != null) {
      pk.horizontal(alarms.definition(AlarmKind.PEAK_HIGH).limit() - 273.15, new Color(0xC0, 0x6A, 0x00), "peak_high limit");
    }
    pk.writePng(WIDTH, HEIGHT, dir.resolve(FILES.get(1)));

    // melt fraction
    double[] mx = r.series(4);
    double[] ov = r.series(3);
    for (int i = 0; i < mx.length; i++) {
      mx[i] *= 100;
      ov[i] *= 100;
    }
    Chart mf = new Chart("Buffer-layer melt fraction (estimate)", xLabel, "%")
        .line(x, mx, Chart.LIMIT, "largest cell")
        .line(x, ov, Chart.DATA, "overall (length-weighted)")
        .yRange(-2, 102);
    if (alarms != null) {
      mf.horizontal(100 * alarms.definition(AlarmKind.MELT_HIGH).limit(), Chart.DATA2, "melt_high limit");
    }
    mf.writePng(WIDTH, HEIGHT, dir.resolve(FILES.get(2)));

    // time to exhaust
    double[][] teBand = meanAndBand(r.series(5), r.series(6), 0.0, 1.0 / 60.0, 0.0);
    double[] tm = teBand[0];
    double[] tlo = teBand[1];
    double[] thi = teBand[2];
    Chart te = new Chart("Time-to-exhaust (estimate; gaps: no melt-through forecast within the horizon)", xLabel, "min")
        .band(x, tlo, thi, Chart.BAND, "± spread")
        .line(x, tm, Chart.DATA, "time-to-exhaust")
        .xRange(x.length == 0 ? 0 : x[0], x.length == 0 ? 1 : x[x.length - 1]);
    if (alarms != null) {
      te.horizontal(alarms.definition(AlarmKind.EXHAUST_LOW).limit() / 60.0, Chart.LIMIT, "exhaust_low limit");
    }
    boolean anyTte = false;
    for (double v : tm) {
      anyTte |= Double.isFinite(v);
    }
    if (!anyTte) {
      te.yRange(0, 10);
    }
    te.writePng(WIDTH, HEIGHT, dir.resolve(FILES.get(3)));

    alarmTimeline(r.alarms(), t0, x.length == 0 ? 1 : x[x.length - 1], xLabel).writePng(WIDTH, HEIGHT, dir.resolve(FILES.get(4)));
  }

  /**
   * One row per alarm: bars where it is in alarm (unacknowledged or acknowledged), grey where it
   * is otherwise out of normal (returned unacknowledged, shelved, suppressed, out of service).
   */
  static Chart alarmTimeline(List<AlarmEventRow> events, Instant t0, double endMin, String xLabel) {
    Map<String, Integer> rows = new LinkedHashMap<>();
    for (AlarmKind k : AlarmKind.values()) {
      rows.put(k.key(), rows.size());
    }
    for (AlarmEventRow e : events) {
      rows.putIfAbsent(e.alarmId(), rows.size());
    }
    Chart c = new Chart("Advisory alarm timeline (" + events.size() + " state transitions)", xLabel, "")
        .rows(rows.keySet().toArray(new String[0]))
        .xRange(0.0, Math.max(endMin, 1e-3));
    Map<String, String> state = new LinkedHashMap<>();
    Map<String, Double> since = new LinkedHashMap<>();
    List<Object[]> bars = new ArrayList<>();
    for (AlarmEventRow e : events) {
      double m = (e.time().toEpochMilli() - t0.toEpochMilli()) / 60000.0;
      String prev = state.getOrDefault(e.alarmId(), "normal");
      if (!prev.equals("normal")) {
        bars.add(new Object[] {e.alarmId(), since.get(e.alarmId()), m, prev});
      }
      String to = e.transition().contains("->") ? e.transition().substring(e.transition().indexOf("->") + 2).strip()
          : e.transition();
      state.put(e.alarmId(), to);
      since.put(e.alarmId(), m);
    }
    for (Map.Entry<String, String> s : state.entrySet()) {
      if (!s.getValue().equals("normal")) {
        bars.add(new Object[] {s.getKey(), since.get(s.getKey()), endMin, s.getValue()});
      }
    }
    for (Object[] b : bars) {
      String st = (String) b[3];
      boolean inAlarm = st.equals("unacknowledged") || st.equals("acknowledged");
      c.bar(rows.get((String) b[0]), (Double) b[1], (Double) b[2], inAlarm ? Chart.LIMIT : Chart.DATA2,
          inAlarm ? "in alarm" : "other than normal (returned unacknowledged, shelved, suppressed, out of service)");
    }
    return c;
  }

  /**
   * A series and its ± σ band in display units, (v + offset) · scale, the band's lower edge
   * kept at or above {@code floor}: {mean, lower, upper}.
   */
  private static double[][] meanAndBand(double[] v, double[] sd, double offset, double scale, double floor) {
    double[][] out = new double[3][v.length];
    for (int i = 0; i < v.length; i++) {
      out[0][i] = (v[i] + offset) * scale;
      out[1][i] = Math.max(floor, (v[i] + offset - sd[i]) * scale);
      out[2][i] = (v[i] + offset + sd[i]) * scale;
    }
    return out;
  }
}
