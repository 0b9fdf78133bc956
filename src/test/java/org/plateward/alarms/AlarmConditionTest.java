package org.plateward.alarms;

import static org.assertj.core.api.Assertions.assertThat;
import static org.plateward.alarms.AlarmFixtures.C;
import static org.plateward.alarms.AlarmFixtures.inputs;
import static org.plateward.alarms.AlarmFixtures.plain;
import static org.plateward.alarms.AlarmFixtures.settings;
import static org.plateward.alarms.AlarmFixtures.with;

import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Deadband, on-delay, off-delay and the upper-confidence judgement. The behaviour checked is the
 * one ISA-18.2 / IEC 62682 describes for alarm deadband and on/off delays (REFERENCES.md §7 and
 * PITFALLS §5.4, from memory: a deadband holds an alarm until the value is back past the limit
 * by the deadband; an on-delay raises it only when the condition has lasted that long; an
 * off-delay clears it only when the clear condition has lasted that long).
 */
class AlarmConditionTest {
  private static final double LIMIT_K = 1110 + C;

  private static AlarmBoard board(AlarmDefinition peakHigh, double k,
      AlarmFixtures.Recording audit) {
    Map<AlarmKind, AlarmDefinition> d = plain();
    d.put(AlarmKind.PEAK_HIGH, peakHigh);
    return new AlarmBoard(settings(k, d), audit);
  }

  @Test
  void onDelayFiltersAOneSampleSpike() {
    var audit = new AlarmFixtures.Recording();
    AlarmBoard b = board(with(AlarmKind.PEAK_HIGH, LIMIT_K, 0, 10, 0), 0.0, audit);
    for (long s = 0; s < 60; s++) {
      // one 1-s sample 20 K over the limit at t = 30 s, otherwise 10 K under
      b.evaluate(inputs(s, s == 30 ? LIMIT_K + 20 : LIMIT_K - 10, 0, 0.1, Double.NaN));
    }
    assertThat(audit.of(AlarmKind.PEAK_HIGH)).isEmpty();

    // the same excess held for the on-delay raises the alarm exactly when the delay is up
    for (long s = 60; s <= 75; s++) {
      b.evaluate(inputs(s, LIMIT_K + 20, 0, 0.1, Double.NaN));
    }
    assertThat(audit.of(AlarmKind.PEAK_HIGH)).hasSize(1);
    assertThat(audit.of(AlarmKind.PEAK_HIGH).get(0).time())
        .isEqualTo(AlarmFixtures.T0.plusSeconds(70));
    assertThat(b.status(AlarmKind.PEAK_HIGH).state()).isEqualTo(AlarmState.UNACKNOWLEDGED);
  }

  @Test
  void withoutOnDelayTheSameSpikeIsAnAlarm() {
    // the control case: proves the spike above would have raised an alarm
    var audit = new AlarmFixtures.Recording();
    AlarmBoard b = board(with(AlarmKind.PEAK_HIGH, LIMIT_K, 0, 0, 0), 0.0, audit);
    b.evaluate(inputs(0, LIMIT_K - 10, 0, 0.1, Double.NaN));
    b.evaluate(inputs(1, LIMIT_K + 20, 0, 0.1, Double.NaN));
    b.evaluate(inputs(2, LIMIT_K - 10, 0, 0.1, Double.NaN));
    assertThat(audit.annunciations(AlarmKind.PEAK_HIGH)).isEqualTo(1);
  }

  @Test
  void offDelayHoldsTheAlarmUntilTheClearConditionHasLasted() {
    var audit = new AlarmFixtures.Recording();
    AlarmBoard b = board(with(AlarmKind.PEAK_HIGH, LIMIT_K, 0, 0, 30), 0.0, audit);
    b.evaluate(inputs(0, LIMIT_K + 5, 0, 0.1, Double.NaN));
    b.acknowledge(AlarmFixtures.T0.plusSeconds(1), "op1", AlarmKind.PEAK_HIGH, null);
    // below the limit from t = 10 s; with a 29-s dip interrupted at t = 25 s the timer restarts
    for (long s = 10; s <= 70; s++) {
      double v = s == 25 ? LIMIT_K + 1 : LIMIT_K - 5;
      b.evaluate(inputs(s, v, 0, 0.1, Double.NaN));
      AlarmState expected = s < 56 ? AlarmState.ACKNOWLEDGED : AlarmState.NORMAL;
      assertThat(b.status(AlarmKind.PEAK_HIGH).state()).as("t=%d s", s).isEqualTo(expected);
    }
    // the clear came 30 s after the last sample over the limit (t = 26 s + 30 s)
    assertThat(audit.of(AlarmKind.PEAK_HIGH).get(2).time())
        .isEqualTo(AlarmFixtures.T0.plusSeconds(56));
  }

