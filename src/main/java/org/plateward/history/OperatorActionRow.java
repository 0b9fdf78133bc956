package org.plateward.history;

import java.time.Instant;
import java.util.Objects;

/**
 * One operator action (acknowledge, shelve, suppress, limit change, ...) for the audit trail.
 *
 * @param time when the action was taken
 * @param who the operator
 * @param action what was done
 * @param alarmId the alarm acted on (null when none)
 * @param reason the operator's reason or comment (null when none)
 * @param expiry when the action lapses, e.g. the end of a shelve (null when it does not)
 */
public record OperatorActionRow(
    Instant time, String who, String action, String alarmId, String reason, Instant expiry) {
  public OperatorActionRow {
    Objects.requireNonNull(time, "time");
    Objects.requireNonNull(who, "who");
    Objects.requireNonNull(action, "action");
  }
}
