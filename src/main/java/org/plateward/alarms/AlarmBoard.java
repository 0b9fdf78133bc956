package org.plateward.alarms;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The alarms of one operator position: evaluates each estimate against the configured
 * definitions, runs the lifecycle ({@link AlarmLifecycle}), applies the design suppression rules
 * ({@link DesignSuppression}), takes operator actions, detects floods ({@link FloodDetector}) and
 * sends every transition and every accepted action to the {@link AlarmAudit}.
 *
 * <p>Deterministic and driven by the input time only: delays and shelve expiry are measured in
 * {@link AlarmInputs#time()} (and in the time of operator actions), never in wall-clock time.
 * Not thread-safe: one owner thread calls it.
 *
 * <p>Everything here is advisory; Plateward is not an alarm system of record.
 */
public final class AlarmBoard {
  private static final Logger LOG = LoggerFactory.getLogger(AlarmBoard.class);

  private final AlarmSettings settings;
  private final AlarmAudit audit;
  private final FloodDetector flood;
  private final Map<AlarmKind, Entry> entries = new EnumMap<>(AlarmKind.class);
  private Instant lastTime;

  /** The live state of one enabled alarm. */
  private static final class Entry {
    final AlarmDefinition def;
    final ConditionFilter filter;
    AlarmState state = AlarmState.NORMAL;
    boolean conditionSeen;
    boolean suppressed;
    double value = Double.NaN;
    Instant shelvedUntil;
    String shelvedBy;
    String reason;

    Entry(AlarmDefinition def) {
      this.def = def;
      this.filter = new ConditionFilter(def);
    }
  }

  /**
   * @param settings the definitions; disabled alarms are left out of the board
   * @param audit where transitions and actions go
   */
  public AlarmBoard(AlarmSettings settings, AlarmAudit audit) {
    this.settings = Objects.requireNonNull(settings, "settings");
    this.audit = Objects.requireNonNull(audit, "audit");
    this.flood = new FloodDetector(settings.floodCount(), settings.floodWindow());
    for (AlarmDefinition d : settings.definitions().values()) {
      if (d.enabled()) {
        entries.put(d.kind(), new Entry(d));
      }
    }
  }

  /**
   * Evaluates one estimate: shelves that have expired by {@code in.time()} come back, each
   * condition is filtered (deadband, on-delay, off-delay), design suppression is applied, and the
   * lifecycle moves.
   *
   * @param in the estimate values; times must not go backwards
   * @return the transitions, in order (also sent to the audit)
   * @throws IllegalArgumentException when {@code in.time()} is before the previous evaluation
   */
  public List<AlarmEvent> evaluate(AlarmInputs in) {
    Instant now = in.time();
    if (lastTime != null && now.isBefore(lastTime)) {
      throw new IllegalArgumentException(
          "alarm inputs went back in time: " + now + " after " + lastTime);
    }
    lastTime = now;
    List<AlarmEvent> out = new ArrayList<>();
    expireShelves(now, out);
    for (Entry e : entries.values()) {
      e.value = in.judged(e.def.kind(), settings.kSigma());
      e.filter.update(now, e.value);
    }
    Entry hh = entries.get(AlarmKind.PEAK_HIGH_HIGH);
    boolean hhOn = hh != null && hh.filter.active() && hh.state != AlarmState.OUT_OF_SERVICE
        && hh.state != AlarmState.SHELVED;
    for (Entry e : entries.values()) {
      boolean s = DesignSuppression.holds(e.def.kind(), in, settings, hhOn);
      if (s != e.suppressed) {
        e.suppressed = s;
        apply(e, s ? Trigger.SUPPRESSION_STARTS : Trigger.SUPPRESSION_ENDS, now, out);
      }
      boolean c = e.filter.active();
      if (c != e.conditionSeen) {
        e.conditionSeen = c;
        apply(e, c ? Trigger.CONDITION_ACTIVE : Trigger.CONDITION_CLEAR, now, out);
      }
    }
    flood.advance(now);
    return List.copyOf(out);
  }

  /** Acknowledges an alarm; {@code comment} is optional. */
  public ActionResult acknowledge(Instant time, String who, AlarmKind alarm, String comment) {
    return act(ActionKind.ACKNOWLEDGE, time, who, alarm, comment, null);
  }

  /**
   * Shelves an alarm until {@code expiry}. Refused without a reason, without an expiry, with an
   * expiry not after {@code time}, or longer than the configured maximum.
   */
  public ActionResult shelve(Instant time, String who, AlarmKind alarm, String reason,
      Instant expiry) {
    return act(ActionKind.SHELVE, time, who, alarm, reason, expiry);
  }

  /** Unshelves an alarm before its expiry; {@code comment} is optional. */
  public ActionResult unshelve(Instant time, String who, AlarmKind alarm, String comment) {
    return act(ActionKind.UNSHELVE, time, who, alarm, comment, null);
  }

  /** Removes an alarm from service; a reason is required. */
  public ActionResult removeFromService(Instant time, String who, AlarmKind alarm,
      String reason) {
    return act(ActionKind.REMOVE_FROM_SERVICE, time, who, alarm, reason, null);
  }

  /** Returns an alarm to service; {@code comment} is optional. */
  public ActionResult returnToService(Instant time, String who, AlarmKind alarm, String comment) {
    return act(ActionKind.RETURN_TO_SERVICE, time, who, alarm, comment, null);
  }

  /**
   * Takes an operator action of any kind (the one dispatch the monitors and the replay share).
   *
   * @param shelveFor how long a shelve lasts from {@code time} (ignored by the other actions;
   *     null: no expiry, which a shelve refuses)
   */
  public ActionResult take(ActionKind action, Instant time, String who, AlarmKind alarm, String reason,
      Duration shelveFor) {
    Instant expiry = action == ActionKind.SHELVE && shelveFor != null ? time.plus(shelveFor) : null;
    return act(action, time, who, alarm, reason, expiry);
  }

  private ActionResult act(ActionKind action, Instant time, String who, AlarmKind alarm,
      String reason, Instant expiry) {
    Objects.requireNonNull(time, "time");
    Objects.requireNonNull(action, "action");
    String refusal = precheck(action, time, who, alarm, reason, expiry);
    if (refusal != null) {
      return refuse(action, refusal);
    }
    Entry e = entries.get(alarm);
    List<AlarmEvent> out = new ArrayList<>();
    expireShelves(time, out);
    Transition tr = AlarmLifecycle.next(e.state, action.trigger(), e.filter.active(), e.suppressed);
    if (tr.kind() == Transition.Kind.REFUSE) {
      return refuse(action, alarm.key() + ": " + tr.reason());
    }
    String why = reason == null || reason.isBlank() ? null : reason.strip();
    OperatorAction record = new OperatorAction(time, who.strip(), action, alarm, why,
        action == ActionKind.SHELVE ? expiry : null);
    audit.action(record);
    switch (action) {
      case SHELVE -> {
        e.shelvedUntil = expiry;
        e.shelvedBy = record.who();
        e.reason = why;
      }
      case REMOVE_FROM_SERVICE -> {
        clearShelve(e);
        e.reason = why;
      }
      case UNSHELVE, RETURN_TO_SERVICE -> clearShelve(e);
      default -> { }
    }
    String byWhom = " by " + record.who() + (why == null ? "" : " (" + why + ")");
    move(e, tr.to(), time, out, alarm.title() + ": " + action.word().replace('_', ' ') + byWhom
        + (expiry != null && action == ActionKind.SHELVE ? ", until " + expiry : ""));
    flood.advance(time);
    return new ActionResult(true, alarm.key() + ": " + action.word() + byWhom, record, out);
  }

  private String precheck(ActionKind action, Instant time, String who, AlarmKind alarm,
      String reason, Instant expiry) {
    if (alarm == null) {
      return "no alarm named";
    }
    if (who == null || who.isBlank()) {
      return alarm.key() + ": say who takes the action";
    }
    if (!entries.containsKey(alarm)) {
      return alarm.key() + ": the alarm is disabled in the configuration";
    }
    boolean needsReason = action == ActionKind.SHELVE || action == ActionKind.REMOVE_FROM_SERVICE;
    if (needsReason && (reason == null || reason.isBlank())) {
      return alarm.key() + ": " + action.word().replace('_', ' ') + " needs a reason";
    }
    if (action == ActionKind.SHELVE) {
      if (expiry == null) {
        return alarm.key() + ": shelve needs an expiry time";
      }
      if (!expiry.isAfter(time)) {
        return alarm.key() + ": the shelve expiry " + expiry + " is not after the action time "
            + time;
      }
      if (Duration.between(time, expiry).compareTo(settings.maxShelve()) > 0) {
        return alarm.key() + ": shelve for at most " + human(settings.maxShelve()) + ", asked "
            + human(Duration.between(time, expiry));
      }
    }
    return null;
  }

  private static ActionResult refuse(ActionKind action, String message) {
    LOG.info("refused action={}: {}", action.word(), message);
    return ActionResult.refused(message);
  }

  private void expireShelves(Instant now, List<AlarmEvent> out) {
    for (Entry e : entries.values()) {
      if (e.state == AlarmState.SHELVED && !now.isBefore(e.shelvedUntil)) {
        Instant at = e.shelvedUntil;
        Transition tr = AlarmLifecycle.next(e.state, Trigger.SHELF_EXPIRES, e.filter.active(),
            e.suppressed);
        clearShelve(e);
        move(e, tr.to(), at.isAfter(now) ? now : at, out,
            e.def.kind().title() + ": shelve expired");
      }
    }
  }

  private static void clearShelve(Entry e) {
    e.shelvedUntil = null;
    e.shelvedBy = null;
    e.reason = null;
  }

  private void apply(Entry e, Trigger t, Instant now, List<AlarmEvent> out) {
    Transition tr = AlarmLifecycle.next(e.state, t, e.filter.active(), e.suppressed);
    if (tr.kind() == Transition.Kind.MOVE) {
      move(e, tr.to(), now, out, describe(e, t));
    }
  }

  private void move(Entry e, AlarmState to, Instant time, List<AlarmEvent> out, String message) {
    AlarmEvent ev = new AlarmEvent(time, e.def.kind(), e.state, to, e.def.priority(), e.value,
        e.def.limit(), message);
    e.state = to;
    if (to != AlarmState.OUT_OF_SERVICE && to != AlarmState.SHELVED) {
      e.reason = null;
    }
    out.add(ev);
    audit.event(ev);
    countAnnunciation(ev);
  }

  private void countAnnunciation(AlarmEvent ev) {
    if (ev.annunciation()) {
      flood.annunciated(ev.time());
    }
  }

  private String describe(Entry e, Trigger t) {
    AlarmKind k = e.def.kind();
    String what = switch (t) {
      case CONDITION_ACTIVE -> "active";
      case CONDITION_CLEAR -> "cleared";
      case SUPPRESSION_STARTS -> "suppressed by design";
      case SUPPRESSION_ENDS -> "no longer suppressed";
      default -> t.name().toLowerCase(Locale.ROOT);
    };
    return k.title() + ": " + what + valueText(k, e.value, e.def.limit());
  }

  private String valueText(AlarmKind k, double value, double limit) {
    if (Double.isNaN(value)) {
      return "";
    }
    return switch (k.limitKind()) {
      case TEMPERATURE -> String.format(Locale.ROOT,
          ", upper bound (mean + %.1f sigma) %.1f degC, limit %.1f degC", settings.kSigma(),
          value - 273.15, limit - 273.15);
      case FRACTION -> String.format(Locale.ROOT, ", %.1f %%, limit %.1f %%", 100 * value,
          100 * limit);
      case TIME -> Double.isInfinite(value) ? ", no exhaustion forecast"
          : String.format(Locale.ROOT, ", %.0f s, limit %.0f s", value, limit);
      case NONE -> "";
    };
  }

  private static String human(Duration d) {
    long s = d.getSeconds();
    return s % 3600 == 0 ? s / 3600 + " h" : s % 60 == 0 ? s / 60 + " min" : s + " s";
  }

  /** The current state of one alarm; null when it is disabled. */
  public AlarmStatus status(AlarmKind kind) {
    Entry e = entries.get(kind);
    return e == null ? null : new AlarmStatus(kind, e.state, e.def.priority(), e.filter.active(),
        e.value, e.def.limit(), e.shelvedUntil, e.shelvedBy, e.reason);
  }

  /** Every enabled alarm, most urgent priority first, then in definition order. */
  public List<AlarmStatus> statuses() {
    List<AlarmStatus> s = new ArrayList<>();
    for (AlarmKind k : entries.keySet()) {
      s.add(status(k));
    }
    s.sort((a, b) -> a.priority().compareTo(b.priority()));
    return s;
  }

  /** How many alarms are suppressed by design now. */
  public int suppressedCount() {
    int n = 0;
    for (Entry e : entries.values()) {
      n += e.state == AlarmState.SUPPRESSED_BY_DESIGN ? 1 : 0;
    }
    return n;
  }

  /** Whether the position is in an alarm flood. */
  public boolean flooding() {
    return flood.flooding();
  }

  /** Every flood so far, oldest first. */
  public List<FloodEpisode> floods() {
    return flood.episodes();
  }

  /** Annunciations in the current flood window. */
  public int annunciationsInWindow() {
    return flood.countInWindow();
  }
}
