package org.plateward.calibration;

import java.util.List;
import org.plateward.reactor.ModelParameters;

/**
 * What a calibration found: the fitted parameters with their 95 % confidence intervals and
 * correlations, and per window the measured and fitted outputs (SI) for the residual plots.
 *
 * @param windows the steady windows fitted
 * @param estimates one per {@link FittedParameter}, enum order
 * @param fitted the fitted parameters
 * @param correlation correlation matrix of the (log) parameters, enum order; NaN when singular
 * @param measured window means of the outputs, [window][output], SI (NaN when not measured)
 * @param predicted the model's steady outputs at the fitted parameters, [window][output], SI
 * @param sigmaSi the σ each residual was weighted by, per output, SI
 * @param chiSquare sum of the squared weighted residuals at the optimum
 * @param residuals number of residuals m
 * @param degreesOfFreedom m - 4
 * @param residualVariance chi-square over the degrees of freedom: the factor the covariance was
 *     scaled by
 * @param tQuantile the two-sided 95 % Student-t quantile used for the intervals
 * @param iterations optimiser iterations
 * @param evaluations residual evaluations (each one steady state per window)
 * @param covarianceSingular whether the fit covariance could not be formed
 * @param conditionNumber ratio of the largest to the smallest singular value of the weighted
 *     Jacobian in log-parameter space
 * @param weakestDirection right singular vector of the smallest singular value (which
 *     combination of log parameters the data pin down least), enum order
 */
public record CalibrationResult(
    List<SteadyWindow> windows,
    List<ParameterEstimate> estimates,
    ModelParameters fitted,
    double[][] correlation,
    double[][] measured,
    double[][] predicted,
    double[] sigmaSi,
    double chiSquare,
    int residuals,
    int degreesOfFreedom,
    double residualVariance,
    double tQuantile,
    int iterations,
    int evaluations,
    boolean covarianceSingular,
    double conditionNumber,
    double[] weakestDirection) {

  /** A parameter whose 95 % interval spans more than this factor either way is not identifiable. */
  public static final double IDENTIFIABLE_FACTOR = 2.0;

  public CalibrationResult {
    windows = List.copyOf(windows);
    estimates = List.copyOf(estimates);
  }

  public ParameterEstimate estimate(FittedParameter p) {
    return estimates.get(p.ordinal());
  }

  /** True when every parameter is identifiable. */
  public boolean allIdentifiable() {
    for (ParameterEstimate e : estimates) {
      if (!e.identifiable()) {
        return false;
      }
    }
    return true;
  }
}
