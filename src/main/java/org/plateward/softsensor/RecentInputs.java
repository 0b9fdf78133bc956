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
 * 329 s to melt-through where the plant took 194 s. {@link #present} is the least-squares line
 * through the window evaluated at its newest time: no lag on a ramp, and for N equally spaced
 * frames of white noise σ a spread of σ √((4N − 2)/(N(N + 1))) (0.36 σ for N = 30, against
 * 0.18 σ for the mean), still well under the meters' accuracy class.
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
    double[] sum = new double[2];
    if (!window(i, (dt, v) -> {
      sum[0] += v;
      sum[1]++;
    })) {
      return Double.NaN;
    }
    return sum[0] / sum[1];
  }

  /**
   * The least-squares line of input {@code i} over the window, at its newest time (the mean
   * when the window holds fewer than three values), or NaN before any value.
   */
  double present(int i) {
    SimpleRegression line = new SimpleRegression();
    // time from the newest frame: keeps the normal equations well scaled at epoch seconds
    if (!window(i, line::addData)) {
      return Double.NaN;
    }
    return line.getN() < 3 ? mean(i) : line.predict(0.0);
  }

  private interface Sink {
    void accept(double dtS, double value);
  }

  /** Hands (time from the newest, value) of each value in the window; false if there is none. */
  private boolean window(int i, Sink sink) {
    if (count[i] == 0) {
      return false;
    }
    int newest = (next[i] - 1 + capacity) % capacity;
    double tNew = times[i][newest];
    for (int k = 0; k < count[i]; k++) {
      int idx = (newest - k + capacity) % capacity;
      if (tNew - times[i][idx] >= windowS) {
        break;
      }
      sink.accept(times[i][idx] - tNew, values[i][idx]);
    }
    return true;
  }
}
