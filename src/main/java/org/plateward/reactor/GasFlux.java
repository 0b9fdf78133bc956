package org.plateward.reactor;

import org.plateward.thermo.Species;

/**
 * Sums over the species molar flows of one gas stream (arrays indexed by Species ordinal),
 * with species properties from {@link GasTables}. Instances hold scratch space: one per
 * channel, not shared between threads.
 */
final class GasFlux {
  static final int NS = Species.COUNT;

  private final double[] h = new double[NS];
  private final double[] h2 = new double[NS];
  private final double[] cp = new double[NS];

  /** Total molar flow of the stream starting at {@code off} in {@code flows}, mol/s. */
  static double total(double[] flows, int off) {
    double s = 0.0;
    for (int k = 0; k < NS; k++) {
      s += flows[off + k];
    }
    return s;
  }

  /** Mole fractions of the stream into {@code x}; returns the total flow, mol/s. */
  static double moleFractions(double[] flows, int off, double[] x) {
    double tot = total(flows, off);
    for (int k = 0; k < NS; k++) {
      x[k] = flows[off + k] / tot;
    }
    return tot;
  }

  /** Enthalpy flow sum_k n_k h_k(T), W (absolute enthalpies, formation included). */
  double enthalpyW(double[] flows, int off, double tempK) {
    GasTables.enthalpies(tempK, h);
    double s = 0.0;
    for (int k = 0; k < NS; k++) {
      s += flows[off + k] * h[k];
    }
    return s;
  }

  /**
   * Exchange step shared by both channels: the gas, having changed composition from the
   * stream at {@code inOff} to the one at {@code outOff} by surface reaction at the inlet
   * temperature, then relaxes towards the wall temperature by convection. Returns the gas
   * outlet temperature and puts the convective heat taken from the wall (W, gas gains) into
   * {@code q[0]} and the reaction heat given to the wall (W) into {@code q[1]}. Energy closes
   * exactly: H_out - H_in = q_conv - q_rxn.
   */
  double exchange(
      double[] flows, int inOff, int outOff, double tempInK, double wallK, double conductanceWPerK,
      double[] q) {
    GasTables.enthalpies(tempInK, h);
    GasTables.heatCapacities(tempInK, cp);
    double hIn = 0.0;
    double hOutAtTin = 0.0;
    double cpOut = 0.0;
    for (int k = 0; k < NS; k++) {
      double nOut = flows[outOff + k];
      hIn += flows[inOff + k] * h[k];
      hOutAtTin += nOut * h[k];
      cpOut += nOut * cp[k];
    }
    // reaction heat released to the wall: -(sum dn_k h_k(T_in))
    q[1] = hIn - hOutAtTin;
    // convection with the wall held at wallK over the cell: T_out = Tw + (T_in - Tw) exp(-NTU)
    double tOut = wallK + (tempInK - wallK) * Math.exp(-conductanceWPerK / cpOut);
    GasTables.enthalpies(tOut, h2);
    double hOut = 0.0;
    for (int k = 0; k < NS; k++) {
      hOut += flows[outOff + k] * h2[k];
    }
    q[0] = hOut - hOutAtTin;
    return tOut;
  }
}
