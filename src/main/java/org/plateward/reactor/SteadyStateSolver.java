package org.plateward.reactor;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.SingularMatrixException;

/**
 * Solves f(e, u, p) = 0 for the plate enthalpies: Newton with the model Jacobian and a
 * backtracking line search, falling back to pseudo-transient continuation with switched
 * evolution relaxation (Kelley and Keyes 1998, SIAM J. Numer. Anal. 35, 508) when Newton
 * stalls. Residuals are measured as max_j |f_j| / C (K/s of sensible heating).
 */
public final class SteadyStateSolver {
  /** Converged when every cell's residual heating rate is below this, K/s. */
  public static final double TOLERANCE_K_PER_S = 1e-9;
  private static final int NEWTON_ITERATIONS = 40;
  private static final int CONTINUATION_STEPS = 800;
  /** Largest plate temperature change one step may make, K. */
  private static final double MAX_STEP_K = 50.0;
  private static final double MIN_TEMP_K = 250.0;
  private static final double MAX_TEMP_K = 2500.0;

  /** The steady state and how it was found. */
  public record Result(double[] enthalpyJPerM2, int iterations, double residualKPerS, boolean usedContinuation) {
    public Result {
      enthalpyJPerM2 = enthalpyJPerM2.clone();
    }

    @Override
    public double[] enthalpyJPerM2() {
      return enthalpyJPerM2.clone();
    }
  }

  /** Thrown when neither Newton nor continuation reaches the tolerance. */
  public static final class NotConvergedException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    NotConvergedException(String message) {
      super(message);
    }
  }

  private static final boolean DEBUG = Boolean.getBoolean("plateward.debug");
  private final PlateReactorModel model;
  private final ModelEvaluation eval;
  private final double[][] jac;
  private final int n;

  public SteadyStateSolver(PlateReactorModel model) {
    this.model = model;
    this.n = model.cells();
    this.eval = model.newEvaluation();
    this.jac = new double[n][n];
  }

  /**
   * Finds the steady state from {@code initial} (a hot profile finds the lit branch).
   *
   * @throws NotConvergedException with the residual reached and the cell where it is largest
   */
  public Result solve(OperatingPoint u, ModelParameters p, double[] initial) {
    double[] e = initial.clone();
    double c = model.plate().sensibleJPerM2K();
    double r = residual(e, u, p);
    double l2 = lastL2;
    int it = 0;
    boolean newtonOk = true;
    while (r > TOLERANCE_K_PER_S && it < NEWTON_ITERATIONS) {
      it++;
      double[] step = newtonStep(e, u, p, 0.0);
      if (step == null) {
        newtonOk = false;
        break;
      }
      double lambda = 1.0;
      double[] trial = new double[n];
      double rt = Double.POSITIVE_INFINITY;
      while (lambda > 1e-4) {
        for (int j = 0; j < n; j++) {
          trial[j] = e[j] + lambda * step[j];
        }
        rt = residual(trial, u, p);
        if (lastL2 < (1.0 - 1e-4 * lambda) * l2 || rt <= TOLERANCE_K_PER_S) {
          break;
        }
        lambda *= 0.5;
      }
      if (!(lastL2 < l2) && rt > TOLERANCE_K_PER_S) {
        newtonOk = false;
        break;
      }
      e = trial;
      r = rt;
      l2 = lastL2;
      if (DEBUG) System.err.printf("newton %d lambda %.3g r %.3g l2 %.3g%n", it, lambda, r, l2);
    }
    if (r <= TOLERANCE_K_PER_S) {
      return new Result(e, it, r, false);
    }
    // pseudo-transient continuation: (I/dtau - J) d = f, dtau grows as the residual falls
    double dtau = 1.0;
    e = newtonOk ? e : initial.clone();
    r = residual(e, u, p);
    for (int k = 0; k < CONTINUATION_STEPS; k++) {
      it++;
      double[] step = newtonStep(e, u, p, 1.0 / dtau);
      if (step == null) {
        dtau *= 0.25;
        continue;
      }
      double[] trial = new double[n];
      for (int j = 0; j < n; j++) {
        trial[j] = e[j] + step[j];
      }
      double rt = residual(trial, u, p);
      if (!Double.isFinite(rt)) {
        dtau *= 0.25;
        continue;
      }
      dtau = Math.min(1e12, dtau * Math.max(0.2, Math.min(10.0, r / rt)));
      e = trial;
      r = rt;
      if (DEBUG && k % 20 == 0) System.err.printf("ptc %d dtau %.3g r %.3g%n", k, dtau, r);
      if (r <= TOLERANCE_K_PER_S) {
        return new Result(e, it, r, true);
      }
    }
    residual(e, u, p);
    int worst = 0;
    for (int j = 0; j < n; j++) {
      if (Math.abs(eval.dedt[j]) > Math.abs(eval.dedt[worst])) {
        worst = j;
      }
    }
    throw new NotConvergedException(String.format(java.util.Locale.ROOT,
        "steady state not found after %d iterations (Newton, then pseudo-transient continuation): "
            + "residual %.3g K/s, largest in cell %d at z = %.3f m (plate %.1f K); "
            + "check the operating point and that the unit can stay lit",
        it, r, worst, model.grid().centreM(worst), eval.plateK[worst]));
  }

  /** Root-mean-square residual of the last {@link #residual} call, K/s. */
  private double lastL2;

  /** Largest residual heating rate over the cells, K/s; also sets {@link #lastL2}. */
  private double residual(double[] e, OperatingPoint u, ModelParameters p) {
    lastL2 = Double.POSITIVE_INFINITY;
    for (double ej : e) {
      double t = model.plate().tempK(ej);
      if (!(t > MIN_TEMP_K && t < MAX_TEMP_K)) {
        return Double.POSITIVE_INFINITY;
      }
    }
    model.evaluate(e, u, p, eval);
    double c = model.plate().sensibleJPerM2K();
    double m = 0.0;
    double sq = 0.0;
    for (int j = 0; j < n; j++) {
      double v = Math.abs(eval.dedt[j]) / c;
      if (!Double.isFinite(v)) {
        return Double.POSITIVE_INFINITY;
      }
      m = Math.max(m, v);
      sq += v * v;
    }
    lastL2 = Math.sqrt(sq / n);
    return m;
  }

  /** Solves (shift I - J) d = f at e; null when singular. Leaves eval at e. */
  private double[] newtonStep(double[] e, OperatingPoint u, ModelParameters p, double shift) {
    model.evaluate(e, u, p, eval);
    model.jacobian(e, u, p, eval, jac, null);
    Array2DRowRealMatrix a = new Array2DRowRealMatrix(n, n);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        a.setEntry(i, j, (i == j ? shift : 0.0) - jac[i][j]);
      }
    }
    try {
      DecompositionSolver s = new LUDecomposition(a, 1e-300).getSolver();
      double[] d = s.solve(new ArrayRealVector(eval.dedt, true)).toArray();
      double c = model.plate().sensibleJPerM2K();
      double worst = 0.0;
      for (double v : d) {
        worst = Math.max(worst, Math.abs(v) / c);
      }
      if (worst > MAX_STEP_K) {
        double scale = MAX_STEP_K / worst;
        for (int i = 0; i < n; i++) {
          d[i] *= scale;
        }
      }
      return d;
    } catch (SingularMatrixException ex) {
      return null;
    }
  }
}
