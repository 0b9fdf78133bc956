package org.plateward.plant;

/**
 * The measurement model of one boundary signal, in the signal's edge unit.
 *
 * <pre>
 *   l_{k+1} = l_k + (x_{k+1} - l_k)(1 - exp(-dt / tau))      first-order lag (thermocouples)
 *   z_k     = q round((l_k + v_k + faults) / q),   v_k ~ N(0, sd^2)   (sd relative: sd |l_k|)
 * </pre>
 *
 * @param noiseSd standard deviation of the white noise: in the edge unit, or relative to the
 *     reading when {@code relativeNoise}
 * @param relativeNoise whether {@code noiseSd} is a fraction of the reading (flow meters)
 * @param lagS time constant of the first-order lag, s (0 for none)
 * @param quantum quantisation step of the transmitted value, edge unit (0 for none)
 */
public record SensorSpec(double noiseSd, boolean relativeNoise, double lagS, double quantum) {
  public SensorSpec {
    if (!(noiseSd >= 0.0) || !(lagS >= 0.0) || !(quantum >= 0.0)) {
      throw new IllegalArgumentException("sensor parameters must be non-negative");
    }
  }
}
