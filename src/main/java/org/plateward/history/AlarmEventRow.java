package org.plateward.history;

import java.time.Instant;
import java.util.Objects;

/**
 * One alarm state transition (ANSI/ISA-18.2 lifecycle), as the append-only audit trail keeps it.
 *
 * @param time when the transition happened
 * @param alarmId the alarm's id
 * @param transition the transition or the new state, in the alarm module's words
 * @param priority the alarm priority at the time
 * @param value the value that caused the transition, SI (NaN when none)
 * @param limit the limit in force, SI (NaN when none)
 * @param message the text shown to the operator
 */
public record AlarmEventRow(
    Instant time, String alarmId, String transition, String priority, double value, double limit,
    String message) {
  public AlarmEventRow {
    Objects.requireNonNull(time, "time");
    Objects.requireNonNull(alarmId, "alarmId");
    Objects.requireNonNull(transition, "transition");
    Objects.requireNonNull(priority, "priority");
    Objects.requireNonNull(message, "message");
  }
}
