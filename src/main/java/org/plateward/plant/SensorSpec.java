package org.plateward.plant;

/**
 * The measurement model of one boundary signal, in the signal's edge unit.
 *
 * <pre>
 *   l_{k+1} = l_k + (x_{k+1} - l_k)(1 - exp(-dt / tau))      first-order lag (thermocouples)
 *   z_k     = q round((l_k + b + v_k + faults) / q),   v_k ~ N(0, sd^2)   (sd relative: sd |l_k|)
 * </pre>
 *
 * b is the meter's systematic error (its accuracy class): drawn once per run from N(0,
 * accuracySd^2) (relative like the noise when {@code relativeNoise}) and held, as a calibration
 * offset is.
 *
 * @param noiseSd standard deviation of the white noise: in the edge unit, or relative to the
 *     reading when {@code relativeNoise}
 * @param relativeNoise whether {@code noiseSd} is a fraction of the reading (flow meters)
 * @param lagS time constant of the first-order lag, s (0 for none)
 * @param quantum quantisation step of the transmitted value, edge unit (0 for none)
 * @param accuracySd standard deviation of the systematic error b, same convention as the noise
 */
public record SensorSpec(double noiseSd, boolean relativeNoise, double lagS, double quantum, double accuracySd) {
  /** A sensor without systematic error. */
  public SensorSpec(double noiseSd, boolean relativeNoise, double lagS, double quantum) {
    this(noiseSd, relativeNoise, lagS, quantum, 0.0);
  }

  public SensorSpec {
    if (!(noiseSd >= 0.0) || !(lagS >= 0.0) || !(quantum >= 0.0) || !(accuracySd >= 0.0)) {
      throw new IllegalArgumentException("sensor parameters must be non-negative");
    }
  }
}
