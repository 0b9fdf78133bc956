package org.plateward.live;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.plateward.alarms.ActionKind;
import org.plateward.alarms.ActionResult;
import org.plateward.alarms.AlarmAudit;
import org.plateward.alarms.AlarmBoard;
import org.plateward.alarms.AlarmEvent;
import org.plateward.alarms.AlarmInputs;
import org.plateward.alarms.AlarmKind;
import org.plateward.alarms.AlarmSettings;
import org.plateward.alarms.AlarmState;
import org.plateward.alarms.AlarmStatus;
import org.plateward.alarms.OperatorAction;
import org.plateward.config.AlarmConfigReader;

class OperatorConsoleTest {
  private static final Instant T0 = Instant.parse("2026-03-02T06:00:00Z");

  /** The board of config/plateward.toml behind a fixed clock, with a recording audit. */
  private static final class Desk implements AlarmActions {
    final List<OperatorAction> actions = new ArrayList<>();
    final AlarmBoard board;
    Instant now = T0;

    Desk() throws Exception {
      AlarmSettings s = AlarmConfigReader.load(Path.of("config", "plateward.toml"));
      board = new AlarmBoard(s, new AlarmAudit() {
        @Override
        public void event(AlarmEvent e) {}

        @Override
        public void action(OperatorAction a) {
          actions.add(a);
        }
      });
    }

    @Override
    public ActionResult act(ActionKind kind, String who, AlarmKind alarm, String reason, Duration shelveFor) {
      return switch (kind) {
        case ACKNOWLEDGE -> board.acknowledge(now, who, alarm, reason);
        case SHELVE -> board.shelve(now, who, alarm, reason, shelveFor == null ? null : now.plus(shelveFor));
        case UNSHELVE -> board.unshelve(now, who, alarm, reason);
        default -> throw new AssertionError(kind);
      };
    }

    @Override
    public List<AlarmStatus> statuses() {
      return board.statuses();
    }
  }

  @Test
  void scriptedStdinActsThroughTheBoardAndTheAuditRecordsWho() throws Exception {
    Desk desk = new Desk();
    // the peak upper bound (1118 degC + 2 x 5 K) above peak_high (1110 degC), below peak_high_high
    // (1135 degC, which would hide it by design), for longer than its
    // 10 s on-delay: the alarm is active and unacknowledged
    for (int s = 0; s <= 20; s++) {
      desk.now = T0.plusSeconds(s);
      desk.board.evaluate(new AlarmInputs(desk.now, 1118 + 273.15, 5.0, 0.1, Double.POSITIVE_INFINITY, "ok",
          Set.of(), false, false));
    }
    assertThat(desk.board.status(AlarmKind.PEAK_HIGH).state()).isEqualTo(AlarmState.UNACKNOWLEDGED);
    StringWriter sw = new StringWriter();
    OperatorConsole console = new OperatorConsole(desk, "shift-b", new PrintWriter(sw));
    String script = String.join("\n",
        "help",
        "ack peak_hi",                          // unknown alarm: did you mean
        "ack peak_high seen, watching",
        "shelve melt_high",                     // no expiry
        "shelve melt_high 30min",               // no reason
        "shelve melt_high 30 parsecs probe",    // bad duration
        "shelve melt_high -5min probe",         // negative duration
        "shelve melt_high 30 min probe being replaced",
        "alarms",
        "unshelve melt_high probe back",
        "shelf melt_high",                      // unknown command
        "");
    console.start(new StringReader(script)).join(10_000);
    String out = sw.toString();
    System.out.println(out);
    assertThat(out).contains(">>   ack ALARM");
    assertThat(out).contains("unknown alarm \"peak_hi\"; did you mean \"peak_high\"?");
    assertThat(out).contains(">> done: peak_high: acknowledge by shift-b (seen, watching)");
    assertThat(out).contains("shelve melt_high: needs an expiry");
    assertThat(out).contains("shelve melt_high: needs a reason");
    assertThat(out).contains("shelve melt_high: bad duration \"30\"").contains("has no unit");
    assertThat(out).contains("shelve melt_high: the duration must be positive");
    assertThat(out).contains("melt_high").contains("shelved until " + T0.plusSeconds(20).plus(Duration.ofMinutes(30)));
    assertThat(out).contains("unknown command \"shelf\"").contains("(type help for the list)");
    // the audit trail holds exactly the accepted actions, with who, why and the expiry
    assertThat(desk.actions).hasSize(3);
    assertThat(desk.actions.get(0).who()).isEqualTo("shift-b");
    assertThat(desk.actions.get(0).action()).isEqualTo(ActionKind.ACKNOWLEDGE);
    OperatorAction shelve = desk.actions.get(1);
    assertThat(shelve.action()).isEqualTo(ActionKind.SHELVE);
    assertThat(shelve.reason()).isEqualTo("probe being replaced");
    assertThat(shelve.expiry()).isEqualTo(T0.plusSeconds(20).plus(Duration.ofMinutes(30)));
    assertThat(desk.actions.get(2).action()).isEqualTo(ActionKind.UNSHELVE);
    assertThat(desk.board.status(AlarmKind.PEAK_HIGH).state()).isEqualTo(AlarmState.ACKNOWLEDGED);
    assertThat(desk.board.status(AlarmKind.MELT_HIGH).state()).isEqualTo(AlarmState.NORMAL);
  }

  @Test
  void operatorNameIsTheGivenOneOrTheOsUser() {
    assertThat(OperatorConsole.operatorName(" night-shift ")).isEqualTo("night-shift");
    assertThat(OperatorConsole.operatorName(null)).isEqualTo(System.getProperty("user.name"));
  }
}
