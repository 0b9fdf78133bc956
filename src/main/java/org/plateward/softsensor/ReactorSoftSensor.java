package org.plateward.softsensor;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.plateward.estimation.ChannelStatus;
import org.plateward.estimation.DriftAlarm;
import org.plateward.estimation.ExtendedKalmanFilter;
import org.plateward.estimation.FilterSettings;
import org.plateward.estimation.LinearMeasurement;
import org.plateward.estimation.MeasurementModel;
import org.plateward.estimation.StepResult;
import org.plateward.reactor.Grid;
import org.plateward.reactor.HiddenPeak;
import org.plateward.reactor.ModelEvaluation;
import org.plateward.reactor.ModelOutputs;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.OperatingPoint;
import org.plateward.reactor.PlateEnthalpy;
import org.plateward.reactor.PlateReactorModel;
import org.plateward.reactor.SteadyStateSolver;
import org.plateward.reactor.SteadySummary;
import org.plateward.reactor.UnitSpec;
import org.plateward.signals.Frame;
import org.plateward.signals.Signal;

/**
 * The reactor soft sensor: frames in, one {@link Estimate} per frame out. See the package
 * documentation for the state vector, the noise reasoning and the timing. Not thread-safe.
 */
public final class ReactorSoftSensor {
  /** Inputs in {@link OperatingPoint} order. */
  static final Signal[] INPUTS = {
    Signal.REF_GAS_FLOW, Signal.REF_STEAM_FLOW, Signal.REF_INLET_TEMP, Signal.REF_PRESSURE,
    Signal.FUEL_FLOW, Signal.AIR_FLOW, Signal.COMB_INLET_TEMP, Signal.COMB_PRESSURE
  };
  /** Frame-rate measurements in lag order. */
  static final Signal[] FAST = {
    Signal.REF_OUTLET_TEMP, Signal.COMB_OUTLET_TEMP, Signal.PLATE_END_TEMP_REF_INLET,
    Signal.PLATE_END_TEMP_REF_OUTLET
  };
  /** Analyzer channels in clone order. */
  static final Signal[] ANALYZER = {
    Signal.REF_OUTLET_CH4, Signal.REF_OUTLET_CO, Signal.REF_OUTLET_CO2, Signal.REF_OUTLET_H2,
    Signal.COMB_OUTLET_O2
  };
  private static final int SLOTS = 2;
  /** The time-to-exhaust forecast runs while the peak is within this of the melting point (K). */
  static final double NEAR_MELT_K = 25.0;
  /** Window of the observability diagnostic (s): ten minutes, the settling time of the plate. */
  static final double OBSERVABILITY_WINDOW_S = 600.0;
  /**
   * Uniform plate temperature the start's steady solve begins from (K): hot enough for the lit
   * branch, and 158 K below the melting band. From the 1250 K of {@link SteadySummary#HOT_START_K}
   * Newton's first steps crossed into the band, where dT/de is 60 times smaller, and stalled:
   * with the reaction sub-steps the fuel surge's first three frames failed to start (840
   * iterations each, most of that replay's time); from 1200 K all four recordings start in
   * 11 to 13 Newton iterations.
   */
  static final double START_K = 1200.0;
  /** Step of the diagnostic's open-loop covariance (s): ten per window ({@link ExtendedKalmanFilter#openLoopStepS}). */
  static final double OPEN_LOOP_STEP_S = 60.0;
  /** Sub-step near the melting band (s), and how near counts (K of sensible heat). */
  static final double BAND_SUBSTEP_S = 2.5;
  static final double BAND_MARGIN_K = 5.0;

  private final UnitSpec spec;
  private final SoftSensorSettings settings;
  private final FilterSettings filterSettings;
  private final PlateReactorModel model;
  private final Grid grid;
  private final PlateEnthalpy plate;
  private final StateLayout layout;
  private final ReactorDynamics dynamics;
  private final int cells;
  private final int n;
  private final double capacity;
  private final LinearMeasurement fastModel;
  private final LinearMeasurement[] cloneModels = new LinearMeasurement[SLOTS];
  private final MeasurementModel analyzerModel;
  private final ExhaustForecast forecast;
  private final ObservabilityDiagnostic observability;

  private ExtendedKalmanFilter ekf;
  private double t0S = Double.NaN;
  private double lastEpochS = Double.NaN;
  private final double[] lastGoodInput = new double[8];
  /** Window of the held inputs of every forecast (s): see {@link RecentInputs}. */
  static final double HELD_INPUT_WINDOW_S = 30.0;
  private final RecentInputs recentInputs = new RecentInputs(8, HELD_INPUT_WINDOW_S, 256);
  private final boolean[] haveInput = new boolean[8];

  // block accumulators
  private final double[] inSum = new double[8];
  private final int[] inCount = new int[8];
  private final double[] fastSum = new double[4];
  private final int[] fastCount = new int[4];
  private final List<double[]> publications = new ArrayList<>();
  private final List<boolean[]> publicationMasks = new ArrayList<>();
  private final List<Double> publicationTimes = new ArrayList<>();

  // analyzer cloning
  private double analyzerPhaseS = Double.NaN;
  private double nextSampleS = Double.NaN;
  private final double[] slotSampleS = new double[SLOTS];
  private double lastAnalyzerUpdateS = Double.NaN;

