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
    try (ReplayFeed feed = ReplayFeed.ofHistory(cfg.unit(), cfg.alarms(), db, first, to, null)) {
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
}
