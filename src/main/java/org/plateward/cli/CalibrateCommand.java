package org.plateward.cli;

import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.plateward.Advisory;
import org.plateward.calibration.CalibrationResult;
import org.plateward.calibration.FittedParameter;
import org.plateward.calibration.MeasurementSigmas;
import org.plateward.calibration.ParameterEstimate;
import org.plateward.calibration.SteadinessTolerances;
import org.plateward.calibration.SteadyStateCalibrator;
import org.plateward.calibration.SteadyWindow;
import org.plateward.calibration.SteadyWindowDetector;
import org.plateward.calibration.io.CalibrationPlots;
import org.plateward.calibration.io.ParameterFileWriter;
import org.plateward.config.PlatewardConfig;
import org.plateward.history.HistoryException;
import org.plateward.reactor.Grid;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.PlateReactorModel;
import org.plateward.signals.EdgeUnit;
import org.plateward.signals.Frame;
import org.plateward.softsensor.FrameSource;
import org.plateward.softsensor.SoftSensorSettings;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code plateward calibrate}: finds the steady windows of a recorded period, fits the catalyst
 * activities, the heat-loss coefficient and the heat-transfer multiplier to their means, prints
 * each with its 95 % confidence interval, and writes a parameter file with its residual plots.
 */
@Command(
    name = "calibrate",
    mixinStandardHelpOptions = true,
    description = {"Fit the model parameters to the steady windows of a recorded period and report"
        + " how sure the fit is.", "Either --input F.csv, or --db F --from T1 --to T2 (ISO 8601 times with zone)."})
public final class CalibrateCommand implements Callable<Integer> {
  /** Default model grid of the fit: fine, so the fit does not absorb the discretisation error. */
  public static final int DEFAULT_CELLS = 200;

  @CommandLine.Mixin ConfigOption config;

  @CommandLine.Mixin PeriodOption period;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Option(names = "--out", paramLabel = "params.toml",
      description = "Write the fitted parameters here, and the residual plots beside it (<name>-fit.png, <name>-residuals.png).")
  Path out;

  @Option(names = "--force", description = "Replace the parameter file and plots if they exist.")
  boolean force;

  @Option(names = "--cells", paramLabel = "N", defaultValue = "" + DEFAULT_CELLS,
      description = "Uniform model grid of the fit (default ${DEFAULT-VALUE}; the configuration's [model] cells fits values"
          + " effective for the estimator's own grid).")
  int cells;

  @Option(names = "--min-window", paramLabel = "MIN", defaultValue = "10",
      description = "Shortest steady window, minutes (default ${DEFAULT-VALUE}).")
  double minWindowMin;

