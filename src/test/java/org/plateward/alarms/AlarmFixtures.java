package org.plateward.alarms;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/** Settings and inputs for alarm tests (invented test values, not check values). */
final class AlarmFixtures {
  static final Instant T0 = Instant.parse("2026-03-01T08:00:00Z");
  static final double C = 273.15;

  private AlarmFixtures() {}

  /** Every alarm enabled, no deadband, no delays; peak 1110/1135 degC, melt 0.8, exhaust 600 s. */
  static Map<AlarmKind, AlarmDefinition> plain() {
    Map<AlarmKind, AlarmDefinition> m = new EnumMap<>(AlarmKind.class);
    put(m, AlarmKind.PEAK_HIGH, 1110 + C, Priority.PROMPT);
    put(m, AlarmKind.PEAK_HIGH_HIGH, 1135 + C, Priority.IMMEDIATE);
    put(m, AlarmKind.MELT_HIGH, 0.8, Priority.PROMPT);
    put(m, AlarmKind.EXHAUST_LOW, 600, Priority.PROMPT);
    for (AlarmKind k : List.of(AlarmKind.ESTIMATOR_UNTRUSTWORTHY, AlarmKind.SIGNAL_BAD_OR_STALE,
        AlarmKind.CONNECTION_LOST, AlarmKind.HISTORY_NOT_KEPT)) {
      m.put(k, AlarmDefinition.condition(k, Priority.ROUTINE, Duration.ZERO, Duration.ZERO));
    }
    return m;
  }

  private static void put(Map<AlarmKind, AlarmDefinition> m, AlarmKind k, double limit,
      Priority p) {
    m.put(k, new AlarmDefinition(k, true, limit, p, 0.0, Duration.ZERO, Duration.ZERO));
  }

  static AlarmSettings settings(double kSigma, Map<AlarmKind, AlarmDefinition> defs) {
    return new AlarmSettings(kSigma, 10, Duration.ofMinutes(10), Duration.ofHours(12), defs);
  }

  static AlarmDefinition with(AlarmKind k, double limit, double deadband, long onS, long offS) {
    return new AlarmDefinition(k, true, limit, k == AlarmKind.PEAK_HIGH_HIGH
        ? Priority.IMMEDIATE : Priority.PROMPT, deadband, Duration.ofSeconds(onS),
        Duration.ofSeconds(offS));
  }

  /** Quiet inputs at T0 + s seconds: everything well inside its limits. */
  static AlarmInputs quiet(long s) {
    return inputs(s, 900 + C, 5, 0.1, Double.NaN);
  }

  static AlarmInputs inputs(long s, double peakK, double sdK, double melt, double exhaustS) {
    return new AlarmInputs(T0.plusSeconds(s), peakK, sdK, melt, exhaustS, "ok", Set.of(), false,
        false);
  }

  static AlarmInputs flags(long s, String status, Set<String> bad, boolean lost, boolean noHist) {
    return new AlarmInputs(T0.plusSeconds(s), 900 + C, 5, 0.1, Double.NaN, status, bad, lost,
        noHist);
  }

  /** An audit that keeps everything. */
  static final class Recording implements AlarmAudit {
    final List<AlarmEvent> events = new ArrayList<>();
    final List<OperatorAction> actions = new ArrayList<>();

    @Override
    public void event(AlarmEvent e) {
      events.add(e);
    }

    @Override
    public void action(OperatorAction a) {
      actions.add(a);
    }

    List<AlarmEvent> of(AlarmKind k) {
      return events.stream().filter(e -> e.alarm() == k).toList();
    }

    long annunciations(AlarmKind k) {
      return of(k).stream().filter(AlarmEvent::annunciation).count();
    }
  }

  static Set<String> none() {
    return Set.of();
  }
}
