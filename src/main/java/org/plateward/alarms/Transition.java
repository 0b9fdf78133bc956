package org.plateward.alarms;

import java.util.Objects;

/**
 * The outcome of one trigger in one state: a move to a new state, staying put (the trigger means
 * nothing here, no event), or a refusal of an operator action with the reason.
 *
 * @param kind move, stay or refuse
 * @param to the new state for a move; the unchanged state otherwise
 * @param reason why an operator action was refused; null otherwise
 */
public record Transition(Kind kind, AlarmState to, String reason) {
  /** What the lifecycle does with a trigger. */
  public enum Kind { MOVE, STAY, REFUSE }

  public Transition {
    Objects.requireNonNull(kind, "kind");
    Objects.requireNonNull(to, "to");
    if ((kind == Kind.REFUSE) != (reason != null)) {
      throw new IllegalArgumentException("a refusal, and only a refusal, has a reason");
    }
  }

  static Transition move(AlarmState to) {
    return new Transition(Kind.MOVE, to, null);
  }

  static Transition stay(AlarmState s) {
    return new Transition(Kind.STAY, s, null);
  }

  static Transition refuse(AlarmState s, String reason) {
    return new Transition(Kind.REFUSE, s, reason);
  }
}
