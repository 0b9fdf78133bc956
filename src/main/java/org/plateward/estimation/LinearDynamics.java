package org.plateward.estimation;

/**
 * Linear time-invariant dynamics dx/dt = A x + B u, for cross-checks against linear filters and
 * for simple augmented models. The matrices are copied on construction.
 */
public final class LinearDynamics implements Dynamics {
  private final double[][] a;
  private final double[][] b;

  /**
   * @param a state matrix n×n (1/s)
   * @param b input matrix n×p, or {@code null} for no input
   * @throws IllegalArgumentException if A is not square or B has the wrong row count
   */
  public LinearDynamics(double[][] a, double[][] b) {
    this.a = Matrices.copy(a);
    Matrices.requireSquare(a, "A");
    if (b != null && b.length != a.length) {
      throw new IllegalArgumentException("B has " + b.length + " rows, A has " + a.length);
    }
    this.b = b == null ? null : Matrices.copy(b);
  }

  @Override
  public int stateSize() {
    return a.length;
  }

  @Override
  public void derivative(double[] x, double[] u, double[] dxdt) {
    final int n = a.length;
    for (int i = 0; i < n; i++) {
      double s = 0.0;
      final double[] ai = a[i];
      for (int j = 0; j < n; j++) {
        s += ai[j] * x[j];
      }
      if (b != null) {
        final double[] bi = b[i];
        for (int j = 0; j < bi.length; j++) {
          s += bi[j] * u[j];
        }
      }
      dxdt[i] = s;
    }
  }

  @Override
  public void jacobian(double[] x, double[] u, double[][] dfdx) {
    for (int i = 0; i < a.length; i++) {
      System.arraycopy(a[i], 0, dfdx[i], 0, a.length);
    }
  }
}
