package org.plateward.plant;

import org.plateward.reactor.Grid;
import org.plateward.reactor.ModelEvaluation;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.OperatingPoint;
import org.plateward.reactor.PlateEnthalpy;
import org.plateward.reactor.PlateReactorModel;

/**
 * Time integration of de/dt = f(e) for the truth plate: a linearly implicit (Rosenbrock-Euler
 * type, "W-method") step whose approximate Jacobian J is the stiff, local part of f only, axial
 * conduction and heat loss:
 *
 * <pre>
 *   (I - h J) de = h f(e_n),   e_{n+1} = e_n + de,   J = A D
 *   (A T)_j = [G_{j-1/2} (T_{j-1} - T_j) + G_{j+1/2} (T_{j+1} - T_j)] / dz_j - U T_j
 *   D = diag(dT/de) at e_n (1/C outside the mushy band, far smaller inside it)
 * </pre>
 *
 * J is tridiagonal, so each step costs one model evaluation plus one Thomas solve. Gas
 * exchange and reaction heat stay explicit: their rate is about (h_ref + h_comb) / C ≈ 0.04 1/s
 * for the demo unit, so a 1 s step is far inside the explicit limit, while conduction between
 * 3 mm cells (G / (C dz^2) ≈ 3 1/s) would not be. Any J gives a first-order consistent method
 * (Hairer and Wanner, Solving ODEs II, sec. IV.7, W-methods); with the conduction part implicit
 * it is stable at the sample period. Accuracy is checked against steps eight times smaller.
 *
 * <p>Energy: the conduction rows of J conserve energy (dz_j-weighted column sums are zero), so
 * the stored-energy change per step is h times (net gas enthalpy inflow minus heat loss at the
 * linearly extrapolated temperature), which the tests check.
 */
public final class ConductionImplicitStepper {
  private final PlateReactorModel model;
  private final PlateEnthalpy plate;
  private final int n;
  private final double[] dz;
  private final double[] dTde;
  private final double[] g; // interface conductances, W/K per m width... times m, between j and j+1
  private final double[] lower;
  private final double[] diag;
  private final double[] upper;
  private final double[] rhs;
  private final double[] cPrime;
  private final ModelEvaluation eval;
  private final double probe;

  public ConductionImplicitStepper(PlateReactorModel model) {
    this.model = model;
    this.plate = model.plate();
    this.n = model.cells();
    Grid grid = model.grid();
    dz = new double[n];
    for (int j = 0; j < n; j++) {
      dz[j] = grid.widthM(j);
    }
    dTde = new double[n];
    g = new double[n];
    lower = new double[n];
    diag = new double[n];
    upper = new double[n];
    rhs = new double[n];
    cPrime = new double[n];
    eval = model.newEvaluation();
    probe = 1e-3 * plate.sensibleJPerM2K(); // one millikelvin of sensible heat
  }

  /** The evaluation of f at the state before the last step (reused by callers for outputs). */
  public ModelEvaluation lastEvaluation() {
    return eval;
  }

  /**
   * Advances {@code e} (J/m2 per cell, in place) by {@code hS} seconds at constant inputs and
   * parameters. After the call {@link #lastEvaluation()} holds f at the state before the step.
   */
  public void step(double[] e, OperatingPoint u, ModelParameters p, double hS) {
    model.evaluate(e, u, p, eval);
    step(e, p, hS, eval);
  }

  /**
   * Advances {@code e} by {@code hS} seconds using {@code ev}, which must hold the model
   * evaluated at exactly this {@code e} (and the inputs and parameters p of the step): saves the
   * evaluation when the caller has just made it for the outputs.
   */
  public void step(double[] e, ModelParameters p, double hS, ModelEvaluation ev) {
    double loss = p.heatLossCoefficientWPerM2K();
    double sensible = 1.0 / plate.sensibleJPerM2K();
    double bandLow = plate.meltStartJPerM2() - probe;
    double bandHigh = plate.meltEndJPerM2() + probe;
    for (int j = 0; j < n; j++) {
      if (e[j] < bandLow || e[j] > bandHigh) {
        dTde[j] = sensible; // outside the mushy band T = Tref + (e - Lambda phi) / C exactly
      } else {
        // central secant of T(e) over +-1 mK of sensible heat
        dTde[j] = (plate.tempK(e[j] + probe) - plate.tempK(e[j] - probe)) / (2.0 * probe);
      }
    }
    for (int j = 0; j < n - 1; j++) {
      double ra = 0.5 * dz[j] / plate.axialConductanceWPerK(ev.meltFraction(j));
      double rb = 0.5 * dz[j + 1] / plate.axialConductanceWPerK(ev.meltFraction(j + 1));
      g[j] = 1.0 / (ra + rb);
    }
    for (int j = 0; j < n; j++) {
      double gl = j > 0 ? g[j - 1] : 0.0;
      double gr = j < n - 1 ? g[j] : 0.0;
      // row j of I - h A D
      lower[j] = j > 0 ? -hS * gl / dz[j] * dTde[j - 1] : 0.0;
      upper[j] = j < n - 1 ? -hS * gr / dz[j] * dTde[j + 1] : 0.0;
      diag[j] = 1.0 + hS * ((gl + gr) / dz[j] + loss) * dTde[j];
      rhs[j] = hS * ev.enthalpyRateWPerM2(j);
    }
    solveTridiagonal();
    for (int j = 0; j < n; j++) {
      e[j] += rhs[j];
    }
  }

  /** Thomas algorithm, in place on rhs (the matrix is diagonally dominant, no pivoting needed). */
  private void solveTridiagonal() {
    cPrime[0] = upper[0] / diag[0];
    rhs[0] = rhs[0] / diag[0];
    for (int j = 1; j < n; j++) {
      double m = diag[j] - lower[j] * cPrime[j - 1];
      cPrime[j] = upper[j] / m;
      rhs[j] = (rhs[j] - lower[j] * rhs[j - 1]) / m;
    }
    for (int j = n - 2; j >= 0; j--) {
      rhs[j] -= cPrime[j] * rhs[j + 1];
    }
  }
}
