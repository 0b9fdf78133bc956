package org.plateward.plant;

/**
 * Time-to-exhaust known in hindsight: for each frame, the seconds until the first frame at or
 * after it in which some cell's buffer is fully melted (melt fraction 1); NaN when that does not
 * happen before the run ends. One backward pass over the max-cell melt fractions.
 */
public final class TimeToExhaust {
  /** A cell counts as fully melted from this melt fraction on (round-off of the enthalpy map). */
  public static final double FULLY_MELTED = 1.0 - 1e-9;

  private TimeToExhaust() {}

  /**
   * @param timeS frame times, s, increasing
   * @param maxCellMelt max-cell melt fraction of each frame
   * @return seconds until exhaustion from each frame, NaN where none follows
   */
  public static double[] inHindsight(double[] timeS, double[] maxCellMelt) {
    double[] out = new double[timeS.length];
    double next = Double.NaN;
    for (int k = timeS.length - 1; k >= 0; k--) {
      if (maxCellMelt[k] >= FULLY_MELTED) {
        next = timeS[k];
      }
      out[k] = Double.isNaN(next) ? Double.NaN : next - timeS[k];
    }
    return out;
  }
}
