package org.plateward.live;

import java.time.Duration;
import java.time.Instant;
import org.plateward.signals.Frame;

/**
 * Maps wall-clock instants to plant time. A real plant runs on the wall clock (speed 1, same
 * origin); the demo's simulated plant runs {@code speed} times faster, and its frames travel
 * over OPC UA with wall-clock SourceTimestamps so that the client's alignment and stale checks
 * work as on a real plant. The monitor maps each aligned frame back to plant time before the
 * estimator sees it, so the model's dynamics stay in plant seconds:
 * {@code t_plant = plantOrigin + (t_wall − wallOrigin) · speed}.
 *
 * @param wallOrigin wall-clock instant that corresponds to {@code plantOrigin}
 * @param plantOrigin plant time at {@code wallOrigin}
 * @param speed plant seconds per wall second, &gt; 0
 */
public record TimeScale(Instant wallOrigin, Instant plantOrigin, double speed) {
  /** The wall clock itself: a real plant. */
  public static final TimeScale REAL_TIME = new TimeScale(Instant.EPOCH, Instant.EPOCH, 1.0);

  public TimeScale {
    if (!(speed > 0.0) || !Double.isFinite(speed)) {
      throw new IllegalArgumentException("speed must be positive and finite, got " + speed);
    }
  }

  /** Whether plant time is the wall clock. */
  public boolean realTime() {
    return speed == 1.0 && wallOrigin.equals(plantOrigin);
  }

  /** Plant time of a wall-clock instant. */
  public Instant toPlant(Instant wall) {
    if (realTime()) {
      return wall;
    }
    long dNs = Duration.between(wallOrigin, wall).toNanos();
    return plantOrigin.plusNanos(Math.round(dNs * speed));
  }

  /** Wall-clock instant of a plant time given as seconds after {@code plantOrigin}. */
  public Instant toWall(double plantOffsetS) {
    return wallOrigin.plusNanos(Math.round(plantOffsetS / speed * 1e9));
  }

  /** Plant seconds for a wall-clock span, s. */
  public double plantSeconds(double wallS) {
    return wallS * speed;
  }

  /** The same frame on plant time. */
  public Frame toPlant(Frame wallFrame) {
    if (realTime()) {
      return wallFrame;
    }
    return new Frame(toPlant(wallFrame.time()), wallFrame.valuesSi(), wallFrame.quality());
  }
}
