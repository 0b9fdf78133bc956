package org.plateward.config;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** Collects every problem found while reading one file, so all of them can be reported. */
final class ErrorList {
  private final Path file;
  private final List<ConfigError> errors = new ArrayList<>();

  ErrorList(Path file) {
    this.file = file;
  }

  void add(int line, String field, String message) {
    errors.add(new ConfigError(file, line, field, message));
  }

  /** How many problems have been collected so far. */
  int size() {
    return errors.size();
  }

  boolean isEmpty() {
    return errors.isEmpty();
  }

  /** Throws when anything was collected. */
  void throwIfAny() throws InvalidConfigException {
    if (!errors.isEmpty()) {
      throw new InvalidConfigException(errors);
    }
  }
}
