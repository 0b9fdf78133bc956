package org.plateward.config;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.plateward.plant.EventKind;
import org.plateward.plant.Scenario;
import org.plateward.plant.ScenarioEvent;
import org.plateward.plant.SensorSuite;
import org.plateward.plant.TruthSettings;
import org.plateward.signals.EdgeUnit;
import org.plateward.signals.Signal;

/**
 * Reads a scenario file of the simulated plant (TOML; the format is in the README, section
 * "Scenario files"). Every problem is collected and reported as {@code file:line: field:
 * message}; nothing is written.
 */
public final class ScenarioLoader {
  /** Target naming every analyzer channel at once (for faults). */
  public static final String ANALYZER_TARGET = "analyzer";
  private static final double DEFAULT_SPIKE_INTERVAL_S = 300.0;
  private static final Pattern AMOUNT =
      Pattern.compile("\\s*([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*?)\\s*");

  private ScenarioLoader() {}

  /**
   * Reads and checks a scenario file.
   *
   * @throws InvalidConfigException with every problem found
   */
  public static Scenario load(Path file) throws InvalidConfigException {
    TomlDocument doc = TomlDocument.read(file);
    ErrorList errors = new ErrorList(file);
    Scenario s = read(doc, errors);
    errors.throwIfAny();
    return s;
  }

  private static Scenario read(TomlDocument doc, ErrorList errors) {
    for (java.util.Iterator<String> it = doc.root().fieldNames(); it.hasNext(); ) {
      String t = it.next();
      if (!List.of("scenario", "truth", "sensors", "event").contains(t)) {
        String near = Spelling.closest(t, List.of("scenario", "truth", "sensors", "event"));
        errors.add(doc.lineOf(t, 1), t, "unknown table"
            + (near != null ? "; did you mean [" + (near.equals("event") ? "[event]" : near) + "]?"
                : " (a scenario has [scenario], [truth], [sensors] and [[event]])"));
      }
    }
    TableReader sc = TableReader.open(doc, errors, "scenario",
        List.of("name", "seed", "start", "duration", "sample_period"));
    String name = sc.text("name");
    Long seed = seed(sc);
    Instant start = instant(sc, "start");
    double duration = sc.quantity("duration", Dimension.TIME, Bound.POSITIVE);
    double period = sc.quantity("sample_period", Dimension.TIME, Bound.POSITIVE);
    sc.finish();
    if (!Double.isNaN(duration) && !Double.isNaN(period) && period > duration) {
      sc.error("sample_period", "must not be longer than the duration");
    }

    TruthSettings truth = truth(doc, errors);
    SensorSuite sensors = sensors(doc, errors);

    List<ScenarioEvent> events = new ArrayList<>();
    JsonNode ev = doc.root().get("event");
    if (ev != null) {
      if (!ev.isArray()) {
        errors.add(doc.lineOf("event", 1), "event", "must be an array of tables: write each event as [[event]]");
      } else {
        for (int i = 0; i < ev.size(); i++) {
          ScenarioEvent e = event(doc, errors, "event[" + i + "]", ev.get(i), duration);
          if (e != null) {
            events.add(e);
          }
        }
      }
    }
    if (name == null || seed == null || start == null || Double.isNaN(duration) || Double.isNaN(period)
        || truth == null || sensors == null) {
      return null;
    }
    if (!errors.isEmpty()) {
      return null;
    }
    return new Scenario(name, seed, start, duration, period, truth, sensors, events);
  }

  private static Long seed(TableReader sc) {
    JsonNode v = sc.raw("seed");
    if (v == null) {
      if (sc.present()) {
        sc.error("seed", "missing; add it to the [scenario] table (a whole number)");
      }
      return null;
    }
    if (!v.isIntegralNumber() || !v.canConvertToLong() || v.asLong() < 0) {
      sc.error("seed", "must be a whole number of at least 0, got " + sc.written("seed"));
      return null;
    }
    return v.asLong();
  }

  private static Instant instant(TableReader t, String key) {
    String text = t.text(key);
    if (text == null) {
      return null;
    }
    try {
      return Instant.parse(text);
    } catch (DateTimeParseException e) {
      t.error(key, "must be a UTC time in ISO 8601 such as \"2031-03-04T06:00:00Z\", got \"" + text + "\"");
      return null;
    }
  }

