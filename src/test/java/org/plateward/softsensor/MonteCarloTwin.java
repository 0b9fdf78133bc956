package org.plateward.softsensor;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.plateward.config.ScenarioLoader;
import org.plateward.config.UnitConfigLoader;
import org.plateward.estimation.FilterSettings;
import org.plateward.plant.PlantRecorder;
import org.plateward.plant.PlantRun;
import org.plateward.plant.Scenario;
import org.plateward.plant.SimulatedPlant;
import org.plateward.reactor.UnitSpec;
import org.plateward.replay.ReplayFrameSource;

/**
 * Twin experiments over an ensemble of plant seeds (the Monte Carlo consistency test of
 * Bar-Shalom, Li and Kirubarajan 2001, §5.4): one scenario, its events unchanged, run with M
 * seeds, so each run draws its own meter noise and its own accuracy-class meter errors.
 *
 * <p>Why: a meter's systematic error is one draw per run and the peak error follows it for
 * the whole run, so one run's time-averaged NEES is close to a single χ²(1) sample, not the
 * mean of thousands; whether σ is honest shows over runs. The ensemble mean of the per-run
 * mean NEES is compared with the χ²(M)/M band (each run counted as one independent sample:
 * the widest band, right when the error is one constant per run).
 *
 * <p>Study use: {@code java ... org.plateward.softsensor.MonteCarloTwin SCENARIO.toml M}, with
 * {@code -Dconfig=FILE} another unit configuration (a grid study), {@code -DfirstSeed=N}
 * (default 7001), and {@code -DperfectMeters=true} the same plant with no systematic meter
 * errors (what perfect calibration alone would buy); {@code -Dss.X=v} and {@code -Dfs.X=v} override
 * tuning as in {@code bench.TwinSweep}; {@code -Dkeep=DIR} keeps each run's recording
 * there (for {@code TwinSweep -Ddata=DIR}).
 */
final class MonteCarloTwin {
  /** One run's figures after the start-up. */
  record Run(long seed, double meanNees, double coverage, double peakRmseK, double peakBiasK, double maxCellMeltError,
      double exhaustWithin10Pct, long exhaustFrames, double exhaustMedianRelError) {}

  /** The ensemble's runs. */
  record Ensemble(List<Run> runs) {
    /** Mean of one figure over the runs. */
    double mean(java.util.function.ToDoubleFunction<Run> figure) {
      return runs.stream().mapToDouble(figure).average().orElse(Double.NaN);
    }

    double meanNees() {
      return mean(Run::meanNees);
    }

    double meanCoverage() {
      return mean(Run::coverage);
    }

    /** 95 % band of the ensemble mean NEES, one χ²(1) sample per run. */
    double[] neesBand() {
      ChiSquaredDistribution c = new ChiSquaredDistribution(runs.size());
      return new double[] {c.inverseCumulativeProbability(0.025) / runs.size(),
        c.inverseCumulativeProbability(0.975) / runs.size()};
    }
  }

  private MonteCarloTwin() {}

  /**
   * Runs the scenario with seeds {@code firstSeed .. firstSeed + m - 1}, two at a time,
   * recording each into {@code dir}.
   */
  static Ensemble run(UnitSpec unit, Scenario scenario, long firstSeed, int m, Path dir) throws Exception {
    ExecutorService pool = Executors.newFixedThreadPool(2);
    try {
      List<Future<Run>> out = new ArrayList<>();
      for (int k = 0; k < m; k++) {
        long seed = firstSeed + k;
        out.add(pool.submit(() -> one(unit, scenario.withSeed(seed), dir)));
      }
      List<Run> runs = new ArrayList<>();
      for (Future<Run> f : out) {
        runs.add(f.get());
      }
      return new Ensemble(runs);
    } finally {
      pool.shutdownNow();
    }
  }

  private static Run one(UnitSpec unit, Scenario s, Path dir) throws Exception {
    SimulatedPlant plant = new SimulatedPlant(unit, s);
    PlantRecorder recorder = new PlantRecorder();
    PlantRun.run(plant, Double.POSITIVE_INFINITY, recorder.sink(), null);
    Path file = dir.resolve(s.name() + "-seed" + s.seed() + ".csv");
    recorder.write(file, s, s.name() + ".toml", unit.name());
    ReactorSoftSensor sensor = new ReactorSoftSensor(unit,
        org.plateward.bench.TwinSweep.override(SoftSensorSettings.defaults(), "ss."),
        org.plateward.bench.TwinSweep.override(FilterSettings.defaults(), "fs."));
    TwinScore score = new TwinScore(600.0);
    try (var src = ReplayFrameSource.open(file)) {
      EstimationLoop.run(src, sensor, (f, e, truth) -> score.add(f.time().getEpochSecond(), e, truth), null);
    }
    if (System.getProperty("keep") == null) {
      Files.deleteIfExists(file);
    } else {
      Files.move(file, Path.of(System.getProperty("keep")).resolve(file.getFileName()),
          java.nio.file.StandardCopyOption.REPLACE_EXISTING);
    }
    return new Run(s.seed(), score.meanNees(), score.coverage(), score.peakRmseK(), score.peakBiasK(), score.maxCellMeltError(),
        score.exhaustWithin10Pct(), score.exhaustFrames(), score.exhaustMedianSignedRelError());
  }

  public static void main(String[] args) throws Exception {
    UnitSpec unit = UnitConfigLoader.load(Path.of(System.getProperty("config", "config/plateward.toml")));
    Scenario scenario = ScenarioLoader.load(Path.of(args[0]));
    if (Boolean.getBoolean("perfectMeters")) { // study: the same plant with calibrated meters
      scenario = scenario.withSensors(scenario.sensors().withoutSystematicErrors());
    }
    int m = args.length > 1 ? Integer.parseInt(args[1]) : 8;
    Path dir = Files.createTempDirectory("plateward-mc");
    Ensemble e = run(unit, scenario, Long.getLong("firstSeed", 7001), m, dir);
    for (Run r : e.runs()) {
      System.out.printf(Locale.ROOT, "seed %d: mean NEES %.2f, 2-sigma coverage %.1f %%, peak RMSE %.2f K (bias %+.2f K),"
          + " max-cell melt error %.2f, time-to-exhaust within 10 %% in %.0f %% of %d frames (median error %+.0f %%)%n",
          r.seed(), r.meanNees(), 100 * r.coverage(), r.peakRmseK(), r.peakBiasK(), r.maxCellMeltError(),
          100 * r.exhaustWithin10Pct(), r.exhaustFrames(), 100 * r.exhaustMedianRelError());
    }
    double[] band = e.neesBand();
    System.out.printf(Locale.ROOT, "%s, %d seeds: ensemble mean NEES %.2f, 95%% band [%.2f, %.2f]; mean 2-sigma coverage %.1f %%%n",
        scenario.name(), m, e.meanNees(), band[0], band[1], 100 * e.meanCoverage());
    System.out.printf(Locale.ROOT, "  mean peak RMSE %.2f K, mean bias %+.2f K; max-cell melt error mean %.2f, within 0.2 in %d of %d seeds%n",
        e.mean(Run::peakRmseK), e.mean(Run::peakBiasK), e.mean(Run::maxCellMeltError),
        e.runs().stream().filter(r -> r.maxCellMeltError() <= 0.2).count(), m);
    Files.deleteIfExists(dir);
  }
}
