package org.plateward.alarms;

import static org.assertj.core.api.Assertions.assertThat;
import static org.plateward.alarms.AlarmFixtures.T0;

import org.junit.jupiter.api.Test;
import org.plateward.history.AlarmEventRow;
import org.plateward.history.OperatorActionRow;

/** The audit records map one to one onto the history rows, field for field. */
class HistoryAlarmAuditTest {
  @Test
  void eventsAndActionsBecomeRowsFieldForField() {
    AlarmEvent e = new AlarmEvent(T0, AlarmKind.PEAK_HIGH, AlarmState.UNACKNOWLEDGED,
        AlarmState.ACKNOWLEDGED, Priority.PROMPT, 1385.0, 1383.15, "msg");
    assertThat(HistoryAlarmAudit.row(e)).isEqualTo(new AlarmEventRow(T0, "peak_high",
        "unacknowledged -> acknowledged", "prompt", 1385.0, 1383.15, "msg"));
    OperatorAction a = new OperatorAction(T0, "op1", ActionKind.SHELVE, AlarmKind.MELT_HIGH,
        "why", T0.plusSeconds(60));
    assertThat(HistoryAlarmAudit.row(a)).isEqualTo(new OperatorActionRow(T0, "op1", "shelve",
        "melt_high", "why", T0.plusSeconds(60)));
  }
}
