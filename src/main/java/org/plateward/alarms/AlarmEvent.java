package org.plateward.alarms;

import java.time.Instant;
import java.util.Objects;

/**
 * One lifecycle transition of one alarm, immutable, as the audit trail keeps it.
 *
 * @param time when it happened (input time, or the time of the operator action)
 * @param alarm which alarm
 * @param from state before
 * @param to state after
 * @param priority the alarm's priority
 * @param value the judged value at the time, SI (NaN when none)
 * @param limit the limit in force, SI (NaN for yes/no alarms)
 * @param message text for the operator
 */
public record AlarmEvent(
    Instant time, AlarmKind alarm, AlarmState from, AlarmState to, Priority priority,
    double value, double limit, String message) {
  public AlarmEvent {
    Objects.requireNonNull(time, "time");
    Objects.requireNonNull(alarm, "alarm");
    Objects.requireNonNull(from, "from");
    Objects.requireNonNull(to, "to");
    Objects.requireNonNull(priority, "priority");
    Objects.requireNonNull(message, "message");
  }

  /** The transition in audit words, e.g. {@code unacknowledged -> acknowledged}. */
  public String transition() {
    return from.word() + " -> " + to.word();
  }

  /** Whether this event presents a new alarm to the operator (counts toward a flood). */
  public boolean annunciation() {
    return to == AlarmState.UNACKNOWLEDGED;
  }
}
