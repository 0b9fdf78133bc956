package org.plateward.alarms;

import java.util.List;

/**
 * What became of an operator action.
 *
 * @param accepted whether it was carried out
 * @param message for a refusal the reason, in operator words; for an acceptance a short summary
 * @param action the action record when accepted, null when refused
 * @param events the transitions it caused (empty when refused)
 */
public record ActionResult(boolean accepted, String message, OperatorAction action,
    List<AlarmEvent> events) {
  public ActionResult {
    events = List.copyOf(events);
  }

  static ActionResult refused(String message) {
    return new ActionResult(false, message, null, List.of());
  }
}
