package org.plateward.plant;

import java.util.function.Consumer;
import java.util.function.LongConsumer;

/**
 * Drives a {@link SimulatedPlant} to the end of its scenario, handing each sample to a sink,
 * either as fast as possible or paced against the wall clock.
 */
public final class PlantRun {
  private PlantRun() {}

  /** What a run took. */
  public record Stats(long frames, double simulatedS, double wallS) {
    /** Simulated time over wall time. */
    public double speedUp() {
      return simulatedS / wallS;
    }
  }

  /**
   * Runs the plant.
   *
   * @param plant the plant, at its first frame
   * @param speed simulated seconds per wall second; {@code Double.POSITIVE_INFINITY} for as fast
   *     as possible
   * @param sink receives every sample, in order, on the calling thread
   * @param progress called with the frame count at every tenth of the run (may be null)
   * @throws InterruptedException when interrupted while pacing
   */
  public static Stats run(SimulatedPlant plant, double speed, Consumer<PlantSample> sink, LongConsumer progress)
      throws InterruptedException {
    long frames = plant.frames();
    long tenth = Math.max(1, frames / 10);
    long startNs = System.nanoTime();
    double lastT = 0.0;
    long done = 0;
    while (plant.hasNext()) {
      PlantSample s = plant.next();
      if (Double.isFinite(speed)) {
        long dueNs = startNs + Math.round(s.timeS() / speed * 1e9);
        long waitNs = dueNs - System.nanoTime();
        if (waitNs > 0) {
          Thread.sleep(waitNs / 1_000_000L, (int) (waitNs % 1_000_000L));
        }
      }
      sink.accept(s);
      lastT = s.timeS();
      done++;
      if (progress != null && done % tenth == 0) {
        progress.accept(done);
      }
    }
    return new Stats(done, lastT, (System.nanoTime() - startNs) / 1e9);
  }
}
