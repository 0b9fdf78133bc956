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
final class ObservabilityDiagnostic {
  /** Names of the reported quantities, in report order. */
  static final String PEAK_CELL = "peak_cell_temperature";

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
    Map<String, Double> m = new LinkedHashMap<>();
    m.put(PEAK_CELL, resolved(p, open, peakCell));
    m.put("reforming_activity", resolved(p, open, layout.reformingActivity()));
    m.put("combustion_activity", resolved(p, open, layout.combustionActivity()));
    m.put("heat_loss", resolved(p, open, layout.heatLoss()));
    m.put("heat_transfer_multiplier", resolved(p, open, layout.heatTransfer()));
    m.put("plate_end_bias_ref_inlet", resolved(p, open, layout.bias(0)));
    m.put("plate_end_bias_ref_outlet", resolved(p, open, layout.bias(1)));
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
