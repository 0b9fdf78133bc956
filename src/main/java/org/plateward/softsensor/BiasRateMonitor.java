package org.plateward.softsensor;

import java.util.ArrayDeque;

/**
 * Flags a thermocouple whose estimated bias moves faster than a healthy one drifts. A healthy
 * bias is a random walk with σ_h over one hour, so over a window W its change has σ =
 * σ_h √(W / 1 h); the monitor raises when the estimated bias has moved by more than
 * {@code sigmas} of that over the last W (a two-sided test on the increment, in the spirit of
 * a generalised likelihood ratio test for a jump in the drift rate).
 */
public final class BiasRateMonitor {
  private final double windowS;
  private final double thresholdK;
  private final ArrayDeque<double[]> history = new ArrayDeque<>();
  private double raisedAtS = Double.NaN;
  private double changeK;

  /**
   * @param windowS window W (s)
   * @param healthyDriftKPerHour σ_h (K over one hour)
   * @param sigmas threshold in σ of the windowed increment
   */
  public BiasRateMonitor(double windowS, double healthyDriftKPerHour, double sigmas) {
    this.windowS = windowS;
    this.thresholdK = sigmas * healthyDriftKPerHour * Math.sqrt(windowS / 3600.0);
  }

  /**
   * Adds one estimate of the bias.
   *
   * @return true when this call raised the flag
   */
  public boolean add(double tS, double biasK) {
    history.addLast(new double[] {tS, biasK});
    while (history.size() > 1 && tS - history.peekFirst()[0] > windowS) {
      history.removeFirst();
    }
    double[] first = history.peekFirst();
    if (!Double.isNaN(raisedAtS) || tS - first[0] < 0.9 * windowS) {
      return false;
    }
    changeK = biasK - first[1];
    if (Math.abs(changeK) > thresholdK) {
      raisedAtS = tS;
      return true;
    }
    return false;
  }

  /** Threshold on the windowed change (K). */
  public double thresholdK() {
    return thresholdK;
  }

  /** Change over the window when the flag was raised (K). */
  public double changeK() {
    return changeK;
  }

  /** Time the flag was raised (s), NaN if not. */
  public double raisedAtS() {
    return raisedAtS;
  }
}
