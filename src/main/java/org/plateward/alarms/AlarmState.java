package org.plateward.alarms;

/**
 * The states of one alarm, after the alarm state transition diagram of ANSI/ISA-18.2 / IEC 62682
 * (2009 edition lettering A–G, which has no latched states; REFERENCES.md §7, lettering [M]).
 */
public enum AlarmState {
  /** A: the condition is clear and nothing waits for the operator. */
  NORMAL("normal", 'A'),
  /** B: the condition is active and the operator has not acknowledged it. */
  UNACKNOWLEDGED("unacknowledged", 'B'),
  /** C: the condition is active and acknowledged. */
  ACKNOWLEDGED("acknowledged", 'C'),
  /** D: the condition has cleared but the alarm was never acknowledged. */
  RETURNED_UNACKNOWLEDGED("returned_to_normal_unacknowledged", 'D'),
  /** G: the operator has shelved the alarm until an expiry time. */
  SHELVED("shelved", 'G'),
  /** H: suppressed by a design rule while another condition holds (see {@link DesignSuppression}). */
  SUPPRESSED_BY_DESIGN("suppressed_by_design", 'H'),
  /** I: removed from service by the operator (maintenance, known bad instrument). */
  OUT_OF_SERVICE("out_of_service", 'I');

  private final String word;
  private final char letter;

  AlarmState(String word, char letter) {
    this.word = word;
    this.letter = letter;
  }

  /** The state in the words the audit trail stores, e.g. {@code returned_to_normal_unacknowledged}. */
  public String word() {
    return word;
  }

  /** The letter of the state in the ISA-18.2 (2009) diagram. */
  public char letter() {
    return letter;
  }

  /** Whether the alarm stands: its condition is active and it is not shelved or suppressed (B, C). */
  public boolean standing() {
    return this == UNACKNOWLEDGED || this == ACKNOWLEDGED;
  }

  /** Whether the alarm is presented to the operator (B, C, D). */
  public boolean annunciated() {
    return this == UNACKNOWLEDGED || this == ACKNOWLEDGED || this == RETURNED_UNACKNOWLEDGED;
  }
}
