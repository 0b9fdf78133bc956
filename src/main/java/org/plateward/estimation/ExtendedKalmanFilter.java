package org.plateward.estimation;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Continuous-discrete extended Kalman filter over a {@link Dynamics} model (Jazwinski 1970;
 * Simon 2006, ch. 13), with Joseph-form updates, χ² gating, NIS consistency, innovation CUSUM,
 * optional innovation-based Q inflation and exact rollback for delayed measurements. See the
 * package documentation for the method and its costs.
 *
 * <p>Not thread-safe: one filter belongs to one estimation loop.
 */
public final class ExtendedKalmanFilter {
  private static final Logger LOG = LoggerFactory.getLogger(ExtendedKalmanFilter.class);
  /** Two times closer than this are the same epoch (s). */
  static final double TIME_TOLERANCE_S = 1e-9;

  private final Dynamics dynamics;
  private final FilterSettings settings;
  private final int n;
  private double[][] processNoiseDensity;

  private final double[] x;
  private double[][] p;
  private double timeS;

  // propagation work
  private final double[] f;
  private final double[][] jac;
  private double[][] lu;
  private final int[] perm;
  private final double[][] rowsWork;
  private double[][] work;
  private final double[] vecWork;
  private final double[] vecWork2;
  private double[][] phi;
  private long phiVersion = -1L;
  private double phiStepS = Double.NaN;
  private long phiBuilds;

  private final CovarianceGuard guard;
  private final ChiSquareTable channelGate;
  private final ChiSquareTable jointGate;
  private final NisWindow nisWindow;
  private final ProcessNoiseAdapter noiseAdapter;
  private final Map<MeasurementModel, UpdateWork> updateWork = new IdentityHashMap<>();
  private final Map<MeasurementModel, InnovationCusum> cusums = new IdentityHashMap<>();

  private final ArrayList<Epoch> history = new ArrayList<>();
  private final ArrayDeque<Epoch> spareEpochs = new ArrayDeque<>();
  private boolean replaying;
  /** Covariance propagated like P but never updated (null when not tracked). */
  private double[][] openLoop;
  private double openLoopStepS;
  private double openLoopPendingS;
  private double openLoopPendingQ;

  private boolean pendingRepair;
  private double pendingMinEigenvalue = Double.NaN;
  private long repairCount;
  private long lateDroppedCount;

  /**
   * @param dynamics the model
   * @param processNoiseDensity continuous process noise spectral density Q, n×n (state units²/s),
   *     symmetric positive semi-definite
   * @param settings tuning
   * @param startTimeS time of the initial estimate (s)
   * @param x0 initial state, length n
   * @param p0 initial covariance, n×n, symmetric positive definite
   * @throws IllegalArgumentException on a dimension mismatch or an indefinite P0
   */
  public ExtendedKalmanFilter(
      Dynamics dynamics,
      double[][] processNoiseDensity,
      FilterSettings settings,
      double startTimeS,
      double[] x0,
      double[][] p0) {
    this.dynamics = dynamics;
    this.settings = settings;
    this.n = dynamics.stateSize();
    if (x0.length != n) {
      throw new IllegalArgumentException("x0 has " + x0.length + " entries, model has " + n);
    }
    Matrices.requireShape(p0, n, n, "P0");
    Matrices.requireShape(processNoiseDensity, n, n, "Q");
    this.processNoiseDensity = Matrices.copy(processNoiseDensity);
    this.x = x0.clone();
    this.p = Matrices.copy(p0);
    Matrices.symmetrise(p);
    this.timeS = startTimeS;
    f = new double[n];
    jac = new double[n][n];
    lu = new double[n][n];
    perm = new int[n];
    rowsWork = new double[n][];
    work = new double[n][n];
    vecWork = new double[n];
    vecWork2 = new double[n];
    guard = new CovarianceGuard(n, settings.eigenvalueFloorRelative(),
        settings.eigenvalueFloorAbsolute());
    if (!guard.isPositiveDefinite(p, true)) {
      throw new IllegalArgumentException("P0 is not symmetric positive definite");
    }
    channelGate = new ChiSquareTable(settings.channelGateProbability(), 1);
    jointGate = new ChiSquareTable(settings.jointGateProbability(), 16);
    nisWindow = new NisWindow(settings.nisWindow(), settings.nisBandProbability(), 16);
    noiseAdapter = new ProcessNoiseAdapter(settings.adaptiveWindow(),
        settings.maxProcessNoiseInflation());
    history.add(newEpoch(timeS));
  }

  // ---------------------------------------------------------------------------------------
  // propagation