  // health
  private final boolean[] excluded = new boolean[4];
  private final String[] exclusionReason = new String[4];
  private final List<DriftAlarm> driftFlags = new ArrayList<>();
  private final BiasRateMonitor[] biasMonitors = new BiasRateMonitor[2];
  private long repairsSeen;
  private ChannelStatus[] lastFastStatus;
  private double lastNis = Double.NaN;
  private int lastNisDof;
  private String blockReason = "";
  private EstimatorStatus blockStatus = EstimatorStatus.OK;

  // derived-quantity state
  private Estimate last;
  /** Plate temperature rate of each cell over the last propagation, K/s (for frames inside a block). */
  private double[] rate;
  private double[] prevPosterior;
  private double tteS = Double.POSITIVE_INFINITY;
  private double tteSdS = Double.NaN;
  private double tteAtS = Double.NaN;
  /** Held inputs of the last time-to-exhaust forecast (null before one). */
  private double[] tteHeld;
  /**
   * A held flow that moved by more than this since the last forecast brings the next one
   * forward (relative): near melt-through 0.25 % of fuel moves the forecast by some 15 %, and a
   * forecast taken inside a ramp otherwise stood for the full {@code forecast_every}.
   */
  static final double HELD_FLOW_MOVE = 0.0025;
  /** The four flows among {@link #INPUTS}: reforming gas, steam, fuel, air. */
  static final int[] HELD_FLOWS = {0, 1, 4, 5};
  private long blocks;
  private long droppedAnalyzer;
  private long heldInputBlocks;
  private long startFailures;
  private final ModelEvaluation ev;

  /**
   * @param spec the unit (its grid is the estimator's grid)
   * @param settings soft sensor tuning
   * @param filterSettings generic filter tuning; its sub-step is set to the block length
   */
  public ReactorSoftSensor(UnitSpec spec, SoftSensorSettings settings, FilterSettings filterSettings) {
    this.spec = spec;
    this.settings = settings;
    this.filterSettings = filterSettings.withMaxSubstepS(settings.blockS()).withHistoryLength(2);
    this.model = new PlateReactorModel(spec);
    this.grid = model.grid();
    this.plate = model.plate();
    this.cells = model.cells();
    this.layout = new StateLayout(cells, SLOTS);
    this.n = layout.size();
    this.dynamics = new ReactorDynamics(model, layout, settings.lagS(), settings.jacobianRefreshS(),
        settings.jacobianRefreshK(), settings.inputBiasTimeS());
    this.capacity = dynamics.capacityJPerM2K();
    this.ev = model.newEvaluation();
    double[][] h = new double[4][n];
    for (int k = 0; k < 4; k++) {
      h[k][layout.lag(k)] = 1.0;
    }
    h[2][layout.bias(0)] = 1.0;
    h[3][layout.bias(1)] = 1.0;
    fastModel = new LinearMeasurement(h);
    for (int s = 0; s < SLOTS; s++) {
      double[][] hc = new double[StateLayout.ANALYZER_CHANNELS][n];
      for (int c = 0; c < StateLayout.ANALYZER_CHANNELS; c++) {
        hc[c][layout.clone(s) + c] = 1.0;
      }
      cloneModels[s] = new LinearMeasurement(hc);
    }
    analyzerModel = new AnalyzerPrediction();
    forecast = new ExhaustForecast(model);
    observability = new ObservabilityDiagnostic(layout, OBSERVABILITY_WINDOW_S);
    Arrays.fill(slotSampleS, Double.NaN);
    for (int end = 0; end < 2; end++) {
      biasMonitors[end] = new BiasRateMonitor(settings.driftWindowS(), settings.biasDriftKPerHour(), 4.0);
    }
  }

  /** The augmented state layout. */
  public StateLayout layout() {
    return layout;
  }

  /** The model on the estimator's grid. */
  public PlateReactorModel model() {
    return model;
  }

  /** Present state estimate (copy), or null before the start. */
  public double[] state() {
    return ekf == null ? null : ekf.state();
  }

  /** Present covariance (copy), or null before the start. */
  public double[][] covariance() {
    return ekf == null ? null : ekf.covariance();
  }

  /**
   * Plate temperature of each cell from the present state estimate, K (posterior mean mapped
   * through the enthalpy-temperature relation), or null before the start.
   */
  public double[] cellTempK() {
    if (ekf == null) {
      return null;
    }
    double[] x = ekf.state();
    double[] tK = new double[cells];
    for (int j = 0; j < cells; j++) {
      tK[j] = plate.tempK(x[j] * capacity);
    }
    return tK;
  }

  /** Number of filter steps (blocks) so far. */
  public long blocks() {
    return blocks;
  }

  /** Number of model Jacobian builds so far. */
  public long jacobianBuilds() {
    return dynamics.builds();
  }

  /** Analyzer results that could not be placed at their sample time (no clone). */
  public long droppedAnalyzerResults() {
    return droppedAnalyzer;
  }

  /**
   * Drift flags raised so far (channel index into the frame-rate set: 0..3; {@code raisedAtTimeS}
   * in epoch seconds).
   */
  public List<DriftAlarm> driftFlags() {
    return List.copyOf(driftFlags);
  }

  /**
   * What the last filter step did with each frame-rate channel (0 reformed gas outlet, 1 flue
   * gas outlet, 2 plate end z = 0, 3 plate end z = L): used, missing or gated (copy); null
   * before the first step.
   */
  public ChannelStatus[] lastFastChannelStatus() {
    return lastFastStatus == null ? null : lastFastStatus.clone();
  }

