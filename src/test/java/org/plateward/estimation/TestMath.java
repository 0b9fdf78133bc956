package org.plateward.estimation;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.random.RandomGenerator;

/** Independent reference computations for the estimator tests (Commons Math based). */
final class TestMath {
  private TestMath() {}

  /**
   * Matrix exponential by scaling and squaring with a Taylor series (Moler &amp; Van Loan 2003,
   * "Nineteen dubious ways", method 3 with squaring): e^A = (e^{A/2^s})^{2^s}, series to 30 terms.
   */
  static RealMatrix expm(RealMatrix a) {
    final double norm = a.getNorm();
    int s = Math.max(0, (int) Math.ceil(Math.log(norm / 0.25) / Math.log(2)));
    final RealMatrix as = a.scalarMultiply(Math.pow(2, -s));
    RealMatrix term = MatrixUtils.createRealIdentityMatrix(a.getRowDimension());
    RealMatrix sum = term.copy();
    for (int k = 1; k <= 30; k++) {
      term = term.multiply(as).scalarMultiply(1.0 / k);
      sum = sum.add(term);
    }
    for (int i = 0; i < s; i++) {
      sum = sum.multiply(sum);
    }
    return sum;
  }

  /**
   * Exact discretisation of dx = A x dt + dw, E[dw dwᵀ] = Q dt over T (Van Loan 1978):
   * expm([[−A, Q], [0, Aᵀ]] T) = [[·, M12], [0, M22]], Φ = M22ᵀ, Q_d = Φ M12.
   *
   * @return {Φ, Q_d}
   */
  static RealMatrix[] vanLoan(RealMatrix a, RealMatrix q, double t) {
    final int n = a.getRowDimension();
    final RealMatrix c = new Array2DRowRealMatrix(2 * n, 2 * n);
    c.setSubMatrix(a.scalarMultiply(-t).getData(), 0, 0);
    c.setSubMatrix(q.scalarMultiply(t).getData(), 0, n);
    c.setSubMatrix(a.transpose().scalarMultiply(t).getData(), n, n);
    final RealMatrix e = expm(c);
    final RealMatrix phi = e.getSubMatrix(n, 2 * n - 1, n, 2 * n - 1).transpose();
    final RealMatrix qd = phi.multiply(e.getSubMatrix(0, n - 1, n, 2 * n - 1));
    return new RealMatrix[] {phi, qd.add(qd.transpose()).scalarMultiply(0.5)};
  }

  /** Random SPD matrix L Lᵀ + eps I with L entries uniform in [−scale, scale]. */
  static double[][] randomSpd(RandomGenerator rng, int n, double scale, double eps) {
    final double[][] l = new double[n][n];
    for (int i = 0; i < n; i++) {
      for (int j = 0; j <= i; j++) {
        l[i][j] = scale * (2 * rng.nextDouble() - 1);
      }
    }
    final RealMatrix lm = new Array2DRowRealMatrix(l);
    final RealMatrix s = lm.multiply(lm.transpose())
        .add(MatrixUtils.createRealIdentityMatrix(n).scalarMultiply(eps));
    return s.getData();
  }

  /** A sample of N(0, C). */
  static double[] gaussian(RandomGenerator rng, double[][] c) {
    final RealMatrix l = new CholeskyDecomposition(new Array2DRowRealMatrix(c)).getL();
    final double[] w = new double[c.length];
    for (int i = 0; i < w.length; i++) {
      w[i] = rng.nextGaussian();
    }
    return l.operate(w);
  }

  static double maxAbsDiff(double[][] a, double[][] b) {
    double m = 0;
    for (int i = 0; i < a.length; i++) {
      for (int j = 0; j < a[i].length; j++) {
        m = Math.max(m, Math.abs(a[i][j] - b[i][j]));
      }
    }
    return m;
  }

  static double maxAbsDiff(double[] a, double[] b) {
    double m = 0;
    for (int i = 0; i < a.length; i++) {
      m = Math.max(m, Math.abs(a[i] - b[i]));
    }
    return m;
  }

  /** x̃ᵀ P⁻¹ x̃ via Commons Math's Cholesky solver. */
  static double mahalanobis(double[] err, double[][] p) {
    final double[] s = new CholeskyDecomposition(new Array2DRowRealMatrix(p)).getSolver()
        .solve(MatrixUtils.createRealVector(err)).toArray();
    double v = 0;
    for (int i = 0; i < err.length; i++) {
      v += err[i] * s[i];
    }
    return v;
  }

  static boolean[] all(int m) {
    final boolean[] b = new boolean[m];
    java.util.Arrays.fill(b, true);
    return b;
  }

  static double[][] diag(double... d) {
    final double[][] m = new double[d.length][d.length];
    for (int i = 0; i < d.length; i++) {
      m[i][i] = d[i];
    }
    return m;
  }
}
