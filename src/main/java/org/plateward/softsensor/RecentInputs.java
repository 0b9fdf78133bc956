package org.plateward.softsensor;

/**
 * Mean of each input over the last {@code windowS} of frames that carried a usable value: what a
 * held-input forecast takes as "the present inputs". A single frame carries the meters' white
 * noise (0.5 % of reading per frame for the flow meters), which a forecast near the melting
 * point turns into seconds of time-to-exhaust; the mean over 30 frames cuts it by √30 to below
 * 0.1 %, under the meters' 0.5 % accuracy class, and lags a change by half the window.
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
    if (count[i] == 0) {
      return Double.NaN;
    }
    int newest = (next[i] - 1 + capacity) % capacity;
    double tNew = times[i][newest];
    double sum = 0.0;
    int n = 0;
    for (int k = 0; k < count[i]; k++) {
      int idx = (newest - k + capacity) % capacity;
      if (tNew - times[i][idx] >= windowS) {
        break;
      }
      sum += values[i][idx];
      n++;
    }
    return sum / n;
  }
}
