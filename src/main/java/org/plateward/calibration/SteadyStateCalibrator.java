package org.plateward.calibration;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresProblem;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularMatrixException;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.apache.commons.math3.util.Pair;
import org.plateward.reactor.ModelEvaluation;
import org.plateward.reactor.ModelOutputs;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.PlateReactorModel;
import org.plateward.reactor.SteadyStateSolver;
import org.plateward.reactor.SteadySummary;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Fits the four {@link FittedParameter}s to the window means of steady windows: weighted least
 * squares on the steady-state model,
 *
 * <pre>
 *   min_theta  sum_w sum_m [ (h_m(e*_w(theta), u_w, p(theta)) - y_wm) / sigma_m ]^2,
 *   p_k = p0_k exp(theta_k)                         (log parameters: positive and well scaled)
 *   f(e*_w, u_w, p) = 0                             (steady state of window w, SteadyStateSolver)
 * </pre>
 *
 * by Commons Math's Levenberg-Marquardt optimiser; the Jacobian in theta comes from the implicit
 * function theorem at each window's steady state (see {@link #sensitivities}), so only one
 * steady state per window is solved per evaluation, warm-started from the window's last one.
 *
 * <p>Uncertainty: the covariance of theta is (J^T J)^-1 of the weighted Jacobian at the optimum,
 * scaled by the residual variance s^2 = chi^2 / (m - 4). The scaling is used because the
 * residuals of window means are not sensor noise: averaging removes most of the noise, and what
 * is left is model mismatch (grid, transport correlations) and instrument bias, whose size the
 * fit itself measures; the σ weights then set only the relative weight of the outputs (weighted
 * least squares with an unknown common variance factor; e.g. Seber and Wild, Nonlinear
 * Regression, 1989, §2.1 — from memory). Intervals are theta_k ± t_{0.975, m-4} sd_k, mapped to
 * p by exp, so they are asymmetric in p.
 *
 * <p>Not thread-safe (the model keeps caches).
 */
public final class SteadyStateCalibrator {
  private static final Logger LOG = LoggerFactory.getLogger(SteadyStateCalibrator.class);
  /** Forward-difference step in log parameters for df/dtheta at fixed plate state. */
  private static final double PARAM_STEP = 1e-6;
  /** Log parameters are kept within a factor 20 of the start. */
  private static final double MAX_LOG = Math.log(20.0);
  /** Weighted residual given to an output when the steady state cannot be found. */
  private static final double FAILED_RESIDUAL = 1e3;
  private static final double SINGULAR_RATIO = 1e-10;

  private final PlateReactorModel model;
  private final SteadyStateSolver solver;
  private final MeasurementSigmas sigmas;
  private final ModelEvaluation eval;
  private int maxIterations = 40;
  private long solves;

  public SteadyStateCalibrator(PlateReactorModel model, MeasurementSigmas sigmas) {
    this.model = model;
    this.solver = new SteadyStateSolver(model);
    this.sigmas = sigmas;
    this.eval = model.newEvaluation();
  }

  /** Steady-state solves so far. */
  public long solves() {
    return solves;
  }

