package org.plateward.advisor;

import java.util.Optional;
import org.apache.commons.math3.analysis.solvers.AllowedSolution;
import org.apache.commons.math3.analysis.solvers.BracketingNthOrderBrentSolver;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.OperatingPoint;
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
 */
public final class FuelTrimAdvisor {
  private static final Logger LOG = LoggerFactory.getLogger(FuelTrimAdvisor.class);
  private static final int MAX_EVALUATIONS = 40;

  private final TrimSettings settings;
  private final TrimForecast forecast;
  private final BracketingNthOrderBrentSolver solver;
  private TrimSuggestion current;

  public FuelTrimAdvisor(PlateReactorModel model, TrimSettings settings) {
    this.settings = settings;
    this.forecast = new TrimForecast(model);
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
    if (current != null && timeS - current.timeS() < settings.minIntervalS()) {
      return Optional.empty();
    }
    TrimSuggestion s = evaluate(timeS, eJPerM2, u, p, peakSdK);
    if (current != null && s.verdict() == current.verdict()
        && Math.abs(s.trim() - current.trim()) <= settings.trimStep()) {
      return Optional.empty();
    }
    current = s;
    LOG.info("fuel-trim suggestion at t={} s: {} {}", timeS, s.verdict(), s.trim());
    return Optional.of(s);
  }

  /**
   * The suggestion for this state, ignoring the rate limit (the deadband of a trim in force
   * still applies).
   */
  public TrimSuggestion evaluate(
      double timeS, double[] eJPerM2, OperatingPoint u, ModelParameters p, double peakSdK) {
    boolean inForce = current != null && current.verdict() != TrimVerdict.NO_TRIM_NEEDED;
    double limitK = settings.peakLimitK() - (inForce ? settings.deadbandK() : 0.0);
    forecast.setState(eJPerM2, u, p);
    TrimOutlook hold = outlook(0.0, peakSdK);
    if (hold.peakUpperK() <= limitK) {
      return new TrimSuggestion(timeS, TrimVerdict.NO_TRIM_NEEDED, 0.0, limitK, hold, hold);
    }
    double lo = settings.minTrim();
    TrimOutlook bound = outlook(lo, peakSdK);
    if (lo == 0.0 || bound.peakUpperK() > limitK) {
      return new TrimSuggestion(timeS, TrimVerdict.NO_TRIM_SUFFICES, lo, limitK, hold, bound);
    }
    // g(trim) = peakUpper(trim) - limit, g(lo) <= 0 < g(0); keep the root's g <= 0 side
    double root = solver.solve(MAX_EVALUATIONS, t -> outlook(t, peakSdK).peakUpperK() - limitK,
        lo, 0.0, AllowedSolution.BELOW_SIDE);
    double trim = Math.max(lo, Math.min(0.0, root));
    return new TrimSuggestion(timeS, TrimVerdict.TRIM, trim, limitK, hold, outlook(trim, peakSdK));
  }

  private TrimOutlook outlook(double trim, double peakSdK) {
    return forecast.forecast(trim, peakSdK, settings.kSigma(), settings.horizonS());
  }
}