  /** Whether frame-rate channel k (0 reformed gas outlet .. 3 plate end z = L) was excluded. */
  public boolean excluded(int k) {
    return excluded[k];
  }

  /**
   * Takes one frame and returns its estimate. Frames must come in time order.
   *
   * @param frame the measurements
   * @return the estimate for this frame
   */
  public Estimate accept(Frame frame) {
    double tS = seconds(frame.time());
    for (int i = 0; i < 8; i++) {
      if (frame.usable(INPUTS[i])) {
        double v = frame.valueSi(INPUTS[i]);
        lastGoodInput[i] = v;
        recentInputs.add(i, tS, v);
        haveInput[i] = true;
        inSum[i] += v;
        inCount[i]++;
      }
    }
    if (ekf == null) {
      if (!allInputs()) {
        clearBlock();
        return waiting(frame.time());
      }
      try {
        start(tS);
      } catch (org.plateward.reactor.SteadyStateSolver.NotConvergedException ex) {
        // in the middle of an upset the inputs may have no steady state near the hot start:
        // wait for a frame whose inputs do
        clearBlock();
        startFailures++;
        return waiting(frame.time(), "waiting for inputs with a steady state to start from (" + ex.getMessage() + ")");
      }
      clearBlock();
      last = derive(frame.time(), EstimatorStatus.DEGRADED, "starting: steady state at the first inputs");
      return last;
    }
    for (int k = 0; k < 4; k++) {
      if (frame.usable(FAST[k])) {
        fastSum[k] += frame.valueSi(FAST[k]);
        fastCount[k]++;
      }
    }
    boolean any = false;
    double[] z = new double[5];
    boolean[] mask = new boolean[5];
    for (int c = 0; c < 5; c++) {
      if (frame.usable(ANALYZER[c])) {
        z[c] = frame.valueSi(ANALYZER[c]) * 100.0;
        mask[c] = true;
        any = true;
      } else {
        z[c] = Double.NaN;
      }
    }
    if (any) {
      publications.add(z);
      publicationMasks.add(mask);
      publicationTimes.add(tS);
    }
    if (tS - lastEpochS >= settings.blockS() - 1e-6) {
      step(tS);
      last = derive(frame.time(), blockStatus, blockReason);
      return last;
    }
    return extrapolated(frame.time(), tS);
  }

  private boolean allInputs() {
    for (boolean b : haveInput) {
      if (!b) {
        return false;
      }
    }
    return true;
  }

  private Estimate waiting(Instant time) {
    return waiting(time, "waiting for every input to have a usable value");
  }

  private Estimate waiting(Instant time, String why) {
    double nan = Double.NaN;
    return new Estimate(time, nan, nan, nan, nan, nan, nan, nan, nan, nan, nan, 0,
        EstimatorStatus.UNTRUSTWORTHY, why,
        nan, nan, nan, nan, nan, nan, nan, nan, nan, nan, new double[0], new double[0], new double[0],
        java.util.Map.of());
  }

  private static double seconds(Instant t) {
    return t.getEpochSecond() + 1e-9 * t.getNano();
  }

  private void start(double tS) {
    double[] u = lastGoodInput.clone();
    ModelParameters p = ModelParameters.nominal(spec).withHeatTransferMultiplier(settings.heatTransferPrior());
    double[] e = new double[cells];
    model.uniformState(START_K, e);
    e = new SteadyStateSolver(model).solve(ReactorDynamics.operatingPoint(u), p, e).enthalpyJPerM2();
    double[] x = new double[n];
    for (int j = 0; j < cells; j++) {
      x[j] = e[j] / capacity;
    }
    x[layout.reformingActivity()] = p.reformingActivity();
    x[layout.combustionActivity()] = p.combustionActivity();
    x[layout.heatLoss()] = p.heatLossCoefficientWPerM2K();
    x[layout.heatTransfer()] = p.heatTransferMultiplier();
    dynamics.evaluateModel(x, u, ev);
    int[] lagOut = {ModelOutputs.REF_OUTLET_TEMP_K, ModelOutputs.COMB_OUTLET_TEMP_K,
        ModelOutputs.PLATE_END_INLET_K, ModelOutputs.PLATE_END_OUTLET_K};
    for (int k = 0; k < 4; k++) {
      x[layout.lag(k)] = ev.output(lagOut[k]);
    }
    double[][] p0 = new double[n][n];
    // initial uncertainty: the steady state at nominal parameters is a guess within about 10 K
    // per cell, strongly correlated along the plate (a shared offset), 5 K independent
    for (int i = 0; i < cells; i++) {
      for (int j = 0; j < cells; j++) {
        double corr = Math.exp(-Math.abs(grid.centreM(i) - grid.centreM(j)) / 0.1);
        p0[i][j] = 100.0 * corr + (i == j ? 25.0 : 0.0);
      }
    }
    p0[layout.reformingActivity()][layout.reformingActivity()] = sq(0.15 * p.reformingActivity());
    p0[layout.combustionActivity()][layout.combustionActivity()] = sq(0.15 * p.combustionActivity());
    p0[layout.heatLoss()][layout.heatLoss()] = sq(0.5 * p.heatLossCoefficientWPerM2K());
    p0[layout.heatTransfer()][layout.heatTransfer()] = sq(settings.heatTransferPriorSd());
    p0[layout.bias(0)][layout.bias(0)] = sq(3.0);
    p0[layout.bias(1)][layout.bias(1)] = sq(3.0);
    for (int k = 0; k < 4; k++) {
      p0[layout.lag(k)][layout.lag(k)] = sq(5.0);
    }
    for (int q = 0; q < StateLayout.INPUT_ERRORS; q++) {
      int b = layout.inputError(q);
      p0[b][b] = sq(inputErrorSd(StateLayout.ERROR_INPUTS[q]));
    }
    for (int s = 0; s < SLOTS; s++) {
      for (int c = 0; c < 5; c++) {
        p0[layout.clone(s) + c][layout.clone(s) + c] = 1.0;
      }
    }
    ekf = new ExtendedKalmanFilter(dynamics, processNoise(x, u, p), filterSettings, tS, x, p0);
    ekf.openLoopStepS(OPEN_LOOP_STEP_S);
    t0S = tS;
    lastEpochS = tS;
    prevPosterior = x.clone();
    rate = new double[n];
  }

