package org.plateward.signals;

import java.time.Instant;
import java.util.Arrays;

/**
 * One time step of aligned measurements: a value in SI and a quality per {@link Signal},
 * indexed by {@code Signal.ordinal()}. Missing values are NaN with quality MISSING.
 */
public record Frame(Instant time, double[] valuesSi, Quality[] quality) {
  public Frame {
    if (valuesSi.length != Signal.COUNT || quality.length != Signal.COUNT) {
      throw new IllegalArgumentException("a frame holds exactly " + Signal.COUNT + " signals");
    }
    valuesSi = valuesSi.clone();
    quality = quality.clone();
  }

  public double valueSi(Signal s) {
    return valuesSi[s.ordinal()];
  }

  public Quality quality(Signal s) {
    return quality[s.ordinal()];
  }

  /** True when the signal has a value the estimator may use. */
  public boolean usable(Signal s) {
    return quality[s.ordinal()].usable() && Double.isFinite(valuesSi[s.ordinal()]);
  }

  /** True when any signal has a usable value. */
  public boolean anyUsable() {
    for (Signal s : Signal.values()) {
      if (usable(s)) {
        return true;
      }
    }
    return false;
  }

  @Override
  public double[] valuesSi() {
    return valuesSi.clone();
  }

  @Override
  public Quality[] quality() {
    return quality.clone();
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof Frame f
        && time.equals(f.time)
        && Arrays.equals(valuesSi, f.valuesSi)
        && Arrays.equals(quality, f.quality);
  }

  @Override
  public int hashCode() {
    return time.hashCode() * 31 + Arrays.hashCode(valuesSi);
  }

  @Override
  public String toString() {
    return "Frame[" + time + "]";
  }
}
