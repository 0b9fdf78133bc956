package org.plateward.softsensor;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.plateward.signals.Signal;

/**
 * Accuracy of a run against simulation truth (twin experiment): peak-temperature error, 2σ
 * coverage overall and inside each upset, melt-fraction errors, mean NEES of the peak and mean
 * NIS against their 95 % χ² bands.
 *
 * <p>Frames before {@code startupS} are not scored. An upset is a stretch where a true input
 * ({@code truth_<input id>}) is away from its value in the first frame (flows by more than 2 %,
 * temperatures by more than 3 K, pressures by more than 2 kPa), extended by 10 minutes for the
 * plate's response. The NEES band: peak errors are correlated over the filter's time constants,
 * so the mean NEES is compared with the χ² band of one independent sample per minute of data
 * (a common practice; the per-frame band would assume thousands of independent samples).
 */
public final class TwinScore {
  private static final double UPSET_TAIL_S = 600.0;
  private static final double DECORRELATION_S = 60.0;
  private static final String PEAK = "truth_peak_plate_temp_c";
  private static final String MELT = "truth_buffer_melt_fraction";
  private static final String MAX_MELT = "truth_max_cell_melt_fraction";
  private static final String TTE = "truth_time_to_exhaust_s";
  private static final Signal[] INPUTS = ReactorSoftSensor.INPUTS;

  private final double startupS;
  private double t0 = Double.NaN;
  private final double[] baseline = new double[INPUTS.length];
  private boolean haveTruth;

  private long scored;
  private double sumSq;
  private double sumErr;
  private double maxErr;
  private double maxErrAtS = Double.NaN;
  private double maxCellMeltErrAtS = Double.NaN;
  private long covered;
  private double neesSum;
  private long neesCount;
  private double maxMeltErr;
  private double maxCellMeltErr;
  private double nisSum;
  private long nisDof;
  private long nisCount;
  /** Inputs that must stay put for a held-input forecast to be scored: the four flows. */
  private static final int[] HELD = ReactorSoftSensor.HELD_FLOWS;
  /** Relative band the true flows must stay in (0.5 %, a tenth of the smallest upset). */
  static final double HELD_TOLERANCE = 0.005;
  private final List<Double> frameTimes = new ArrayList<>();
  private final List<double[]> frameFlows = new ArrayList<>();
  private final List<double[]> tteCandidates = new ArrayList<>();
  private long tteInside2Sd;
  private boolean tteSettled = true;
  private long tteScored;
  private long tteWithin;
  private double tteWorstRel;
  /** Signed relative error (estimate − truth) / truth of each scored frame that had a forecast. */
  private final List<Double> tteSignedRel = new ArrayList<>();

  private double upsetEndS = Double.NaN;
  private Upset current;
  private final List<Upset> upsets = new ArrayList<>();

  /** Coverage inside one upset. */
  public static final class Upset {
    double startS;
    double endS;
    long frames;
    long covered;

    public double startS() {
      return startS;
    }

    public double endS() {
      return endS;
    }

    public long frames() {
      return frames;
    }

    /** Fraction of the upset's scored frames with the truth inside ±2σ. */
    public double coverage() {
      return frames == 0 ? Double.NaN : (double) covered / frames;
    }
  }

  /** @param startupS time after the first frame that is not scored (s) */
  public TwinScore(double startupS) {
    this.startupS = startupS;
  }

