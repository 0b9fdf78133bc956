package org.plateward.reactor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.special.Erf;
import org.junit.jupiter.api.Test;

/**
 * The enthalpy method ({@link LatentHeatMap}) on the one-phase Stefan melting problem, against
 * the Neumann similarity solution (Carslaw and Jaeger 1959, section 11.2; Crank 1984, eqs.
 * 3.10-3.15): a slab initially solid at the melting point, face held at Tw > Tm,
 * X(t) = 2 lambda sqrt(alpha t) with lambda e^{lambda^2} erf(lambda) = St / sqrt(pi).
 */
class StefanMeltingTest {
  // The published one-phase validation case (REFERENCES.md section 5): k = 1.5 W/m/K,
  // c = 2500 J/kg/K, rho = 870 kg/m3, L = 179 kJ/kg, Tw - Tm = 10 K, domain 0.1 m,
  // liquid fraction "about 81 %" after 36 000 s.
  static final double K = 1.5;
  static final double C = 2500.0;
  static final double RHO = 870.0;
  static final double LATENT = 179_000.0;
  static final double TM = 300.0;
  static final double TW = 310.0;
  static final double BAND = 0.05;

  /** Explicit finite-volume melting of a slab; returns the melted length at each report time. */
  static double[] melt(int cells, double lengthM, double[] reportS, double[] heatInJPerM2) {
    LatentHeatMap map = new LatentHeatMap(RHO * C, RHO * LATENT, TM + 0.5 * BAND, BAND, 0.0);
    double dx = lengthM / cells;
    double dt = 0.3 * RHO * C * dx * dx / K;
    double[] e = new double[cells];
    java.util.Arrays.fill(e, map.meltStart());
    double[] tK = new double[cells];
    double[] out = new double[reportS.length];
    double t = 0.0;
    double heat = 0.0;
    int next = 0;
    while (next < reportS.length) {
      double step = Math.min(dt, reportS[next] - t);
      for (int j = 0; j < cells; j++) {
        tK[j] = map.tempK(e[j]);
      }
      // face x = 0 held at Tw, half a cell from the first centre; far face insulated
      double q0 = K * (TW - tK[0]) / (0.5 * dx);
      heat += q0 * step;
      double qPrev = q0;
      for (int j = 0; j < cells; j++) {
        double qNext = j < cells - 1 ? K * (tK[j] - tK[j + 1]) / dx : 0.0;
        e[j] += step * (qPrev - qNext) / dx;
        qPrev = qNext;
      }
      t += step;
      if (Math.abs(t - reportS[next]) < 1e-9) {
        double x = 0.0;
        for (int j = 0; j < cells; j++) {
          x += map.meltFraction(e[j]) * dx;
        }
        out[next++] = x;
      }
    }
    if (heatInJPerM2 != null) {
      heatInJPerM2[0] = heat;
      double stored = 0.0;
      for (double ej : e) {
        stored += (ej - map.meltStart()) * dx;
      }
      heatInJPerM2[1] = stored;
    }
    return out;
  }

  static double neumannLambda(double stefan) {
    return new BrentSolver(1e-14)
        .solve(200, l -> l * Math.exp(l * l) * Erf.erf(l) - stefan / Math.sqrt(Math.PI), 1e-6, 3.0);
  }

  @Test
  void interfaceFollowsNeumannSolutionWithinTwoPercent() {
    double stefan = C * (TW - TM) / LATENT;
    double lambda = neumannLambda(stefan);
    double alpha = K / (RHO * C);
    double[] times = {4000, 12000, 24000, 36000};
    double[] x = melt(100, 0.1, times, null);
    for (int i = 0; i < times.length; i++) {
      double exact = 2.0 * lambda * Math.sqrt(alpha * times[i]);
      assertThat(x[i]).as("front at %.0f s", times[i]).isCloseTo(exact, within(0.02 * exact));
    }
    // the published worked example: about 81 % liquid after 36 000 s in the 0.1 m domain
    assertThat(x[3] / 0.1).isCloseTo(0.81, within(0.03));
  }

  @Test
  void latentHeatAbsorbedOnFullMeltingEqualsDensityTimesLatentHeatTimesVolume() {
    double length = 0.005;
    int cells = 40;
    double[] heat = new double[2];
    double[] x = melt(cells, length, new double[] {3000}, heat);
    assertThat(x[0]).as("fully melted").isCloseTo(length, within(1e-12));
    // conservation: the heat that entered through the face is what the slab stores
    assertThat(heat[1]).isCloseTo(heat[0], within(1e-9 * heat[0]));
    // by 3000 s the melted slab has come to Tw throughout (time constant L^2/alpha ~ 36 s), so
    // what entered is the sensible rise from the band's lower edge (Tm - dT/2) to Tw plus the latent heat
    double sensible = RHO * C * (TW - TM) * length;
    assertThat(heat[0] - sensible).isCloseTo(RHO * LATENT * length, within(1e-6 * RHO * LATENT * length));
    LatentHeatMap map = new LatentHeatMap(RHO * C, RHO * LATENT, TM + 0.5 * BAND, BAND, 0.0);
    assertThat(map.meltEnd() - map.meltStart() - map.capacity() * BAND).isCloseTo(RHO * LATENT, within(1e-6));
  }
}
