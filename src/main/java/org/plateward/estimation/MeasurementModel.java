package org.plateward.estimation;

/**
 * Measurement function y = h(x, u) and its Jacobian ∂h/∂x for one group of measurement
 * channels (for example all frame-rate sensors, or the composition analyzer alone).
 *
 * <p>The model always predicts every channel; which ones are used is decided per update by an
 * availability mask and by gating.
 */
public interface MeasurementModel {

  /** Number of measurement channels m. */
  int size();

  /**
   * Predicts the measurements.
   *
   * @param x state, length n
   * @param u inputs
   * @param y output, length m (measurement units)
   */
  void predict(double[] x, double[] u, double[] y);

  /**
   * Evaluates the Jacobian ∂h/∂x.
   *
   * @param x state, length n
   * @param u inputs
   * @param dhdx output m×n; every entry must be written
   */
  void jacobian(double[] x, double[] u, double[][] dhdx);

  /**
   * Evaluates h and ∂h/∂x together; override when one pass gives both.
   *
   * @param x state, length n
   * @param u inputs
   * @param y output, length m
   * @param dhdx output m×n
   */
  default void evaluate(double[] x, double[] u, double[] y, double[][] dhdx) {
    predict(x, u, y);
    jacobian(x, u, dhdx);
  }
}