  /**
   * Fits the parameters.
   *
   * @param windows the steady windows (at least one; each with at least one measured output)
   * @param start where the fit starts (and the reference p0 of the log parameters)
   * @throws IllegalArgumentException when there are fewer residuals than five
   * @throws org.apache.commons.math3.exception.TooManyIterationsException when it does not
   *     converge
   */
  public CalibrationResult fit(List<SteadyWindow> windows, ModelParameters start) {
    int nw = windows.size();
    double[] p0 = FittedParameter.values(start);
    List<int[]> index = new ArrayList<>(); // {window, output}
    for (int w = 0; w < nw; w++) {
      for (int m = 0; m < ModelOutputs.COUNT; m++) {
        if (Double.isFinite(windows.get(w).outputSi(m))) {
          index.add(new int[] {w, m});
        }
      }
    }
    int np = FittedParameter.COUNT;
    int mres = index.size();
    if (mres <= np) {
      throw new IllegalArgumentException("the windows hold " + mres + " measured means; the fit of "
          + np + " parameters needs more than " + np);
    }
    // warm starts: window 0 from the hot (lit) start, each further window from the one before
    double[][] warm = new double[nw][];
    for (int w = 0; w < nw; w++) {
      warm[w] = new double[model.cells()];
      if (w == 0) {
        model.uniformState(SteadySummary.HOT_START_K, warm[w]);
      } else {
        System.arraycopy(warm[w - 1], 0, warm[w], 0, warm[w].length);
      }
      steadyOutputs(windows.get(w), start, warm[w], true);
    }
    double[][] lastY = new double[nw][ModelOutputs.COUNT];

    LeastSquaresProblem problem = new LeastSquaresBuilder()
        .start(new double[np])
        .target(new double[mres])
        .model(point -> valueAndJacobian(point, p0, windows, index, warm, lastY))
        .parameterValidator(v -> {
          RealVector c = v.copy();
          for (int k = 0; k < c.getDimension(); k++) {
            c.setEntry(k, Math.max(-MAX_LOG, Math.min(MAX_LOG, c.getEntry(k))));
          }
          return c;
        })
        .maxIterations(maxIterations)
        .maxEvaluations(4 * maxIterations)
        .lazyEvaluation(false)
        .build();
    LeastSquaresOptimizer.Optimum opt = new LevenbergMarquardtOptimizer()
        .withCostRelativeTolerance(1e-8)
        .withParameterRelativeTolerance(1e-6)
        .optimize(problem);

    double[] theta = opt.getPoint().toArray();
    // outputs at the optimum (the last evaluation need not be the optimum)
    double[][] predicted = new double[nw][];
    for (int w = 0; w < nw; w++) {
      predicted[w] = steadyOutputs(windows.get(w), paramsAt(theta, p0), warm[w], true);
    }
    double chi2 = 0.0;
    for (int[] im : index) {
      double r = (predicted[im[0]][im[1]] - windows.get(im[0]).outputSi(im[1])) / sigmas.sigmaSi(im[1]);
      chi2 += r * r;
    }
    int dof = mres - np;
    double s2 = chi2 / dof;
    double t = new TDistribution(dof).inverseCumulativeProbability(0.975);

    RealMatrix jac = opt.getJacobian();
    SingularValueDecomposition svd = new SingularValueDecomposition(jac);
    double[] sv = svd.getSingularValues();
    double cond = sv[sv.length - 1] > 0 ? sv[0] / sv[sv.length - 1] : Double.POSITIVE_INFINITY;
    double[] weakest = svd.getV().getColumn(sv.length - 1);
    boolean singular = !(sv[sv.length - 1] > SINGULAR_RATIO * sv[0]);
    RealMatrix cov = null;
    if (!singular) {
      try {
        cov = opt.getCovariances(1e-14).scalarMultiply(s2);
      } catch (SingularMatrixException e) {
        singular = true;
      }
    }
    List<ParameterEstimate> est = new ArrayList<>();
    double[][] corr = new double[np][np];
    for (FittedParameter fp : FittedParameter.values()) {
      int k = fp.ordinal();
      double value = p0[k] * Math.exp(theta[k]);
      if (cov == null) {
        est.add(new ParameterEstimate(fp, p0[k], value, Double.NaN, 0.0, Double.POSITIVE_INFINITY, false));
        java.util.Arrays.fill(corr[k], Double.NaN);
        continue;
      }
      double sdTheta = Math.sqrt(cov.getEntry(k, k));
      double half = t * sdTheta;
      boolean ok = half < Math.log(CalibrationResult.IDENTIFIABLE_FACTOR);
      est.add(new ParameterEstimate(fp, p0[k], value, value * sdTheta,
          value * Math.exp(-half), value * Math.exp(half), ok));
      for (int j = 0; j < np; j++) {
        corr[k][j] = cov.getEntry(k, j) / Math.sqrt(cov.getEntry(k, k) * cov.getEntry(j, j));
      }
    }
    double[][] measured = new double[nw][];
    double[] sig = new double[ModelOutputs.COUNT];
    for (int w = 0; w < nw; w++) {
      measured[w] = windows.get(w).outputsSi();
    }
    for (int m = 0; m < ModelOutputs.COUNT; m++) {
      sig[m] = sigmas.sigmaSi(m);
    }
    LOG.info("calibration: windows={} residuals={} iterations={} evaluations={} chi2={} solves={}",
        nw, mres, opt.getIterations(), opt.getEvaluations(), chi2, solves);
    return new CalibrationResult(windows, est, paramsAt(theta, p0), corr, measured, predicted, sig,
        chi2, mres, dof, s2, t, opt.getIterations(), opt.getEvaluations(), singular, cond, weakest);
  }

  private static ModelParameters paramsAt(double[] theta, double[] p0) {
    double[] v = new double[p0.length];
    for (int k = 0; k < p0.length; k++) {
      v[k] = p0[k] * Math.exp(theta[k]);
    }
    return FittedParameter.toParameters(v);
  }

  private Pair<RealVector, RealMatrix> valueAndJacobian(
      RealVector point, double[] p0, List<SteadyWindow> windows, List<int[]> index, double[][] warm,
      double[][] lastY) {
    double[] theta = point.toArray();
    ModelParameters p = paramsAt(theta, p0);
    int np = theta.length;
    int nw = windows.size();
    double[][] base = new double[nw][];
    double[][][] dy = new double[nw][][];
    for (int w = 0; w < nw; w++) {
      base[w] = steadyOutputs(windows.get(w), p, warm[w], true);
      if (base[w] != null) {
        dy[w] = sensitivities(windows.get(w), theta, p0, warm[w]);
      }
    }
    double[] r = weighted(base, windows, index);
    Array2DRowRealMatrix jac = new Array2DRowRealMatrix(r.length, np);
    for (int i = 0; i < r.length; i++) {
      int w = index.get(i)[0];
      int m = index.get(i)[1];
      for (int k = 0; k < np; k++) {
        jac.setEntry(i, k, dy[w] == null ? 0.0 : dy[w][m][k] / sigmas.sigmaSi(m));
      }
    }
    for (int w = 0; w < nw; w++) {
      lastY[w] = base[w];
    }
    return new Pair<>(new ArrayRealVector(r, false), jac);
  }