  /**
   * Propagates mean and covariance by dt with inputs held, in equal linearly implicit
   * (Rosenbrock–Euler) sub-steps no longer than {@link FilterSettings#maxSubstepS()}:
   * Φ = (I − hJ)⁻¹, x ← x + Φ h f(x), P ← Φ (P + h λ Q) Φᵀ.
   *
   * @param u inputs held over the interval (model units)
   * @param dtS interval (s), ≥ 0
   * @throws IllegalArgumentException if dt is negative or not finite
   * @throws IllegalStateException if I − hJ is singular
   */
  public void propagate(double[] u, double dtS) {
    if (!(dtS >= 0.0) || !Double.isFinite(dtS)) {
      throw new IllegalArgumentException("propagation interval must be finite and >= 0, got "
          + dtS);
    }
    if (dtS == 0.0) {
      return;
    }
    final Propagation step = new ContinuousStep(u.clone(), dtS, processNoiseInflation());
    runPropagation(step);
    closeEpoch(step);
  }

  /**
   * Discrete-time linear propagation x ← Φ x + c, P ← Φ P Φᵀ + Q_d (for cross-checks against
   * linear filters and for models already discretised).
   *
   * @param phi state transition n×n
   * @param offset additive term c (length n) or null
   * @param qd discrete process noise n×n (state units²)
   * @param dtS time the step covers (s), &gt; 0, used for the epoch clock only
   * @throws IllegalArgumentException on a dimension mismatch
   */
  public void propagateLinear(double[][] phi, double[] offset, double[][] qd, double dtS) {
    Matrices.requireShape(phi, n, n, "Phi");
    Matrices.requireShape(qd, n, n, "Qd");
    if (offset != null && offset.length != n) {
      throw new IllegalArgumentException("offset has " + offset.length + " entries, expected "
          + n);
    }
    if (!(dtS > 0.0)) {
      throw new IllegalArgumentException("dtS must be > 0, got " + dtS);
    }
    final Propagation step = new DiscreteStep(Matrices.copy(phi),
        offset == null ? null : offset.clone(), Matrices.copy(qd), dtS);
    runPropagation(step);
    closeEpoch(step);
  }

  private void runPropagation(Propagation step) {
    if (step instanceof ContinuousStep c) {
      final int steps = Math.max(1, (int) Math.ceil(c.dtS / settings.maxSubstepS() - 1e-12));
      final double h = c.dtS / steps;
      for (int s = 0; s < steps; s++) {
        substep(c.u, h, c.inflation);
      }
    } else {
      final DiscreteStep d = (DiscreteStep) step;
      for (int i = 0; i < n; i++) {
        double s = d.offset == null ? 0.0 : d.offset[i];
        final double[] row = d.phi[i];
        for (int j = 0; j < n; j++) {
          s += row[j] * x[j];
        }
        vecWork[i] = s;
      }
      System.arraycopy(vecWork, 0, x, 0, n);
      discreteCovariance(d, p);
      if (tracksOpenLoop()) {
        discreteCovariance(d, openLoop);
      }
    }
    Matrices.symmetrise(p);
    timeS += step.dtS();
    if (!guard.isPositiveDefinite(p, false)) {
      repairCovariance("propagation");
    }
  }

