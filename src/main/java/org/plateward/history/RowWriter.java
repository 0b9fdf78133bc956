package org.plateward.history;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.sql.Types;
import java.time.Instant;
import java.util.List;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;

/**
 * Inserts queued entries on the write connection with reused prepared statements. Owned by the
 * writer thread; the caller opens and commits the transaction.
 */
final class RowWriter implements AutoCloseable {
  private final int[] signalKey = new int[Signal.COUNT];
  private final PreparedStatement sample;
  private final PreparedStatement estimate;
  private final PreparedStatement alarm;
  private final PreparedStatement action;
  private final PreparedStatement run;
  private final PreparedStatement gap;
  private final Connection conn;
  private PreparedStatement suggestion; // prepared at first use: a version-1 file has no table for it

  RowWriter(Connection c) throws SQLException {
    conn = c;
    registerSignals(c, signalKey);
    sample = c.prepareStatement(
        "INSERT OR REPLACE INTO samples (time_ms, signal, value, quality) VALUES (?, ?, ?, ?)");
    estimate = c.prepareStatement("INSERT OR REPLACE INTO estimates (time_ms, peak_plate_temp_k,"
        + " peak_plate_temp_sd_k, peak_position_m, buffer_melt_fraction, buffer_melt_fraction_sd,"
        + " max_cell_melt_fraction, time_to_exhaust_s, time_to_exhaust_sd_s, nis, status,"
        + " status_reason, parameters, cell_temp_k, cell_melt_fraction)"
        + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)");
    alarm = c.prepareStatement("INSERT INTO alarm_events (time_ms, alarm_id, transition,"
        + " priority, value, limit_value, message) VALUES (?, ?, ?, ?, ?, ?, ?)");
    action = c.prepareStatement("INSERT INTO operator_actions (time_ms, who, action, alarm_id,"
        + " reason, expiry_ms) VALUES (?, ?, ?, ?, ?, ?)");
    run = c.prepareStatement("INSERT OR REPLACE INTO runs (run_id, started_ms, source,"
        + " config_file, unit_name, model_version) VALUES (?, ?, ?, ?, ?, ?)");
    gap = c.prepareStatement("INSERT INTO gaps (start_ms, end_ms, reason) VALUES (?, ?, ?)");
  }

  /** Inserts the signal catalogue (names not yet present) and reads every signal's key. */
  static void registerSignals(Connection c, int[] keyByOrdinal) throws SQLException {
    boolean auto = c.getAutoCommit();
    c.setAutoCommit(false);
    try (PreparedStatement ins = c.prepareStatement(
        "INSERT OR IGNORE INTO signals (name, meaning, unit) VALUES (?, ?, ?)")) {
      for (Signal s : Signal.values()) {
        ins.setString(1, s.id());
        ins.setString(2, s.meaning());
        ins.setString(3, s.unit().siLabel());
        ins.addBatch();
      }
      ins.executeBatch();
      c.commit();
    } catch (SQLException e) {
      c.rollback();
      throw e;
    } finally {
      c.setAutoCommit(auto);
    }
    try (Statement st = c.createStatement();
        ResultSet r = st.executeQuery("SELECT id, name FROM signals")) {
      while (r.next()) {
        Signal s = Signal.byId(r.getString(2));
        if (s != null) {
          keyByOrdinal[s.ordinal()] = r.getInt(1);
        }
      }
    }
  }

  /** Inserts the entries; returns the number of SQL rows written. */
  long write(List<Object> entries) throws SQLException {
    long rows = 0;
    boolean samples = false;
    for (Object e : entries) {
      if (e instanceof Frame f) {
        rows += addFrame(f);
        samples = true;
      } else if (e instanceof EstimateRow r) {
        bindEstimate(r);
        estimate.executeUpdate();
        rows++;
      } else if (e instanceof AlarmEventRow a) {
        alarm.setLong(1, a.time().toEpochMilli());
        alarm.setString(2, a.alarmId());
        alarm.setString(3, a.transition());
        alarm.setString(4, a.priority());
        setReal(alarm, 5, a.value());
        setReal(alarm, 6, a.limit());
        alarm.setString(7, a.message());
        alarm.executeUpdate();
        rows++;
      } else if (e instanceof OperatorActionRow a) {
        action.setLong(1, a.time().toEpochMilli());
        action.setString(2, a.who());
        action.setString(3, a.action());
        action.setString(4, a.alarmId());
        action.setString(5, a.reason());
        setTime(action, 6, a.expiry());
        action.executeUpdate();
        rows++;
      } else if (e instanceof RunRow r) {
        run.setString(1, r.runId());
        run.setLong(2, r.started().toEpochMilli());
        run.setString(3, r.source().stored());
        run.setString(4, r.configFile());
        run.setString(5, r.unitName());
        run.setString(6, r.modelVersion());
        run.executeUpdate();
        rows++;
      } else if (e instanceof SuggestionRow g) {
        bindSuggestion(g);
        suggestion.executeUpdate();
        rows++;
      } else if (e instanceof GapRow g) {
        gap.setLong(1, g.start().toEpochMilli());
        gap.setLong(2, g.end().toEpochMilli());
        gap.setString(3, g.reason());
        gap.executeUpdate();
        rows++;
      } else {
        throw new IllegalArgumentException("not a history entry: " + e.getClass());
      }
    }
    if (samples) {
      sample.executeBatch();
    }
    return rows;
  }

