/**
 * The replay file: recorded or simulated boundary signals, one row per frame, read by {@link
 * org.plateward.replay.ReplayReader} and written by {@link org.plateward.replay.ReplayWriter}.
 *
 * <h2>Format</h2>
 *
 * <ul>
 *   <li>UTF-8 text, one record per line, cells separated by ',' (no quoting; no cell contains a
 *       comma). Blank lines are skipped.
 *   <li>Comment lines start with '#'. Those before the header row are kept; every {@code
 *       key=value} token in them is metadata, e.g. {@code # scenario=feed-drop seed=7
 *       model=0.1.0}. Comment lines further down are skipped.
 *   <li>The header row names the columns. The first is {@code timestamp}; the others, in any
 *       order and any subset:
 *       <ul>
 *         <li>a canonical signal id ({@link org.plateward.signals.Signal#id()}), holding the value
 *             in the signal's edge unit (the unit its id names: Nm3/h, kg/h, degC, kPa absolute,
 *             mol% dry);
 *         <li>{@code status_<signal id>}: the OPC UA status name of that value ({@code Good},
 *             {@code Uncertain_SensorNotAccurate}, {@code Bad_SensorFailure}, ...; the names of
 *             {@link org.plateward.signals.StatusName}). Needs the value column too;
 *         <li>{@code truth_<name>} (lower-case letters, digits, '_'): simulation-only truth, in
 *             the unit its name carries. The simulated plant writes {@code
 *             truth_peak_plate_temp_c}, {@code truth_peak_position_m}, {@code
 *             truth_buffer_melt_fraction}, {@code truth_max_cell_melt_fraction}, {@code
 *             truth_time_to_exhaust_s} and one {@code truth_<parameter>} per drifting parameter
 *             (e.g. {@code truth_reforming_activity}).
 *       </ul>
 *   <li>{@code timestamp}: ISO 8601 in UTC with a 'Z', e.g. {@code 2026-03-04T05:06:07Z},
 *       fractional seconds allowed; strictly increasing from row to row.
 *   <li>Numbers: optional sign, decimal digits with an optional '.', optional exponent ({@code
 *       1.5e-3}). NaN, Infinity and words are errors. The writer uses plain notation with 9
 *       significant digits (relative rounding at most 5e-9).
 *   <li>An empty cell means missing: the value is NaN with quality MISSING, whatever its status
 *       says. A filled value is GOOD, or takes the severity (Good/Uncertain/Bad) of its status
 *       cell when there is one. A signal without a column is MISSING in every frame.
 *   <li>A row with more cells than the header is an error; a row with fewer is read with the
 *       missing trailing cells empty and counted as a partial row.
 * </ul>
 *
 * <p>Every format error is a {@link org.plateward.replay.ReplayFormatException} whose message
 * reads {@code file:line: column: message}.
 */
package org.plateward.replay;
