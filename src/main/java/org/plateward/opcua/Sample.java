package org.plateward.opcua;

import java.time.Instant;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;

/**
 * One value received for a signal, copied out of the OPC UA client's callback.
 *
 * @param signal the canonical signal
 * @param valueSi the value in SI; NaN when the server sent none or a non-numeric one
 * @param quality from the StatusCode severity ({@link StatusQuality})
 * @param statusCode the 32-bit OPC UA StatusCode as received
 * @param sourceTime SourceTimestamp; null when absent (or the 1601 "null" DateTime)
 * @param serverTime ServerTimestamp; null when absent
 * @param receivedAt local clock when the value was copied out of the callback
 */
public record Sample(
    Signal signal,
    double valueSi,
    Quality quality,
    long statusCode,
    Instant sourceTime,
    Instant serverTime,
    Instant receivedAt) {

  /** The timestamp to align on: SourceTimestamp, else ServerTimestamp, else local receive time. */
  public Instant alignmentTime() {
    if (sourceTime != null) {
      return sourceTime;
    }
    return serverTime != null ? serverTime : receivedAt;
  }
}
