package org.plateward.opcua;

import java.util.Set;
import org.plateward.signals.Frame;
import org.plateward.signals.Signal;

/**
 * A frame built from live samples, with what the aligner noticed on the way.
 *
 * @param frame values (SI) and qualities at the frame time; a stale or never-seen signal is NaN
 *     with quality MISSING
 * @param stale signals that had a value earlier but none within their stale limit
 * @param clockSkewed signals whose latest sample's SourceTimestamp differed from local receive
 *     time by more than the skew limit (those samples were aligned on receive time instead)
 * @param samplesUsed samples that arrived for this frame's interval
 */
public record AlignedFrame(Frame frame, Set<Signal> stale, Set<Signal> clockSkewed, int samplesUsed) {
  public AlignedFrame {
    stale = Set.copyOf(stale);
    clockSkewed = Set.copyOf(clockSkewed);
  }
}
