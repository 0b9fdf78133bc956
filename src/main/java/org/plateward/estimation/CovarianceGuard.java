package org.plateward.estimation;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * Keeps a covariance symmetric positive definite: symmetrises, checks (diagonal, then a
 * Cholesky attempt) and, when the check fails, repairs by flooring the eigenvalues
 * (P ← V max(Λ, ε) Vᵀ, the nearest SPD matrix in the Frobenius norm above the floor; Higham
 * 1988). The repair is rare and uses Commons Math's {@link EigenDecomposition}.
 */
final class CovarianceGuard {
  private final double relativeFloor;
  private final double absoluteFloor;
  private final double[][] work;

  CovarianceGuard(int n, double relativeFloor, double absoluteFloor) {
    this.relativeFloor = relativeFloor;
    this.absoluteFloor = absoluteFloor;
    this.work = new double[n][n];
  }

  /** True if P has a positive finite diagonal and a Cholesky factor. */
  boolean isPositiveDefinite(double[][] p, boolean fullCheck) {
    for (int i = 0; i < p.length; i++) {
      final double d = p[i][i];
      if (!(d > 0.0) || !Double.isFinite(d)) {
        return false;
      }
    }
    return !fullCheck || Matrices.isCholeskyFactorisable(p, work);
  }

  /**
   * Replaces P by its eigenvalue-floored version.
   *
   * @return the smallest eigenvalue before the repair
   */
  double repair(double[][] p) {
    for (double[] row : p) {
      for (int j = 0; j < row.length; j++) {
        if (!Double.isFinite(row[j])) {
          throw new IllegalStateException(
              "covariance contains a non-finite entry; the estimator must be re-initialised");
        }
      }
    }
    final EigenDecomposition eig = new EigenDecomposition(new Array2DRowRealMatrix(p, true));
    final double[] lambda = eig.getRealEigenvalues();
    double max = 0.0;
    double min = Double.POSITIVE_INFINITY;
    for (double l : lambda) {
      max = Math.max(max, l);
      min = Math.min(min, l);
    }
    final double floor = Math.max(absoluteFloor, relativeFloor * max);
    final RealMatrix v = eig.getV();
    final int n = p.length;
    for (int i = 0; i < n; i++) {
      java.util.Arrays.fill(p[i], 0.0);
    }
    for (int k = 0; k < n; k++) {
      final double l = Math.max(lambda[k], floor);
      for (int i = 0; i < n; i++) {
        final double vik = v.getEntry(i, k) * l;
        if (vik == 0.0) {
          continue;
        }
        for (int j = 0; j < n; j++) {
          p[i][j] += vik * v.getEntry(j, k);
        }
      }
    }
    Matrices.symmetrise(p);
    return min;
  }
}
