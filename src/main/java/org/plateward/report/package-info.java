/**
 * Upset reports for a recorded period: the estimates (from the soft sensor over the frames, or as
 * stored in history) and the advisory alarm events are gathered in an {@link
 * org.plateward.report.UpsetRecord}; {@link org.plateward.report.UpsetReport} writes the plots,
 * the alarm-event and key-figure CSV files and summary.txt with the cautions. Everything in a
 * report is advisory.
 */
package org.plateward.report;
