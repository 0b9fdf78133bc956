package org.plateward.bench;

import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.plateward.estimation.Dynamics;
import org.plateward.estimation.ExtendedKalmanFilter;
import org.plateward.estimation.FilterSettings;
import org.plateward.estimation.LinearMeasurement;
import org.plateward.estimation.StepResult;

/**
 * One estimator frame (propagate 1 s in one linearly implicit sub-step + Joseph update) at
 * n = 60 states, m = 9 measurements. The model is a dummy f = J x with a fixed Jacobian: dense
 * (worst case) or banded with 8 dense parameter columns (the reactor's shape). The model cost is
 * not part of this figure.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class EkfBench {
  private static final int N = 60;
  private static final int M = 9;

  @Param({"dense", "banded"})
  public String jacobian;

  private ExtendedKalmanFilter ekf;
  private LinearMeasurement meas;
  private double[][] r;
  private double[][] z;
  private boolean[] all;
  private double[] u;
  private int k;

  @Setup
  public void setup() {
    final Random rng = new Random(234);
    final double[][] j = new double[N][N];
    for (int a = 0; a < N; a++) {
      for (int b = 0; b < N; b++) {
        final boolean keep = "dense".equals(jacobian) || Math.abs(a - b) <= 2 || b >= N - 8;
        j[a][b] = keep ? 0.05 * rng.nextGaussian() : 0.0;
      }
      j[a][a] -= 1.0;
    }
    final Dynamics dyn = new Dynamics() {
      @Override
      public int stateSize() {
        return N;
      }

      @Override
      public void derivative(double[] x, double[] uu, double[] dxdt) {
        for (int a = 0; a < N; a++) {
          double s = 0;
          for (int b = 0; b < N; b++) {
            s += j[a][b] * x[b];
          }
          dxdt[a] = s;
        }
      }

      @Override
      public void jacobian(double[] x, double[] uu, double[][] dfdx) {
        for (int a = 0; a < N; a++) {
          System.arraycopy(j[a], 0, dfdx[a], 0, N);
        }
      }
    };
    final double[][] h = new double[M][N];
    for (double[] row : h) {
      for (int b = 0; b < N; b++) {
        row[b] = rng.nextGaussian() / Math.sqrt(N);
      }
    }
    meas = new LinearMeasurement(h);
    r = new double[M][M];
    for (int a = 0; a < M; a++) {
      r[a][a] = 0.01;
    }
    final double[][] q = new double[N][N];
    final double[][] p0 = new double[N][N];
    for (int a = 0; a < N; a++) {
      q[a][a] = 1e-3;
      p0[a][a] = 1.0;
    }
    ekf = new ExtendedKalmanFilter(dyn, q, FilterSettings.defaults(), 0.0, new double[N], p0);
    z = new double[64][M];
    for (double[] zz : z) {
      for (int a = 0; a < M; a++) {
        zz[a] = 0.1 * rng.nextGaussian();
      }
    }
    all = new boolean[M];
    java.util.Arrays.fill(all, true);
    u = new double[8];
  }

  @Benchmark
  public StepResult frame() {
    ekf.propagate(u, 1.0);
    return ekf.update(meas, z[k++ & 63], all, r, u);
  }
}