  /** Adds one frame. */
  public void add(double tS, Estimate e, Map<String, Double> truth) {
    Double peakC = truth.get(PEAK);
    if (peakC == null || peakC.isNaN()) {
      return;
    }
    haveTruth = true;
    if (Double.isNaN(t0)) {
      t0 = tS;
      for (int i = 0; i < INPUTS.length; i++) {
        baseline[i] = truthInput(truth, i);
      }
    }
    boolean inputAway = false;
    for (int i = 0; i < INPUTS.length; i++) {
      double v = truthInput(truth, i);
      if (Double.isNaN(v) || Double.isNaN(baseline[i])) {
        continue;
      }
      double d = Math.abs(v - baseline[i]);
      String unit = INPUTS[i].unit().name();
      double tol = unit.startsWith("DEG") ? 3.0 : unit.startsWith("KPA") ? 2.0 : 0.02 * Math.abs(baseline[i]);
      inputAway |= d > tol;
    }
    if (inputAway) {
      upsetEndS = tS + UPSET_TAIL_S;
    }
    boolean inUpset = !Double.isNaN(upsetEndS) && tS <= upsetEndS;
    if (tS - t0 < startupS || !Double.isFinite(e.peakPlateTempK())) {
      if (!inUpset) {
        current = null;
      }
      return;
    }
    double err = e.peakPlateTempK() - (peakC + 273.15);
    double sd = e.peakPlateTempSdK();
    scored++;
    sumSq += err * err;
    sumErr += err;
    if (Math.abs(err) > maxErr) {
      maxErr = Math.abs(err);
      maxErrAtS = tS - t0;
    }
    boolean in = Math.abs(err) <= 2.0 * sd;
    if (in) {
      covered++;
    }
    if (sd > 0) {
      neesSum += (err / sd) * (err / sd);
      neesCount++;
    }
    if (inUpset) {
      if (current == null) {
        current = new Upset();
        current.startS = tS - t0;
        upsets.add(current);
      }
      current.endS = tS - t0;
      current.frames++;
      if (in) {
        current.covered++;
      }
    } else {
      current = null;
    }
    Double melt = truth.get(MELT);
    if (melt != null && !melt.isNaN()) {
      maxMeltErr = Math.max(maxMeltErr, Math.abs(e.bufferMeltFraction() - melt));
    }
    Double maxMelt = truth.get(MAX_MELT);
    if (maxMelt != null && !maxMelt.isNaN()) {
      double me = Math.abs(e.maxCellMeltFraction() - maxMelt);
      if (me > maxCellMeltErr) {
        maxCellMeltErr = me;
        maxCellMeltErrAtS = tS - t0;
      }
    }
    if (e.nisDof() > 0 && Double.isFinite(e.nis())) {
      nisSum += e.nis();
      nisDof += e.nisDof();
      nisCount++;
    }
    double[] flows = new double[HELD.length];
    for (int k = 0; k < HELD.length; k++) {
      flows[k] = truthInput(truth, HELD[k]);
    }
    frameTimes.add(tS);
    frameFlows.add(flows);
    Double tte = truth.get(TTE);
    if (tte != null && tte >= 60.0 && tte <= 600.0) {
      tteCandidates.add(new double[] {frameTimes.size() - 1, tte, e.timeToExhaustS(), e.timeToExhaustSdS()});
      tteSettled = false;
    }
  }

  /**
   * Scores the time-to-exhaust forecasts: a forecast holds the present inputs, so a frame is
   * scored only when the true flows stay within {@link #HELD_TOLERANCE} of their present values
   * until the melt-through it forecasts (a forecast before an upset has begun is not scored).
   */
  private void settleExhaust() {
    if (tteSettled) {
      return;
    }
    tteScored = 0;
    tteWithin = 0;
    tteInside2Sd = 0;
    tteWorstRel = 0.0;
    tteSignedRel.clear();
    for (double[] c : tteCandidates) {
      int k = (int) c[0];
      double tte = c[1];
      double est = c[2];
      double endS = frameTimes.get(k) + tte;
      double[] now = frameFlows.get(k);
      boolean held = true;
      for (int m = k; m < frameTimes.size() && frameTimes.get(m) <= endS && held; m++) {
        double[] f = frameFlows.get(m);
        for (int q = 0; q < f.length; q++) {
          if (Math.abs(f[q] - now[q]) > HELD_TOLERANCE * Math.abs(now[q])) {
            held = false;
          }
        }
      }
      if (!held) {
        continue;
      }
      tteScored++;
      double sd = c[3];
      if (Double.isFinite(est) && sd > 0.0 && Math.abs(est - tte) <= 2.0 * sd) {
        tteInside2Sd++;
      }
      double signed = (est - tte) / tte;
      double rel = Double.isFinite(est) ? Math.abs(signed) : Double.POSITIVE_INFINITY;
      tteWorstRel = Math.max(tteWorstRel, rel);
      if (Double.isFinite(est)) {
        tteSignedRel.add(signed);
      }
      if (rel <= 0.1) {
        tteWithin++;
      }
    }
    tteSettled = true;
  }

  private static double truthInput(Map<String, Double> truth, int i) {
    Double v = truth.get("truth_" + INPUTS[i].id());
    return v == null ? Double.NaN : v;
  }

  public boolean hasTruth() {
    return haveTruth;
  }

  public long scoredFrames() {
    return scored;
  }

  /** Time of the largest peak error from the first frame (s). */
  public double peakMaxErrorAtS() {
    return maxErrAtS;
  }

  /** Time of the largest max-cell melt error from the first frame (s). */
  public double maxCellMeltErrorAtS() {
    return maxCellMeltErrAtS;
  }

  /** Mean signed error of the peak (estimate − truth), K: the part of the RMSE that is bias. */
  public double peakBiasK() {
    return scored == 0 ? Double.NaN : sumErr / scored;
  }

  public double peakRmseK() {
    return Math.sqrt(sumSq / Math.max(1, scored));
  }

  public double peakMaxErrorK() {
    return maxErr;
  }

  public double coverage() {
    return (double) covered / Math.max(1, scored);
  }

  public List<Upset> upsets() {
    return List.copyOf(upsets);
  }

  public double maxOverallMeltErrorK() {
    return maxMeltErr;
  }

