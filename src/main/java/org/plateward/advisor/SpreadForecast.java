package org.plateward.advisor;

import org.plateward.reactor.Grid;
import org.plateward.reactor.HiddenPeak;
import org.plateward.reactor.ModelEvaluation;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.OperatingPoint;
import org.plateward.reactor.PlateEnthalpy;
import org.plateward.reactor.PlateReactorModel;
import org.plateward.softsensor.ExhaustForecast;
import org.plateward.thermo.Species;

/**
 * Forecast with spread from sigma points (the unscented transform, {@link SigmaPoints}): the
 * present posterior ({@link PosteriorBelief}) is represented by a reduced symmetric set along
 * the dominant eigen-directions of the correlation matrix of the cell enthalpies and the four
 * parameters; each point is marched open loop over the horizon with the inputs held (fuel
 * scaled by 1 + trim) and its own parameters, and the peak maximum, time-to-exhaust, melt and
 * conversion of the points are combined with the UT weights.
 *
 * <p>Why the reduced set: the cell block is strongly correlated along the plate (the filter's
 * prior is a shared offset, and the plate-end thermocouples and outlet temperatures inform
 * smooth profile modes), so a few directions carry most of the spread, while the full set would
 * need 2·64 + 1 = 129 marches per trim. The correlation matrix is decomposed, not P, because
 * the entries carry different units. {@link SigmaPoints#capturedVarianceMin()} reports what the
 * truncation drops.
 *
 * <p>Stepping: the linearly implicit steps of {@link ExhaustForecast#march}, with one model
 * Jacobian taken at the mean state and untrimmed inputs and re-used for every point and trim
 * (column-rescaled to each point's dT/de by the stepper). Not thread-safe.
 */
public final class SpreadForecast {
  /** Default most directions: 2·6 + 1 = 13 marches per trim. */
  public static final int DEFAULT_DIRECTIONS = 6;
  /** Default share of the correlation trace to capture. */
  public static final double DEFAULT_TRACE_FRACTION = 0.99;

  private final PlateReactorModel model;
  private final ExhaustForecast stepper;
  private final ModelEvaluation ev;
  private final int n;
  private final int maxDirections;
  private final double traceFraction;
  private SigmaPoints sigma;
  private double[][] plates;
  private ModelParameters[] params;
  private OperatingPoint u0;

  /**
   * @param model the plate model on the soft sensor's grid
   * @param maxDirections most sigma directions r (2r + 1 marches per trim), ≥ 1
   * @param traceFraction stop adding directions once this share of the correlation trace is
   *     captured, in (0, 1]
   */
  public SpreadForecast(PlateReactorModel model, int maxDirections, double traceFraction) {
    this.model = model;
    this.stepper = new ExhaustForecast(model, ExhaustForecast.ADVISOR_MAX_STEP_K);
    this.ev = model.newEvaluation();
    this.n = model.cells();
    this.maxDirections = maxDirections;
    this.traceFraction = traceFraction;
  }

  /** With {@link #DEFAULT_DIRECTIONS} and {@link #DEFAULT_TRACE_FRACTION}. */
  public SpreadForecast(PlateReactorModel model) {
    this(model, DEFAULT_DIRECTIONS, DEFAULT_TRACE_FRACTION);
  }

  /**
   * Sets the belief to forecast from: draws the sigma points and builds one Jacobian at the mean.
   *
   * @param belief the posterior (its cells must match the model's)
   * @param u present inputs (untrimmed)
   */
  public void setBelief(PosteriorBelief belief, OperatingPoint u) {
    if (belief.cells() != n) {
      throw new IllegalArgumentException("belief has " + belief.cells() + " cells, the model " + n);
    }
    setPoints(SigmaPoints.dominant(belief.mean(), belief.covariance(), maxDirections, traceFraction, Double.NaN),
        belief, u);
  }

  /** As {@link #setBelief} with a given set of points (the full set, say) in the belief's space. */
  public void setPoints(SigmaPoints points, PosteriorBelief belief, OperatingPoint u) {
    sigma = points;
    plates = new double[points.size()][];
    params = new ModelParameters[points.size()];
    for (int i = 0; i < points.size(); i++) {
      PosteriorPlate pl = belief.plateAt(points.point(i));
      plates[i] = pl.enthalpyJPerM2();
      params[i] = pl.parameters();
    }
    u0 = u;
    PosteriorPlate mean = belief.meanPlate();
    meanE = mean.enthalpyJPerM2();
    meanP = mean.parameters();
    jacobianTrim = Double.NaN;
  }

  private double[] meanE;
  private ModelParameters meanP;
  /** Trim the stepper's Jacobian was taken at (NaN: none yet). */
  private double jacobianTrim = Double.NaN;

