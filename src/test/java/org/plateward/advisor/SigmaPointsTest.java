package org.plateward.advisor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.RealMatrix;
import org.junit.jupiter.api.Test;

class SigmaPointsTest {

  @Test
  void scalarQuadraticOfAGaussianIsExactWithKappaTwo() {
    // analytic: for x ~ N(μ, σ²) and y = x², E[y] = μ² + σ² and Var[y] = 4 μ² σ² + 2 σ⁴
    // (Gaussian moments E[(x-μ)³] = 0, E[(x-μ)⁴] = 3 σ⁴); the unscented transform with
    // κ = 3 − n = 2 matches the fourth moment, so both are exact (Julier & Uhlmann 1997)
    double mu = 1.7;
    double sigma = 0.6;
    SigmaPoints sp = SigmaPoints.full(new double[] {mu}, new double[][] {{sigma * sigma}}, 2.0);
    double[] y = new double[sp.size()];
    for (int i = 0; i < sp.size(); i++) {
      double x = sp.point(i)[0];
      y[i] = x * x;
    }
    assertThat(sp.size()).isEqualTo(3);
    assertThat(sp.mean(y)).isCloseTo(mu * mu + sigma * sigma, within(1e-12));
    assertThat(sp.variance(y)).isCloseTo(4 * mu * mu * sigma * sigma + 2 * Math.pow(sigma, 4), within(1e-12));
  }

  @Test
  void linearMapOfAGaussianIsExact() {
    // analytic: y = A x + b has mean A m + b and covariance A P Aᵀ (products by Commons Math)
    Random rnd = new Random(4711);
    int n = 5;
    int m = 3;
    double[][] b0 = randomMatrix(rnd, n, n);
    RealMatrix bm = new Array2DRowRealMatrix(b0);
    RealMatrix p = bm.multiply(bm.transpose()).add(new Array2DRowRealMatrix(identity(n, 0.1)));
    double[] mean = {300.0, -2.0, 0.5, 7.0, 1e-3};
    RealMatrix a = new Array2DRowRealMatrix(randomMatrix(rnd, m, n));
    double[] off = {1.0, 2.0, 3.0};
    SigmaPoints sp = SigmaPoints.full(mean, p.getData(), 3.0 - n);
    double[][] y = new double[sp.size()][];
    for (int i = 0; i < sp.size(); i++) {
      double[] v = a.operate(sp.point(i));
      for (int k = 0; k < m; k++) {
        v[k] += off[k];
      }
      y[i] = v;
    }
    double[] expectMean = a.operate(mean);
    double[][] expectCov = a.multiply(p).multiply(a.transpose()).getData();
    double[][] cov = sp.covariance(y);
    for (int k = 0; k < m; k++) {
      double[] col = new double[sp.size()];
      for (int i = 0; i < sp.size(); i++) {
        col[i] = y[i][k];
      }
      assertThat(sp.mean(col)).isCloseTo(expectMean[k] + off[k], within(1e-9 * (1 + Math.abs(expectMean[k]))));
      for (int l = 0; l < m; l++) {
        assertThat(cov[k][l]).isCloseTo(expectCov[k][l], within(1e-9 * (1 + Math.abs(expectCov[k][l]))));
      }
    }
  }

  @Test
  void dominantSetReproducesALowRankCovarianceExactly() {
    // a covariance of rank 2 in mixed units (K and a multiplier): its correlation matrix has
    // rank 2, so two eigen-directions carry all of it and P is reproduced exactly; the linear
    // map's covariance then matches A P Aᵀ as for the full set
    Random rnd = new Random(99);
    int n = 6;
    double[][] g = new double[n][2];
    double[] unit = {10.0, 10.0, 10.0, 10.0, 0.05, 0.05};
    for (int j = 0; j < n; j++) {
      g[j][0] = unit[j] * rnd.nextGaussian();
      g[j][1] = unit[j] * rnd.nextGaussian();
    }
    RealMatrix gm = new Array2DRowRealMatrix(g);
    double[][] p = gm.multiply(gm.transpose()).getData();
    double[] mean = {1300, 1310, 1320, 1330, 1.0, 0.5};
    SigmaPoints sp = SigmaPoints.dominant(mean, p, 6, 0.999, Double.NaN);
    assertThat(sp.directions()).isEqualTo(2);
    assertThat(sp.size()).isEqualTo(5);
    assertThat(sp.capturedVarianceMin()).isCloseTo(1.0, within(1e-9));
    double[][] pts = new double[sp.size()][];
    for (int i = 0; i < sp.size(); i++) {
      pts[i] = sp.point(i);
    }
    double[][] back = sp.covariance(pts);
    for (int a = 0; a < n; a++) {
      for (int b = 0; b < n; b++) {
        assertThat(back[a][b]).isCloseTo(p[a][b], within(1e-9 * (Math.abs(p[a][a]) + Math.abs(p[b][b]))));
      }
    }
  }

  @Test
  void truncationKeepsTheLargestShareAndSaysHowMuch() {
    // a full-rank correlation with one strong shared mode: the leading direction carries most
    // of the trace; the share reported equals λ_max / n of Commons Math's own decomposition
    int n = 8;
    double rho = 0.9;
    double[][] p = new double[n][n];
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        p[i][j] = (i == j ? 1.0 : rho) * 4.0; // σ = 2 K everywhere, correlation 0.9
      }
    }
    SigmaPoints sp = SigmaPoints.dominant(new double[n], p, 1, 1.0, Double.NaN);
    // analytic: the equicorrelation matrix has λ_max = 1 + (n − 1) ρ along (1, ..., 1)/√n
    assertThat(sp.capturedTrace()).isCloseTo((1 + (n - 1) * rho) / n, within(1e-12));
    assertThat(sp.capturedVarianceMin()).isCloseTo((1 + (n - 1) * rho) / n, within(1e-12));
    // κ = 3 − r = 2 for one direction: points at ±√3 σ_shared
    assertThat(Math.abs(sp.point(1)[0])).isCloseTo(Math.sqrt(3) * 2 * Math.sqrt((1 + (n - 1) * rho) / n), within(1e-9));
  }

  private static double[][] randomMatrix(Random rnd, int r, int c) {
    double[][] a = new double[r][c];
    for (int i = 0; i < r; i++) {
      for (int j = 0; j < c; j++) {
        a[i][j] = rnd.nextGaussian();
      }
    }
    return a;
  }

  private static double[][] identity(int n, double v) {
    double[][] a = new double[n][n];
    for (int i = 0; i < n; i++) {
      a[i][i] = v;
    }
    return a;
  }
}
