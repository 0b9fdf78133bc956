package org.plateward.alarms;

import static org.assertj.core.api.Assertions.assertThat;
import static org.plateward.alarms.AlarmFixtures.C;
import static org.plateward.alarms.AlarmFixtures.T0;
import static org.plateward.alarms.AlarmFixtures.plain;
import static org.plateward.alarms.AlarmFixtures.settings;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

/**
 * The design suppression rules, each shown to hide exactly the alarms it names and nothing
 * else (PITFALLS §5.3: state-based suppression scoped narrowly, each rule unit-tested; ISA-18.2
 * "suppressed by design", REFERENCES.md §7 [M]).
 */
class DesignSuppressionTest {
  private final AlarmFixtures.Recording audit = new AlarmFixtures.Recording();
  private final AlarmBoard board = new AlarmBoard(settings(0, plain()), audit);

  private static AlarmInputs everythingBad(long s, String status, boolean lost) {
    // peak over high-high, melt and exhaust over their limits, a stale signal, no history
    return new AlarmInputs(T0.plusSeconds(s), 1140 + C, 0, 0.9, 100, status, Set.of("TI-101"),
        lost, true);
  }

  private Set<AlarmKind> inState(AlarmState st) {
    Set<AlarmKind> out = EnumSet.noneOf(AlarmKind.class);
    for (AlarmStatus s : board.statuses()) {
      if (s.state() == st) {
        out.add(s.kind());
      }
    }
    return out;
  }

  @Test
  void highHighSuppressesHighOnly() {
    board.evaluate(everythingBad(0, "ok", false));
    assertThat(inState(AlarmState.SUPPRESSED_BY_DESIGN)).containsExactly(AlarmKind.PEAK_HIGH);
    assertThat(inState(AlarmState.UNACKNOWLEDGED)).containsExactlyInAnyOrder(
        AlarmKind.PEAK_HIGH_HIGH, AlarmKind.MELT_HIGH, AlarmKind.EXHAUST_LOW,
        AlarmKind.SIGNAL_BAD_OR_STALE, AlarmKind.HISTORY_NOT_KEPT);
    // back under high-high but still over high: the high alarm is annunciated
    board.evaluate(new AlarmInputs(T0.plusSeconds(1), 1120 + C, 0, 0.9, 100, "ok",
        Set.of("TI-101"), false, true));
    assertThat(board.status(AlarmKind.PEAK_HIGH).state()).isEqualTo(AlarmState.UNACKNOWLEDGED);
  }

  @Test
  void highHighOutOfServiceDoesNotHideHigh() {
    board.removeFromService(T0, "op1", AlarmKind.PEAK_HIGH_HIGH, "limit under review");
    board.evaluate(everythingBad(0, "ok", false));
    assertThat(board.status(AlarmKind.PEAK_HIGH).state()).isEqualTo(AlarmState.UNACKNOWLEDGED);
  }

  @Test
  void highHighShelvedDoesNotHideHigh() {
    board.evaluate(everythingBad(0, "ok", false));
    assertThat(board.status(AlarmKind.PEAK_HIGH).state())
        .isEqualTo(AlarmState.SUPPRESSED_BY_DESIGN);
    board.shelve(T0.plusSeconds(1), "op1", AlarmKind.PEAK_HIGH_HIGH, "trim under way",
        T0.plusSeconds(600));
    board.evaluate(everythingBad(2, "ok", false));
    assertThat(board.status(AlarmKind.PEAK_HIGH).state()).isEqualTo(AlarmState.UNACKNOWLEDGED);
  }

  @Test
  void theBoardReturnsWhatItSendsToTheAudit() {
    List<AlarmEvent> returned = new ArrayList<>(board.evaluate(everythingBad(0, "ok", false)));
    returned.addAll(board.evaluate(everythingBad(1, "untrustworthy", true)));
    assertThat(returned).isNotEmpty().isEqualTo(audit.events);
  }

  @Test
  void anUntrustworthyEstimateHidesNoHotSpotAlarm() {
    board.evaluate(everythingBad(0, "untrustworthy", false));
    assertThat(inState(AlarmState.UNACKNOWLEDGED)).containsExactlyInAnyOrder(
        AlarmKind.PEAK_HIGH_HIGH, AlarmKind.MELT_HIGH, AlarmKind.EXHAUST_LOW,
        AlarmKind.ESTIMATOR_UNTRUSTWORTHY, AlarmKind.SIGNAL_BAD_OR_STALE, AlarmKind.HISTORY_NOT_KEPT);
    assertThat(inState(AlarmState.SUPPRESSED_BY_DESIGN)).containsExactly(AlarmKind.PEAK_HIGH); // by high-high only
  }

  @Test
  void aLostConnectionSuppressesTheStaleSignalAlarmOnly() {
    board.evaluate(everythingBad(0, "ok", true));
    assertThat(inState(AlarmState.SUPPRESSED_BY_DESIGN)).containsExactlyInAnyOrder(
        AlarmKind.PEAK_HIGH, AlarmKind.SIGNAL_BAD_OR_STALE);
    assertThat(board.status(AlarmKind.CONNECTION_LOST).state())
        .isEqualTo(AlarmState.UNACKNOWLEDGED);
  }
}
