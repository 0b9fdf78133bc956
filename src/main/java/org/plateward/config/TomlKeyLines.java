package org.plateward.config;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The line on which each key, table header and array element of a TOML text starts.
 *
 * <p>The TOML parser we use builds a tree and reports no positions for its tokens (only for
 * syntax errors), so this small scanner walks the text again. It understands comments, the
 * four string forms, {@code [table]} and {@code [[array of tables]]} headers, dotted and quoted
 * keys, arrays and inline tables spanning lines. It is run only on text the parser has
 * accepted, so it does not report syntax errors; on anything odd it skips ahead.
 *
 * <p>Paths are dotted keys with element indices: {@code geometry.length},
 * {@code geometry.reforming_coating[1]}, {@code geometry.reforming_coating[1].start}.
 */
final class TomlKeyLines {
  private final String s;
  private int pos;
  private int line = 1;
  private final Map<String, Integer> lines = new HashMap<>();
  private final Map<String, Integer> arrayTableCounts = new HashMap<>();

  private TomlKeyLines(String text) {
    this.s = text;
  }

  /** Scans a TOML text. */
  static TomlKeyLines scan(String text) {
    TomlKeyLines k = new TomlKeyLines(text);
    k.document();
    return k;
  }

  /** The 1-based line where {@code path} starts, or -1 when it does not occur. */
  int lineOf(String path) {
    Integer l = lines.get(path);
    return l == null ? -1 : l;
  }

  private void record(String path, int atLine) {
    lines.putIfAbsent(path, atLine);
  }

  private void document() {
    String table = "";
    while (pos < s.length()) {
      int before = pos;
      skipBlankLinesAndComments();
      if (pos >= s.length()) {
        break;
      }
      char c = s.charAt(pos);
      if (c == '[') {
        int at = line;
        boolean arrayTable = pos + 1 < s.length() && s.charAt(pos + 1) == '[';
        pos += arrayTable ? 2 : 1;
        String name = join("", key());
        skipInline();
        pos += arrayTable ? 2 : 1;
        if (arrayTable) {
          int n = arrayTableCounts.merge(name, 1, Integer::sum) - 1;
          record(name, at);
          name = name + "[" + n + "]";
        }
        record(name, at);
        table = name;
      } else {
        keyValue(table);
      }
      skipToEndOfLine();
      if (pos == before) {
        pos++; // never stall on text the scanner does not understand
      }
    }
  }

  private void keyValue(String prefix) {
    int at = line;
    List<String> parts = key();
    String path = prefix;
    for (String p : parts) {
      path = path.isEmpty() ? p : path + "." + p;
      record(path, at);
    }
    skipInline();
    if (pos < s.length() && s.charAt(pos) == '=') {
      pos++;
      value(path);
    }
  }

  private static String join(String prefix, List<String> parts) {
    String path = prefix;
    for (String p : parts) {
      path = path.isEmpty() ? p : path + "." + p;
    }
    return path;
  }

  /** A dotted key: bare or quoted parts separated by dots. */
  private List<String> key() {
    List<String> parts = new ArrayList<>();
    while (true) {
      skipInline();
      if (pos >= s.length()) {
        return parts;
      }
      char c = s.charAt(pos);
      if (c == '"' || c == '\'') {
        parts.add(singleLineString(c));
      } else {
        int start = pos;
        while (pos < s.length() && isBareKeyChar(s.charAt(pos))) {
          pos++;
        }
        parts.add(s.substring(start, pos));
      }
      skipInline();
      if (pos < s.length() && s.charAt(pos) == '.') {
        pos++;
      } else {
        return parts;
      }
    }
  }

  private static boolean isBareKeyChar(char c) {
    return Character.isLetterOrDigit(c) || c == '_' || c == '-';
  }

  private void value(String path) {
    skipInline();
    if (pos >= s.length()) {
      return;
    }
    char c = s.charAt(pos);
    if (s.startsWith("\"\"\"", pos) || s.startsWith("'''", pos)) {
      multiLineString(s.substring(pos, pos + 3));
    } else if (c == '"' || c == '\'') {
      singleLineString(c);
    } else if (c == '[') {
      pos++;
      int i = 0;
      while (true) {
        skipBlankLinesAndComments();
        if (pos >= s.length() || s.charAt(pos) == ']') {
          pos++;
          return;
        }
        String element = path + "[" + i++ + "]";
        record(element, line);
        int before = pos;
        value(element);
        skipBlankLinesAndComments();
        if (pos < s.length() && s.charAt(pos) == ',') {
          pos++;
        } else if (pos == before) {
          pos++;
        }
      }
    } else if (c == '{') {
      pos++;
      while (true) {
        skipInline();
        if (pos >= s.length() || s.charAt(pos) == '}') {
          pos++;
          return;
        }
        int before = pos;
        keyValue(path);
        skipInline();
        if (pos < s.length() && s.charAt(pos) == ',') {
          pos++;
        } else if (pos == before) {
          pos++;
        }
      }
    } else {
      // number, boolean or date-time: up to the next delimiter
      while (pos < s.length() && ",]}#\n\r".indexOf(s.charAt(pos)) < 0) {
        pos++;
      }
    }
  }

  /** A basic ("...") or literal ('...') string on one line; returns its raw content. */
  private String singleLineString(char quote) {
    pos++;
    StringBuilder b = new StringBuilder();
    while (pos < s.length() && s.charAt(pos) != quote && s.charAt(pos) != '\n') {
      char c = s.charAt(pos);
      if (quote == '"' && c == '\\' && pos + 1 < s.length()) {
        b.append(s.charAt(pos + 1));
        pos += 2;
      } else {
        b.append(c);
        pos++;
      }
    }
    pos++;
    return b.toString();
  }

  private void multiLineString(String delimiter) {
    pos += 3;
    while (pos < s.length() && !s.startsWith(delimiter, pos)) {
      char c = s.charAt(pos);
      if (c == '\\' && delimiter.charAt(0) == '"' && pos + 1 < s.length()) {
        pos++; // an escaped character never ends the string
        c = s.charAt(pos);
      }
      if (c == '\n') {
        line++;
      }
      pos++;
    }
    pos += 3;
    while (pos < s.length() && s.charAt(pos) == delimiter.charAt(0)) {
      pos++; // up to two quotes may end the content
    }
  }

  private void skipInline() {
    while (pos < s.length() && (s.charAt(pos) == ' ' || s.charAt(pos) == '\t')) {
      pos++;
    }
  }

  private void skipBlankLinesAndComments() {
    while (pos < s.length()) {
      char c = s.charAt(pos);
      if (c == '\n') {
        line++;
        pos++;
      } else if (c == ' ' || c == '\t' || c == '\r') {
        pos++;
      } else if (c == '#') {
        while (pos < s.length() && s.charAt(pos) != '\n') {
          pos++;
        }
      } else {
        return;
      }
    }
  }

  private void skipToEndOfLine() {
    while (pos < s.length() && s.charAt(pos) != '\n') {
      pos++;
    }
  }
}
