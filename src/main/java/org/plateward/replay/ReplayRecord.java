package org.plateward.replay;

import java.util.Map;
import org.plateward.signals.Frame;
import org.plateward.signals.Signal;
import org.plateward.signals.StatusName;

/**
 * One row of a replay file.
 *
 * @param line 1-based physical line number of the row in its file
 * @param frame the measurements, in SI
 * @param status the status name of each signal whose status cell was filled
 * @param truth simulation-only truth by full column name ({@code truth_...}), in the unit its
 *     name carries; NaN for an empty cell. Empty for real plant data.
 */
public record ReplayRecord(
    long line, Frame frame, Map<Signal, StatusName> status, Map<String, Double> truth) {
  public ReplayRecord {
    status = Map.copyOf(status);
    truth = Map.copyOf(truth);
  }

  /** The truth value of a column, or NaN when the column is absent or the cell empty. */
  public double truth(String column) {
    Double v = truth.get(column);
    return v == null ? Double.NaN : v;
  }
}
