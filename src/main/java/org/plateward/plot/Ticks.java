package org.plateward.plot;

/**
 * "Nice" axis ticks: steps of 1, 2 or 5 times a power of ten, about {@code target} of them
 * over a range (the usual rule of thumb for readable axes).
 */
public final class Ticks {
  private Ticks() {}

  /** The tick step for [lo, hi] with about {@code target} intervals. */
  public static double step(double lo, double hi, int target) {
    double span = hi - lo;
    if (!(span > 0.0) || !Double.isFinite(span)) {
      return 1.0;
    }
    double raw = span / Math.max(1, target);
    double mag = Math.pow(10.0, Math.floor(Math.log10(raw)));
    double f = raw / mag;
    double nice = f < 1.5 ? 1.0 : f < 3.0 ? 2.0 : f < 7.0 ? 5.0 : 10.0;
    return nice * mag;
  }

  /** The ticks inside [lo, hi] at multiples of {@code step}. */
  public static double[] values(double lo, double hi, double step) {
    double first = Math.ceil(lo / step - 1e-9) * step;
    int n = (int) Math.floor((hi - first) / step + 1e-9) + 1;
    n = Math.max(0, Math.min(n, 1000));
    double[] t = new double[n];
    for (int i = 0; i < n; i++) {
      t[i] = first + i * step;
      if (Math.abs(t[i]) < 1e-12 * step) {
        t[i] = 0.0;
      }
    }
    return t;
  }

  /** A tick label with as many decimals as the step needs. */
  public static String label(double v, double step) {
    int decimals = Math.max(0, (int) Math.ceil(-Math.log10(step) - 1e-9));
    return String.format(java.util.Locale.ROOT, "%." + decimals + "f", v);
  }
}