  /**
   * dy/dtheta of one window's steady outputs by the implicit function theorem at the steady
   * state e*, without re-solving:
   *
   * <pre>
   *   f(e*(theta), theta) = 0   =>   de/dtheta = -(df/de)^-1 df/dtheta
   *   dy/dtheta = dh/dtheta + dh/de de/dtheta
   * </pre>
   *
   * df/de and dh/de from the model's structured Jacobian; df/dtheta and dh/dtheta by forward
   * differences of single evaluations at fixed e*. Returns [output][parameter].
   */
  private double[][] sensitivities(SteadyWindow w, double[] theta, double[] p0, double[] e) {
    int n = model.cells();
    int no = ModelOutputs.COUNT;
    int np = theta.length;
    ModelParameters p = paramsAt(theta, p0);
    model.evaluate(e, w.inputs(), p, eval);
    double[] f0 = eval.enthalpyRateWPerM2();
    double[] y0 = new double[no];
    for (int m = 0; m < no; m++) {
      y0[m] = eval.output(m);
    }
    double[][] dfde = new double[n][n];
    double[][] dhde = new double[no][n];
    model.jacobian(e, w.inputs(), p, eval, dfde, dhde);
    double[][] dfdt = new double[n][np];
    double[][] dhdt = new double[no][np];
    for (int k = 0; k < np; k++) {
      double[] tk = theta.clone();
      tk[k] += PARAM_STEP;
      model.evaluate(e, w.inputs(), paramsAt(tk, p0), eval);
      for (int j = 0; j < n; j++) {
        dfdt[j][k] = (eval.enthalpyRateWPerM2(j) - f0[j]) / PARAM_STEP;
      }
      for (int m = 0; m < no; m++) {
        dhdt[m][k] = (eval.output(m) - y0[m]) / PARAM_STEP;
      }
    }
    RealMatrix dedt;
    try {
      dedt = new LUDecomposition(new Array2DRowRealMatrix(dfde, false)).getSolver()
          .solve(new Array2DRowRealMatrix(dfdt, false)).scalarMultiply(-1.0);
    } catch (SingularMatrixException ex) {
      LOG.debug("singular steady-state Jacobian for window at {}", w.from());
      return null;
    }
    double[][] out = new double[no][np];
    for (int m = 0; m < no; m++) {
      for (int k = 0; k < np; k++) {
        double s = dhdt[m][k];
        for (int j = 0; j < n; j++) {
          s += dhde[m][j] * dedt.getEntry(j, k);
        }
        out[m][k] = s;
      }
    }
    return out;
  }

  private double[] weighted(double[][] y, List<SteadyWindow> windows, List<int[]> index) {
    double[] r = new double[index.size()];
    for (int i = 0; i < r.length; i++) {
      int w = index.get(i)[0];
      int m = index.get(i)[1];
      if (y[w] == null) {
        r[i] = FAILED_RESIDUAL;
      } else {
        // r = (h_m - y_m) / sigma_m
        r[i] = (y[w][m] - windows.get(w).outputSi(m)) / sigmas.sigmaSi(m);
      }
    }
    return r;
  }

  /**
   * The model's steady outputs for one window, SI; null when no steady state is found (from the
   * warm start, then from the hot start). With {@code keep} the solution becomes the window's
   * next warm start.
   */
  private double[] steadyOutputs(SteadyWindow w, ModelParameters p, double[] warm, boolean keep) {
    double[] e;
    try {
      solves++;
      e = solver.solve(w.inputs(), p, warm).enthalpyJPerM2();
    } catch (SteadyStateSolver.NotConvergedException ex) {
      double[] hot = new double[model.cells()];
      model.uniformState(SteadySummary.HOT_START_K, hot);
      try {
        solves++;
        e = solver.solve(w.inputs(), p, hot).enthalpyJPerM2();
      } catch (SteadyStateSolver.NotConvergedException ex2) {
        LOG.debug("no steady state for window at {}: {}", w.from(), ex2.getMessage());
        return null;
      }
    }
    if (keep) {
      System.arraycopy(e, 0, warm, 0, e.length);
    }
    model.evaluate(e, w.inputs(), p, eval);
    double[] y = new double[ModelOutputs.COUNT];
    for (int m = 0; m < y.length; m++) {
      y[m] = eval.output(m);
    }
    return y;
  }
}
