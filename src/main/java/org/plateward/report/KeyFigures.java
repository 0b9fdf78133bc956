package org.plateward.report;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.plateward.history.AlarmEventRow;

/** The key figures of an upset record. */
public final class KeyFigures {
  private KeyFigures() {}

  /** The figures, in table order. */
  public static List<KeyFigure> of(UpsetRecord r) {
    List<KeyFigure> f = new ArrayList<>();
    List<Instant> t = r.times();
    if (t.isEmpty()) {
      f.add(new KeyFigure("estimates", "0", "", "estimates in the period"));
      return f;
    }
    f.add(new KeyFigure("period_start", t.get(0).toString(), "", "first estimate"));
    f.add(new KeyFigure("period_end", t.get(t.size() - 1).toString(), "", "last estimate"));
    f.add(new KeyFigure("duration", num(Duration.between(t.get(0), t.get(t.size() - 1)).toMillis() / 60000.0, 1), "min",
        "length of the period"));
    f.add(new KeyFigure("estimates", Integer.toString(r.size()), "", "estimates in the period"));
    ReportPoint hot = r.hottest();
    if (hot != null) {
      f.add(new KeyFigure("peak_max", num(hot.peakTempK() - 273.15, 1), "degC", "highest hidden peak plate temperature"));
      f.add(new KeyFigure("peak_max_sd", num(hot.peakTempSdK(), 1), "K", "standard deviation of the highest hidden peak"));
      f.add(new KeyFigure("peak_max_time", hot.time().toString(), "", "time of the highest hidden peak"));
      f.add(new KeyFigure("peak_max_position", num(1000 * hot.peakPositionM(), 0), "mm", "position of the highest hidden peak from the reforming inlet"));
    }
    double[] maxMelt = r.series(4);
    double[] melt = r.series(3);
    int iMelt = argMax(maxMelt);
    if (iMelt >= 0) {
      f.add(new KeyFigure("max_cell_melt_max", num(100 * maxMelt[iMelt], 1), "%", "largest melt fraction of any cell"));
      f.add(new KeyFigure("max_cell_melt_max_time", t.get(iMelt).toString(), "", "time of the largest cell melt fraction"));
    }
    int iOverall = argMax(melt);
    if (iOverall >= 0) {
      f.add(new KeyFigure("overall_melt_max", num(100 * melt[iOverall], 2), "%", "largest overall melt fraction"));
    }
    ReportPoint mt = r.meltThrough();
    f.add(new KeyFigure("first_melt_through", mt == null ? "none" : mt.time().toString(), "",
        "first estimate with a cell melted through (melt fraction >= " + UpsetRecord.MELT_THROUGH + ")"));
    double[] tte = r.series(5);
    int iTte = argMin(tte);
    f.add(new KeyFigure("time_to_exhaust_min", iTte < 0 ? "" : num(tte[iTte] / 60.0, 1), "min",
        iTte < 0 ? "no exhaustion forecast in the period" : "shortest forecast time-to-exhaust"));
    if (iTte >= 0) {
      f.add(new KeyFigure("time_to_exhaust_min_time", t.get(iTte).toString(), "", "time of the shortest time-to-exhaust"));
    }
    for (Map.Entry<String, Long> e : r.statusCounts().entrySet()) {
      f.add(new KeyFigure("estimator_" + e.getKey(), num(100.0 * e.getValue() / r.size(), 1), "%",
          "share of estimates with status " + e.getKey()));
    }
    Map<String, Integer> annunciated = new TreeMap<>();
    for (AlarmEventRow a : r.alarms()) {
      if (a.transition().endsWith("-> unacknowledged")) {
        annunciated.merge(a.alarmId(), 1, Integer::sum);
      }
    }
    f.add(new KeyFigure("alarm_events", Integer.toString(r.alarms().size()), "", "alarm state transitions"));
    for (Map.Entry<String, Integer> e : annunciated.entrySet()) {
      f.add(new KeyFigure("annunciated_" + e.getKey(), Integer.toString(e.getValue()), "", "times " + e.getKey() + " was annunciated"));
    }
    return f;
  }

  private static int argMax(double[] v) {
    int k = -1;
    for (int i = 0; i < v.length; i++) {
      if (Double.isFinite(v[i]) && (k < 0 || v[i] > v[k])) {
        k = i;
      }
    }
    return k;
  }

  private static int argMin(double[] v) {
    int k = -1;
    for (int i = 0; i < v.length; i++) {
      if (Double.isFinite(v[i]) && (k < 0 || v[i] < v[k])) {
        k = i;
      }
    }
    return k;
  }

  static String num(double v, int decimals) {
    return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + decimals + "f", v) : "";
  }
}
