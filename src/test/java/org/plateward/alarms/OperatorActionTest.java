package org.plateward.alarms;

import static org.assertj.core.api.Assertions.assertThat;
import static org.plateward.alarms.AlarmFixtures.C;
import static org.plateward.alarms.AlarmFixtures.T0;
import static org.plateward.alarms.AlarmFixtures.flags;
import static org.plateward.alarms.AlarmFixtures.inputs;
import static org.plateward.alarms.AlarmFixtures.none;
import static org.plateward.alarms.AlarmFixtures.plain;
import static org.plateward.alarms.AlarmFixtures.settings;

import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Operator actions on the board: shelving with reason and expiry, expiry on input time,
 * refusals that change nothing, and one audit record per accepted action. Behaviour after
 * ISA-18.2 / IEC 62682 shelving (REFERENCES.md §7 [M]; PITFALLS §5.2 and §5.5: shelving needs a
 * reason and an expiry, on expiry the alarm is re-evaluated and annunciated if still active,
 * every operator action is recorded).
 */
class OperatorActionTest {
  private final AlarmFixtures.Recording audit = new AlarmFixtures.Recording();
  private final AlarmBoard board = new AlarmBoard(settings(0, plain()), audit);

  private static Instant at(long s) {
    return T0.plusSeconds(s);
  }

  private void hot(long s) {
    board.evaluate(inputs(s, 1120 + C, 0, 0.1, Double.NaN)); // over peak_high, under high-high
  }

  private void cool(long s) {
    board.evaluate(inputs(s, 1000 + C, 0, 0.1, Double.NaN));
  }

  @Test
  void shelvingExpiresOnInputTimeAndAnActiveAlarmComesBackUnacknowledged() {
    hot(0);
    ActionResult r = board.shelve(at(5), "op1", AlarmKind.PEAK_HIGH, "known hot spot, trim"
        + " under way", at(65));
    assertThat(r.accepted()).isTrue();
    assertThat(board.status(AlarmKind.PEAK_HIGH).state()).isEqualTo(AlarmState.SHELVED);
    assertThat(board.status(AlarmKind.PEAK_HIGH).shelvedUntil()).isEqualTo(at(65));
    for (long s = 6; s < 65; s++) {
      hot(s);
      assertThat(board.status(AlarmKind.PEAK_HIGH).state()).isEqualTo(AlarmState.SHELVED);
    }
    hot(66); // the first sample at or after the expiry
    assertThat(board.status(AlarmKind.PEAK_HIGH).state()).isEqualTo(AlarmState.UNACKNOWLEDGED);
    AlarmEvent back = audit.of(AlarmKind.PEAK_HIGH).get(audit.of(AlarmKind.PEAK_HIGH).size() - 1);
    assertThat(back.from()).isEqualTo(AlarmState.SHELVED);
    assertThat(back.time()).as("the event carries the expiry time").isEqualTo(at(65));
    assertThat(board.status(AlarmKind.PEAK_HIGH).shelvedUntil()).isNull();
  }

  @Test
  void aShelvedAlarmThatClearedComesBackNormal() {
    hot(0);
    board.shelve(at(1), "op1", AlarmKind.PEAK_HIGH, "sensor work", at(61));
    cool(30);
    cool(61);
    assertThat(board.status(AlarmKind.PEAK_HIGH).state()).isEqualTo(AlarmState.NORMAL);
  }

  @Test
  void shelveWithoutReasonOrWithPastExpiryOrTooLongIsRefusedAndNothingChanges() {
    hot(0);
    int events = audit.events.size();
    List<ActionResult> refused = List.of(
        board.shelve(at(1), "op1", AlarmKind.PEAK_HIGH, null, at(100)),
        board.shelve(at(1), "op1", AlarmKind.PEAK_HIGH, "   ", at(100)),
        board.shelve(at(1), "op1", AlarmKind.PEAK_HIGH, "trim", at(1)),
        board.shelve(at(1), "op1", AlarmKind.PEAK_HIGH, "trim", at(0)),
        board.shelve(at(1), "op1", AlarmKind.PEAK_HIGH, "trim", null),
        board.shelve(at(1), "op1", AlarmKind.PEAK_HIGH, "trim", at(1 + 13 * 3600)),
        board.shelve(at(1), " ", AlarmKind.PEAK_HIGH, "trim", at(100)));
    assertThat(refused).allSatisfy(r -> {
      assertThat(r.accepted()).isFalse();
      assertThat(r.action()).isNull();
      assertThat(r.events()).isEmpty();
      assertThat(r.message()).startsWith("peak_high: ");
    });
    assertThat(refused.get(0).message()).isEqualTo("peak_high: shelve needs a reason");
    assertThat(refused.get(2).message()).contains("is not after the action time");
    assertThat(refused.get(5).message()).contains("at most 12 h");
    assertThat(board.status(AlarmKind.PEAK_HIGH).state()).isEqualTo(AlarmState.UNACKNOWLEDGED);
    assertThat(audit.actions).isEmpty();
    assertThat(audit.events).hasSize(events);
  }

  @Test
  void refusedLifecycleActionsChangeNothing() {
    cool(0);
    ActionResult ack = board.acknowledge(at(1), "op1", AlarmKind.PEAK_HIGH, null);
    assertThat(ack.accepted()).isFalse();
    assertThat(ack.message()).isEqualTo("peak_high: nothing to acknowledge: the alarm is normal");
    assertThat(board.unshelve(at(1), "op1", AlarmKind.PEAK_HIGH, null).message())
        .isEqualTo("peak_high: the alarm is not shelved");
    assertThat(board.returnToService(at(1), "op1", AlarmKind.PEAK_HIGH, null).accepted())
        .isFalse();
    assertThat(board.removeFromService(at(1), "op1", AlarmKind.PEAK_HIGH, "").message())
        .isEqualTo("peak_high: remove from service needs a reason");
    assertThat(audit.actions).isEmpty();
    assertThat(audit.events).isEmpty();
    assertThat(board.status(AlarmKind.PEAK_HIGH).state()).isEqualTo(AlarmState.NORMAL);
  }