  /**
   * Q (state units²/s): input uncertainty mapped through the model, B Σ Bᵀ, with Σ the
   * spectral density of white input noise sampled once per second (σ² · 1 s) for the four
   * flows and two inlet temperatures; plus a structural floor per cell, random walks for the
   * parameters and thermocouple biases. Clone and lag states have none.
   */
  private double[][] processNoise(double[] x, double[] u, ModelParameters p) {
    double[][] q = new double[n][n];
    int[] in = {0, 1, 2, 4, 5, 6};
    double[][] b = dynamics.inputJacobian(x, u, in);
    for (int a = 0; a < in.length; a++) {
      int i = in[a];
      double sd = StateLayout.temperatureInput(i) ? settings.inputTempNoiseK() : settings.inputNoiseRelative() * Math.abs(u[i]);
      // white meter noise sampled at 1 s: σ²·1 s (the systematic part is a state of its own)
      double density = sd * sd * 1.0;
      for (int r = 0; r < cells; r++) {
        for (int c = 0; c < cells; c++) {
          q[r][c] += b[a][r] * b[a][c] * density;
        }
      }
    }
    for (int j = 0; j < cells; j++) {
      q[j][j] += settings.cellNoiseK2PerS();
    }
    q[layout.reformingActivity()][layout.reformingActivity()] =
        sq(settings.activityDriftPerHour() * p.reformingActivity()) / 3600.0;
    q[layout.combustionActivity()][layout.combustionActivity()] =
        sq(settings.activityDriftPerHour() * p.combustionActivity()) / 3600.0;
    q[layout.heatLoss()][layout.heatLoss()] =
        sq(settings.heatLossDriftPerHour() * p.heatLossCoefficientWPerM2K()) / 3600.0;
    q[layout.heatTransfer()][layout.heatTransfer()] = sq(settings.heatTransferDriftPerHour()) / 3600.0;
    for (int end = 0; end < 2; end++) {
      q[layout.bias(end)][layout.bias(end)] = sq(settings.biasDriftKPerHour()) / 3600.0;
    }
    // first-order Gauss-Markov input errors: db/dt = -b/τ + w keeps var σ² with density 2σ²/τ
    for (int k = 0; k < StateLayout.INPUT_ERRORS; k++) {
      int be = layout.inputError(k);
      q[be][be] = 2.0 * sq(inputErrorSd(StateLayout.ERROR_INPUTS[k])) / settings.inputBiasTimeS();
    }
    return q;
  }

  /** Stationary σ of the systematic error of input i: relative for flows, K for temperatures. */
  private double inputErrorSd(int i) {
    return StateLayout.temperatureInput(i) ? settings.inputBiasTempK() : settings.inputBiasRelative();
  }

  private static double sq(double v) {
    return v * v;
  }

