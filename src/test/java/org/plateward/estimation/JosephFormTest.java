package org.plateward.estimation;

import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigInteger;
import org.apache.commons.math3.fraction.BigFraction;
import org.apache.commons.math3.fraction.BigFractionField;
import org.apache.commons.math3.linear.Array2DRowFieldMatrix;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.FieldLUDecomposition;
import org.apache.commons.math3.linear.FieldMatrix;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.junit.jupiter.api.Test;

/**
 * Joseph form against the short form P = (I − KH)P on the classic ill-conditioned measurement
 * example: P₀ = I₃, H = [[1,1,1],[1,1,1+δ]], R = δ² I, δ near √ε (Grewal &amp; Andrews, "Kalman
 * Filtering: Theory and Practice", ch. on implementation; from memory). The two measurements are
 * fused one after the other. The exact posterior (I + Hᵀ R⁻¹ H)⁻¹ is computed in rational
 * arithmetic with Commons Math's {@link BigFraction}.
 */
class JosephFormTest {
  private static final double DELTA = 1e-6;

  @Test
  void josephFormStaysPositiveDefiniteWhereTheShortFormDoesNot() {
    final double[][] h = {{1, 1, 1}, {1, 1, 1 + DELTA}};
    final double r = DELTA * DELTA;
    // short form, by Commons Math matrices
    RealMatrix ps = MatrixUtils.createRealIdentityMatrix(3);
    for (double[] row : h) {
      final RealMatrix hm = new Array2DRowRealMatrix(new double[][] {row});
      final double s = hm.multiply(ps).multiply(hm.transpose()).getEntry(0, 0) + r;
      final RealMatrix k = ps.multiply(hm.transpose()).scalarMultiply(1.0 / s);
      ps = MatrixUtils.createRealIdentityMatrix(3).subtract(k.multiply(hm)).multiply(ps);
      ps = ps.add(ps.transpose()).scalarMultiply(0.5);
    }
    final double simpleMin = minEigenvalue(ps);

    final ExtendedKalmanFilter ekf = new ExtendedKalmanFilter(
        new LinearDynamics(new double[3][3], null), new double[3][3],
        FilterSettings.defaults().withGating(false), 0.0, new double[3],
        TestMath.diag(1, 1, 1));
    StepResult res = null;
    for (double[] row : h) {
      res = ekf.update(new LinearMeasurement(new double[][] {row}), new double[] {0.0},
          new boolean[] {true}, new double[][] {{r}}, new double[0]);
    }
    final double[][] p = res.covariance();
    final double josephMin = minEigenvalue(new Array2DRowRealMatrix(p));
    final double exactMin = minEigenvalue(exactPosterior());
    System.out.printf("Joseph: min eigenvalue exact=%.4e joseph=%.4e short form=%.4e%n",
        exactMin, josephMin, simpleMin);

    assertThat(simpleMin).isNegative(); // the short form has lost positive definiteness
    assertThat(res.covarianceRepaired()).isFalse(); // ours needed no repair ...
    assertThat(josephMin).isPositive(); // ... is positive definite ...
    assertThat(josephMin).isBetween(0.9 * exactMin, 1.1 * exactMin); // ... and right
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        assertThat(p[i][j]).isEqualTo(p[j][i]);
      }
    }
  }

  /** (I + Hᵀ R⁻¹ H)⁻¹ exactly, δ = 10⁻⁶ as a fraction. */
  private static RealMatrix exactPosterior() {
    final BigFraction d = new BigFraction(BigInteger.ONE, BigInteger.TEN.pow(6));
    final BigFraction one = BigFraction.ONE;
    final BigFraction[][] h = {{one, one, one}, {one, one, one.add(d)}};
    final FieldMatrix<BigFraction> hm = new Array2DRowFieldMatrix<>(h);
    final FieldMatrix<BigFraction> info = MatrixUtils.createFieldIdentityMatrix(
        BigFractionField.getInstance(), 3).add(
            hm.transpose().multiply(hm).scalarMultiply(d.multiply(d).reciprocal()));
    final FieldMatrix<BigFraction> p = new FieldLUDecomposition<>(info).getSolver().getInverse();
    final double[][] out = new double[3][3];
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        out[i][j] = p.getEntry(i, j).doubleValue();
      }
    }
    return new Array2DRowRealMatrix(out);
  }

  private static double minEigenvalue(RealMatrix m) {
    double min = Double.POSITIVE_INFINITY;
    for (double e : new EigenDecomposition(m).getRealEigenvalues()) {
      min = Math.min(min, e);
    }
    return min;
  }
}
