package org.plateward.calibration.io;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Instant;
import java.util.Locale;
import org.plateward.Advisory;
import org.plateward.calibration.CalibrationResult;
import org.plateward.calibration.FittedParameter;
import org.plateward.calibration.ParameterEstimate;
import org.plateward.calibration.SteadyWindow;

/**
 * Writes a calibration as a TOML parameter file: the fitted values in the same tables and keys
 * as the configuration file ({@code [catalyst]}, {@code [heat_loss]}, plus {@code
 * [heat_transfer] multiplier}), so they can be carried over by hand after review, and the
 * uncertainty, correlations and windows under {@code [calibration]}. The header comment carries
 * the cautions.
 */
public final class ParameterFileWriter {
  private ParameterFileWriter() {}

  /**
   * Writes the file; an existing file is replaced only with {@code force}.
   *
   * @param source what was fitted (file or database and period), for the header
   * @param cells cells of the model grid the fit used
   * @param tolerances the steadiness tolerances in words
   * @throws java.nio.file.FileAlreadyExistsException when the file exists and {@code force} is
   *     false (nothing is written)
   */
  public static void write(Path file, CalibrationResult r, String source, int cells, String tolerances,
      Instant fittedAt, boolean force) throws IOException {
    StandardOpenOption[] opts = force
        ? new StandardOpenOption[] {StandardOpenOption.CREATE, StandardOpenOption.TRUNCATE_EXISTING, StandardOpenOption.WRITE}
        : new StandardOpenOption[] {StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE};
    try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8, opts)) {
      w.write(text(r, source, cells, tolerances, fittedAt));
    }
  }

  /** The file's text. */
  public static String text(CalibrationResult r, String source, int cells, String tolerances, Instant fittedAt) {
    StringBuilder b = new StringBuilder();
    b.append("# Plateward model parameters fitted by `plateward calibrate` at ").append(fittedAt).append('\n');
    b.append("# ").append(Advisory.SHORT).append('\n');
    b.append("# Cautions: these values are fitted to the steady windows listed below, on a steady-state\n");
    b.append("# model with ").append(cells).append(" cells; they hold for operation like those windows and are only as good\n");
    b.append("# as the model and the measurements behind them. Review them (intervals, correlations,\n");
    b.append("# residual plots) before carrying them into a configuration; a parameter marked\n");
    b.append("# identifiable = false is not pinned down by these windows and should not be carried over.\n");
    b.append("# The heat-transfer multiplier scales the combustion Sherwood number as well (heat and mass\n");
    b.append("# transfer analogy), as it does in the estimator.\n");
    b.append("# Source: ").append(source.replace('\n', ' ')).append('\n');
    b.append("# Steady windows: ").append(tolerances).append('\n');
    b.append('\n');
    b.append("[catalyst]\n");
    b.append("reforming_activity = ").append(num(r.fitted().reformingActivity())).append('\n');
    b.append("combustion_activity = ").append(num(r.fitted().combustionActivity())).append('\n');
    b.append('\n');
    b.append("[heat_loss]\n");
    b.append("coefficient = \"").append(num(r.fitted().heatLossCoefficientWPerM2K())).append(" W/(m2 K)\"\n");
    b.append('\n');
    b.append("[heat_transfer]\n");
    b.append("multiplier = ").append(num(r.fitted().heatTransferMultiplier()))
        .append("   # on the gas-wall heat- and mass-transfer coefficients (model Nu = Sh = 7.541)\n");
    b.append('\n');
    b.append("[calibration]\n");
    b.append("fitted_at = \"").append(fittedAt).append("\"\n");
    b.append("model_cells = ").append(cells).append('\n');
    b.append("windows = ").append(r.windows().size()).append('\n');
    b.append("residuals = ").append(r.residuals()).append('\n');
    b.append("chi_square = ").append(num(r.chiSquare())).append('\n');
    b.append("residual_variance = ").append(num(r.residualVariance()))
        .append("   # the covariance is scaled by this (chi-square over m - 4)\n");
    b.append("t_quantile_95 = ").append(num(r.tQuantile())).append('\n');
    b.append("covariance_singular = ").append(r.covarianceSingular()).append('\n');
    b.append("condition_number = ").append(num(r.conditionNumber())).append('\n');
    for (ParameterEstimate e : r.estimates()) {
      b.append('\n');
      b.append("[calibration.").append(e.parameter().key()).append("]\n");
      String u = e.parameter().unit().isEmpty() ? "" : "   # " + e.parameter().unit();
      b.append("start = ").append(num(e.start())).append(u).append('\n');
      b.append("value = ").append(num(e.value())).append(u).append('\n');
      b.append("sd = ").append(num(e.sd())).append('\n');
      b.append("ci95_low = ").append(num(e.ciLow())).append('\n');
      b.append("ci95_high = ").append(num(e.ciHigh())).append('\n');
      b.append("identifiable = ").append(e.identifiable()).append('\n');
    }
    b.append('\n');
    b.append("[calibration.correlation]\n");
    b.append("order = [");
    for (FittedParameter p : FittedParameter.values()) {
      b.append(p.ordinal() == 0 ? "" : ", ").append('"').append(p.key()).append('"');
    }
    b.append("]\n");
    b.append("matrix = [\n");
    for (double[] row : r.correlation()) {
      b.append("  [");
      for (int j = 0; j < row.length; j++) {
        b.append(j == 0 ? "" : ", ").append(num(row[j]));
      }
      b.append("],\n");
    }
    b.append("]\n");
    for (SteadyWindow w : r.windows()) {
      b.append('\n');
      b.append("[[calibration.window]]\n");
      b.append("from = \"").append(w.from()).append("\"\n");
      b.append("to = \"").append(w.to()).append("\"\n");
      b.append("frames = ").append(w.frames()).append('\n');
    }
    return b.toString();
  }

  /** TOML float: finite values with 6 significant digits, nan and inf as TOML spells them. */
  static String num(double v) {
    if (Double.isNaN(v)) {
      return "nan";
    }
    if (Double.isInfinite(v)) {
      return v > 0 ? "inf" : "-inf";
    }
    String s = String.format(Locale.ROOT, "%.6g", v);
    if (s.contains("e")) {
      // TOML wants a digit before the exponent's sign handled: 1.00000e+06 is valid TOML
      return s;
    }
    return s.contains(".") ? s : s + ".0";
  }
}
