package org.plateward.config;

/** The sign a configured value must have. */
enum Bound {
  ANY,
  POSITIVE,
  NON_NEGATIVE;

  boolean admits(double v) {
    return switch (this) {
      case ANY -> true;
      case POSITIVE -> v > 0.0;
      case NON_NEGATIVE -> v >= 0.0;
    };
  }

  String requirement() {
    return switch (this) {
      case ANY -> "";
      case POSITIVE -> "must be positive";
      case NON_NEGATIVE -> "must not be negative";
    };
  }
}
