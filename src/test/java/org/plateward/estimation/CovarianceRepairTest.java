package org.plateward.estimation;

import static org.assertj.core.api.Assertions.assertThat;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.junit.jupiter.api.Test;

/** An indefinite covariance is detected, repaired by an eigenvalue floor and reported. */
class CovarianceRepairTest {

  @Test
  void indefiniteCovarianceIsRepairedAndReported() {
    final ExtendedKalmanFilter ekf = new ExtendedKalmanFilter(
        new LinearDynamics(new double[3][3], null), TestMath.diag(0.01, 0.01, 0.01),
        FilterSettings.defaults(), 0.0, new double[3], TestMath.diag(1, 1, 1));
    // positive diagonal, eigenvalues 1 + 1.5 = 2.5, 1, 1 − 1.5 = −0.5 (2×2 block [[1,1.5],[1.5,1]])
    ekf.overwriteCovariance(new double[][] {{1.0, 1.5, 0.0}, {1.5, 1.0, 0.0}, {0, 0, 1.0}});
    final StepResult res = ekf.update(
        new LinearMeasurement(new double[][] {{0.0, 0.0, 1.0}}), new double[] {0.1},
        new boolean[] {true}, new double[][] {{0.5}}, new double[0]);
    assertThat(res.covarianceRepaired()).isTrue();
    assertThat(res.minEigenvalueBeforeRepair()).isNegative();
    assertThat(ekf.repairCount()).isEqualTo(1);
    // the repaired covariance is SPD by Commons Math's own Cholesky (its default thresholds)
    new CholeskyDecomposition(new Array2DRowRealMatrix(res.covariance()));
    for (double e : new EigenDecomposition(new Array2DRowRealMatrix(res.covariance()))
        .getRealEigenvalues()) {
      assertThat(e).isPositive();
    }
    // the flag is reported once, on the result that follows the repair
    ekf.propagate(new double[0], 1.0);
    final StepResult next = ekf.update(
        new LinearMeasurement(new double[][] {{0.0, 0.0, 1.0}}), new double[] {0.1},
        new boolean[] {true}, new double[][] {{0.5}}, new double[0]);
    assertThat(next.covarianceRepaired()).isFalse();
  }

  @Test
  void negativeDiagonalAfterPropagationIsRepairedAndReportedOnTheNextUpdate() {
    final ExtendedKalmanFilter ekf = new ExtendedKalmanFilter(
        new LinearDynamics(new double[2][2], null), new double[2][2],
        FilterSettings.defaults(), 0.0, new double[2], TestMath.diag(1, 1));
    ekf.overwriteCovariance(new double[][] {{1.0, 0.0}, {0.0, -0.2}});
    ekf.propagate(new double[0], 1.0);
    assertThat(ekf.covariance()[1][1]).isPositive();
    final StepResult res = ekf.update(new LinearMeasurement(new double[][] {{1.0, 0.0}}),
        new double[] {0.0}, new boolean[] {true}, new double[][] {{1.0}}, new double[0]);
    assertThat(res.covarianceRepaired()).isTrue();
    assertThat(res.minEigenvalueBeforeRepair()).isCloseTo(-0.2,
        org.assertj.core.api.Assertions.within(1e-12));
  }
}
