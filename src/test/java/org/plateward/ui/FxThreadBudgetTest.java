package org.plateward.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * No view keeps the FX thread busy for more than 50 ms per frame while a recording replays as
 * fast as the estimator goes: the window's own pulse timings (snapshots taken in, cursor moved,
 * view redrawn) and the interval between scene pulses are measured over about ten seconds of
 * wall time, the views shown in turn. 50 ms is the brief's budget; the check is on the 95th
 * percentile of the FX thread's CPU time per pulse, and of its wall time too when the machine
 * is not overloaded (load average at most twice the cores).
 */
class FxThreadBudgetTest {
  @Test
  void noViewBlocksTheFxThreadDuringAMaxSpeedReplay() throws Exception {
    try (WindowFixture w = WindowFixture.open(WindowFixture.FUEL_SURGE, null)) {
      long[] intervals = new long[20_000];
      int[] n = {0};
      long[] last = {0};
      w.fxRun(() -> w.stage.getScene().addPostLayoutPulseListener(() -> {
        long now = System.nanoTime();
        if (last[0] != 0 && n[0] < intervals.length) {
          intervals[n[0]++] = now - last[0];
        }
        last[0] = now;
      }));
      w.fxRun(() -> {
        w.window.cursor().speed(ReplayCursor.MAX);
        w.window.cursor().play();
        w.window.timings().clear();
        w.window.cpuTimings().clear();
        for (int v = 0; v < 6; v++) {
          w.window.viewTimings(v).clear();
        }
      });
      int views = w.window.views().size();
      for (int round = 0; round < 2 * views; round++) {
        int v = round % views;
        w.fxRun(() -> w.window.tabs().getSelectionModel().select(v));
        Thread.sleep(800);
      }
      double p50 = w.fx(() -> w.window.timings().quantileMs(0.50));
      double p95 = w.fx(() -> w.window.timings().quantileMs(0.95));
      double max = w.fx(() -> w.window.timings().quantileMs(1.0));
      long pulses = w.fx(() -> w.window.timings().count());
      double cpu95 = w.fx(() -> w.window.cpuTimings().quantileMs(0.95));
      StringBuilder per = new StringBuilder();
      for (int v = 0; v < views; v++) {
        int k = v;
        per.append(String.format(Locale.ROOT, " %s %.1f/%.1f;", w.window.views().get(v).title(),
            w.fx(() -> w.window.viewTimings(k).quantileMs(0.95)), w.fx(() -> w.window.viewTimings(k).quantileMs(1.0))));
      }
      System.out.println("FX thread p95/max busy ms by view:" + per + " CPU time p95 " + String.format(Locale.ROOT, "%.2f ms", cpu95)
          + "; load average " + String.format(Locale.ROOT, "%.1f",
              java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage()));
      int frames = w.fx(() -> w.window.timeline().size());
      long[] iv = Arrays.copyOf(intervals, n[0]);
      Arrays.sort(iv);
      double ip95 = iv.length == 0 ? Double.NaN : iv[(int) Math.ceil(0.95 * iv.length) - 1] / 1e6;
      System.out.printf(Locale.ROOT,
          "FX thread during max-speed replay: %d pulses, %d frames in; busy per pulse p50 %.2f ms, p95 %.2f ms, max %.1f ms;"
              + " pulse interval p95 %.1f ms (%d intervals)%n", pulses, frames, p50, p95, max, ip95, iv.length);
      assertThat(frames).as("frames replayed").isGreaterThan(300);
      assertThat(pulses).as("pulses measured").isGreaterThan(50);
      // the FX thread's own CPU time per pulse is what a view costs; the wall time also holds the
      // time the thread waited for a core, which on a loaded shared machine says nothing of the view
      assertThat(cpu95).as("95th percentile of the FX thread's CPU time per pulse, ms").isLessThan(50.0);
      double load = java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage();
      int cores = Runtime.getRuntime().availableProcessors();
      if (load >= 0 && load <= 2.0 * cores) {
        assertThat(p95).as("95th percentile of the FX thread's wall time per pulse, ms (load %.1f)", load).isLessThan(50.0);
      }
    }
  }
}
