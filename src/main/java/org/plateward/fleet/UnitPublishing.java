package org.plateward.fleet;

import java.time.Instant;
import java.util.Map;
import org.plateward.opcua.EstimatePublisher;
import org.plateward.opcua.PublishedEstimate;
import org.plateward.signals.Frame;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.EstimationLoop;

/**
 * Connects lanes of a {@link UnitPool} to the soft-sensor publisher: each unit's estimates go
 * to its own folder {@code Objects/Plateward/<unit id>}, and a failed lane is shown there as a
 * status with no values (never as a stale number).
 */
public final class UnitPublishing {
  private UnitPublishing() {}

  /**
   * A lane sink that publishes every estimate of {@code unitId}, then hands it on.
   *
   * @param publisher started with {@code unitId} among its units
   * @param unitId the unit's folder
   * @param next the sink after publishing (history, listeners); may be null
   * @return the sink to open the lane with
   */
  public static EstimationLoop.Sink sink(EstimatePublisher publisher, String unitId, EstimationLoop.Sink next) {
    return sink(publisher, unitId, (f, e) -> 0, next);
  }

  /**
   * As {@link #sink(EstimatePublisher, String, EstimationLoop.Sink)}, with the alarms judged
   * first: {@code alarms} returns the number of alarms standing after this estimate, which is
   * published with it.
   */
  public static EstimationLoop.Sink sink(EstimatePublisher publisher, String unitId,
      java.util.function.ToIntBiFunction<Frame, Estimate> alarms, EstimationLoop.Sink next) {
    if (!publisher.units().contains(unitId)) {
      throw new IllegalArgumentException("unit " + unitId + " has no folder on the publisher (units: "
          + publisher.units() + ")");
    }
    return (Frame f, Estimate e, Map<String, Double> truth) -> {
      publisher.publish(unitId, published(e, alarms.applyAsInt(f, e)));
      if (next != null) {
        next.accept(f, e, truth);
      }
    };
  }

  /**
   * Shows a failed lane on the publisher: every value without data (Bad_NoCommunication) and
   * the status {@code "failed: <reason>"}.
   *
   * @param publisher the publisher
   * @param status the lane's status (failed)
   */
  public static void showFailure(EstimatePublisher publisher, LaneStatus status) {
    Instant t = status.lastFrame() != null ? status.lastFrame() : Instant.now();
    publisher.publish(status.unitId(), new PublishedEstimate(t, Double.NaN, Double.NaN, Double.NaN,
        Double.NaN, Double.NaN, Double.NaN, Double.NaN, "failed: " + status.reason(), 0));
  }

  /**
   * What the publisher serves for an estimate: degC for the peak, a time-to-exhaust of +Inf
   * when the estimator runs but forecasts no melt-through within its horizon (the same
   * conversion serves the single-unit live monitor).
   *
   * @param e the estimate
   * @param activeAlarms number of alarms active now
   */
  public static PublishedEstimate published(Estimate e, int activeAlarms) {
    boolean running = Double.isFinite(e.peakPlateTempK());
    double tte = e.timeToExhaustS();
    double tteSd = e.timeToExhaustSdS();
    if (running && Double.isNaN(tte)) {
      tte = Double.POSITIVE_INFINITY;
      tteSd = Double.NaN;
    }
    return new PublishedEstimate(e.time(), e.peakPlateTempK() - 273.15, e.peakPlateTempSdK(),
        e.peakPositionM(), e.bufferMeltFraction(), e.maxCellMeltFraction(), tte, tteSd,
        e.status().text() + (e.reason() == null || e.reason().isEmpty() ? "" : ": " + e.reason()), activeAlarms);
  }
}