  @Test
  void everyAcceptedActionWritesOneActionRecordAndOneEvent() {
    hot(0);
    List<ActionResult> done = List.of(
        board.acknowledge(at(1), "op1", AlarmKind.PEAK_HIGH, "seen"),
        board.shelve(at(2), "op2", AlarmKind.PEAK_HIGH, "trim under way", at(600)),
        board.unshelve(at(3), "op2", AlarmKind.PEAK_HIGH, null),
        board.removeFromService(at(4), "op1", AlarmKind.PEAK_HIGH, "thermocouple replaced"),
        board.returnToService(at(5), "op1", AlarmKind.PEAK_HIGH, null));
    assertThat(done).allSatisfy(r -> assertThat(r.accepted()).isTrue());
    assertThat(audit.actions).extracting(OperatorAction::action).containsExactly(
        ActionKind.ACKNOWLEDGE, ActionKind.SHELVE, ActionKind.UNSHELVE,
        ActionKind.REMOVE_FROM_SERVICE, ActionKind.RETURN_TO_SERVICE);
    assertThat(audit.actions.get(1).expiry()).isEqualTo(at(600));
    assertThat(audit.actions.get(1).reason()).isEqualTo("trim under way");
    assertThat(audit.actions.get(1).who()).isEqualTo("op2");
    assertThat(audit.actions.get(0).expiry()).isNull();
    // B, then C, G, B (unshelved while still hot), I, B (returned while still hot)
    assertThat(audit.of(AlarmKind.PEAK_HIGH)).extracting(AlarmEvent::to).containsExactly(
        AlarmState.UNACKNOWLEDGED, AlarmState.ACKNOWLEDGED, AlarmState.SHELVED,
        AlarmState.UNACKNOWLEDGED, AlarmState.OUT_OF_SERVICE, AlarmState.UNACKNOWLEDGED);
    for (ActionResult r : done) {
      assertThat(r.events()).hasSize(1);
    }
  }

  @Test
  void outOfServiceIgnoresTheConditionAndReturnsByIt() {
    cool(0);
    board.removeFromService(at(1), "op1", AlarmKind.PEAK_HIGH, "calibration");
    hot(2);
    cool(3);
    hot(4);
    assertThat(board.status(AlarmKind.PEAK_HIGH).state()).isEqualTo(AlarmState.OUT_OF_SERVICE);
    assertThat(audit.of(AlarmKind.PEAK_HIGH)).hasSize(1);
    board.returnToService(at(5), "op1", AlarmKind.PEAK_HIGH, null);
    assertThat(board.status(AlarmKind.PEAK_HIGH).state()).isEqualTo(AlarmState.UNACKNOWLEDGED);
  }

  @Test
  void anActionAfterTheExpiryFindsTheAlarmAlreadyUnshelved() {
    hot(0);
    board.shelve(at(1), "op1", AlarmKind.PEAK_HIGH, "trim under way", at(31));
    // no estimate arrives (connection down); the operator acts after the expiry
    ActionResult r = board.unshelve(at(40), "op1", AlarmKind.PEAK_HIGH, null);
    assertThat(r.accepted()).isFalse();
    assertThat(r.message()).isEqualTo("peak_high: the alarm is not shelved");
    assertThat(board.status(AlarmKind.PEAK_HIGH).state()).isEqualTo(AlarmState.UNACKNOWLEDGED);
    assertThat(audit.actions).hasSize(1);
  }

  @Test
  void inputsMustNotGoBackInTime() {
    hot(10);
    org.assertj.core.api.Assertions.assertThatThrownBy(() -> cool(9))
        .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("back in time");
    assertThat(board.status(AlarmKind.PEAK_HIGH).state()).isEqualTo(AlarmState.UNACKNOWLEDGED);
  }

  @Test
  void statusesAreSortedMostUrgentFirst() {
    List<AlarmStatus> s = board.statuses();
    assertThat(s).hasSize(AlarmKind.values().length);
    assertThat(s.get(0).kind()).isEqualTo(AlarmKind.PEAK_HIGH_HIGH);
    for (int i = 1; i < s.size(); i++) {
      assertThat(s.get(i).priority()).isGreaterThanOrEqualTo(s.get(i - 1).priority());
    }
  }

  @Test
  void aDisabledAlarmIsNotOnTheBoardAndCannotBeActedOn() {
    var defs = plain();
    defs.put(AlarmKind.HISTORY_NOT_KEPT, new AlarmDefinition(AlarmKind.HISTORY_NOT_KEPT, false,
        Double.NaN, Priority.NOTICE, 0, java.time.Duration.ZERO, java.time.Duration.ZERO));
    AlarmBoard b = new AlarmBoard(settings(0, defs), audit);
    b.evaluate(flags(0, "ok", none(), false, true));
    assertThat(b.status(AlarmKind.HISTORY_NOT_KEPT)).isNull();
    assertThat(audit.events).isEmpty();
    assertThat(b.acknowledge(at(1), "op1", AlarmKind.HISTORY_NOT_KEPT, null).message())
        .isEqualTo("history_not_kept: the alarm is disabled in the configuration");
  }
}
