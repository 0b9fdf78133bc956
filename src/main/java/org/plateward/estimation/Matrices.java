package org.plateward.estimation;

/**
 * Dense linear algebra on {@code double[][]} (row arrays) for the estimator's hot path: no
 * allocation inside the loops, zero entries of factors skipped (the reactor Jacobian is mostly
 * banded, so its LU factors are sparse). Row permutations are applied by swapping row
 * references, never by copying.
 */
final class Matrices {
  private Matrices() {}

  static double[][] copy(double[][] a) {
    final double[][] c = new double[a.length][];
    for (int i = 0; i < a.length; i++) {
      c[i] = a[i].clone();
    }
    return c;
  }

  static void copyInto(double[][] src, double[][] dst) {
    for (int i = 0; i < src.length; i++) {
      System.arraycopy(src[i], 0, dst[i], 0, src[i].length);
    }
  }

  static double[][] identity(int n) {
    final double[][] e = new double[n][n];
    for (int i = 0; i < n; i++) {
      e[i][i] = 1.0;
    }
    return e;
  }

  static void requireSquare(double[][] a, String name) {
    for (double[] row : a) {
      if (row.length != a.length) {
        throw new IllegalArgumentException(
            name + " must be square, got a row of " + row.length + " in " + a.length + " rows");
      }
    }
  }

  static void requireShape(double[][] a, int rows, int cols, String name) {
    if (a.length != rows) {
      throw new IllegalArgumentException(name + " has " + a.length + " rows, expected " + rows);
    }
    for (double[] row : a) {
      if (row.length != cols) {
        throw new IllegalArgumentException(
            name + " has a row of " + row.length + " columns, expected " + cols);
      }
    }
  }

  /** P ← (P + Pᵀ)/2 in place. */
  static void symmetrise(double[][] p) {
    final int n = p.length;
    for (int i = 0; i < n; i++) {
      final double[] pi = p[i];
      for (int j = i + 1; j < n; j++) {
        final double s = 0.5 * (pi[j] + p[j][i]);
        pi[j] = s;
        p[j][i] = s;
      }
    }
  }

  /** dst ← srcᵀ (square). */
  static void transposeInto(double[][] src, double[][] dst) {
    final int n = src.length;
    for (int i = 0; i < n; i++) {
      final double[] si = src[i];
      for (int j = 0; j < n; j++) {
        dst[j][i] = si[j];
      }
    }
  }

  /**
   * c ← a·b for a product known to be symmetric (Φ M Φᵀ as Φ·(M Φᵀ)): the upper triangle is
   * computed, the lower one mirrored — half the work of {@link #multiply}, same sums for the
   * upper triangle. Square n×n; c must not alias a or b.
   */
  static void multiplySymmetricResult(double[][] a, double[][] b, double[][] c) {
    final int n = a.length;
    for (int i = 0; i < n; i++) {
      final double[] ci = c[i];
      java.util.Arrays.fill(ci, i, n, 0.0);
      final double[] ai = a[i];
      for (int k = 0; k < n; k++) {
        final double aik = ai[k];
        if (aik == 0.0) {
          continue;
        }
        final double[] bk = b[k];
        for (int j = i; j < n; j++) {
          ci[j] += aik * bk[j];
        }
      }
    }
    for (int i = 0; i < n; i++) {
      final double[] ci = c[i];
      for (int j = i + 1; j < n; j++) {
        c[j][i] = ci[j];
      }
    }
  }

  /** c ← a·b, a is r×k, b is k×c (c must not alias a or b). */
  static void multiply(double[][] a, double[][] b, double[][] c) {
    final int rows = a.length;
    final int inner = b.length;
    final int cols = b[0].length;
    for (int i = 0; i < rows; i++) {
      final double[] ci = c[i];
      java.util.Arrays.fill(ci, 0, cols, 0.0);
      final double[] ai = a[i];
      for (int k = 0; k < inner; k++) {
        final double aik = ai[k];
        if (aik == 0.0) {
          continue;
        }
        final double[] bk = b[k];
        for (int j = 0; j < cols; j++) {
          ci[j] += aik * bk[j];
        }
      }
    }
  }

