package org.plateward.history;

import static org.assertj.core.api.Assertions.assertThat;
import static org.plateward.history.HistoryFixtures.T0;

import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.apache.commons.math3.stat.descriptive.DescriptiveStatistics;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;

class RetentionTest {
  @TempDir Path dir;

  private static final int STEP_S = 10;
  private static final int DAY_S = 86_400;

  @Test
  void pruneKeepsRawForTheRawRetentionThenMinuteSummariesThenNothing() throws Exception {
    Path file = dir.resolve("ret.db");
    HistorySettings s = HistoryFixtures.settings(file)
        .withRetention(Duration.ofDays(1), Duration.ofDays(2), Duration.ofMinutes(1));
    List<Frame> frames = new ArrayList<>();
    Instant now = T0.plusSeconds(3L * DAY_S);
    PruneReport first;
    PruneReport second;
    try (HistoryRecorder r = HistoryRecorder.start(s)) {
      for (int t = 0; t < 3 * DAY_S; t += STEP_S) {
        Instant ti = T0.plusSeconds(t);
        Frame f = (t / STEP_S) % 7 == 3 ? HistoryFixtures.mixedFrame(ti) : HistoryFixtures.frame(ti);
        frames.add(f);
        r.appendFrame(f);
        r.appendEstimate(HistoryFixtures.estimate(ti, 8));
      }
      r.appendAlarmEvent(new AlarmEventRow(T0.plusSeconds(3600), "a1", "NORMAL->UNACK_ACTIVE",
          "high", 1.0, 0.5, "old alarm"));
      r.appendOperatorAction(new OperatorActionRow(T0.plusSeconds(3700), "op1", "acknowledge",
          "a1", null, null));
      r.appendGap(new GapRow(T0.plusSeconds(3600), T0.plusSeconds(7200), "connection lost"));
      r.appendGap(new GapRow(T0.plusSeconds(DAY_S + DAY_S / 2), T0.plusSeconds(DAY_S + DAY_S / 2 + 60),
          "connection lost"));
      assertThat(r.flush(Duration.ofSeconds(60))).isTrue();
      first = r.prune(now).get(60, TimeUnit.SECONDS);
      second = r.prune(now).get(60, TimeUnit.SECONDS);
    }
    Instant rawCutoff = T0.plusSeconds(2L * DAY_S);
    Instant oldCutoff = T0.plusSeconds(DAY_S);
    int perDay = DAY_S / STEP_S;
    int minutesPerDay = DAY_S / 60;

    // raw: only the last day is left, complete
    assertThat(HistoryFixtures.count(file, "SELECT count(DISTINCT time_ms) FROM samples"))
        .isEqualTo(perDay);
    assertThat(HistoryFixtures.count(file, "SELECT min(time_ms) FROM samples"))
        .isEqualTo(rawCutoff.toEpochMilli());
    // summaries: one per signal and minute of the day between the two cutoffs
    assertThat(HistoryFixtures.count(file, "SELECT count(*) FROM sample_summaries"))
        .isEqualTo((long) minutesPerDay * Signal.COUNT);
    long foldedValues = 0;
    for (Frame f : frames) {
      if (f.time().isBefore(rawCutoff)) {
        for (Signal sig : Signal.values()) {
          foldedValues += f.quality(sig) == Quality.MISSING ? 0 : 1;
        }
      }
    }
    assertThat(first.samplesSummarised()).isEqualTo(foldedValues);
    assertThat(first.summariesWritten()).isEqualTo(2L * minutesPerDay * Signal.COUNT);
    assertThat(first.summariesExpired()).isEqualTo((long) minutesPerDay * Signal.COUNT);
    assertThat(first.estimatesExpired()).isEqualTo(perDay / 6);
    assertThat(second).isEqualTo(new PruneReport(0, 0, 0, 0, 0, 0));

    try (HistoryReader h = HistoryReader.open(file)) {
      assertThat(h.frames(T0, rawCutoff)).isEmpty();
      assertThat(h.frames(rawCutoff, now)).hasSize(perDay);
      // independent check: min, max, mean and worst quality of each summary equal Apache
      // Commons Math DescriptiveStatistics over the raw values of that minute
      for (Signal sig : new Signal[] {Signal.FUEL_FLOW, Signal.REF_OUTLET_TEMP, Signal.REF_OUTLET_CH4}) {
        List<SampleSummaryRow> rows = h.summaries(sig, oldCutoff, rawCutoff);
        assertThat(rows).hasSize(minutesPerDay);
        for (SampleSummaryRow row : rows.subList(0, 120)) {
          DescriptiveStatistics st = new DescriptiveStatistics();
          Quality worst = Quality.GOOD;
          boolean any = false;
          for (Frame f : frames) {
            long dt = f.time().toEpochMilli() - row.start().toEpochMilli();
            if (dt < 0 || dt >= 60_000 || f.quality(sig) == Quality.MISSING) {
              continue;
            }
            any = true;
            if (f.quality(sig).compareTo(worst) > 0) {
              worst = f.quality(sig);
            }
            if (Double.isFinite(f.valueSi(sig))) {
              st.addValue(f.valueSi(sig));
            }
          }
          assertThat(row.span()).isEqualTo(Duration.ofMinutes(1));
          assertThat(row.count()).isEqualTo(st.getN());
          if (st.getN() > 0) {
            assertThat(row.min()).isEqualTo(st.getMin());
            assertThat(row.max()).isEqualTo(st.getMax());
            assertThat(row.mean()).isCloseTo(st.getMean(), org.assertj.core.data.Offset.offset(1e-9));
          } else {
            assertThat(row.mean()).isNaN();
          }
          if (any) {
            assertThat(row.worstQuality()).isEqualTo(worst);
          }
        }
      }
      // estimates: gone before the old cutoff, the last of each minute between, all after
      assertThat(h.estimates(T0, oldCutoff)).isEmpty();
      List<EstimateRow> thinned = h.estimates(oldCutoff, rawCutoff);
      assertThat(thinned).hasSize(minutesPerDay);
      for (EstimateRow e : thinned) {
        assertThat(e.time().toEpochMilli() % 60_000).isEqualTo(50_000);
      }
      assertThat(h.estimates(rawCutoff, now)).hasSize(perDay);
      // the audit trail is never pruned; gaps expire with the summaries
      assertThat(h.alarmEvents(T0, now)).hasSize(1);
      assertThat(h.operatorActions(T0, now)).hasSize(1);
      assertThat(h.gaps(T0, now)).hasSize(1);
    }
    assertThat(HistoryFixtures.text(file, "PRAGMA integrity_check")).isEqualTo("ok");
  }
}