  private void step(double tS) {
    blocks++;
    EstimatorStatus status = EstimatorStatus.OK;
    StringBuilder reason = new StringBuilder();
    double[] u = new double[8];
    for (int i = 0; i < 8; i++) {
      if (inCount[i] > 0) {
        u[i] = inSum[i] / inCount[i];
      } else {
        u[i] = lastGoodInput[i];
        status = EstimatorStatus.DEGRADED;
        append(reason, INPUTS[i].id() + " missing or Bad: last good value held");
      }
    }
    if (status == EstimatorStatus.DEGRADED) {
      heldInputBlocks++;
    }
    double dt = tS - lastEpochS;
    double[] before = ekf.state();
    // near the melting band T(e) has kinks that one 5 s linearly implicit step can jump across
    // (a cell then overshoots by tens of kelvin for one block): there, 2.5 s sub-steps
    int sub = nearBand(before) ? Math.max(1, (int) Math.ceil(dt / BAND_SUBSTEP_S - 1e-9)) : 1;
    dynamics.stepLengthS(Math.min(dt, settings.blockS()) / sub);
    // the Jacobian linearises T(e) over each cell's spread, not at its mean (ReactorDynamics.cellSpread)
    dynamics.cellSpread(cellSd());
    long buildsBefore = dynamics.builds();
    for (int k = 0; k < sub; k++) {
      ekf.propagate(u, dt / sub);
    }
    double[] prior = ekf.state();
    if (dynamics.builds() != buildsBefore) {
      ekf.setProcessNoiseDensity(processNoise(prior, u, dynamics.parameters(prior)));
    }
    // the plate-temperature rate of the propagation, K/s (not the enthalpy rate: extrapolating
    // enthalpy across the kinks of T(e) at the band edges overshoots by tens of kelvin)
    for (int j = 0; j < cells; j++) {
      rate[j] = (plate.tempK(prior[j] * capacity) - plate.tempK(before[j] * capacity)) / dt;
    }
    applyPublications(tS, u);
    captureDueClones(tS, u);
    // frame-rate sensors: block means, R = σ²/k + floor²
    double[] z = new double[4];
    boolean[] avail = new boolean[4];
    double[][] r = new double[4][4];
    for (int k = 0; k < 4; k++) {
      avail[k] = fastCount[k] > 0 && !excluded[k];
      z[k] = fastCount[k] > 0 ? fastSum[k] / fastCount[k] : Double.NaN;
      double sd = settings.temperatureNoiseK()[k];
      r[k][k] = sd * sd / Math.max(1, fastCount[k]) + sq(settings.temperatureFloorK()[k]) + 0.1 * 0.1 / 12.0;
      if (excluded[k]) {
        status = status.worst(EstimatorStatus.DEGRADED);
        append(reason, exclusionReason[k]);
      } else if (fastCount[k] == 0) {
        status = status.worst(EstimatorStatus.DEGRADED);
        append(reason, FAST[k].id() + " missing or Bad");
      }
    }
    StepResult res = ekf.update(fastModel, z, avail, r, u);
    lastNis = res.nis();
    lastNisDof = res.usedCount();
    ChannelStatus[] cs = res.channelStatus();
    lastFastStatus = cs.clone();
    for (int k = 0; k < 4; k++) {
      if (cs[k] == ChannelStatus.GATED_SINGLE || cs[k] == ChannelStatus.GATED_JOINT) {
        status = status.worst(EstimatorStatus.DEGRADED);
        append(reason, FAST[k].id() + " gated (innovation outside its χ² gate)");
      }
    }
    handleDrift(res.driftAlarms(), tS);
    double[] post = ekf.state();
    for (int end = 0; end < 2; end++) {
      int k = 2 + end;
      if (!excluded[k] && biasMonitors[end].add(tS, post[layout.bias(end)])) {
        excluded[k] = true;
        driftFlags.add(new DriftAlarm(k, biasMonitors[end].changeK() > 0 ? 1 : -1,
            tS - settings.driftWindowS(), tS));
        exclusionReason[k] = String.format(java.util.Locale.ROOT,
            "%s drifting: its bias moved %+.1f K in %.0f min (healthy drift allows %.1f K): excluded",
            FAST[k].id(), biasMonitors[end].changeK(), settings.driftWindowS() / 60.0, biasMonitors[end].thresholdK());
        append(reason, exclusionReason[k]);
        status = status.worst(EstimatorStatus.DEGRADED);
      }
    }
    if (!Double.isNaN(analyzerPhaseS) && tS - lastAnalyzerUpdateS > 2 * settings.analyzerPeriodS() + settings.analyzerDeadTimeS()) {
      status = status.worst(EstimatorStatus.DEGRADED);
      append(reason, "analyzer results missing since " + (long) (tS - lastAnalyzerUpdateS) + " s");
    }
    if (ekf.repairCount() > repairsSeen) {
      repairsSeen = ekf.repairCount();
      status = EstimatorStatus.UNTRUSTWORTHY;
      append(reason, "covariance repaired (not positive definite)");
    }
    var nc = ekf.nisConsistency();
    if (!nc.consistent() && nc.meanNisPerDof() > nc.upperPerDof()) {
      // innovations larger than the filter allows: its σ is too small to be believed
      status = EstimatorStatus.UNTRUSTWORTHY;
      append(reason, String.format(java.util.Locale.ROOT, "NIS per dof %.2f above its 95%% band [%.2f, %.2f] over the last %d updates",
          nc.meanNisPerDof(), nc.lowerPerDof(), nc.upperPerDof(), nc.samples()));
    } else if (!nc.consistent()) {
      // innovations smaller than the filter expects: σ is conservative, the mean still serves
      status = status.worst(EstimatorStatus.DEGRADED);
      append(reason, String.format(java.util.Locale.ROOT,
          "over-cautious: NIS per dof %.2f below its 95%% band [%.2f, %.2f] over the last %d updates (σ larger than needed)",
          nc.meanNisPerDof(), nc.lowerPerDof(), nc.upperPerDof(), nc.samples()));
    }
    if (tS - t0S < settings.startupS()) {
      status = status.worst(EstimatorStatus.DEGRADED);
      append(reason, "settling after start");
    }
    observability.afterStep(ekf, tS, hottestCell(post));
    blockStatus = status;
    blockReason = reason.toString();
    lastEpochS = tS;
    clearBlock();
  }

  /** σ of a cell's plate temperature when its enthalpy state is N(mean, sd²) ({@link CellSpread}). */
  private double temperatureSd(double mean, double sd) {
    return CellSpread.temperatureSd(plate, capacity, mean, sd);
  }

  /** Whether any cell's enthalpy lies within {@link #BAND_MARGIN_K} (of sensible heat) of the melting band. */
  private boolean nearBand(double[] x) {
    double lo = plate.meltStartJPerM2() / capacity - BAND_MARGIN_K;
    double hi = plate.meltEndJPerM2() / capacity + BAND_MARGIN_K;
    for (int j = 0; j < cells; j++) {
      if (x[j] >= lo && x[j] <= hi) {
        return true;
      }
    }
    return false;
  }

  private int hottestCell(double[] x) {
    int best = 0;
    for (int j = 1; j < cells; j++) {
      if (x[j] > x[best]) {
        best = j;
      }
    }
    return best;
  }

