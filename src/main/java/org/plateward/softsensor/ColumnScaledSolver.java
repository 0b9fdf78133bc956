package org.plateward.softsensor;

import java.util.HashMap;
import java.util.Map;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.LUDecomposition;

/**
 * Solves (I − h·J·diag(r)) x = b for column scales r that change from solve to solve, from one
 * LU factorisation at the scales r₀ it was built at.
 *
 * <p>Why: the time-to-exhaust forecast rescales the Jacobian's column j by the slope dT/de of
 * cell j, which changes about sixtyfold as a cell enters or leaves the melting band, and only
 * for the few cells near it. The matrix then differs from the factorised one in those columns
 * only: A = A₀ + U·Vᵀ with U = −h·J[:, C]·diag(r_C − r₀_C) and Vᵀ the rows e_c of the moved
 * columns C. The Woodbury identity (Golub and Van Loan, <i>Matrix Computations</i>, 4th ed.,
 * §2.1.4) gives A⁻¹b = y − A₀⁻¹U·S⁻¹·Vᵀy with y = A₀⁻¹b and the k×k capacitance matrix
 * S = I + Vᵀ·A₀⁻¹U; A₀⁻¹J[:, c] is kept per column once solved. A solve costs one
 * back-substitution and k small ones instead of a fresh factorisation, and it is exact at the
 * present scales where reusing factors within a tolerance was not.
 */
final class ColumnScaledSolver {
  /** Moved columns beyond which a fresh factorisation is cheaper and better conditioned. */
  static final int MAX_MOVED = 12;
  /** Relative change of a scale below which its column counts as unmoved (rounding only). */
  private static final double SAME = 1e-6;

  private final double[][] jacobian;
  private final double h;
  private final double[] baseScale;
  private final DecompositionSolver base;
  private final Map<Integer, double[]> solvedColumns = new HashMap<>();

  /**
   * @param jacobian J, n×n (not copied; must not change while this solver is used)
   * @param h step length, s
   * @param scale r₀, the column scales to factorise at (copied)
   */
  ColumnScaledSolver(double[][] jacobian, double h, double[] scale) {
    int n = scale.length;
    this.jacobian = jacobian;
    this.h = h;
    this.baseScale = scale.clone();
    double[][] a = new double[n][n];
    for (int r = 0; r < n; r++) {
      for (int c = 0; c < n; c++) {
        a[r][c] = (r == c ? 1.0 : 0.0) - h * jacobian[r][c] * scale[c];
      }
    }
    this.base = new LUDecomposition(new Array2DRowRealMatrix(a, false)).getSolver();
  }

  /**
   * The solution at scales r, or null when more than {@link #MAX_MOVED} columns moved from the
   * factorised scales (build a new solver at r then).
   */
  double[] solve(double[] scale, double[] b) {
    int n = baseScale.length;
    int[] moved = new int[MAX_MOVED];
    int k = 0;
    for (int c = 0; c < n; c++) {
      if (Math.abs(scale[c] - baseScale[c]) > SAME * Math.max(Math.abs(scale[c]), Math.abs(baseScale[c]))) {
        if (k == MAX_MOVED) {
          return null;
        }
        moved[k++] = c;
      }
    }
    double[] y = base.solve(new ArrayRealVector(b, false)).toArray();
    if (k == 0) {
      return y;
    }
    // A0^-1 U[:, m] = -h dm z_m with z_m = A0^-1 J[:, c_m];  S[i][m] = delta_im - h dm z_m[c_i]
    double[][] z = new double[k][];
    double[] delta = new double[k];
    double[][] s = new double[k][k];
    double[] yc = new double[k];
    for (int m = 0; m < k; m++) {
      z[m] = solvedColumn(moved[m]);
      delta[m] = scale[moved[m]] - baseScale[moved[m]];
    }
    for (int i = 0; i < k; i++) {
      yc[i] = y[moved[i]];
      for (int m = 0; m < k; m++) {
        s[i][m] = (i == m ? 1.0 : 0.0) - h * delta[m] * z[m][moved[i]];
      }
    }
    double[] w = new LUDecomposition(new Array2DRowRealMatrix(s, false)).getSolver()
        .solve(new ArrayRealVector(yc, false)).toArray();
    for (int m = 0; m < k; m++) {
      double f = h * delta[m] * w[m];
      double[] zm = z[m];
      for (int r = 0; r < n; r++) {
        y[r] += f * zm[r];
      }
    }
    return y;
  }

  private double[] solvedColumn(int c) {
    return solvedColumns.computeIfAbsent(c, col -> {
      int n = baseScale.length;
      double[] jc = new double[n];
      for (int r = 0; r < n; r++) {
        jc[r] = jacobian[r][col];
      }
      return base.solve(new ArrayRealVector(jc, false)).toArray();
    });
  }
}
