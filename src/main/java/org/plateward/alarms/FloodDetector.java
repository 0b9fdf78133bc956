package org.plateward.alarms;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;

/**
 * Counts annunciated alarms for one operator position over a sliding window and marks a flood
 * while the count exceeds the threshold.
 *
 * <p>The default figure is the published one: a flood is more than 10 annunciated alarms in
 * 10 minutes per operator (REFERENCES.md §7, EEMUA 191-derived KPI grid "flood state 10 in 10
 * minutes" and a secondary source "more than 10 alarms in a 10-minute period" [V2]; ISA-18.2
 * itself defines a flood only qualitatively [M]). The window is (t − window, t]. The flood ends
 * when the count falls back to the threshold or below, at the moment the annunciation that
 * made the difference leaves the window (our choice; the sources give no end criterion). For
 * scale, the long-term rate judged very likely acceptable is about 1 per 10 minutes (EEMUA 191,
 * 3rd ed. 2013 [V2]; the ISA-18.2 performance-metrics table gives ~1 per 10 min, ~6 per hour,
 * ~150 per day [M]); the flood figure is ten times that.
 */
public final class FloodDetector {
  private final int threshold;
  private final Duration window;
  private final Deque<Instant> recent = new ArrayDeque<>();
  private final List<FloodEpisode> episodes = new ArrayList<>();
  private Instant floodStart;
  private int peak;

  /**
   * @param threshold a flood is more than this many annunciations in the window
   * @param window the length of the sliding window
   */
  public FloodDetector(int threshold, Duration window) {
    if (threshold < 1 || window.isZero() || window.isNegative()) {
      throw new IllegalArgumentException("threshold and window must be positive");
    }
    this.threshold = threshold;
    this.window = window;
  }

  /** A detector with the published figure (more than 10 in 10 min). */
  public static FloodDetector published() {
    return new FloodDetector(AlarmSettings.PUBLISHED_FLOOD_COUNT,
        AlarmSettings.PUBLISHED_FLOOD_WINDOW);
  }

  /** Counts one annunciation at {@code t} (times non-decreasing). */
  public void annunciated(Instant t) {
    advance(t);
    recent.addLast(t);
    if (floodStart == null && recent.size() > threshold) {
      floodStart = t;
      peak = recent.size();
      episodes.add(new FloodEpisode(t, null, peak));
    } else if (floodStart != null && recent.size() > peak) {
      peak = recent.size();
      episodes.set(episodes.size() - 1, new FloodEpisode(floodStart, null, peak));
    }
  }

  /** Moves the window to {@code t}: old annunciations drop out and a flood may end. */
  public void advance(Instant t) {
    Instant from = t.minus(window);
    while (!recent.isEmpty() && !recent.peekFirst().isAfter(from)) {
      Instant gone = recent.removeFirst();
      if (floodStart != null && recent.size() <= threshold) {
        // the flood ended the moment this annunciation left the window
        episodes.set(episodes.size() - 1, new FloodEpisode(floodStart, gone.plus(window), peak));
        floodStart = null;
        peak = 0;
      }
    }
  }

  /** Whether a flood is going on. */
  public boolean flooding() {
    return floodStart != null;
  }

  /** Annunciations in the current window. */
  public int countInWindow() {
    return recent.size();
  }

  /** Every flood seen so far, oldest first; the last one may be ongoing. */
  public List<FloodEpisode> episodes() {
    return List.copyOf(episodes);
  }
}
