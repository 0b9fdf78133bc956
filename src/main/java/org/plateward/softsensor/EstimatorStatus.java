package org.plateward.softsensor;

/** How far an estimate can be trusted. */
public enum EstimatorStatus {
  /** Every input and measurement used, innovations consistent. */
  OK("ok"),
  /** An input or measurement is missing, Bad, stale or gated; the estimate uses the rest. */
  DEGRADED("degraded"),
  /** Innovations persistently outside their χ² band, or the covariance had to be repaired. */
  UNTRUSTWORTHY("untrustworthy");

  private final String text;

  EstimatorStatus(String text) {
    this.text = text;
  }

  /** The word written to estimate files and shown to the operator. */
  public String text() {
    return text;
  }

  /** The worse of two statuses. */
  public EstimatorStatus worst(EstimatorStatus other) {
    return other.ordinal() > ordinal() ? other : this;
  }
}
