/**
 * History: every frame, estimate, alarm event, operator action, run and data gap, kept in one
 * SQLite file (xerial sqlite-jdbc) so upsets can be replayed and audited.
 *
 * <h2>Writing</h2>
 * {@link org.plateward.history.HistoryRecorder} is the only writer: producers (the OPC UA
 * client, the estimator, the alarm module) call its non-blocking {@code append} methods; one
 * thread owns the one write connection and commits a batch in one IMMEDIATE transaction every
 * 250 ms (configurable, at most 1 s) or every 2000 entries. WAL journal, synchronous=NORMAL for
 * the high-rate tables, synchronous=FULL for batches that carry audit records, busy timeout
 * 5 s. A killed process loses at most the last batch interval or so; the file stays
 * consistent.
 *
 * <h2>Faults</h2>
 * Nothing in this package throws at a producer. A file that is read-only, full, damaged, of a
 * newer schema or not a history turns {@link org.plateward.history.HistoryHealth} to
 * NOT_KEEPING with the reason, and the counters say how much was not stored; monitoring goes
 * on. Faults that may clear are retried; when writing resumes a gap row covers what was lost.
 * A failed transaction is rolled back, and a file that is not recognised is never written to.
 *
 * <h2>Reading</h2>
 * {@link org.plateward.history.HistoryReader} opens its own read-only connection for
 * time-range queries; {@link org.plateward.history.HistoryFrameStream} pages through frames for
 * replay without holding a read transaction open.
 *
 * <p>The schema and the reasons for its layout are in {@link org.plateward.history.HistorySchema};
 * retention and downsampling in {@link org.plateward.history.HistoryRecorder#prune}.
 */
package org.plateward.history;
