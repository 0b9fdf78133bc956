package org.plateward.estimation;

/** Linear measurement y = H x. The matrix is copied on construction. */
public final class LinearMeasurement implements MeasurementModel {
  private final double[][] h;

  /**
   * @param h measurement matrix m×n
   * @throws IllegalArgumentException if H is empty or ragged
   */
  public LinearMeasurement(double[][] h) {
    if (h.length == 0) {
      throw new IllegalArgumentException("H has no rows");
    }
    this.h = Matrices.copy(h);
  }

  @Override
  public int size() {
    return h.length;
  }

  @Override
  public void predict(double[] x, double[] u, double[] y) {
    for (int i = 0; i < h.length; i++) {
      double s = 0.0;
      final double[] hi = h[i];
      for (int j = 0; j < hi.length; j++) {
        s += hi[j] * x[j];
      }
      y[i] = s;
    }
  }

  @Override
  public void jacobian(double[] x, double[] u, double[][] dhdx) {
    for (int i = 0; i < h.length; i++) {
      System.arraycopy(h[i], 0, dhdx[i], 0, h[i].length);
    }
  }
}
