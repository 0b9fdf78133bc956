package org.plateward.softsensor;

import org.apache.commons.math3.special.Erf;
import org.plateward.reactor.PlateEnthalpy;

/**
 * A cell's plate temperature and melt fraction when its enthalpy state is Gaussian,
 * x ~ N(μ, σ²) in kelvin of sensible heat (e = C x): the σ of T(x), and the statistical
 * linearisation slopes (Gelb 1974) dT/de and dφ/de, E[g'(x)]/C, which for a Gaussian equal
 * Cov(x, g(x))/(σ² C) (Stein's lemma).
 *
 * <p>T(x) is taken piecewise linear: slope 1 below and above the melting band, and across the
 * band a straight line from its lower to its upper temperature (the band is 2 K of temperature
 * over about 160 K of sensible-heat enthalpy, so the line is within a fraction of a kelvin of
 * the smooth step); φ rises linearly from 0 to 1 across it. The Gaussian moments of each piece
 * are exact (partial moments of the normal distribution), so the σ and the slopes move smoothly
 * as the mean crosses a band edge. (A 5-point Gauss-Hermite rule, used before, put the peak σ at
 * 0.05 K in one block and 30 K in the next whenever its outer node crossed the band's upper
 * edge.)
 */
final class CellSpread {
  private static final double SQRT2 = Math.sqrt(2.0);
  private static final double INV_SQRT_2PI = 1.0 / Math.sqrt(2.0 * Math.PI);

  private CellSpread() {}

  /** Spreads further than this many σ from the band see one linear piece only (exactly). */
  private static final double FAR_SIGMAS = 8.0;

  /** E[T], E[T²], E[T'] (per K of x) and E[φ'] (per K of x) for x ~ N(meanK, sdK²). */
  private static void moments(PlateEnthalpy plate, double capacity, double meanK, double sdK, double[] out) {
    double a = plate.meltStartJPerM2() / capacity;
    double b = plate.meltEndJPerM2() / capacity;
    if (meanK + FAR_SIGMAS * sdK < a || meanK - FAR_SIGMAS * sdK > b) {
      // one piece of slope 1 (the mass beyond 8σ, below 1e-15, is dropped): no erf needed
      double t = plate.tempK(meanK * capacity);
      out[0] = t;
      out[1] = t * t + sdK * sdK;
      out[2] = 1.0;
      out[3] = 0.0;
      return;
    }
    double tLow = plate.tempK(plate.meltStartJPerM2());
    double tHigh = plate.tempK(plate.meltEndJPerM2());
    double za = (a - meanK) / sdK;
    double zb = (b - meanK) / sdK;
    double bandSlope = (tHigh - tLow) / (b - a);
    double[] m = new double[3];
    double e1 = 0.0;
    double e2 = 0.0;
    double slope = 0.0;
    // below the band: T = tLow + (x - a); inside: tLow + s (x - a); above: tHigh + (x - b)
    double[][] pieces = {
      {Double.NEGATIVE_INFINITY, za, tLow - a, 1.0},
      {za, zb, tLow - bandSlope * a, bandSlope},
      {zb, Double.POSITIVE_INFINITY, tHigh - b, 1.0},
    };
    double pBand = 0.0;
    for (int k = 0; k < 3; k++) {
      double[] pc = pieces[k];
      partial(pc[0], pc[1], m);
      // T = alpha + beta x = (alpha + beta mu) + beta sd z
      double c0 = pc[2] + pc[3] * meanK;
      double c1 = pc[3] * sdK;
      e1 += c0 * m[0] + c1 * m[1];
      e2 += c0 * c0 * m[0] + 2.0 * c0 * c1 * m[1] + c1 * c1 * m[2];
      slope += pc[3] * m[0];
      if (k == 1) {
        pBand = m[0];
      }
    }
    out[0] = e1;
    out[1] = e2;
    out[2] = slope;
    out[3] = pBand / (b - a);
  }

  /** ∫ z^k φ(z) dz over [l, u] for k = 0, 1, 2 (standard normal density φ). */
  private static void partial(double l, double u, double[] m) {
    double pl = Double.isInfinite(l) ? 0.0 : INV_SQRT_2PI * Math.exp(-0.5 * l * l);
    double pu = Double.isInfinite(u) ? 0.0 : INV_SQRT_2PI * Math.exp(-0.5 * u * u);
    double p = 0.5 * (Erf.erf(l / SQRT2, u / SQRT2));
    double lpl = Double.isInfinite(l) ? 0.0 : l * pl;
    double upu = Double.isInfinite(u) ? 0.0 : u * pu;
    m[0] = p;
    m[1] = pl - pu;
    m[2] = p + lpl - upu;
  }

  /** σ of T(x) for x ~ N(meanK, sdK²), K (0 for a negligible spread). */
  static double temperatureSd(PlateEnthalpy plate, double capacity, double meanK, double sdK) {
    if (!(sdK > 1e-6)) {
      return 0.0;
    }
    double[] out = new double[4];
    moments(plate, capacity, meanK, sdK, out);
    return Math.sqrt(Math.max(out[1] - out[0] * out[0], 0.0));
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
    double[] out = new double[4];
    moments(plate, capacity, meanK, sdK, out);
    meltSlope[0] = out[3] / capacity;
    return out[2] / capacity;
  }
}