  private static TruthSettings truth(TomlDocument doc, ErrorList errors) {
    TruthSettings d = TruthSettings.defaults();
    if (doc.root().get("truth") == null) {
      return d;
    }
    TableReader t = TableReader.open(doc, errors, "truth", List.of());
    int cells = t.has("cells") ? orElse(t.count("cells", 3), d.cells()) : d.cells();
    double nu = t.has("nusselt") ? t.number("nusselt", Bound.POSITIVE) : d.nusselt();
    double loss = t.has("heat_loss")
        ? t.quantity("heat_loss", Dimension.HEAT_TRANSFER_COEFFICIENT, Bound.NON_NEGATIVE) : d.heatLossWPerM2K();
    double tau = t.has("deactivation_time")
        ? t.quantity("deactivation_time", Dimension.TIME, Bound.POSITIVE) : d.reformingDeactivationTimeS();
    int sub = t.has("substeps") ? orElse(t.count("substeps", 1), 1) : d.substeps();
    t.finish();
    if (Double.isNaN(nu) || Double.isNaN(loss) || Double.isNaN(tau)) {
      return null;
    }
    return new TruthSettings(cells, nu, loss, tau, sub);
  }

  private static SensorSuite sensors(TomlDocument doc, ErrorList errors) {
    SensorSuite d = SensorSuite.defaults();
    if (doc.root().get("sensors") == null) {
      return d;
    }
    TableReader t = TableReader.open(doc, errors, "sensors", List.of());
    double p = t.has("analyzer_period")
        ? t.quantity("analyzer_period", Dimension.TIME, Bound.POSITIVE) : d.analyzerPeriodS();
    double dead = t.has("analyzer_dead_time")
        ? t.quantity("analyzer_dead_time", Dimension.TIME, Bound.NON_NEGATIVE) : d.analyzerDeadTimeS();
    t.finish();
    return Double.isNaN(p) || Double.isNaN(dead) ? null : d.withAnalyzer(p, dead);
  }

  private static int orElse(Integer v, int fallback) {
    return v == null ? fallback : v;
  }

  private static ScenarioEvent event(TomlDocument doc, ErrorList errors, String path, JsonNode node, double durationS) {
    if (!node.isObject()) {
      errors.add(doc.lineOf(path, 1), path, "must be a table of keys");
      return null;
    }
    TableReader t = TableReader.element(doc, errors, path, node);
    String kindText = t.text("kind");
    EventKind kind = null;
    List<String> ids = new ArrayList<>();
    for (EventKind k : EventKind.values()) {
      ids.add(k.id());
    }
    if (kindText != null) {
      kind = EventKind.byId(kindText.toLowerCase(Locale.ROOT));
      if (kind == null) {
        String near = Spelling.closest(kindText, ids);
        t.error("kind", "unknown event kind \"" + kindText + "\""
            + (near != null ? "; did you mean \"" + near + "\"?" : " (kinds: " + String.join(", ", ids) + ")"));
      }
    }
    double at = t.quantity("at", Dimension.TIME, Bound.NON_NEGATIVE);
    if (!Double.isNaN(at) && !Double.isNaN(durationS) && at > durationS) {
      t.error("at", "event past the duration: starts at " + t.written("at") + " but the scenario ends at "
          + formatDuration(durationS));
    }
    double ramp = t.has("ramp") ? t.quantity("ramp", Dimension.TIME, Bound.NON_NEGATIVE) : 0.0;
    double duration = t.has("duration") ? t.quantity("duration", Dimension.TIME, Bound.POSITIVE)
        : Double.POSITIVE_INFINITY;
    if (kind == null) {
      for (String k : List.of("target", "magnitude", "time_constant", "interval")) {
        t.has(k);
      }
      t.finish();
      return null;
    }
    if (!kind.isUpset() && t.has("ramp")) {
      t.error("ramp", "a sensor fault starts at once: remove ramp from this " + kind.id() + " event");
    }
    List<Signal> targets = new ArrayList<>();
    String catalyst = null;
    boolean targetOk = targets(t, kind, targets);
    if (kind == EventKind.CATALYST_AGEING) {
      catalyst = targets.isEmpty() && targetOk ? catalystName(t) : null;
      targets.clear();
    }
    double magnitude = magnitude(t, kind, targets);
    double tc = Double.NaN;
    if (kind == EventKind.CATALYST_AGEING) {
      tc = t.quantity("time_constant", Dimension.TIME, Bound.POSITIVE);
    } else if (t.has("time_constant")) {
      t.error("time_constant", "only catalyst_ageing takes a time_constant");
    }
    double interval = Double.NaN;
    if (kind == EventKind.SPIKES) {
      interval = t.has("interval") ? t.quantity("interval", Dimension.TIME, Bound.POSITIVE) : DEFAULT_SPIKE_INTERVAL_S;
    } else if (t.has("interval")) {
      t.error("interval", "only spikes take an interval");
    }
    t.finish();
    if (!targetOk || Double.isNaN(at) || Double.isNaN(ramp) || Double.isNaN(duration)
        || (needsMagnitude(kind) && Double.isNaN(magnitude))
        || (kind == EventKind.CATALYST_AGEING && (Double.isNaN(tc) || catalyst == null))
        || (kind == EventKind.SPIKES && Double.isNaN(interval))) {
      return null;
    }
    return new ScenarioEvent(kind, at, targets, catalyst, magnitude, ramp, duration, tc, interval);
  }

