package org.plateward.replay;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Number cells of the replay file: plain decimal notation, '.' as separator, rounded half-even to
 * {@value #SIGNIFICANT_DIGITS} significant digits, trailing zeros removed. The rounding is exact
 * (on the binary value), so the same double always gives the same text.
 */
final class ReplayNumbers {
  /** Significant digits written: relative rounding error at most 5e-9. */
  static final int SIGNIFICANT_DIGITS = 9;

  private static final MathContext CONTEXT =
      new MathContext(SIGNIFICANT_DIGITS, RoundingMode.HALF_EVEN);

  private ReplayNumbers() {}

  /** The cell text of a finite value; the empty string for NaN (missing). */
  static String format(double value) {
    if (Double.isNaN(value)) {
      return "";
    }
    if (Double.isInfinite(value)) {
      throw new IllegalArgumentException("a replay file cannot hold an infinite value");
    }
    if (value == 0.0) {
      return "0";
    }
    return new BigDecimal(value).round(CONTEXT).stripTrailingZeros().toPlainString();
  }

  /**
   * Parses a number cell: optional sign, digits with an optional '.', optional exponent. Returns
   * NaN when the text is not such a number (NaN, Infinity, hex, type suffixes, words), so the
   * caller can report the cell.
   */
  static double parse(String cell) {
    int n = cell.length();
    int i = 0;
    if (i < n && (cell.charAt(i) == '+' || cell.charAt(i) == '-')) {
      i++;
    }
    int digits = 0;
    while (i < n && isDigit(cell.charAt(i))) {
      i++;
      digits++;
    }
    if (i < n && cell.charAt(i) == '.') {
      i++;
      while (i < n && isDigit(cell.charAt(i))) {
        i++;
        digits++;
      }
    }
    if (digits == 0) {
      return Double.NaN;
    }
    if (i < n && (cell.charAt(i) == 'e' || cell.charAt(i) == 'E')) {
      i++;
      if (i < n && (cell.charAt(i) == '+' || cell.charAt(i) == '-')) {
        i++;
      }
      int expDigits = 0;
      while (i < n && isDigit(cell.charAt(i))) {
        i++;
        expDigits++;
      }
      if (expDigits == 0) {
        return Double.NaN;
      }
    }
    if (i != n) {
      return Double.NaN;
    }
    double v = Double.parseDouble(cell);
    return Double.isFinite(v) ? v : Double.NaN;
  }

  private static boolean isDigit(char c) {
    return c >= '0' && c <= '9';
  }
}
