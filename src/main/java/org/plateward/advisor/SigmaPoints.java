package org.plateward.advisor;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;

/**
 * The symmetric sigma-point set of the unscented transform (Julier &amp; Uhlmann, "A new extension
 * of the Kalman filter to nonlinear systems", 1997; "Unscented filtering and nonlinear
 * estimation", Proc. IEEE 92(3), 2004): for a mean m and r columns s_i with Σ s_i s_iᵀ = P
 * (a square root of the covariance, or of a reduced approximation of it),
 *
 * <pre>
 *   χ_0 = m,  χ_±i = m ± √(r + κ) s_i          (i = 1..r)
 *   W_0 = κ / (r + κ),  W_±i = 1 / (2 (r + κ))
 * </pre>
 *
 * so that Σ W χ = m and Σ W (χ − m)(χ − m)ᵀ = P exactly; the mean and covariance of any linear
 * map of the points are then exact, and with κ = 3 − r the fourth central moment along each
 * direction matches a Gaussian's (the mean and variance of a scalar quadratic are exact).
 *
 * <p>Two ways to get the columns: {@link #full} (Cholesky, n directions, 2n + 1 points) and
 * {@link #dominant} (the leading eigen-directions of the correlation matrix, fewer points).
 * Immutable.
 */
public final class SigmaPoints {
  private final double[][] points;
  private final double[] weights;
  private final int directions;
  private final double capturedMin;
  private final double capturedTrace;

  private SigmaPoints(double[] mean, double[][] columns, double kappa, double capturedMin,
      double capturedTrace) {
    int r = columns.length;
    if (!(r + kappa > 0.0)) {
      throw new IllegalArgumentException("r + kappa must be positive, got r = " + r + ", kappa = " + kappa);
    }
    this.directions = r;
    this.capturedMin = capturedMin;
    this.capturedTrace = capturedTrace;
    int n = mean.length;
    double scale = Math.sqrt(r + kappa);
    points = new double[2 * r + 1][];
    weights = new double[2 * r + 1];
    points[0] = mean.clone();
    weights[0] = kappa / (r + kappa);
    for (int i = 0; i < r; i++) {
      double[] plus = mean.clone();
      double[] minus = mean.clone();
      for (int j = 0; j < n; j++) {
        plus[j] += scale * columns[i][j];
        minus[j] -= scale * columns[i][j];
      }
      points[1 + 2 * i] = plus;
      points[2 + 2 * i] = minus;
      weights[1 + 2 * i] = 0.5 / (r + kappa);
      weights[2 + 2 * i] = 0.5 / (r + kappa);
    }
  }

  /**
   * The full set: columns of the lower Cholesky factor L of P (P = L Lᵀ), 2n + 1 points.
   *
   * @param mean the mean, any units per entry
   * @param covariance P, symmetric positive definite, in the squared units of the mean
   * @param kappa the spread parameter κ (κ = 3 − n matches a Gaussian's kurtosis)
   * @throws org.apache.commons.math3.linear.NonPositiveDefiniteMatrixException if P is not SPD
   */
  public static SigmaPoints full(double[] mean, double[][] covariance, double kappa) {
    check(mean, covariance);
    RealMatrix l = new CholeskyDecomposition(new Array2DRowRealMatrix(covariance, true)).getL();
    int n = mean.length;
    double[][] cols = new double[n][];
    for (int i = 0; i < n; i++) {
      cols[i] = l.getColumn(i);
    }
    return new SigmaPoints(mean, cols, kappa, 1.0, 1.0);
  }

