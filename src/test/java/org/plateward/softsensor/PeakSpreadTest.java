package org.plateward.softsensor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.distribution.MultivariateNormalDistribution;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

/**
 * Variance of the hottest cell by Clark's recursion, against sampling from Commons Math's
 * multivariate normal: exact in its first two moments for two variables (Clark 1961), an
 * approximation for three.
 */
class PeakSpreadTest {
  private static double sampledVarianceOfMax(double[] mean, double[][] cov, int n) {
    MultivariateNormalDistribution d = new MultivariateNormalDistribution(new Well19937c(7), mean, cov);
    double s1 = 0.0;
    double s2 = 0.0;
    for (int i = 0; i < n; i++) {
      double[] x = d.sample();
      double m = Double.NEGATIVE_INFINITY;
      for (double v : x) {
        m = Math.max(m, v);
      }
      s1 += m;
      s2 += m * m;
    }
    double mean1 = s1 / n;
    return s2 / n - mean1 * mean1;
  }

  private static double[] sd(double[][] cov) {
    double[] s = new double[cov.length];
    for (int i = 0; i < s.length; i++) {
      s[i] = Math.sqrt(cov[i][i]);
    }
    return s;
  }

  @Test
  void twoCorrelatedCellsMatchSampling() {
    // a plateau cell (σ 0.3 K) tied with a molten neighbour (σ 6 K), correlation 0.5
    double[] mean = {1358.0, 1357.5};
    double[][] cov = {{0.09, 0.9}, {0.9, 36.0}};
    double v = PeakSpread.varianceOfMax(mean, sd(cov), cov, 0, 1);
    double ref = sampledVarianceOfMax(mean, cov, 400_000);
    // exact for two: within the sampling error of 400 000 draws (about 0.3 %), 1 % allowed
    assertThat(v).isCloseTo(ref, within(0.01 * ref));
    // much more than the plateau cell's own 0.09 K²: the tie is what the flicker missed
    assertThat(v).isGreaterThan(10.0);
  }

  @Test
  void threeCellsMatchSamplingClosely() {
    double[] mean = {1356.0, 1358.0, 1357.0};
    double[][] cov = {{4.0, 2.4, 1.0}, {2.4, 9.0, 3.6}, {1.0, 3.6, 4.0}};
    double v = PeakSpread.varianceOfMax(mean, sd(cov), cov, 0, 2);
    double ref = sampledVarianceOfMax(mean, cov, 400_000);
    // Clark's Gaussian matching of the running maximum: a few per cent for three
    assertThat(v).isCloseTo(ref, within(0.05 * ref));
  }

  @Test
  void perfectlyCorrelatedCellsGiveTheHotterOnesVariance() {
    double[] mean = {1350.0, 1352.0};
    double[][] cov = {{4.0, 4.0}, {4.0, 4.0}};
    assertThat(PeakSpread.varianceOfMax(mean, sd(cov), cov, 0, 1)).isCloseTo(4.0, within(1e-9));
  }
}
