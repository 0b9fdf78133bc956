package org.plateward.softsensor;

import org.apache.commons.math3.stat.regression.SimpleRegression;

/**
 * Each input over the last {@code windowS} of frames that carried a usable value: what a
 * held-input forecast takes as "the present inputs". A single frame carries the meters' white
 * noise (0.5 % of reading per frame for the flow meters), which a forecast near the melting
 * point turns into seconds of time-to-exhaust.
 *
 * <p>{@link #mean} cuts that noise by √N but lags a ramp by half the window: on the fuel
 * surge the forecasts taken just after the 2 min ramp held a fuel flow 1.5 % low and read
 * 329 s to melt-through where the plant took 194 s. The least-squares line through the window
 * at its newest time does not lag, but for N equally spaced frames of white noise σ it spreads
 * σ √((4N − 2)/(N(N + 1))) (0.36 σ for N = 30, against 0.18 σ for the mean), and near
 * melt-through the forecast is that sensitive: on the fuel surge 0.25 % of fuel moved the
 * forecast by 15 %. {@link #present} therefore takes the mean over the longest flat stretch
 * of up to four windows (0.09 σ over 120 frames) and the line only while the input moves.
 */
final class RecentInputs {
  private final double windowS;
  private final int capacity;
  private final double[][] values;
  private final double[][] times;
  private final int[] next;
  private final int[] count;

  /**
   * @param inputs number of inputs
   * @param windowS averaging window, s
   * @param capacity most frames kept per input (at least the frames of one window)
   */
  RecentInputs(int inputs, double windowS, int capacity) {
    if (!(windowS > 0.0) || capacity < 1) {
      throw new IllegalArgumentException("window must be > 0 s and capacity >= 1");
    }
    this.windowS = windowS;
    this.capacity = capacity;
    this.values = new double[inputs][capacity];
    this.times = new double[inputs][capacity];
    this.next = new int[inputs];
    this.count = new int[inputs];
  }

  /** Adds a usable value of input {@code i} at time {@code tS}. */
  void add(int i, double tS, double v) {
    values[i][next[i]] = v;
    times[i][next[i]] = tS;
    next[i] = (next[i] + 1) % capacity;
    count[i] = Math.min(count[i] + 1, capacity);
  }

  /**
   * Mean of input {@code i} over the values within {@code windowS} of its newest one (so a
   * signal that went silent keeps the mean of its last window), or NaN before any value.
   */
  double mean(int i) {
    Stretch w = window(i, windowS);
    return w == null ? Double.NaN : w.mean();
  }

  /**
   * The present value of input {@code i}: the mean over the longest of 4, 2 and 1 windows in
   * which the values show no trend (least-squares slope within two standard errors of zero),
   * else the least-squares line over one window at its newest time; the mean when one window
   * holds fewer than three values; NaN before any value.
   */
  double present(int i) {
    for (int k = LONGEST; k >= 1; k /= 2) {
      double spanS = k * windowS;
      Stretch w = window(i, spanS);
      if (w == null) {
        return Double.NaN;
      }
      if (w.line.getN() < 3) {
        return mean(i);
      }
      boolean flat = Math.abs(w.line.getSlope()) <= 2.0 * w.line.getSlopeStdErr();
      if (k == 1) {
        // time from the newest frame: the intercept is the line at the newest time
        return flat ? w.mean() : w.line.getIntercept();
      }
      if (flat && w.spanS() >= 0.9 * spanS) {
        return w.mean();
      }
    }
    throw new AssertionError("the loop ends at one window");
  }

  /** How many windows back {@link #present} looks for a flat stretch. */
  private static final int LONGEST = 4;

  /** The values of one window, gathered in one pass: their line, sum and oldest time. */
  private static final class Stretch {
    final SimpleRegression line = new SimpleRegression();
    double sum;
    double oldestS;

    void add(double dtS, double v) {
      line.addData(dtS, v);
      sum += v;
      oldestS = Math.min(oldestS, dtS);
    }

    double mean() {
      return sum / line.getN();
    }

    /** Time from the oldest value to the newest, plus one frame gap. */
    double spanS() {
      long n = line.getN();
      return n < 2 ? 0.0 : -oldestS * n / (n - 1);
    }
  }

  /** The values within {@code spanS} of the newest (time from the newest), or null if there is none. */
  private Stretch window(int i, double spanS) {
    if (count[i] == 0) {
      return null;
    }
    Stretch w = new Stretch();
    int newest = (next[i] - 1 + capacity) % capacity;
    double tNew = times[i][newest];
    for (int k = 0; k < count[i]; k++) {
      int idx = (newest - k + capacity) % capacity;
      if (tNew - times[i][idx] >= spanS) {
        break;
      }
      w.add(times[i][idx] - tNew, values[i][idx]);
    }
    return w;
  }
}
