package org.plateward.plant;

import java.util.List;
import org.plateward.signals.Signal;

/**
 * One entry of a scenario's timeline, SI.
 *
 * @param kind what happens
 * @param atS start time from the first frame, s
 * @param targets the signals a fault acts on, or the inlet whose temperature steps; empty for
 *     upsets of the feeds
 * @param catalyst for {@link EventKind#CATALYST_AGEING}: "reforming" or "combustion"; else null
 * @param magnitude the size, in the unit that depends on the kind: a fraction (0.08 for 8 %) for
 *     feed drop, fuel surge and ageing; the new steam-to-carbon ratio; a temperature difference,
 *     K; a drift rate in SI units of the target per second; a spike amplitude in SI units of the
 *     target; NaN for stuck and dropout
 * @param rampS time to ramp in (and out, after the duration), s; 0 for a step
 * @param durationS how long the event lasts after its start (ramp in included), s; infinite when
 *     it lasts to the end
 * @param timeConstantS e-folding time of catalyst ageing, s; NaN otherwise
 * @param intervalS mean time between spikes, s; NaN otherwise
 */
public record ScenarioEvent(
    EventKind kind,
    double atS,
    List<Signal> targets,
    String catalyst,
    double magnitude,
    double rampS,
    double durationS,
    double timeConstantS,
    double intervalS) {
  public ScenarioEvent {
    targets = List.copyOf(targets);
  }

  /** Time the event ends (ramp out begins), s; infinite when it never ends. */
  public double endS() {
    return atS + durationS;
  }

  /**
   * The event's strength at time t, 0..1: a linear ramp up from {@code atS} over {@code rampS},
   * 1 until {@code atS + durationS}, then a linear ramp back down over {@code rampS}.
   */
  public double strength(double tS) {
    if (tS < atS) {
      return 0.0;
    }
    double up = rampS > 0.0 ? Math.min(1.0, (tS - atS) / rampS) : 1.0;
    double end = endS();
    if (tS < end) {
      return up;
    }
    if (rampS <= 0.0) {
      return 0.0;
    }
    return Math.max(0.0, Math.min(up, 1.0 - (tS - end) / rampS));
  }

  /** True while a sensor fault is in force (from its start to its end). */
  public boolean activeAt(double tS) {
    return tS >= atS && tS < endS();
  }
}