  private int addFrame(Frame f) throws SQLException {
    long t = f.time().toEpochMilli();
    int n = 0;
    for (Signal s : Signal.values()) {
      Quality q = f.quality(s);
      if (q == Quality.MISSING) {
        continue;
      }
      sample.setLong(1, t);
      sample.setInt(2, signalKey[s.ordinal()]);
      setReal(sample, 3, f.valueSi(s));
      sample.setInt(4, qualityCode(q));
      sample.addBatch();
      n++;
    }
    return n;
  }

  private void bindEstimate(EstimateRow r) throws SQLException {
    estimate.setLong(1, r.time().toEpochMilli());
    setReal(estimate, 2, r.peakPlateTempK());
    setReal(estimate, 3, r.peakPlateTempSdK());
    setReal(estimate, 4, r.peakPositionM());
    setReal(estimate, 5, r.bufferMeltFraction());
    setReal(estimate, 6, r.bufferMeltFractionSd());
    setReal(estimate, 7, r.maxCellMeltFraction());
    setReal(estimate, 8, r.timeToExhaustS());
    setReal(estimate, 9, r.timeToExhaustSdS());
    setReal(estimate, 10, r.nis());
    estimate.setString(11, r.status());
    estimate.setString(12, r.statusReason());
    estimate.setString(13, ProfileCodec.encodeParameters(r.parameters()));
    estimate.setBytes(14, ProfileCodec.encodeProfile(r.cellTempKShared()));
    estimate.setBytes(15, ProfileCodec.encodeProfile(r.cellMeltFractionShared()));
  }

  private void bindSuggestion(SuggestionRow g) throws SQLException {
    if (suggestion == null) {
      suggestion = conn.prepareStatement("INSERT INTO advisor_suggestions (time_ms, verdict, trim_percent,"
          + " limit_k, hold_peak_upper_k, trim_peak_upper_k, hold_max_melt_fraction, trim_max_melt_fraction,"
          + " hold_conversion, trim_conversion, horizon_s, message, label)"
          + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)");
    }
    suggestion.setLong(1, g.time().toEpochMilli());
    suggestion.setString(2, g.verdict());
    suggestion.setDouble(3, Double.isFinite(g.trimPercent()) ? g.trimPercent() : 0.0);
    setReal(suggestion, 4, g.limitK());
    setReal(suggestion, 5, g.holdPeakUpperK());
    setReal(suggestion, 6, g.trimPeakUpperK());
    setReal(suggestion, 7, g.holdMaxMeltFraction());
    setReal(suggestion, 8, g.trimMaxMeltFraction());
    setReal(suggestion, 9, g.holdConversion());
    setReal(suggestion, 10, g.trimConversion());
    setReal(suggestion, 11, g.horizonS());
    suggestion.setString(12, g.text());
    suggestion.setString(13, g.label());
  }

  static int qualityCode(Quality q) {
    return switch (q) {
      case GOOD -> HistorySchema.QUALITY_GOOD;
      case UNCERTAIN -> HistorySchema.QUALITY_UNCERTAIN;
      case BAD, MISSING -> HistorySchema.QUALITY_BAD;
    };
  }

  static Quality quality(int code) {
    return switch (code) {
      case HistorySchema.QUALITY_GOOD -> Quality.GOOD;
      case HistorySchema.QUALITY_UNCERTAIN -> Quality.UNCERTAIN;
      default -> Quality.BAD;
    };
  }

  /** Binds a double; a value that is not finite becomes NULL (SQLite has no NaN). */
  private static void setReal(PreparedStatement p, int i, double v) throws SQLException {
    if (Double.isFinite(v)) {
      p.setDouble(i, v);
    } else {
      p.setNull(i, Types.REAL);
    }
  }

  private static void setTime(PreparedStatement p, int i, Instant t) throws SQLException {
    if (t == null) {
      p.setNull(i, Types.INTEGER);
    } else {
      p.setLong(i, t.toEpochMilli());
    }
  }

  /** Clears any half-added batch after a failed transaction. */
  void reset() {
    try {
      sample.clearBatch();
    } catch (SQLException ignored) {
      // the statement is reused; a failed clear shows up at the next write
    }
  }

  @Override
  public void close() {
    for (PreparedStatement p : new PreparedStatement[] {sample, estimate, alarm, action, run, gap, suggestion}) {
      try {
        if (p != null) {
          p.close();
        }
      } catch (SQLException ignored) {
        // closing on shutdown
      }
    }
  }
}