  /** c ← a·bᵀ, a is r×k, b is c×k. */
  static void multiplyTransposed(double[][] a, double[][] b, double[][] c) {
    final int rows = a.length;
    final int cols = b.length;
    final int inner = a[0].length;
    for (int i = 0; i < rows; i++) {
      final double[] ai = a[i];
      final double[] ci = c[i];
      for (int j = 0; j < cols; j++) {
        final double[] bj = b[j];
        double s = 0.0;
        for (int k = 0; k < inner; k++) {
          s += ai[k] * bj[k];
        }
        ci[j] = s;
      }
    }
  }

  /**
   * LU decomposition with partial pivoting, in place: afterwards a holds L (unit diagonal,
   * strictly below) and U (on and above), row references permuted so that row i of the factors
   * belongs to original row perm[i].
   *
   * @return false if a pivot is exactly zero or not finite (singular)
   */
  static boolean luInPlace(double[][] a, int[] perm) {
    final int n = a.length;
    for (int i = 0; i < n; i++) {
      perm[i] = i;
    }
    for (int k = 0; k < n; k++) {
      int p = k;
      double max = Math.abs(a[k][k]);
      for (int i = k + 1; i < n; i++) {
        final double v = Math.abs(a[i][k]);
        if (v > max) {
          max = v;
          p = i;
        }
      }
      if (!(max > 0.0) || !Double.isFinite(max)) {
        return false;
      }
      if (p != k) {
        final double[] t = a[p];
        a[p] = a[k];
        a[k] = t;
        final int ti = perm[p];
        perm[p] = perm[k];
        perm[k] = ti;
      }
      final double[] ak = a[k];
      final double inv = 1.0 / ak[k];
      for (int i = k + 1; i < n; i++) {
        final double[] ai = a[i];
        final double l = ai[k] * inv;
        ai[k] = l;
        if (l == 0.0) {
          continue;
        }
        for (int j = k + 1; j < n; j++) {
          ai[j] -= l * ak[j];
        }
      }
    }
    return true;
  }

  /** Solves A x = b in place given the LU factors of A; work has length n. */
  static void luSolve(double[][] lu, int[] perm, double[] b, double[] work) {
    final int n = lu.length;
    for (int i = 0; i < n; i++) {
      work[i] = b[perm[i]];
    }
    for (int i = 0; i < n; i++) {
      final double[] li = lu[i];
      double s = work[i];
      for (int k = 0; k < i; k++) {
        s -= li[k] * work[k];
      }
      work[i] = s;
    }
    for (int i = n - 1; i >= 0; i--) {
      final double[] ui = lu[i];
      double s = work[i];
      for (int k = i + 1; k < n; k++) {
        s -= ui[k] * work[k];
      }
      work[i] = s / ui[i];
    }
    System.arraycopy(work, 0, b, 0, n);
  }

  /**
   * Solves A X = B in place (B n×c, its row references are permuted) given the LU factors of A.
   * rowsWork has length n.
   */
  static void luSolve(double[][] lu, int[] perm, double[][] b, double[][] rowsWork) {
    final int n = lu.length;
    for (int i = 0; i < n; i++) {
      rowsWork[i] = b[perm[i]];
    }
    System.arraycopy(rowsWork, 0, b, 0, n);
    final int cols = b[0].length;
    // forward: L Y = P B, row-oriented so the inner loop runs over contiguous columns
    for (int i = 1; i < n; i++) {
      final double[] li = lu[i];
      final double[] bi = b[i];
      for (int k = 0; k < i; k++) {
        final double l = li[k];
        if (l == 0.0) {
          continue;
        }
        final double[] bk = b[k];
        for (int j = 0; j < cols; j++) {
          bi[j] -= l * bk[j];
        }
      }
    }
    // backward: U X = Y
    for (int i = n - 1; i >= 0; i--) {
      final double[] ui = lu[i];
      final double[] bi = b[i];
      for (int k = i + 1; k < n; k++) {
        final double v = ui[k];
        if (v == 0.0) {
          continue;
        }
        final double[] bk = b[k];
        for (int j = 0; j < cols; j++) {
          bi[j] -= v * bk[j];
        }
      }
      final double inv = 1.0 / ui[i];
      for (int j = 0; j < cols; j++) {
        bi[j] *= inv;
      }
    }
  }