  /**
   * A reduced set along the dominant directions. With D = diag(√P_jj) and the correlation
   * matrix C = D⁻¹ P D⁻¹ = U Λ Uᵀ, the columns are s_i = D u_i √λ_i for the largest eigenvalues
   * until their sum reaches {@code traceFraction} of tr C = n (and at most {@code
   * maxDirections}). The correlation matrix, not P, is decomposed because the entries have
   * different units (K, multipliers, W/(m2 K)): its spectrum does not change with the units.
   * Entries with zero variance are left fixed.
   *
   * @param mean the mean
   * @param covariance P, symmetric positive semi-definite
   * @param maxDirections at most this many directions, ≥ 1
   * @param traceFraction stop once this share of tr C is captured, in (0, 1]
   * @param kappa κ; pass NaN for max(0, 3 − r) (Gaussian kurtosis where r ≤ 3, never a negative
   *     centre weight)
   */
  public static SigmaPoints dominant(double[] mean, double[][] covariance, int maxDirections,
      double traceFraction, double kappa) {
    check(mean, covariance);
    if (maxDirections < 1 || !(traceFraction > 0.0 && traceFraction <= 1.0)) {
      throw new IllegalArgumentException("need maxDirections >= 1 and traceFraction in (0, 1]");
    }
    int n = mean.length;
    double[] sd = new double[n];
    int live = 0;
    for (int j = 0; j < n; j++) {
      sd[j] = Math.sqrt(Math.max(covariance[j][j], 0.0));
      if (sd[j] > 0.0) {
        live++;
      }
    }
    if (live == 0) {
      return new SigmaPoints(mean, new double[0][], Double.isNaN(kappa) ? 1.0 : Math.max(kappa, 1.0), 1.0, 1.0);
    }
    double[][] c = new double[n][n];
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        // C_ij = P_ij / (σ_i σ_j), symmetrised; a fixed entry gets no correlation
        c[i][j] = sd[i] > 0 && sd[j] > 0 ? 0.5 * (covariance[i][j] + covariance[j][i]) / (sd[i] * sd[j]) : 0.0;
      }
    }
    EigenDecomposition eig = new EigenDecomposition(new Array2DRowRealMatrix(c, false));
    double[] lambda = eig.getRealEigenvalues();
    Integer[] order = new Integer[n];
    for (int i = 0; i < n; i++) {
      order[i] = i;
    }
    java.util.Arrays.sort(order, (a, b) -> Double.compare(lambda[b], lambda[a]));
    double sum = 0.0;
    java.util.List<double[]> cols = new java.util.ArrayList<>();
    double[] kept = new double[n];
    for (int k = 0; k < n && cols.size() < maxDirections && sum < traceFraction * live - 1e-12; k++) {
      double lam = lambda[order[k]];
      if (!(lam > 0.0)) {
        break;
      }
      RealVector u = eig.getEigenvector(order[k]);
      double[] s = new double[n];
      for (int j = 0; j < n; j++) {
        s[j] = sd[j] * u.getEntry(j) * Math.sqrt(lam); // s = D u √λ
        kept[j] += u.getEntry(j) * u.getEntry(j) * lam; // diag(U_r Λ_r U_rᵀ)
      }
      cols.add(s);
      sum += lam;
    }
    double min = 1.0;
    for (int j = 0; j < n; j++) {
      if (sd[j] > 0.0) {
        min = Math.min(min, kept[j]);
      }
    }
    int r = cols.size();
    double k = Double.isNaN(kappa) ? Math.max(0.0, 3.0 - r) : kappa;
    return new SigmaPoints(mean, cols.toArray(new double[0][]), k, min, sum / live);
  }

  private static void check(double[] mean, double[][] covariance) {
    if (covariance.length != mean.length) {
      throw new IllegalArgumentException("covariance is " + covariance.length + " x ?, mean has " + mean.length);
    }
    for (double[] row : covariance) {
      if (row.length != mean.length) {
        throw new IllegalArgumentException("covariance is not square");
      }
    }
  }

  /** Number of points, 2r + 1. */
  public int size() {
    return points.length;
  }

  /** Number of directions r. */
  public int directions() {
    return directions;
  }

  /** Point i (copy), in the units of the mean. */
  public double[] point(int i) {
    return points[i].clone();
  }

  /** Weight of point i (the weights sum to 1). */
  public double weight(int i) {
    return weights[i];
  }

  /**
   * Smallest share of any entry's variance the set carries, diag(P_r)_j / P_jj (1 for the full
   * set).
   */
  public double capturedVarianceMin() {
    return capturedMin;
  }

  /** Share of the correlation matrix's trace the set carries (1 for the full set). */
  public double capturedTrace() {
    return capturedTrace;
  }

  /** Weighted mean Σ W_i y_i of values y_i computed at the points. */
  public double mean(double[] y) {
    requireSize(y.length);
    double m = 0.0;
    for (int i = 0; i < y.length; i++) {
      m += weights[i] * y[i];
    }
    return m;
  }

  /** Weighted variance Σ W_i (y_i − ȳ)² of values y_i computed at the points. */
  public double variance(double[] y) {
    double m = mean(y);
    double v = 0.0;
    for (int i = 0; i < y.length; i++) {
      v += weights[i] * (y[i] - m) * (y[i] - m);
    }
    return v;
  }

  /** Weighted covariance Σ W_i (y_i − ȳ)(y_i − ȳ)ᵀ of vectors y_i computed at the points. */
  public double[][] covariance(double[][] y) {
    requireSize(y.length);
    int m = y[0].length;
    double[] mean = new double[m];
    for (int i = 0; i < y.length; i++) {
      for (int a = 0; a < m; a++) {
        mean[a] += weights[i] * y[i][a];
      }
    }
    double[][] c = new double[m][m];
    for (int i = 0; i < y.length; i++) {
      for (int a = 0; a < m; a++) {
        for (int b = 0; b < m; b++) {
          c[a][b] += weights[i] * (y[i][a] - mean[a]) * (y[i][b] - mean[b]);
        }
      }
    }
    return c;
  }

  private void requireSize(int len) {
    if (len != points.length) {
      throw new IllegalArgumentException("need one value per point (" + points.length + "), got " + len);
    }
  }
}
