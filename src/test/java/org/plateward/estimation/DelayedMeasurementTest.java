package org.plateward.estimation;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

/**
 * Delayed measurements by exact rollback and re-filtering. Oracle: for a linear model, a filter
 * that receives the analyzer value late must end in the same state and covariance as a filter
 * that had it on time (Kalman filter with the same data in the same order; rounding only).
 */
class DelayedMeasurementTest {
  // three coupled states, inputs; a fast sensor on state 0 and an "analyzer" on state 2
  private static final double[][] A = {{-0.2, 0.1, 0.0}, {0.05, -0.1, 0.02}, {0.0, 0.3, -0.4}};
  private static final double[][] B = {{1.0}, {0.0}, {0.2}};
  private static final double[][] Q = TestMath.diag(0.01, 0.002, 0.005);
  private static final LinearMeasurement FAST =
      new LinearMeasurement(new double[][] {{1.0, 0.0, 0.0}});
  private static final LinearMeasurement ANALYZER =
      new LinearMeasurement(new double[][] {{0.0, 0.0, 1.0}});
  private static final double[][] R_FAST = {{0.01}};
  private static final double[][] R_AN = {{0.002}};

  private record Sample(double timeS, double value) {}

  private static ExtendedKalmanFilter filter() {
    return new ExtendedKalmanFilter(new LinearDynamics(A, B), Q,
        FilterSettings.defaults().withMaxSubstepS(0.25).withHistoryLength(60), 0.0,
        new double[3], TestMath.diag(1.0, 1.0, 1.0));
  }

  @Test
  void lateAnalyzerValueGivesTheSameResultAsOnTime() {
    run(0.0);
  }

  @Test
  void lateValueBetweenEpochsIsInsertedAtItsOwnTime() {
    run(0.5);
  }

  /** Truth by Euler–Maruyama with 0.01 s steps; index j is time j·0.01 s. */
  private static double[][] truth(Well19937c rng, int seconds) {
    final int per = 100;
    final double[][] xs = new double[seconds * per + 1][3];
    for (int j = 0; j < seconds * per; j++) {
      final double u = Math.sin(0.05 * Math.ceil((j + 0.5) / per));
      for (int i = 0; i < 3; i++) {
        double d = B[i][0] * u;
        for (int c = 0; c < 3; c++) {
          d += A[i][c] * xs[j][c];
        }
        xs[j + 1][i] = xs[j][i] + 0.01 * d + Math.sqrt(Q[i][i] * 0.01) * rng.nextGaussian();
      }
    }
    return xs;
  }

  private void run(double offsetS) {
    final Well19937c rng = new Well19937c(1000);
    final double[][] xs = truth(rng, 201);
    final ExtendedKalmanFilter onTime = filter();
    final ExtendedKalmanFilter late = filter();
    final ExtendedKalmanFilter without = filter(); // control: never gets the analyzer
    final double delayS = 20.0;
    final List<Sample> pending = new ArrayList<>();
    StepResult lastDelayed = null;
    for (int k = 1; k <= 200; k++) {
      final double[] u = {Math.sin(0.05 * k)};
      final double t = k;
      // analyzer every 30 s, the last one early enough that it arrives before the end
      final boolean analyzerNow =
          k <= 175 && (offsetS == 0.0 ? k % 30 == 0 : (k - 1) % 30 == 0);
      if (analyzerNow && offsetS > 0) {
        // the sample belongs to t−1+offset: the on-time filter stops there
        final double an = xs[(int) Math.round((t - 1 + offsetS) * 100)][2]
            + Math.sqrt(R_AN[0][0]) * rng.nextGaussian();
        onTime.propagate(u, offsetS);
        onTime.update(ANALYZER, new double[] {an}, new boolean[] {true}, R_AN, u);
        onTime.propagate(u, 1.0 - offsetS);
        pending.add(new Sample(t - 1 + offsetS, an));
      } else {
        onTime.propagate(u, 1.0);
      }
      late.propagate(u, 1.0);
      without.propagate(u, 1.0);
      final double z = xs[k * 100][0] + Math.sqrt(R_FAST[0][0]) * rng.nextGaussian();
      onTime.update(FAST, new double[] {z}, new boolean[] {true}, R_FAST, u);
      late.update(FAST, new double[] {z}, new boolean[] {true}, R_FAST, u);
      without.update(FAST, new double[] {z}, new boolean[] {true}, R_FAST, u);
      if (analyzerNow && offsetS == 0.0) {
        final double an = xs[k * 100][2] + Math.sqrt(R_AN[0][0]) * rng.nextGaussian();
        onTime.update(ANALYZER, new double[] {an}, new boolean[] {true}, R_AN, u);
        pending.add(new Sample(t, an));
      }
      // the analyzer value arrives delayS later
      for (int i = pending.size() - 1; i >= 0; i--) {
        final Sample s = pending.get(i);
        if (t >= s.timeS + delayS - 1e-9) {
          final double[] us = {Math.sin(0.05 * Math.ceil(s.timeS - 1e-9))};
          lastDelayed = late.updateDelayed(s.timeS, ANALYZER, new double[] {s.value},
              new boolean[] {true}, R_AN, us);
          pending.remove(i);
        }
      }
    }
    assertThat(lastDelayed).isNotNull();
    assertThat(lastDelayed.delayed()).isTrue();
    assertThat(lastDelayed.channelStatus()[0]).isEqualTo(ChannelStatus.USED);
    final double dx = TestMath.maxAbsDiff(late.state(), onTime.state());
    final double dp = TestMath.maxAbsDiff(late.covariance(), onTime.covariance());
    System.out.printf("Delayed (offset %.1f s): max |dx|=%.3e max |dP|=%.3e%n", offsetS, dx, dp);
    // exact method: equal to rounding (brief: 1e-9)
    assertThat(dx).isLessThan(1e-9);
    assertThat(dp).isLessThan(1e-9);
    assertThat(late.timeS()).isEqualTo(onTime.timeS());
    assertThat(pending).isEmpty();
    // the analyzer matters: a filter without it ends in a clearly different state
    assertThat(TestMath.maxAbsDiff(without.state(), onTime.state())).isGreaterThan(1e-4);
  }

  @Test
  void valueOlderThanTheHistoryIsDroppedAndCounted() {
    final ExtendedKalmanFilter ekf = filter();
    for (int k = 0; k < 100; k++) {
      ekf.propagate(new double[] {0.0}, 1.0);
    }
    final double[] x = ekf.state();
    final StepResult res = ekf.updateDelayed(10.0, ANALYZER, new double[] {1.0},
        new boolean[] {true}, R_AN, new double[] {0.0});
    assertThat(res.channelStatus()[0]).isEqualTo(ChannelStatus.TOO_LATE);
    assertThat(ekf.lateDroppedCount()).isEqualTo(1);
    assertThat(ekf.state()).containsExactly(x);
    assertThat(ekf.historyStartTimeS()).isEqualTo(41.0);
  }
}
