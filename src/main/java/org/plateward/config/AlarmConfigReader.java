package org.plateward.config;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.plateward.alarms.AlarmDefinition;
import org.plateward.alarms.AlarmKind;
import org.plateward.alarms.AlarmSettings;
import org.plateward.alarms.Priority;

/**
 * Reads the {@code [alarms]} table and one sub-table per alarm. A file with any problem is
 * refused as a whole (every problem is reported as {@code file:line: field: message}), so the
 * alarm settings in use are never half-replaced.
 *
 * <pre>
 * [alarms]
 * k_sigma = 2.0                  # peak alarms judge mean + k_sigma * sigma
 * flood_count = 10               # optional: a flood is more than this many ... (default 10)
 * flood_window = "10 min"        # optional: ... annunciations in this window (default 10 min)
 * max_shelve = "12 h"            # optional: longest shelve (default 12 h)
 *
 * [alarms.peak_high]             # one sub-table for every alarm
 * limit = "1110 degC"            # degC or K; melt_high: fraction or "%"; exhaust_low: a time
 * priority = "prompt"            # immediate, prompt, routine, notice
 * deadband = "5 K"               # optional (default 0): K, fraction or %, time
 * on_delay = "10 s"              # optional (default 0)
 * off_delay = "30 s"             # optional (default 0)
 * enabled = true                 # optional (default true)
 * </pre>
 *
 * The yes/no alarms ({@code estimator_untrustworthy}, {@code signal_bad_or_stale},
 * {@code connection_lost}, {@code history_not_kept}) take no limit and no deadband.
 */
public final class AlarmConfigReader {
  static final String TABLE = "alarms";
  static final List<String> KEYS = List.of("k_sigma", "flood_count", "flood_window",
      "max_shelve");
  private static final Duration DEFAULT_MAX_SHELVE = Duration.ofHours(12); // common practice, no source

  private AlarmConfigReader() {}

  /**
   * Reads a file holding an {@code [alarms]} table (e.g. {@code config/plateward.toml}).
   *
   * @throws InvalidConfigException with every problem found; nothing is returned then
   */
  public static AlarmSettings load(Path file) throws InvalidConfigException {
    TomlDocument doc = TomlDocument.read(file);
    ErrorList errors = new ErrorList(file);
    AlarmSettings s = read(doc, errors);
    errors.throwIfAny();
    return s;
  }

  /** Reads {@code [alarms]}; problems go to {@code errors}, and then the result is null. */
  static AlarmSettings read(TomlDocument doc, ErrorList errors) {
    if (doc.root().get(TABLE) == null) {
      return null; // the section is optional in a full configuration
    }
    List<String> all = new ArrayList<>(KEYS);
    for (AlarmKind k : AlarmKind.values()) {
      all.add("[alarms." + k.key() + "]");
    }
    TableReader t = TableReader.open(doc, errors, TABLE, all);
    if (!t.present()) {
      return null;
    }
    int before = errorCount(errors);
    double k = t.number("k_sigma", Bound.NON_NEGATIVE);
    int floodCount = AlarmSettings.PUBLISHED_FLOOD_COUNT;
    if (t.has("flood_count")) {
      Integer c = t.count("flood_count", 1);
      floodCount = c == null ? floodCount : c;
    }
    Duration floodWindow = optionalDuration(t, "flood_window",
        AlarmSettings.PUBLISHED_FLOOD_WINDOW, Bound.POSITIVE);
    Duration maxShelve = optionalDuration(t, "max_shelve", DEFAULT_MAX_SHELVE, Bound.POSITIVE);
    Map<AlarmKind, AlarmDefinition> defs = new EnumMap<>(AlarmKind.class);
    JsonNode node = doc.root().get(TABLE);
    for (AlarmKind kind : AlarmKind.values()) {
      t.has(kind.key());
      JsonNode sub = node.get(kind.key());
      String path = TABLE + "." + kind.key();
      if (sub == null || !sub.isObject()) {
        errors.add(sub == null ? t.headerLine() : doc.lineOf(path, t.headerLine()), path,
            sub == null ? "missing table [" + path + "]; write enabled = false in it to turn the"
                + " alarm off" : "must be a table [" + path + "], not a single value");
        continue;
      }
      AlarmDefinition d = definition(kind, TableReader.element(doc, errors, path, sub));
      if (d != null) {
        defs.put(kind, d);
      }
    }
    t.finish();
    AlarmDefinition h = defs.get(AlarmKind.PEAK_HIGH);
    AlarmDefinition hh = defs.get(AlarmKind.PEAK_HIGH_HIGH);
    if (h != null && hh != null && h.enabled() && hh.enabled() && !(h.limit() < hh.limit())) {
      errors.add(doc.lineOf(TABLE + ".peak_high_high.limit", t.headerLine()),
          TABLE + ".peak_high_high.limit", "must be above peak_high.limit ("
              + String.format(java.util.Locale.ROOT, "%.2f K", h.limit()) + "), got "
              + String.format(java.util.Locale.ROOT, "%.2f K", hh.limit()));
    }
    if (errorCount(errors) > before || Double.isNaN(k)) {
      return null;
    }
    return new AlarmSettings(k, floodCount, floodWindow, maxShelve, defs);
  }

