package org.plateward.history;

import java.util.List;

/**
 * The history schema as an ordered list of migrations. Add a step by appending a
 * {@link Migration} with the next version; never edit a step that has shipped.
 *
 * <h2>Layout (version 1)</h2>
 *
 * <ul>
 *   <li>{@code signals(id, name, meaning, unit)}: a small integer key per signal; {@code name}
 *       is {@link org.plateward.signals.Signal#id()}, {@code unit} the SI unit values are
 *       stored in.
 *   <li>{@code samples(time_ms, signal, value, quality)}: one row per signal per frame, time as
 *       UTC epoch milliseconds in an INTEGER, {@code WITHOUT ROWID} with primary key
 *       {@code (time_ms, signal)}. The key is the only index, so a row costs its record plus
 *       one b-tree cell (about 20 bytes); frames arrive in time order, so every insert appends
 *       at the right edge of the tree and pages fill completely; a time range (frames, replay,
 *       pruning) is one contiguous range scan. A signal's trend over a range reads the other
 *       signals of that range too (17 rows for one), which is acceptable for the ranges raw
 *       data covers; longer trends use the summaries. A value that is not a finite number is
 *       stored as NULL; a signal MISSING from a frame has no row.
 *   <li>{@code sample_summaries(signal, start_ms, span_ms, min_value, max_value, mean_value,
 *       value_count, worst_quality)}: the downsampled form kept after raw samples are pruned,
 *       keyed by {@code (signal, start_ms)} because it serves long per-signal trends.
 *   <li>{@code estimates(time_ms INTEGER PRIMARY KEY, scalars..., parameters, cell_temp_k,
 *       cell_melt_fraction)}: one row per estimate keyed by time (the rowid itself, no extra
 *       index). The per-cell profiles are BLOBs of single-precision floats (see {@link
 *       ProfileCodec}) in the same row: an estimate is always written and read whole, so a
 *       child table would add a key and a cell per value (about 3× the bytes) and a join.
 *   <li>{@code alarm_events}, {@code operator_actions}: append-only audit trail with an
 *       autoincrementing id (order of arrival) and a time index; never pruned.
 *   <li>{@code runs(run_id, started_ms, source, config_file, unit_name, model_version)}.
 *   <li>{@code gaps(id, start_ms, end_ms, reason)}: periods with no data.
 *   <li>{@code prune_marks(what, through_ms)}: how far thinning has gone, so pruning does not
 *       rescan old rows.
 *   <li>{@code schema_version(version, applied_ms, description)}: one row per applied step.
 * </ul>
 *
 * <h2>Version 2</h2>
 *
 * <ul>
 *   <li>{@code advisor_suggestions(id, time_ms, verdict, trim_percent, limit_k,
 *       hold_peak_upper_k, trim_peak_upper_k, hold_max_melt_fraction, trim_max_melt_fraction,
 *       hold_conversion, trim_conversion, horizon_s, message, label)}: every fuel-trim
 *       suggestion, append-only with a time index, never pruned (like the audit trail).
 * </ul>
 */
public final class HistorySchema {
  private HistorySchema() {}

  /** SQLite {@code application_id} of a Plateward history file ("PlWd" in ASCII). */
  public static final int APPLICATION_ID = 0x506C5764;

  /** Quality codes in the {@code quality} columns; larger is worse. */
  static final int QUALITY_GOOD = 0;
  static final int QUALITY_UNCERTAIN = 1;
  static final int QUALITY_BAD = 2;

  static final Migration V1 = new Migration(1, "history tables", List.of(
      "CREATE TABLE signals (id INTEGER PRIMARY KEY, name TEXT NOT NULL UNIQUE,"
          + " meaning TEXT NOT NULL, unit TEXT NOT NULL)",
      "CREATE TABLE samples (time_ms INTEGER NOT NULL, signal INTEGER NOT NULL, value REAL,"
          + " quality INTEGER NOT NULL, PRIMARY KEY (time_ms, signal)) WITHOUT ROWID",
      "CREATE TABLE sample_summaries (signal INTEGER NOT NULL, start_ms INTEGER NOT NULL,"
          + " span_ms INTEGER NOT NULL, min_value REAL, max_value REAL, mean_value REAL,"
          + " value_count INTEGER NOT NULL, worst_quality INTEGER NOT NULL,"
          + " PRIMARY KEY (signal, start_ms)) WITHOUT ROWID",
      "CREATE TABLE estimates (time_ms INTEGER PRIMARY KEY, peak_plate_temp_k REAL,"
          + " peak_plate_temp_sd_k REAL, peak_position_m REAL, buffer_melt_fraction REAL,"
          + " buffer_melt_fraction_sd REAL, max_cell_melt_fraction REAL,"
          + " time_to_exhaust_s REAL, time_to_exhaust_sd_s REAL, nis REAL,"
          + " status TEXT NOT NULL, status_reason TEXT, parameters TEXT NOT NULL,"
          + " cell_temp_k BLOB NOT NULL, cell_melt_fraction BLOB NOT NULL)",
      "CREATE TABLE alarm_events (id INTEGER PRIMARY KEY, time_ms INTEGER NOT NULL,"
          + " alarm_id TEXT NOT NULL, transition TEXT NOT NULL, priority TEXT NOT NULL,"
          + " value REAL, limit_value REAL, message TEXT NOT NULL)",
      "CREATE INDEX alarm_events_by_time ON alarm_events (time_ms)",
      "CREATE TABLE operator_actions (id INTEGER PRIMARY KEY, time_ms INTEGER NOT NULL,"
          + " who TEXT NOT NULL, action TEXT NOT NULL, alarm_id TEXT, reason TEXT,"
          + " expiry_ms INTEGER)",
      "CREATE INDEX operator_actions_by_time ON operator_actions (time_ms)",
      "CREATE TABLE runs (run_id TEXT PRIMARY KEY, started_ms INTEGER NOT NULL,"
          + " source TEXT NOT NULL CHECK (source IN ('live', 'replay', 'demo')),"
          + " config_file TEXT, unit_name TEXT, model_version TEXT)",
      "CREATE TABLE gaps (id INTEGER PRIMARY KEY, start_ms INTEGER NOT NULL,"
          + " end_ms INTEGER NOT NULL, reason TEXT NOT NULL)",
      "CREATE INDEX gaps_by_start ON gaps (start_ms)",
      "CREATE TABLE prune_marks (what TEXT PRIMARY KEY, through_ms INTEGER NOT NULL)"));

  static final Migration V2 = new Migration(2, "advisor suggestions", List.of(
      "CREATE TABLE advisor_suggestions (id INTEGER PRIMARY KEY, time_ms INTEGER NOT NULL,"
          + " verdict TEXT NOT NULL, trim_percent REAL NOT NULL, limit_k REAL,"
          + " hold_peak_upper_k REAL, trim_peak_upper_k REAL, hold_max_melt_fraction REAL,"
          + " trim_max_melt_fraction REAL, hold_conversion REAL, trim_conversion REAL,"
          + " horizon_s REAL, message TEXT NOT NULL, label TEXT NOT NULL)",
      "CREATE INDEX advisor_suggestions_by_time ON advisor_suggestions (time_ms)"));

  /** The schema this Plateward writes, oldest step first. */
  public static final List<Migration> MIGRATIONS = List.of(V1, V2);

  /** The version a file has after all {@link #MIGRATIONS}. */
  public static int currentVersion() {
    return MIGRATIONS.get(MIGRATIONS.size() - 1).version();
  }
}
