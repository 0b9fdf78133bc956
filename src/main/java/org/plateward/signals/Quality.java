package org.plateward.signals;

/** Quality of one measured value, following the OPC UA StatusCode severity (Good/Uncertain/Bad). */
public enum Quality {
  GOOD,
  UNCERTAIN,
  BAD,
  /** No value arrived for this frame (never filled with a guess). */
  MISSING;

  /** True when the value may be used by the estimator. */
  public boolean usable() {
    return this == GOOD || this == UNCERTAIN;
  }
}
