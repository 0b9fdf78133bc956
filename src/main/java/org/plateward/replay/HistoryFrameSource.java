package org.plateward.replay;

import java.io.IOException;
import java.time.Instant;
import org.plateward.history.HistoryException;
import org.plateward.history.HistoryFrameStream;
import org.plateward.history.HistoryReader;
import org.plateward.signals.Frame;
import org.plateward.softsensor.FrameSource;

/**
 * Frames of a period of history, for the same estimator path a replay file takes ({@code
 * plateward replay --db}). Read page by page; history has no truth columns.
 */
public final class HistoryFrameSource implements FrameSource {
  private final HistoryReader reader;
  private final HistoryFrameStream stream;
  private final String file;
  private Instant last;

  private HistoryFrameSource(HistoryReader reader, HistoryFrameStream stream, String file) {
    this.reader = reader;
    this.stream = stream;
    this.file = file;
  }

  /**
   * Opens a history file read-only over [from, to).
   *
   * @throws HistoryException when the file is absent, damaged or not a history
   */
  public static HistoryFrameSource open(java.nio.file.Path file, Instant from, Instant to) throws HistoryException {
    HistoryReader r = HistoryReader.open(file);
    return new HistoryFrameSource(r, r.frameStream(from, to), file.toString());
  }

  @Override
  public Frame next() throws IOException {
    try {
      if (!stream.hasNext()) {
        return null;
      }
      Frame f = stream.next();
      last = f.time();
      return f;
    } catch (IllegalStateException e) {
      throw new IOException(e.getMessage(), e.getCause() == null ? e : e.getCause());
    }
  }

  @Override
  public String position() {
    return file + (last == null ? "" : " at " + last);
  }

  @Override
  public void close() {
    stream.close();
    reader.close();
  }
}
