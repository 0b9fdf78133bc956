package org.plateward.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.plateward.Advisory;
import org.plateward.config.PlatewardConfig;
import org.plateward.estimation.FilterSettings;
import org.plateward.replay.EstimateWriter;
import org.plateward.replay.ReplayFormatException;
import org.plateward.replay.ReplayFrameSource;
import org.plateward.softsensor.EstimationLoop;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.SoftSensorSettings;
import org.plateward.softsensor.TwinScore;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code plateward replay}: runs the soft sensor over a replay file, optionally writing the
 * estimates; prints throughput and, for simulated recordings, the accuracy against the truth.
 */
@Command(
    name = "replay",
    mixinStandardHelpOptions = true,
    description = "Run the estimator over a recorded period (a replay file) and summarise it.")
public final class ReplayCommand implements Callable<Integer> {
  @CommandLine.Mixin ConfigOption config;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Option(names = "--input", required = true, paramLabel = "F.csv", description = "Replay file to run.")
  Path input;

  @Option(names = "--out", paramLabel = "estimates.csv", description = "Write one estimate per frame here.")
  Path out;

  @Option(names = "--no-progress", description = "Do not draw the progress bar on stderr.")
  boolean noProgress;

  @Override
  public Integer call() throws Exception {
    PlatewardConfig cfg = config.load();
    if (!Files.isReadable(input)) {
      throw new ReplayFormatException(input.toString(), 0, "--input", "no such file or not readable");
    }
    long totalLines = noProgress ? 0 : countLines(input);
    PrintWriter err = spec.commandLine().getErr();
    PrintWriter outText = spec.commandLine().getOut();
    ReactorSoftSensor sensor = new ReactorSoftSensor(cfg.unit(), SoftSensorSettings.defaults(), FilterSettings.defaults());
    TwinScore score = new TwinScore(600.0);
    EstimationLoop.Stats stats;
    try (ReplayFrameSource src = ReplayFrameSource.open(input)) {
      checkUnit(src, cfg);
      EstimateWriter w = out == null ? null : EstimateWriter.create(out, input.getFileName().toString());
      try {
        stats = EstimationLoop.run(src, sensor, (f, e, truth) -> {
          if (w != null) {
            w.write(e);
          }
          if (!truth.isEmpty()) {
            score.add(f.time().getEpochSecond() + 1e-9 * f.time().getNano(), e, truth);
          }
        }, totalLines > 0 ? n -> progress(err, n, totalLines) : null);
      } finally {
        if (w != null) {
          w.close();
        }
      }
    }
    if (totalLines > 0) {
      progress(err, totalLines, totalLines);
      err.println();
      err.flush();
    }
    outText.println(Advisory.SHORT);
    outText.printf(Locale.ROOT, "replayed %d frames (%.1f h of data) in %.2f s: %.0f x real time%n",
        stats.frames(), stats.spanS() / 3600.0, stats.wallS(), stats.timesRealTime());
    if (stats.partialFrames() > 0) {
      outText.printf(Locale.ROOT, "%d short rows read with their missing cells as missing values%n", stats.partialFrames());
    }
    outText.printf(Locale.ROOT, "filter steps %d, model Jacobian builds %d, analyzer results not placed %d, drift flags %d%n",
        sensor.blocks(), sensor.jacobianBuilds(), sensor.droppedAnalyzerResults(), sensor.driftFlags().size());
    if (score.hasTruth()) {
      outText.print(score.summary());
    }
    if (out != null) {
      outText.println("estimates written to " + out);
    }
    outText.flush();
    return 0;
  }

  /** The recording's {@code unit=} metadata must name the configured unit when present. */
  private static void checkUnit(ReplayFrameSource src, PlatewardConfig cfg) {
    String unit = src.header().metadata().get("unit");
    if (unit != null && !unit.equals(cfg.unit().name().replaceAll("[\\s=]+", "_"))) {
      int line = 1;
      for (String c : src.header().comments()) {
        if (c.contains("unit=" + unit)) {
          break;
        }
        line++;
      }
      throw new ReplayFormatException(src.position(), line, "unit",
          "recording is of unit '" + unit + "' but the configuration (" + cfg.file() + ") describes '" + cfg.unit().name() + "'");
    }
  }

  private static long countLines(Path p) throws java.io.IOException {
    try (var lines = Files.lines(p)) {
      return lines.count();
    }
  }

  private static void progress(PrintWriter err, long n, long total) {
    int width = 40;
    double f = Math.min(1.0, (double) n / total);
    int fill = (int) Math.round(f * width);
    err.print("\r[" + "#".repeat(fill) + " ".repeat(width - fill) + String.format(Locale.ROOT, "] %3.0f %%", 100 * f));
    err.flush();
  }
}
