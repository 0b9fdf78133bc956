package org.plateward.history;

import java.time.Instant;

/**
 * Whether history is being kept, and the counters behind it. Monitoring goes on in either state.
 *
 * @param state OK or NOT_KEEPING
 * @param reason plain words for the operator when NOT_KEEPING (null when OK)
 * @param since when the current NOT_KEEPING period began (null when OK)
 * @param storedEntries entries committed to the database since start
 * @param droppedEntries entries refused because the queue was full or the recorder closed
 * @param unstoredEntries entries the writer took but could not store (database fault)
 * @param queueDepth entries waiting for the writer now
 * @param walBytes size of the -wal file, bytes (-1 when unknown): it should stay small; a
 *     growing WAL means checkpoints are starved by a reader that never finishes
 */
public record HistoryHealth(
    State state, String reason, Instant since, long storedEntries, long droppedEntries,
    long unstoredEntries, int queueDepth, long walBytes) {
  /** Whether history is being kept. */
  public enum State {
    OK,
    NOT_KEEPING
  }

  public boolean ok() {
    return state == State.OK;
  }
}
