package org.plateward.live;

import org.plateward.alarms.AlarmState;
import org.plateward.alarms.AlarmStatus;
import java.util.Locale;
import org.plateward.Advisory;
import org.plateward.history.HistoryHealth;
import org.plateward.softsensor.Estimate;

/**
 * The console's status block: a few labelled lines, engineering units at this edge (degC, mm,
 * min), every estimate with its uncertainty, and the caution.
 */
public final class StatusBlock {
  private StatusBlock() {}

  /** The history state in the words the console uses. */
  public static String historyWord(HistoryHealth.State s) {
    return s == HistoryHealth.State.OK ? "kept" : "NOT KEEPING";
  }

  /** The block for one look at the monitor, lines ending in '\n'. */
  public static String render(MonitorStatus s) {
    StringBuilder b = new StringBuilder();
    Estimate e = s.latest();
    String time = e == null ? "(no estimate yet)" : e.time().truncatedTo(java.time.temporal.ChronoUnit.MILLIS).toString();
    String clock = s.clock().realTime() ? ""
        : String.format(Locale.ROOT, " (simulated plant time, %s x real time)", num(s.clock().speed()));
    b.append("== ").append(s.unitName()).append("  ").append(time).append(clock).append('\n');
    b.append("   ").append(Advisory.SHORT).append('\n');
    String age = Double.isNaN(s.dataAgeS()) ? "no data yet"
        : String.format(Locale.ROOT, "data age %.1f s", s.dataAgeS());
    b.append(String.format(Locale.ROOT, "   link        %-12s %s  %s%n", s.link(), s.endpointUrl(), age));
    if (e == null) {
      b.append("   estimator   waiting for the first frame\n");
    } else {
      String reason = e.reason() == null || e.reason().isEmpty() ? "" : " - " + e.reason();
      b.append("   estimator   ").append(e.status().text()).append(reason).append('\n');
      if (Double.isFinite(e.peakPlateTempK())) {
        b.append(String.format(Locale.ROOT, "   hidden peak %.1f +/- %.1f degC (1 sigma) at %.0f mm from the reforming inlet%n",
            e.peakPlateTempK() - 273.15, e.peakPlateTempSdK(), e.peakPositionM() * 1000.0));
        b.append(String.format(Locale.ROOT, "   buffer      max-cell melt %.2f, overall %.3f +/- %.3f%n",
            e.maxCellMeltFraction(), e.bufferMeltFraction(), e.bufferMeltFractionSd()));
        b.append("   exhaust     ").append(timeToExhaust(e)).append('\n');
      }
    }
    if (s.history() == null) {
      b.append("   history     not kept\n");
    } else {
      HistoryHealth h = s.history();
      b.append("   history     ").append(historyWord(h.state())).append("  ").append(s.historyFile());
      b.append(String.format(Locale.ROOT, "  (%d stored", h.storedEntries()));
      if (h.unstoredEntries() + h.droppedEntries() > 0) {
        b.append(String.format(Locale.ROOT, ", %d not stored", h.unstoredEntries() + h.droppedEntries()));
      }
      b.append(')');
      if (!h.ok() && h.reason() != null) {
        b.append(" - ").append(h.reason());
      }
      b.append('\n');
    }
    b.append(String.format(Locale.ROOT, "   frames %d, filter steps %d%s%n", s.frames(), s.blocks(),
        s.droppedFrames() > 0 ? ", " + s.droppedFrames() + " frames dropped (estimator behind)" : ""));
    alarmLines(b, s.alarms());
    if (s.advice() != null) {
      for (String line : s.advice().message().split("\n")) {
        b.append("   advisor     ").append(line.strip()).append('\n');
      }
    }
    return b.toString();
  }

  /**
   * One line per annunciated, shelved or out-of-service alarm, most urgent first: priority in
   * words (not colour), state, the judged value against its limit in engineering units;
   * alarms suppressed by design are counted, not listed.
   */
  private static void alarmLines(StringBuilder b, java.util.List<AlarmStatus> alarms) {
    int shown = 0;
    int suppressed = 0;
    for (AlarmStatus a : alarms) {
      if (a.state() == AlarmState.NORMAL) {
        continue;
      }
      if (a.state() == AlarmState.SUPPRESSED_BY_DESIGN) {
        suppressed++;
        continue;
      }
      shown++;
      b.append(String.format(Locale.ROOT, "   ALARM %-9s %-24s %-26s%s%n", a.priority().key().toUpperCase(Locale.ROOT),
          a.kind().key(), a.state().name().toLowerCase(Locale.ROOT).replace('_', ' '), judged(a)));
    }
    if (shown == 0 && !alarms.isEmpty()) {
      b.append("   alarms      none annunciated\n");
    }
    if (suppressed > 0) {
      b.append(String.format(Locale.ROOT, "   alarms      %d suppressed by design%n", suppressed));
    }
  }

  /** " value .. limit .." in degC, as a fraction or in seconds; empty for the yes/no alarms. */
  private static String judged(AlarmStatus a) {
    if (!Double.isFinite(a.limit())) {
      return "";
    }
    return switch (a.kind()) {
      case PEAK_HIGH, PEAK_HIGH_HIGH -> String.format(Locale.ROOT, " mean+k sigma %.1f degC, limit %.1f degC",
          a.value() - 273.15, a.limit() - 273.15);
      case MELT_HIGH -> String.format(Locale.ROOT, " %.2f, limit %.2f", a.value(), a.limit());
      case EXHAUST_LOW -> String.format(Locale.ROOT, " %s, limit %.0f s",
          a.value() > 1e12 ? "none forecast" : String.format(Locale.ROOT, "%.0f s", a.value()), a.limit());
      default -> "";
    };
  }


  private static String timeToExhaust(Estimate e) {
    double t = e.timeToExhaustS();
    if (Double.isNaN(t)) {
      return "no cell melts through within the 30 min forecast (inputs held)";
    }
    if (t <= 0.0) {
      return "buffer layer spent in the hottest cell";
    }
    String sd = Double.isFinite(e.timeToExhaustSdS())
        ? String.format(Locale.ROOT, " +/- %.1f", e.timeToExhaustSdS() / 60.0) : "";
    return String.format(Locale.ROOT, "time-to-exhaust %.1f%s min (inputs held)", t / 60.0, sd);
  }

  private static String num(double x) {
    return x == Math.rint(x) ? String.valueOf((long) x) : String.valueOf(x);
  }
}