  /**
   * The marches' Jacobian at the mean state with the trimmed inputs: one at the held inputs,
   * reused for a trim, let the linearly implicit steps run away once the trim moved the
   * combustion front (at the fuel surge's melt-through a 5 % trim forecast a peak 140 K above
   * holding).
   */
  private void jacobianFor(double trim, OperatingPoint u) {
    if (trim == jacobianTrim) {
      return;
    }
    double[][] j = new double[n][n];
    model.evaluate(meanE, u, meanP, ev);
    model.jacobian(meanE, u, meanP, ev, j, null);
    stepper.setJacobian(j, meanE);
    jacobianTrim = trim;
  }

  /** The sigma points of the last {@link #setBelief}. */
  public SigmaPoints sigmaPoints() {
    return sigma;
  }

  /**
   * The forecast for one trim from the belief of the last {@link #setBelief}.
   *
   * @param trim relative fuel-flow change (−0.05 = 5 % less fuel), above −1
   * @param kSigma k of the upper bound mean + k σ
   * @param horizonS horizon, s
   */
  public SpreadOutlook forecast(double trim, double kSigma, double horizonS) {
    if (sigma == null) {
      throw new IllegalStateException("setBelief first");
    }
    if (!(trim > -1.0) || !Double.isFinite(trim)) {
      throw new IllegalArgumentException("trim must be finite and above -1 (no negative fuel), got " + trim);
    }
    OperatingPoint u = TrimForecast.trimmed(u0, trim);
    jacobianFor(trim, u);
    int m = sigma.size();
    double[] peak = new double[m];
    double[] tte = new double[m];
    double[] melt = new double[m];
    double[] conv = new double[m];
    double share = 0.0;
    for (int i = 0; i < m; i++) {
      march(i, u, horizonS, peak, tte, melt, conv);
      if (Double.isFinite(tte[i])) {
        share += sigma.weight(i);
      }
    }
    double peakMean = sigma.mean(peak);
    double peakSd = Math.sqrt(Math.max(sigma.variance(peak), 0.0));
    double exMean = Double.POSITIVE_INFINITY;
    double exSd = Double.NaN;
    double centre = tte[0];
    boolean any = false;
    double[] censored = new double[m];
    for (int i = 0; i < m; i++) {
      any |= Double.isFinite(tte[i]);
      censored[i] = Math.min(tte[i], horizonS); // a point that does not melt through counts as the horizon
    }
    if (any) {
      exMean = sigma.mean(censored);
      exSd = Math.sqrt(Math.max(sigma.variance(censored), 0.0));
    }
    return new SpreadOutlook(trim, horizonS, m, peakMean, peakSd, peakMean + kSigma * peakSd, exMean, exSd,
        Math.min(1.0, share), centre, sigma.mean(melt), sigma.mean(conv));
  }

  private void march(int i, OperatingPoint u, double horizonS, double[] peak, double[] tte, double[] melt,
      double[] conv) {
    PlateEnthalpy plate = model.plate();
    Grid grid = model.grid();
    double meltEnd = plate.meltEndJPerM2();
    double[] tK = new double[n];
    double[] prev = plates[i].clone();
    double[] prevT = {0.0};
    double[] pk = {Double.NEGATIVE_INFINITY};
    double[] mx = {0.0};
    double[] first = {Double.POSITIVE_INFINITY};
    for (double e : prev) {
      if (e >= meltEnd) {
        first[0] = 0.0;
      }
    }
    double[] end = stepper.march(plates[i], u, params[i], horizonS, (t, e) -> {
      double crossing = Double.POSITIVE_INFINITY;
      for (int j = 0; j < n; j++) {
        tK[j] = plate.tempK(e[j]);
        mx[0] = Math.max(mx[0], plate.meltFraction(e[j]));
        if (first[0] == Double.POSITIVE_INFINITY && e[j] >= meltEnd) {
          // linear crossing inside the step: t_prev + (e_end − e_prev) / (e − e_prev) · h
          double frac = e[j] > prev[j] ? (meltEnd - prev[j]) / (e[j] - prev[j]) : 1.0;
          crossing = Math.min(crossing, prevT[0] + Math.max(0.0, Math.min(1.0, frac)) * (t - prevT[0]));
        }
      }
      if (crossing < first[0]) {
        first[0] = crossing; // the earliest of the cells that crossed in this step
      }
      pk[0] = Math.max(pk[0], HiddenPeak.of(grid, tK).tempK());
      System.arraycopy(e, 0, prev, 0, n);
      prevT[0] = t;
    });
    model.evaluate(end, u, params[i], ev);
    int ch4 = Species.CH4.ordinal();
    peak[i] = pk[0];
    tte[i] = first[0];
    melt[i] = mx[0];
    conv[i] = 1.0 - ev.reformingFlowMolPerS(n, ch4) / ev.reformingFlowMolPerS(0, ch4);
  }
}
