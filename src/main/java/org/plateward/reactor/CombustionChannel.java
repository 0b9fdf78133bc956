package org.plateward.reactor;

import org.plateward.kinetics.CatalyticCombustion;
import org.plateward.thermo.MixtureProperties;

/**
 * Quasi-steady march of one combustion channel in -z (lean methane in air, first order in
 * methane on the platinum-group washcoat of both walls, in series with gas-to-wall mass
 * transfer). The gas enters cell j at face j + 1 and leaves at face j.
 *
 * <p>Total moles are conserved by CH4 + 2 O2 -> CO2 + 2 H2O, so with the gas temperature
 * frozen at the cell inlet the methane balance dn/dA = -k_eff c_tot n / n_tot integrates
 * exactly: n_out = n_in exp(-k_eff A_coated c_tot / n_tot). Stable at any cell size.
 */
final class CombustionChannel {
  private static final int CH4 = 0;
  private static final int H2O = 1;
  private static final int CO2 = 3;
  private static final int O2 = 5;
  private static final int NS = GasFlux.NS;
  private static final double R = 8.314462618;

  private final int cells;
  private final double[] coatedAreaM2;
  private final double[] wallAreaM2;
  private final double hydraulicDiameterM;
  private final double nusselt;
  private final boolean multiplierOnMassTransfer;
  private final double[] surfaceRateCache;
  private final double[] x = new double[NS];
  private final double[] q = new double[2];
  private final double[] lambdaScratch = new double[NS];
  private final GasFlux gas = new GasFlux();

  CombustionChannel(Geometry g, Grid grid, double nusselt) {
    this(g, grid, nusselt, false);
  }

  /**
   * @param multiplierOnMassTransfer whether the heat-transfer multiplier also scales the
   *     Sherwood number (see {@link PlateReactorModel.Options})
   */
  CombustionChannel(Geometry g, Grid grid, double nusselt, boolean multiplierOnMassTransfer) {
    this.multiplierOnMassTransfer = multiplierOnMassTransfer;
    this.cells = grid.cells();
    this.coatedAreaM2 = new double[cells];
    this.wallAreaM2 = new double[cells];
    for (int j = 0; j < cells; j++) {
      double a = grid.faceM(j);
      double b = grid.faceM(j + 1);
      wallAreaM2[j] = 2.0 * g.widthM() * (b - a);
      coatedAreaM2[j] = 2.0 * g.widthM() * Geometry.coatedLengthM(g.combustionCoating(), a, b);
    }
    this.hydraulicDiameterM = 2.0 * g.combustionGapM();
    this.nusselt = nusselt;
    this.surfaceRateCache = new double[cells];
  }

  /**
   * Marches cells {@code from} down to 0. Face {@code from + 1} of {@code out} must hold the
   * inlet of cell {@code from}. {@code perturbed} as in {@link ReformingChannel#march}.
   */
  void march(
      double[] plateK, double activity, double htMultiplier, double pressurePa, int from,
      int perturbed, ChannelState out) {
    double[] f = out.flows;
    for (int j = from; j >= 0; j--) {
      int in = (j + 1) * NS;
      int o = j * NS;
      double tw = plateK[j];
      double ks;
      if (perturbed < 0) {
        ks = GasTables.combustionSurfaceRateMPerS(tw);
        surfaceRateCache[j] = ks;
      } else if (j == perturbed) {
        ks = GasTables.combustionSurfaceRateMPerS(tw);
      } else {
        ks = surfaceRateCache[j];
      }
      double tin = out.tempK[j + 1];
      double nTot = GasFlux.moleFractions(f, in, x);
      double film = 0.5 * (tin + tw);
      double xi = 0.0;
      double nCh4 = f[in + CH4];
      if (coatedAreaM2[j] > 0.0 && nCh4 > 0.0 && activity > 0.0) {
        // Sh = Nu (heat and mass transfer analogy); optionally scaled like h
        double km = (multiplierOnMassTransfer ? htMultiplier : 1.0) * nusselt * MixtureProperties.diffusivityInMixtureM2PerS(CH4, x, film, pressurePa)
            / hydraulicDiameterM;
        double keff = CatalyticCombustion.effectiveRateConstantMPerS(activity * ks, km);
        double cTot = pressurePa / (R * tin);
        double k = keff * coatedAreaM2[j] * cTot / nTot;
        // 1 - exp(-k), with its series where exp would lose digits
        xi = nCh4 * (k < 1e-5 ? k * (1.0 - 0.5 * k) : 1.0 - Math.exp(-k));
        xi = Math.min(xi, 0.5 * f[in + O2] * (1.0 - 1e-12));
      }
      for (int k = 0; k < NS; k++) {
        f[o + k] = f[in + k];
      }
      f[o + CH4] -= xi;
      f[o + O2] -= 2.0 * xi;
      f[o + CO2] += xi;
      f[o + H2O] += 2.0 * xi;
      double h = htMultiplier * nusselt * GasTables.conductivityWPerMK(x, film, lambdaScratch) / hydraulicDiameterM;
      out.tempK[j] = gas.exchange(f, in, o, tin, tw, h * wallAreaM2[j], q);
      out.reactionHeatW[j] = q[1];
      out.heatToPlateW[j] = q[1] - q[0];
    }
  }
}
