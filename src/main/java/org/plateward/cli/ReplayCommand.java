package org.plateward.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.plateward.Advisory;
import org.plateward.config.FleetConfig;
import org.plateward.config.PlatewardConfig;
import org.plateward.config.Spelling;
import org.plateward.estimation.FilterSettings;
import java.time.Instant;
import org.plateward.replay.EstimateWriter;
import org.plateward.replay.HistoryFrameSource;
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
    description = {"Run the estimator over a recorded period (a replay file, or a period of history)"
        + " and summarise it.", "Either --input F.csv (repeat it for several inputs at once), or --db F --from T1 --to T2 (ISO 8601 times with zone)."})
public final class ReplayCommand implements Callable<Integer> {
  @CommandLine.Mixin ConfigOption config;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Option(names = "--input", paramLabel = "F.csv",
      description = {"Replay file to run; repeat for several inputs, run at once on a pool of estimator threads.",
          "With a configuration that lists several units, write ID=F.csv (the unit the file is replayed as)."})
  List<String> inputs;

  @Option(names = "--out-dir", paramLabel = "DIR",
      description = "With one or more inputs: write each input's estimates to DIR/<input name>.estimates.csv.")
  Path outDir;

  @Option(names = "--threads", paramLabel = "N",
      description = "Estimator threads for several inputs (default: the available processors).")
  Integer threads;

  @Option(names = "--db", paramLabel = "F", description = "History database to replay a period of.")
  Path db;

  @Option(names = "--from", paramLabel = "T1", description = "Start of the period (with --db), e.g. 2031-03-05T14:00:00Z.")
  String from;

  @Option(names = "--to", paramLabel = "T2", description = "End of the period (with --db, exclusive).")
  String to;

  @Option(names = "--out", paramLabel = "estimates.csv", description = "Write one estimate per frame here.")
  Path out;

  @Option(names = "--advice",
      description = "Also ask the fuel-trim advisor, as live (every forecast_every of plant time); slower, each question costs a few forecasts.")
  boolean advice;

  @Option(names = "--no-progress", description = "Do not draw the progress bar on stderr.")
  boolean noProgress;

  @Option(names = "--ui", description = "Show the recording in the window, with play, pause, speed, scrub and jump to the next alarm.")
  boolean ui;

  @Option(names = "--audit-db", paramLabel = "F",
      description = "With --ui: history file that keeps the alarm audit of the replay (operator actions included); default: not kept.")
  Path auditDb;

  @Option(names = "--screenshot", paramLabel = "DIR",
      description = "With --ui: save one PNG per view into DIR, then close the window.")
  Path screenshotDir;

  @Option(names = "--screenshot-at", paramLabel = "D", defaultValue = "30 min",
      description = "With --screenshot: how far into the recording to take them (default: ${DEFAULT-VALUE}).")
  String screenshotAt;

