package org.plateward.ui;

/**
 * Reduces a time series to at most two values per pixel column: the smallest and the largest
 * sample that falls into the column. Drawing a vertical stroke from min to max in each column
 * shows every excursion of the raw series (no spike is lost, unlike plain subsampling), while
 * the cost of drawing no longer grows with the number of samples.
 *
 * <p>Column of a sample at time t, for the window [t0, t1) split into W columns:
 * {@code c = floor((t - t0) · W / (t1 - t0))}; samples outside [0, W) are skipped, and so are
 * NaN values. Times must be non-decreasing, so the window start is found by binary search and
 * the work is O(log n + samples in the window).
 */
public final class MinMaxDecimator {
  private MinMaxDecimator() {}

  /**
   * Fills {@code min[c]} and {@code max[c]} for c in [0, columns); a column without a finite
   * sample gets NaN in both.
   *
   * @param timeS sample times, s (non-decreasing)
   * @param value sample values, any unit (NaN: no value)
   * @param count how many leading samples of the arrays are valid
   * @param t0S window start, s (inclusive)
   * @param t1S window end, s (exclusive), &gt; t0S
   * @param columns number of pixel columns, &gt; 0
   * @param min receives the column minima (length &ge; columns)
   * @param max receives the column maxima (length &ge; columns)
   * @return the number of columns that got a value
   * @throws IllegalArgumentException for an empty window, no columns or short output arrays
   */
  public static int decimate(double[] timeS, double[] value, int count, double t0S, double t1S,
      int columns, double[] min, double[] max) {
    if (!(t1S > t0S) || columns <= 0 || min.length < columns || max.length < columns) {
      throw new IllegalArgumentException("need t1 > t0, columns > 0 and output arrays of that length; got t0="
          + t0S + " t1=" + t1S + " columns=" + columns);
    }
    for (int c = 0; c < columns; c++) {
      min[c] = Double.NaN;
      max[c] = Double.NaN;
    }
    double span = t1S - t0S;
    int filled = 0;
    for (int i = firstAtOrAfter(timeS, count, t0S); i < count; i++) {
      double t = timeS[i];
      if (t >= t1S) {
        break;
      }
      double v = value[i];
      if (Double.isNaN(v)) {
        continue;
      }
      int c = column(t, t0S, span, columns);
      if (c < 0 || c >= columns) {
        continue; // rounding at the window's edges
      }
      if (Double.isNaN(min[c])) {
        min[c] = v;
        max[c] = v;
        filled++;
      } else if (v < min[c]) {
        min[c] = v;
      } else if (v > max[c]) {
        max[c] = v;
      }
    }
    return filled;
  }

  /**
   * The envelope of a band v ± k·sd per column: {@code lower[c]} the smallest v − k·sd and
   * {@code upper[c]} the largest v + k·sd of the samples in column c (NaN when none has both a
   * finite value and a finite sd).
   *
   * @param k the band's half-width in standard deviations, &ge; 0
   * @return the number of columns that got a value
   */
  public static int decimateBand(double[] timeS, double[] value, double[] sd, double k, int count,
      double t0S, double t1S, int columns, double[] lower, double[] upper) {
    if (!(t1S > t0S) || columns <= 0 || lower.length < columns || upper.length < columns) {
      throw new IllegalArgumentException("need t1 > t0, columns > 0 and output arrays of that length");
    }
    for (int c = 0; c < columns; c++) {
      lower[c] = Double.NaN;
      upper[c] = Double.NaN;
    }
    double span = t1S - t0S;
    int filled = 0;
    for (int i = firstAtOrAfter(timeS, count, t0S); i < count; i++) {
      double t = timeS[i];
      if (t >= t1S) {
        break;
      }
      double lo = value[i] - k * sd[i];
      double hi = value[i] + k * sd[i];
      if (Double.isNaN(lo) || Double.isNaN(hi)) {
        continue;
      }
      int c = column(t, t0S, span, columns);
      if (c < 0 || c >= columns) {
        continue;
      }
      if (Double.isNaN(lower[c])) {
        lower[c] = lo;
        upper[c] = hi;
        filled++;
      } else {
        lower[c] = Math.min(lower[c], lo);
        upper[c] = Math.max(upper[c], hi);
      }
    }
    return filled;
  }

  /** The column of time t: floor((t − t0) · W / (t1 − t0)), evaluated in that order. */
  static int column(double t, double t0S, double spanS, int columns) {
    return (int) Math.floor((t - t0S) * columns / spanS);
  }

  /**
   * Index of the first sample with time &ge; t (count when none).
   *
   * @param timeS non-decreasing times, s
   * @param count valid leading samples
   * @param tS the time sought, s
   */
  public static int firstAtOrAfter(double[] timeS, int count, double tS) {
    int lo = 0;
    int hi = count;
    while (lo < hi) {
      int mid = (lo + hi) >>> 1;
      if (timeS[mid] < tS) {
        lo = mid + 1;
      } else {
        hi = mid;
      }
    }
    return lo;
  }
}
