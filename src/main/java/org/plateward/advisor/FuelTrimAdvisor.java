package org.plateward.advisor;

import java.util.Optional;
import java.util.function.DoubleFunction;
import org.plateward.reactor.OperatingPoint;
import org.apache.commons.math3.analysis.solvers.AllowedSolution;
import org.apache.commons.math3.analysis.solvers.BracketingNthOrderBrentSolver;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.PlateReactorModel;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Suggests the smallest fuel-flow reduction that keeps the forecast peak upper bound below its
 * limit over the horizon. With g(trim) = peakUpper(trim) − limit on [minTrim, 0]:
 * g(0) ≤ 0 → no trim needed; g(minTrim) > 0 → no trim within bounds suffices; otherwise the
 * root of g by Commons Math's bracketing Brent solver, taken on the side where g ≤ 0 (so the
 * returned trim keeps the forecast at or below the limit). The peak rises with the fuel, so the
 * root closest to 0 is the smallest |trim| that suffices.
 *
 * <p>Against flapping: a suggestion is issued at most every {@code minIntervalS}; a new one of
 * the same verdict only when its trim moves by more than {@code trimStep}; and while a trim is
 * in force the limit is lowered by {@code deadbandK} (holding must be clearly safe before the
 * advisor says "no trim needed" again). Advisory only; it never writes to the plant.
 *
 * <p>Two ways to forecast: from a plate state with the present peak's σ carried unchanged
 * ({@link #consider(double, double[], OperatingPoint, ModelParameters, double)}, {@link
 * TrimForecast}), or from the whole posterior with the spread of the forecast peak from sigma
 * points ({@link #consider(double, PosteriorBelief, OperatingPoint)}, {@link SpreadForecast}):
 * there the upper bound is mean + kσ of max_t T_peak(t) over the points, so it grows or shrinks
 * with the spread along the horizon. When the estimate is untrustworthy the caller says so
 * with {@link #holdBack}; no trim is suggested then.
 */
public final class FuelTrimAdvisor {
  private static final Logger LOG = LoggerFactory.getLogger(FuelTrimAdvisor.class);
  private static final int MAX_EVALUATIONS = 40;

  private final TrimSettings settings;
  private final TrimForecast forecast;
  private final SpreadForecast spread;
  private final BracketingNthOrderBrentSolver solver;
  private TrimSuggestion current;

  public FuelTrimAdvisor(PlateReactorModel model, TrimSettings settings) {
    this.settings = settings;
    this.forecast = new TrimForecast(model);
    this.spread = new SpreadForecast(model, settings.sigmaDirections(), SpreadForecast.DEFAULT_TRACE_FRACTION);
    this.solver = new BracketingNthOrderBrentSolver(1e-9, settings.trimTolerance(), 1e-6, 5);
  }

  public TrimSettings settings() {
    return settings;
  }

  /** The last issued suggestion, or null before the first. */
  public TrimSuggestion current() {
    return current;
  }

  /**
   * Considers the present state; issues a new suggestion if the rate limit and hysteresis allow.
   *
   * @param timeS present time, s (monotonic)
   * @param eJPerM2 plate enthalpy per cell, J/m2
   * @param u present inputs
   * @param p present parameters
   * @param peakSdK standard deviation of the present peak estimate, K
   * @return the new suggestion, or empty if the last one stands
   */
  public Optional<TrimSuggestion> consider(
      double timeS, double[] eJPerM2, OperatingPoint u, ModelParameters p, double peakSdK) {
    if (rateLimited(timeS)) {
      return Optional.empty();
    }
    return issue(evaluate(timeS, eJPerM2, u, p, peakSdK));
  }

  /**
   * As {@link #consider(double, double[], OperatingPoint, ModelParameters, double)}, forecasting
   * from the whole posterior with the sigma-point spread ({@link SpreadForecast}).
   *
   * @param timeS present time, s (monotonic)
   * @param belief the soft sensor's posterior (cells and parameters)
   * @param u present inputs
   * @return the new suggestion, or empty if the last one stands
   */
  public Optional<TrimSuggestion> consider(double timeS, PosteriorBelief belief, OperatingPoint u) {
    if (rateLimited(timeS)) {
      return Optional.empty();
    }
    return issue(evaluate(timeS, belief, u));
  }

  /**
   * Holds back: the estimate is untrustworthy, so no trim is suggested. A held-back suggestion
   * is issued at once (not rate-limited: a standing trim must be withdrawn promptly), and again
   * only when the reason changes. When trust returns, the next {@code consider} is not held to
   * the minimum interval.
   *
   * @param timeS present time, s
   * @param reason the estimate's reason, in plain words
   * @return the held-back suggestion, or empty if the same one stands
   */
  public Optional<TrimSuggestion> holdBack(double timeS, String reason) {
    TrimSuggestion s = TrimSuggestion.heldBack(timeS, settings.peakLimitK(), reason);
    if (current != null && current.verdict() == TrimVerdict.HELD_BACK && current.reason().equals(s.reason())) {
      return Optional.empty();
    }
    current = s;
    LOG.info("fuel-trim advice held back at t={} s: {}", timeS, s.reason());
    return Optional.of(s);
  }

  private boolean rateLimited(double timeS) {
    return current != null && current.verdict() != TrimVerdict.HELD_BACK
        && timeS - current.timeS() < settings.minIntervalS();
  }

  private Optional<TrimSuggestion> issue(TrimSuggestion s) {
    if (current != null && s.verdict() == current.verdict()
        && Math.abs(s.trim() - current.trim()) <= settings.trimStep()) {
      return Optional.empty();
    }
    current = s;
    LOG.info("fuel-trim suggestion at t={} s: {} {}", s.timeS(), s.verdict(), s.trim());
    return Optional.of(s);
  }

  /**
   * The suggestion for this state, ignoring the rate limit (the deadband of a trim in force
   * still applies).
   */
  public TrimSuggestion evaluate(
      double timeS, double[] eJPerM2, OperatingPoint u, ModelParameters p, double peakSdK) {
    forecast.setState(eJPerM2, u, p);
    return solve(timeS, t -> forecast.forecast(t, peakSdK, settings.kSigma(), settings.horizonS()));
  }

  /**
   * The suggestion for this posterior with the sigma-point spread, ignoring the rate limit.
   * Cost: one model Jacobian, then 2r + 1 open-loop marches per trim tried.
   */
  public TrimSuggestion evaluate(double timeS, PosteriorBelief belief, OperatingPoint u) {
    spread.setBelief(belief, u);
    return solve(timeS, t -> spread.forecast(t, settings.kSigma(), settings.horizonS()).outlook());
  }

  /** The sigma points of the last spread evaluation (null before one). */
  public SigmaPoints lastSigmaPoints() {
    return spread.sigmaPoints();
  }

  private TrimSuggestion solve(double timeS, DoubleFunction<TrimOutlook> outlook) {
    boolean inForce = current != null
        && (current.verdict() == TrimVerdict.TRIM || current.verdict() == TrimVerdict.NO_TRIM_SUFFICES);
    double limitK = settings.peakLimitK() - (inForce ? settings.deadbandK() : 0.0);
    TrimOutlook hold = outlook.apply(0.0);
    if (hold.peakUpperK() <= limitK) {
      return new TrimSuggestion(timeS, TrimVerdict.NO_TRIM_NEEDED, 0.0, limitK, hold, hold);
    }
    double lo = settings.minTrim();
    TrimOutlook bound = outlook.apply(lo);
    if (lo == 0.0 || bound.peakUpperK() > limitK) {
      return new TrimSuggestion(timeS, TrimVerdict.NO_TRIM_SUFFICES, lo, limitK, hold, bound);
    }
    // g(trim) = peakUpper(trim) - limit, g(lo) <= 0 < g(0); keep the root's g <= 0 side
    double root = solver.solve(MAX_EVALUATIONS, t -> outlook.apply(t).peakUpperK() - limitK,
        lo, 0.0, AllowedSolution.BELOW_SIDE);
    double trim = Math.max(lo, Math.min(0.0, root));
    return new TrimSuggestion(timeS, TrimVerdict.TRIM, trim, limitK, hold, outlook.apply(trim));
  }
}