  private static void append(StringBuilder sb, String s) {
    if (sb.indexOf(s) >= 0) {
      return;
    }
    if (sb.length() > 0) {
      sb.append("; ");
    }
    sb.append(s);
  }

  /**
   * A drift alarm on one frame-rate channel while the other channels stay in control is read as
   * a sensor fault (a model error would move several): the channel is excluded from then on.
   */
  private void handleDrift(List<DriftAlarm> alarms, double tS) {
    if (alarms.isEmpty()) {
      return;
    }
    int active = 0;
    for (DriftAlarm a : alarms) {
      if (!excluded[a.channel()]) {
        active++;
      }
    }
    if (active != 1) {
      return;
    }
    for (DriftAlarm a : alarms) {
      int k = a.channel();
      if (excluded[k]) {
        continue;
      }
      excluded[k] = true;
      driftFlags.add(a);
      exclusionReason[k] = String.format(java.util.Locale.ROOT,
          "%s drifting %s since about %d s before the alarm: excluded", FAST[k].id(),
          a.direction() > 0 ? "high" : "low", (long) (a.raisedAtTimeS() - a.sinceTimeS()));
    }
  }

  private void captureDueClones(double tS, double[] u) {
    if (Double.isNaN(nextSampleS)) {
      return;
    }
    while (nextSampleS <= tS + 1e-6) {
      if (nextSampleS > lastEpochS - 1e-6 || tS - nextSampleS < settings.blockS()) {
        int slot = freeSlot();
        int[] targets = new int[5];
        for (int c = 0; c < 5; c++) {
          targets[c] = layout.clone(slot) + c;
        }
        ekf.captureClone(analyzerModel, targets, u, 1e-6);
        slotSampleS[slot] = nextSampleS;
      }
      nextSampleS += settings.analyzerPeriodS();
    }
  }

  private int freeSlot() {
    int oldest = 0;
    for (int s = 0; s < SLOTS; s++) {
      if (Double.isNaN(slotSampleS[s])) {
        return s;
      }
      if (slotSampleS[s] < slotSampleS[oldest]) {
        oldest = s;
      }
    }
    return oldest;
  }

  private void applyPublications(double tS, double[] u) {
    for (int i = 0; i < publications.size(); i++) {
      double pubS = publicationTimes.get(i);
      double sampleS = pubS - settings.analyzerDeadTimeS();
      if (Double.isNaN(analyzerPhaseS)) {
        analyzerPhaseS = sampleS;
        nextSampleS = sampleS + settings.analyzerPeriodS();
        while (nextSampleS < tS - 1e-6) {
          nextSampleS += settings.analyzerPeriodS();
        }
        droppedAnalyzer++;
        lastAnalyzerUpdateS = tS;
        continue;
      }
      int slot = -1;
      for (int s = 0; s < SLOTS; s++) {
        if (!Double.isNaN(slotSampleS[s]) && Math.abs(slotSampleS[s] - sampleS) <= settings.blockS()) {
          slot = s;
        }
      }
      if (slot < 0) {
        droppedAnalyzer++;
        continue;
      }
      double[][] r = new double[5][5];
      for (int c = 0; c < 5; c++) {
        r[c][c] = sq(settings.analyzerNoiseMolPct()[c]) + sq(settings.analyzerFloorMolPct()[c]) + 0.01 * 0.01 / 12.0;
      }
      StepResult res = ekf.update(cloneModels[slot], publications.get(i), publicationMasks.get(i), r, u);
      slotSampleS[slot] = Double.NaN;
      lastAnalyzerUpdateS = tS;
      if (res.usedCount() > 0) {
        lastNis = res.nis();
        lastNisDof = res.usedCount();
      }
    }
  }

  private void clearBlock() {
    Arrays.fill(inSum, 0.0);
    Arrays.fill(inCount, 0);
    Arrays.fill(fastSum, 0.0);
    Arrays.fill(fastCount, 0);
    publications.clear();
    publicationMasks.clear();
    publicationTimes.clear();
  }

  // ---------------------------------------------------------------------------------------
  // derived quantities

  private Estimate extrapolated(Instant time, double tS) {
    if (last == null || rate == null) {
      return waiting(time);
    }
    double dt = tS - lastEpochS;
    double[] x = ekf.state();
    double[] tK = new double[cells];
    for (int j = 0; j < cells; j++) {
      tK[j] = plate.tempK(x[j] * capacity) + rate[j] * dt;
    }
    HiddenPeak pk = HiddenPeak.of(grid, tK);
    double tte = Double.isFinite(last.timeToExhaustS()) ? Math.max(0.0, last.timeToExhaustS() - dt) : Double.NaN;
    return new Estimate(time, pk.tempK(), last.peakPlateTempSdK(), pk.positionM(), last.bufferMeltFraction(),
        last.bufferMeltFractionSd(), last.maxCellMeltFraction(), last.remainingLatentJ(), tte, last.timeToExhaustSdS(),
        last.nis(), last.nisDof(), last.status(), last.reason(), last.reformingActivity(), last.reformingActivitySd(),
        last.combustionActivity(), last.combustionActivitySd(), last.heatLossWPerM2K(), last.heatLossSdWPerM2K(),
        last.heatTransferMultiplier(), last.heatTransferMultiplierSd(),
        last.biasInletK(), last.biasOutletK(), last.cellMeltFraction(), tK, last.cellPlateTempSdK(),
        last.observability());
  }

