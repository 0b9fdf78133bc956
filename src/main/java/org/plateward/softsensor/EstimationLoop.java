package org.plateward.softsensor;

import java.io.IOException;
import java.util.Map;
import java.util.function.LongConsumer;
import org.plateward.signals.Frame;

/**
 * Drives frames from a {@link FrameSource} through a {@link ReactorSoftSensor} and hands each
 * estimate (with the frame's truth, if any) to a sink. The same loop serves replay and live data.
 */
public final class EstimationLoop {
  /** Receives every estimate in order. */
  @FunctionalInterface
  public interface Sink {
    void accept(Frame frame, Estimate estimate, Map<String, Double> truth) throws IOException;
  }

  /** What a run took. */
  public record Stats(long frames, double spanS, double wallS, long partialFrames) {
    /** Data time over wall time. */
    public double timesRealTime() {
      return wallS > 0 ? spanS / wallS : Double.POSITIVE_INFINITY;
    }
  }

  private EstimationLoop() {}

  /**
   * Runs until the source ends.
   *
   * @param progress called with the frame count every 1,000 frames (may be null)
   */
  public static Stats run(FrameSource source, ReactorSoftSensor sensor, Sink sink, LongConsumer progress)
      throws IOException {
    long start = System.nanoTime();
    long frames = 0;
    double first = Double.NaN;
    double lastT = Double.NaN;
    Frame f;
    while ((f = source.next()) != null) {
      Estimate e = sensor.accept(f);
      double t = f.time().getEpochSecond() + 1e-9 * f.time().getNano();
      if (Double.isNaN(first)) {
        first = t;
      }
      lastT = t;
      if (sink != null) {
        sink.accept(f, e, source.truth());
      }
      frames++;
      if (progress != null && frames % 1000 == 0) {
        progress.accept(frames);
      }
    }
    double span = frames > 1 ? lastT - first + (lastT - first) / (frames - 1) : 0.0;
    return new Stats(frames, span, (System.nanoTime() - start) / 1e9, source.partialFrames());
  }
}
