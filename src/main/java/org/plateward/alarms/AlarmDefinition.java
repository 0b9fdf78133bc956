package org.plateward.alarms;

import java.time.Duration;
import java.util.Objects;

/**
 * One configured alarm.
 *
 * @param kind which alarm
 * @param enabled false: the alarm is never evaluated or shown
 * @param limit the limit in SI (K, fraction, s); NaN for yes/no alarms
 * @param priority how soon the operator should respond
 * @param deadband how far back past the limit the value must go before the condition clears,
 *     SI (K, fraction, s); 0 for yes/no alarms
 * @param onDelay how long the condition must hold before the alarm is raised
 * @param offDelay how long the clear condition must hold before the alarm returns to normal
 */
public record AlarmDefinition(
    AlarmKind kind, boolean enabled, double limit, Priority priority, double deadband,
    Duration onDelay, Duration offDelay) {
  public AlarmDefinition {
    Objects.requireNonNull(kind, "kind");
    Objects.requireNonNull(priority, "priority");
    Objects.requireNonNull(onDelay, "onDelay");
    Objects.requireNonNull(offDelay, "offDelay");
    if (onDelay.isNegative() || offDelay.isNegative()) {
      throw new IllegalArgumentException(kind.key() + ": delays must not be negative");
    }
    if (!(deadband >= 0.0)) {
      throw new IllegalArgumentException(kind.key() + ": deadband must be >= 0, got " + deadband);
    }
    if (kind.limitKind() == AlarmKind.LimitKind.NONE) {
      if (!Double.isNaN(limit) || deadband != 0.0) {
        throw new IllegalArgumentException(kind.key() + " is a yes/no alarm: no limit, no deadband");
      }
    } else if (!Double.isFinite(limit)) {
      throw new IllegalArgumentException(kind.key() + ": limit must be finite, got " + limit);
    }
  }

  /** A yes/no alarm (no limit). */
  public static AlarmDefinition condition(AlarmKind kind, Priority priority, Duration onDelay,
      Duration offDelay) {
    return new AlarmDefinition(kind, true, Double.NaN, priority, 0.0, onDelay, offDelay);
  }
}
