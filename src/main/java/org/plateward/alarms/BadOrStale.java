package org.plateward.alarms;

import java.util.Set;
import java.util.TreeSet;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;

/**
 * Which signals the "signal Bad or stale" alarm counts, by one rule for every path that judges
 * alarms (live, the window's replay, reports):
 *
 * <ul>
 *   <li>a value of Bad quality counts, for any signal;
 *   <li>a stale value counts only for a signal that reports continuously: the composition
 *       analyzer publishes once per period, so between results it is silent by design (the
 *       estimator itself flags an analyzer silent for longer than its period plus dead time).
 * </ul>
 *
 * <p>Live, "stale" is the frame aligner's flag (a signal that had a value but none within its
 * stale limit). A recorded frame (replay file or history) carries no flag: the aligner wrote a
 * stale value as MISSING, so a MISSING value of a continuously reporting signal is read as stale.
 */
public final class BadOrStale {
  private BadOrStale() {}

  /**
   * The live rule.
   *
   * @param frame the aligned frame
   * @param stale the signals the aligner flagged stale
   * @return ids of the signals that count, sorted
   */
  public static Set<String> live(Frame frame, Set<Signal> stale) {
    Set<String> out = new TreeSet<>();
    for (Signal s : Signal.values()) {
      if (frame.quality(s) == Quality.BAD || (stale.contains(s) && continuous(s))) {
        out.add(s.id());
      }
    }
    return out;
  }

  /** The rule for a recorded frame: Bad, or MISSING for a continuously reporting signal. */
  public static Set<String> recorded(Frame frame) {
    Set<String> out = new TreeSet<>();
    for (Signal s : Signal.values()) {
      Quality q = frame.quality(s);
      if (q == Quality.BAD || (q == Quality.MISSING && continuous(s))) {
        out.add(s.id());
      }
    }
    return out;
  }

  private static boolean continuous(Signal s) {
    return s.kind() != Signal.Kind.ANALYZER;
  }
}
