/**
 * Advisory alarms on the estimate: definitions, the ANSI/ISA-18.2 / IEC 62682 lifecycle,
 * deadband and delays, shelving, suppression by design, flood detection and the audit trail.
 *
 * <h2>Flow</h2>
 * Each estimate is mapped to {@link org.plateward.alarms.AlarmInputs} (estimate values only; no
 * OPC UA, SQLite or JavaFX here) and handed to {@link org.plateward.alarms.AlarmBoard#evaluate}.
 * For every enabled alarm the board judges one value (the hidden peak on its upper confidence
 * bound mean + kσ), filters it through a {@code ConditionFilter} (deadband, on-delay,
 * off-delay, measured in the input's time), applies {@link org.plateward.alarms.DesignSuppression}
 * and moves the lifecycle with the pure function {@link org.plateward.alarms.AlarmLifecycle#next}.
 * Operator actions (acknowledge, shelve with reason and expiry, unshelve, remove from / return
 * to service) go through the same function and are refused with a reason when the state does
 * not allow them; a refusal changes nothing.
 *
 * <h2>Audit</h2>
 * Every transition is an immutable {@link org.plateward.alarms.AlarmEvent}, every accepted action
 * an {@link org.plateward.alarms.OperatorAction}; both go to an
 * {@link org.plateward.alarms.AlarmAudit}. {@link org.plateward.alarms.HistoryAlarmAudit} maps
 * them one to one onto the history rows.
 *
 * <h2>Floods</h2>
 * {@link org.plateward.alarms.FloodDetector} counts annunciations (transitions into
 * unacknowledged) per operator position over a sliding 10-min window; more than 10 is a flood
 * (EEMUA 191-derived figure, REFERENCES.md §7 [V2]).
 *
 * <p>Everything here is advisory. Plateward is not an alarm system of record.
 */
package org.plateward.alarms;
