package org.plateward.alarms;

import java.time.Instant;
import java.util.Objects;
import java.util.Set;

/**
 * The values one alarm evaluation looks at: one estimate and the health of the chain behind it.
 * The alarm board keeps its own time from {@code time}, never from the wall clock, so replay
 * and live operation behave the same.
 *
 * @param time the time of the estimate
 * @param peakTempK mean of the hidden peak temperature, K (NaN when none)
 * @param peakTempSdK standard deviation of the hidden peak temperature, K (NaN when none)
 * @param maxCellMeltFraction largest melt fraction of any buffer-layer cell, 0–1 (NaN when none)
 * @param timeToExhaustS forecast time until the buffer layer is spent, s; NaN when no
 *     exhaustion is forecast
 * @param estimatorStatus {@code ok}, {@code degraded} or {@code untrustworthy}
 * @param badOrStaleSignals names of the input signals that are Bad or stale now
 * @param connectionLost whether the OPC UA connection is lost
 * @param historyNotKept whether history is not being kept
 */
public record AlarmInputs(
    Instant time, double peakTempK, double peakTempSdK, double maxCellMeltFraction,
    double timeToExhaustS, String estimatorStatus, Set<String> badOrStaleSignals,
    boolean connectionLost, boolean historyNotKept) {
  /** The estimator status that marks the estimate as not to be trusted. */
  public static final String UNTRUSTWORTHY = "untrustworthy";

  public AlarmInputs {
    Objects.requireNonNull(time, "time");
    Objects.requireNonNull(estimatorStatus, "estimatorStatus");
    if (!Set.of("ok", "degraded", UNTRUSTWORTHY).contains(estimatorStatus)) {
      throw new IllegalArgumentException(
          "estimatorStatus must be ok, degraded or untrustworthy, got " + estimatorStatus);
    }
    badOrStaleSignals = Set.copyOf(badOrStaleSignals);
  }

  /** Whether the estimator calls itself untrustworthy. */
  public boolean untrustworthy() {
    return UNTRUSTWORTHY.equals(estimatorStatus);
  }

  /**
   * The value an alarm is judged on, SI: mean + kσ for the peak alarms (a missing σ counts as
   * unknown), the melt fraction, the time-to-exhaust (+∞ when none is forecast), or 1/0 for
   * yes/no alarms. NaN means "no judgement possible": the alarm holds its condition.
   *
   * @param kind the alarm
   * @param kSigma the upper-confidence factor k
   */
  public double judged(AlarmKind kind, double kSigma) {
    return switch (kind) {
      // upper confidence bound: T_ucb = mean + k·σ
      case PEAK_HIGH, PEAK_HIGH_HIGH -> peakTempK + kSigma * peakTempSdK;
      case MELT_HIGH -> maxCellMeltFraction;
      case EXHAUST_LOW -> Double.isNaN(timeToExhaustS) ? Double.POSITIVE_INFINITY : timeToExhaustS;
      case ESTIMATOR_UNTRUSTWORTHY -> untrustworthy() ? 1.0 : 0.0;
      case SIGNAL_BAD_OR_STALE -> badOrStaleSignals.isEmpty() ? 0.0 : 1.0;
      case CONNECTION_LOST -> connectionLost ? 1.0 : 0.0;
      case HISTORY_NOT_KEPT -> historyNotKept ? 1.0 : 0.0;
    };
  }
}