  private static AlarmDefinition definition(AlarmKind kind, TableReader t) {
    boolean enabled = true;
    JsonNode en = t.raw("enabled");
    boolean ok = true;
    if (en != null) {
      if (!en.isBoolean()) {
        t.error("enabled", "must be true or false, got " + t.written("enabled"));
        ok = false;
      } else {
        enabled = en.asBoolean();
      }
    }
    Priority priority = null;
    String p = t.text("priority");
    if (p != null) {
      priority = Priority.ofKey(p);
      if (priority == null) {
        List<String> names = new ArrayList<>();
        for (Priority q : Priority.values()) {
          names.add(q.key());
        }
        String near = Spelling.closest(p, names);
        t.error("priority", "unknown priority \"" + p + "\" (one of: " + String.join(", ", names)
            + ")" + (near != null ? "; did you mean \"" + near + "\"?" : ""));
      }
    }
    double limit = Double.NaN;
    double deadband = 0.0;
    if (kind.limitKind() == AlarmKind.LimitKind.NONE) {
      for (String key : List.of("limit", "deadband")) {
        if (t.has(key)) {
          t.error(key, kind.key() + " is a yes/no alarm and takes no " + key);
          ok = false;
        }
      }
    } else {
      limit = switch (kind.limitKind()) {
        case TEMPERATURE -> t.quantity("limit", Dimension.TEMPERATURE, Bound.POSITIVE);
        case FRACTION -> fraction(t, "limit", true);
        case TIME -> t.quantity("limit", Dimension.TIME, Bound.POSITIVE);
        case NONE -> Double.NaN;
      };
      ok &= !Double.isNaN(limit);
      if (t.has("deadband")) {
        deadband = switch (kind.limitKind()) {
          case TEMPERATURE -> t.quantity("deadband", Dimension.TEMPERATURE_DIFFERENCE,
              Bound.NON_NEGATIVE);
          case FRACTION -> fraction(t, "deadband", false);
          case TIME -> t.quantity("deadband", Dimension.TIME, Bound.NON_NEGATIVE);
          case NONE -> 0.0;
        };
        ok &= !Double.isNaN(deadband);
      }
    }
    Duration on = optionalDuration(t, "on_delay", Duration.ZERO, Bound.NON_NEGATIVE);
    Duration off = optionalDuration(t, "off_delay", Duration.ZERO, Bound.NON_NEGATIVE);
    t.finish();
    if (!ok || priority == null || on == null || off == null) {
      return null;
    }
    return new AlarmDefinition(kind, enabled, limit, priority, deadband, on, off);
  }

  /** A fraction written as a plain number in [0, 1] or as per cent ("80 %"). NaN when bad. */
  private static double fraction(TableReader t, String key, boolean required) {
    JsonNode v = t.raw(key);
    if (v == null) {
      if (required) {
        t.error(key, "missing; add it as a fraction such as 0.8 or \"80 %\"");
      }
      return Double.NaN;
    }
    double f;
    if (v.isNumber()) {
      f = v.asDouble();
    } else if (v.isTextual()) {
      try {
        f = Quantity.parse(v.asText(), Dimension.PERCENT).valueSi();
      } catch (QuantityFormatException e) {
        t.error(key, "a fraction is a plain number such as 0.8 or per cent such as \"80 %\": "
            + e.getMessage());
        return Double.NaN;
      }
    } else {
      t.error(key, "must be a fraction such as 0.8 or \"80 %\", got " + t.written(key));
      return Double.NaN;
    }
    if (!(f >= 0.0 && f <= 1.0)) {
      t.error(key, "must be a fraction between 0 and 1 (0 % to 100 %), got " + t.written(key));
      return Double.NaN;
    }
    return f;
  }

  private static Duration optionalDuration(TableReader t, String key, Duration fallback,
      Bound bound) {
    if (!t.has(key)) {
      return fallback;
    }
    double s = t.quantity(key, Dimension.TIME, bound);
    if (Double.isNaN(s)) {
      return null;
    }
    return Duration.ofNanos(Math.round(s * 1e9));
  }

  private static int errorCount(ErrorList errors) {
    return errors.size();
  }
}
