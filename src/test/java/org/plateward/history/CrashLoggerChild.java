package org.plateward.history;

import java.nio.file.Path;
import java.time.Instant;

/**
 * Child process of {@link CrashSafetyTest}: keeps history at 1 kHz (one frame per millisecond of
 * wall-clock time, 1000 times the live rate, an estimate with a 60-cell profile every 10 frames
 * and an alarm event every 500) until it is killed. It prints {@code A <time_ms>} every 20
 * frames for the last frame time it appended and {@code H <dropped> <queue>} every second.
 */
public final class CrashLoggerChild {
  private CrashLoggerChild() {}

  public static void main(String[] args) throws Exception {
    HistoryRecorder r = HistoryRecorder.start(HistorySettings.at(Path.of(args[0])));
    if (!r.health().ok()) {
      System.out.println("E " + r.health().reason());
      return;
    }
    System.out.println("READY");
    long next = System.currentTimeMillis();
    long n = 0;
    long lastHealth = next;
    while (true) {
      long now = System.currentTimeMillis();
      if (next > now) {
        Thread.sleep(next - now);
        continue;
      }
      Instant t = Instant.ofEpochMilli(next);
      r.appendFrame(HistoryFixtures.frame(t));
      if (n % 10 == 0) {
        r.appendEstimate(HistoryFixtures.estimate(t, 60));
      }
      if (n % 500 == 0) {
        r.appendAlarmEvent(new AlarmEventRow(t, "child", "NORMAL->UNACK_ACTIVE", "low", n, 0.0,
            "child alarm " + n));
      }
      if (n % 20 == 0) {
        System.out.println("A " + next);
      }
      if (now - lastHealth >= 1000) {
        HistoryHealth h = r.health();
        System.out.println("H " + h.droppedEntries() + " " + h.queueDepth());
        lastHealth = now;
      }
      n++;
      next++;
    }
  }
}
