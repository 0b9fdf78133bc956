package org.plateward.estimation;

/**
 * A raised CUSUM drift alarm on one measurement channel.
 *
 * @param channel index of the channel within its measurement model
 * @param direction +1 if the measurement reads high against the model, −1 if low
 * @param sinceTimeS estimated start of the drift: last time the CUSUM statistic was zero (s)
 * @param raisedAtTimeS time the statistic crossed its threshold (s)
 */
public record DriftAlarm(int channel, int direction, double sinceTimeS, double raisedAtTimeS) {}
