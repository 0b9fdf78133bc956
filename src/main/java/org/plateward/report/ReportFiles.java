package org.plateward.report;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.plateward.Advisory;
import org.plateward.history.AlarmEventRow;

/** The report's text files: the alarm events and key figures as CSV, and summary.txt. */
public final class ReportFiles {
  public static final String ALARMS = "alarm-events.csv";
  public static final String FIGURES = "key-figures.csv";
  public static final String SUMMARY = "summary.txt";
  /** Columns of the alarm CSV: the alarm history's fields, value and limit in SI (K, 1, s). */
  public static final List<String> ALARM_COLUMNS = List.of("time", "alarm_id", "transition", "priority", "value_si",
      "limit_si", "message");

  private ReportFiles() {}

  /** Writes the alarm events, one row each, in order; an empty cell is a NaN value. */
  public static void writeAlarms(Path file, List<AlarmEventRow> events) throws IOException {
    try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
      w.write(String.join(",", ALARM_COLUMNS));
      w.write('\n');
      for (AlarmEventRow e : events) {
        w.write(String.join(",", e.time().toString(), csv(e.alarmId()), csv(e.transition()), csv(e.priority()),
            real(e.value()), real(e.limit()), csv(e.message())));
        w.write('\n');
      }
    }
  }

  /** Writes the key figures as {@code figure,value,unit,meaning}. */
  public static void writeFigures(Path file, List<KeyFigure> figures) throws IOException {
    try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
      w.write("figure,value,unit,meaning\n");
      for (KeyFigure f : figures) {
        w.write(String.join(",", csv(f.name()), csv(f.value()), csv(f.unit()), csv(f.meaning())));
        w.write('\n');
      }
    }
  }

  /** Writes summary.txt: the cautions, where the data came from, the key figures, the notes. */
  public static void writeSummary(Path file, String title, List<String> sourceLines, List<KeyFigure> figures,
      List<String> notes) throws IOException {
    StringBuilder b = new StringBuilder();
    b.append(title).append('\n').append("=".repeat(title.length())).append("\n\n");
    b.append(Advisory.FULL).append("\n\n");
    for (String s : sourceLines) {
      b.append(s).append('\n');
    }
    b.append("\nKey figures\n");
    int w = 0;
    for (KeyFigure f : figures) {
      w = Math.max(w, f.meaning().length());
    }
    for (KeyFigure f : figures) {
      b.append("  ").append(f.meaning()).append(" ".repeat(w - f.meaning().length())).append("  ")
          .append(f.value().isEmpty() ? "-" : f.value()).append(f.unit().isEmpty() ? "" : " " + f.unit()).append('\n');
    }
    if (!notes.isEmpty()) {
      b.append("\nNotes\n");
      for (String n : notes) {
        b.append("  - ").append(n).append('\n');
      }
    }
    b.append("\nFiles: ").append(String.join(", ", ReportPlots.FILES)).append(", ").append(ALARMS).append(", ")
        .append(FIGURES).append(".\n");
    Files.writeString(file, b.toString(), StandardCharsets.UTF_8);
  }

  /** RFC 4180 field: quoted when it holds a comma, quote or line break. */
  static String csv(String s) {
    if (s == null) {
      return "";
    }
    if (s.contains(",") || s.contains("\"") || s.contains("\n") || s.contains("\r")) {
      return "\"" + s.replace("\"", "\"\"") + "\"";
    }
    return s;
  }

  /** Shortest exact text of a double (round-trips), empty for NaN. */
  static String real(double v) {
    return Double.isNaN(v) ? "" : Double.toString(v);
  }
}
