package org.plateward.alarms;

import java.time.Instant;
import java.util.Objects;

/**
 * One accepted operator action, immutable, as the audit trail keeps it.
 *
 * @param time when it was taken
 * @param who the operator
 * @param action what was done
 * @param alarm the alarm acted on
 * @param reason the operator's reason or comment (null when none was given)
 * @param expiry when a shelve lapses (null for other actions)
 */
public record OperatorAction(
    Instant time, String who, ActionKind action, AlarmKind alarm, String reason, Instant expiry) {
  public OperatorAction {
    Objects.requireNonNull(time, "time");
    Objects.requireNonNull(who, "who");
    Objects.requireNonNull(action, "action");
    Objects.requireNonNull(alarm, "alarm");
  }
}
