package org.plateward.replay;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Map;
import org.plateward.signals.Frame;
import org.plateward.softsensor.FrameSource;

/** A replay file as a {@link FrameSource}; format errors surface as {@link ReplayFormatException}. */
public final class ReplayFrameSource implements FrameSource {
  private final ReplayReader reader;
  private final String file;
  private ReplayRecord last;

  private ReplayFrameSource(ReplayReader reader, String file) {
    this.reader = reader;
    this.file = file;
  }

  /** Opens a replay file and checks its header. */
  public static ReplayFrameSource open(Path file) throws IOException {
    return new ReplayFrameSource(ReplayReader.open(file), file.toString());
  }

  /** The file's header (metadata, comments, columns). */
  public ReplayHeader header() {
    return reader.header();
  }

  @Override
  public Frame next() {
    if (!reader.hasNext()) {
      last = null;
      return null;
    }
    last = reader.next();
    return last.frame();
  }

  @Override
  public Map<String, Double> truth() {
    return last == null ? Map.of() : last.truth();
  }

  @Override
  public long partialFrames() {
    return reader.partialRowCount();
  }

  @Override
  public String position() {
    return last == null ? file : file + ":" + last.line();
  }

  @Override
  public void close() throws IOException {
    reader.close();
  }
}
