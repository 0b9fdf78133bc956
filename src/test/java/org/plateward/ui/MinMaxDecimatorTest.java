package org.plateward.ui;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The decimator against brute force: for every column, the minimum and maximum over all samples
 * whose column (floor((t − t0)·W/(t1 − t0))) is that column, found by scanning every sample.
 */
class MinMaxDecimatorTest {
  /** Brute force: O(samples · columns), no binary search, no early exit. */
  private static double[][] bruteForce(double[] t, double[] v, int n, double t0, double t1, int w) {
    double[] min = new double[w];
    double[] max = new double[w];
    for (int c = 0; c < w; c++) {
      min[c] = Double.NaN;
      max[c] = Double.NaN;
      for (int i = 0; i < n; i++) {
        if (t[i] < t0 || t[i] >= t1 || Double.isNaN(v[i])) {
          continue;
        }
        if ((int) Math.floor((t[i] - t0) * w / (t1 - t0)) != c) {
          continue;
        }
        min[c] = Double.isNaN(min[c]) ? v[i] : Math.min(min[c], v[i]);
        max[c] = Double.isNaN(max[c]) ? v[i] : Math.max(max[c], v[i]);
      }
    }
    return new double[][] {min, max};
  }

  @Test
  void minAndMaxPerColumnEqualBruteForceOnRandomData() {
    Random rnd = new Random(234);
    for (int trial = 0; trial < 200; trial++) {
      int n = 1 + rnd.nextInt(3000);
      double[] t = new double[n + 10];
      double[] v = new double[n + 10];
      double time = rnd.nextDouble() * 100;
      for (int i = 0; i < n; i++) {
        // irregular steps, repeated times, gaps, NaNs and spikes (noise, not a sine)
        time += rnd.nextInt(10) == 0 ? rnd.nextDouble() * 50 : rnd.nextInt(5) == 0 ? 0.0 : rnd.nextDouble() * 2;
        t[i] = time;
        v[i] = rnd.nextInt(20) == 0 ? Double.NaN : rnd.nextGaussian() * (rnd.nextInt(50) == 0 ? 100 : 1);
      }
      double t0 = t[0] + (rnd.nextDouble() - 0.2) * (time - t[0]) * 0.5;
      double t1 = t0 + 1 + rnd.nextDouble() * (time - t[0]);
      int w = 1 + rnd.nextInt(400);
      double[] min = new double[w];
      double[] max = new double[w];
      int filled = MinMaxDecimator.decimate(t, v, n, t0, t1, w, min, max);
      double[][] ref = bruteForce(t, v, n, t0, t1, w);
      assertThat(min).as("trial %d min", trial).containsExactly(ref[0]);
      assertThat(max).as("trial %d max", trial).containsExactly(ref[1]);
      int refFilled = 0;
      for (double x : ref[0]) {
        refFilled += Double.isNaN(x) ? 0 : 1;
      }
      assertThat(filled).isEqualTo(refFilled);
    }
  }

  @Test
  void bandEnvelopeEqualsBruteForceOnRandomData() {
    Random rnd = new Random(1000);
    for (int trial = 0; trial < 100; trial++) {
      int n = 1 + rnd.nextInt(2000);
      double[] t = new double[n];
      double[] v = new double[n];
      double[] sd = new double[n];
      for (int i = 0; i < n; i++) {
        t[i] = i + (rnd.nextInt(7) == 0 ? 0.5 : 0.0);
        v[i] = rnd.nextGaussian() * 10;
        sd[i] = rnd.nextInt(30) == 0 ? Double.NaN : Math.abs(rnd.nextGaussian());
      }
      double k = 2.0;
      double[] lo = new double[n];
      double[] hi = new double[n];
      for (int i = 0; i < n; i++) {
        lo[i] = v[i] - k * sd[i];
        hi[i] = v[i] + k * sd[i];
      }
      double t0 = -3;
      double t1 = n * 0.8;
      int w = 1 + rnd.nextInt(300);
      double[] lower = new double[w];
      double[] upper = new double[w];
      MinMaxDecimator.decimateBand(t, v, sd, k, n, t0, t1, w, lower, upper);
      assertThat(lower).containsExactly(bruteForce(t, lo, n, t0, t1, w)[0]);
      assertThat(upper).containsExactly(bruteForce(t, hi, n, t0, t1, w)[1]);
    }
  }

  @Test
  void aSpikeOfOneSampleSurvivesADayInOneThousandColumns() {
    int n = 86_400;
    double[] t = new double[n];
    double[] v = new double[n];
    for (int i = 0; i < n; i++) {
      t[i] = i;
    }
    v[43_210] = 50.0;
    double[] min = new double[1000];
    double[] max = new double[1000];
    MinMaxDecimator.decimate(t, v, n, 0, n, 1000, min, max);
    // 86.4 s per column: sample 43 210 lies in column floor(43 210 / 86.4) = 500
    assertThat(max[500]).isEqualTo(50.0);
    assertThat(min[500]).isEqualTo(0.0);
  }

  @Test
  void badWindowsAreRefused() {
    assertThatThrownBy(() -> MinMaxDecimator.decimate(new double[1], new double[1], 1, 5, 5, 10,
        new double[10], new double[10])).isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> MinMaxDecimator.decimate(new double[1], new double[1], 1, 0, 5, 10,
        new double[9], new double[10])).isInstanceOf(IllegalArgumentException.class);
  }
}
