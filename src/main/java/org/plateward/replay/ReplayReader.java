package org.plateward.replay;

import org.plateward.config.Spelling;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Set;
import java.util.Spliterator;
import java.util.Spliterators;
import java.util.stream.Stream;
import java.util.stream.StreamSupport;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;
import org.plateward.signals.StatusName;

/**
 * Reads a replay file row by row (see the package documentation for the format), holding one
 * row at a time. Values are converted from each signal's edge unit to SI.
 *
 * <p>The header is read and checked on {@code open}; each row is checked as it is read. Any
 * violation throws {@link ReplayFormatException} naming file, line and column. A row with fewer
 * cells than the header is read with the missing trailing cells empty and counted in {@link
 * #partialRowCount()}. Not thread-safe.
 */
public final class ReplayReader implements Iterator<ReplayRecord>, AutoCloseable {
  private enum Kind {
    TIMESTAMP,
    VALUE,
    STATUS,
    TRUTH
  }

  private final BufferedReader in;
  private final String fileName;
  private final ReplayHeader header;
  private final int width;
  private final Kind[] kinds;
  private final Signal[] signals;
  private final String[] names;
  private final String[] cells;
  private long lineNumber;
  private ReplayRecord next;
  private Instant lastTime;
  private long rows;
  private long partialRows;
  private boolean done;

  private ReplayReader(BufferedReader in, String fileName) throws IOException {
    this.in = in;
    this.fileName = fileName;
    Map<String, String> metadata = new LinkedHashMap<>();
    List<String> comments = new ArrayList<>();
    String headerLine = null;
    String line;
    while ((line = in.readLine()) != null) {
      lineNumber++;
      if (lineNumber == 1 && line.startsWith("\uFEFF")) {
        line = line.substring(1); // UTF-8 byte order mark
      }
      if (line.startsWith("#")) {
        String text = line.substring(1).startsWith(" ") ? line.substring(2) : line.substring(1);
        comments.add(text);
        for (String token : text.trim().split("\\s+")) {
          int eq = token.indexOf('=');
          if (eq > 0 && eq < token.length() - 1) {
            metadata.put(token.substring(0, eq), token.substring(eq + 1));
          }
        }
      } else if (!line.isBlank()) {
        headerLine = line;
        break;
      }
    }
    if (headerLine == null) {
      throw error(Math.max(1, lineNumber), ReplayColumns.TIMESTAMP, "no header row");
    }
    names = headerLine.split(",", -1);
    width = names.length;
    kinds = new Kind[width];
    signals = new Signal[width];
    cells = new String[width];
    classify();
    header = new ReplayHeader(metadata, comments, Arrays.asList(names));
  }

  /** Opens a UTF-8 replay file and checks its header. */
  public static ReplayReader open(Path file) throws IOException {
    BufferedReader in =
        new BufferedReader(
            new java.io.InputStreamReader(Files.newInputStream(file), StandardCharsets.UTF_8),
            1 << 16);
    try {
      return new ReplayReader(in, file.toString());
    } catch (RuntimeException | IOException e) {
      in.close();
      throw e;
    }
  }

  /**
   * Reads from any character stream; {@code fileName} is used in error messages only.
   */
  public static ReplayReader open(Reader reader, String fileName) throws IOException {
    BufferedReader in =
        reader instanceof BufferedReader b ? b : new BufferedReader(reader, 1 << 16);
    return new ReplayReader(in, fileName);
  }

  private void classify() {
    Set<String> seen = new HashSet<>();
    List<String> known = ReplayColumns.knownNames();
    Map<Signal, Integer> valueColumn = new HashMap<>();
    for (int c = 0; c < width; c++) {
      String n = names[c];
      if (n.isEmpty()) {
        throw error(lineNumber, "column " + (c + 1), "empty column name in the header");
      }
      if (!seen.add(n)) {
        throw error(lineNumber, n, "duplicate column");
      }
      if (n.equals(ReplayColumns.TIMESTAMP)) {
        if (c != 0) {
          throw error(lineNumber, n, "must be the first column (found as column " + (c + 1) + ")");
        }
        kinds[c] = Kind.TIMESTAMP;
        continue;
      }
      Signal s = Signal.byId(n);
      if (s != null) {
        kinds[c] = Kind.VALUE;
        signals[c] = s;
        valueColumn.put(s, c);
        continue;
      }
      if (n.startsWith(ReplayColumns.STATUS_PREFIX)) {
        s = Signal.byId(n.substring(ReplayColumns.STATUS_PREFIX.length()));
        if (s != null) {
          kinds[c] = Kind.STATUS;
          signals[c] = s;
          continue;
        }
      }
      if (ReplayColumns.isTruthColumn(n)) {
        kinds[c] = Kind.TRUTH;
        continue;
      }
      String guess = Spelling.closest(n, known);
      throw error(
          lineNumber,
          n,
          "unknown column"
              + (guess != null ? "; did you mean '" + guess + "'?" : "")
              + " (expected timestamp, a signal id, status_<signal id> or truth_<name>)");
    }
    if (kinds[0] != Kind.TIMESTAMP) {
      throw error(lineNumber, ReplayColumns.TIMESTAMP, "missing timestamp column (it must be the first column)");
    }
    for (int c = 0; c < width; c++) {
      if (kinds[c] == Kind.STATUS && !valueColumn.containsKey(signals[c])) {
        throw error(lineNumber, names[c], "status column without the value column " + signals[c].id());
      }
    }
  }

  public ReplayHeader header() {
    return header;
  }

  /** The signals that have a value column in this file. */
  public Set<Signal> signalsPresent() {
    Set<Signal> present = java.util.EnumSet.noneOf(Signal.class);
    for (int c = 0; c < width; c++) {
      if (kinds[c] == Kind.VALUE) {
        present.add(signals[c]);
      }
    }
    return present;
  }

