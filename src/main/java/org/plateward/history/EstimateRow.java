package org.plateward.history;

import java.time.Instant;
import java.util.Arrays;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;
import java.util.Collections;
import java.util.regex.Pattern;

/**
 * What history keeps of one estimate: the headline scalars with their standard deviations, the
 * estimator's consistency (NIS) and status, the estimated model parameters and the per-cell
 * plate profile. SI throughout.
 *
 * <p>History stores the two profiles in IEEE 754 single precision (see {@link ProfileCodec}),
 * so a profile read back equals {@code (double) (float) x} of what was written.
 *
 * @param time time of the frame the estimate belongs to
 * @param peakPlateTempK hidden peak plate temperature, K
 * @param peakPlateTempSdK its standard deviation, K
 * @param peakPositionM position of the hidden peak along the plate, m
 * @param bufferMeltFraction overall melt fraction of the buffer layer, 1
 * @param bufferMeltFractionSd its standard deviation, 1
 * @param maxCellMeltFraction largest melt fraction of any cell, 1
 * @param timeToExhaustS forecast time until the buffer is spent, s (NaN = none forecast)
 * @param timeToExhaustSdS its standard deviation, s (NaN = none)
 * @param nis normalised innovation squared of the update, 1 (NaN when no update)
 * @param status estimator status, in the estimator's words
 * @param statusReason why, when the status is not the normal one (may be null)
 * @param parameters estimated model parameters by name (names of letters, digits, {@code _ . -})
 * @param cellTempK plate temperature per cell, K
 * @param cellMeltFraction buffer melt fraction per cell, 1
 */
public record EstimateRow(
    Instant time,
    double peakPlateTempK,
    double peakPlateTempSdK,
    double peakPositionM,
    double bufferMeltFraction,
    double bufferMeltFractionSd,
    double maxCellMeltFraction,
    double timeToExhaustS,
    double timeToExhaustSdS,
    double nis,
    String status,
    String statusReason,
    Map<String, Double> parameters,
    double[] cellTempK,
    double[] cellMeltFraction) {
  private static final Pattern NAME = Pattern.compile("[A-Za-z0-9_.\\-]+");

  public EstimateRow {
    Objects.requireNonNull(time, "time");
    Objects.requireNonNull(status, "status");
    Objects.requireNonNull(cellTempK, "cellTempK");
    Objects.requireNonNull(cellMeltFraction, "cellMeltFraction");
    TreeMap<String, Double> p = new TreeMap<>();
    if (parameters != null) {
      for (Map.Entry<String, Double> e : parameters.entrySet()) {
        if (!NAME.matcher(e.getKey()).matches()) {
          throw new IllegalArgumentException(
              "parameter name \"" + e.getKey() + "\": use letters, digits, _ . - only");
        }
        p.put(e.getKey(), Objects.requireNonNull(e.getValue(), e.getKey()));
      }
    }
    parameters = Collections.unmodifiableSortedMap(p);
    cellTempK = cellTempK.clone();
    cellMeltFraction = cellMeltFraction.clone();
  }

  @Override
  public double[] cellTempK() {
    return cellTempK.clone();
  }

  @Override
  public double[] cellMeltFraction() {
    return cellMeltFraction.clone();
  }

  double[] cellTempKShared() {
    return cellTempK;
  }

  double[] cellMeltFractionShared() {
    return cellMeltFraction;
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof EstimateRow e
        && time.equals(e.time)
        && Double.compare(peakPlateTempK, e.peakPlateTempK) == 0
        && Double.compare(peakPlateTempSdK, e.peakPlateTempSdK) == 0
        && Double.compare(peakPositionM, e.peakPositionM) == 0
        && Double.compare(bufferMeltFraction, e.bufferMeltFraction) == 0
        && Double.compare(bufferMeltFractionSd, e.bufferMeltFractionSd) == 0
        && Double.compare(maxCellMeltFraction, e.maxCellMeltFraction) == 0
        && Double.compare(timeToExhaustS, e.timeToExhaustS) == 0
        && Double.compare(timeToExhaustSdS, e.timeToExhaustSdS) == 0
        && Double.compare(nis, e.nis) == 0
        && status.equals(e.status)
        && Objects.equals(statusReason, e.statusReason)
        && parameters.equals(e.parameters)
        && Arrays.equals(cellTempK, e.cellTempK)
        && Arrays.equals(cellMeltFraction, e.cellMeltFraction);
  }

  @Override
  public int hashCode() {
    return time.hashCode() * 31 + Arrays.hashCode(cellTempK);
  }

  @Override
  public String toString() {
    return "EstimateRow[" + time + ", peak " + peakPlateTempK + " K, status " + status + "]";
  }
}