  public double maxOverallMeltError() {
    return maxMeltErr;
  }

  public double maxCellMeltError() {
    return maxCellMeltErr;
  }

  public double meanNees() {
    return neesSum / Math.max(1, neesCount);
  }

  /** 95 % band of the mean NEES (one dof per sample), with one sample per minute. */
  public double[] neesBand() {
    int k = (int) Math.max(1, Math.round(neesCount / DECORRELATION_S));
    ChiSquaredDistribution c = new ChiSquaredDistribution(k);
    return new double[] {c.inverseCumulativeProbability(0.025) / k, c.inverseCumulativeProbability(0.975) / k};
  }

  /** Mean NIS per degree of freedom over the scored frames' last updates. */
  public double meanNisPerDof() {
    return nisSum / Math.max(1, nisDof);
  }

  /** 95 % band of the mean NIS per dof, one update per block of frames counted once per minute. */
  public double[] nisBand() {
    long k = Math.max(1, Math.round(nisDof / DECORRELATION_S));
    ChiSquaredDistribution c = new ChiSquaredDistribution(k);
    return new double[] {c.inverseCumulativeProbability(0.025) / k, c.inverseCumulativeProbability(0.975) / k};
  }

  /** Frames with a true time-to-exhaust of 60–600 s. */
  public long exhaustFrames() {
    settleExhaust();
    return tteScored;
  }

  /** Fraction of those where the estimate is within 10 % of the truth. */
  public double exhaustWithin10Pct() {
    settleExhaust();
    return tteScored == 0 ? Double.NaN : (double) tteWithin / tteScored;
  }

  /** Fraction of those where the truth lies within ±2σ of the forecast (its stated spread). */
  public double exhaustInside2Sd() {
    settleExhaust();
    return tteScored == 0 ? Double.NaN : (double) tteInside2Sd / tteScored;
  }

  /**
   * Median signed relative time-to-exhaust error over those frames (positive: the forecast
   * melts through later than the plant), NaN if none had a forecast: a bias shows here, where
   * the within-10 % share mixes bias and spread.
   */
  public double exhaustMedianSignedRelError() {
    settleExhaust();
    if (tteSignedRel.isEmpty()) {
      return Double.NaN;
    }
    return new org.apache.commons.math3.stat.descriptive.rank.Median()
        .evaluate(tteSignedRel.stream().mapToDouble(Double::doubleValue).toArray());
  }

  /** Worst relative time-to-exhaust error over those frames. */
  public double exhaustWorstRelError() {
    settleExhaust();
    return tteWorstRel;
  }

  /** A multi-line summary. */
  public String summary() {
    StringBuilder sb = new StringBuilder();
    double[] nb = neesBand();
    double[] ib = nisBand();
    sb.append(String.format(Locale.ROOT, "accuracy against simulation truth (after %.0f min start-up, %d frames):%n",
        startupS / 60.0, scored));
    sb.append(String.format(Locale.ROOT, "  peak plate temperature  RMSE %.2f K (mean error %+.2f K), max error %.2f K (at %.0f s)%n",
        peakRmseK(), peakBiasK(), peakMaxErrorK(), maxErrAtS));
    sb.append(String.format(Locale.ROOT, "  2-sigma coverage        %.1f %% overall%n", 100 * coverage()));
    for (Upset u : upsets) {
      sb.append(String.format(Locale.ROOT, "    upset %5.0f-%5.0f s   %.1f %% of %d frames%n", u.startS, u.endS, 100 * u.coverage(), u.frames));
    }
    sb.append(String.format(Locale.ROOT, "  max-cell melt fraction  max error %.3f (at %.0f s)%n", maxCellMeltErr, maxCellMeltErrAtS));
    sb.append(String.format(Locale.ROOT, "  overall melt fraction   max error %.4f%n", maxMeltErr));
    sb.append(String.format(Locale.ROOT, "  mean NEES (peak)        %.2f, 95%% band [%.2f, %.2f]%n", meanNees(), nb[0], nb[1]));
    sb.append(String.format(Locale.ROOT, "  mean NIS per dof        %.2f, 95%% band [%.2f, %.2f]%n", meanNisPerDof(), ib[0], ib[1]));
    settleExhaust();
    if (!tteCandidates.isEmpty()) {
      sb.append(String.format(Locale.ROOT,
          "  time-to-exhaust (truth 60-600 s, flows held until then): %.1f %% of %d frames within 10 %%, worst %.0f %%,"
              + " median error %+.0f %%, truth within its ±2σ in %.1f %% (%d frames with the flows still moving not scored)%n",
          100 * exhaustWithin10Pct(), tteScored, 100 * tteWorstRel, 100 * exhaustMedianSignedRelError(), 100 * exhaustInside2Sd(),
          tteCandidates.size() - tteScored));
    }
    return sb.toString();
  }
}
