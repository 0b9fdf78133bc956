package org.plateward.ui;

import java.util.concurrent.CompletableFuture;
import java.util.function.Consumer;
import org.plateward.alarms.ActionKind;
import org.plateward.alarms.ActionResult;
import org.plateward.alarms.AlarmKind;
import org.plateward.reactor.UnitSpec;

/**
 * Where the window's data come from: the live monitor ({@link LiveFeed}) or a recording run
 * through the same estimator ({@link ReplayFeed}). A feed produces {@link Snapshot}s on its own
 * thread; the window never runs the estimator.
 */
public interface DisplayFeed extends AutoCloseable {
  /** The reactor unit (limits, geometry). */
  UnitSpec unit();

  /** Cell centres along the plate from the reforming inlet, m. */
  double[] cellCentresM();

  /**
   * Starts producing; {@code sink} is called on the feed's thread for every frame, in order, and
   * must only hand the snapshot on.
   */
  void start(Consumer<Snapshot> sink);

  /** Where the data come from now (any thread). */
  FeedStatus status();

  /**
   * One operator action on an advisory alarm, carried out by the alarm board on the feed's
   * thread, which writes the audit trail.
   *
   * @param action the action
   * @param who the operator
   * @param alarm the alarm
   * @param reason reason or comment (required to shelve)
   * @param shelveFor how long a shelve lasts from the action time (null for other actions)
   */
  CompletableFuture<ActionResult> alarmAction(ActionKind action, String who, AlarmKind alarm,
      String reason, java.time.Duration shelveFor);

  /** The replay controls of a recording; null for a live feed. */
  default ReplayFeed replay() {
    return null;
  }

  @Override
  void close();
}
