package org.plateward.replay;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.plateward.Advisory;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.ObservabilityDiagnostic;

/**
 * Writes estimates as CSV, one row per frame, temperatures in degC. Header comments carry the
 * caution and the source; an empty cell is a figure that is not available.
 */
public final class EstimateWriter implements AutoCloseable {
  /** The column names, in file order. */
  public static final List<String> COLUMNS = columns();

  private static List<String> columns() {
    List<String> c = new java.util.ArrayList<>(List.of(
      "timestamp", "peak_plate_temp_c", "peak_plate_temp_sd_c", "peak_position_m", "buffer_melt_fraction",
      "buffer_melt_fraction_sd", "max_cell_melt_fraction", "remaining_latent_kj", "time_to_exhaust_s",
      "time_to_exhaust_sd_s", "nis", "nis_dof", "estimator_status", "reforming_activity", "reforming_activity_sd",
      "combustion_activity", "combustion_activity_sd", "heat_loss_w_m2k", "heat_loss_sd_w_m2k",
      "heat_transfer_multiplier", "heat_transfer_multiplier_sd", "plate_end_bias_ref_inlet_k",
      "plate_end_bias_ref_outlet_k"));
    for (String name : ObservabilityDiagnostic.NAMES) {
      c.add("observed_" + name);
    }
    c.add("estimator_reason");
    return List.copyOf(c);
  }

  private final Writer out;
  private final StringBuilder row = new StringBuilder(256);

  private EstimateWriter(Writer out, String source) throws IOException {
    this.out = out;
    out.write("# Plateward estimates (" + Advisory.SHORT + ")\n");
    out.write("# An estimate is only as good as the model and the measurements behind it; see estimator_status.\n");
    out.write("# source=" + source.replaceAll("[\\s=]+", "_") + "\n");
    out.write(String.join(",", COLUMNS));
    out.write('\n');
  }

  /** Creates (or truncates) the file. */
  public static EstimateWriter create(Path file, String source) throws IOException {
    return new EstimateWriter(Files.newBufferedWriter(file, StandardCharsets.UTF_8), source);
  }

  /** Writes to any stream (closed with this writer). */
  public static EstimateWriter to(Writer out, String source) throws IOException {
    return new EstimateWriter(out instanceof BufferedWriter ? out : new BufferedWriter(out), source);
  }

  /** Writes one estimate. */
  public void write(Estimate e) throws IOException {
    row.setLength(0);
    row.append(e.time());
    cell(e.peakPlateTempK() - 273.15);
    cell(e.peakPlateTempSdK());
    cell(e.peakPositionM());
    cell(e.bufferMeltFraction());
    cell(e.bufferMeltFractionSd());
    cell(e.maxCellMeltFraction());
    cell(e.remainingLatentJ() / 1000.0);
    cell(e.timeToExhaustS());
    cell(e.timeToExhaustSdS());
    cell(e.nis());
    row.append(',').append(e.nisDof());
    row.append(',').append(e.status().text());
    cell(e.reformingActivity());
    cell(e.reformingActivitySd());
    cell(e.combustionActivity());
    cell(e.combustionActivitySd());
    cell(e.heatLossWPerM2K());
    cell(e.heatLossSdWPerM2K());
    cell(e.heatTransferMultiplier());
    cell(e.heatTransferMultiplierSd());
    cell(e.biasInletK());
    cell(e.biasOutletK());
    for (String name : ObservabilityDiagnostic.NAMES) {
      Double v = e.observability().get(name);
      cell(v == null ? Double.NaN : v);
    }
    row.append(',').append(e.reason().replace(',', ';'));
    row.append('\n');
    out.append(row);
  }

  private void cell(double v) {
    row.append(',');
    if (!Double.isFinite(v)) {
      return;
    }
    if (Math.abs(v) >= 1e9) {
      row.append(v);
      return;
    }
    // fixed six decimals by integer arithmetic (BigDecimal rounding costs more than the filter)
    long scaled = Math.round(Math.abs(v) * 1e6);
    if (v < 0 && scaled != 0) {
      row.append('-');
    }
    row.append(scaled / 1_000_000L).append('.');
    String frac = Long.toString(scaled % 1_000_000L);
    for (int i = frac.length(); i < 6; i++) {
      row.append('0');
    }
    row.append(frac);
  }

  @Override
  public void close() throws IOException {
    out.close();
  }
}
