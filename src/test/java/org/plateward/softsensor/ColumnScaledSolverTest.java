package org.plateward.softsensor;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * The Woodbury-updated solve against Commons Math's LU of the matrix formed afresh at the new
 * column scales (an independent reference), on a random system shaped like the plate's: a
 * stiff, diagonally dominant J with a dense lower part (the gas marches).
 */
class ColumnScaledSolverTest {
  private static final int N = 60;

  private static double[][] jacobian(Random rnd) {
    double[][] j = new double[N][N];
    for (int r = 0; r < N; r++) {
      for (int c = 0; c < N; c++) {
        j[r][c] = r == c ? -(0.2 + rnd.nextDouble()) : (c < r ? 0.05 : 0.01) * rnd.nextGaussian();
      }
    }
    return j;
  }

  private static double[] reference(double[][] j, double h, double[] scale, double[] b) {
    double[][] a = new double[N][N];
    for (int r = 0; r < N; r++) {
      for (int c = 0; c < N; c++) {
        a[r][c] = (r == c ? 1.0 : 0.0) - h * j[r][c] * scale[c];
      }
    }
    return new LUDecomposition(new Array2DRowRealMatrix(a)).getSolver().solve(new ArrayRealVector(b)).toArray();
  }

  @ParameterizedTest
  @ValueSource(ints = {0, 1, 3, ColumnScaledSolver.MAX_MOVED})
  void matchesAFreshFactorisationAtTheNewScales(int moved) {
    Random rnd = new Random(41 + moved);
    double[][] j = jacobian(rnd);
    double h = 10.0;
    double[] r0 = new double[N];
    java.util.Arrays.fill(r0, 1.0);
    ColumnScaledSolver s = new ColumnScaledSolver(j, h, r0);
    for (int trial = 0; trial < 3; trial++) {
      double[] r = r0.clone();
      for (int k = 0; k < moved; k++) {
        // a cell entering the melting band: its slope falls about sixtyfold, or partly
        r[(7 * k + 3 * trial) % N] = 1.0 / (1.0 + 59.0 * rnd.nextDouble());
      }
      double[] b = new double[N];
      for (int q = 0; q < N; q++) {
        b[q] = rnd.nextGaussian();
      }
      double[] want = reference(j, h, r, b);
      double[] got = s.solve(r, b);
      for (int q = 0; q < N; q++) {
        assertThat(got[q]).isCloseTo(want[q], org.assertj.core.data.Offset.offset(1e-10 * (1 + Math.abs(want[q]))));
      }
    }
  }

  @Test
  void tooManyMovedColumnsAskForAFreshFactorisation() {
    Random rnd = new Random(5);
    double[][] j = jacobian(rnd);
    double[] r0 = new double[N];
    java.util.Arrays.fill(r0, 1.0);
    ColumnScaledSolver s = new ColumnScaledSolver(j, 10.0, r0);
    double[] r = r0.clone();
    for (int k = 0; k <= ColumnScaledSolver.MAX_MOVED; k++) {
      r[k] = 0.5;
    }
    assertThat(s.solve(r, new double[N])).isNull();
    r[ColumnScaledSolver.MAX_MOVED] = 1.0 + 1e-9; // a rounding-sized change is not a move
    assertThat(s.solve(r, new double[N])).isNotNull();
  }
}
