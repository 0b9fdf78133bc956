package org.plateward.config;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.plateward.advisor.TrimSettings;

/**
 * Reads the optional {@code [advisor]} table into {@link TrimSettings}. Every key is optional;
 * an absent key keeps the built-in default ({@link TrimSettings#defaults}), and an absent
 * {@code peak_limit} takes the limit of {@code [alarms.peak_high]}. A file with any problem is
 * refused as a whole ({@code file:line: field: message}), so the settings in use are never
 * half-replaced.
 *
 * <pre>
 * [advisor]
 * min_trim = "-15 %"        # largest fuel reduction the advisor may suggest (per cent, &lt;= 0)
 * max_trim = "0 %"          # largest fuel increase (per cent, &gt;= 0; the search looks at reductions)
 * horizon = "15 min"        # forecast horizon (a time)
 * peak_limit = "1110 degC"  # limit on the forecast peak upper bound (degC or K)
 * k_sigma = 2.0             # k of the upper bound mean + k sigma
 * deadband = "3 K"          # hysteresis on the limit while a trim is in force (K)
 * min_interval = "2 min"    # least time between two suggestions
 * trim_step = "0.5 %"       # a new trim of the same verdict only when it moves by more
 * forecast_every = "30 s"   # how often (plant time) the live monitor asks the advisor
 * sigma_directions = 6      # most sigma-point directions of the spread forecast (2r + 1 marches)
 * </pre>
 */
public final class AdvisorConfigReader {
  static final String TABLE = "advisor";
  static final List<String> KEYS = List.of("min_trim", "max_trim", "horizon", "peak_limit", "k_sigma",
      "deadband", "min_interval", "trim_step", "forecast_every", "sigma_directions");

  private AdvisorConfigReader() {}

  /**
   * Reads a file holding an {@code [advisor]} table.
   *
   * @param file the TOML file
   * @param peakHighK the peak_high alarm limit, K, used when {@code peak_limit} is absent
   * @return the settings, or the defaults when the file has no {@code [advisor]} table
   * @throws InvalidConfigException with every problem found; nothing is returned then
   */
  public static TrimSettings load(Path file, double peakHighK) throws InvalidConfigException {
    TomlDocument doc = TomlDocument.read(file);
    ErrorList errors = new ErrorList(file);
    TrimSettings s = read(doc, errors, peakHighK);
    errors.throwIfAny();
    return s == null ? TrimSettings.defaults(peakHighK) : s;
  }

  /**
   * Reads {@code [advisor]}; null when the table is absent or has a problem (reported to
   * {@code errors}).
   *
   * @param peakHighK the default peak limit, K (NaN when there is none: then peak_limit is required)
   */
  static TrimSettings read(TomlDocument doc, ErrorList errors, double peakHighK) {
    if (doc.root().get(TABLE) == null) {
      return null;
    }
    TableReader t = TableReader.open(doc, errors, TABLE, KEYS);
    if (!t.present()) {
      return null;
    }
    int before = errors.size();
    TrimSettings d = TrimSettings.defaults(Double.isNaN(peakHighK) ? 1.0 : peakHighK);
    double minTrim = percent(t, "min_trim", d.minTrim());
    double maxTrim = percent(t, "max_trim", d.maxTrim());
    double horizon = optional(t, "horizon", Dimension.TIME, Bound.POSITIVE, d.horizonS());
    double limit;
    if (t.has("peak_limit") || Double.isNaN(peakHighK)) {
      limit = t.quantity("peak_limit", Dimension.TEMPERATURE, Bound.POSITIVE);
    } else {
      limit = peakHighK;
    }
    double k = t.has("k_sigma") ? t.number("k_sigma", Bound.NON_NEGATIVE) : d.kSigma();
    double deadband = optional(t, "deadband", Dimension.TEMPERATURE_DIFFERENCE, Bound.NON_NEGATIVE, d.deadbandK());
    double interval = optional(t, "min_interval", Dimension.TIME, Bound.NON_NEGATIVE, d.minIntervalS());
    double step = percent(t, "trim_step", d.trimStep());
    double every = optional(t, "forecast_every", Dimension.TIME, Bound.POSITIVE, d.forecastEveryS());
    int directions = d.sigmaDirections();
    if (t.has("sigma_directions")) {
      Integer r = t.count("sigma_directions", 1);
      directions = r == null ? -1 : r;
      if (r != null && r > 64) {
        t.error("sigma_directions", "must be at most 64 (each direction costs two forecasts), got " + r);
      }
    }
    t.finish();
    if (errors.size() == before) {
      if (!(minTrim <= 0.0)) {
        t.error("min_trim", "must be 0 % or below: the trim bounds must include 0 % (hold), got "
            + t.written("min_trim"));
      } else if (!(minTrim > -1.0)) {
        t.error("min_trim", "must be above -100 % (no negative fuel), got " + t.written("min_trim"));
      }
      if (!(maxTrim >= 0.0)) {
        t.error("max_trim", "must be 0 % or above: the trim bounds must include 0 % (hold), got "
            + t.written("max_trim"));
      }
      if (!(step >= 0.0)) {
        t.error("trim_step", "must not be negative, got " + t.written("trim_step"));
      }
    }
    if (errors.size() > before) {
      return null;
    }
    try {
      return new TrimSettings(minTrim, maxTrim, limit, k, horizon, deadband, interval, step, d.trimTolerance(),
          every, directions);
    } catch (IllegalArgumentException e) {
      errors.add(t.headerLine(), TABLE, e.getMessage());
      return null;
    }
  }

  /** A relative trim written in per cent ("-15 %"); a plain number is refused. */
  private static double percent(TableReader t, String key, double fallback) {
    if (!t.has(key)) {
      return fallback;
    }
    com.fasterxml.jackson.databind.JsonNode v = t.raw(key);
    if (!v.isTextual()) {
      t.error(key, "write it in per cent with the unit, such as \"-15 %\", got " + t.written(key));
      return Double.NaN;
    }
    try {
      return Quantity.parse(v.asText(), Dimension.PERCENT).valueSi();
    } catch (QuantityFormatException e) {
      t.error(key, e.getMessage());
      return Double.NaN;
    }
  }

  private static double optional(TableReader t, String key, Dimension dim, Bound bound, double fallback) {
    return t.has(key) ? t.quantity(key, dim, bound) : fallback;
  }

}