  /** c ← Φ c Φᵀ + Q_d. */
  private void discreteCovariance(DiscreteStep d, double[][] c) {
    Matrices.multiply(d.phi, c, work); // Φ C
    Matrices.multiplyTransposed(work, d.phi, c); // (Φ C) Φᵀ
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        c[i][j] += d.qd[i][j];
      }
    }
  }

  private boolean tracksOpenLoop() {
    return openLoop != null && !replaying;
  }

  /** Forms A = I − h J in {@code lu} and factorises it in place (partial pivoting). */
  private void factorIminusHJ(double h) {
    for (int i = 0; i < n; i++) {
      final double[] ai = lu[i];
      final double[] ji = jac[i];
      for (int j = 0; j < n; j++) {
        ai[j] = -h * ji[j];
      }
      ai[i] += 1.0;
    }
    if (!Matrices.luInPlace(lu, perm)) {
      throw new IllegalStateException("I - hJ is singular at t=" + timeS + " s, h=" + h + " s");
    }
  }

  private void substep(double[] u, double h, double inflation) {
    dynamics.evaluate(x, u, f, jac);
    final long version = dynamics.jacobianVersion();
    if (version >= 0) {
      heldJacobianSubstep(version, h, inflation);
      return;
    }
    // A = I − h J, factorised once and used for the state and both covariance solves
    factorIminusHJ(h);
    // x ← x + A⁻¹ h f
    for (int i = 0; i < n; i++) {
      vecWork2[i] = h * f[i];
    }
    Matrices.luSolve(lu, perm, vecWork2, vecWork);
    for (int i = 0; i < n; i++) {
      x[i] += vecWork2[i];
    }
    luCovariance(p, h * inflation);
    if (tracksOpenLoop()) {
      if (openLoopStepS > 0.0) {
        advanceOpenLoop(h, inflation);
      } else {
        luCovariance(openLoop, h * inflation);
      }
    }
  }

  /**
   * Coarse open loop: gathers sub-steps and, once {@link #openLoopStepS} has passed, takes
   * one linearly implicit step over it with the present Jacobian (lu is scratch after a
   * sub-step's own solves).
   */
  private void advanceOpenLoop(double h, double inflation) {
    openLoopPendingS += h;
    openLoopPendingQ += h * inflation;
    if (openLoopPendingS >= openLoopStepS - 1e-9) {
      flushOpenLoop();
    }
  }

  private void flushOpenLoop() {
    if (openLoop == null || openLoopPendingS <= 0.0) {
      return;
    }
    factorIminusHJ(openLoopPendingS);
    luCovariance(openLoop, openLoopPendingQ);
    openLoopPendingS = 0.0;
    openLoopPendingQ = 0.0;
  }

  /** M = C + h λ Q;  Y = A⁻¹ M;  C ← A⁻¹ Yᵀ = Φ M Φᵀ (M symmetric), with A factorised in lu. */
  private void luCovariance(double[][] c, double hq) {
    for (int i = 0; i < n; i++) {
      final double[] wi = work[i];
      final double[] ci = c[i];
      final double[] qi = processNoiseDensity[i];
      for (int j = 0; j < n; j++) {
        wi[j] = ci[j] + hq * qi[j];
      }
    }
    Matrices.luSolve(lu, perm, work, rowsWork);
    Matrices.transposeInto(work, c);
    Matrices.luSolve(lu, perm, c, rowsWork);
  }

  /**
   * Sub-step with a Jacobian the model holds over several steps: Φ = (I − hJ)⁻¹ is formed
   * explicitly once per Jacobian version and step length (one LU and n solves), and each step
   * is then x ← x + Φ h f, P ← Φ (P + h λ Q) Φᵀ as two products that skip the zero entries of Φ
   * (the rows of random-walk and held states are unit rows). Same arithmetic as the LU path.
   */
  private void heldJacobianSubstep(long version, double h, double inflation) {
    if (phi == null) {
      phi = new double[n][n];
    }
    if (version != phiVersion || h != phiStepS) {
      factorIminusHJ(h);
      for (int i = 0; i < n; i++) {
        Arrays.fill(phi[i], 0.0);
        phi[i][i] = 1.0;
      }
      Matrices.luSolve(lu, perm, phi, rowsWork);
      // drop round-off below 1e-14 of the row's largest entry so the products skip it
      for (int i = 0; i < n; i++) {
        double big = 0.0;
        for (int j = 0; j < n; j++) {
          big = Math.max(big, Math.abs(phi[i][j]));
        }
        for (int j = 0; j < n; j++) {
          if (Math.abs(phi[i][j]) < 1e-14 * big) {
            phi[i][j] = 0.0;
          }
        }
      }
      phiVersion = version;
      phiStepS = h;
      phiBuilds++;
    }
    for (int i = 0; i < n; i++) {
      final double[] row = phi[i];
      double s = 0.0;
      for (int j = 0; j < n; j++) {
        s += row[j] * f[j];
      }
      vecWork[i] = h * s;
    }
    for (int i = 0; i < n; i++) {
      x[i] += vecWork[i];
    }
    heldCovariance(p, h * inflation);
    if (tracksOpenLoop()) {
      if (openLoopStepS > 0.0) {
        advanceOpenLoop(h, inflation);
      } else {
        heldCovariance(openLoop, h * inflation);
      }
    }
  }

  /** C ← Φ (C + h λ Q) Φᵀ with the explicit Φ; lu is scratch here (factors needed only to rebuild Φ). */
  private void heldCovariance(double[][] c, double hq) {
    for (int i = 0; i < n; i++) {
      final double[] li = lu[i];
      final double[] ci = c[i];
      final double[] qi = processNoiseDensity[i];
      for (int j = 0; j < n; j++) {
        li[j] = ci[j] + hq * qi[j];
      }
    }
    Matrices.multiply(phi, lu, work); // Y = Φ M
    Matrices.transposeInto(work, lu); // Yᵀ = M Φᵀ
    Matrices.multiplySymmetricResult(phi, lu, c); // Φ M Φᵀ (symmetric: upper triangle, mirrored)
  }

  // ---------------------------------------------------------------------------------------
  // measurement update

  /**
   * Fuses one group of measurements at the present time with the Joseph-form update.
   *
   * @param model measurement model (m channels)
   * @param z measured values, length m (measurement units); NaN counts as not available
   * @param available per channel: true if the value may be used (Good/Uncertain and fresh)
   * @param r measurement noise covariance m×m (measurement units²)
   * @param u inputs at this time
   * @return the update's result
   * @throws IllegalArgumentException on a dimension mismatch
   */
  public StepResult update(
      MeasurementModel model, double[] z, boolean[] available, double[][] r, double[] u) {
    final StoredUpdate up = storedUpdate(model, z, available, r, u);
    final StepResult result = applyUpdate(up, true, false);
    currentEpoch().updates.add(up);
    return result;
  }

  /**
   * Fuses a measurement that belongs to an earlier time (an analyzer with dead time): the
   * filter rolls back to the stored epoch at that time, inserts the measurement there and
   * re-filters every later propagation and update it had already done. With a linear model the
   * result equals the filter that had the measurement on time, to rounding. Measurements older
   * than the history are dropped and counted.
   *
   * @param measurementTimeS time the values belong to (s), not after the present time
   * @param model measurement model
   * @param z measured values
   * @param available availability mask
   * @param r measurement noise covariance
   * @param u inputs at the measurement time
   * @return the result of the update at the measurement time (timeS = measurement time)
   * @throws IllegalArgumentException if the time is in the future, or falls inside a discrete
   *     linear step (which cannot be split)
   */
  public StepResult updateDelayed(
      double measurementTimeS,
      MeasurementModel model,
      double[] z,
      boolean[] available,
      double[][] r,
      double[] u) {
    final StoredUpdate up = storedUpdate(model, z, available, r, u);
    if (measurementTimeS > timeS + TIME_TOLERANCE_S) {
      throw new IllegalArgumentException("measurement time " + measurementTimeS
          + " s is after the filter time " + timeS + " s");
    }
    int k = -1;
    for (int i = history.size() - 1; i >= 0; i--) {
      if (history.get(i).timeS <= measurementTimeS + TIME_TOLERANCE_S) {
        k = i;
        break;
      }
    }
    if (k < 0) {
      lateDroppedCount++;
      LOG.debug("delayed measurement dropped: time={} s older than history start={} s",
          measurementTimeS, history.get(0).timeS);
      return tooLateResult(up, measurementTimeS);
    }
    int target = k;
    if (Math.abs(history.get(k).timeS - measurementTimeS) > TIME_TOLERANCE_S) {
      splitEpoch(k, measurementTimeS);
      target = k + 1;
    }
    // roll back to the prior at epoch k and re-filter forward, inserting the new update at
    // the target epoch (the only one that feeds the monitors: the others were counted already)
    replaying = true;
    StepResult result = null;
    try {
      final Epoch start = history.get(k);
      System.arraycopy(start.xPrior, 0, x, 0, n);
      Matrices.copyInto(start.pPrior, p);
      timeS = start.timeS;
      for (int i = k; i < history.size(); i++) {
        final Epoch e = history.get(i);
        if (i > k) {
          System.arraycopy(x, 0, e.xPrior, 0, n);
          Matrices.copyInto(p, e.pPrior);
          timeS = e.timeS;
        }
        for (StoredUpdate old : e.updates) {
          applyUpdate(old, false, false);
        }
        if (i == target) {
          result = applyUpdate(up, true, true);
          e.updates.add(up);
        }
        if (e.next != null) {
          runPropagation(e.next);
        }
      }
    } finally {
      replaying = false;
    }
    return result;
  }

  private void splitEpoch(int k, double tauS) {
    final Epoch e = history.get(k);
    if (!(e.next instanceof ContinuousStep c)) {
      throw new IllegalArgumentException("delayed measurement at " + tauS
          + " s falls inside a discrete step; deliver it at an epoch time");
    }
    final double first = tauS - e.timeS;
    final Epoch mid = spareEpochs.isEmpty() ? new Epoch(n) : spareEpochs.pop();
    mid.timeS = tauS;
    mid.updates.clear();
    mid.next = new ContinuousStep(c.u, c.dtS - first, c.inflation);
    e.next = new ContinuousStep(c.u, first, c.inflation);
    history.add(k + 1, mid); // its prior is written by the forward pass
  }

  private StoredUpdate storedUpdate(
      MeasurementModel model, double[] z, boolean[] available, double[][] r, double[] u) {
    final int m = model.size();
    if (z.length != m || available.length != m) {
      throw new IllegalArgumentException("measurement model has " + m + " channels, got z of "
          + z.length + " and a mask of " + available.length);
    }
    Matrices.requireShape(r, m, m, "R");
    return new StoredUpdate(model, z.clone(), available.clone(), Matrices.copy(r), u.clone());
  }

  private StepResult applyUpdate(StoredUpdate up, boolean feedMonitors, boolean delayed) {
    final MeasurementModel model = up.model;
    final int m = model.size();
    final UpdateWork w = updateWork.computeIfAbsent(model, mm -> new UpdateWork(mm.size(), n));
    model.evaluate(x, up.u, w.yhat, w.h);
    final ChannelStatus[] status = new ChannelStatus[m];
    final double[] nu = new double[m];
    final double[] e = new double[m];
    Arrays.fill(nu, Double.NaN);
    Arrays.fill(e, Double.NaN);
    // available channels and their rows of H P
    int ma = 0;
    for (int i = 0; i < m; i++) {
      if (up.available[i] && Double.isFinite(up.z[i])) {
        nu[i] = up.z[i] - w.yhat[i];
        w.avail[ma++] = i;
      } else {
        status[i] = ChannelStatus.MISSING;
      }
    }
    for (int i = 0; i < n; i++) {
      w.priorDiag[i] = p[i][i];
    }
    for (int a = 0; a < ma; a++) {
      final double[] hi = w.h[w.avail[a]];
      final double[] row = w.hpAll[a];
      Arrays.fill(row, 0.0);
      for (int k = 0; k < n; k++) {
        final double hk = hi[k];
        if (hk == 0.0) {
          continue;
        }
        final double[] pk = p[k];
        for (int j = 0; j < n; j++) {
          row[j] += hk * pk[j];
        }
      }
    }
    // S over the available channels: S = H P Hᵀ + R
    for (int a = 0; a < ma; a++) {
      final double[] hpa = w.hpAll[a];
      for (int b = 0; b <= a; b++) {
        final double[] hb = w.h[w.avail[b]];
        double s = 0.0;
        for (int j = 0; j < n; j++) {
          s += hpa[j] * hb[j];
        }
        s += 0.5 * (up.r[w.avail[a]][w.avail[b]] + up.r[w.avail[b]][w.avail[a]]);
        w.sAll[a][b] = s;
        w.sAll[b][a] = s;
      }
    }
    // per-channel gate on ν²/S_ii against χ²₁
    int mu = 0;
    final double single = channelGate.quantile(1);
    for (int a = 0; a < ma; a++) {
      final int i = w.avail[a];
      e[i] = nu[i] / Math.sqrt(w.sAll[a][a]);
      if (settings.gatingEnabled() && e[i] * e[i] > single) {
        status[i] = ChannelStatus.GATED_SINGLE;
      } else {
        w.usedPos[mu++] = a;
      }
    }
    // joint gate: drop the worst channel until NIS of the rest passes χ²_mu
    double nis = 0.0;
    boolean sOk = true;
    while (mu > 0) {
      for (int r = 0; r < mu; r++) {
        for (int c = 0; c < mu; c++) {
          w.s[r][c] = w.sAll[w.usedPos[r]][w.usedPos[c]];
        }
        w.sinvNu[r] = nu[w.avail[w.usedPos[r]]];
      }
      if (!Matrices.cholesky(w.s, mu, w.l)) {
        sOk = false;
        break;
      }
      Matrices.choleskySolve(w.l, mu, w.sinvNu);
      nis = 0.0;
      for (int r = 0; r < mu; r++) {
        nis += nu[w.avail[w.usedPos[r]]] * w.sinvNu[r];
      }
      if (!settings.gatingEnabled() || nis <= jointGate.quantile(mu)) {
        break;
      }
      int worst = 0;
      for (int r = 1; r < mu; r++) {
        final int ir = w.avail[w.usedPos[r]];
        final int iw = w.avail[w.usedPos[worst]];
        if (e[ir] * e[ir] > e[iw] * e[iw]) {
          worst = r;
        }
      }
      status[w.avail[w.usedPos[worst]]] = ChannelStatus.GATED_JOINT;
      System.arraycopy(w.usedPos, worst + 1, w.usedPos, worst, mu - worst - 1);
      mu--;
      nis = 0.0;
    }
    if (!sOk) {
      // S = H P Hᵀ + R not positive definite: P (or R) is broken; repair P, skip this update
      repairCovariance("innovation covariance");
      mu = 0;
      nis = 0.0;
      for (int a = 0; a < ma; a++) {
        if (status[w.avail[a]] == null) {
          status[w.avail[a]] = ChannelStatus.GATED_JOINT;
        }
      }
    }
    final int[] used = new int[mu];
    for (int r = 0; r < mu; r++) {
      used[r] = w.avail[w.usedPos[r]];
      status[used[r]] = ChannelStatus.USED;
    }
    double excess = 0.0;
    double predicted = 0.0;
    final double[][] sUsed = new double[mu][mu];
    for (int r = 0; r < mu; r++) {
      for (int c = 0; c < mu; c++) {
        sUsed[r][c] = w.s[r][c];
      }
      final double ri = up.r[used[r]][used[r]];
      excess += nu[used[r]] * nu[used[r]] - ri;
      predicted += w.s[r][r] - ri;
    }
    if (mu > 0) {
      josephUpdate(w, up, used, nu);
    }
    final double[] reduction = new double[n];
    for (int i = 0; i < n; i++) {
      reduction[i] = w.priorDiag[i] > 0.0 ? 1.0 - p[i][i] / w.priorDiag[i] : 0.0;
    }
    if (!feedMonitors) {
      return null;
    }
    nisWindow.add(nis, mu);
    if (settings.adaptiveProcessNoise() && mu > 0) {
      noiseAdapter.add(excess, predicted);
    }
    final InnovationCusum cusum = cusumFor(model);
    for (int a = 0; a < ma; a++) {
      final int i = w.avail[a];
      final DriftAlarm raised = cusum.add(i, e[i], timeS);
      if (raised != null) {
        LOG.info("innovation drift alarm: channel={} direction={} since={} s raised={} s",
            raised.channel(), raised.direction(), raised.sinceTimeS(), raised.raisedAtTimeS());
      }
    }
    final boolean repaired = pendingRepair;
    final double minEig = pendingMinEigenvalue;
    if (!replaying || delayed) {
      pendingRepair = false;
      pendingMinEigenvalue = Double.NaN;
    }
    return new StepResult(timeS, x, p, nu, e, used, sUsed, nis, status, reduction, repaired,
        minEig, delayed, processNoiseInflation(), nisWindow.summary(), cusum.activeAlarms());
  }

  /**
   * K = P Hᵀ S⁻¹ (as Kᵀ = S⁻¹ H P by a Cholesky solve); x ← x + K ν;
   * P ← (I − K H) P (I − K H)ᵀ + K R Kᵀ, evaluated as W = P − K (H P), P = W − (W Hᵀ − K R) Kᵀ,
   * which is the same product without forming the n×n matrix I − K H (O(n²m), not O(n³)).
   */
  private void josephUpdate(UpdateWork w, StoredUpdate up, int[] used, double[] nu) {
    final int mu = used.length;
    for (int r = 0; r < mu; r++) {
      System.arraycopy(w.hpAll[w.usedPos[r]], 0, w.kt[r], 0, n);
    }
    Matrices.choleskySolve(w.l, mu, w.kt, n);
    // x ← x + Kν  (Kν)_j = Σ_r Kᵀ[r][j] ν_r
    for (int r = 0; r < mu; r++) {
      final double v = nu[used[r]];
      final double[] kr = w.kt[r];
      for (int j = 0; j < n; j++) {
        x[j] += kr[j] * v;
      }
    }
    // W = P − K (H P)
    for (int i = 0; i < n; i++) {
      final double[] wi = work[i];
      System.arraycopy(p[i], 0, wi, 0, n);
      for (int r = 0; r < mu; r++) {
        final double kir = w.kt[r][i];
        final double[] hpr = w.hpAll[w.usedPos[r]];
        for (int j = 0; j < n; j++) {
          wi[j] -= kir * hpr[j];
        }
      }
    }
    // Dᵀ = H Wᵀ − (K R)ᵀ  (mu×n), in axpy form over the rows of Wᵀ so the loops vectorise
    Matrices.transposeInto(work, lu);
    for (int r = 0; r < mu; r++) {
      final double[] dr = w.dt[r];
      Arrays.fill(dr, 0.0);
      final double[] hr = w.h[used[r]];
      for (int k = 0; k < n; k++) {
        final double hk = hr[k];
        if (hk == 0.0) {
          continue;
        }
        final double[] wk = lu[k];
        for (int j = 0; j < n; j++) {
          dr[j] += hk * wk[j];
        }
      }
      for (int q = 0; q < mu; q++) {
        final double rq = up.r[used[q]][used[r]];
        if (rq == 0.0) {
          continue;
        }
        final double[] kq = w.kt[q];
        for (int j = 0; j < n; j++) {
          dr[j] -= rq * kq[j];
        }
      }
    }
    // P = W − D Kᵀ
    for (int i = 0; i < n; i++) {
      final double[] pi = p[i];
      System.arraycopy(work[i], 0, pi, 0, n);
      for (int r = 0; r < mu; r++) {
        final double dir = w.dt[r][i];
        final double[] kr = w.kt[r];
        for (int j = 0; j < n; j++) {
          pi[j] -= dir * kr[j];
        }
      }
    }
    Matrices.symmetrise(p);
    if (!guard.isPositiveDefinite(p, settings.fullPositiveDefiniteCheck())) {
      repairCovariance("update");
    }
  }

  private void repairCovariance(String where) {
    final double minEig = guard.repair(p);
    repairCount++;
    pendingRepair = true;
    pendingMinEigenvalue = Double.isNaN(pendingMinEigenvalue) ? minEig
        : Math.min(pendingMinEigenvalue, minEig);
    LOG.warn("covariance not positive definite after {}: repaired, min eigenvalue={} t={} s",
        where, minEig, timeS);
  }

  private StepResult tooLateResult(StoredUpdate up, double tS) {
    final int m = up.model.size();
    final ChannelStatus[] st = new ChannelStatus[m];
    Arrays.fill(st, ChannelStatus.TOO_LATE);
    final double[] nan = new double[m];
    Arrays.fill(nan, Double.NaN);
    final double[] zero = new double[n];
    return new StepResult(tS, x, p, nan, nan, new int[0], new double[0][0], 0.0, st, zero,
        false, Double.NaN, true, processNoiseInflation(), nisWindow.summary(),
        cusumFor(up.model).activeAlarms());
  }

  private InnovationCusum cusumFor(MeasurementModel model) {
    return cusums.computeIfAbsent(model, mm -> new InnovationCusum(mm.size(),
        settings.cusumSlack(), settings.cusumThreshold(), timeS));
  }

  /**
   * Stochastic cloning for a delayed measurement (Roumeliotis &amp; Burdick 2002): sets the held
   * states {@code targets} to the present prediction of {@code model}, with their exact
   * covariance: x_c = h(x), P_c· = H P, P_cc = H P Hᵀ + δ I. The held states must have zero
   * dynamics and zero process noise; when the delayed value arrives, an update with z = x_c
   * applies it where it belongs in time, exactly for a linear model, at the cost of m extra
   * states instead of a rollback. δ (state units²) keeps P positive definite (the clone is
   * otherwise an exact linear function of the other states); use the variance of sample
   * handling, or a value far below R. The clone is not stored in the rollback history: do not
   * mix it with {@link #updateDelayed} across the same interval.
   *
   * @param model predicts the values to hold (m channels); it must not depend on the targets
   * @param targets m state indices that receive the clone
   * @param u inputs at this time
   * @param jitterVariance δ, ≥ 0
   */
  public void captureClone(MeasurementModel model, int[] targets, double[] u, double jitterVariance) {
    final int m = model.size();
    if (targets.length != m) {
      throw new IllegalArgumentException("model has " + m + " channels, got " + targets.length + " targets");
    }
    final double[] y = new double[m];
    final double[][] h = new double[m][n];
    model.evaluate(x, u, y, h);
    for (int t : targets) {
      for (int i = 0; i < m; i++) {
        h[i][t] = 0.0;
      }
    }
    final double[][] hp = new double[m][n];
    Matrices.multiply(h, p, hp);
    final double[][] hph = new double[m][m];
    Matrices.multiplyTransposed(hp, h, hph);
    for (int i = 0; i < m; i++) {
      x[targets[i]] = y[i];
    }
    for (int i = 0; i < m; i++) {
      final int ti = targets[i];
      for (int j = 0; j < n; j++) {
        p[ti][j] = hp[i][j];
        p[j][ti] = hp[i][j];
      }
    }
    for (int i = 0; i < m; i++) {
      for (int k = 0; k < m; k++) {
        p[targets[i]][targets[k]] = 0.5 * (hph[i][k] + hph[k][i]) + (i == k ? jitterVariance : 0.0);
      }
    }
  }

  /**
   * Replaces the continuous process noise density Q for the propagations that follow (for a
   * model whose input-noise mapping B Σ Bᵀ moves with the operating point).
   *
   * @param q n×n (state units²/s), symmetric positive semi-definite
   */
  public void setProcessNoiseDensity(double[][] q) {
    Matrices.requireShape(q, n, n, "Q");
    processNoiseDensity = Matrices.copy(q);
  }

  /** Number of times Φ was formed for a held Jacobian (a measure of the refresh rate). */
  public long transitionBuilds() {
    return phiBuilds;
  }

  // ---------------------------------------------------------------------------------------
  // history

  private Epoch newEpoch(double t) {
    final Epoch e = spareEpochs.isEmpty() ? new Epoch(n) : spareEpochs.pop();
    e.timeS = t;
    e.updates.clear();
    e.next = null;
    System.arraycopy(x, 0, e.xPrior, 0, n);
    Matrices.copyInto(p, e.pPrior);
    return e;
  }

  private Epoch currentEpoch() {
    return history.get(history.size() - 1);
  }

  private void closeEpoch(Propagation step) {
    currentEpoch().next = step;
    history.add(newEpoch(timeS));
    while (history.size() > settings.historyLength()) {
      spareEpochs.push(history.remove(0));
    }
  }

  // ---------------------------------------------------------------------------------------
  // accessors

  /**
   * Starts (or restarts) an open-loop covariance: from now on a copy of P propagated exactly as
   * P is (same Φ, same Q, same inflation) but never updated by a measurement. Comparing it
   * with P says how much of the uncertainty gathered since the restart the measurements
   * removed — an observability diagnostic along the trajectory actually flown.
   */
  public void restartOpenLoopCovariance() {
    openLoop = Matrices.copy(p);
    openLoopPendingS = 0.0;
    openLoopPendingQ = 0.0;
  }

  /**
   * Propagates the open-loop covariance of continuous steps in linearly implicit steps of
   * about {@code stepS} with the Jacobian at each step's end, instead of with every sub-step
   * as P (0, the default: exactly as P). For a diagnostic over minutes this keeps its meaning
   * (the slow parameter directions are random walks, propagated exactly; the fast plate
   * states forget their start within a step either way) at a fraction of the cost: tracked
   * exactly it cost as much as P itself, about 15 % of a replay. Discrete steps stay exact.
   */
  public void openLoopStepS(double stepS) {
    if (!(stepS >= 0.0)) {
      throw new IllegalArgumentException("open-loop step must be >= 0 s, got " + stepS);
    }
    flushOpenLoop();
    this.openLoopStepS = stepS;
  }

  /** The open-loop covariance (copy), or null when none was started. */
  public double[][] openLoopCovariance() {
    flushOpenLoop();
    return openLoop == null ? null : Matrices.copy(openLoop);
  }

  /** Diagonal of the open-loop covariance (copy), or null when none was started. */
  public double[] openLoopVariances() {
    flushOpenLoop();
    if (openLoop == null) {
      return null;
    }
    double[] d = new double[n];
    for (int i = 0; i < n; i++) {
      d[i] = openLoop[i][i];
    }
    return d;
  }

  /** Number of states n. */
  public int stateSize() {
    return n;
  }

  /** Present filter time (s). */
  public double timeS() {
    return timeS;
  }

  /** Copy of the present state estimate. */
  public double[] state() {
    return x.clone();
  }

  /** Copy of the present covariance (state units²). */
  public double[][] covariance() {
    return Matrices.copy(p);
  }

  /** One entry P[i][j] of the covariance, without copying the matrix. */
  public double covarianceEntry(int i, int j) {
    return p[i][j];
  }

  /** Factor λ ≥ 1 the next propagation applies to Q (1 when adaptation is off). */
  public double processNoiseInflation() {
    return settings.adaptiveProcessNoise() ? noiseAdapter.inflation() : 1.0;
  }

  /** Windowed NIS consistency. */
  public NisConsistency nisConsistency() {
    return nisWindow.summary();
  }

  /** Active drift alarms of one measurement model (empty if it was never used). */
  public List<DriftAlarm> driftAlarms(MeasurementModel model) {
    final InnovationCusum c = cusums.get(model);
    return c == null ? List.of() : c.activeAlarms();
  }

  /** Clears one channel's drift alarm and CUSUM statistics. */
  public void resetDriftAlarm(MeasurementModel model, int channel) {
    final InnovationCusum c = cusums.get(model);
    if (c != null) {
      c.reset(channel);
    }
  }

  /** Number of covariance repairs since construction. */
  public long repairCount() {
    return repairCount;
  }

  /** Number of delayed measurements dropped because they were older than the history. */
  public long lateDroppedCount() {
    return lateDroppedCount;
  }

  /** Time of the oldest stored epoch (s): delayed measurements before it are dropped. */
  public double historyStartTimeS() {
    return history.get(0).timeS;
  }

  /**
   * Replaces the covariance (for tests of the repair path and for re-initialisation). The next
   * update checks it and repairs it if it is not positive definite.
   *
   * @param newP n×n (state units²)
   */
  public void overwriteCovariance(double[][] newP) {
    Matrices.requireShape(newP, n, n, "P");
    Matrices.copyInto(newP, p);
  }

  // ---------------------------------------------------------------------------------------
  // internal types

  private sealed interface Propagation permits ContinuousStep, DiscreteStep {
    double dtS();
  }

  private record ContinuousStep(double[] u, double dtS, double inflation)
      implements Propagation {}

  private record DiscreteStep(double[][] phi, double[] offset, double[][] qd, double dtS)
      implements Propagation {}

  private record StoredUpdate(
      MeasurementModel model, double[] z, boolean[] available, double[][] r, double[] u) {}

  private static final class Epoch {
    double timeS;
    final double[] xPrior;
    final double[][] pPrior;
    final List<StoredUpdate> updates = new ArrayList<>(2);
    Propagation next;

    Epoch(int n) {
      xPrior = new double[n];
      pPrior = new double[n][n];
    }
  }

  private static final class UpdateWork {
    final double[] yhat;
    final double[][] h;
    final int[] avail;
    final int[] usedPos;
    final double[][] hpAll;
    final double[][] sAll;
    final double[][] s;
    final double[][] l;
    final double[] sinvNu;
    final double[][] kt;
    final double[][] dt;
    final double[] priorDiag;

    UpdateWork(int m, int n) {
      yhat = new double[m];
      h = new double[m][n];
      avail = new int[m];
      usedPos = new int[m];
      hpAll = new double[m][n];
      sAll = new double[m][m];
      s = new double[m][m];
      l = new double[m][m];
      sinvNu = new double[m];
      kt = new double[m][n];
      dt = new double[m][n];
      priorDiag = new double[n];
    }
  }
}
