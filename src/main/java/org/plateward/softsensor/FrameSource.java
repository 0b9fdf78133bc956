package org.plateward.softsensor;

import java.io.IOException;
import java.util.Map;
import org.plateward.signals.Frame;

/**
 * Where frames come from: a replay file now, a live endpoint later. The soft sensor does not
 * care which; {@link EstimationLoop} drives either.
 */
public interface FrameSource extends AutoCloseable {
  /**
   * The next frame, in time order, or null at the end.
   *
   * @throws IOException when the source cannot be read
   */
  Frame next() throws IOException;

  /** Simulation-only truth of the last frame returned (column name → value); empty for plant data. */
  default Map<String, Double> truth() {
    return Map.of();
  }

  /** Frames read with some values missing because their row was short. */
  default long partialFrames() {
    return 0;
  }

  /** Where the last frame came from, for messages (e.g. {@code file:line}). */
  default String position() {
    return "";
  }

  @Override
  void close() throws IOException;
}
