package org.plateward.history;

import java.time.Instant;
import java.util.Objects;

/**
 * A period with no data, and why (connection lost, history not kept, ...).
 *
 * @param start first instant without data
 * @param end instant data came back (not before {@code start})
 * @param reason plain words for the operator
 */
public record GapRow(Instant start, Instant end, String reason) {
  public GapRow {
    Objects.requireNonNull(start, "start");
    Objects.requireNonNull(end, "end");
    Objects.requireNonNull(reason, "reason");
    if (end.isBefore(start)) {
      throw new IllegalArgumentException("gap ends (" + end + ") before it starts (" + start + ")");
    }
  }
}
