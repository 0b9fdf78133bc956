package org.plateward.alarms;

import java.util.concurrent.atomic.AtomicLong;
import org.plateward.history.AlarmEventRow;
import org.plateward.history.HistoryRecorder;
import org.plateward.history.OperatorActionRow;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Sends the alarm audit trail to the history database: each {@link AlarmEvent} becomes one
 * {@link AlarmEventRow} and each {@link OperatorAction} one {@link OperatorActionRow}, field for
 * field. A write the recorder refuses is counted and logged; the count can drive the
 * {@code history_not_kept} alarm.
 */
public final class HistoryAlarmAudit implements AlarmAudit {
  private static final Logger LOG = LoggerFactory.getLogger(HistoryAlarmAudit.class);

  private final HistoryRecorder recorder;
  private final AtomicLong refused = new AtomicLong();

  public HistoryAlarmAudit(HistoryRecorder recorder) {
    this.recorder = recorder;
  }

  /** The history row of one transition. */
  public static AlarmEventRow row(AlarmEvent e) {
    return new AlarmEventRow(e.time(), e.alarm().key(), e.transition(), e.priority().key(),
        e.value(), e.limit(), e.message());
  }

  /** The history row of one operator action. */
  public static OperatorActionRow row(OperatorAction a) {
    return new OperatorActionRow(a.time(), a.who(), a.action().word(), a.alarm().key(),
        a.reason(), a.expiry());
  }

  @Override
  public void event(AlarmEvent e) {
    if (!recorder.appendAlarmEvent(row(e))) {
      refused.incrementAndGet();
      LOG.warn("history refused alarm event alarm={} transition={}", e.alarm().key(),
          e.transition());
    }
  }

  @Override
  public void action(OperatorAction a) {
    if (!recorder.appendOperatorAction(row(a))) {
      refused.incrementAndGet();
      LOG.warn("history refused operator action alarm={} action={} who={}", a.alarm().key(),
          a.action().word(), a.who());
    }
  }

  /** How many audit writes the recorder refused. */
  public long refusedWrites() {
    return refused.get();
  }
}
