package org.plateward.alarms;

import java.time.Instant;

/**
 * One alarm flood: from the annunciation that took the count over the threshold until the
 * count in the window fell back to the threshold.
 *
 * @param start when the flood began
 * @param end when it ended; null while it lasts
 * @param peakCount the most annunciations seen in one window during the flood
 */
public record FloodEpisode(Instant start, Instant end, int peakCount) {
  /** Whether the flood is still going on. */
  public boolean ongoing() {
    return end == null;
  }
}
