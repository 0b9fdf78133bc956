package org.plateward.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** A minimal RFC 4180 reader for the report's CSV files (quoted fields, doubled quotes). */
final class CsvRows {
  private CsvRows() {}

  static List<List<String>> read(Path file) throws IOException {
    String text = Files.readString(file);
    List<List<String>> rows = new ArrayList<>();
    List<String> row = new ArrayList<>();
    StringBuilder f = new StringBuilder();
    boolean quoted = false;
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      if (quoted) {
        if (c == '"' && i + 1 < text.length() && text.charAt(i + 1) == '"') {
          f.append('"');
          i++;
        } else if (c == '"') {
          quoted = false;
        } else {
          f.append(c);
        }
      } else if (c == '"') {
        quoted = true;
      } else if (c == ',') {
        row.add(f.toString());
        f.setLength(0);
      } else if (c == '\n') {
        row.add(f.toString());
        f.setLength(0);
        rows.add(row);
        row = new ArrayList<>();
      } else {
        f.append(c);
      }
    }
    return rows;
  }
}
