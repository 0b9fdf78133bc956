package org.plateward.alarms;

import java.time.Duration;
import java.time.Instant;

/**
 * Turns a sampled value into an alarm condition with a deadband, an on-delay and an off-delay,
 * all in the input's time.
 *
 * <p>For a high alarm: the condition comes on once value &gt; limit has held for the on-delay,
 * and goes off once value &lt; limit − deadband has held for the off-delay (mirror image for a
 * low alarm). A value between the two thresholds keeps the condition as it is and restarts any
 * pending delay. A NaN value keeps the condition and restarts any pending delay.
 * Yes/no alarms use limit 0.5 on values 0/1.
 */
final class ConditionFilter {
  private final boolean high;
  private final double limit;
  private final double deadband;
  private final Duration onDelay;
  private final Duration offDelay;
  private boolean active;
  private Instant pendingSince;

  ConditionFilter(AlarmDefinition d) {
    this.high = d.kind().high();
    this.limit = Double.isNaN(d.limit()) ? 0.5 : d.limit();
    this.deadband = d.deadband();
    this.onDelay = d.onDelay();
    this.offDelay = d.offDelay();
  }

  /**
   * Feeds one sample.
   *
   * @param t sample time (non-decreasing)
   * @param value the judged value, SI
   * @return true when the condition changed
   */
  boolean update(Instant t, double value) {
    if (Double.isNaN(value)) {
      pendingSince = null;
      return false;
    }
    boolean wants = active
        ? (high ? value < limit - deadband : value > limit + deadband)
        : (high ? value > limit : value < limit);
    if (!wants) {
      pendingSince = null;
      return false;
    }
    if (pendingSince == null) {
      pendingSince = t;
    }
    Duration delay = active ? offDelay : onDelay;
    if (Duration.between(pendingSince, t).compareTo(delay) >= 0) {
      active = !active;
      pendingSince = null;
      return true;
    }
    return false;
  }

  boolean active() {
    return active;
  }

  /** The limit in force, SI (0.5 for yes/no alarms). */
  double limit() {
    return limit;
  }
}
