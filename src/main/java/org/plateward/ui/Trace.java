package org.plateward.ui;

/** The estimate figures the window keeps per frame, SI. */
public enum Trace {
  /** Hidden peak plate temperature, K. */
  PEAK_K,
  /** Its standard deviation, K. */
  PEAK_SD_K,
  /** Position of the hidden peak from the reforming inlet, m. */
  PEAK_POSITION_M,
  /** Overall (length-weighted) melt fraction, 0..1. */
  MELT_OVERALL,
  /** Its standard deviation. */
  MELT_OVERALL_SD,
  /** Largest melt fraction of any cell, 0..1. */
  MELT_MAX_CELL,
  /** Time-to-exhaust, s (NaN: none forecast). */
  TIME_TO_EXHAUST_S,
  /** Its spread, s. */
  TIME_TO_EXHAUST_SD_S,
  /** Normalised innovation squared of the last update. */
  NIS,
  /** Its degrees of freedom. */
  NIS_DOF,
  /** Model prediction of the reformed gas outlet temperature, K. */
  PREDICTED_REF_OUTLET_K,
  /** Model prediction of the flue gas outlet temperature, K. */
  PREDICTED_COMB_OUTLET_K,
  /** Model prediction of the plate-end thermocouple at z = 0, K. */
  PREDICTED_PLATE_END_INLET_K,
  /** Model prediction of the plate-end thermocouple at z = L, K. */
  PREDICTED_PLATE_END_OUTLET_K;

  /** The prediction trace of frame-rate output k (0..3). */
  public static Trace predicted(int k) {
    return values()[PREDICTED_REF_OUTLET_K.ordinal() + k];
  }
}
