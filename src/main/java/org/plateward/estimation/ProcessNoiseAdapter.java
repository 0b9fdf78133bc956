package org.plateward.estimation;

/**
 * Innovation-based scalar inflation of the process noise (covariance matching in the sense of
 * Mehra 1970, with the windowed innovation covariance estimate Ĉ_ν = (1/N) Σ ν νᵀ of Mohamed
 * &amp; Schwarz 1999). For a consistent filter E[ν νᵀ] = H P⁻ Hᵀ + R, so over the window
 *
 * <pre>  λ = Σ_k Σ_i (ν_i² − R_ii) / Σ_k Σ_i (H P⁻ Hᵀ)_ii        (used channels i, updates k)</pre>
 *
 * is the factor by which the predicted part of the innovation covariance is too small. Since
 * α is measured with the inflation already in force, the factor is updated multiplicatively
 * and damped over the window: λ ← clamp(λ · α^{1/N}, 1, λ_max); it settles where α = 1, that is
 * where the innovations match S. The filter multiplies its model Q by λ. A single scalar (rather than the
 * full K Ĉ_ν Kᵀ estimate) keeps Q's shape, which carries the physics, and cannot make Q
 * indefinite; the clamp keeps an outlier burst from blowing the covariance up.
 */
public final class ProcessNoiseAdapter {
  private final double[] excess;
  private final double[] predicted;
  private final double maxInflation;
  private final int minSamples;
  private int count;
  private int next;
  private double sumExcess;
  private double sumPredicted;
  private double lambda = 1.0;

  /**
   * @param window number of updates N in the window
   * @param maxInflation upper bound λ_max ≥ 1
   */
  public ProcessNoiseAdapter(int window, double maxInflation) {
    if (window < 1 || !(maxInflation >= 1.0)) {
      throw new IllegalArgumentException(
          "adaptive Q needs window >= 1 and max inflation >= 1, got " + window + ", "
              + maxInflation);
    }
    excess = new double[window];
    predicted = new double[window];
    this.maxInflation = maxInflation;
    this.minSamples = Math.max(1, window / 2);
  }

  /**
   * Adds one update.
   *
   * @param innovationExcess Σ_i (ν_i² − R_ii) over the used channels
   * @param predictedVariance Σ_i (H P⁻ Hᵀ)_ii over the same channels
   */
  public void add(double innovationExcess, double predictedVariance) {
    if (!(predictedVariance > 0.0) || !Double.isFinite(innovationExcess)) {
      return;
    }
    if (count == excess.length) {
      sumExcess -= excess[next];
      sumPredicted -= predicted[next];
    } else {
      count++;
    }
    excess[next] = innovationExcess;
    predicted[next] = predictedVariance;
    sumExcess += innovationExcess;
    sumPredicted += predictedVariance;
    next = (next + 1) % excess.length;
    if (count >= minSamples && sumPredicted > 0.0) {
      // α below 0 (innovations smaller than R alone) is treated as a strong "too large"
      final double alpha = Math.max(0.1, sumExcess / sumPredicted);
      lambda = Math.min(maxInflation, Math.max(1.0, lambda * Math.pow(alpha, 1.0 / excess.length)));
    }
  }

  /** Current factor λ in [1, λ_max]; 1 until half the window is filled. */
  public double inflation() {
    return lambda;
  }
}