  @Override
  public Integer call() throws Exception {
    CommandLine cl = spec.commandLine();
    period.check(cl);
    if (cells < 3) {
      throw new CommandLine.ParameterException(cl, "--cells must be at least 3, got " + cells);
    }
    PlatewardConfig cfg = config.load();
    PrintWriter o = cl.getOut();
    PrintWriter err = cl.getErr();
    List<Path> targets = new ArrayList<>();
    if (out != null) {
      targets.add(out);
      targets.add(plotPath("-fit.png"));
      targets.add(plotPath("-residuals.png"));
      if (!force) {
        for (Path t : targets) {
          if (Files.exists(t)) {
            err.println("plateward calibrate: " + t + " exists; give --force to replace it (nothing was written)");
            err.flush();
            return PlatewardCommand.EXIT_BAD_INPUT;
          }
        }
      }
    }
    SteadinessTolerances tol = SteadinessTolerances.defaults().withMinDurationS(60.0 * minWindowMin);
    SteadyWindowDetector det = new SteadyWindowDetector(tol);
    String source = period.describe(cl);
    try (FrameSource src = period.open(cl)) {
      Frame f;
      while ((f = src.next()) != null) {
        det.accept(f);
      }
    } catch (HistoryException e) {
      err.println("plateward calibrate: " + e.getMessage());
      err.flush();
      return PlatewardCommand.EXIT_BAD_INPUT;
    }
    o.println(Advisory.SHORT);
    o.println("steady windows: " + tol.describe());
    List<SteadyWindow> windows = det.windows();
    if (windows.isEmpty()) {
      SteadyWindowDetector.LongestRun run = det.longestRun();
      err.printf(Locale.ROOT, "plateward calibrate: no steady window found in %s (%d frames)", source, det.frames());
      if (run.from() != null) {
        err.printf(Locale.ROOT, "; the longest steady stretch lasted %.1f min from %s%s", run.durationS() / 60.0, run.from(),
            run.endedBy() == null ? "" : " and ended when the " + run.endedBy().meaning() + " (" + run.endedBy().id()
                + ") left its band");
      }
      err.println(". Nothing was written; give a period with holds of at least " + fmt(minWindowMin) + " min, or a smaller --min-window.");
      err.flush();
      return PlatewardCommand.EXIT_BAD_INPUT;
    }
    o.printf(Locale.ROOT, "%d steady windows in %s:%n", windows.size(), source);
    for (int i = 0; i < windows.size(); i++) {
      SteadyWindow w = windows.get(i);
      o.printf(Locale.ROOT, "  %d  %s .. %s  %5.1f min  feed %.2f Nm3/h, fuel %.3f Nm3/h%n", i + 1, w.from(), w.to(),
          w.durationS() / 60.0, EdgeUnit.NM3_PER_H.fromSi(w.inputs().reformingGasFlowMolPerS()),
          EdgeUnit.NM3_PER_H.fromSi(w.inputs().fuelFlowMolPerS()));
    }
    PlateReactorModel model = new PlateReactorModel(cfg.unit(), Grid.uniform(cfg.unit().geometry().lengthM(), cells),
        PlateReactorModel.Options.DEFAULT.withMultiplierOnMassTransfer());
    ModelParameters start = ModelParameters.nominal(cfg.unit());
    long cpu0 = ManagementFactory.getThreadMXBean().getCurrentThreadCpuTime();
    long wall0 = System.nanoTime();
    CalibrationResult r;
    try {
      r = new SteadyStateCalibrator(model, MeasurementSigmas.of(SoftSensorSettings.defaults())).fit(windows, start);
    } catch (IllegalArgumentException | org.apache.commons.math3.exception.TooManyIterationsException
        | org.apache.commons.math3.exception.TooManyEvaluationsException e) {
      err.println("plateward calibrate: the fit failed: " + e.getMessage() + " (nothing was written)");
      err.flush();
      return PlatewardCommand.EXIT_BAD_INPUT;
    }
    double wallS = (System.nanoTime() - wall0) / 1e9;
    double cpuS = (ManagementFactory.getThreadMXBean().getCurrentThreadCpuTime() - cpu0) / 1e9;
    o.printf(Locale.ROOT, "fit: %d iterations, %d evaluations, %.1f s (%.1f s CPU), %d cells; chi-square %.3g over %d"
            + " residuals, residual variance %.3g (covariance scaled by it), t(0.975, %d) = %.3f%n",
        r.iterations(), r.evaluations(), wallS, cpuS, cells, r.chiSquare(), r.residuals(), r.residualVariance(),
        r.degreesOfFreedom(), r.tQuantile());
    o.printf(Locale.ROOT, "  %-26s %12s %12s %25s  %s%n", "parameter", "configured", "fitted", "95 % interval", "");
    for (ParameterEstimate e : r.estimates()) {
      String unit = e.parameter().unit().isEmpty() ? "" : " " + e.parameter().unit();
      o.printf(Locale.ROOT, "  %-26s %12.4f %12.4f   [%9.4f, %9.4f]%s%s%n", e.parameter().key(), e.start(), e.value(),
          e.ciLow(), e.ciHigh(), unit, e.identifiable() ? "" : "  NOT IDENTIFIABLE from these windows");
    }
    if (r.covarianceSingular()) {
      o.println("  the fit covariance is singular: the windows do not separate the parameters; the weakest"
          + " combination of log parameters is " + direction(r.weakestDirection()));
    } else if (!r.allIdentifiable()) {
      o.println("  a parameter whose interval spans more than a factor " + fmt(CalibrationResult.IDENTIFIABLE_FACTOR)
          + " either way is not pinned down by these windows (weakest combination: " + direction(r.weakestDirection())
          + "); add windows at other operating points");
    }
    o.println("correlation of the fitted (log) parameters:");
    for (FittedParameter p : FittedParameter.values()) {
      StringBuilder b = new StringBuilder(String.format(Locale.ROOT, "  %-26s", p.key()));
      for (double c : r.correlation()[p.ordinal()]) {
        b.append(String.format(Locale.ROOT, " %6.2f", c));
      }
      o.println(b);
    }
    if (out != null) {
      try {
        ParameterFileWriter.write(out, r, source, cells, tol.describe(), Instant.now(), force);
      } catch (FileAlreadyExistsException e) {
        err.println("plateward calibrate: " + out + " exists; give --force to replace it (nothing was written)");
        err.flush();
        return PlatewardCommand.EXIT_BAD_INPUT;
      }
      CalibrationPlots.writeFit(r, targets.get(1));
      CalibrationPlots.writeResiduals(r, targets.get(2));
      o.println("parameters written to " + out + "; residual plots " + targets.get(1) + ", " + targets.get(2));
      o.println("review them before carrying any value into the configuration.");
    }
    o.flush();
    return 0;
  }

  private Path plotPath(String suffix) {
    String name = out.getFileName().toString();
    int dot = name.lastIndexOf('.');
    String stem = dot > 0 ? name.substring(0, dot) : name;
    return out.resolveSibling(stem + suffix);
  }

  private static String direction(double[] v) {
    StringBuilder b = new StringBuilder();
    for (FittedParameter p : FittedParameter.values()) {
      b.append(b.length() == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%.2f ln %s", v[p.ordinal()], p.key()));
    }
    return b.toString();
  }

  private static String fmt(double v) {
    return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
  }

}
