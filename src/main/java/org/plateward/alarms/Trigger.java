package org.plateward.alarms;

/** What can happen to an alarm: a change of its condition, a design rule, or an operator action. */
public enum Trigger {
  /** The filtered condition became active (after deadband and on-delay). */
  CONDITION_ACTIVE(false),
  /** The filtered condition cleared (after deadband and off-delay). */
  CONDITION_CLEAR(false),
  /** A design suppression rule started to hold. */
  SUPPRESSION_STARTS(false),
  /** A design suppression rule stopped holding. */
  SUPPRESSION_ENDS(false),
  /** The shelve expiry time was reached (driven by the input time). */
  SHELF_EXPIRES(false),
  ACKNOWLEDGE(true),
  SHELVE(true),
  UNSHELVE(true),
  REMOVE_FROM_SERVICE(true),
  RETURN_TO_SERVICE(true);

  private final boolean operator;

  Trigger(boolean operator) {
    this.operator = operator;
  }

  /** Whether an operator takes this action (and it can be refused). */
  public boolean byOperator() {
    return operator;
  }
}
