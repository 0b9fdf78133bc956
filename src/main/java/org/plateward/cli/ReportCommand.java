package org.plateward.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import org.plateward.Advisory;
import org.plateward.config.PlatewardConfig;
import org.plateward.estimation.FilterSettings;
import org.plateward.history.AlarmEventRow;
import org.plateward.history.EstimateRow;
import org.plateward.history.HistoryException;
import org.plateward.history.HistoryReader;
import org.plateward.report.KeyFigure;
import org.plateward.report.ReportFiles;
import org.plateward.report.ReportPlots;
import org.plateward.report.UpsetReport;
import org.plateward.softsensor.EstimationLoop;
import org.plateward.softsensor.FrameSource;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.SoftSensorSettings;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code plateward report}: an upset report for a recorded period, written headless into a
 * folder: plots (profile snapshots, hidden peak ± σ, melt fraction, time-to-exhaust, alarm
 * timeline), the alarm events and key figures as CSV, and summary.txt with the cautions.
 */
@Command(
    name = "report",
    mixinStandardHelpOptions = true,
    description = {"Write an upset report (plots, alarm events, key figures, summary) for a recorded period.",
        "Either --input F.csv, or --db F --from T1 --to T2 (ISO 8601 times with zone); --out DIR is new or empty."})
public final class ReportCommand implements Callable<Integer> {
  @CommandLine.Mixin ConfigOption config;

  @CommandLine.Mixin PeriodOption period;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Option(names = "--out", paramLabel = "DIR", required = true, description = "Folder to write the report into (created; if it exists it must be empty, unless --force).")
  Path out;

  @Option(names = "--force", description = "Write into an existing folder that is not empty (files of the same names are replaced).")
  boolean force;

  @Override
  public Integer call() throws Exception {
    CommandLine cl = spec.commandLine();
    period.check(cl);
    PlatewardConfig cfg = config.load();
    PrintWriter o = cl.getOut();
    PrintWriter err = cl.getErr();
    if (Files.exists(out)) {
      if (!Files.isDirectory(out)) {
        err.println("plateward report: " + out + " exists and is not a folder (nothing was written)");
        err.flush();
        return PlatewardCommand.EXIT_BAD_INPUT;
      }
      if (!force && !isEmpty(out)) {
        err.println("plateward report: " + out + " is not empty; give an empty or new folder, or --force (nothing was written)");
        err.flush();
        return PlatewardCommand.EXIT_BAD_INPUT;
      }
    }
    long wall0 = System.nanoTime();
    UpsetReport report = new UpsetReport(cfg.unit(), cfg.alarms());
    List<String> source = new ArrayList<>();
    source.add("Unit: " + cfg.unit().name() + " (" + cfg.unit().site() + "), configuration " + cfg.file());
    source.add("Period: " + period.describe(cl));
    try {
      if (period.isHistory()) {
        Instant t1 = period.fromInstant(cl);
        Instant t2 = period.toInstant(cl);
        List<EstimateRow> stored;
        List<AlarmEventRow> events;
        try (HistoryReader r = HistoryReader.open(period.file())) {
          stored = r.estimates(t1, t2);
          events = r.alarmEvents(t1, t2);
        }
        if (!stored.isEmpty()) {
          report.addStored(stored, events);
          source.add("Estimates: " + stored.size() + " stored in history; alarm events: " + events.size() + " stored");
        } else {
          report.note("history holds no estimates for the period: the estimator was run over its stored frames");
          runEstimator(cl, cfg, report, source);
        }
      } else {
        runEstimator(cl, cfg, report, source);
      }
    } catch (HistoryException e) {
      err.println("plateward report: " + e.getMessage() + " (nothing was written)");
      err.flush();
      return PlatewardCommand.EXIT_BAD_INPUT;
    }
    if (report.record().size() == 0) {
      err.println("plateward report: no frames or estimates in " + period.describe(cl) + " (nothing was written)");
      err.flush();
      return PlatewardCommand.EXIT_BAD_INPUT;
    }
    Files.createDirectories(out);
    List<KeyFigure> figures = report.write(out, "Plateward upset report: " + cfg.unit().name(), source);
    double wallS = (System.nanoTime() - wall0) / 1e9;
    o.println(Advisory.SHORT);
    for (KeyFigure f : figures) {
      o.printf(Locale.ROOT, "  %-30s %s%s%n", f.name(), f.value().isEmpty() ? "-" : f.value(), f.unit().isEmpty() ? "" : " " + f.unit());
    }
    o.printf(Locale.ROOT, "report written to %s in %.1f s: %s, %s, %s, %s%n", out, wallS, String.join(", ", ReportPlots.FILES),
        ReportFiles.ALARMS, ReportFiles.FIGURES, ReportFiles.SUMMARY);
    o.flush();
    return 0;
  }

  private void runEstimator(CommandLine cl, PlatewardConfig cfg, UpsetReport report, List<String> source)
      throws IOException, HistoryException {
    ReactorSoftSensor sensor = new ReactorSoftSensor(cfg.unit(), SoftSensorSettings.defaults(), FilterSettings.defaults());
    EstimationLoop.Stats st;
    try (FrameSource src = period.open(cl)) {
      st = report.runEstimator(src, sensor);
    }
    source.add(String.format(Locale.ROOT, "Estimates: the soft sensor run over %d frames (%.1f min of data) in %.1f s",
        st.frames(), st.spanS() / 60.0, st.wallS()));
  }

  private static boolean isEmpty(Path dir) throws IOException {
    try (Stream<Path> s = Files.list(dir)) {
      return s.findAny().isEmpty();
    }
  }
}
