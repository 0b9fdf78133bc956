package org.plateward.softsensor;

import org.apache.commons.math3.special.Erf;

/**
 * Variance of the hottest of a few neighbouring cell temperatures, each Gaussian with the given
 * mean and σ and with the correlation of their enthalpy states (a monotone map keeps its sign),
 * by Clark's moment-matching recursion for the maximum of correlated Gaussians (C. E. Clark,
 * "The greatest of a finite set of random variables", Operations Research 9, 1961): the maximum of
 * the first k is matched by a Gaussian and compared with the next.
 */
final class PeakSpread {
  private static final double INV_SQRT_2PI = 1.0 / Math.sqrt(2.0 * Math.PI);

  private PeakSpread() {}

  /**
   * @param meanK cell temperatures, K
   * @param sdK their σ, K
   * @param cov covariance of the enthalpy states (for the correlations)
   * @param lo first cell
   * @param hi last cell (inclusive)
   * @return Var[max of T_lo..T_hi], K²
   */
  static double varianceOfMax(double[] meanK, double[] sdK, double[][] cov, int lo, int hi) {
    double m = meanK[lo];
    double s = sdK[lo];
    // correlation of the running maximum with each later cell
    int n = hi - lo + 1;
    double[] rhoMax = new double[n];
    for (int k = 1; k < n; k++) {
      rhoMax[k] = correlation(cov, lo, lo + k);
    }
    for (int k = 1; k < n; k++) {
      int j = lo + k;
      double m2 = meanK[j];
      double s2 = sdK[j];
      double r = rhoMax[k];
      double a2 = s * s + s2 * s2 - 2.0 * r * s * s2;
      if (!(a2 > 1e-18)) {
        // the two move together: the larger mean is the maximum
        if (m2 > m) {
          m = m2;
          s = s2;
          for (int q = k + 1; q < n; q++) {
            rhoMax[q] = correlation(cov, j, lo + q);
          }
        }
        continue;
      }
      double a = Math.sqrt(a2);
      double alpha = (m - m2) / a;
      double cdf = 0.5 * (1.0 + Erf.erf(alpha / Math.sqrt(2.0)));
      double pdf = INV_SQRT_2PI * Math.exp(-0.5 * alpha * alpha);
      double e1 = m * cdf + m2 * (1.0 - cdf) + a * pdf;
      double e2 = (m * m + s * s) * cdf + (m2 * m2 + s2 * s2) * (1.0 - cdf) + (m + m2) * a * pdf;
      double sNew = Math.sqrt(Math.max(e2 - e1 * e1, 0.0));
      for (int q = k + 1; q < n; q++) {
        int c = lo + q;
        double r1 = rhoMax[q];
        double r2 = correlation(cov, j, c);
        rhoMax[q] = sNew > 0.0 ? (s * r1 * cdf + s2 * r2 * (1.0 - cdf)) / sNew : 0.0;
      }
      m = e1;
      s = sNew;
    }
    return s * s;
  }

  private static double correlation(double[][] cov, int i, int j) {
    double d = Math.sqrt(Math.max(cov[i][i], 0.0) * Math.max(cov[j][j], 0.0));
    return d > 0.0 ? Math.max(-1.0, Math.min(1.0, cov[i][j] / d)) : 0.0;
  }
}
