package org.plateward.advisor;

/**
 * How the fuel-trim advisor searches and when it speaks.
 *
 * @param minTrim lowest trim it may suggest (−0.15 = 15 % less fuel), ≤ 0
 * @param maxTrim highest trim it may suggest, ≥ 0 (the search looks only at reductions, so a
 *     suggestion never exceeds 0 either)
 * @param peakLimitK limit on the forecast peak upper bound, K
 * @param kSigma k of the upper bound mean + k σ
 * @param horizonS forecast horizon, s
 * @param deadbandK hysteresis: while a trim is suggested, holding counts as safe only below
 *     limit − deadband, and the trim is sized against that lower limit, K
 * @param minIntervalS least time between two issued suggestions, s
 * @param trimStep a new trim of the same verdict is issued only if it differs by more than this
 * @param trimTolerance absolute accuracy of the solved trim
 * @param forecastEveryS how often (plant time) the live monitor asks the advisor, s
 * @param sigmaDirections most directions r of the sigma-point spread forecast ({@link
 *     SpreadForecast}): each trim costs 2r + 1 open-loop marches
 */
public record TrimSettings(
    double minTrim,
    double maxTrim,
    double peakLimitK,
    double kSigma,
    double horizonS,
    double deadbandK,
    double minIntervalS,
    double trimStep,
    double trimTolerance,
    double forecastEveryS,
    int sigmaDirections) {

  /** Asked every {@value #DEFAULT_FORECAST_EVERY_S} s, spread from {@link SpreadForecast#DEFAULT_DIRECTIONS} directions. */
  public TrimSettings(double minTrim, double maxTrim, double peakLimitK, double kSigma, double horizonS,
      double deadbandK, double minIntervalS, double trimStep, double trimTolerance) {
    this(minTrim, maxTrim, peakLimitK, kSigma, horizonS, deadbandK, minIntervalS, trimStep, trimTolerance,
        DEFAULT_FORECAST_EVERY_S, SpreadForecast.DEFAULT_DIRECTIONS);
  }

  /** Default period of the live monitor's questions, s (design value, no source). */
  public static final double DEFAULT_FORECAST_EVERY_S = 30.0;

  public TrimSettings {
    require(minTrim <= 0.0 && minTrim > -1.0, "min_trim must lie in (-100 %, 0 %], got " + minTrim);
    require(maxTrim >= 0.0 && Double.isFinite(maxTrim), "max_trim must be >= 0, got " + maxTrim);
    require(peakLimitK > 0.0 && Double.isFinite(peakLimitK), "peak limit must be a positive temperature in K, got " + peakLimitK);
    require(kSigma >= 0.0 && Double.isFinite(kSigma), "k_sigma must be >= 0, got " + kSigma);
    require(horizonS > 0.0 && Double.isFinite(horizonS), "horizon must be > 0 s, got " + horizonS);
    require(deadbandK >= 0.0 && Double.isFinite(deadbandK), "deadband must be >= 0 K, got " + deadbandK);
    require(minIntervalS >= 0.0 && Double.isFinite(minIntervalS), "minimum interval must be >= 0 s, got " + minIntervalS);
    require(trimStep >= 0.0 && Double.isFinite(trimStep), "trim step must be >= 0, got " + trimStep);
    require(trimTolerance > 0.0 && trimTolerance < 0.01, "trim tolerance must lie in (0, 0.01), got " + trimTolerance);
    require(forecastEveryS > 0.0 && Double.isFinite(forecastEveryS), "forecast_every must be > 0 s, got " + forecastEveryS);
    require(sigmaDirections >= 1, "sigma_directions must be at least 1, got " + sigmaDirections);
  }

  /**
   * Design values of the demo (no source): −15 % … 0 %, 2 σ, 15 min, 3 K deadband, a
   * suggestion at most every 2 min, re-issued only for a change above 0.5 %, trim to 0.05 %,
   * asked every 30 s, spread from at most 6 sigma directions.
   */
  public static TrimSettings defaults(double peakLimitK) {
    return new TrimSettings(-0.15, 0.0, peakLimitK, 2.0, 900.0, 3.0, 120.0, 0.005, 5e-4);
  }

  private static void require(boolean ok, String message) {
    if (!ok) {
      throw new IllegalArgumentException("advisor settings: " + message);
    }
  }
}
