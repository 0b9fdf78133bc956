package org.plateward.config;

import com.fasterxml.jackson.databind.JsonNode;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.plateward.history.HistorySettings;

/**
 * Reads the optional {@code [history]} table. Every key is optional; an absent table gives
 * {@link HistorySettings#defaults()}.
 *
 * <pre>
 * [history]
 * path = "data/plateward.db"      # relative to the working folder
 * raw_retention = "30 d"          # raw samples and every estimate
 * summary_retention = "730 d"     # 1-min min/max/mean summaries, thinned estimates, gaps
 * summary_span = "1 min"          # the downsampling interval
 * batch_interval = "250 ms"       # the writer commits at least this often (at most 1 s)
 * queue_capacity = 200000         # entries waiting for the writer before appends are refused
 * max_size = "20 GB"              # cap on the file (absent: none)
 * </pre>
 *
 * Durations take {@code ms, s, min, h, d}; sizes {@code B, kB, MB, GB} (powers of 1000).
 */
public final class HistoryConfigReader {
  static final String TABLE = "history";
  static final List<String> KEYS = List.of("path", "raw_retention", "summary_retention",
      "summary_span", "batch_interval", "queue_capacity", "max_size");

  private static final Pattern AMOUNT =
      Pattern.compile("\\s*([0-9]+(?:\\.[0-9]+)?)\\s*([A-Za-z]+)\\s*");

  private HistoryConfigReader() {}

  /** Reads {@code [history]} from a parsed document; problems go to {@code errors}. */
  static HistorySettings read(TomlDocument doc, ErrorList errors) {
    HistorySettings d = HistorySettings.defaults();
    if (doc.root().get(TABLE) == null) {
      return d;
    }
    TableReader t = TableReader.open(doc, errors, TABLE, KEYS);
    Path path = d.databaseFile();
    if (t.has("path")) {
      String p = t.text("path");
      if (p != null) {
        path = Path.of(p);
      }
    }
    Duration raw = duration(t, "raw_retention", d.rawRetention());
    Duration summaries = duration(t, "summary_retention", d.summaryRetention());
    Duration span = duration(t, "summary_span", d.summarySpan());
    Duration batch = duration(t, "batch_interval", d.batchInterval());
    int capacity = d.queueCapacity();
    if (t.has("queue_capacity")) {
      Integer c = t.count("queue_capacity", 100);
      capacity = c == null ? capacity : c;
    }
    long maxBytes = size(t, "max_size", d.maxDatabaseBytes());
    t.finish();
    boolean ok = true;
    if (batch.compareTo(Duration.ofSeconds(1)) > 0) {
      t.error("batch_interval", "must be at most 1 s (it bounds what a crash can lose), got "
          + t.written("batch_interval"));
      ok = false;
    }
    if (summaries.compareTo(raw) < 0) {
      t.error("summary_retention", "must not be shorter than raw_retention ("
          + raw.toDays() + " d), got " + t.written("summary_retention"));
      ok = false;
    }
    if (span.compareTo(raw) > 0) {
      t.error("summary_span", "must not be longer than raw_retention, got "
          + t.written("summary_span"));
      ok = false;
    }
    if (!ok) {
      return d;
    }
    return new HistorySettings(path, raw, summaries, span, batch, d.maxBatchEntries(), capacity,
        maxBytes, d.retryInterval());
  }

  private static Duration duration(TableReader t, String key, Duration fallback) {
    JsonNode v = t.raw(key);
    if (v == null) {
      return fallback;
    }
    String hint = "write it as text such as \"30 d\" (units of duration: ms, s, min, h, d), got "
        + t.written(key);
    Matcher m = v.isTextual() ? AMOUNT.matcher(v.asText()) : null;
    if (m == null || !m.matches()) {
      t.error(key, (v.isNumber() ? "needs a unit: " : "") + hint);
      return fallback;
    }
    long ms;
    try {
      ms = Math.round(Quantity.parse(v.asText(), Dimension.TIME).valueSi() * 1000.0);
    } catch (QuantityFormatException e) {
      t.error(key, "unknown unit \"" + m.group(2) + "\": " + hint);
      return fallback;
    }
    if (ms <= 0) {
      t.error(key, "must be positive, got " + t.written(key));
      return fallback;
    }
    return Duration.ofMillis(ms);
  }

  private static long size(TableReader t, String key, long fallback) {
    JsonNode v = t.raw(key);
    if (v == null) {
      return fallback;
    }
    String hint = "write it as text such as \"20 GB\" (units: B, kB, MB, GB), got "
        + t.written(key);
    Matcher m = v.isTextual() ? AMOUNT.matcher(v.asText()) : null;
    if (m == null || !m.matches()) {
      t.error(key, (v.isNumber() ? "needs a unit: " : "") + hint);
      return fallback;
    }
    long unit = switch (m.group(2).toLowerCase(Locale.ROOT)) {
      case "b" -> 1L;
      case "kb" -> 1000L;
      case "mb" -> 1_000_000L;
      case "gb" -> 1_000_000_000L;
      default -> -1L;
    };
    if (unit < 0) {
      t.error(key, "unknown unit \"" + m.group(2) + "\": " + hint);
      return fallback;
    }
    long bytes = new BigDecimal(m.group(1)).multiply(BigDecimal.valueOf(unit)).longValue();
    if (bytes < 1_000_000L) {
      t.error(key, "must be at least 1 MB, got " + t.written(key));
      return fallback;
    }
    return bytes;
  }
}
