package org.plateward.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.config.PlatewardConfig;
import org.plateward.history.HistoryRecorder;
import org.plateward.history.HistorySettings;
import org.plateward.replay.ReplayFrameSource;
import org.plateward.signals.Frame;
import org.plateward.advisor.TrimSuggestion;
import org.plateward.alarms.AlarmAudit;
import org.plateward.alarms.AlarmEvent;
import org.plateward.alarms.BadOrStale;
import org.plateward.estimation.FilterSettings;
import org.plateward.history.HistoryReader;
import org.plateward.history.SuggestionRow;
import org.plateward.live.AdvisoryStage;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.SoftSensorSettings;
import java.util.ArrayList;

/**
 * The replay feed without a window: a period of history goes through it frame for frame (the
 * same frames the history holds, in order), and it stops where the cursor asks.
 */
class ReplayFeedTest {
  @Test
  void aPeriodOfHistoryIsEstimatedFrameForFrameUpToTheTimeAskedFor(@TempDir Path dir) throws Exception {
    PlatewardConfig cfg = PlatewardConfig.load(WindowFixture.CONFIG);
    Path db = dir.resolve("h.db");
    Instant first;
    int stored = 0;
    try (HistoryRecorder h = HistoryRecorder.start(HistorySettings.at(db));
        ReplayFrameSource src = ReplayFrameSource.open(WindowFixture.FUEL_SURGE)) {
      Frame f = src.next();
      first = f.time();
      while (f != null && stored < 300) {
        h.appendFrame(f);
        stored++;
        f = src.next();
      }
      assertThat(h.flush(Duration.ofSeconds(10))).isTrue();
    }
    Instant to = first.plusSeconds(300);
    List<Snapshot> got = new CopyOnWriteArrayList<>();
    try (ReplayFeed feed = ReplayFeed.ofHistory(cfg.unit(), cfg.alarms(), cfg.advisor(), db, first, to, null)) {
      feed.start(got::add);
      double half = Timeline.seconds(first) + 120;
      feed.runTo(half);
      long end = System.currentTimeMillis() + 30_000;
      while (feed.busy() && System.currentTimeMillis() < end) {
        Thread.sleep(20);
      }
      Thread.sleep(200);
      // it stops at the time asked for: frames at 1 s, from the first, up to and including t0 + 120 s
      assertThat(got).hasSize(121);
      assertThat(feed.headS()).isEqualTo(half);
      feed.runTo(Timeline.seconds(to));
      end = System.currentTimeMillis() + 30_000;
      while (!feed.ended() && System.currentTimeMillis() < end) {
        Thread.sleep(20);
      }
    }
    assertThat(got).hasSize(stored);
    for (int i = 1; i < got.size(); i++) {
      assertThat(got.get(i).time()).isAfter(got.get(i - 1).time());
    }
    assertThat(got.get(0).time()).isEqualTo(first);
  }

  /**
   * "Replays through exactly the live path": the window's replay of the fuel surge raises the
   * same alarm transitions and makes the same fuel-trim suggestions, at the same plant times, as
   * the live path's stage (estimator, then {@link AdvisoryStage}) run directly over the same
   * frames, and it stores the suggestions in the audit history, labelled advisory. The reference
   * run is independent of the feed (its own estimator, stage and frame loop); before the stage
   * was shared, the replay asked the advisor on its own 30 s clock with a fixed-σ forecast and
   * stored nothing.
   */
  @Test
  void theReplayGivesTheLivePathsAlarmsAndAdviceAndStoresTheAdvice(@TempDir Path dir) throws Exception {
    PlatewardConfig cfg = PlatewardConfig.load(WindowFixture.CONFIG);
    double spanS = 24 * 60;
    List<AlarmEvent> directEvents = new ArrayList<>();
    List<TrimSuggestion> direct = new ArrayList<>();
    Instant first;
    try (ReplayFrameSource src = ReplayFrameSource.open(WindowFixture.FUEL_SURGE)) {
      ReactorSoftSensor sensor = new ReactorSoftSensor(cfg.unit(), SoftSensorSettings.defaults(), FilterSettings.defaults());
      AdvisoryStage stage = new AdvisoryStage(cfg.unit(), sensor, cfg.alarms(), cfg.advisor(), AlarmAudit.NONE);
      Frame f = src.next();
      first = f.time();
      while (f != null && f.time().getEpochSecond() - first.getEpochSecond() <= spanS) {
        Estimate e = sensor.accept(f);
        directEvents.addAll(stage.judge(e, BadOrStale.recorded(f), false, false));
        stage.advise(e, sensor).ifPresent(direct::add);
        f = src.next();
      }
    }
    assertThat(direct).as("suggestions in the reference run").isNotEmpty();
    assertThat(directEvents).as("alarm transitions in the reference run").isNotEmpty();
    System.out.printf("reference run: %d alarm transitions, %d suggestions (%s)%n", directEvents.size(), direct.size(),
        direct.stream().map(d -> d.verdict() + " " + Math.round(1000 * d.trim()) / 10.0 + " %").toList());

    Path db = dir.resolve("audit.db");
    List<AlarmEvent> replayEvents = new CopyOnWriteArrayList<>();
    try (HistoryRecorder audit = HistoryRecorder.start(HistorySettings.at(db))) {
      try (ReplayFeed feed = ReplayFeed.ofFile(cfg.unit(), cfg.alarms(), cfg.advisor(), WindowFixture.FUEL_SURGE, audit)) {
        feed.start(snap -> replayEvents.addAll(snap.events()));
        feed.runTo(Timeline.seconds(first) + spanS);
        long end = System.currentTimeMillis() + 120_000;
        while ((feed.busy() || Double.isNaN(feed.headS())) && System.currentTimeMillis() < end) {
          Thread.sleep(20);
        }
        assertThat(feed.headS()).isEqualTo(Timeline.seconds(first) + spanS);
      }
      assertThat(audit.flush(Duration.ofSeconds(10))).isTrue();
    }
    assertThat(replayEvents).hasSameSizeAs(directEvents);
    for (int i = 0; i < directEvents.size(); i++) {
      AlarmEvent a = directEvents.get(i);
      AlarmEvent b = replayEvents.get(i);
      assertThat(b.time()).isEqualTo(a.time());
      assertThat(b.alarm()).isEqualTo(a.alarm());
      assertThat(b.to()).isEqualTo(a.to());
    }
    List<SuggestionRow> stored;
    try (HistoryReader r = HistoryReader.open(db)) {
      stored = r.suggestions(first, first.plusSeconds((long) spanS + 1));
    }
    assertThat(stored).hasSameSizeAs(direct);
    for (int i = 0; i < direct.size(); i++) {
      TrimSuggestion d = direct.get(i);
      SuggestionRow row = stored.get(i);
      assertThat(Timeline.seconds(row.time())).isEqualTo(d.timeS());
      assertThat(row.verdict()).isEqualTo(d.verdict().name().toLowerCase(java.util.Locale.ROOT));
      assertThat(row.trimPercent()).isCloseTo(100 * d.trim(), org.assertj.core.data.Offset.offset(1e-9));
      assertThat(row.label()).isEqualTo("ADVISORY");
    }
  }
}
