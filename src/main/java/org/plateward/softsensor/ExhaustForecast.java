package org.plateward.softsensor;

import org.plateward.reactor.ModelEvaluation;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.OperatingPoint;
import org.plateward.reactor.PlateEnthalpy;
import org.plateward.reactor.PlateReactorModel;

/**
 * Open-loop forecast of the time until the buffer layer of some cell is fully melted, from a
 * plate state with the present inputs and parameters held. Linearly implicit (Rosenbrock-Euler)
 * steps e ← e + (I − hJ)⁻¹ h f(e), steps of 10 s over the first 600 s and 30 s after; the
 * crossing of e_k through the fully-melted enthalpy is interpolated linearly inside the step.
 *
 * <p>J is the filter's held Jacobian with each column j rescaled by s_j(e)/s_j(e₀), the slope
 * dT/de of cell j now over its slope at the start: the plate couples to its neighbours and the
 * gases through its temperature only, so ∂f/∂e_j = ∂f/∂T_j · dT/de_j. Without this, a
 * Jacobian taken below the melting band damps the enthalpy rise of a melting cell (where dT/de
 * is about 60 times smaller) and the forecast runs far too slow.
 */
public final class ExhaustForecast {
  private static final double FINE_STEP_S = 10.0;
  private static final double COARSE_STEP_S = 30.0;
  private static final double FINE_SPAN_S = 600.0;
  /**
   * Largest change of any cell in one step of the estimator's time-to-exhaust forecast, K of
   * sensible heat (a full melt is about 130): a guard against runaway, not an accuracy control
   * (at 100 K the halving and refactoring made the fuel-surge replay 2.5 times slower). That
   * forecast starts from the state its Jacobian was taken at, with the inputs it was taken at.
   */
  public static final double MAX_STEP_K = 400.0;
  /**
   * The same for the advisor's sigma-point marches ({@link #ExhaustForecast(PlateReactorModel, double)}):
   * they start from sigma points away from the Jacobian's state and run with trimmed inputs,
   * where 400 K steps ran away: at the fuel surge's melt-through a 5 % fuel trim forecast a peak
   * 140 K above holding; with 30 K the forecast peak falls with the trim as it must.
   */
  public static final double ADVISOR_MAX_STEP_K = 30.0;
  private final double maxStepK;
  private static final double MIN_STEP_S = 0.5;
  private double lastStepS;

  private final PlateReactorModel model;
  private final ModelEvaluation ev;
  private final int n;
  private final double meltEnd;
  private double[][] jRef;
  private double[] slopeRef;
  /** Solvers of I − hJ·diag(ratio) per step length. */
  private final java.util.Map<Double, ColumnScaledSolver> solvers = new java.util.HashMap<>();
  private int lastCell = -1;

  public ExhaustForecast(PlateReactorModel model) {
    this(model, MAX_STEP_K);
  }

  /**
   * @param model the plate model
   * @param maxStepK largest change of any cell in one step, K of sensible heat (steps are
   *     halved down to 0.5 s until none moves more)
   */
  public ExhaustForecast(PlateReactorModel model, double maxStepK) {
    this.maxStepK = maxStepK;
    this.model = model;
    this.ev = model.newEvaluation();
    this.n = model.cells();
    this.meltEnd = model.plate().meltEndJPerM2();
  }

  /**
   * Sets the cell block of df/de (1/s), N×N, and the state it belongs to.
   *
   * @param dfde the Jacobian (copied)
   * @param e0 plate enthalpy per cell at which it holds, J/m2
   */
  public void setJacobian(double[][] dfde, double[] e0) {
    setJacobian(dfde, e0, null);
  }

  /**
   * Sets the cell block of df/de and the dT/de its columns were built with. The forecast
   * marches one state, the mean, so each column is brought to the point slope at the marched
   * state: the estimator's Jacobian is linearised over each cell's spread, where a cell inside
   * the melting band keeps up to a third of the sensible slope. Rescaled from the point slope
   * instead, a melting cell stayed damped as if its temperature still rose, and on the fuel
   * surge forecasts taken in the band read 71 s where the plant melted through in 53 s, and
   * 84 s against 109 s just below it.
   *
   * @param dfde the Jacobian (copied)
   * @param e0 plate enthalpy per cell at which it holds, J/m2
   * @param builtSlopesKPerJ dT/de per cell of its columns, K per J/m2; null: the point slope at {@code e0}
   */
  public void setJacobian(double[][] dfde, double[] e0, double[] builtSlopesKPerJ) {
    jRef = new double[n][];
    for (int r = 0; r < n; r++) {
      jRef[r] = dfde[r].clone();
    }
    solvers.clear();
    slopeRef = new double[n];
    for (int j = 0; j < n; j++) {
      slopeRef[j] = builtSlopesKPerJ == null ? slope(e0[j]) : builtSlopesKPerJ[j];
    }
  }

  private double slope(double e) {
    double d = 0.2 * model.plate().sensibleJPerM2K(); // 0.2 K of sensible heat
    PlateEnthalpy pl = model.plate();
    return (pl.tempK(e + d) - pl.tempK(e - d)) / (2 * d);
  }

