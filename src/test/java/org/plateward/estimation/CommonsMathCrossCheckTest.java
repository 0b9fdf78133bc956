package org.plateward.estimation;

import static org.assertj.core.api.Assertions.assertThat;

import org.apache.commons.math3.filter.DefaultMeasurementModel;
import org.apache.commons.math3.filter.DefaultProcessModel;
import org.apache.commons.math3.filter.KalmanFilter;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

/**
 * Linear case against a general-purpose reference library: Apache Commons Math 3.6.1
 * {@code org.apache.commons.math3.filter.KalmanFilter}. Its update is the short form
 * P = (I − KH)P; ours is Joseph form, equal in exact arithmetic for the optimal gain.
 */
class CommonsMathCrossCheckTest {

  @Test
  void randomStableSystemMatchesCommonsMathKalmanFilter() {
    final Well19937c rng = new Well19937c(1000);
    final int n = 6;
    final int m = 3;
    // random A scaled to infinity-norm 0.95, so the system is stable
    final double[][] a = new double[n][n];
    double maxRow = 0;
    for (int i = 0; i < n; i++) {
      double row = 0;
      for (int j = 0; j < n; j++) {
        a[i][j] = 2 * rng.nextDouble() - 1;
        row += Math.abs(a[i][j]);
      }
      maxRow = Math.max(maxRow, row);
    }
    for (double[] row : a) {
      for (int j = 0; j < n; j++) {
        row[j] *= 0.95 / maxRow;
      }
    }
    final double[][] h = new double[m][n];
    for (double[] row : h) {
      for (int j = 0; j < n; j++) {
        row[j] = 2 * rng.nextDouble() - 1;
      }
    }
    final double[][] q = TestMath.randomSpd(rng, n, 0.3, 0.01);
    final double[][] r = TestMath.randomSpd(rng, m, 0.5, 0.05);
    final double[] x0 = new double[n];
    final double[][] p0 = TestMath.randomSpd(rng, n, 1.0, 0.1);

    final KalmanFilter reference = new KalmanFilter(
        new DefaultProcessModel(a, new double[n][1], q, x0, p0),
        new DefaultMeasurementModel(h, r));
    final FilterSettings settings = FilterSettings.defaults().withGating(false);
    final ExtendedKalmanFilter ours = new ExtendedKalmanFilter(
        new LinearDynamics(a, null), new double[n][n], settings, 0.0, x0, p0);
    final LinearMeasurement meas = new LinearMeasurement(h);

    double[] truth = TestMath.gaussian(rng, p0);
    double worstX = 0;
    double worstP = 0;
    for (int k = 0; k < 200; k++) {
      truth = new Array2DRowRealMatrix(a).operate(truth);
      final double[] w = TestMath.gaussian(rng, q);
      for (int i = 0; i < n; i++) {
        truth[i] += w[i];
      }
      final double[] z = new Array2DRowRealMatrix(h).operate(truth);
      final double[] v = TestMath.gaussian(rng, r);
      for (int i = 0; i < m; i++) {
        z[i] += v[i];
      }
      reference.predict();
      reference.correct(new ArrayRealVector(z));
      ours.propagateLinear(a, null, q, 1.0);
      final StepResult res = ours.update(meas, z, TestMath.all(m), r, new double[0]);
      assertThat(res.usedCount()).isEqualTo(m);
      worstX = Math.max(worstX,
          TestMath.maxAbsDiff(res.state(), reference.getStateEstimation()));
      worstP = Math.max(worstP,
          TestMath.maxAbsDiff(res.covariance(), reference.getErrorCovariance()));
    }
    // Commons Math KalmanFilter is the reference; tolerance 1e-9 from the brief
    assertThat(worstX).isLessThan(1e-9);
    assertThat(worstP).isLessThan(1e-9);
    System.out.printf("CommonsMathCrossCheck: max |dx|=%.3e max |dP|=%.3e over 200 steps%n",
        worstX, worstP);
  }
}
