package org.plateward.softsensor;

import java.time.Instant;

/**
 * The soft sensor's output for one frame. NaN marks a figure that is not available (for
 * example the time-to-exhaust when no cell melts through inside the horizon).
 *
 * @param time frame time
 * @param peakPlateTempK hidden peak plate temperature, K
 * @param peakPlateTempSdK its standard deviation, K
 * @param peakPositionM position of the peak from the reforming inlet, m
 * @param bufferMeltFraction overall (length-weighted) melt fraction, 0..1
 * @param bufferMeltFractionSd its standard deviation
 * @param maxCellMeltFraction largest melt fraction of any cell, 0..1
 * @param remainingLatentJ latent capacity left in one plate's buffer layer, J
 * @param timeToExhaustS seconds until the buffer of some cell is fully melted, inputs held; NaN
 *     when not within the horizon
 * @param timeToExhaustSdS its spread, s (NaN with it)
 * @param nis normalised innovation squared of the last update
 * @param nisDof degrees of freedom of that NIS (channels fused)
 * @param status trust in this estimate
 * @param reason why the status is not ok (empty when ok)
 * @param reformingActivity estimated reforming activity
 * @param reformingActivitySd its standard deviation
 * @param combustionActivity estimated combustion activity
 * @param combustionActivitySd its standard deviation
 * @param heatLossWPerM2K estimated heat-loss coefficient, W/(m2 K)
 * @param heatLossSdWPerM2K its standard deviation
 * @param heatTransferMultiplier estimated multiplier on the gas-wall heat-transfer coefficients
 * @param heatTransferMultiplierSd its standard deviation
 * @param biasInletK estimated bias of the plate-end thermocouple at z = 0, K
 * @param biasOutletK estimated bias of the plate-end thermocouple at z = L, K
 * @param cellMeltFraction melt fraction of each cell (copy)
 * @param cellPlateTempK plate temperature of each cell, K (copy; empty before the start)
 * @param cellPlateTempSdK its standard deviation per cell, K (copy)
 * @param observability how well the present measurements pin down each key quantity: the
 *     fraction (0..1) of the uncertainty it would have gathered open loop over the diagnostic
 *     window that the measurements removed, by name (see {@link ObservabilityDiagnostic});
 *     empty until the first window is complete
 */
public record Estimate(
    Instant time,
    double peakPlateTempK,
    double peakPlateTempSdK,
    double peakPositionM,
    double bufferMeltFraction,
    double bufferMeltFractionSd,
    double maxCellMeltFraction,
    double remainingLatentJ,
    double timeToExhaustS,
    double timeToExhaustSdS,
    double nis,
    int nisDof,
    EstimatorStatus status,
    String reason,
    double reformingActivity,
    double reformingActivitySd,
    double combustionActivity,
    double combustionActivitySd,
    double heatLossWPerM2K,
    double heatLossSdWPerM2K,
    double heatTransferMultiplier,
    double heatTransferMultiplierSd,
    double biasInletK,
    double biasOutletK,
    double[] cellMeltFraction,
    double[] cellPlateTempK,
    double[] cellPlateTempSdK,
    java.util.Map<String, Double> observability) {

  public Estimate {
    cellMeltFraction = cellMeltFraction.clone();
    cellPlateTempK = cellPlateTempK.clone();
    cellPlateTempSdK = cellPlateTempSdK.clone();
    observability = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(observability));
  }

  @Override
  public double[] cellPlateTempK() {
    return cellPlateTempK.clone();
  }

  @Override
  public double[] cellPlateTempSdK() {
    return cellPlateTempSdK.clone();
  }

  @Override
  public double[] cellMeltFraction() {
    return cellMeltFraction.clone();
  }
}
