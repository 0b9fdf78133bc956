package org.plateward.history;

import static org.assertj.core.api.Assertions.assertThat;
import static org.plateward.history.HistoryFixtures.T0;

import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;

/**
 * A range with a gap: history returns no frame inside the gap and the gap row says why; a
 * signal with no stored value in a frame comes back MISSING with NaN.
 */
class GapQueryTest {
  @TempDir Path dir;

  @Test
  void aGapYieldsNoFramesAndItsRowAndMissingSignalsAreMarked() throws Exception {
    Path file = dir.resolve("gap.db");
    GapRow gap = new GapRow(T0.plusSeconds(60), T0.plusSeconds(120), "connection lost");
    try (HistoryRecorder r = HistoryRecorder.start(HistoryFixtures.settings(file))) {
      for (int t = 0; t < 180; t++) {
        if (t >= 60 && t < 120) {
          continue;
        }
        r.appendFrame(t % 10 == 5 ? HistoryFixtures.mixedFrame(T0.plusSeconds(t))
            : HistoryFixtures.frame(T0.plusSeconds(t)));
      }
      r.appendGap(gap);
      assertThat(r.flush(Duration.ofSeconds(10))).isTrue();
    }
    try (HistoryReader h = HistoryReader.open(file)) {
      List<Frame> frames = h.frames(T0, T0.plusSeconds(180));
      assertThat(frames).hasSize(120);
      assertThat(frames).noneMatch(f -> !f.time().isBefore(gap.start()) && f.time().isBefore(gap.end()));
      assertThat(frames.get(59).time()).isEqualTo(T0.plusSeconds(59));
      assertThat(frames.get(60).time()).isEqualTo(T0.plusSeconds(120));
      assertThat(h.gaps(T0, T0.plusSeconds(180))).containsExactly(gap);
      Frame mixed = frames.get(5);
      assertThat(mixed.quality(Signal.REF_OUTLET_CH4)).isEqualTo(Quality.MISSING);
      assertThat(mixed.valueSi(Signal.REF_OUTLET_CH4)).isNaN();
      assertThat(mixed.quality(Signal.FUEL_FLOW)).isEqualTo(Quality.BAD);
      assertThat(mixed.valueSi(Signal.FUEL_FLOW)).isNaN();
      assertThat(mixed.usable(Signal.AIR_FLOW)).isTrue();
      assertThat(h.frames(T0.plusSeconds(70), T0.plusSeconds(110))).isEmpty();
    }
  }

  @Test
  void theStreamPagesThroughManyFramesInOrder() throws Exception {
    Path file = dir.resolve("stream.db");
    int n = 3 * HistoryFrameStream.PAGE_ROWS / Signal.COUNT + 17;
    try (HistoryRecorder r = HistoryRecorder.start(HistoryFixtures.settings(file))) {
      for (int i = 0; i < n; i++) {
        r.appendFrame(i % 3 == 0 ? HistoryFixtures.mixedFrame(T0.plusMillis(100L * i))
            : HistoryFixtures.frame(T0.plusMillis(100L * i)));
      }
      assertThat(r.flush(Duration.ofSeconds(30))).isTrue();
    }
    try (HistoryReader h = HistoryReader.open(file);
        HistoryFrameStream s = h.frameStream(T0, T0.plusSeconds(3600))) {
      int i = 0;
      Instant last = null;
      while (s.hasNext()) {
        Frame f = s.next();
        Frame expected = i % 3 == 0 ? HistoryFixtures.mixedFrame(T0.plusMillis(100L * i))
            : HistoryFixtures.frame(T0.plusMillis(100L * i));
        assertThat(HistoryFixtures.sameValues(f, expected)).as("frame %d", i).isTrue();
        assertThat(last == null || f.time().isAfter(last)).isTrue();
        last = f.time();
        i++;
      }
      // independent check: the number of distinct stored times, counted in plain SQL
      assertThat((long) i).isEqualTo(n)
          .isEqualTo(HistoryFixtures.count(file, "SELECT count(DISTINCT time_ms) FROM samples"));
    }
  }
}
