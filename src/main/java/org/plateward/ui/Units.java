package org.plateward.ui;

import java.util.Locale;

/** SI to the engineering units the window shows (degC, mm, min, per cent); labels beside. */
final class Units {
  private Units() {}

  static final double ZERO_C_K = 273.15;

  static double degC(double k) {
    return k - ZERO_C_K;
  }

  /** "1084.6 ± 3.1 °C" (σ = 1 standard deviation). */
  static String tempWithSd(double k, double sdK) {
    if (!Double.isFinite(k)) {
      return "n/a";
    }
    return Double.isFinite(sdK) ? String.format(Locale.ROOT, "%.1f ± %.1f °C", degC(k), sdK)
        : String.format(Locale.ROOT, "%.1f °C", degC(k));
  }

  static String mm(double m) {
    return Double.isFinite(m) ? String.format(Locale.ROOT, "%.0f mm", m * 1000) : "n/a";
  }

  static String fraction(double f, double sd) {
    if (!Double.isFinite(f)) {
      return "n/a";
    }
    return Double.isFinite(sd) ? String.format(Locale.ROOT, "%.3f ± %.3f", f, sd) : String.format(Locale.ROOT, "%.3f", f);
  }

  /** Time-to-exhaust in words: minutes ± σ, or none forecast. */
  static String exhaust(double s, double sdS) {
    if (Double.isNaN(s)) {
      return "none within the forecast horizon";
    }
    if (s <= 0) {
      return "buffer spent in the hottest cell";
    }
    return Double.isFinite(sdS) ? String.format(Locale.ROOT, "%.1f ± %.1f min", s / 60, sdS / 60)
        : String.format(Locale.ROOT, "%.1f min", s / 60);
  }
}
