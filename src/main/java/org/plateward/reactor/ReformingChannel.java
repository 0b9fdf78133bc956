package org.plateward.reactor;

import org.plateward.kinetics.XuFromentKinetics;

/**
 * Quasi-steady march of one reforming channel in +z (Xu-Froment reforming and shift on the
 * nickel washcoat of both walls, evaluated at the plate temperature).
 *
 * <p>Composition changes through two extents per cell, a = CH4 consumed (= r1 + r3) and
 * b = CO2 formed (= r2 + r3); all species follow from them, so the C, H, O and N balances
 * hold by construction. The extents solve the backward-Euler cell balance
 * (a, b) = m_cat (r1 + r3, r2 + r3) evaluated at the cell outlet composition (stable however
 * fast the reaction), solved by a safeguarded Newton iteration that keeps every species flow
 * non-negative.
 *
 * <p>That balance is a stirred tank per step, first-order accurate in the step's length: on a
 * grid refined at the front, 10 mm background cells converted 0.9771 of the methane where the
 * converged march converts 0.9795, and the estimator answered the outlet analyzer by raising
 * the reforming activity 4 % and put the hidden peak 3.4 K low. A cell wider than the grid's
 * narrowest is therefore marched in equal reaction sub-steps ({@link #reactionSubSteps}), all
 * at the cell's plate temperature; the gas-to-plate exchange stays one per cell. On a uniform
 * grid nothing changes.
 */
final class ReformingChannel {
  private static final int CH4 = 0;
  private static final int H2O = 1;
  private static final int CO = 2;
  private static final int CO2 = 3;
  private static final int H2 = 4;
  private static final int NS = GasFlux.NS;
  private static final int NC = XuFromentKinetics.CONSTANTS;

  private final int cells;
  /** Nickel catalyst mass per cell per channel (both walls, coated part only), kg. */
  private final double[] catalystKg;
  /** Wall area per cell per channel (both walls), m2. */
  private final double[] wallAreaM2;
  private final double hydraulicDiameterM;
  private final double nusselt;
  /** Rate constants per cell at the base plate temperatures. */
  private final double[][] constantsCache;

  private final double[] constantsScratch = new double[NC];
  private final int[] subSteps;
  private final double[] work = new double[NS];
  private final double[] x = new double[NS];
  private final double[] r = new double[3];
  private final double[] q = new double[2];
  private final double[] lambdaScratch = new double[NS];
  private final GasFlux gas = new GasFlux();

  ReformingChannel(Geometry g, Grid grid, double loadingKgPerM2, double nusselt) {
    this.cells = grid.cells();
    this.catalystKg = new double[cells];
    this.wallAreaM2 = new double[cells];
    for (int j = 0; j < cells; j++) {
      double a = grid.faceM(j);
      double b = grid.faceM(j + 1);
      wallAreaM2[j] = 2.0 * g.widthM() * (b - a);
      catalystKg[j] = loadingKgPerM2 * 2.0 * g.widthM() * Geometry.coatedLengthM(g.reformingCoating(), a, b);
    }
    this.hydraulicDiameterM = 2.0 * g.reformingGapM();
    this.nusselt = nusselt;
    this.constantsCache = new double[cells][NC];
    this.subSteps = reactionSubSteps(grid);

  }

  /**
   * Marches cells {@code from..N-1}. Face {@code from} of {@code out} must hold the inlet of
   * cell {@code from}. With {@code perturbed >= 0}, that cell's rate constants are computed
   * afresh and all others come from the cache; with {@code perturbed < 0} every cell's are
   * computed and cached.
   */
  void march(
      double[] plateK, double activity, double htMultiplier, double pressurePa, int from,
      int perturbed, ChannelState out) {
    double pBar = pressurePa * 1e-5;
    double[] f = out.flows;
    for (int j = from; j < cells; j++) {
      int in = j * NS;
      int o = in + NS;
      double tw = plateK[j];
      double[] c;
      if (perturbed < 0) {
        c = constantsCache[j];
        GasTables.xuFromentConstants(tw, c);
      } else if (j == perturbed) {
        c = constantsScratch;
        GasTables.xuFromentConstants(tw, c);
      } else {
        c = constantsCache[j];
      }
      double mcat = catalystKg[j] * activity;
      double a = 0.0;
      double b = 0.0;
      if (mcat > 0.0) {
        int m = subSteps[j];
        if (m == 1) {
          double[] ab = solveExtents(f, in, c, mcat, pBar);
          a = ab[0];
          b = ab[1];
        } else {
          System.arraycopy(f, in, work, 0, NS);
          for (int s = 0; s < m; s++) {
            double[] ab = solveExtents(work, 0, c, mcat / m, pBar);
            work[CH4] -= ab[0];
            work[H2O] -= ab[0] + ab[1];
            work[CO] += ab[0] - ab[1];
            work[CO2] += ab[1];
            work[H2] += 3.0 * ab[0] + ab[1];
            a += ab[0];
            b += ab[1];
          }
        }
      }
      f[o + CH4] = f[in + CH4] - a;
      f[o + H2O] = f[in + H2O] - a - b;
      f[o + CO] = f[in + CO] + a - b;
      f[o + CO2] = f[in + CO2] + b;
      f[o + H2] = f[in + H2] + 3.0 * a + b;
      f[o + 5] = f[in + 5];
      f[o + 6] = f[in + 6];
      double tin = out.tempK[j];
      GasFlux.moleFractions(f, o, x);
      double film = 0.5 * (tin + tw);
      double h = htMultiplier * nusselt * GasTables.conductivityWPerMK(x, film, lambdaScratch) / hydraulicDiameterM;
      out.tempK[j + 1] = gas.exchange(f, in, o, tin, tw, h * wallAreaM2[j], q);
      out.reactionHeatW[j] = q[1];
      out.heatToPlateW[j] = q[1] - q[0];
    }
  }