  /**
   * Solves (I − hJ·diag(ratio(e))) d = rhs. One factorisation per step length (a step halved
   * from 10 s to 0.5 s tries six lengths), updated exactly for the columns whose ratio moved
   * since ({@link ColumnScaledSolver}), refactorised when too many moved. Factors reused
   * within 10 % of the ratios, as before, had to be rebuilt at every step of a melting cell:
   * on the fuel surge that was 40 % of a replay's time at 100 cells.
   */
  private double[] solve(double[] e, double h, double[] rhs) {
    double[] ratio = new double[n];
    for (int j = 0; j < n; j++) {
      ratio[j] = slopeRef[j] > 0 ? slope(e[j]) / slopeRef[j] : 1.0;
    }
    ColumnScaledSolver s = solvers.get(h);
    double[] d = s == null ? null : s.solve(ratio, rhs);
    if (d == null) {
      s = new ColumnScaledSolver(jRef, h, ratio);
      solvers.put(h, s);
      d = s.solve(ratio, rhs);
    }
    return d;
  }

  /**
   * Seconds until some cell is fully melted, or +∞ if not within {@code horizonS}.
   *
   * @param e0 plate enthalpy per cell, J/m2 (not modified)
   * @param u inputs held
   * @param p parameters held
   * @param horizonS forecast horizon, s
   */
  public double secondsToExhaust(double[] e0, OperatingPoint u, ModelParameters p, double horizonS) {
    if (jRef == null) {
      throw new IllegalStateException("setJacobian first");
    }
    double[] e = e0.clone();
    for (int j = 0; j < n; j++) {
      if (e[j] >= meltEnd) {
        lastCell = j;
        return 0.0;
      }
    }
    double t = 0.0;
    double[] rhs = new double[n];
    while (t < horizonS) {
      boolean isFine = t < FINE_SPAN_S;
      double h = isFine ? FINE_STEP_S : COARSE_STEP_S;
      h = Math.min(h, horizonS - t);
      double[] d = step(e, u, p, h, rhs);
      h = lastStepS;
      double best = Double.POSITIVE_INFINITY;
      int cell = -1;
      for (int j = 0; j < n; j++) {
        double next = e[j] + d[j];
        if (next >= meltEnd && d[j] > 0.0) {
          double frac = (meltEnd - e[j]) / d[j];
          if (frac < best) {
            best = frac;
            cell = j;
          }
        }
      }
      if (cell >= 0) {
        lastCell = cell;
        return Math.min(horizonS, t + best * h) < horizonS ? t + best * h : Double.POSITIVE_INFINITY;
      }
      for (int j = 0; j < n; j++) {
        e[j] += d[j];
      }
      t += h;
    }
    lastCell = -1;
    return Double.POSITIVE_INFINITY;
  }

  /** Receives the plate state after each forecast step. */
  @FunctionalInterface
  public interface StepObserver {
    /**
     * @param tS time since the forecast start, s
     * @param e plate enthalpy per cell after the step, J/m2 (do not keep or modify)
     */
    void after(double tS, double[] e);
  }

  /**
   * Marches the open-loop forecast with the same steps as {@link #secondsToExhaust} over the
   * whole horizon (no early stop), reporting every step. The Jacobian set by {@link
   * #setJacobian} serves as J, column-rescaled as above; {@code u} may differ from the inputs it
   * was taken at (a changed fuel flow, say), which costs accuracy only through J.
   *
   * @param e0 plate enthalpy per cell at the start, J/m2 (not modified)
   * @param u inputs held
   * @param p parameters held
   * @param horizonS forecast horizon, s
   * @param observer called after each step
   * @return the plate enthalpy per cell at the horizon, J/m2
   */
  public double[] march(double[] e0, OperatingPoint u, ModelParameters p, double horizonS, StepObserver observer) {
    if (jRef == null) {
      throw new IllegalStateException("setJacobian first");
    }
    double[] e = e0.clone();
    double t = 0.0;
    double[] rhs = new double[n];
    while (t < horizonS - 1e-9) {
      double h = Math.min(t < FINE_SPAN_S ? FINE_STEP_S : COARSE_STEP_S, horizonS - t);
      double[] d = step(e, u, p, h, rhs); // (I - hJ) d = h f(e)
      h = lastStepS;
      for (int j = 0; j < n; j++) {
        e[j] += d[j];
      }
      t += h;
      observer.after(t, e);
    }
    return e;
  }

  /**
   * One linearly implicit step (I − hJ) d = h f(e), halved until no cell moves by more than
   * the step limit of sensible heat: far from the state its Jacobian was taken at (a
   * sigma point, a large trim) the held J can be poor and a full step runs away. The step
   * taken is left in {@link #lastStepS}.
   */
  private double[] step(double[] e, OperatingPoint u, ModelParameters p, double h, double[] rhs) {
    model.evaluate(e, u, p, ev);
    double limit = maxStepK * model.plate().sensibleJPerM2K();
    while (true) {
      for (int j = 0; j < n; j++) {
        rhs[j] = h * ev.enthalpyRateWPerM2(j);
      }
      double[] d = solve(e, h, rhs);
      double big = 0.0;
      for (double dj : d) {
        big = Math.max(big, Math.abs(dj));
      }
      if (!(big > limit) || h <= MIN_STEP_S) {
        lastStepS = h;
        return d;
      }
      h *= 0.5;
    }
  }

  /** Cell that melted through first in the last forecast (−1 if none). */
  public int lastCell() {
    return lastCell;
  }

  /** The plate model's enthalpy map (for callers that build states). */
  public PlateEnthalpy plate() {
    return model.plate();
  }
}
