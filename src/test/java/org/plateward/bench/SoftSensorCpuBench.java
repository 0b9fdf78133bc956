package org.plateward.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.plateward.config.UnitConfigLoader;
import org.plateward.estimation.FilterSettings;
import org.plateward.replay.ReplayFrameSource;
import org.plateward.signals.Frame;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.SoftSensorSettings;

/**
 * Replay throughput of the soft sensor by thread CPU time, which the load of a shared machine
 * inflates far less than wall-clock time: each committed recording, frames held in memory, one
 * warm-up pass and one measured pass on a fresh estimator. Prints CPU µs per frame and the
 * multiple of real time at 1 Hz on one core. Run:
 * {@code mvn -B -q test-compile exec:exec@bench -Dbench.main=org.plateward.bench.SoftSensorCpuBench}
 * or directly with the test classpath.
 */
public final class SoftSensorCpuBench {
  private SoftSensorCpuBench() {}

  public static void main(String[] args) throws Exception {
    var unit = UnitConfigLoader.load(Path.of(args.length > 0 ? args[0] : "config/plateward.toml"));
    ThreadMXBean mx = ManagementFactory.getThreadMXBean();
    System.out.printf(Locale.ROOT, "grid %d cells; load average %.1f%n", unit.grid().cells(),
        ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
    for (String rec : new String[] {"feed-drop", "fuel-surge", "analyzer-outage", "catalyst-ageing"}) {
      List<Frame> frames = new ArrayList<>();
      try (var src = ReplayFrameSource.open(Path.of("replay-data", rec + ".csv"))) {
        Frame f;
        while ((f = src.next()) != null) {
          frames.add(f);
        }
      }
      double spanS = frames.get(frames.size() - 1).time().getEpochSecond() - frames.get(0).time().getEpochSecond() + 1;
      for (int pass = 0; pass < 2; pass++) {
        ReactorSoftSensor s = new ReactorSoftSensor(unit, SoftSensorSettings.defaults(), FilterSettings.defaults());
        long cpu0 = mx.getCurrentThreadCpuTime();
        long wall0 = System.nanoTime();
        for (Frame f : frames) {
          s.accept(f);
        }
        double cpuS = (mx.getCurrentThreadCpuTime() - cpu0) * 1e-9;
        double wallS = (System.nanoTime() - wall0) * 1e-9;
        if (pass == 1) {
          System.out.printf(Locale.ROOT,
              "%-16s %6d frames: CPU %7.1f us/frame = %6.0f x real time (wall %6.0f x); Jacobian builds %d%n",
              rec, frames.size(), 1e6 * cpuS / frames.size(), spanS / cpuS, spanS / wallS, s.jacobianBuilds());
        }
      }
    }
  }
}