  /**
   * Cholesky factor of the leading d×d block of a into l (lower triangle written, upper left
   * untouched).
   *
   * @return false if the block is not numerically positive definite
   */
  static boolean cholesky(double[][] a, int d, double[][] l) {
    for (int j = 0; j < d; j++) {
      final double[] lj = l[j];
      double s = a[j][j];
      for (int k = 0; k < j; k++) {
        s -= lj[k] * lj[k];
      }
      if (!(s > 0.0) || !Double.isFinite(s)) {
        return false;
      }
      final double djj = Math.sqrt(s);
      lj[j] = djj;
      final double inv = 1.0 / djj;
      for (int i = j + 1; i < d; i++) {
        final double[] li = l[i];
        double t = a[i][j];
        for (int k = 0; k < j; k++) {
          t -= li[k] * lj[k];
        }
        li[j] = t * inv;
      }
    }
    return true;
  }

  /**
   * Positive-definiteness test by an upper Cholesky factorisation A = UᵀU written row by row
   * into u (axpy form: U_j,j: = (A_j,j: − Σ_k U_kj U_k,j:)/U_jj), which vectorises.
   *
   * @return false if a pivot is not positive and finite
   */
  static boolean isCholeskyFactorisable(double[][] a, double[][] u) {
    final int n = a.length;
    for (int j = 0; j < n; j++) {
      final double[] uj = u[j];
      System.arraycopy(a[j], j, uj, j, n - j);
      for (int k = 0; k < j; k++) {
        final double[] uk = u[k];
        final double c = uk[j];
        if (c == 0.0) {
          continue;
        }
        for (int i = j; i < n; i++) {
          uj[i] -= c * uk[i];
        }
      }
      final double d = uj[j];
      if (!(d > 0.0) || !Double.isFinite(d)) {
        return false;
      }
      final double inv = 1.0 / Math.sqrt(d);
      for (int i = j; i < n; i++) {
        uj[i] *= inv;
      }
    }
    return true;
  }

  /** Solves (L Lᵀ) X = B in place for the leading d rows of B (B d×c). */
  static void choleskySolve(double[][] l, int d, double[][] b, int cols) {
    for (int i = 0; i < d; i++) {
      final double[] li = l[i];
      final double[] bi = b[i];
      for (int k = 0; k < i; k++) {
        final double v = li[k];
        final double[] bk = b[k];
        for (int j = 0; j < cols; j++) {
          bi[j] -= v * bk[j];
        }
      }
      final double inv = 1.0 / li[i];
      for (int j = 0; j < cols; j++) {
        bi[j] *= inv;
      }
    }
    for (int i = d - 1; i >= 0; i--) {
      final double[] bi = b[i];
      for (int k = i + 1; k < d; k++) {
        final double v = l[k][i];
        final double[] bk = b[k];
        for (int j = 0; j < cols; j++) {
          bi[j] -= v * bk[j];
        }
      }
      final double inv = 1.0 / l[i][i];
      for (int j = 0; j < cols; j++) {
        bi[j] *= inv;
      }
    }
  }

  /** Solves (L Lᵀ) x = b in place for the leading d entries. */
  static void choleskySolve(double[][] l, int d, double[] b) {
    for (int i = 0; i < d; i++) {
      double s = b[i];
      final double[] li = l[i];
      for (int k = 0; k < i; k++) {
        s -= li[k] * b[k];
      }
      b[i] = s / li[i];
    }
    for (int i = d - 1; i >= 0; i--) {
      double s = b[i];
      for (int k = i + 1; k < d; k++) {
        s -= l[k][i] * b[k];
      }
      b[i] = s / l[i][i];
    }
  }
}
