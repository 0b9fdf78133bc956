package org.plateward.alarms;

import java.time.Duration;
import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;
import java.util.Objects;

/**
 * Everything configured in the {@code [alarms]} table.
 *
 * @param kSigma the upper-confidence factor k: peak alarms judge mean + k·σ
 * @param floodCount a flood is more than this many annunciations within {@code floodWindow}
 * @param floodWindow the sliding window of flood detection
 * @param maxShelve the longest a shelve may last
 * @param definitions one definition per alarm kind (all kinds present)
 */
public record AlarmSettings(
    double kSigma, int floodCount, Duration floodWindow, Duration maxShelve,
    Map<AlarmKind, AlarmDefinition> definitions) {
  /**
   * Flood threshold: more than 10 annunciated alarms per operator in 10 minutes
   * (REFERENCES.md §7: EEMUA-191-derived KPI grid "flood state 10 in 10 minutes" and a
   * secondary source "more than 10 alarms in a 10-minute period" [V2]).
   */
  public static final int PUBLISHED_FLOOD_COUNT = 10;

  /** The window of the published flood figure. */
  public static final Duration PUBLISHED_FLOOD_WINDOW = Duration.ofMinutes(10);

  public AlarmSettings {
    Objects.requireNonNull(floodWindow, "floodWindow");
    Objects.requireNonNull(maxShelve, "maxShelve");
    if (!(kSigma >= 0.0) || !Double.isFinite(kSigma)) {
      throw new IllegalArgumentException("kSigma must be finite and >= 0, got " + kSigma);
    }
    if (floodCount < 1 || floodWindow.isNegative() || floodWindow.isZero()
        || maxShelve.isNegative() || maxShelve.isZero()) {
      throw new IllegalArgumentException("flood count, flood window and max shelve must be positive");
    }
    EnumMap<AlarmKind, AlarmDefinition> m = new EnumMap<>(AlarmKind.class);
    m.putAll(definitions);
    for (AlarmKind k : AlarmKind.values()) {
      AlarmDefinition d = m.get(k);
      if (d == null || d.kind() != k) {
        throw new IllegalArgumentException("no definition for alarm " + k.key());
      }
    }
    definitions = Collections.unmodifiableMap(m);
  }

  /** The definition of one alarm. */
  public AlarmDefinition definition(AlarmKind kind) {
    return definitions.get(kind);
  }
}
