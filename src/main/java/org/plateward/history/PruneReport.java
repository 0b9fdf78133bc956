package org.plateward.history;

/**
 * What one {@link HistoryRecorder#prune} did.
 *
 * @param samplesSummarised raw sample rows folded into summaries and deleted
 * @param summariesWritten summary rows written
 * @param estimatesThinned estimates deleted because an older span keeps only its last one
 * @param summariesExpired summary rows deleted after the summary retention
 * @param estimatesExpired estimates deleted after the summary retention
 * @param gapsExpired gap rows deleted after the summary retention
 */
public record PruneReport(
    long samplesSummarised, long summariesWritten, long estimatesThinned, long summariesExpired,
    long estimatesExpired, long gapsExpired) {}
