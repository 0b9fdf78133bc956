package org.plateward.estimation;

import java.util.Arrays;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;

/**
 * Memoised χ² quantiles for one probability and integer degrees of freedom: each quantile is
 * computed once with Commons Math's {@link ChiSquaredDistribution} and then read from the table,
 * so the filter's hot path never calls the inverse CDF.
 */
public final class ChiSquareTable {
  private final double probability;
  private double[] quantiles;

  /**
   * @param probability lower-tail probability in (0, 1), e.g. 0.9973 for a gate
   * @param initialMaxDof quantiles for 1..initialMaxDof are computed now; larger ones on demand
   * @throws IllegalArgumentException if the probability is outside (0, 1)
   */
  public ChiSquareTable(double probability, int initialMaxDof) {
    if (!(probability > 0.0 && probability < 1.0)) {
      throw new IllegalArgumentException("probability must be in (0,1), got " + probability);
    }
    this.probability = probability;
    this.quantiles = new double[Math.max(2, initialMaxDof + 1)];
    Arrays.fill(quantiles, Double.NaN);
    for (int d = 1; d < quantiles.length; d++) {
      quantiles[d] = compute(d);
    }
  }

  /** Lower-tail probability of this table. */
  public double probability() {
    return probability;
  }

  /**
   * @param dof degrees of freedom, at least 1
   * @return x with P(χ²_dof ≤ x) = probability
   */
  public double quantile(int dof) {
    if (dof < 1) {
      throw new IllegalArgumentException("degrees of freedom must be >= 1, got " + dof);
    }
    if (dof >= quantiles.length) {
      final int old = quantiles.length;
      quantiles = Arrays.copyOf(quantiles, Math.max(dof + 1, 2 * old));
      Arrays.fill(quantiles, old, quantiles.length, Double.NaN);
    }
    double q = quantiles[dof];
    if (Double.isNaN(q)) {
      q = compute(dof);
      quantiles[dof] = q;
    }
    return q;
  }

  private double compute(int dof) {
    return new ChiSquaredDistribution(null, dof).inverseCumulativeProbability(probability);
  }
}
