package org.plateward.config;

import java.nio.file.Path;

/**
 * One problem found in a configuration file, printed as {@code file:line: field: message}.
 *
 * @param file the file as the user named it
 * @param line 1-based line the problem is reported at; 0 when no line applies (unreadable file)
 * @param field dotted path of the field, e.g. {@code geometry.buffer_thickness}; null when
 *     the problem is not about one field
 * @param message what is wrong, in plain words
 */
public record ConfigError(Path file, int line, String field, String message) {
  /** The one-line form {@code file:line: field: message}. */
  public String format() {
    StringBuilder b = new StringBuilder();
    b.append(file);
    if (line > 0) {
      b.append(':').append(line);
    }
    b.append(": ");
    if (field != null) {
      b.append(field).append(": ");
    }
    return b.append(message).toString();
  }

  @Override
  public String toString() {
    return format();
  }
}
