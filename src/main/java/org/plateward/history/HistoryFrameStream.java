package org.plateward.history;

import java.util.ArrayDeque;
import java.util.Iterator;
import java.util.NoSuchElementException;
import org.plateward.signals.Frame;
import org.plateward.signals.Signal;

/**
 * Frames of a history range in time order, read a page at a time (keyset pagination on
 * {@code time_ms}, one short query per page), so a day of history is never held in memory and
 * no read transaction stays open between pages. A read failure surfaces as an
 * {@link IllegalStateException} whose cause is the {@link HistoryException}.
 */
public final class HistoryFrameStream implements Iterator<Frame>, AutoCloseable {
  /** Rows per page: about 1000 frames of all signals. */
  static final int PAGE_ROWS = 1000 * Signal.COUNT;

  private final HistoryReader reader;
  private final long toMs;
  private final ArrayDeque<Frame> page = new ArrayDeque<>();
  private long afterMs;
  private boolean exhausted;

  HistoryFrameStream(HistoryReader reader, long fromMs, long toMs) {
    this.reader = reader;
    this.toMs = toMs;
    this.afterMs = fromMs - 1;
  }

  @Override
  public boolean hasNext() {
    if (page.isEmpty() && !exhausted) {
      try {
        var frames = reader.page(afterMs, toMs, PAGE_ROWS);
        if (frames.isEmpty()) {
          exhausted = true;
        } else {
          page.addAll(frames);
          afterMs = frames.get(frames.size() - 1).time().toEpochMilli();
        }
      } catch (HistoryException e) {
        throw new IllegalStateException(e.getMessage(), e);
      }
    }
    return !page.isEmpty();
  }

  @Override
  public Frame next() {
    if (!hasNext()) {
      throw new NoSuchElementException();
    }
    return page.poll();
  }

  @Override
  public void close() {
    exhausted = true;
    page.clear();
  }
}
