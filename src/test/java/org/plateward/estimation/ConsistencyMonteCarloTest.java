package org.plateward.estimation;

import static org.assertj.core.api.Assertions.assertThat;

import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

/**
 * Monte-Carlo consistency (Bar-Shalom, Li &amp; Kirubarajan 2001, §5.4; REFERENCES.md §6): with N
 * runs, N·ε̄ ~ χ²(N·n). N = 50: NEES (n = 2) band [1.484, 2.591], NIS (n = 1) band
 * [0.647, 1.428]. The truth is simulated with the exact discretisation (Van Loan 1978); the
 * filter uses its continuous-discrete propagation with 0.01 s sub-steps.
 */
class ConsistencyMonteCarloTest {

  @Test
  void meanNeesAndNisLieInsideTheirChiSquareBands() {
    final double[][] a = {{0.0, 1.0}, {-1.0, -0.4}}; // damped oscillator (1/s)
    final double[][] q = {{0.0, 0.0}, {0.0, 0.5}}; // acceleration noise density
    final double[][] h = {{1.0, 0.0}};
    final double[][] r = {{0.05}};
    final double dt = 0.5;
    final int runs = 50;
    final int steps = 100;
    final RealMatrix[] exact = TestMath.vanLoan(new Array2DRowRealMatrix(a),
        new Array2DRowRealMatrix(q), dt);
    final double[][] p0 = TestMath.diag(1.0, 1.0);
    final Well19937c rng = new Well19937c(1000);
    final double[] neesSum = new double[steps];
    final double[] nisSum = new double[steps];
    final LinearMeasurement meas = new LinearMeasurement(h);
    for (int run = 0; run < runs; run++) {
      double[] truth = TestMath.gaussian(rng, p0);
      final ExtendedKalmanFilter ekf = new ExtendedKalmanFilter(new LinearDynamics(a, null), q,
          FilterSettings.defaults().withMaxSubstepS(0.01).withGating(false), 0.0,
          new double[2], p0);
      for (int k = 0; k < steps; k++) {
        truth = exact[0].operate(truth);
        final double[] w = TestMath.gaussian(rng, exact[1].getData());
        truth[0] += w[0];
        truth[1] += w[1];
        final double z = truth[0] + Math.sqrt(r[0][0]) * rng.nextGaussian();
        ekf.propagate(new double[0], dt);
        final StepResult res = ekf.update(meas, new double[] {z}, new boolean[] {true}, r,
            new double[0]);
        final double[] xh = res.state();
        neesSum[k] += TestMath.mahalanobis(
            new double[] {truth[0] - xh[0], truth[1] - xh[1]}, res.covariance());
        nisSum[k] += res.nis();
      }
    }
    // bands from Commons Math χ² quantiles, equal to REFERENCES.md §6 to 3 decimals
    final double[] neesBand = band(runs, 2);
    final double[] nisBand = band(runs, 1);
    assertThat(neesBand[0]).isCloseTo(1.484, org.assertj.core.api.Assertions.within(5e-4));
    assertThat(neesBand[1]).isCloseTo(2.591, org.assertj.core.api.Assertions.within(5e-4));
    assertThat(nisBand[0]).isCloseTo(0.647, org.assertj.core.api.Assertions.within(5e-4));
    assertThat(nisBand[1]).isCloseTo(1.428, org.assertj.core.api.Assertions.within(5e-4));
    int neesIn = 0;
    int nisIn = 0;
    double neesAll = 0;
    double nisAll = 0;
    for (int k = 0; k < steps; k++) {
      final double ne = neesSum[k] / runs;
      final double ni = nisSum[k] / runs;
      neesAll += ne / steps;
      nisAll += ni / steps;
      neesIn += ne >= neesBand[0] && ne <= neesBand[1] ? 1 : 0;
      nisIn += ni >= nisBand[0] && ni <= nisBand[1] ? 1 : 0;
    }
    System.out.printf("Consistency: mean NEES=%.3f (%d/%d steps in [%.3f, %.3f]),"
        + " mean NIS=%.3f (%d/%d in [%.3f, %.3f])%n", neesAll, neesIn, steps, neesBand[0],
        neesBand[1], nisAll, nisIn, steps, nisBand[0], nisBand[1]);
    // per step, a consistent filter is inside a 95% band 95% of the time; ≥ 88 of 100 is the
    // binomial 3σ lower limit (common practice for such a check)
    assertThat(neesIn).isGreaterThanOrEqualTo(88);
    assertThat(nisIn).isGreaterThanOrEqualTo(88);
    // the grand mean over all 50×100 samples against the χ²(5000·n) band (same §5.4 formula;
    // NEES samples of one run are correlated in time, so this band is if anything too narrow)
    final double[] neesGrand = band(runs * steps, 2);
    final double[] nisGrand = band(runs * steps, 1);
    assertThat(neesAll).isBetween(neesGrand[0], neesGrand[1]);
    assertThat(nisAll).isBetween(nisGrand[0], nisGrand[1]);
  }

  private static double[] band(int runs, int dof) {
    final ChiSquaredDistribution chi = new ChiSquaredDistribution((double) runs * dof);
    return new double[] {chi.inverseCumulativeProbability(0.025) / runs,
        chi.inverseCumulativeProbability(0.975) / runs};
  }
}
