package org.plateward.softsensor;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import org.plateward.estimation.ExtendedKalmanFilter;

/**
 * How well the present measurements pin down each key quantity, along the trajectory actually
 * run. At the start of each window the filter begins an open-loop copy of its covariance
 * (propagated with the same Φ and Q, never updated); at the window's end, for each quantity i,
 *
 * <pre>  resolved_i = 1 − P_ii / P_open,ii   (0 = the measurements told us nothing, 1 = all)</pre>
 *
 * is the fraction of the variance the quantity would have had without the measurements that
 * they removed. It is the diagonal of the observability question a Gramian asks, answered
 * with the filter's own noise model: a weakly observed state (one boundary sensors see only
 * through a long chain) shows a small fraction even when its σ looks settled. The figures of
 * the last complete window are reported; the peak is judged at the cell that was hottest at the
 * window's end.
 */
public final class ObservabilityDiagnostic {
  /** Name of the hottest cell's entry. */
  public static final String PEAK_CELL = "peak_cell_temperature";
  /** Names of the reported quantities, in report order. */
  public static final java.util.List<String> NAMES = java.util.List.of(PEAK_CELL, "reforming_activity",
      "combustion_activity", "heat_loss", "heat_transfer_multiplier", "plate_end_bias_ref_inlet",
      "plate_end_bias_ref_outlet");

  private final StateLayout layout;
  private final double windowS;
  private double windowStartS = Double.NaN;
  private Map<String, Double> last = Map.of();

  /**
   * @param layout the augmented state layout
   * @param windowS window length (s)
   */
  ObservabilityDiagnostic(StateLayout layout, double windowS) {
    this.layout = layout;
    this.windowS = windowS;
  }

  /**
   * Called after each filter step: closes the window when it is due and starts the next one.
   *
   * @param ekf the filter
   * @param timeS filter time (s)
   * @param peakCell index of the hottest cell now
   */
  void afterStep(ExtendedKalmanFilter ekf, double timeS, int peakCell) {
    if (Double.isNaN(windowStartS)) {
      ekf.restartOpenLoopCovariance();
      windowStartS = timeS;
      return;
    }
    if (timeS - windowStartS < windowS - 1e-6) {
      return;
    }
    double[] open = ekf.openLoopVariances();
    double[][] p = ekf.covariance();
    int[] index = {peakCell, layout.reformingActivity(), layout.combustionActivity(), layout.heatLoss(),
      layout.heatTransfer(), layout.bias(0), layout.bias(1)};
    Map<String, Double> m = new LinkedHashMap<>();
    for (int k = 0; k < index.length; k++) {
      m.put(NAMES.get(k), resolved(p, open, index[k]));
    }
    last = Collections.unmodifiableMap(m);
    ekf.restartOpenLoopCovariance();
    windowStartS = timeS;
  }

  /** Figures of the last complete window (empty before the first). */
  Map<String, Double> lastWindow() {
    return last;
  }

  private static double resolved(double[][] p, double[] open, int i) {
    if (!(open[i] > 0.0)) {
      return Double.NaN;
    }
    return Math.max(0.0, Math.min(1.0, 1.0 - p[i][i] / open[i]));
  }
}
