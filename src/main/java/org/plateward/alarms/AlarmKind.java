package org.plateward.alarms;

/**
 * The advisory alarms Plateward raises. Each has a config key, the kind of limit it is judged
 * against, and the direction of the limit.
 */
public enum AlarmKind {
  /** Hidden peak temperature high, judged on the upper confidence bound mean + kσ (K). */
  PEAK_HIGH("peak_high", "hidden peak temperature high", LimitKind.TEMPERATURE, true),
  /** Hidden peak temperature high-high, judged on mean + kσ (K). */
  PEAK_HIGH_HIGH("peak_high_high", "hidden peak temperature high-high", LimitKind.TEMPERATURE, true),
  /** Largest melt fraction of any buffer-layer cell high (fraction 0–1). */
  MELT_HIGH("melt_high", "buffer-layer melt fraction high", LimitKind.FRACTION, true),
  /** Forecast time until the buffer layer is spent is short (s). */
  EXHAUST_LOW("exhaust_low", "time-to-exhaust low", LimitKind.TIME, false),
  /** The estimator reports itself untrustworthy. */
  ESTIMATOR_UNTRUSTWORTHY("estimator_untrustworthy", "estimator untrustworthy", LimitKind.NONE, true),
  /** At least one input signal is Bad or stale. */
  SIGNAL_BAD_OR_STALE("signal_bad_or_stale", "signal Bad or stale", LimitKind.NONE, true),
  /** The OPC UA connection to the plant endpoint is lost. */
  CONNECTION_LOST("connection_lost", "OPC UA connection lost", LimitKind.NONE, true),
  /** History is not being kept (the recorder is refusing or failing writes). */
  HISTORY_NOT_KEPT("history_not_kept", "history not being kept", LimitKind.NONE, true);

  /** What the limit of an alarm is, and so its unit in configuration. */
  public enum LimitKind {
    /** Absolute temperature, K inside; deadband in K. */
    TEMPERATURE,
    /** Dimensionless fraction 0–1 (config: plain number or per cent). */
    FRACTION,
    /** Duration, s inside. */
    TIME,
    /** A yes/no condition: no limit, no deadband. */
    NONE
  }

  private final String key;
  private final String title;
  private final LimitKind limitKind;
  private final boolean high;

  AlarmKind(String key, String title, LimitKind limitKind, boolean high) {
    this.key = key;
    this.title = title;
    this.limitKind = limitKind;
    this.high = high;
  }

  /** The alarm id: config sub-table name and audit-trail id, e.g. {@code peak_high}. */
  public String key() {
    return key;
  }

  /** A short title for messages. */
  public String title() {
    return title;
  }

  public LimitKind limitKind() {
    return limitKind;
  }

  /** True when the alarm is raised above its limit, false when below (time-to-exhaust). */
  public boolean high() {
    return high;
  }

  /** The kind with config key {@code key}, or null. */
  public static AlarmKind ofKey(String key) {
    for (AlarmKind k : values()) {
      if (k.key.equals(key)) {
        return k;
      }
    }
    return null;
  }
}
