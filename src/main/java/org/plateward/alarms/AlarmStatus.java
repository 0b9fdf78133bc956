package org.plateward.alarms;

import java.time.Instant;

/**
 * A snapshot of one alarm for display.
 *
 * @param kind which alarm
 * @param state its lifecycle state
 * @param priority its priority
 * @param conditionActive whether its filtered condition is active (also while shelved,
 *     suppressed or out of service)
 * @param value the last judged value, SI (NaN when none)
 * @param limit the limit in force, SI (NaN for yes/no alarms)
 * @param shelvedUntil the shelve expiry; null unless shelved
 * @param shelvedBy who shelved it; null unless shelved
 * @param reason the reason given for the shelve or removal from service; null when none
 */
public record AlarmStatus(AlarmKind kind, AlarmState state, Priority priority,
    boolean conditionActive, double value, double limit, Instant shelvedUntil, String shelvedBy,
    String reason) {}
