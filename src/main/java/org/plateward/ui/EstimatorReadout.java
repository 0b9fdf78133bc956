package org.plateward.ui;

import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.StateLayout;

/**
 * Reads from the estimator what the window shows besides the estimate, on the estimator's own
 * thread: the model's prediction of the four frame-rate outputs as the filter holds it (its lag
 * states, plus the thermocouple bias states for the two plate ends). Reading, not computing.
 */
final class EstimatorReadout {
  private EstimatorReadout() {}

  /** The four predictions, K (NaN before the estimator started). */
  static double[] predictedOutputsK(ReactorSoftSensor sensor) {
    double[] x = sensor.state();
    double[] y = {Double.NaN, Double.NaN, Double.NaN, Double.NaN};
    if (x == null) {
      return y;
    }
    StateLayout l = sensor.layout();
    for (int k = 0; k < 4; k++) {
      y[k] = x[l.lag(k)];
    }
    // the plate-end thermocouples read the lagged plate end plus their bias: y = T_lag + b
    y[2] += x[l.bias(0)];
    y[3] += x[l.bias(1)];
    return y;
  }
}
