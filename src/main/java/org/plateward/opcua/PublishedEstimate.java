package org.plateward.opcua;

import java.time.Instant;

/**
 * The soft-sensor values one unit publishes per estimate, in the units named. Independent of the
 * estimator's own classes; the caller copies its result into this record.
 *
 * @param time estimate time (becomes the SourceTimestamp)
 * @param peakTempC hidden peak plate temperature, degC
 * @param peakTempSdK its standard deviation, K
 * @param peakPositionM position of the hidden peak from the reforming inlet, m
 * @param meltFraction overall buffer-layer melt fraction, 0..1
 * @param maxCellMeltFraction largest melt fraction of any cell, 0..1
 * @param timeToExhaustS time-to-exhaust of the buffer layer, s (+Inf when not melting)
 * @param timeToExhaustSdS its standard deviation, s
 * @param status estimator status in words (e.g. "tracking", "inputs stale")
 * @param activeAlarms number of active alarms
 */
public record PublishedEstimate(
    Instant time,
    double peakTempC,
    double peakTempSdK,
    double peakPositionM,
    double meltFraction,
    double maxCellMeltFraction,
    double timeToExhaustS,
    double timeToExhaustSdS,
    String status,
    int activeAlarms) {}
