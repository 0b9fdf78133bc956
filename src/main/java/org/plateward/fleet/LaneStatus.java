package org.plateward.fleet;

import java.time.Instant;

/**
 * A snapshot of one unit's lane.
 *
 * @param unitId the unit
 * @param state running, finished or failed
 * @param accepted frames taken into the lane (queued or read from its source)
 * @param estimated frames the estimator has processed
 * @param dropped frames thrown away: the oldest queued frame when a full lane was offered a new
 *     one, and frames offered after the lane failed
 * @param queued frames waiting now
 * @param maxQueued most frames ever waiting at once
 * @param firstFrame time of the first frame estimated; null before it
 * @param lastFrame time of the last frame estimated; null before it
 * @param cpuNanos CPU time the pool's threads spent on this lane (estimator, sink and, for a
 *     lane reading its own source, the reading), ns
 * @param wallNanos wall time from the lane's opening to its end (or to now while running), ns
 * @param partialFrames frames the source read with some values missing (short rows); 0 for a
 *     fed lane
 * @param reason why the lane failed (exception, message and the frame it stopped at); empty
 *     otherwise
 */
public record LaneStatus(
    String unitId,
    LaneState state,
    long accepted,
    long estimated,
    long dropped,
    int queued,
    int maxQueued,
    Instant firstFrame,
    Instant lastFrame,
    long cpuNanos,
    long wallNanos,
    long partialFrames,
    String reason) {

  /**
   * Plant time covered by the estimated frames, s: last minus first plus one frame period
   * (the mean spacing), as {@link org.plateward.softsensor.EstimationLoop} counts it.
   */
  public double spanS() {
    if (firstFrame == null || estimated < 2) {
      return 0.0;
    }
    double d = (lastFrame.getEpochSecond() - firstFrame.getEpochSecond())
        + 1e-9 * (lastFrame.getNano() - firstFrame.getNano());
    return d + d / (estimated - 1);
  }

  /** CPU time per second of plant time, s/s; NaN before two frames. */
  public double cpuPerPlantSecond() {
    double span = spanS();
    return span > 0 ? cpuNanos / 1e9 / span : Double.NaN;
  }
}
