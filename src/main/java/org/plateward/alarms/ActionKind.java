package org.plateward.alarms;

import java.util.Locale;

/** The operator actions on an alarm. */
public enum ActionKind {
  ACKNOWLEDGE(Trigger.ACKNOWLEDGE),
  SHELVE(Trigger.SHELVE),
  UNSHELVE(Trigger.UNSHELVE),
  REMOVE_FROM_SERVICE(Trigger.REMOVE_FROM_SERVICE),
  RETURN_TO_SERVICE(Trigger.RETURN_TO_SERVICE);

  private final Trigger trigger;

  ActionKind(Trigger trigger) {
    this.trigger = trigger;
  }

  Trigger trigger() {
    return trigger;
  }

  /** The action in audit words, e.g. {@code remove_from_service}. */
  public String word() {
    return name().toLowerCase(Locale.ROOT);
  }
}
