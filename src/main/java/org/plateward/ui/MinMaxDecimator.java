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
    int[] starts = new int[columns + 1];
    columnStarts(timeS, count, t0S, t1S, columns, starts);
    return decimate(value, starts, columns, min, max);
  }

  /**
   * Where each column's samples begin: {@code starts[c]} is the first sample of column c or a
   * later one, {@code starts[columns]} one past the last sample before t1; column c holds the
   * samples [starts[c], starts[c + 1]). The column function is monotone in t, so each boundary
   * is a binary search (O(W log n)), and every series on the same times shares them.
   *
   * @param starts receives columns + 1 indices
   */
  public static void columnStarts(double[] timeS, int count, double t0S, double t1S, int columns, int[] starts) {
    if (!(t1S > t0S) || columns <= 0 || starts.length < columns + 1) {
      throw new IllegalArgumentException("need t1 > t0, columns > 0 and columns + 1 starts");
    }
    double span = t1S - t0S;
    int first = firstAtOrAfter(timeS, count, t0S);
    int end = firstAtOrAfter(timeS, count, t1S);
    starts[0] = first;
    for (int c = 1; c < columns; c++) {
      // first index in [starts[c-1], end) whose column is >= c
      int lo = starts[c - 1];
      int hi = end;
      while (lo < hi) {
        int mid = (lo + hi) >>> 1;
        if (column(timeS[mid], t0S, span, columns) < c) {
          lo = mid + 1;
        } else {
          hi = mid;
        }
      }
      starts[c] = lo;
    }
    // samples whose column rounds to W or beyond (t just below t1) are left out, as in the formula
    int lo = columns > 1 ? starts[columns - 1] : first;
    int hi = end;
    while (lo < hi) {
      int mid = (lo + hi) >>> 1;
      if (column(timeS[mid], t0S, span, columns) < columns) {
        lo = mid + 1;
      } else {
        hi = mid;
      }
    }
    starts[columns] = lo;
  }

  /**
   * Min and max per column of one series over column boundaries from {@link #columnStarts}.
   *
   * @return the number of columns that got a value
   */
  public static int decimate(double[] value, int[] starts, int columns, double[] min, double[] max) {
    int filled = 0;
    for (int c = 0; c < columns; c++) {
      double lo = Double.NaN;
      double hi = Double.NaN;
      for (int i = starts[c], e = starts[c + 1]; i < e; i++) {
        double v = value[i];
        if (v != v) {
          continue; // NaN
        }
        if (lo != lo) {
          lo = v;
          hi = v;
        } else if (v < lo) {
          lo = v;
        } else if (v > hi) {
          hi = v;
        }
      }
      min[c] = lo;
      max[c] = hi;
      if (lo == lo) {
        filled++;
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
    int[] starts = new int[columns + 1];
    columnStarts(timeS, count, t0S, t1S, columns, starts);
    return decimateBand(value, sd, k, starts, columns, lower, upper);
  }

  /** The band envelope over column boundaries from {@link #columnStarts}. */
  public static int decimateBand(double[] value, double[] sd, double k, int[] starts, int columns,
      double[] lower, double[] upper) {
    int filled = 0;
    for (int c = 0; c < columns; c++) {
      double lo = Double.NaN;
      double hi = Double.NaN;
      for (int i = starts[c], e = starts[c + 1]; i < e; i++) {
        double l = value[i] - k * sd[i];
        double h = value[i] + k * sd[i];
        if (l != l || h != h) {
          continue; // NaN
        }
        if (lo != lo) {
          lo = l;
          hi = h;
        } else {
          lo = Math.min(lo, l);
          hi = Math.max(hi, h);
        }
      }
      lower[c] = lo;
      upper[c] = hi;
      if (lo == lo) {
        filled++;
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
