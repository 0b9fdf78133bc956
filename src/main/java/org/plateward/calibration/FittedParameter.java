package org.plateward.calibration;

import org.plateward.reactor.ModelParameters;

/** The four model parameters calibration fits, with their file keys and units. */
public enum FittedParameter {
  REFORMING_ACTIVITY("reforming_activity", "", "reforming catalyst activity multiplier"),
  COMBUSTION_ACTIVITY("combustion_activity", "", "combustion catalyst activity multiplier"),
  HEAT_LOSS("heat_loss_coefficient", "W/(m2 K)", "heat-loss coefficient"),
  HEAT_TRANSFER_MULTIPLIER("heat_transfer_multiplier", "", "gas-wall heat-transfer multiplier");

  public static final int COUNT = values().length;

  private final String key;
  private final String unit;
  private final String meaning;

  FittedParameter(String key, String unit, String meaning) {
    this.key = key;
    this.unit = unit;
    this.meaning = meaning;
  }

  /** Key in the parameter file. */
  public String key() {
    return key;
  }

  /** Unit label (empty for multipliers). */
  public String unit() {
    return unit;
  }

  public String meaning() {
    return meaning;
  }

  /** This parameter's value in {@code p}, SI. */
  public double of(ModelParameters p) {
    return switch (this) {
      case REFORMING_ACTIVITY -> p.reformingActivity();
      case COMBUSTION_ACTIVITY -> p.combustionActivity();
      case HEAT_LOSS -> p.heatLossCoefficientWPerM2K();
      case HEAT_TRANSFER_MULTIPLIER -> p.heatTransferMultiplier();
    };
  }

  /** The parameters from values in enum order. */
  public static ModelParameters toParameters(double[] v) {
    return new ModelParameters(v[0], v[1], v[2], v[3]);
  }

  /** The values in enum order. */
  public static double[] values(ModelParameters p) {
    double[] v = new double[COUNT];
    for (FittedParameter f : values()) {
      v[f.ordinal()] = f.of(p);
    }
    return v;
  }
}
