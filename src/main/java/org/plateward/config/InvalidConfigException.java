package org.plateward.config;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/** A configuration file that cannot be used, with every problem found in it (in file order). */
public final class InvalidConfigException extends Exception {
  private final List<ConfigError> errors;

  public InvalidConfigException(List<ConfigError> errors) {
    super(joined(errors));
    if (errors.isEmpty()) {
      throw new IllegalArgumentException("an invalid configuration has at least one error");
    }
    List<ConfigError> sorted = new ArrayList<>(errors);
    sorted.sort(Comparator.comparingInt(ConfigError::line));
    this.errors = List.copyOf(sorted);
  }

  /** The problems, sorted by line (stable for problems on the same line). */
  public List<ConfigError> errors() {
    return errors;
  }

  private static String joined(List<ConfigError> errors) {
    StringBuilder b = new StringBuilder();
    for (ConfigError e : errors) {
      if (b.length() > 0) {
        b.append(System.lineSeparator());
      }
      b.append(e.format());
    }
    return b.toString();
  }
}
