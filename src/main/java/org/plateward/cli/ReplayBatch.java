package org.plateward.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.plateward.Advisory;
import org.plateward.estimation.FilterSettings;
import org.plateward.fleet.LaneState;
import org.plateward.fleet.LaneStatus;
import org.plateward.fleet.UnitLane;
import org.plateward.fleet.UnitPool;
import org.plateward.reactor.UnitSpec;
import org.plateward.replay.EstimateWriter;
import org.plateward.replay.ReplayFrameSource;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.SoftSensorSettings;
import org.plateward.softsensor.TwinScore;

/**
 * {@code plateward replay} with several inputs: one estimator per input, all on one {@link
 * UnitPool}; a summary line per input and the total throughput.
 */
final class ReplayBatch {
  /** Longest wait for one input, ms (a day: replay is bounded by its files). */
  private static final long WAIT_MS = 24L * 3600 * 1000;

  /**
   * One input.
   *
   * @param input the replay file
   * @param unitLabel the unit it is replayed as (for messages)
   * @param unit that unit's specification
   * @param out where its estimates go; null for none
   */
  record Job(Path input, String unitLabel, UnitSpec unit, Path out) {}

  private ReplayBatch() {}

  /**
   * Runs every job on a pool of {@code threads} and prints the summary.
   *
   * @return the exit code: 0 when every input finished, {@link PlatewardCommand#EXIT_BAD_INPUT}
   *     when any failed (the others still ran)
   */
  static int run(List<Job> jobs, int threads, PrintWriter out, PrintWriter err) throws IOException {
    List<ReactorSoftSensor> sensors = new ArrayList<>();
    List<TwinScore> scores = new ArrayList<>();
    List<EstimateWriter> writers = new ArrayList<>();
    List<UnitLane> lanes = new ArrayList<>();
    long t0 = System.nanoTime();
    long wallNs;
    try (UnitPool pool = new UnitPool(threads)) {
      for (Job j : jobs) {
        ReactorSoftSensor sensor = new ReactorSoftSensor(j.unit(), SoftSensorSettings.defaults(), FilterSettings.defaults());
        TwinScore score = new TwinScore(600.0);
        EstimateWriter w = j.out() == null ? null : EstimateWriter.create(j.out(), j.input().getFileName().toString());
        sensors.add(sensor);
        scores.add(score);
        writers.add(w);
        ReplayFrameSource src = ReplayFrameSource.open(j.input());
        lanes.add(pool.replay(j.input().toString(), src, sensor::accept, (f, e, truth) -> {
          if (w != null) {
            w.write(e);
          }
          if (!truth.isEmpty()) {
            score.add(f.time().getEpochSecond() + 1e-9 * f.time().getNano(), e, truth);
          }
        }));
      }
      for (UnitLane l : lanes) {
        try {
          l.await(WAIT_MS);
        } catch (InterruptedException e) {
          Thread.currentThread().interrupt();
          throw new IOException("interrupted while replaying", e);
        } catch (java.util.concurrent.TimeoutException e) {
          throw new IOException("replay of " + l.unitId() + " did not end within a day", e);
        }
      }
      wallNs = System.nanoTime() - t0;
    }

    out.println(Advisory.SHORT);
    long frames = 0;
    double spanS = 0;
    double cpuS = 0;
    int failed = 0;
    for (int i = 0; i < jobs.size(); i++) {
      Job j = jobs.get(i);
      LaneStatus s = lanes.get(i).status();
      EstimateWriter w = writers.get(i);
      if (w != null) {
        w.close();
      }
      frames += s.estimated();
      spanS += s.spanS();
      cpuS += s.cpuNanos() / 1e9;
      if (s.state() == LaneState.FAILED) {
        failed++;
        if (j.out() != null) {
          Files.deleteIfExists(j.out());
        }
        out.printf(Locale.ROOT, "%s (%s): FAILED after %d frames: %s; no estimates written%n",
            j.input(), j.unitLabel(), s.estimated(), s.reason());
        err.println("plateward replay: " + j.input() + ": " + s.reason());
        continue;
      }
      ReactorSoftSensor sensor = sensors.get(i);
      double cpu = s.cpuNanos() / 1e9;
      out.printf(Locale.ROOT, "%s (%s): %d frames (%.1f h of data), %.2f s CPU (%.0f x real time on one thread), "
              + "filter steps %d, drift flags %d%s%n",
          j.input(), j.unitLabel(), s.estimated(), s.spanS() / 3600.0, cpu,
          cpu > 0 ? s.spanS() / cpu : Double.POSITIVE_INFINITY, sensor.blocks(), sensor.driftFlags().size(),
          s.partialFrames() > 0 ? ", " + s.partialFrames() + " short rows" : "");
      TwinScore score = scores.get(i);
      if (score.hasTruth()) {
        out.printf(Locale.ROOT, "    peak plate temperature vs truth: RMSE %.1f K, largest error %.1f K, inside ±2σ %.0f %%%n",
            score.peakRmseK(), score.peakMaxErrorK(), 100 * score.coverage());
      }
      if (j.out() != null) {
        out.println("    estimates written to " + j.out());
      }
    }
    double wallS = wallNs / 1e9;
    out.printf(Locale.ROOT, "total: %d inputs%s, %d frames (%.1f h of data) in %.2f s on %d threads "
            + "(%.2f s CPU): %.0f x real time%n",
        jobs.size(), failed > 0 ? " (" + failed + " failed)" : "", frames, spanS / 3600.0, wallS, threads, cpuS,
        wallS > 0 ? spanS / wallS : Double.POSITIVE_INFINITY);
    out.flush();
    err.flush();
    return failed > 0 ? PlatewardCommand.EXIT_BAD_INPUT : 0;
  }
}
