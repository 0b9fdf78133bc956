package org.plateward.estimation;

/**
 * Sliding window over the last K normalised innovation squared values with their degrees of
 * freedom, tested against the two-sided χ² band (Bar-Shalom, Li &amp; Kirubarajan 2001, §5.4).
 */
public final class NisWindow {
  private final double[] nis;
  private final int[] dof;
  private final ChiSquareTable lower;
  private final ChiSquareTable upper;
  private int count;
  private int next;
  private double sumNis;
  private int sumDof;

  /**
   * @param length window length K (updates)
   * @param bandProbability two-sided band probability, e.g. 0.95
   * @param maxDofPerUpdate largest measurement dimension expected, to size the quantile tables
   */
  public NisWindow(int length, double bandProbability, int maxDofPerUpdate) {
    if (length < 1) {
      throw new IllegalArgumentException("NIS window length must be >= 1, got " + length);
    }
    nis = new double[length];
    dof = new int[length];
    final int size = Math.min(length * Math.max(1, maxDofPerUpdate), 4096);
    lower = new ChiSquareTable(0.5 * (1.0 - bandProbability), size);
    upper = new ChiSquareTable(0.5 * (1.0 + bandProbability), size);
  }

  /**
   * Adds one update's NIS.
   *
   * @param value NIS of the update (dimensionless)
   * @param degreesOfFreedom number of measurements used in it; 0 is ignored
   */
  public void add(double value, int degreesOfFreedom) {
    if (degreesOfFreedom <= 0) {
      return;
    }
    if (count == nis.length) {
      sumNis -= nis[next];
      sumDof -= dof[next];
    } else {
      count++;
    }
    nis[next] = value;
    dof[next] = degreesOfFreedom;
    sumNis += value;
    sumDof += degreesOfFreedom;
    next = (next + 1) % nis.length;
  }

  /** Current consistency summary. */
  public NisConsistency summary() {
    if (count == 0) {
      return new NisConsistency(0, 0, Double.NaN, Double.NaN, Double.NaN, false, true);
    }
    final double lo = lower.quantile(sumDof) / sumDof;
    final double hi = upper.quantile(sumDof) / sumDof;
    final double mean = sumNis / sumDof;
    final boolean full = count == nis.length;
    return new NisConsistency(
        count, sumDof, mean, lo, hi, full, !full || (mean >= lo && mean <= hi));
  }
}