  /**
   * Reaction sub-steps per cell: enough that none is wider than the grid's narrowest cell (a
   * quarter of a width of slack), so a uniform grid keeps one per cell.
   */
  static int[] reactionSubSteps(Grid grid) {
    double narrowest = Double.POSITIVE_INFINITY;
    for (int j = 0; j < grid.cells(); j++) {
      narrowest = Math.min(narrowest, grid.widthM(j));
    }
    int[] m = new int[grid.cells()];
    for (int j = 0; j < m.length; j++) {
      m[j] = Math.max(1, (int) Math.ceil(grid.widthM(j) / narrowest - 0.25));
    }
    return m;
  }

  private final double[] ab = new double[2];
  private final double[] g0 = new double[2];
  private final double[] ga = new double[2];
  private final double[] gb = new double[2];

  /**
   * Backward-Euler extents (a, b) of one cell: the root of (a, b) = g(a, b) by Newton with a
   * fresh finite-difference Jacobian each iteration, safeguarded so no flow goes negative,
   * converged to 1e-12 of the flow. Converging fully (rather than a fixed number of steps)
   * makes the march a smooth function of the plate temperatures, which the steady-state
   * Newton and the estimator's Jacobian rely on.
   */
  private double[] solveExtents(double[] f, int in, double[] c, double mcat, double pBar) {
    double nTot = GasFlux.total(f, in);
    double da = 1e-7 * nTot;
    double tol = 1e-12 * nTot;
    // Every solve starts from zero extent, so f is a pure function of its arguments. A cell
    // is a small stirred tank: with autocatalysis near the hydrogen-poor inlet it can have
    // more than one root, and a start elsewhere (a warm start was tried) can select another.
    double a = 0.0;
    double b = 0.0;
    for (int it = 0; it < MAX_NEWTON; it++) {
      cellRates(f, in, nTot, a, b, c, mcat, pBar, g0);
      cellRates(f, in, nTot, a + da, b, c, mcat, pBar, ga);
      cellRates(f, in, nTot, a, b + da, c, mcat, pBar, gb);
      // M = I - dg/d(a,b);  M d = g(a, b) - (a, b)
      double m11 = 1.0 - (ga[0] - g0[0]) / da;
      double m21 = -(ga[1] - g0[1]) / da;
      double m12 = -(gb[0] - g0[0]) / da;
      double m22 = 1.0 - (gb[1] - g0[1]) / da;
      double det = m11 * m22 - m12 * m21;
      double ra = g0[0] - a;
      double rb = g0[1] - b;
      double d1 = (m22 * ra - m12 * rb) / det;
      double d2 = (m11 * rb - m21 * ra) / det;
      safeguard(f, in, a, b, d1, d2, step);
      a += step[0];
      b += step[1];
      if (Math.abs(step[0]) + Math.abs(step[1]) <= tol) {
        break;
      }
    }
    ab[0] = a;
    ab[1] = b;
    return ab;
  }

  private static final int MAX_NEWTON = 40;


  /**
   * Safeguards a step (d1, d2) from (a, b) so that every species flow stays non-negative:
   * a constraint already at zero removes the step's component that would make it negative
   * (projection onto that constraint line), the others are kept strictly positive by
   * fraction-to-the-boundary scaling. Returns the step in {@code step}.
   */
  private void safeguard(double[] f, int in, double a, double b, double d1, double d2, double[] step) {
    // species flow = value + ca * a' + cb * b' for each of CH4, H2O, CO, CO2, H2
    double[] value = this.value;
    value[0] = f[in + CH4] - a;
    value[1] = f[in + H2O] - a - b;
    value[2] = f[in + CO] + a - b;
    value[3] = f[in + CO2] + b;
    value[4] = f[in + H2] + 3.0 * a + b;
    for (int k = 0; k < 5; k++) {
      double slope = CA[k] * d1 + CB[k] * d2;
      if (slope < 0.0 && value[k] <= 1e-14 * f[in + CH4]) {
        double nn = CA[k] * CA[k] + CB[k] * CB[k];
        d1 -= slope / nn * CA[k];
        d2 -= slope / nn * CB[k];
      }
    }
    double s = 1.0;
    for (int k = 0; k < 5; k++) {
      double slope = CA[k] * d1 + CB[k] * d2;
      if (slope < 0.0 && value[k] + s * slope < 0.0) {
        s = Math.max(0.0, 0.99 * value[k] / -slope);
      }
    }
    step[0] = s * d1;
    step[1] = s * d2;
  }

  private static final double[] CA = {-1.0, -1.0, 1.0, 0.0, 3.0};
  private static final double[] CB = {0.0, -1.0, -1.0, 1.0, 1.0};
  private final double[] value = new double[5];
  private final double[] step = new double[2];

  /** g(a, b) = m_cat (r1 + r3, r2 + r3) at the composition after extents a and b, mol/s. */
  private void cellRates(
      double[] f, int in, double nTotIn, double a, double b, double[] c, double mcat, double pBar, double[] g) {
    double nCh4 = f[in + CH4] - a;
    double nH2o = f[in + H2O] - a - b;
    double nCo = f[in + CO] + a - b;
    double nCo2 = f[in + CO2] + b;
    double nH2 = f[in + H2] + 3.0 * a + b;
    double tot = nTotIn + 2.0 * a;
    double s = pBar / tot;
    XuFromentKinetics.rates(c, nCh4 * s, nH2o * s, nCo * s, nCo2 * s, nH2 * s, r);
    g[0] = mcat * (r[0] + r[2]);
    g[1] = mcat * (r[1] + r[2]);
  }
}
