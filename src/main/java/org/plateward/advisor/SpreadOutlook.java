package org.plateward.advisor;

/**
 * The sigma-point forecast for one fuel-flow trim over a horizon: mean and spread of the
 * hidden peak's maximum over the horizon and of the time-to-exhaust, each taken over the sigma
 * points of the present estimate ({@link SpreadForecast}).
 *
 * @param trim relative fuel-flow change, fuel = (1 + trim) fuel_now
 * @param horizonS horizon, s
 * @param points number of sigma points forecast
 * @param peakMeanK weighted mean over the points of max_t T_peak(t), K
 * @param peakSdK weighted standard deviation of the same, K
 * @param peakUpperK peakMean + k · peakSd, K
 * @param exhaustMeanS weighted mean time until the first cell is fully melted, s, each point's
 *     time held at the horizon when it does not melt through within it (a censored mean); +∞
 *     when no point melts through
 * @param exhaustSdS weighted standard deviation of the same censored times, s (NaN when none
 *     melts through)
 * @param exhaustShare weight of the points that melt through within the horizon, 0..1
 * @param centreExhaustS time-to-exhaust of the mean state alone, s (+∞ when not within the
 *     horizon)
 * @param maxCellMeltFraction weighted mean over the points of the highest cell melt fraction
 *     reached, 0..1
 * @param methaneConversion weighted mean reforming methane conversion at the horizon
 */
public record SpreadOutlook(
    double trim,
    double horizonS,
    int points,
    double peakMeanK,
    double peakSdK,
    double peakUpperK,
    double exhaustMeanS,
    double exhaustSdS,
    double exhaustShare,
    double centreExhaustS,
    double maxCellMeltFraction,
    double methaneConversion) {

  /** The same forecast in the form the advisor compares. */
  public TrimOutlook outlook() {
    return new TrimOutlook(trim, peakMeanK, peakUpperK, maxCellMeltFraction, methaneConversion, horizonS, peakSdK);
  }
}
