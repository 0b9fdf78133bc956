package org.plateward.config;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * Reads the keys of one top-level table, converting units and collecting every problem in
 * an {@link ErrorList}. A getter returns NaN (or null) for a value that is missing or bad, so
 * checks that combine several values can skip it instead of piling up follow-on errors.
 *
 * <p>Call {@link #finish()} after the last read: it reports keys nobody asked for, with a
 * did-you-mean for likely typos.
 */
final class TableReader {
  private final TomlDocument doc;
  private final ErrorList errors;
  private final String name;
  private final JsonNode node;
  private final Set<String> known = new LinkedHashSet<>();

  private TableReader(TomlDocument doc, ErrorList errors, String name, JsonNode node) {
    this.doc = doc;
    this.errors = errors;
    this.name = name;
    this.node = node;
  }

  /**
   * The top-level table {@code name}. When it is absent one error is reported for the whole
   * table (line 1), naming a similarly spelt table if there is one, and the reads that follow
   * report nothing more.
   */
  static TableReader open(TomlDocument doc, ErrorList errors, String name, List<String> keysHint) {
    JsonNode n = doc.root().get(name);
    if (n != null && !n.isObject()) {
      errors.add(doc.lineOf(name, 1), name, "must be a table [" + name + "], not a single value");
      return new TableReader(doc, errors, name, null);
    }
    if (n == null) {
      List<String> present = new ArrayList<>();
      doc.root().fieldNames().forEachRemaining(present::add);
      String similar = Spelling.closest(name, present);
      String msg = "missing table [" + name + "] (keys: " + String.join(", ", keysHint) + ")";
      if (similar != null) {
        msg += "; the file has a table [" + similar + "]: is it misspelt?";
      }
      errors.add(1, name, msg);
    }
    return new TableReader(doc, errors, name, n);
  }

  /**
   * A reader over one element of an array of tables ({@code [[event]]}), named by its dotted
   * path with index, e.g. {@code event[2]}; its keys are reported as {@code event[2].kind}.
   */
  static TableReader element(TomlDocument doc, ErrorList errors, String path, JsonNode node) {
    return new TableReader(doc, errors, path, node);
  }

  /** Whether an optional key is present (and marks it as known). */
  boolean has(String key) {
    known.add(key);
    return node != null && node.get(key) != null;
  }

  /** The raw node of a key (marks it as known); null when absent. */
  JsonNode raw(String key) {
    known.add(key);
    return node == null ? null : node.get(key);
  }

  boolean present() {
    return node != null;
  }

  String name() {
    return name;
  }

  /** Line of the table header. */
  int headerLine() {
    return doc.lineOf(name, 1);
  }

  /** Dotted path of a key of this table. */
  String path(String key) {
    return name + "." + key;
  }

  /** Line of a key (or of the table header when the key is absent). */
  int lineOf(String key) {
    return doc.lineOf(path(key), headerLine());
  }

  /** The raw text of a value as written, for messages. */
  String written(String key) {
    JsonNode v = node == null ? null : node.get(key);
    return v == null ? "" : v.isTextual() ? "\"" + v.asText() + "\"" : v.toString();
  }

  /** Reports a problem with a key of this table at the key's line. */
  void error(String key, String message) {
    errors.add(lineOf(key), path(key), message);
  }

  private JsonNode get(String key) {
    known.add(key);
    if (node == null) {
      return null;
    }
    JsonNode v = node.get(key);
    if (v == null) {
      errors.add(headerLine(), path(key), "missing; add it to the [" + name + "] table");
    }
    return v;
  }

  /** A required, non-blank text value. */
  String text(String key) {
    JsonNode v = get(key);
    if (v == null) {
      return null;
    }
    if (!v.isTextual() || v.asText().isBlank()) {
      error(key, "must be a non-empty text in quotes, got " + written(key));
      return null;
    }
    return v.asText().strip();
  }

  /**
   * A quantity written with its unit, in SI.
   *
   * @return the SI value, or NaN when missing or invalid (the problem is reported)
   */
  double quantity(String key, Dimension dim, Bound bound) {
    JsonNode v = get(key);
    return v == null ? Double.NaN : quantityOf(v, path(key), lineOf(key), dim, bound);
  }

  private double quantityOf(JsonNode v, String field, int line, Dimension dim, Bound bound) {
    if (!v.isTextual()) {
      errors.add(line, field, "needs a unit: write it as text such as \"" + example(dim)
          + "\" (units of " + dim.label() + ": " + dim.unitList() + "), got " + v);
      return Double.NaN;
    }
    Quantity q;
    try {
      q = Quantity.parse(v.asText(), dim);
    } catch (QuantityFormatException e) {
      errors.add(line, field, e.getMessage());
      return Double.NaN;
    }
    if (dim == Dimension.TEMPERATURE && !(q.valueSi() > 0.0)) {
      errors.add(line, field, "must be above absolute zero, got \"" + v.asText() + "\"");
      return Double.NaN;
    }
    if (!bound.admits(q.valueSi())) {
      errors.add(line, field, bound.requirement() + ", got \"" + v.asText() + "\"");
      return Double.NaN;
    }
    return q.valueSi();
  }

  private static String example(Dimension dim) {
    return switch (dim) {
      case LENGTH -> "600 mm";
      case TEMPERATURE -> "560 degC";
      case PRESSURE -> "320 kPa";
      default -> "1 " + dim.units().get(0).symbol();
    };
  }

  /** A plain dimensionless number. NaN when missing or invalid. */
  double number(String key, Bound bound) {
    JsonNode v = get(key);
    if (v == null) {
      return Double.NaN;
    }
    if (!v.isNumber()) {
      error(key, "must be a plain number without a unit, got " + written(key));
      return Double.NaN;
    }
    double d = v.asDouble();
    if (!Double.isFinite(d) || !bound.admits(d)) {
      error(key, (Double.isFinite(d) ? bound.requirement() : "must be finite") + ", got " + v);
      return Double.NaN;
    }
    return d;
  }

  /** A mole (or other) fraction: a plain number in [0, 1]. NaN when missing or invalid. */
  double fraction(String key) {
    double d = number(key, Bound.ANY);
    if (!Double.isNaN(d) && (d < 0.0 || d > 1.0)) {
      error(key, "must be a fraction between 0 and 1, got " + written(key));
      return Double.NaN;
    }
    return d;
  }

  /** A whole number at least {@code min}. Null when missing or invalid. */
  Integer count(String key, int min) {
    JsonNode v = get(key);
    if (v == null) {
      return null;
    }
    if (!v.isIntegralNumber() || !v.canConvertToInt()) {
      error(key, "must be a whole number, got " + written(key));
      return null;
    }
    if (v.asInt() < min) {
      error(key, "must be at least " + min + ", got " + v.asInt());
      return null;
    }
    return v.asInt();
  }

  /** One element of a list of coated zones, as read (SI, NaN where invalid). */
  record ZoneEntry(String field, int line, double startM, double endM, String startText, String endText) {}

  /**
   * A list of zones written as {@code [{start = "0 mm", end = "600 mm"}, ...]}. Null when
   * missing or not such a list; elements with bad values are reported and come back with
   * NaN bounds.
   */
  List<ZoneEntry> zones(String key) {
    JsonNode v = get(key);
    if (v == null) {
      return null;
    }
    if (!v.isArray()) {
      error(key, "must be a list of zones such as [{start = \"0 mm\", end = \"600 mm\"}], got "
          + written(key));
      return null;
    }
    List<ZoneEntry> out = new ArrayList<>();
    for (int i = 0; i < v.size(); i++) {
      String field = path(key) + "[" + i + "]";
      int line = doc.lineOf(field, lineOf(key));
      JsonNode z = v.get(i);
      if (!z.isObject()) {
        errors.add(line, field, "must be a zone {start = \"...\", end = \"...\"}, got " + z);
        continue;
      }
      double start = zoneBound(z, field, "start", line);
      double end = zoneBound(z, field, "end", line);
      for (Iterator<String> it = z.fieldNames(); it.hasNext(); ) {
        String k = it.next();
        if (!k.equals("start") && !k.equals("end")) {
          errors.add(doc.lineOf(field + "." + k, line), field + "." + k,
              unknownKeyMessage(k, List.of("start", "end")));
        }
      }
      out.add(new ZoneEntry(field, line, start, end, text(z, "start"), text(z, "end")));
    }
    return out;
  }

  private static String text(JsonNode z, String k) {
    JsonNode v = z.get(k);
    return v == null ? "" : v.asText();
  }

  private double zoneBound(JsonNode zone, String field, String k, int line) {
    JsonNode b = zone.get(k);
    if (b == null) {
      errors.add(line, field + "." + k, "missing; every zone needs a start and an end");
      return Double.NaN;
    }
    return quantityOf(b, field + "." + k, doc.lineOf(field + "." + k, line), Dimension.LENGTH,
        Bound.NON_NEGATIVE);
  }

  /** Reports a problem with one zone of a zone list at the zone's line. */
  void errorAt(ZoneEntry zone, String message) {
    errors.add(zone.line(), zone.field(), message);
  }

  /** Reports every key of the table that was never read. */
  void finish() {
    if (node == null) {
      return;
    }
    for (Iterator<String> it = node.fieldNames(); it.hasNext(); ) {
      String k = it.next();
      if (!known.contains(k)) {
        error(k, unknownKeyMessage(k, known));
      }
    }
  }

  private static String unknownKeyMessage(String key, java.util.Collection<String> known) {
    String near = Spelling.closest(key, known);
    return near != null
        ? "unknown key; did you mean \"" + near + "\"?"
        : "unknown key (expected one of: " + String.join(", ", known) + ")";
  }
}
