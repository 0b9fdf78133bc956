package org.plateward.replay;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeFormatter;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;
import org.plateward.signals.StatusName;

/**
 * Writes frames to a replay file row by row (see the package documentation for the format).
 * Values are converted from SI to each signal's edge unit and written with {@value
 * ReplayNumbers#SIGNIFICANT_DIGITS} significant digits; the same frames give byte-identical
 * files. Not thread-safe.
 */
public final class ReplayWriter implements AutoCloseable {
  private final Writer out;
  private final ReplayLayout layout;
  private final Set<String> truthNames;
  private final boolean[] hadValue = new boolean[Signal.COUNT];
  private final StringBuilder row = new StringBuilder(512);
  private Instant lastTime;
  private long rows;

  private ReplayWriter(Writer out, ReplayLayout layout) throws IOException {
    this.out = out;
    this.layout = layout;
    this.truthNames = new HashSet<>(layout.truthColumns());
    for (String c : layout.comments()) {
      out.write("# " + c + "\n");
    }
    if (!layout.metadata().isEmpty()) {
      StringBuilder meta = new StringBuilder("#");
      layout.metadata().forEach((k, v) -> meta.append(' ').append(k).append('=').append(v));
      out.write(meta.append('\n').toString());
    }
    out.write(String.join(",", layout.columnNames()) + "\n");
  }

  /** Creates (or truncates) the file and writes the comments and the header row. */
  public static ReplayWriter create(Path file, ReplayLayout layout) throws IOException {
    return new ReplayWriter(
        new BufferedWriter(
            new OutputStreamWriter(Files.newOutputStream(file), StandardCharsets.UTF_8), 1 << 16),
        layout);
  }

  /** Writes to any character stream (UTF-8 is the caller's business); closes it on close. */
  public static ReplayWriter to(Writer out, ReplayLayout layout) throws IOException {
    return new ReplayWriter(out, layout);
  }

  /** Writes a frame; statuses derived from its qualities, no truth values. */
  public void write(Frame frame) throws IOException {
    write(frame, Map.of(), Map.of());
  }

  /**
   * Writes one row.
   *
   * <p>A value cell is empty when the quality is MISSING or the value NaN, and also when the
   * quality is BAD but the layout has no status columns (the reader would take it for good). A
   * status cell takes the status given in {@code status}, else the one {@link
   * StatusName#forQuality} gives for the frame quality (a GOOD or UNCERTAIN quality with a NaN
   * value counts as MISSING), exactly as the plant endpoint serves it.
   *
   * @param frame measurements in SI; its time must be later than the previous row's
   * @param status explicit status names for some signals (may be empty)
   * @param truth values by full truth column name, in the unit the name carries; absent or NaN
   *     gives an empty cell
   * @throws IllegalArgumentException for a time that does not increase or an unknown truth column
   */
  public void write(Frame frame, Map<Signal, StatusName> status, Map<String, Double> truth)
      throws IOException {
    Instant t = frame.time();
    if (lastTime != null && !t.isAfter(lastTime)) {
      throw new IllegalArgumentException(
          "replay rows must have increasing timestamps: " + t + " after " + lastTime);
    }
    for (String k : truth.keySet()) {
      if (!truthNames.contains(k)) {
        throw new IllegalArgumentException("truth column not in the layout: " + k);
      }
    }
    row.setLength(0);
    row.append(DateTimeFormatter.ISO_INSTANT.format(t));
    for (Signal s : layout.signals()) {
      int i = s.ordinal();
      double si = frame.valueSi(s);
      Quality q = frame.quality(s);
      if (q.usable() && Double.isNaN(si)) {
        q = Quality.MISSING; // the same rule as the plant endpoint
      }
      boolean writeValue =
          q != Quality.MISSING && !Double.isNaN(si) && (layout.statusColumns() || q != Quality.BAD);
      row.append(',');
      if (writeValue) {
        row.append(ReplayNumbers.format(s.unit().fromSi(si)));
      }
      if (layout.statusColumns()) {
        StatusName name = status.get(s);
        if (name == null) {
          name = StatusName.forQuality(q, hadValue[i]);
        }
        row.append(',').append(name.text());
      }
      hadValue[i] |= q != Quality.MISSING;
    }
    for (String c : layout.truthColumns()) {
      row.append(',');
      Double v = truth.get(c);
      if (v != null) {
        row.append(ReplayNumbers.format(v));
      }
    }
    row.append('\n');
    out.append(row);
    lastTime = t;
    rows++;
  }

  /** Rows written so far. */
  public long rowCount() {
    return rows;
  }

  public void flush() throws IOException {
    out.flush();
  }

  @Override
  public void close() throws IOException {
    out.close();
  }
}
