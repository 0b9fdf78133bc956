package org.plateward.calibration;

import org.plateward.reactor.ModelOutputs;
import org.plateward.softsensor.SoftSensorSettings;

/**
 * Standard deviation of one reading of each measured output, SI ({@link ModelOutputs} order):
 * the weights of the calibration residuals.
 */
public final class MeasurementSigmas {
  private final double[] sigmaSi;

  /** @param sigmaSi one positive σ per model output, SI (K, mole fraction) */
  public MeasurementSigmas(double[] sigmaSi) {
    if (sigmaSi.length != ModelOutputs.COUNT) {
      throw new IllegalArgumentException("one sigma per model output");
    }
    for (double s : sigmaSi) {
      if (!(s > 0.0)) {
        throw new IllegalArgumentException("sigmas must be positive, got " + s);
      }
    }
    this.sigmaSi = sigmaSi.clone();
  }

  /** The instrument noise the soft sensor is tuned for (its R before representation error). */
  public static MeasurementSigmas of(SoftSensorSettings s) {
    double[] t = s.temperatureNoiseK();
    double[] a = s.analyzerNoiseMolPct();
    double[] v = new double[ModelOutputs.COUNT];
    v[ModelOutputs.REF_OUTLET_TEMP_K] = t[0];
    v[ModelOutputs.COMB_OUTLET_TEMP_K] = t[1];
    v[ModelOutputs.PLATE_END_INLET_K] = t[2];
    v[ModelOutputs.PLATE_END_OUTLET_K] = t[3];
    v[ModelOutputs.REF_DRY_CH4] = a[0] / 100.0;
    v[ModelOutputs.REF_DRY_CO] = a[1] / 100.0;
    v[ModelOutputs.REF_DRY_CO2] = a[2] / 100.0;
    v[ModelOutputs.REF_DRY_H2] = a[3] / 100.0;
    v[ModelOutputs.COMB_DRY_O2] = a[4] / 100.0;
    return new MeasurementSigmas(v);
  }

  /** σ of output {@code index}, SI. */
  public double sigmaSi(int index) {
    return sigmaSi[index];
  }
}
