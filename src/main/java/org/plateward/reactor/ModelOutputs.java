package org.plateward.reactor;

import org.plateward.signals.Signal;

/**
 * Index of the model outputs y = h(x, u, p), in SI (K, mole fractions on a dry basis). The
 * order matches the measured signals of kind OUTPUT and ANALYZER in {@link Signal}.
 */
public final class ModelOutputs {
  public static final int REF_OUTLET_TEMP_K = 0;
  public static final int COMB_OUTLET_TEMP_K = 1;
  public static final int REF_DRY_CH4 = 2;
  public static final int REF_DRY_CO = 3;
  public static final int REF_DRY_CO2 = 4;
  public static final int REF_DRY_H2 = 5;
  public static final int COMB_DRY_O2 = 6;
  public static final int PLATE_END_INLET_K = 7;
  public static final int PLATE_END_OUTLET_K = 8;
  public static final int COUNT = 9;

  private static final Signal[] SIGNALS = {
    Signal.REF_OUTLET_TEMP, Signal.COMB_OUTLET_TEMP, Signal.REF_OUTLET_CH4, Signal.REF_OUTLET_CO,
    Signal.REF_OUTLET_CO2, Signal.REF_OUTLET_H2, Signal.COMB_OUTLET_O2,
    Signal.PLATE_END_TEMP_REF_INLET, Signal.PLATE_END_TEMP_REF_OUTLET
  };

  private ModelOutputs() {}

  /** The measured signal that output {@code index} predicts. */
  public static Signal signal(int index) {
    return SIGNALS[index];
  }
}
