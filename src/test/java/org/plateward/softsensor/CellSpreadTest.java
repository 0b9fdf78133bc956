package org.plateward.softsensor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;
import org.plateward.config.UnitConfigLoader;
import org.plateward.reactor.PlateEnthalpy;
import org.plateward.reactor.PlateReactorModel;

/**
 * The spread slopes of T(e) and φ(e) that the estimator's Jacobian uses near the melting band,
 * against analytic limits and against Cov(x, g(x))/σ² integrated independently with Commons
 * Math's adaptive Gauss-Legendre integrator over ±8σ.
 */
class CellSpreadTest {
  private static final PlateEnthalpy PLATE;
  private static final double C;

  static {
    try {
      PLATE = new PlateReactorModel(UnitConfigLoader.load(Path.of("config/plateward.toml"))).plate();
    } catch (Exception e) {
      throw new IllegalStateException(e);
    }
    C = PLATE.sensibleJPerM2K();
  }

  /** Cov(x, g(x)) / (σ² C) for x ~ N(μ, σ²), by adaptive quadrature of the density. */
  private static double reference(boolean melt, double meanK, double sdK) {
    NormalDistribution n = new NormalDistribution(null, meanK, sdK);
    var integ = new IterativeLegendreGaussIntegrator(16, 1e-10, 1e-12);
    double lo = meanK - 8 * sdK;
    double hi = meanK + 8 * sdK;
    // split at the band edges so each piece is smooth
    double a = PLATE.meltStartJPerM2() / C;
    double b = PLATE.meltEndJPerM2() / C;
    double[] cuts = {lo, Math.max(lo, Math.min(hi, a)), Math.max(lo, Math.min(hi, b)), hi};
    double cov = 0.0;
    for (int k = 0; k < 3; k++) {
      if (cuts[k + 1] > cuts[k]) {
        cov += integ.integrate(1_000_000, x -> (x - meanK) * n.density(x)
            * (melt ? PLATE.meltFraction(x * C) : PLATE.tempK(x * C)), cuts[k], cuts[k + 1]);
      }
    }
    return cov / (sdK * sdK * C);
  }

  @Test
  void farFromTheBandTheSlopeIsThePointSlope() {
    double[] melt = new double[1];
    double mean = PLATE.meltStartJPerM2() / C - 60.0; // 60 K below the band, σ 3 K
    // T = Tref + x exactly here, so dT/de = 1/C and φ does not move (analytic)
    assertThat(CellSpread.slopes(PLATE, C, mean, 3.0, melt)).isCloseTo(1.0 / C, within(1e-9 / C));
    assertThat(melt[0]).isCloseTo(0.0, within(1e-15));
  }

  @Test
  void nearAndInsideTheBandTheSlopeFollowsTheIntegral() {
    double[] melt = new double[1];
    double a = PLATE.meltStartJPerM2() / C;
    double b = PLATE.meltEndJPerM2() / C;
    double width = b - a; // the plateau in kelvin of sensible heat
    for (double[] c : new double[][] {{a - 2.0, 3.0}, {a, 3.0}, {a + 0.5 * width, 0.4 * width}, {b, 4.0}, {b + 3.0, 3.0}}) {
      double s = CellSpread.slopes(PLATE, C, c[0], c[1], melt);
      // the band taken as a straight line (CellSpread): within 10 % of the slope scale 1/C
      assertThat(s).as("dT/de at %.1f K, sd %.1f K", c[0] - a, c[1]).isCloseTo(reference(false, c[0], c[1]), within(0.1 / C));
      assertThat(melt[0]).as("dphi/de at %.1f K, sd %.1f K", c[0] - a, c[1])
          .isCloseTo(reference(true, c[0], c[1]), within(0.1 / (width * C)));
    }
  }

  @Test
  void aNegligibleSpreadFallsBackToThePointSlope() {
    double[] melt = new double[1];
    assertThat(CellSpread.slopes(PLATE, C, 1000.0, 0.0, melt)).isNaN();
    assertThat(melt[0]).isNaN();
  }

  @Test
  void temperatureSdIsSdAwayFromTheBandAndSmallOnThePlateau() {
    double a = PLATE.meltStartJPerM2() / C;
    double b = PLATE.meltEndJPerM2() / C;
    // linear map away from the band: σ_T = σ_x (analytic)
    assertThat(CellSpread.temperatureSd(PLATE, C, a - 80.0, 2.5)).isCloseTo(2.5, within(1e-9));
    // mid-plateau, spread well inside it: T barely moves
    assertThat(CellSpread.temperatureSd(PLATE, C, 0.5 * (a + b), 0.05 * (b - a))).isLessThan(1.0);
  }
}
