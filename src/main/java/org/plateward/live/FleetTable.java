package org.plateward.live;

import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.List;
import java.util.Locale;
import org.plateward.Advisory;
import org.plateward.fleet.LaneState;
import org.plateward.opcua.ConnectionState;
import org.plateward.softsensor.Estimate;

/**
 * The compact console table of a fleet watch: one line per unit (id, link, data age, hidden
 * peak ± 1σ in degC, max-cell melt fraction, estimator status, standing advisory alarms with the
 * most urgent priority among them, frames dropped), under the advisory caution.
 */
public final class FleetTable {
  private static final String ROW = "%-12s %-16s %9s  %-22s %13s  %-14s %-15s %7s%n";

  private FleetTable() {}

  /**
   * Renders the table.
   *
   * @param units the units' status, in fleet order
   * @param plantNow plant time now (shown in the heading)
   * @param historyNote one line on where history goes (or that none is kept); may be null
   * @return the lines, each ending in a newline
   */
  public static String render(List<FleetMonitor.UnitStatus> units, Instant plantNow, String historyNote) {
    StringBuilder b = new StringBuilder();
    b.append(Advisory.SHORT).append(System.lineSeparator());
    b.append(String.format(Locale.ROOT, "fleet of %d units at %s%n", units.size(),
        plantNow.truncatedTo(ChronoUnit.SECONDS)));
    b.append(String.format(Locale.ROOT, ROW, "unit", "link", "data age", "hidden peak (1 sigma)",
        "max-cell melt", "estimator", "alarms", "dropped"));
    for (FleetMonitor.UnitStatus u : units) {
      b.append(String.format(Locale.ROOT, ROW, u.unitId(), linkWord(u),
          Double.isNaN(u.dataAgeS()) ? "-" : String.format(Locale.ROOT, "%.1f s", u.dataAgeS()),
          peak(u.latest()), melt(u.latest()), estimatorWord(u), alarms(u), u.lane().dropped()));
    }
    if (historyNote != null) {
      b.append(historyNote).append(System.lineSeparator());
    }
    return b.toString();
  }

  /** "connected", "connecting", "connection lost" or "closed". */
  static String linkWord(FleetMonitor.UnitStatus u) {
    if (u.linkLost()) {
      return "connection lost";
    }
    return u.link() == ConnectionState.CONNECTED ? "connected"
        : u.link() == ConnectionState.CLOSED ? "closed" : "connecting";
  }

  private static String peak(Estimate e) {
    if (e == null || !Double.isFinite(e.peakPlateTempK())) {
      return "-";
    }
    return String.format(Locale.ROOT, "%.1f +/- %.1f degC", e.peakPlateTempK() - 273.15, e.peakPlateTempSdK());
  }

  private static String melt(Estimate e) {
    if (e == null || !Double.isFinite(e.maxCellMeltFraction())) {
      return "-";
    }
    return String.format(Locale.ROOT, "%.2f", e.maxCellMeltFraction());
  }

  /** "-" without alarm definitions, else the standing count and the most urgent priority, e.g. "2 (immediate)". */
  static String alarms(FleetMonitor.UnitStatus u) {
    if (u.alarms().isEmpty()) {
      return "-";
    }
    int n = u.activeAlarms();
    if (n == 0) {
      return "0";
    }
    org.plateward.alarms.Priority top = null;
    for (org.plateward.alarms.AlarmStatus st : u.alarms()) {
      if (st.state().standing() && (top == null || st.priority().ordinal() < top.ordinal())) {
        top = st.priority();
      }
    }
    return n + " (" + top.key() + ")";
  }

  private static String estimatorWord(FleetMonitor.UnitStatus u) {
    if (u.lane().state() == LaneState.FAILED) {
      return "failed";
    }
    Estimate e = u.latest();
    return e == null ? "waiting" : e.status().text();
  }
}
