package org.plateward.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.plateward.advisor.TrimSuggestion;
import org.plateward.alarms.AlarmAudit;
import org.plateward.alarms.AlarmEvent;
import org.plateward.alarms.AlarmSettings;
import org.plateward.alarms.BadOrStale;
import org.plateward.live.AdvisoryStage;
import org.plateward.reactor.UnitSpec;
import org.plateward.signals.Frame;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.ReactorSoftSensor;

/**
 * The headless replay's advisory alarms (and, when asked, fuel-trim advice) through the live
 * path's {@link AdvisoryStage}, collected for the end-of-run summary.
 */
final class ReplayAdvisories {
  /** Transitions listed one per line at the end; the rest are counted. */
  static final int LISTED = 25;

  private final AdvisoryStage stage;
  private final boolean advise;
  private final List<AlarmEvent> events = new ArrayList<>();
  private final List<TrimSuggestion> suggestions = new ArrayList<>();

  private ReplayAdvisories(AdvisoryStage stage, boolean advise) {
    this.stage = stage;
    this.advise = advise;
  }

  /** Null when the configuration defines no alarms. */
  static ReplayAdvisories of(UnitSpec unit, ReactorSoftSensor sensor, AlarmSettings alarms,
      org.plateward.advisor.TrimSettings advisor, boolean advise) {
    if (alarms == null) {
      return null;
    }
    AdvisoryStage s = advise ? new AdvisoryStage(unit, sensor, alarms, advisor, AlarmAudit.NONE)
        : AdvisoryStage.alarmsOnly(unit, sensor, alarms, AlarmAudit.NONE);
    return new ReplayAdvisories(s, advise);
  }

  /** One frame and its estimate (a recorded frame: no link to lose, history not judged). */
  void add(Frame f, Estimate e, ReactorSoftSensor sensor) {
    events.addAll(stage.judge(e, BadOrStale.recorded(f), false, false));
    if (advise) {
      stage.advise(e, sensor).ifPresent(suggestions::add);
    }
  }

  List<AlarmEvent> events() {
    return events;
  }

  List<TrimSuggestion> suggestions() {
    return suggestions;
  }

  /** The summary: the transitions (first {@value #LISTED} listed) and the suggestions. */
  void print(PrintWriter out) {
    long annunciations = events.stream().filter(AlarmEvent::annunciation).count();
    out.printf(Locale.ROOT, "advisory alarms (configured definitions): %d transitions, %d annunciations%n",
        events.size(), annunciations);
    for (int i = 0; i < Math.min(LISTED, events.size()); i++) {
      AlarmEvent ev = events.get(i);
      out.printf(Locale.ROOT, "  %s  %-22s [%s] %s: %s%n", ev.time(), ev.alarm().key(), ev.priority().key(),
          ev.transition(), ev.message());
    }
    if (events.size() > LISTED) {
      out.printf(Locale.ROOT, "  ... and %d more transitions%n", events.size() - LISTED);
    }
    if (!advise) {
      out.println("fuel-trim advice not asked (add --advice; each question costs a few forecasts)");
      return;
    }
    out.printf(Locale.ROOT, "fuel-trim suggestions (advisory): %d%n", suggestions.size());
    for (TrimSuggestion s : suggestions) {
      out.printf(Locale.ROOT, "  %s  %s%n", java.time.Instant.ofEpochMilli(Math.round(1000 * s.timeS())),
          s.message().lines().findFirst().orElse(""));
    }
  }
}
