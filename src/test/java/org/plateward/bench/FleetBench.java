package org.plateward.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.plateward.config.UnitConfigLoader;
import org.plateward.estimation.FilterSettings;
import org.plateward.fleet.LaneStatus;
import org.plateward.fleet.UnitLane;
import org.plateward.fleet.UnitPool;
import org.plateward.reactor.GridSpec;
import org.plateward.reactor.UnitSpec;
import org.plateward.replay.ReplayFrameSource;
import org.plateward.signals.Frame;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.SoftSensorSettings;

/**
 * How many units at 1 Hz, N = 30, one process keeps up with in real time, and the heap each
 * unit holds. Not JMH: the figures are CPU time per second of plant time (thread CPU time,
 * summed over each unit's lane, so other work on a shared machine does not inflate them) and
 * heap after GC, which JMH does not report.
 *
 * <p>K units (default 500), each its own {@link ReactorSoftSensor} on the 30-cell uniform grid
 * and its own stretch of replay-data/fuel-surge.csv (unit k starts 2 k rows in, frames held in
 * memory), all fed one frame per plant second in turn through {@link UnitLane#put} on one
 * {@link UnitPool} (one thread per processor). A warm-up of W plant seconds (default 120) runs
 * first; then heap after GC is taken, and then T plant seconds (default 300) are measured.
 *
 * <pre>
 * mvn -o -B -q test-compile
 * java -cp target/classes:target/test-classes:$(cat target/cp.txt) org.plateward.bench.FleetBench [K] [T] [W]
 * </pre>
 * ({@code target/cp.txt} from {@code mvn -o -q dependency:build-classpath -Dmdep.outputFile=target/cp.txt}).
 *
 * <p>Measured on the 2-core development machine, K = 500, T = 300 s, W = 120 s, load average
 * 14–15 from other work during the run: 89 µs CPU per unit per plant second (so about 22,000
 * units by CPU on 2 processors); 150,000 unit-seconds in 37 s of wall time, i.e. about 4,000
 * units kept in real time at that load; 403 kB of heap per unit after GC; estimator
 * construction 1 ms per unit; no frame dropped, no unit failed.
 */
public final class FleetBench {
  private FleetBench() {}

  public static void main(String[] args) throws Exception {
    int units = args.length > 0 ? Integer.parseInt(args[0]) : 500;
    int plantS = args.length > 1 ? Integer.parseInt(args[1]) : 300;
    int warmS = args.length > 2 ? Integer.parseInt(args[2]) : 120;
    UnitSpec unit = UnitConfigLoader.load(Path.of("config/plateward.toml")).withGrid(GridSpec.uniform(30));
    List<Frame> frames = new ArrayList<>();
    try (ReplayFrameSource src = ReplayFrameSource.open(Path.of("replay-data", "fuel-surge.csv"))) {
      Frame f;
      while ((f = src.next()) != null) {
        frames.add(f);
      }
    }
    // unit k starts 2 k rows in: every start lies in the steady first 20 min of the recording
    // (a start inside the fuel surge can leave the estimator's steady-state start unsolved)
    int stride = 2;
    if ((long) stride * (units - 1) + warmS + plantS > frames.size()) {
      stride = Math.max(0, (frames.size() - warmS - plantS) / Math.max(1, units - 1));
    }
    MemoryMXBean mem = ManagementFactory.getMemoryMXBean();
    long heap0 = heapAfterGc(mem);
    String load0 = loadAverage();
    List<ReactorSoftSensor> sensors = new ArrayList<>();
    long c0 = System.nanoTime();
    for (int k = 0; k < units; k++) {
      sensors.add(new ReactorSoftSensor(unit, SoftSensorSettings.defaults(), FilterSettings.defaults()));
    }
    double buildS = (System.nanoTime() - c0) / 1e9;
    try (UnitPool pool = new UnitPool()) {
      List<UnitLane> lanes = new ArrayList<>();
      for (int k = 0; k < units; k++) {
        lanes.add(pool.feed("u" + k, sensors.get(k)::accept, 64, null));
      }
      feed(lanes, frames, stride, 0, warmS);
      waitIdle(lanes);
      long heap1 = heapAfterGc(mem);
      long[] cpuBefore = new long[units];
      for (int k = 0; k < units; k++) {
        cpuBefore[k] = lanes.get(k).status().cpuNanos();
      }
      long w0 = System.nanoTime();
      feed(lanes, frames, stride, warmS, plantS);
      for (UnitLane l : lanes) {
        l.endFeed();
      }
      long cpu = 0;
      long dropped = 0;
      int failed = 0;
      for (int k = 0; k < units; k++) {
        LaneStatus s = lanes.get(k).await(600_000);
        if (s.estimated() != warmS + plantS) {
          failed++;
          System.out.println("unit u" + k + " did not run through: " + s.reason());
        }
        cpu += s.cpuNanos() - cpuBefore[k];
        dropped += s.dropped();
      }
      double wallS = (System.nanoTime() - w0) / 1e9;
      String load1 = loadAverage();
      double cpuPerUnitS = cpu / 1e9 / ((double) units * plantS);
      int cores = Runtime.getRuntime().availableProcessors();
      System.out.printf(Locale.ROOT, "units %d, N = 30, 1 Hz, %d plant s measured after %d s warm-up, pool %d threads on %d processors%n",
          units, plantS, warmS, pool.threads(), cores);
      System.out.printf(Locale.ROOT, "estimator construction: %.1f ms per unit%n", 1e3 * buildS / units);
      System.out.printf(Locale.ROOT, "CPU per unit per plant second: %.1f us (%.1f us per frame); frames dropped %d; units failed %d%n",
          1e6 * cpuPerUnitS, 1e6 * cpuPerUnitS, dropped, failed);
      System.out.printf(Locale.ROOT, "units kept in real time by CPU: %.0f (%d processors / CPU per unit-second)%n",
          cores / cpuPerUnitS, cores);
      System.out.printf(Locale.ROOT, "wall: %.2f s for %d unit-seconds: %.0f units in real time at the load during the run%n",
          wallS, (long) units * plantS, units * plantS / wallS);
      System.out.printf(Locale.ROOT, "heap after GC: %.1f MB without the units, %.1f MB with them: %.1f kB per unit%n",
          heap0 / 1e6, heap1 / 1e6, (heap1 - heap0) / 1e3 / units);
      System.out.println("load average before: " + load0 + "; after: " + load1);
    }
  }

  private static void feed(List<UnitLane> lanes, List<Frame> frames, int stride, int fromS, int seconds)
      throws InterruptedException {
    for (int t = fromS; t < fromS + seconds; t++) {
      for (int k = 0; k < lanes.size(); k++) {
        lanes.get(k).put(frames.get(k * stride + t));
      }
    }
  }

  private static void waitIdle(List<UnitLane> lanes) throws InterruptedException {
    for (UnitLane l : lanes) {
      while (l.status().queued() > 0) {
        Thread.sleep(5);
      }
    }
    Thread.sleep(50);
  }

  private static long heapAfterGc(MemoryMXBean mem) throws InterruptedException {
    long best = Long.MAX_VALUE;
    for (int i = 0; i < 4; i++) {
      System.gc();
      Thread.sleep(100);
      best = Math.min(best, mem.getHeapMemoryUsage().getUsed());
    }
    return best;
  }

  private static String loadAverage() {
    try {
      return Files.readString(Path.of("/proc/loadavg")).trim();
    } catch (Exception e) {
      return "unknown";
    }
  }
}
