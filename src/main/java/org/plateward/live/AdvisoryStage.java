package org.plateward.live;

import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import org.plateward.advisor.FuelTrimAdvisor;
import org.plateward.advisor.PosteriorBelief;
import org.plateward.advisor.TrimSettings;
import org.plateward.advisor.TrimSuggestion;
import org.plateward.advisor.TrimVerdict;
import org.plateward.alarms.AlarmAudit;
import org.plateward.alarms.AlarmBoard;
import org.plateward.alarms.AlarmEvent;
import org.plateward.alarms.AlarmInputs;
import org.plateward.alarms.AlarmKind;
import org.plateward.alarms.AlarmSettings;
import org.plateward.history.SuggestionRow;
import org.plateward.reactor.PlateReactorModel;
import org.plateward.reactor.UnitSpec;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.EstimatorStatus;
import org.plateward.softsensor.ReactorSoftSensor;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The advisory half of the live path, after the estimator: judges the advisory alarms on each
 * estimate and asks the fuel-trim advisor on its schedule. The live monitor and the window's
 * replay both run their estimates through one of these, so a replayed upset raises the same
 * alarms and the same suggestions, at the same plant times, as it did live.
 *
 * <p>The advisor is asked at most every {@code forecast_every} of plant time (each question is a
 * few sigma-point forecasts from the whole posterior). While the estimate is untrustworthy it
 * holds back and says why. Not thread-safe: one owner thread (the estimator's).
 */
public final class AdvisoryStage {
  private static final Logger LOG = LoggerFactory.getLogger(AdvisoryStage.class);

  private final AlarmBoard board;
  private final FuelTrimAdvisor advisor;
  private double askedAtS = Double.NEGATIVE_INFINITY;

  /**
   * @param unit the unit
   * @param sensor the estimator whose grid the advisor's forecast model uses
   * @param alarms alarm definitions (null: no alarms and no advisor)
   * @param advisor advisor settings (null: the defaults with the peak_high limit)
   * @param audit where alarm transitions and operator actions go
   */
  public AdvisoryStage(UnitSpec unit, ReactorSoftSensor sensor, AlarmSettings alarms, TrimSettings advisor,
      AlarmAudit audit) {
    this(unit, sensor, alarms, advisor, audit, true);
  }

  /**
   * The alarms alone, no advisor (a headless replay that was not asked for advice: each
   * question costs a few sigma-point forecasts, far more than the estimate itself).
   */
  public static AdvisoryStage alarmsOnly(UnitSpec unit, ReactorSoftSensor sensor, AlarmSettings alarms, AlarmAudit audit) {
    return new AdvisoryStage(unit, sensor, alarms, null, audit, false);
  }

  private AdvisoryStage(UnitSpec unit, ReactorSoftSensor sensor, AlarmSettings alarms, TrimSettings advisor,
      AlarmAudit audit, boolean advise) {
    this.board = alarms == null ? null : new AlarmBoard(alarms, audit);
    TrimSettings ts = alarms == null || !advise ? null
        : advisor != null ? advisor : TrimSettings.defaults(alarms.definition(AlarmKind.PEAK_HIGH).limit());
    this.advisor = ts == null ? null : new FuelTrimAdvisor(
        new PlateReactorModel(unit, sensor.model().grid(), PlateReactorModel.Options.DEFAULT), ts);
  }

  /** The alarm board (null when no alarms are judged); for operator actions on the owner thread. */
  public AlarmBoard board() {
    return board;
  }

  /** The suggestion in force (null before the first). */
  public TrimSuggestion advice() {
    return advisor == null ? null : advisor.current();
  }

  /**
   * Judges the alarms on one estimate.
   *
   * @param e the estimate
   * @param badOrStale ids of the signals Bad or stale ({@link org.plateward.alarms.BadOrStale})
   * @param connectionLost whether the plant connection is lost
   * @param historyNotKept whether history is not being kept
   * @return the transitions (empty without alarms)
   */
  public List<AlarmEvent> judge(Estimate e, Set<String> badOrStale, boolean connectionLost, boolean historyNotKept) {
    if (board == null) {
      return List.of();
    }
    return board.evaluate(new AlarmInputs(e.time(), e.peakPlateTempK(), e.peakPlateTempSdK(),
        e.maxCellMeltFraction(), e.timeToExhaustS(), e.status().text(), badOrStale, connectionLost,
        historyNotKept));
  }

  /**
   * Asks the advisor if it is due.
   *
   * @param e the estimate
   * @param sensor the estimator that made it, read on its own thread
   * @return a new suggestion, or empty when none is due or the last one stands
   */
  public Optional<TrimSuggestion> advise(Estimate e, ReactorSoftSensor sensor) {
    double tS = e.time().getEpochSecond() + e.time().getNano() * 1e-9;
    if (advisor == null || tS - askedAtS < advisor.settings().forecastEveryS()) {
      return Optional.empty();
    }
    askedAtS = tS;
    try {
      if (e.status() == EstimatorStatus.UNTRUSTWORTHY || !Double.isFinite(e.peakPlateTempK())) {
        return advisor.holdBack(tS, e.reason() == null || e.reason().isBlank() ? e.status().text() : e.reason());
      }
      return advisor.consider(tS, PosteriorBelief.of(sensor), sensor.heldInputs());
    } catch (RuntimeException ex) {
      LOG.warn("fuel-trim advice at {} failed: {}", e.time(), ex.toString());
      return Optional.empty();
    }
  }

  /** How many of these alarms stand (unacknowledged or acknowledged). */
  public static int active(List<org.plateward.alarms.AlarmStatus> statuses) {
    int n = 0;
    for (org.plateward.alarms.AlarmStatus st : statuses) {
      if (st.state().standing()) {
        n++;
      }
    }
    return n;
  }

  /** What history keeps of a suggestion made at {@code time}. */
  public static SuggestionRow suggestionRow(TrimSuggestion s, Instant time) {
    boolean held = s.verdict() == TrimVerdict.HELD_BACK;
    double nan = Double.NaN;
    return new SuggestionRow(time, s.verdict().name().toLowerCase(Locale.ROOT), 100 * s.trim(), s.limitK(),
        held ? nan : s.hold().peakUpperK(), held ? nan : s.trimmed().peakUpperK(),
        held ? nan : s.hold().maxCellMeltFraction(), held ? nan : s.trimmed().maxCellMeltFraction(),
        held ? nan : s.hold().methaneConversion(), held ? nan : s.trimmed().methaneConversion(),
        held ? nan : s.hold().horizonS(), s.message(), "ADVISORY");
  }
}
