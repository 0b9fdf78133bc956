package org.plateward.calibration;

/**
 * One fitted parameter with its uncertainty, SI.
 *
 * @param parameter which parameter
 * @param start the value the fit started from
 * @param value the fitted value
 * @param sd its standard deviation (delta method: value times the σ of its logarithm)
 * @param ciLow lower end of the 95 % confidence interval
 * @param ciHigh upper end of the 95 % confidence interval
 * @param identifiable false when the windows do not pin the parameter down (singular
 *     covariance, or an interval wider than a factor {@value CalibrationResult#IDENTIFIABLE_FACTOR}
 *     either way)
 */
public record ParameterEstimate(
    FittedParameter parameter, double start, double value, double sd, double ciLow, double ciHigh,
    boolean identifiable) {

  /** True when the 95 % interval holds {@code x}. */
  public boolean covers(double x) {
    return x >= ciLow && x <= ciHigh;
  }
}
