package org.plateward.estimation;

/**
 * Continuous-time state dynamics dx/dt = f(x, u) and its Jacobian ∂f/∂x, as seen by the
 * estimator. Units are those of the state vector per second.
 *
 * <p>Implementations write into caller-owned arrays and must not keep references to them.
 */
public interface Dynamics {

  /** Number of states n. */
  int stateSize();

  /**
   * Evaluates the time derivative.
   *
   * @param x state, length n (state units)
   * @param u inputs (model-defined units); may be empty
   * @param dxdt output, length n (state units per second)
   */
  void derivative(double[] x, double[] u, double[] dxdt);

  /**
   * Evaluates the Jacobian ∂f/∂x at (x, u).
   *
   * @param x state, length n
   * @param u inputs
   * @param dfdx output n×n, row i = ∂f_i/∂x (1/s); every entry must be written
   */
  void jacobian(double[] x, double[] u, double[][] dfdx);

  /**
   * Evaluates f and ∂f/∂x together. Override when the model obtains both from one pass (for
   * example a forward-mode differentiated march); the default calls the two methods.
   *
   * @param x state, length n
   * @param u inputs
   * @param dxdt output, length n (state units per second)
   * @param dfdx output n×n (1/s)
   */
  default void evaluate(double[] x, double[] u, double[] dxdt, double[][] dfdx) {
    derivative(x, u, dxdt);
    jacobian(x, u, dfdx);
  }

  /**
   * Identifies the Jacobian the last {@link #evaluate} or {@link #jacobian} call returned. A
   * model that holds its Jacobian over several steps (refreshing it only when the state or the
   * inputs have moved) returns a number ≥ 0 that changes whenever the Jacobian changes; the
   * filter then reuses Φ = (I − hJ)⁻¹ instead of factorising again. The default, −1, means
   * "may change on every call".
   */
  default long jacobianVersion() {
    return -1L;
  }
}