  /** Rows read so far. */
  public long rowCount() {
    return rows;
  }

  /** Rows read so far that had fewer cells than the header (the rest read as missing). */
  public long partialRowCount() {
    return partialRows;
  }

  /**
   * @throws ReplayFormatException when the next row breaks the format
   * @throws UncheckedIOException when reading fails
   */
  @Override
  public boolean hasNext() {
    if (next == null && !done) {
      try {
        next = readRow();
      } catch (IOException e) {
        throw new UncheckedIOException(fileName + ":" + lineNumber + ": " + e.getMessage(), e);
      }
      done = next == null;
    }
    return next != null;
  }

  @Override
  public ReplayRecord next() {
    if (!hasNext()) {
      throw new NoSuchElementException();
    }
    ReplayRecord r = next;
    next = null;
    return r;
  }

  /** The remaining rows as an ordered sequential stream; closing it closes the reader. */
  public Stream<ReplayRecord> stream() {
    return StreamSupport.stream(
            Spliterators.spliteratorUnknownSize(this, Spliterator.ORDERED | Spliterator.NONNULL),
            false)
        .onClose(
            () -> {
              try {
                close();
              } catch (IOException e) {
                throw new UncheckedIOException(e);
              }
            });
  }

  @Override
  public void close() throws IOException {
    in.close();
  }

  private ReplayRecord readRow() throws IOException {
    String line;
    while (true) {
      line = in.readLine();
      if (line == null) {
        return null;
      }
      lineNumber++;
      if (!line.isBlank() && !line.startsWith("#")) {
        break;
      }
    }
    int count = split(line);
    if (count > width) {
      throw error(lineNumber, "column " + (width + 1), "row has " + count + " cells, the header " + width);
    }
    if (count < width) {
      partialRows++;
      Arrays.fill(cells, count, width, "");
    }
    Instant time = parseTime(cells[0]);
    double[] valuesSi = new double[Signal.COUNT];
    Arrays.fill(valuesSi, Double.NaN);
    Quality[] quality = new Quality[Signal.COUNT];
    Arrays.fill(quality, Quality.MISSING);
    Map<Signal, StatusName> status = new EnumMap<>(Signal.class);
    Map<String, Double> truth = new HashMap<>();
    for (int c = 1; c < width; c++) {
      String cell = cells[c];
      switch (kinds[c]) {
        case VALUE -> {
          if (!cell.isEmpty()) {
            Signal s = signals[c];
            valuesSi[s.ordinal()] = s.unit().toSi(number(cell, c));
            quality[s.ordinal()] = Quality.GOOD;
          }
        }
        case STATUS -> {
          if (!cell.isEmpty()) {
            StatusName name = StatusName.byText(cell);
            if (name == null) {
              throw error(lineNumber, names[c], unknownStatus(cell));
            }
            status.put(signals[c], name);
          }
        }
        case TRUTH -> truth.put(names[c], cell.isEmpty() ? Double.NaN : number(cell, c));
        case TIMESTAMP -> throw new IllegalStateException("timestamp is column 1 only");
      }
    }
    // a filled value takes the severity of its status; an empty value stays MISSING
    for (Map.Entry<Signal, StatusName> e : status.entrySet()) {
      int i = e.getKey().ordinal();
      if (quality[i] != Quality.MISSING) {
        quality[i] = e.getValue().quality();
      }
    }
    rows++;
    lastTime = time;
    return new ReplayRecord(lineNumber, new Frame(time, valuesSi, quality), status, truth);
  }

  /** Splits on ',' into {@link #cells}; returns the number of cells in the line. */
  private int split(String line) {
    int count = 0;
    int start = 0;
    int n = line.length();
    while (true) {
      int comma = line.indexOf(',', start);
      int end = comma < 0 ? n : comma;
      if (count < width) {
        cells[count] = line.substring(start, end);
      }
      count++;
      if (comma < 0) {
        return count;
      }
      start = comma + 1;
    }
  }

  private Instant parseTime(String cell) {
    if (cell.isEmpty()) {
      throw error(lineNumber, ReplayColumns.TIMESTAMP, "empty timestamp");
    }
    Instant t;
    try {
      if (cell.charAt(cell.length() - 1) != 'Z') {
        throw new DateTimeParseException("no Z", cell, cell.length() - 1);
      }
      t = UtcTimestamps.parse(cell);
    } catch (DateTimeParseException e) {
      throw error(
          lineNumber,
          ReplayColumns.TIMESTAMP,
          "'" + cell + "' is not an ISO 8601 UTC time like 2026-03-04T05:06:07Z");
    }
    if (lastTime != null && !t.isAfter(lastTime)) {
      throw error(
          lineNumber,
          ReplayColumns.TIMESTAMP,
          (t.equals(lastTime) ? "duplicate timestamp " : "timestamp goes backwards: ")
              + cell
              + " after "
              + lastTime);
    }
    return t;
  }

  private double number(String cell, int column) {
    double v = ReplayNumbers.parse(cell);
    if (Double.isNaN(v)) {
      throw error(
          lineNumber,
          names[column],
          "'" + cell + "' is not a finite decimal number (leave the cell empty for a missing value)");
    }
    return v;
  }

  private static String unknownStatus(String cell) {
    List<String> known = new ArrayList<>();
    for (StatusName s : StatusName.values()) {
      known.add(s.text());
    }
    String guess = Spelling.closest(cell, known);
    return "unknown OPC UA status name '"
        + cell
        + "'"
        + (guess != null ? "; did you mean '" + guess + "'?" : "");
  }

  private ReplayFormatException error(long line, String column, String problem) {
    return new ReplayFormatException(fileName, line, column, problem);
  }
}