  private static boolean needsMagnitude(EventKind k) {
    return k != EventKind.STUCK && k != EventKind.DROPOUT;
  }

  /** Reads the target; false when it is wrong (reported). */
  private static boolean targets(TableReader t, EventKind kind, List<Signal> out) {
    JsonNode v = t.raw("target");
    switch (kind) {
      case FEED_DROP, FUEL_SURGE, STEAM_TO_CARBON -> {
        if (v != null) {
          t.error("target", kind.id() + " acts on the feeds and takes no target");
          return false;
        }
        return true;
      }
      case CATALYST_AGEING -> {
        return true; // read by catalystName
      }
      default -> { }
    }
    if (v == null) {
      t.error("target", "missing: name the signal" + (kind == EventKind.INLET_TEMP_STEP
          ? " (ref_inlet_temp_c or comb_inlet_temp_c)" : " id it acts on, or \"analyzer\" for every analyzer channel"));
      return false;
    }
    if (!v.isTextual()) {
      t.error("target", "must be a signal id in quotes, got " + t.written("target"));
      return false;
    }
    String id = v.asText().strip();
    if (kind == EventKind.INLET_TEMP_STEP) {
      if (id.equals(Signal.REF_INLET_TEMP.id()) || id.equals(Signal.COMB_INLET_TEMP.id())) {
        out.add(Signal.byId(id));
        return true;
      }
      String near = Spelling.closest(id, List.of(Signal.REF_INLET_TEMP.id(), Signal.COMB_INLET_TEMP.id()));
      t.error("target", "unknown target signal \"" + id + "\" for an inlet temperature step; "
          + (near != null ? "did you mean \"" + near + "\"?" : "use ref_inlet_temp_c or comb_inlet_temp_c"));
      return false;
    }
    if (id.equals(ANALYZER_TARGET)) {
      for (Signal s : Signal.values()) {
        if (s.kind() == Signal.Kind.ANALYZER) {
          out.add(s);
        }
      }
      return true;
    }
    Signal s = Signal.byId(id);
    if (s == null) {
      List<String> names = new ArrayList<>();
      for (Signal x : Signal.values()) {
        names.add(x.id());
      }
      names.add(ANALYZER_TARGET);
      String near = Spelling.closest(id, names);
      t.error("target", "unknown target signal \"" + id + "\""
          + (near != null ? "; did you mean \"" + near + "\"?" : " (a signal id from the README's signal table, or \"analyzer\")"));
      return false;
    }
    out.add(s);
    return true;
  }

  private static String catalystName(TableReader t) {
    JsonNode v = t.raw("target");
    if (v == null) {
      return "reforming";
    }
    String c = v.isTextual() ? v.asText().strip() : "";
    if (c.equals("reforming") || c.equals("combustion")) {
      return c;
    }
    t.error("target", "catalyst_ageing names its catalyst: \"reforming\" or \"combustion\", got " + t.written("target"));
    return null;
  }

