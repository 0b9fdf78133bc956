package org.plateward.live;

import java.time.Duration;
import java.util.List;
import org.plateward.alarms.ActionKind;
import org.plateward.alarms.ActionResult;
import org.plateward.alarms.AlarmKind;
import org.plateward.alarms.AlarmStatus;

/** What the operator console acts on: an alarm board behind its owner (the live monitor). */
public interface AlarmActions {
  /**
   * Carries out one operator action now.
   *
   * @param kind the action
   * @param who the operator
   * @param alarm the alarm
   * @param reason reason or comment (required for shelve), or null
   * @param shelveFor shelve duration (shelve only), or null
   */
  ActionResult act(ActionKind kind, String who, AlarmKind alarm, String reason, Duration shelveFor);

  /** The alarm states now. */
  List<AlarmStatus> statuses();
}