  @Override
  public Integer call() throws Exception {
    if ((inputs == null) == (db == null)) {
      throw new CommandLine.ParameterException(spec.commandLine(),
          "give either --input F.csv or --db F --from T1 --to T2");
    }
    if (!ui && (auditDb != null || screenshotDir != null)) {
      throw new CommandLine.ParameterException(spec.commandLine(), "--audit-db and --screenshot go with --ui");
    }
    if (ui) {
      String problem = org.plateward.ui.WindowLauncher.displayProblem();
      if (problem == null) {
        return replayWindow();
      }
      spec.commandLine().getErr().println("plateward replay: --ui: " + problem + "; replaying on the console instead.");
      spec.commandLine().getErr().flush();
    }
    if (db != null) {
      return replayHistory();
    }
    if (from != null || to != null) {
      throw new CommandLine.ParameterException(spec.commandLine(), "--from and --to go with --db");
    }
    if (inputs.size() > 1 || outDir != null || threads != null || listsUnits()) {
      return replayMany();
    }
    Path input = Path.of(inputs.get(0));
    PlatewardConfig cfg = config.load();
    if (!Files.isReadable(input)) {
      throw new ReplayFormatException(input.toString(), 0, "--input", "no such file or not readable");
    }
    long totalLines = noProgress ? 0 : countLines(input);
    PrintWriter err = spec.commandLine().getErr();
    PrintWriter outText = spec.commandLine().getOut();
    ReactorSoftSensor sensor = new ReactorSoftSensor(cfg.unit(), SoftSensorSettings.defaults(), FilterSettings.defaults());
    TwinScore score = new TwinScore(600.0);
    ReplayAdvisories advisories = ReplayAdvisories.of(cfg.unit(), sensor, cfg.alarms(), cfg.advisor(), advice);
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
          if (advisories != null) {
            advisories.add(f, e, sensor);
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
    printAdvisories(outText, advisories);
    if (out != null) {
      outText.println("estimates written to " + out);
    }
    outText.flush();
    return 0;
  }

  private static void printAdvisories(PrintWriter out, ReplayAdvisories advisories) {
    if (advisories == null) {
      out.println("no [alarms] in the configuration: no advisory alarms judged");
    } else {
      advisories.print(out);
    }
  }

  /** Whether the configuration file is a fleet file ({@code [[units]]}). */
  private boolean listsUnits() throws Exception {
    Path f = config.file();
    if (!Files.isRegularFile(f)) {
      return false; // config.load() reports it
    }
    return FleetConfig.load(f).listsUnits();
  }

  /** Several inputs (or {@code --out-dir}): one estimator per input on the unit pool. */
  private int replayMany() throws Exception {
    if (out != null) {
      throw new CommandLine.ParameterException(spec.commandLine(),
          "--out names one file; with several inputs (or --out-dir) give --out-dir DIR");
    }
    if (advice) {
      throw new CommandLine.ParameterException(spec.commandLine(),
          "--advice goes with one --input or with --db (several inputs are replayed for their estimates only)");
    }
    int n = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
    if (n < 1) {
      throw new CommandLine.ParameterException(spec.commandLine(), "--threads must be at least 1, got " + n);
    }
    if (!Files.isRegularFile(config.file())) {
      config.load(); // its message for a missing file
    }
    FleetConfig fleet = FleetConfig.load(config.file());
    List<ReplayBatch.Job> jobs = new ArrayList<>();
    java.util.Set<Path> seenOut = new java.util.HashSet<>();
    java.util.Set<Path> seenIn = new java.util.HashSet<>();
    for (String text : inputs) {
      FleetConfig.FleetUnit unit;
      Path input;
      if (fleet.listsUnits()) {
        int eq = text.indexOf('=');
        if (eq <= 0) {
          throw new CommandLine.ParameterException(spec.commandLine(), "--input " + text + ": "
              + config.file() + " lists several units; write --input ID=F.csv with ID one of " + fleet.ids());
        }
        String id = text.substring(0, eq);
        unit = fleet.unit(id);
        if (unit == null) {
          String near = Spelling.closest(id, fleet.ids());
          throw new CommandLine.ParameterException(spec.commandLine(), "--input " + text + ": no unit '" + id
              + "' in " + config.file() + (near != null ? "; did you mean '" + near + "'?" : " (units: " + fleet.ids() + ")"));
        }
        input = Path.of(text.substring(eq + 1));
      } else {
        unit = fleet.units().get(0);
        input = Path.of(text);
      }
      if (!Files.isReadable(input)) {
        throw new ReplayFormatException(input.toString(), 0, "--input", "no such file or not readable");
      }
      if (!seenIn.add(input.toAbsolutePath().normalize())) {
        throw new CommandLine.ParameterException(spec.commandLine(), "--input " + input + " is given twice");
      }
      try (ReplayFrameSource src = ReplayFrameSource.open(input)) {
        checkUnit(src, unit.unit(), unit.config().file());
      }
      Path o = null;
      if (outDir != null) {
        String name = input.getFileName().toString().replaceFirst("\\.csv$", "") + ".estimates.csv";
        o = outDir.resolve(name);
        if (!seenOut.add(o)) {
          throw new CommandLine.ParameterException(spec.commandLine(), "two inputs are named "
              + input.getFileName() + "; their estimates would both go to " + o);
        }
      }
      jobs.add(new ReplayBatch.Job(input, unit.id(), unit.unit(), o));
    }
    if (outDir != null) {
      Files.createDirectories(outDir);
    }
    return ReplayBatch.run(jobs, n, spec.commandLine().getOut(), spec.commandLine().getErr());
  }

  /** {@code --db F --from T1 --to T2}: a period of history through the same estimator path. */
  private int replayHistory() throws Exception {
    if (from == null || to == null) {
      throw new CommandLine.ParameterException(spec.commandLine(), "--db needs --from T1 and --to T2");
    }
    Instant t1 = instant("--from", from);
    Instant t2 = instant("--to", to);
    if (!t2.isAfter(t1)) {
      throw new CommandLine.ParameterException(spec.commandLine(), "--to (" + t2 + ") must be after --from (" + t1 + ")");
    }
    PlatewardConfig cfg = config.load();
    PrintWriter err = spec.commandLine().getErr();
    PrintWriter outText = spec.commandLine().getOut();
    if (!Files.isReadable(db)) {
      err.println("plateward replay: " + db + ": no such file or not readable");
      err.flush();
      return PlatewardCommand.EXIT_BAD_INPUT;
    }
    ReactorSoftSensor sensor = new ReactorSoftSensor(cfg.unit(), SoftSensorSettings.defaults(), FilterSettings.defaults());
    EstimationLoop.Stats stats;
    long[] byStatus = new long[org.plateward.softsensor.EstimatorStatus.values().length];
    ReplayAdvisories advisories = ReplayAdvisories.of(cfg.unit(), sensor, cfg.alarms(), cfg.advisor(), advice);
    try (HistoryFrameSource src = HistoryFrameSource.open(db, t1, t2)) {
      EstimateWriter w = out == null ? null : EstimateWriter.create(out, db.getFileName().toString());
      try {
        stats = EstimationLoop.run(src, sensor, (f, e, truth) -> {
          byStatus[e.status().ordinal()]++;
          if (w != null) {
            w.write(e);
          }
          if (advisories != null) {
            advisories.add(f, e, sensor);
          }
        }, noProgress ? null : n -> {
          err.print("\rreplayed " + n + " frames");
          err.flush();
        });
      } finally {
        if (w != null) {
          w.close();
        }
      }
    } catch (org.plateward.history.HistoryException e) {
      err.println("plateward replay: " + e.getMessage());
      err.flush();
      return PlatewardCommand.EXIT_BAD_INPUT;
    }
    if (!noProgress && stats.frames() >= 1000) {
      err.println();
      err.flush();
    }
    outText.println(Advisory.SHORT);
    if (stats.frames() == 0) {
      outText.println("no frames stored in " + db + " between " + t1 + " and " + t2);
      outText.flush();
      return 0;
    }
    outText.printf(Locale.ROOT, "replayed %d frames from %s (%.1f min of data) in %.2f s: %.0f x real time%n",
        stats.frames(), db, stats.spanS() / 60.0, stats.wallS(), stats.timesRealTime());
    StringBuilder st = new StringBuilder("estimator status:");
    for (org.plateward.softsensor.EstimatorStatus s : org.plateward.softsensor.EstimatorStatus.values()) {
      st.append(' ').append(s.text()).append(' ').append(byStatus[s.ordinal()]);
    }
    outText.println(st);
    outText.printf(Locale.ROOT, "filter steps %d, model Jacobian builds %d, analyzer results not placed %d, drift flags %d%n",
        sensor.blocks(), sensor.jacobianBuilds(), sensor.droppedAnalyzerResults(), sensor.driftFlags().size());
    printAdvisories(outText, advisories);
    if (out != null) {
      outText.println("estimates written to " + out);
    }
    outText.flush();
    return 0;
  }

  /** {@code --ui}: the recording in the window, driven by the replay controls. */
  private int replayWindow() throws Exception {
    PlatewardConfig cfg = config.load();
    PrintWriter err = spec.commandLine().getErr();
    PrintWriter outText = spec.commandLine().getOut();
    if (inputs != null && inputs.size() > 1) {
      throw new CommandLine.ParameterException(spec.commandLine(), "--ui shows one recording: give one --input");
    }
    Path input = inputs == null ? null : Path.of(inputs.get(0));
    double atS = LiveRun.durationS(spec, screenshotAt);
    org.plateward.history.HistoryRecorder audit = auditDb == null ? null
        : org.plateward.history.HistoryRecorder.start(org.plateward.live.DemoSession.withFile(cfg.history(), auditDb));
    org.plateward.ui.ReplayFeed feed;
    try {
      if (db != null) {
        if (from == null || to == null) {
          throw new CommandLine.ParameterException(spec.commandLine(), "--db needs --from T1 and --to T2");
        }
        feed = org.plateward.ui.ReplayFeed.ofHistory(cfg.unit(), cfg.alarms(), cfg.advisor(), db, instant("--from", from), instant("--to", to), audit);
      } else {
        if (!Files.isReadable(input)) {
          throw new ReplayFormatException(input.toString(), 0, "--input", "no such file or not readable");
        }
        feed = org.plateward.ui.ReplayFeed.ofFile(cfg.unit(), cfg.alarms(), cfg.advisor(), input, audit);
      }
    } catch (RuntimeException | java.io.IOException e) {
      if (audit != null) {
        audit.close();
      }
      throw e;
    }
    outText.println(Advisory.SHORT);
    outText.println("plateward replay: showing " + (input != null ? input : db) + " in the window"
        + (audit == null ? "" : "; alarm audit kept in " + auditDb));
    outText.flush();
    org.plateward.ui.WindowHandle window = null;
    try {
      window = org.plateward.ui.WindowLauncher.open(feed, cfg.alarms(), "Plateward - replay of "
          + (input != null ? input.getFileName() : db.getFileName()) + " (advisory)");
      if (screenshotDir != null) {
        for (Path p : org.plateward.ui.WindowLauncher.screenshots(window, screenshotDir, feed.firstS() + atS, 120)) {
          outText.println("screenshot: " + p);
        }
        outText.flush();
      } else {
        while (!window.closed()) {
          Thread.sleep(200);
        }
      }
      return 0;
    } catch (IllegalStateException e) {
      err.println("plateward replay: " + e.getMessage());
      err.flush();
      return PlatewardCommand.EXIT_INTERNAL;
    } finally {
      if (window != null) {
        window.close();
      }
      feed.close();
      if (audit != null) {
        audit.flush(java.time.Duration.ofSeconds(10));
        audit.close();
      }
      org.plateward.ui.WindowLauncher.shutdown();
    }
  }

  private Instant instant(String option, String text) {
    try {
      return java.time.OffsetDateTime.parse(text).toInstant();
    } catch (java.time.format.DateTimeParseException e) {
      throw new CommandLine.ParameterException(spec.commandLine(),
          option + ": not an ISO 8601 time with zone such as 2031-03-05T14:00:00Z, got '" + text + "'");
    }
  }

  /** The recording's {@code unit=} metadata must name the configured unit when present. */
  private static void checkUnit(ReplayFrameSource src, PlatewardConfig cfg) {
    checkUnit(src, cfg.unit(), cfg.file());
  }

  /** The recording's {@code unit=} metadata must name {@code spec} (read from {@code file}) when present. */
  static void checkUnit(ReplayFrameSource src, org.plateward.reactor.UnitSpec spec, Path file) {
    String unit = src.header().metadata().get("unit");
    if (unit != null && !unit.equals(spec.name().replaceAll("[\\s=]+", "_"))) {
      int line = 1;
      for (String c : src.header().comments()) {
        if (c.contains("unit=" + unit)) {
          break;
        }
        line++;
      }
      throw new ReplayFormatException(src.position(), line, "unit",
          "recording is of unit '" + unit + "' but the configuration (" + file + ") describes '" + spec.name() + "'");
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