  private static double magnitude(TableReader t, EventKind kind, List<Signal> targets) {
    if (!needsMagnitude(kind)) {
      if (t.has("magnitude")) {
        t.error("magnitude", kind.id() + " takes no magnitude");
      }
      return Double.NaN;
    }
    switch (kind) {
      case FEED_DROP, FUEL_SURGE, CATALYST_AGEING -> {
        double m = t.quantity("magnitude", Dimension.PERCENT, Bound.ANY);
        if (Double.isNaN(m)) {
          return m;
        }
        String what = kind == EventKind.FEED_DROP ? "a feed drop is written as the size of the drop"
            : kind == EventKind.FUEL_SURGE ? "a fuel surge is written as the size of the rise"
            : "ageing is written as the activity finally lost";
        if (!(m > 0.0)) {
          t.error("magnitude", "must be positive: " + what + ", got " + t.written("magnitude"));
          return Double.NaN;
        }
        if (kind != EventKind.FUEL_SURGE && m >= 1.0) {
          t.error("magnitude", "must be below 100 %: " + what + ", got " + t.written("magnitude"));
          return Double.NaN;
        }
        return m;
      }
      case STEAM_TO_CARBON -> {
        double m = t.number("magnitude", Bound.ANY);
        if (!Double.isNaN(m) && !(m > 0.0)) {
          t.error("magnitude", "must be positive: the new steam-to-carbon ratio (mol steam per mol feed methane), got "
              + t.written("magnitude"));
          return Double.NaN;
        }
        return m;
      }
      case INLET_TEMP_STEP -> {
        return t.quantity("magnitude", Dimension.TEMPERATURE_DIFFERENCE, Bound.ANY);
      }
      case DRIFT, SPIKES -> {
        if (targets.isEmpty()) {
          t.raw("magnitude");
          return Double.NaN; // the target error is reported already
        }
        return signalAmount(t, kind, targets.get(0));
      }
      default -> throw new IllegalStateException(kind.toString());
    }
  }

  /** A drift rate ("0.5 K/min") or spike amplitude ("5 K") in the target's unit, to SI (per s). */
  private static double signalAmount(TableReader t, EventKind kind, Signal target) {
    JsonNode v = t.raw("magnitude");
    List<String> units = unitsFor(target.unit());
    String example = kind == EventKind.DRIFT ? "\"0.5 " + units.get(0) + "/min\"" : "\"5 " + units.get(0) + "\"";
    if (v == null) {
      t.error("magnitude", "missing; write it in the unit of " + target.id() + " such as " + example);
      return Double.NaN;
    }
    String text = v.isTextual() ? v.asText() : v.toString();
    double perS = 1.0;
    String body = text;
    if (kind == EventKind.DRIFT) {
      int slash = text.lastIndexOf('/');
      Dimension.UnitOfMeasure time = slash < 0 ? null : Dimension.TIME.find(text.substring(slash + 1));
      if (time == null) {
        t.error("magnitude", "a drift is a rate: write it as " + example + " (per s, min or h), got \"" + text + "\"");
        return Double.NaN;
      }
      perS = 1.0 / time.toSi(1.0);
      body = text.substring(0, slash);
    }
    Matcher m = AMOUNT.matcher(body);
    String unit = m.matches() ? m.group(2) : null;
    if (unit == null || !units.contains(unit)) {
      t.error("magnitude", "needs the unit of " + target.id() + " (" + String.join(" or ", units) + ") such as "
          + example + ", got \"" + text + "\"");
      return Double.NaN;
    }
    double amount = Double.parseDouble(m.group(1));
    if (kind == EventKind.SPIKES && !(amount > 0.0)) {
      t.error("magnitude", "must be positive: a spike's amplitude (its sign is random), got \"" + text + "\"");
      return Double.NaN;
    }
    double siPerEdge = target.unit().toSi(1.0) - target.unit().toSi(0.0);
    return amount * siPerEdge * perS;
  }

  private static List<String> unitsFor(EdgeUnit u) {
    return switch (u) {
      case DEG_C -> List.of("K");
      case NM3_PER_H -> List.of("Nm3/h");
      case KG_PER_H_STEAM -> List.of("kg/h");
      case KPA_ABS -> List.of("kPa");
      case MOL_PCT_DRY -> List.of("mol%");
    };
  }

  private static String formatDuration(double s) {
    if (s % 3600.0 == 0.0) {
      return String.format(Locale.ROOT, "%.0f h", s / 3600.0);
    }
    if (s % 60.0 == 0.0) {
      return String.format(Locale.ROOT, "%.0f min", s / 60.0);
    }
    return String.format(Locale.ROOT, "%s s", s);
  }
}