  @Test
  void deadbandStopsChatter() {
    // a value oscillating +-2 K around the limit, 1-s samples for 10 min
    var withBand = new AlarmFixtures.Recording();
    AlarmBoard b = board(with(AlarmKind.PEAK_HIGH, LIMIT_K, 5.0, 0, 0), 0.0, withBand);
    var noBand = new AlarmFixtures.Recording();
    AlarmBoard c = board(with(AlarmKind.PEAK_HIGH, LIMIT_K, 0.0, 0, 0), 0.0, noBand);
    for (long s = 0; s < 600; s++) {
      double v = LIMIT_K + 2.0 * Math.sin(2 * Math.PI * s / 20.0 + 0.3);
      b.evaluate(inputs(s, v, 0, 0.1, Double.NaN));
      c.evaluate(inputs(s, v, 0, 0.1, Double.NaN));
    }
    assertThat(withBand.annunciations(AlarmKind.PEAK_HIGH)).isEqualTo(1);
    // without a deadband the same signal annunciates once per period (30 periods)
    assertThat(noBand.annunciations(AlarmKind.PEAK_HIGH)).isGreaterThanOrEqualTo(29);

    // and it clears once the value is back below limit - deadband
    b.evaluate(inputs(600, LIMIT_K - 5.5, 0, 0.1, Double.NaN));
    assertThat(b.status(AlarmKind.PEAK_HIGH).state())
        .isEqualTo(AlarmState.RETURNED_UNACKNOWLEDGED);
  }

  @Test
  void peakIsJudgedOnTheUpperConfidenceBound() {
    // mean 1100 degC, sigma 6 K: mean + 2 sigma = 1112 degC > 1110 degC although mean < limit
    var audit = new AlarmFixtures.Recording();
    AlarmBoard b = board(with(AlarmKind.PEAK_HIGH, LIMIT_K, 0, 0, 0), 2.0, audit);
    b.evaluate(inputs(0, 1100 + C, 6.0, 0.1, Double.NaN));
    assertThat(b.status(AlarmKind.PEAK_HIGH).state()).isEqualTo(AlarmState.UNACKNOWLEDGED);
    assertThat(audit.of(AlarmKind.PEAK_HIGH).get(0).value()).isEqualTo(1112 + C, within());
    assertThat(audit.of(AlarmKind.PEAK_HIGH).get(0).limit()).isEqualTo(LIMIT_K);

    // mean + 1 sigma = 1106 degC stays under the limit (k = 1 does not raise it)
    var k1 = new AlarmFixtures.Recording();
    AlarmBoard b1 = board(with(AlarmKind.PEAK_HIGH, LIMIT_K, 0, 0, 0), 1.0, k1);
    b1.evaluate(inputs(0, 1100 + C, 6.0, 0.1, Double.NaN));
    assertThat(b1.status(AlarmKind.PEAK_HIGH).state()).isEqualTo(AlarmState.NORMAL);
  }

  @Test
  void timeToExhaustIsALowAlarmAndNoForecastIsNotLow() {
    var audit = new AlarmFixtures.Recording();
    Map<AlarmKind, AlarmDefinition> d = plain();
    d.put(AlarmKind.EXHAUST_LOW, with(AlarmKind.EXHAUST_LOW, 600, 60, 0, 0));
    AlarmBoard b = new AlarmBoard(settings(2, d), audit);
    b.evaluate(inputs(0, 900 + C, 5, 0.5, Double.NaN));
    assertThat(b.status(AlarmKind.EXHAUST_LOW).state()).isEqualTo(AlarmState.NORMAL);
    b.evaluate(inputs(1, 900 + C, 5, 0.5, 590));
    assertThat(b.status(AlarmKind.EXHAUST_LOW).state()).isEqualTo(AlarmState.UNACKNOWLEDGED);
    b.evaluate(inputs(2, 900 + C, 5, 0.5, 650)); // inside the 60-s deadband: still active
    assertThat(b.status(AlarmKind.EXHAUST_LOW).conditionActive()).isTrue();
    b.evaluate(inputs(3, 900 + C, 5, 0.5, 661));
    assertThat(b.status(AlarmKind.EXHAUST_LOW).conditionActive()).isFalse();
  }

  private static org.assertj.core.data.Offset<Double> within() {
    return org.assertj.core.data.Offset.offset(1e-9);
  }
}
