package org.plateward.plant;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import org.plateward.replay.ReplayColumns;
import org.plateward.replay.ReplayLayout;
import org.plateward.replay.ReplayWriter;
import org.plateward.signals.Signal;

/**
 * Writes the frames of a plant run to a replay file with status columns and the truth columns.
 * Frames are kept in memory until the run ends, because {@code truth_time_to_exhaust_s} is known
 * only in hindsight (about 0.5 kB per frame: a day at 1 s is some 40 MB).
 *
 * <p>Truth columns, after the standard five: {@value #REFORMING_ACTIVITY}, {@value
 * #COMBUSTION_ACTIVITY}, {@value #HEAT_LOSS}, then {@code truth_<signal id>} for every signal:
 * its true value before lag, noise, faults and quantisation, in the signal's edge unit.
 */
public final class PlantRecorder {
  public static final String REFORMING_ACTIVITY = "truth_reforming_activity";
  public static final String COMBUSTION_ACTIVITY = "truth_combustion_activity";
  public static final String HEAT_LOSS = "truth_heat_loss_coefficient_w_m2k";
  /** The simulator's model version, recorded in the header. */
  public static final String MODEL_VERSION = "plant-1";

  private final List<PlantSample> samples = new ArrayList<>();

  /** Consumer that buffers every sample for {@link #write}. */
  public Consumer<PlantSample> sink() {
    return samples::add;
  }

  public int size() {
    return samples.size();
  }

  /** Name of the truth column carrying a signal's true value. */
  public static String truthColumn(Signal s) {
    return ReplayColumns.TRUTH_PREFIX + s.id();
  }

  /** The truth columns after the standard ones, in file order. */
  public static List<String> extraTruthColumns() {
    List<String> extra = new ArrayList<>(List.of(REFORMING_ACTIVITY, COMBUSTION_ACTIVITY, HEAT_LOSS));
    for (Signal s : Signal.values()) {
      extra.add(truthColumn(s));
    }
    return extra;
  }

  /**
   * Writes every buffered sample.
   *
   * @param file the replay file (created or truncated)
   * @param scenario the scenario run (name and seed go into the header)
   * @param scenarioFile the scenario file's name as given (header only)
   * @param unitName the unit simulated (header only)
   */
  public void write(Path file, Scenario scenario, String scenarioFile, String unitName) throws IOException {
    Map<String, String> meta = new LinkedHashMap<>();
    meta.put("scenario", token(scenario.name()));
    meta.put("scenario_file", token(scenarioFile));
    meta.put("seed", Long.toString(scenario.seed()));
    meta.put("unit", token(unitName));
    meta.put("model", MODEL_VERSION);
    meta.put("truth_cells", Integer.toString(scenario.truth().cells()));
    meta.put("truth_nusselt", Double.toString(scenario.truth().nusselt()));
    ReplayLayout layout = ReplayLayout.simulated(meta, extraTruthColumns());
    int n = samples.size();
    double[] t = new double[n];
    double[] melt = new double[n];
    for (int k = 0; k < n; k++) {
      t[k] = samples.get(k).timeS();
      melt[k] = samples.get(k).truth().maxCellMeltFraction();
    }
    double[] tte = TimeToExhaust.inHindsight(t, melt);
    try (ReplayWriter w = ReplayWriter.create(file, layout)) {
      Map<String, Double> truth = new HashMap<>();
      for (int k = 0; k < n; k++) {
        PlantSample s = samples.get(k);
        PlantSample.Truth tr = s.truth();
        truth.clear();
        truth.put(ReplayColumns.TRUTH_PEAK_PLATE_TEMP_C, tr.peakPlateTempK() - 273.15);
        truth.put(ReplayColumns.TRUTH_PEAK_POSITION_M, tr.peakPositionM());
        truth.put(ReplayColumns.TRUTH_BUFFER_MELT_FRACTION, tr.bufferMeltFraction());
        truth.put(ReplayColumns.TRUTH_MAX_CELL_MELT_FRACTION, tr.maxCellMeltFraction());
        if (!Double.isNaN(tte[k])) {
          truth.put(ReplayColumns.TRUTH_TIME_TO_EXHAUST_S, tte[k]);
        }
        truth.put(REFORMING_ACTIVITY, tr.reformingActivity());
        truth.put(COMBUSTION_ACTIVITY, tr.combustionActivity());
        truth.put(HEAT_LOSS, tr.heatLossWPerM2K());
        for (Signal sig : Signal.values()) {
          truth.put(truthColumn(sig), sig.unit().fromSi(tr.boundarySi(sig)));
        }
        w.write(s.frame(), s.status(), truth);
      }
    }
  }

  private static String token(String s) {
    return s.replaceAll("[\\s=]+", "_");
  }
}
