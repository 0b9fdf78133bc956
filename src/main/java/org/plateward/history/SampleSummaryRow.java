package org.plateward.history;

import java.time.Duration;
import java.time.Instant;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;

/**
 * The downsampled form of one signal over one interval, kept after the raw samples are pruned.
 *
 * @param signal the signal
 * @param start start of the interval
 * @param span length of the interval
 * @param min smallest value, SI (NaN when the interval held no value)
 * @param max largest value, SI (NaN when none)
 * @param mean arithmetic mean of the values, SI (NaN when none)
 * @param count number of stored samples with a value
 * @param worstQuality the worst quality seen in the interval
 */
public record SampleSummaryRow(
    Signal signal, Instant start, Duration span, double min, double max, double mean, long count,
    Quality worstQuality) {}
