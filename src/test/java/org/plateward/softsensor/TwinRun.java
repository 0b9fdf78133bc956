package org.plateward.softsensor;

import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.plateward.config.UnitConfigLoader;
import org.plateward.estimation.FilterSettings;
import org.plateward.replay.ReplayFrameSource;

/**
 * One soft-sensor run over a committed recording of the simulated plant, kept for every test
 * that looks at it (each recording is run once per JVM).
 */
final class TwinRun {
  /** One frame of a run: time from the first frame, the estimate and the truth. */
  record Row(double tS, Estimate estimate, Map<String, Double> truth) {}

  private static final Map<String, TwinRun> RUNS = new ConcurrentHashMap<>();

  final String name;
  final List<Row> rows = new ArrayList<>();
  final TwinScore score = new TwinScore(600.0);
  final EstimationLoop.Stats stats;
  final List<org.plateward.estimation.DriftAlarm> drift;
  final Instant start;

  private TwinRun(String name) throws Exception {
    this.name = name;
    var unit = UnitConfigLoader.load(Path.of("config/plateward.toml"));
    var sensor = new ReactorSoftSensor(unit, SoftSensorSettings.defaults(), FilterSettings.defaults());
    Instant[] first = new Instant[1];
    try (var src = ReplayFrameSource.open(Path.of("replay-data", name + ".csv"))) {
      stats = EstimationLoop.run(src, sensor, (f, e, truth) -> {
        if (first[0] == null) {
          first[0] = f.time();
        }
        double t = f.time().getEpochSecond() - first[0].getEpochSecond();
        rows.add(new Row(t, e, Map.copyOf(truth)));
        score.add(f.time().getEpochSecond(), e, truth);
      }, null);
    }
    start = first[0];
    drift = sensor.driftFlags();
    System.out.printf("== %s: %d frames, %.0f x real time (load average %s)%n%s", name, stats.frames(),
        stats.timesRealTime(), loadAverage(), score.summary());
  }

  static TwinRun of(String name) {
    return RUNS.computeIfAbsent(name, n -> {
      try {
        return new TwinRun(n);
      } catch (Exception e) {
        throw new IllegalStateException("run over replay-data/" + n + ".csv failed: " + e.getMessage(), e);
      }
    });
  }

  /** The row at (or just after) time t from the start. */
  Row at(double tS) {
    for (Row r : rows) {
      if (r.tS >= tS - 1e-9) {
        return r;
      }
    }
    return rows.get(rows.size() - 1);
  }

  static String loadAverage() {
    try {
      return java.nio.file.Files.readString(Path.of("/proc/loadavg")).split(" ")[0];
    } catch (Exception e) {
      return "n/a";
    }
  }
}
