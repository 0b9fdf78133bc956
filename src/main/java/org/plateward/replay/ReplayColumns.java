package org.plateward.replay;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import org.plateward.signals.Signal;

/** Column names of the replay file and the rules that say which names are allowed. */
public final class ReplayColumns {
  public static final String TIMESTAMP = "timestamp";
  public static final String STATUS_PREFIX = "status_";
  public static final String TRUTH_PREFIX = "truth_";

  /** Hottest plate temperature along the unit, degC (simulation only). */
  public static final String TRUTH_PEAK_PLATE_TEMP_C = "truth_peak_plate_temp_c";
  /** Axial position of the hottest plate temperature from the reforming inlet, m. */
  public static final String TRUTH_PEAK_POSITION_M = "truth_peak_position_m";
  /** Overall melt fraction of the buffer layer, 0..1. */
  public static final String TRUTH_BUFFER_MELT_FRACTION = "truth_buffer_melt_fraction";
  /** Largest melt fraction of any cell of the buffer layer, 0..1. */
  public static final String TRUTH_MAX_CELL_MELT_FRACTION = "truth_max_cell_melt_fraction";
  /** Seconds from this frame until some cell is fully melted; empty when it does not happen. */
  public static final String TRUTH_TIME_TO_EXHAUST_S = "truth_time_to_exhaust_s";

  /** The truth columns every simulated recording has, in their usual order. */
  public static final List<String> STANDARD_TRUTH =
      List.of(
          TRUTH_PEAK_PLATE_TEMP_C,
          TRUTH_PEAK_POSITION_M,
          TRUTH_BUFFER_MELT_FRACTION,
          TRUTH_MAX_CELL_MELT_FRACTION,
          TRUTH_TIME_TO_EXHAUST_S);

  private static final Pattern TRUTH_NAME = Pattern.compile("truth_[a-z][a-z0-9_]*");

  private ReplayColumns() {}

  /** Status column of a signal, e.g. {@code status_ref_outlet_temp_c}. */
  public static String statusColumn(Signal signal) {
    return STATUS_PREFIX + signal.id();
  }

  /** True for {@code truth_<name>} with a lower-case name of letters, digits and '_'. */
  public static boolean isTruthColumn(String name) {
    return TRUTH_NAME.matcher(name).matches();
  }

  /** Every fixed column name (timestamp, signal ids, status columns, standard truth). */
  static List<String> knownNames() {
    List<String> names = new ArrayList<>();
    names.add(TIMESTAMP);
    for (Signal s : Signal.values()) {
      names.add(s.id());
    }
    for (Signal s : Signal.values()) {
      names.add(statusColumn(s));
    }
    names.addAll(STANDARD_TRUTH);
    return names;
  }

}
