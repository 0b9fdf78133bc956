package org.plateward.opcua;

import java.time.Duration;
import java.time.Instant;

/**
 * A period without data from the plant (local clock), for history to store as a gap.
 *
 * @param from when the session was lost
 * @param to when the session was active again and subscriptions restored
 * @param reason what happened, in plain words
 */
public record DataGap(Instant from, Instant to, String reason) {
  public Duration length() {
    return Duration.between(from, to);
  }
}
