package org.plateward.estimation;

/**
 * Tuning of the {@link ExtendedKalmanFilter}. Use {@link #defaults()} and the {@code with…}
 * methods.
 *
 * @param maxSubstepS longest linearly implicit sub-step of a propagation (s)
 * @param gatingEnabled whether χ² gating is applied at all
 * @param channelGateProbability per-channel gate: reject when ν²/S_ii &gt; χ²₁ quantile
 * @param jointGateProbability joint gate: NIS of the used set against χ²_m quantile
 * @param nisWindow number of updates in the NIS consistency window
 * @param nisBandProbability two-sided probability of the NIS band (0.95)
 * @param adaptiveProcessNoise whether Q is inflated from the innovations
 * @param adaptiveWindow number of updates in the adaptive-Q window
 * @param maxProcessNoiseInflation upper bound on the Q factor
 * @param cusumSlack CUSUM reference value k (σ)
 * @param cusumThreshold CUSUM decision interval h (σ)
 * @param historyLength number of epochs kept for delayed measurements
 * @param fullPositiveDefiniteCheck Cholesky check of P after every update (else diagonal only)
 * @param eigenvalueFloorRelative repair floor relative to the largest eigenvalue
 * @param eigenvalueFloorAbsolute repair floor, absolute (state units squared)
 */
public record FilterSettings(
    double maxSubstepS,
    boolean gatingEnabled,
    double channelGateProbability,
    double jointGateProbability,
    int nisWindow,
    double nisBandProbability,
    boolean adaptiveProcessNoise,
    int adaptiveWindow,
    double maxProcessNoiseInflation,
    double cusumSlack,
    double cusumThreshold,
    int historyLength,
    boolean fullPositiveDefiniteCheck,
    double eigenvalueFloorRelative,
    double eigenvalueFloorAbsolute) {

  /** Validates the settings. */
  public FilterSettings {
    if (!(maxSubstepS > 0.0)) {
      throw new IllegalArgumentException("maxSubstepS must be > 0, got " + maxSubstepS);
    }
    checkProbability(channelGateProbability, "channelGateProbability");
    checkProbability(jointGateProbability, "jointGateProbability");
    checkProbability(nisBandProbability, "nisBandProbability");
    if (nisWindow < 1 || adaptiveWindow < 1 || historyLength < 1) {
      throw new IllegalArgumentException("window and history lengths must be >= 1");
    }
  }

  private static void checkProbability(double p, String name) {
    if (!(p > 0.0 && p < 1.0)) {
      throw new IllegalArgumentException(name + " must be in (0,1), got " + p);
    }
  }

  /**
   * Defaults: 1 s sub-steps; gates at 0.9973 (the 3σ two-sided probability, common practice);
   * NIS window of 100 updates, 95% band; adaptive Q off (window 60, λ ≤ 10); CUSUM k = 0.5,
   * h = 8 (in-control run length about 9,500 updates per channel); 120 epochs of history;
   * a full Cholesky check every update; eigenvalue floor 1e-9 of the largest eigenvalue (about
   * √ε: small enough not to disturb a healthy direction, large enough that P stays
   * factorisable), 1e-15 absolute.
   */
  public static FilterSettings defaults() {
    return new FilterSettings(
        1.0, true, 0.9973, 0.9973, 100, 0.95, false, 60, 10.0, 0.5, 8.0, 120, true, 1e-9, 1e-15);
  }

  /** Copy with another sub-step bound (s). */
  public FilterSettings withMaxSubstepS(double v) {
    return new FilterSettings(v, gatingEnabled, channelGateProbability, jointGateProbability,
        nisWindow, nisBandProbability, adaptiveProcessNoise, adaptiveWindow,
        maxProcessNoiseInflation, cusumSlack, cusumThreshold, historyLength,
        fullPositiveDefiniteCheck, eigenvalueFloorRelative, eigenvalueFloorAbsolute);
  }

  /** Copy with gating switched on or off. */
  public FilterSettings withGating(boolean enabled) {
    return new FilterSettings(maxSubstepS, enabled, channelGateProbability, jointGateProbability,
        nisWindow, nisBandProbability, adaptiveProcessNoise, adaptiveWindow,
        maxProcessNoiseInflation, cusumSlack, cusumThreshold, historyLength,
        fullPositiveDefiniteCheck, eigenvalueFloorRelative, eigenvalueFloorAbsolute);
  }

  /** Copy with other gate probabilities. */
  public FilterSettings withGateProbabilities(double channel, double joint) {
    return new FilterSettings(maxSubstepS, gatingEnabled, channel, joint,
        nisWindow, nisBandProbability, adaptiveProcessNoise, adaptiveWindow,
        maxProcessNoiseInflation, cusumSlack, cusumThreshold, historyLength,
        fullPositiveDefiniteCheck, eigenvalueFloorRelative, eigenvalueFloorAbsolute);
  }

  /** Copy with another NIS window length (updates). */
  public FilterSettings withNisWindow(int v) {
    return new FilterSettings(maxSubstepS, gatingEnabled, channelGateProbability,
        jointGateProbability, v, nisBandProbability, adaptiveProcessNoise, adaptiveWindow,
        maxProcessNoiseInflation, cusumSlack, cusumThreshold, historyLength,
        fullPositiveDefiniteCheck, eigenvalueFloorRelative, eigenvalueFloorAbsolute);
  }

  /** Copy with adaptive process noise switched on or off, its window and bound. */
  public FilterSettings withAdaptiveProcessNoise(boolean on, int window, double maxInflation) {
    return new FilterSettings(maxSubstepS, gatingEnabled, channelGateProbability,
        jointGateProbability, nisWindow, nisBandProbability, on, window, maxInflation,
        cusumSlack, cusumThreshold, historyLength, fullPositiveDefiniteCheck,
        eigenvalueFloorRelative, eigenvalueFloorAbsolute);
  }

  /** Copy with other CUSUM parameters (σ). */
  public FilterSettings withCusum(double slack, double threshold) {
    return new FilterSettings(maxSubstepS, gatingEnabled, channelGateProbability,
        jointGateProbability, nisWindow, nisBandProbability, adaptiveProcessNoise,
        adaptiveWindow, maxProcessNoiseInflation, slack, threshold, historyLength,
        fullPositiveDefiniteCheck, eigenvalueFloorRelative, eigenvalueFloorAbsolute);
  }

  /** Copy with another history length (epochs). */
  public FilterSettings withHistoryLength(int v) {
    return new FilterSettings(maxSubstepS, gatingEnabled, channelGateProbability,
        jointGateProbability, nisWindow, nisBandProbability, adaptiveProcessNoise,
        adaptiveWindow, maxProcessNoiseInflation, cusumSlack, cusumThreshold, v,
        fullPositiveDefiniteCheck, eigenvalueFloorRelative, eigenvalueFloorAbsolute);
  }

  /** Copy with the full Cholesky check of P switched on or off. */
  public FilterSettings withFullPositiveDefiniteCheck(boolean v) {
    return new FilterSettings(maxSubstepS, gatingEnabled, channelGateProbability,
        jointGateProbability, nisWindow, nisBandProbability, adaptiveProcessNoise,
        adaptiveWindow, maxProcessNoiseInflation, cusumSlack, cusumThreshold, historyLength,
        v, eigenvalueFloorRelative, eigenvalueFloorAbsolute);
  }
}
