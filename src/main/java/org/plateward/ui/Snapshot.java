package org.plateward.ui;

import java.time.Instant;
import java.util.List;
import org.plateward.advisor.TrimSuggestion;
import org.plateward.alarms.AlarmEvent;
import org.plateward.alarms.AlarmStatus;
import org.plateward.estimation.ChannelStatus;
import org.plateward.signals.Frame;
import org.plateward.softsensor.Estimate;

/**
 * What the window receives for one frame: the measurements, the estimate and what the alarm
 * board and the advisor said about it. Built on the estimator's thread, read on the FX thread;
 * immutable. The window computes nothing from it but units and pixels.
 *
 * @param frame the measurements, SI, on plant time
 * @param estimate the estimate for the frame
 * @param predictedSi the model's prediction of the four frame-rate outputs (reformed gas outlet,
 *     flue gas outlet, plate end z = 0, plate end z = L), K, as the estimator holds it (lag state
 *     plus thermocouple bias); NaN when not known
 * @param fastStatus what the last filter step did with those four channels (null: no step yet)
 * @param alarms the advisory alarms after this frame, most urgent first
 * @param events alarm transitions caused by this frame (possibly empty)
 * @param advice the fuel-trim suggestion in force (null: none yet)
 */
public record Snapshot(Frame frame, Estimate estimate, double[] predictedSi, ChannelStatus[] fastStatus,
    List<AlarmStatus> alarms, List<AlarmEvent> events, TrimSuggestion advice) {
  public Snapshot {
    predictedSi = predictedSi == null ? new double[] {Double.NaN, Double.NaN, Double.NaN, Double.NaN}
        : predictedSi.clone();
    fastStatus = fastStatus == null ? null : fastStatus.clone();
    alarms = alarms == null ? List.of() : List.copyOf(alarms);
    events = events == null ? List.of() : List.copyOf(events);
  }

  /** Plant time of the frame. */
  public Instant time() {
    return estimate.time();
  }

  @Override
  public double[] predictedSi() {
    return predictedSi.clone();
  }

  @Override
  public ChannelStatus[] fastStatus() {
    return fastStatus == null ? null : fastStatus.clone();
  }
}
