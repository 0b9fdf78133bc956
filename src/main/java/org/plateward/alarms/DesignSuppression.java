package org.plateward.alarms;


/**
 * The suppression-by-design rules, each scoped to the alarms it names and to nothing else.
 *
 * <ol>
 *   <li><b>High-high suppresses high.</b> {@code peak_high} is suppressed while the condition of
 *       {@code peak_high_high} is active and that alarm is neither shelved nor out of service:
 *       one alarm for one hot spot, at the more urgent priority. An operator who shelves or
 *       removes the high-high alarm still sees the high one.
 *   <li><b>A lost connection hides stale signals.</b> {@code signal_bad_or_stale} is suppressed
 *       while the OPC UA connection is lost and the {@code connection_lost} alarm is enabled:
 *       every signal goes stale with the connection, and the connection alarm says so once.
 * </ol>
 *
 * <p>An untrustworthy estimate deliberately suppresses nothing: the hot-spot alarms are judged on
 * mean + k sigma, and hiding them exactly when the estimator doubts itself (for example when
 * its innovations are smaller than its covariance predicts) would hide a real melt-through. The
 * {@code estimator_untrustworthy} alarm says to read them with care.
 */
public final class DesignSuppression {
  private DesignSuppression() {}

  /**
   * Whether a design rule suppresses an alarm now.
   *
   * @param kind the alarm
   * @param in the current inputs
   * @param settings the configured definitions (which alarms are enabled)
   * @param highHighInService whether the {@code peak_high_high} condition is active and that
   *     alarm is enabled, not shelved and not out of service
   */
  public static boolean holds(AlarmKind kind, AlarmInputs in, AlarmSettings settings,
      boolean highHighInService) {
    boolean rule1 = kind == AlarmKind.PEAK_HIGH && highHighInService;
    boolean rule2 = kind == AlarmKind.SIGNAL_BAD_OR_STALE && in.connectionLost()
        && settings.definition(AlarmKind.CONNECTION_LOST).enabled();
    return rule1 || rule2;
  }
}
