package org.plateward.alarms;

import static org.plateward.alarms.AlarmState.ACKNOWLEDGED;
import static org.plateward.alarms.AlarmState.NORMAL;
import static org.plateward.alarms.AlarmState.OUT_OF_SERVICE;
import static org.plateward.alarms.AlarmState.RETURNED_UNACKNOWLEDGED;
import static org.plateward.alarms.AlarmState.SHELVED;
import static org.plateward.alarms.AlarmState.SUPPRESSED_BY_DESIGN;
import static org.plateward.alarms.AlarmState.UNACKNOWLEDGED;

/**
 * The alarm lifecycle as a pure transition function, after the ANSI/ISA-18.2 / IEC 62682 alarm
 * state transition diagram (states A–G of the 2009 edition; REFERENCES.md §7 [M]).
 *
 * <pre>
 * state \ trigger   active clear supp+ supp- expire  ack   shelve unshelve remove return
 * A normal           B     .     H     .     R!      R!    G      R!       I      R!
 * B unack            .     D     H     .     R!      C     G      R!       I      R!
 * C ack              .     A     H     .     R!      R!    G      R!       I      R!
 * D rtn-unack        B     .     H     .     R!      A     G      R!       I      R!
 * G shelved          .     .     .     .     ret     R!    R!     ret      I      R!
 * H suppressed       .     .     .     ret   R!      R!    R!     R!       I      R!
 * I out of service   .     .     .     .     R!      R!    R!     R!       R!     ret
 * </pre>
 *
 * "." stays (no event), "R!" refuses (operator) or is ignored (internal triggers never come
 * there: a board only expires shelved alarms), and "ret" returns to where the conditions put
 * the alarm: H while a design suppression holds, else B while the condition is active, else A.
 * So an alarm that was shelved, suppressed or out of service while its condition came on is
 * annunciated afresh when it comes back. Shelving is also allowed from A (ISA-18.2 draws the
 * shelve arrow from the whole A–D group [M]); out-of-service is reachable from every state.
 */
public final class AlarmLifecycle {
  private AlarmLifecycle() {}

  /**
   * The transition for one trigger.
   *
   * @param from the current state
   * @param trigger what happened
   * @param conditionActive whether the alarm's filtered condition is active now
   * @param suppressedByDesign whether a design suppression rule holds now
   * @return a move, a stay, or a refusal with the reason in operator words
   */
  public static Transition next(AlarmState from, Trigger trigger, boolean conditionActive,
      boolean suppressedByDesign) {
    AlarmState back = suppressedByDesign ? SUPPRESSED_BY_DESIGN
        : conditionActive ? UNACKNOWLEDGED : NORMAL;
    return switch (trigger) {
      case CONDITION_ACTIVE -> switch (from) {
        case NORMAL, RETURNED_UNACKNOWLEDGED -> Transition.move(UNACKNOWLEDGED);
        default -> Transition.stay(from);
      };
      case CONDITION_CLEAR -> switch (from) {
        case UNACKNOWLEDGED -> Transition.move(RETURNED_UNACKNOWLEDGED);
        case ACKNOWLEDGED -> Transition.move(NORMAL);
        default -> Transition.stay(from);
      };
      case SUPPRESSION_STARTS -> from.annunciated() || from == NORMAL
          ? Transition.move(SUPPRESSED_BY_DESIGN) : Transition.stay(from);
      case SUPPRESSION_ENDS -> from == SUPPRESSED_BY_DESIGN
          ? Transition.move(conditionActive ? UNACKNOWLEDGED : NORMAL) : Transition.stay(from);
      case SHELF_EXPIRES -> from == SHELVED
          ? Transition.move(back) : Transition.refuse(from, "the alarm is not shelved");
      case ACKNOWLEDGE -> switch (from) {
        case UNACKNOWLEDGED -> Transition.move(ACKNOWLEDGED);
        case RETURNED_UNACKNOWLEDGED -> Transition.move(NORMAL);
        case ACKNOWLEDGED -> Transition.refuse(from, "the alarm is already acknowledged");
        default -> Transition.refuse(from, "nothing to acknowledge: the alarm is " + from.word());
      };
      case SHELVE -> from == NORMAL || from.annunciated()
          ? Transition.move(SHELVED)
          : Transition.refuse(from, from == SHELVED ? "the alarm is already shelved; unshelve"
              + " it first to set a new expiry" : "cannot shelve: the alarm is " + from.word());
      case UNSHELVE -> from == SHELVED
          ? Transition.move(back) : Transition.refuse(from, "the alarm is not shelved");
      case REMOVE_FROM_SERVICE -> from == OUT_OF_SERVICE
          ? Transition.refuse(from, "the alarm is already out of service")
          : Transition.move(OUT_OF_SERVICE);
      case RETURN_TO_SERVICE -> from == OUT_OF_SERVICE
          ? Transition.move(back) : Transition.refuse(from, "the alarm is not out of service");
    };
  }
}
