package org.plateward.estimation;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * Two-sided tabular CUSUM (Page 1954) per measurement channel on the normalised innovation
 * e = ν/√S_ii, which is N(0,1) for a consistent filter:
 * g⁺ ← max(0, g⁺ + e − k), g⁻ ← max(0, g⁻ − e − k), alarm when either exceeds h.
 *
 * <p>Each sample is winsorised to ±c (c = 4σ by default) before it enters the sums, so a single
 * gross outlier (which the χ² gate handles) cannot raise a drift alarm on its own; a sustained
 * shift still accumulates up to c − k per sample (robust CUSUM in the manner of Lucas &amp;
 * Crosier 1982, from memory).
 *
 * <p>With k = 0.5 and h = 5 the in-control average run length is about 470 updates (two-sided;
 * Siegmund's approximation), h = 8 about 9,500. An alarm is latched until {@link #reset(int)}.
 */
public final class InnovationCusum {
  private final double slack;
  private final double threshold;
  private final double clip;
  private final double[] gPlus;
  private final double[] gMinus;
  private final double[] zeroPlusTimeS;
  private final double[] zeroMinusTimeS;
  private final DriftAlarm[] alarms;

  /**
   * @param channels number of channels
   * @param slack reference value k (in σ)
   * @param threshold decision interval h (in σ)
   * @param startTimeS time the statistics start (s)
   */
  public InnovationCusum(int channels, double slack, double threshold, double startTimeS) {
    this(channels, slack, threshold, 4.0, startTimeS);
  }

  /**
   * @param channels number of channels
   * @param slack reference value k (σ)
   * @param threshold decision interval h (σ)
   * @param clip winsorising bound c &gt; k (σ); {@code Double.POSITIVE_INFINITY} for none
   * @param startTimeS time the statistics start (s)
   */
  public InnovationCusum(
      int channels, double slack, double threshold, double clip, double startTimeS) {
    if (!(threshold > 0.0) || slack < 0.0) {
      throw new IllegalArgumentException(
          "CUSUM needs slack >= 0 and threshold > 0, got " + slack + ", " + threshold);
    }
    this.slack = slack;
    this.threshold = threshold;
    if (!(clip > slack)) {
      throw new IllegalArgumentException("CUSUM clip must exceed the slack, got " + clip);
    }
    this.clip = clip;
    gPlus = new double[channels];
    gMinus = new double[channels];
    zeroPlusTimeS = new double[channels];
    zeroMinusTimeS = new double[channels];
    java.util.Arrays.fill(zeroPlusTimeS, startTimeS);
    java.util.Arrays.fill(zeroMinusTimeS, startTimeS);
    alarms = new DriftAlarm[channels];
  }

  /**
   * Feeds one normalised innovation.
   *
   * @param channel channel index
   * @param normalisedInnovation ν/√S_ii (σ)
   * @param timeS time of the measurement (s)
   * @return the alarm if it was raised by this sample, otherwise null
   */
  public DriftAlarm add(int channel, double normalisedInnovation, double timeS) {
    if (!Double.isFinite(normalisedInnovation)) {
      return null;
    }
    final double e = Math.max(-clip, Math.min(clip, normalisedInnovation));
    // a sample belongs to the drift if the statistic was zero just before it
    if (gPlus[channel] == 0.0) {
      zeroPlusTimeS[channel] = timeS;
    }
    if (gMinus[channel] == 0.0) {
      zeroMinusTimeS[channel] = timeS;
    }
    gPlus[channel] = Math.max(0.0, gPlus[channel] + e - slack);
    gMinus[channel] = Math.max(0.0, gMinus[channel] - e - slack);
    if (alarms[channel] != null) {
      return null;
    }
    if (gPlus[channel] > threshold) {
      alarms[channel] = new DriftAlarm(channel, +1, zeroPlusTimeS[channel], timeS);
      return alarms[channel];
    }
    if (gMinus[channel] > threshold) {
      alarms[channel] = new DriftAlarm(channel, -1, zeroMinusTimeS[channel], timeS);
      return alarms[channel];
    }
    return null;
  }

  /** Upper statistic g⁺ of a channel (σ). */
  public double upper(int channel) {
    return gPlus[channel];
  }

  /** Lower statistic g⁻ of a channel (σ). */
  public double lower(int channel) {
    return gMinus[channel];
  }

  /** Latched alarms, one per alarmed channel. */
  public List<DriftAlarm> activeAlarms() {
    final List<DriftAlarm> out = new ArrayList<>();
    for (DriftAlarm a : alarms) {
      if (a != null) {
        out.add(a);
      }
    }
    return Collections.unmodifiableList(out);
  }

  /** Clears a channel's alarm and statistics (after maintenance, for example). */
  public void reset(int channel) {
    alarms[channel] = null;
    gPlus[channel] = 0.0;
    gMinus[channel] = 0.0;
  }
}
