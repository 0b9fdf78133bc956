package org.plateward.report;

import java.time.Instant;

/**
 * The figures of one estimate the report plots, SI; NaN when not available.
 *
 * @param time the estimate's time
 * @param peakTempK hidden peak plate temperature, K
 * @param peakTempSdK its standard deviation, K
 * @param peakPositionM its position, m
 * @param meltFraction overall melt fraction, 0..1
 * @param maxCellMeltFraction largest cell melt fraction, 0..1
 * @param timeToExhaustS time-to-exhaust, s (NaN: none forecast)
 * @param timeToExhaustSdS its spread, s
 * @param status estimator status word
 * @param cellTempK plate profile, K (may be empty)
 * @param cellTempSdK its σ per cell, K (may be empty: history keeps no profile σ)
 */
public record ReportPoint(
    Instant time, double peakTempK, double peakTempSdK, double peakPositionM, double meltFraction,
    double maxCellMeltFraction, double timeToExhaustS, double timeToExhaustSdS, String status,
    double[] cellTempK, double[] cellTempSdK) {
  public ReportPoint {
    cellTempK = cellTempK.clone();
    cellTempSdK = cellTempSdK.clone();
  }

  @Override
  public double[] cellTempK() {
    return cellTempK.clone();
  }

  @Override
  public double[] cellTempSdK() {
    return cellTempSdK.clone();
  }

  static ReportPoint of(org.plateward.softsensor.Estimate e) {
    return new ReportPoint(e.time(), e.peakPlateTempK(), e.peakPlateTempSdK(), e.peakPositionM(), e.bufferMeltFraction(),
        e.maxCellMeltFraction(), e.timeToExhaustS(), e.timeToExhaustSdS(), e.status().text(), e.cellPlateTempK(),
        e.cellPlateTempSdK());
  }

  static ReportPoint of(org.plateward.history.EstimateRow r) {
    return new ReportPoint(r.time(), r.peakPlateTempK(), r.peakPlateTempSdK(), r.peakPositionM(), r.bufferMeltFraction(),
        r.maxCellMeltFraction(), r.timeToExhaustS(), r.timeToExhaustSdS(), r.status(), r.cellTempK(), new double[0]);
  }
}