  private Estimate derive(Instant time, EstimatorStatus status, String reason) {
    double[] x = ekf.state();
    double[][] p = ekf.covariance();
    double[] tK = new double[cells];
    double[] melt = new double[cells];
    for (int j = 0; j < cells; j++) {
      tK[j] = plate.tempK(x[j] * capacity);
      melt[j] = plate.meltFraction(x[j] * capacity);
    }
    HiddenPeak pk = HiddenPeak.of(grid, tK);
    // σ of each cell temperature: secant slope dT/dx over ±1σ times σ_x (on the plateau the
    // temperature barely moves with enthalpy, so its σ shrinks there while the melt σ grows)
    double[] tSd = new double[cells];
    for (int j = 0; j < cells; j++) {
      tSd[j] = temperatureSd(x[j], Math.sqrt(Math.max(p[j][j], 1e-12)));
    }
    // σ of the peak: gradient of the parabolic reconstruction over its three cells with respect
    // to their temperatures (central differences, 0.01 K), times the secant slope dT/dx of each
    // cell over ±1σ (statistical linearisation: on the melting plateau T barely moves with x)
    int c = pk.cell();
    int lo = Math.max(0, c - 1);
    int hi = Math.min(cells - 1, c + 1);
    double[] g = new double[hi - lo + 1];
    double[] tPert = tK.clone();
    for (int j = lo; j <= hi; j++) {
      double d = 0.01;
      tPert[j] = tK[j] + d;
      double up = HiddenPeak.of(grid, tPert).tempK();
      tPert[j] = tK[j] - d;
      double dn = HiddenPeak.of(grid, tPert).tempK();
      tPert[j] = tK[j];
      double dPeakDt = Math.max(-1.0, Math.min(2.0, (up - dn) / (2 * d)));
      double sdj = Math.sqrt(Math.max(p[j][j], 1e-12));
      double dTdx = tSd[j] / sdj;
      g[j - lo] = dPeakDt * dTdx;
    }
    double var = 0.0;
    for (int a = lo; a <= hi; a++) {
      for (int b = lo; b <= hi; b++) {
        var += g[a - lo] * p[a][b] * g[b - lo];
      }
    }
    // ... and at least the spread of the hottest of the three cells (Clark 1961): when two cells
    // tie on the melting plateau, one pinned and one molten, the argmax flips between them from
    // one block to the next and the gradient alone flips the σ with it (0.1 K, then 20 K)
    var = Math.max(var, PeakSpread.varianceOfMax(tK, tSd, p, lo, hi));
    // overall melt fraction and its σ: secant slope of φ over ±1σ of each cell (statistical
    // linearisation; the plain derivative is zero outside the melting band)
    double length = grid.lengthM();
    double overall = 0.0;
    double maxMelt = 0.0;
    double[] gm = new double[cells];
    double latentLeft = 0.0;
    double width = spec.geometry().widthM();
    for (int j = 0; j < cells; j++) {
      double w = grid.widthM(j) / length;
      overall += w * melt[j];
      maxMelt = Math.max(maxMelt, melt[j]);
      double sd = Math.sqrt(Math.max(p[j][j], 1e-12));
      double up = plate.meltFraction((x[j] + sd) * capacity);
      double dn = plate.meltFraction((x[j] - sd) * capacity);
      gm[j] = w * (up - dn) / (2 * sd);
      latentLeft += (1.0 - melt[j]) * plate.latentJPerM2() * width * grid.widthM(j);
    }
    double mvar = 0.0;
    for (int a = 0; a < cells; a++) {
      if (gm[a] == 0.0) {
        continue;
      }
      for (int b = 0; b < cells; b++) {
        mvar += gm[a] * p[a][b] * gm[b];
      }
    }
    updateExhaust(x, p, pk, maxMelt);
    double tte = Double.NaN;
    double tteSd = Double.NaN;
    double tS = seconds(time);
    if (Double.isFinite(tteS)) {
      tte = Math.max(0.0, tteS - (tS - tteAtS));
      tteSd = tteSdS;
    }
    int ra = layout.reformingActivity();
    int ca = layout.combustionActivity();
    int hl = layout.heatLoss();
    return new Estimate(time, pk.tempK(), Math.sqrt(Math.max(var, 0.0)), pk.positionM(), overall,
        Math.sqrt(Math.max(mvar, 0.0)), maxMelt, latentLeft, tte, tteSd, lastNis, lastNisDof, status, reason,
        x[ra], Math.sqrt(p[ra][ra]), x[ca], Math.sqrt(p[ca][ca]), x[hl], Math.sqrt(p[hl][hl]),
        x[layout.heatTransfer()], Math.sqrt(p[layout.heatTransfer()][layout.heatTransfer()]),
        x[layout.bias(0)], x[layout.bias(1)], melt, tK, tSd, observability.lastWindow());
  }

