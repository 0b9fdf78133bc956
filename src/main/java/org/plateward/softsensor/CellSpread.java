package org.plateward.softsensor;

import org.plateward.reactor.PlateEnthalpy;

/**
 * A cell's plate temperature and melt fraction when its enthalpy state is Gaussian,
 * x ~ N(μ, σ²) in kelvin of sensible heat (e = C x), by 5-point Gauss-Hermite quadrature: the
 * σ of T(x), and the statistical-linearisation slopes (Gelb 1974) dT/de and dφ/de =
 * Cov(x, g(x)) / (σ² C), which for a Gaussian equal E[g'(x)]/C (Stein's lemma). Near the
 * melting band the point slope of T(e) jumps between 1/C outside and a small fraction of it
 * inside; these move smoothly with μ and σ.
 */
final class CellSpread {
  /** Nodes and weights of the 5-point Gauss-Hermite rule for the standard normal (exact to degree 9). */
  private static final double[] NODE = {-2.856970013872806, -1.355626179974266, 0.0, 1.355626179974266, 2.856970013872806};
  private static final double[] WEIGHT = {0.011257411327721, 0.222075922005613, 0.533333333333333, 0.222075922005613, 0.011257411327721};

  private CellSpread() {}

  /** σ of T(x) for x ~ N(meanK, sdK²), K. */
  static double temperatureSd(PlateEnthalpy plate, double capacity, double meanK, double sdK) {
    double m1 = 0.0;
    double m2 = 0.0;
    for (int q = 0; q < NODE.length; q++) {
      double t = plate.tempK((meanK + sdK * NODE[q]) * capacity);
      m1 += WEIGHT[q] * t;
      m2 += WEIGHT[q] * t * t;
    }
    return Math.sqrt(Math.max(m2 - m1 * m1, 0.0));
  }

  /**
   * The slopes over the spread: returns dT/de (K per J/m2) and puts dφ/de (per J/m2) in
   * {@code meltSlope[0]}; NaN for both when σ is below 1 mK (the point slope applies then).
   */
  static double slopes(PlateEnthalpy plate, double capacity, double meanK, double sdK, double[] meltSlope) {
    if (!(sdK > 1e-3)) {
      meltSlope[0] = Double.NaN;
      return Double.NaN;
    }
    double covT = 0.0;
    double covPhi = 0.0;
    for (int q = 0; q < NODE.length; q++) {
      double e = (meanK + sdK * NODE[q]) * capacity;
      covT += WEIGHT[q] * NODE[q] * plate.tempK(e);
      covPhi += WEIGHT[q] * NODE[q] * plate.meltFraction(e);
    }
    double sdE = sdK * capacity;
    meltSlope[0] = covPhi / sdE;
    return covT / sdE;
  }
}
