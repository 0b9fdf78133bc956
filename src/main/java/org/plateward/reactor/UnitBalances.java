package org.plateward.reactor;

import org.plateward.thermo.Species;

/**
 * Conservation checks of one evaluated state, per channel pair: energy over the whole unit
 * (both gases, heat loss and the plates' storage) and C, H, O, N atoms per channel.
 */
public final class UnitBalances {
  /** Atoms of C, H, O, N in each species (Species order CH4, H2O, CO, CO2, H2, O2, N2). */
  private static final int[][] ATOMS = {
    {1, 4, 0, 0}, {0, 2, 1, 0}, {1, 0, 1, 0}, {1, 0, 2, 0}, {0, 2, 0, 0}, {0, 0, 2, 0}, {0, 0, 0, 2}
  };

  private UnitBalances() {}

  /**
   * Relative energy imbalance of a state in transit: |H_in - H_out - Q_loss - dE/dt| over the
   * reforming duty, where the gas enthalpy flows come from the marched inlet and outlet states
   * and Q_loss and dE/dt from the plate temperatures and rates. Closes to rounding for any
   * state if the marches conserve energy.
   */
  public static double energyRelativeError(PlateReactorModel m, ModelEvaluation ev, ModelParameters p) {
    return energyImbalance(m, ev, p, true);
  }

  /**
   * Relative steady-state energy imbalance |H_in - H_out - Q_loss| over the reforming duty:
   * zero only when the plates store no heat, so it measures how far a state is from steady.
   */
  public static double steadyEnergyRelativeError(PlateReactorModel m, ModelEvaluation ev, ModelParameters p) {
    return energyImbalance(m, ev, p, false);
  }

  private static double energyImbalance(PlateReactorModel m, ModelEvaluation ev, ModelParameters p, boolean withStorage) {
    GasFlux gas = new GasFlux();
    int n = m.cells();
    int ns = Species.COUNT;
    ChannelState r = ev.reforming;
    ChannelState c = ev.combustion;
    double hRefIn = gas.enthalpyW(r.flows, 0, r.tempK[0]);
    double hRefOut = gas.enthalpyW(r.flows, n * ns, r.tempK[n]);
    double hCombIn = gas.enthalpyW(c.flows, n * ns, c.tempK[n]);
    double hCombOut = gas.enthalpyW(c.flows, 0, c.tempK[0]);
    double w = m.spec().geometry().widthM();
    double amb = m.spec().heatLoss().ambientK();
    double loss = 0.0;
    double storage = 0.0;
    for (int j = 0; j < n; j++) {
      double area = 2.0 * w * m.grid().widthM(j);
      loss += p.heatLossCoefficientWPerM2K() * (ev.plateK[j] - amb) * area;
      storage += ev.dedt[j] * area;
    }
    double duty = Math.abs(hRefOut - hRefIn);
    return Math.abs(hRefIn - hRefOut + hCombIn - hCombOut - loss - (withStorage ? storage : 0.0)) / duty;
  }

  /** Reforming heat duty per channel pair: enthalpy gained by the reforming gas, W. */
  public static double reformingDutyW(PlateReactorModel m, ModelEvaluation ev) {
    GasFlux gas = new GasFlux();
    int n = m.cells();
    ChannelState r = ev.reforming;
    return gas.enthalpyW(r.flows, n * Species.COUNT, r.tempK[n]) - gas.enthalpyW(r.flows, 0, r.tempK[0]);
  }

  /** Largest relative atom imbalance over C, H, O, N and both channels. */
  public static double elementRelativeError(PlateReactorModel m, ModelEvaluation ev) {
    int n = m.cells();
    double worst = 0.0;
    worst = Math.max(worst, atomsError(ev.reforming.flows, 0, n * Species.COUNT));
    worst = Math.max(worst, atomsError(ev.combustion.flows, n * Species.COUNT, 0));
    return worst;
  }

  private static double atomsError(double[] f, int inOff, int outOff) {
    double worst = 0.0;
    for (int a = 0; a < 4; a++) {
      double in = 0.0;
      double out = 0.0;
      for (int k = 0; k < Species.COUNT; k++) {
        in += ATOMS[k][a] * f[inOff + k];
        out += ATOMS[k][a] * f[outOff + k];
      }
      if (in > 0.0) {
        worst = Math.max(worst, Math.abs(out - in) / in);
      }
    }
    return worst;
  }
}