  /**
   * Time-to-exhaust: recomputed every {@code forecastEveryS} while a cell is melting or the peak
   * is within {@link #NEAR_MELT_K} of the melting point (otherwise none is reported). Mean forecast from the
   * posterior mean; spread from two more forecasts at x ± v with v = P e_k / √P_kk, the
   * conditional shift of the whole state when the critical cell k moves by one σ (a sigma-point
   * pair along the direction that matters most); σ = half the difference of their times.
   */
  private void updateExhaust(double[] x, double[][] p, HiddenPeak pk, double maxMelt) {
    double tS = lastEpochS;
    double meltK = spec.buffer().meltingPointK();
    boolean near = maxMelt > 0.0 || pk.tempK() > meltK - NEAR_MELT_K;
    if (!near || dynamics.builds() == 0) { // no Jacobian yet before the first propagation
      tteS = Double.POSITIVE_INFINITY;
      tteSdS = Double.NaN;
      tteAtS = Double.NaN;
      return;
    }
    double[] held = heldRaw();
    if (!Double.isNaN(tteAtS) && tS - tteAtS < settings.forecastEveryS() - 1e-6 && !heldMoved(held)) {
      return;
    }
    tteHeld = held;
    double[][] jac = dynamics.heldJacobian();
    double[][] jc = new double[cells][cells];
    for (int i = 0; i < cells; i++) {
      System.arraycopy(jac[i], 0, jc[i], 0, cells);
    }
    double[] e0 = enthalpies(x);
    forecast.setJacobian(jc, e0, dynamics.heldPlateSlopes());
    OperatingPoint op = ReactorDynamics.operatingPoint(dynamics.correctedInputs(x, held));
    double mean = forecast.secondsToExhaust(e0, op, dynamics.parameters(x), settings.horizonS());
    if (!Double.isFinite(mean)) {
      // no melt-through within the horizon: none is reported, so no spread either (the pair
      // of spread forecasts would cost two more full-horizon marches for nothing)
      tteS = mean;
      tteAtS = tS;
      tteSdS = Double.NaN;
      return;
    }
    int k = forecast.lastCell() >= 0 ? forecast.lastCell() : pk.cell();
    double sdK = Math.sqrt(Math.max(p[k][k], 1e-12));
    double[] v = new double[n];
    for (int i = 0; i < n; i++) {
      v[i] = p[i][k] / sdK;
    }
    double[] xp = x.clone();
    double[] xm = x.clone();
    for (int i = 0; i < n; i++) {
      xp[i] += v[i];
      xm[i] -= v[i];
    }
    double tp = forecast.secondsToExhaust(enthalpies(xp),
        ReactorDynamics.operatingPoint(dynamics.correctedInputs(xp, held)), dynamics.parameters(xp), settings.horizonS());
    double tm = forecast.secondsToExhaust(enthalpies(xm),
        ReactorDynamics.operatingPoint(dynamics.correctedInputs(xm, held)), dynamics.parameters(xm), settings.horizonS());
    tteS = mean;
    tteAtS = tS;
    if (Double.isFinite(tp) && Double.isFinite(tm)) {
      tteSdS = 0.5 * Math.abs(tm - tp);
    } else {
      double other = Double.isFinite(tp) ? tp : tm;
      tteSdS = Double.isFinite(other) ? Math.abs(mean - other) : settings.horizonS() - mean;
    }
  }

  /**
   * The inputs the estimator uses now, for what-if forecasts: each one's present value from its
   * recent usable values ({@link RecentInputs#present}: the mean over the longest flat stretch
   * of up to four {@value #HELD_INPUT_WINDOW_S} s windows, else the least-squares line over one
   * at the newest frame), corrected by the estimated systematic meter errors (SI).
   */
  public OperatingPoint heldInputs() {
    double[] u = heldRaw();
    return ReactorDynamics.operatingPoint(ekf == null ? u : dynamics.correctedInputs(ekf.state(), u));
  }

  /** σ of each cell's enthalpy state now (K of sensible heat). */
  private double[] cellSd() {
    double[] sd = new double[cells];
    for (int j = 0; j < cells; j++) {
      sd[j] = Math.sqrt(Math.max(ekf.covarianceEntry(j, j), 0.0));
    }
    return sd;
  }

  /** Whether a held flow moved by more than {@link #HELD_FLOW_MOVE} since the last forecast. */
  private boolean heldMoved(double[] held) {
    if (tteHeld == null) {
      return true;
    }
    for (int i : HELD_FLOWS) {
      if (Math.abs(held[i] - tteHeld[i]) > HELD_FLOW_MOVE * Math.abs(tteHeld[i])) {
        return true;
      }
    }
    return false;
  }

  /** The held inputs before the meter-error correction: the present values, else the last good value. */
  private double[] heldRaw() {
    double[] u = lastGoodInput.clone();
    for (int i = 0; i < u.length; i++) {
      double m = recentInputs.present(i);
      if (Double.isFinite(m)) {
        u[i] = m;
      }
    }
    return u;
  }

  private double[] enthalpies(double[] x) {
    double[] e = new double[cells];
    for (int j = 0; j < cells; j++) {
      e[j] = x[j] * capacity;
    }
    return e;
  }

  /** Predicts the five analyzer channels (mol% dry) from the present state. */
  private final class AnalyzerPrediction implements MeasurementModel {
    @Override
    public int size() {
      return 5;
    }

    @Override
    public void predict(double[] x, double[] u, double[] y) {
      dynamics.evaluateModel(x, u, ev);
      for (int c = 0; c < 5; c++) {
        y[c] = 100.0 * ev.output(ReactorDynamics.ANALYZER_OUTPUT[c]);
      }
    }

    @Override
    public void jacobian(double[] x, double[] u, double[][] dhdx) {
      double[][] ho = dynamics.heldOutputs();
      for (int c = 0; c < 5; c++) {
        double[] row = ho[ReactorDynamics.ANALYZER_OUTPUT[c]];
        for (int j = 0; j < n; j++) {
          dhdx[c][j] = 100.0 * row[j];
        }
      }
    }
  }
}
