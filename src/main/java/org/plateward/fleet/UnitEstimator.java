package org.plateward.fleet;

import org.plateward.signals.Frame;
import org.plateward.softsensor.Estimate;

/**
 * One unit's estimator as the pool sees it: frames in, in time order, one estimate each. In
 * production this is {@code sensor::accept} of a {@link org.plateward.softsensor.ReactorSoftSensor};
 * the pool never calls it from two threads at once.
 */
@FunctionalInterface
public interface UnitEstimator {
  /**
   * Takes the next frame of this unit.
   *
   * @param frame the frame, SI
   * @return the estimate for it
   */
  Estimate accept(Frame frame);
}
