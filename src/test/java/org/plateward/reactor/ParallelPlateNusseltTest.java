package org.plateward.reactor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;

/**
 * Fully developed laminar heat transfer between parallel plates, computed here from the
 * energy equation and compared with Shah and London (1978), Laminar Flow Forced Convection in
 * Ducts: Nu_T = 7.541 (uniform wall temperature) and Nu_H = 140/17 = 8.235 (uniform heat
 * flux), D_h = 2 x gap.
 */
class ParallelPlateNusseltTest {
  /**
   * Uniform wall temperature: with y in [0, 1] (half gap), u/U = 1.5 (1 - y^2), the fully
   * developed profile solves f'' + mu (u/U) f = 0, f'(0) = 0, f(1) = 0; integrating,
   * f'(1) = -mu f_bulk, so Nu = h 4b/k = 4 mu. The smallest mu is found by shooting.
   */
  static double uniformWallTempNusselt() {
    double mu = new BrentSolver(1e-13).solve(200, m -> shoot(m), 1.0, 3.0);
    return 4.0 * mu;
  }

  private static double shoot(double mu) {
    FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
      @Override
      public int getDimension() {
        return 2;
      }

      @Override
      public void computeDerivatives(double y, double[] s, double[] d) {
        d[0] = s[1];
        d[1] = -mu * 1.5 * (1.0 - y * y) * s[0];
      }
    };
    double[] s = {1.0, 0.0};
    new DormandPrince853Integrator(1e-10, 0.1, 1e-13, 1e-13).integrate(ode, 0.0, s, 1.0, s);
    return s[0];
  }

  /**
   * Uniform heat flux: the profile solves T'' = c (u/U) with T'(0) = 0; integrating twice
   * and taking the flow-weighted bulk temperature gives Nu = 4 q b / (k (Tw - Tb)).
   */
  static double uniformHeatFluxNusselt() {
    // theta'' = 1.5 (1 - y^2)  =>  theta' = 1.5 (y - y^3/3),  theta = 1.5 (y^2/2 - y^4/12) (theta(0) = 0)
    int n = 20000;
    double num = 0.0;
    double den = 0.0;
    for (int i = 0; i <= n; i++) {
      double y = (double) i / n;
      double w = (i == 0 || i == n) ? 1 : (i % 2 == 1 ? 4 : 2); // Simpson weights
      double u = 1.5 * (1.0 - y * y);
      double th = 1.5 * (y * y / 2.0 - y * y * y * y / 12.0);
      num += w * u * th;
      den += w * u;
    }
    double thetaBulk = num / den;
    double thetaWall = 1.5 * (0.5 - 1.0 / 12.0);
    double gradWall = 1.5 * (1.0 - 1.0 / 3.0); // = q b / k in these units
    return 4.0 * gradWall / (thetaWall - thetaBulk);
  }

  @Test
  void uniformWallTemperatureNusseltMatchesShahAndLondon() {
    assertThat(uniformWallTempNusselt()).isCloseTo(7.541, within(0.001)); // Shah & London 1978
  }

  @Test
  void uniformHeatFluxNusseltMatchesShahAndLondon() {
    assertThat(uniformHeatFluxNusselt()).isCloseTo(140.0 / 17.0, within(1e-6)); // 8.235, Shah & London 1978
  }

  @Test
  void modelUsesTheUniformWallTemperatureValue() {
    // both walls of a channel are plates at the same local temperature: the wall-temperature case applies
    assertThat(PlateReactorModel.NUSSELT_UNIFORM_WALL_TEMP).isCloseTo(uniformWallTempNusselt(), within(0.001));
  }
}
