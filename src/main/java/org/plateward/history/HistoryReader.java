package org.plateward.history;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.plateward.signals.Frame;
import org.plateward.signals.Signal;

/**
 * Time-range queries over a history file, on its own read-only connection (the writer is never
 * blocked). Ranges are half-open: {@code from} inclusive, {@code to} exclusive. Each query is a
 * short read; nothing holds a read transaction between calls, so WAL checkpoints are not
 * starved. One reader per thread.
 *
 * <p>Frames are rebuilt from the samples of each stored time: a signal with no row at that time
 * is MISSING with a NaN value. A period with no stored frame at all yields no frame; the
 * {@link #gaps} table says why when the cause was recorded.
 */
public final class HistoryReader implements AutoCloseable {
  private final Path file;
  private final Connection conn;
  private final Map<Integer, Signal> signalByKey = new HashMap<>();

  private HistoryReader(Path file, Connection conn) throws SQLException {
    this.file = file;
    this.conn = conn;
    try (Statement s = conn.createStatement();
        ResultSet r = s.executeQuery("SELECT id, name FROM signals")) {
      while (r.next()) {
        Signal sig = Signal.byId(r.getString(2));
        if (sig != null) {
          signalByKey.put(r.getInt(1), sig);
        }
      }
    }
  }

  /**
   * Opens an existing history file read-only.
   *
   * @throws HistoryException when the file is absent, damaged, not a history or of another
   *     schema version
   */
  public static HistoryReader open(Path file) throws HistoryException {
    Connection c = HistoryDatabase.openReader(file);
    try {
      return new HistoryReader(file, c);
    } catch (SQLException e) {
      HistoryDatabase.closeQuietly(c);
      throw SqliteFaults.of(file, "reading the signal table", e);
    }
  }

  /** The frames stored in [from, to), time order, all in memory (see {@link #frameStream}). */
  public List<Frame> frames(Instant from, Instant to) throws HistoryException {
    List<Frame> out = new ArrayList<>();
    try (HistoryFrameStream s = frameStream(from, to)) {
      while (s.hasNext()) {
        out.add(s.next());
      }
    } catch (IllegalStateException e) {
      if (e.getCause() instanceof HistoryException h) {
        throw h;
      }
      throw e;
    }
    return out;
  }

  /**
   * The frames stored in [from, to) in time order, read page by page (a few thousand rows at a
   * time), for replay. Close it when done.
   */
  public HistoryFrameStream frameStream(Instant from, Instant to) {
    return new HistoryFrameStream(this, from.toEpochMilli(), to.toEpochMilli());
  }

  /** One page of frames after {@code afterMs} (exclusive) and before {@code toMs}. */
  List<Frame> page(long afterMs, long toMs, int maxRows) throws HistoryException {
    List<Frame> out = new ArrayList<>();
    try (PreparedStatement p = conn.prepareStatement("SELECT time_ms, signal, value, quality"
        + " FROM samples WHERE time_ms > ? AND time_ms < ? ORDER BY time_ms, signal LIMIT ?")) {
      p.setLong(1, afterMs);
      p.setLong(2, toMs);
      p.setInt(3, maxRows);
      int n = 0;
      long current = Long.MIN_VALUE;
      double[] v = null;
      org.plateward.signals.Quality[] q = null;
      try (ResultSet r = p.executeQuery()) {
        while (r.next()) {
          n++;
          long t = r.getLong(1);
          if (t != current) {
            if (v != null) {
              out.add(new Frame(Instant.ofEpochMilli(current), v, q));
            }
            current = t;
            v = new double[Signal.COUNT];
            Arrays.fill(v, Double.NaN);
            q = new org.plateward.signals.Quality[Signal.COUNT];
            Arrays.fill(q, org.plateward.signals.Quality.MISSING);
          }
          Signal s = signalByKey.get(r.getInt(2));
          if (s == null) {
            continue;
          }
          double value = r.getDouble(3);
          v[s.ordinal()] = r.wasNull() ? Double.NaN : value;
          q[s.ordinal()] = RowWriter.quality(r.getInt(4));
        }
      }
      // the last time may be cut by the LIMIT: keep it only when the page was not full
      if (v != null && n < maxRows) {
        out.add(new Frame(Instant.ofEpochMilli(current), v, q));
      }
      if (n == maxRows && out.isEmpty()) {
        throw new HistoryException(HistoryException.Problem.IO, "page of " + maxRows
            + " rows holds less than one frame");
      }
      return out;
    } catch (SQLException e) {
      throw SqliteFaults.of(file, "reading samples", e);
    }
  }

  /** The estimates stored in [from, to), time order. */
  public List<EstimateRow> estimates(Instant from, Instant to) throws HistoryException {
    List<EstimateRow> out = new ArrayList<>();
    try (PreparedStatement p = conn.prepareStatement("SELECT time_ms, peak_plate_temp_k,"
        + " peak_plate_temp_sd_k, peak_position_m, buffer_melt_fraction, buffer_melt_fraction_sd,"
        + " max_cell_melt_fraction, time_to_exhaust_s, time_to_exhaust_sd_s, nis, status,"
        + " status_reason, parameters, cell_temp_k, cell_melt_fraction FROM estimates"
        + " WHERE time_ms >= ? AND time_ms < ? ORDER BY time_ms")) {
      range(p, from, to);
      try (ResultSet r = p.executeQuery()) {
        while (r.next()) {
          out.add(new EstimateRow(Instant.ofEpochMilli(r.getLong(1)), real(r, 2), real(r, 3),
              real(r, 4), real(r, 5), real(r, 6), real(r, 7), real(r, 8), real(r, 9),
              real(r, 10), r.getString(11), r.getString(12),
              ProfileCodec.decodeParameters(r.getString(13)),
              ProfileCodec.decodeProfile(r.getBytes(14)),
              ProfileCodec.decodeProfile(r.getBytes(15))));
        }
      }
    } catch (SQLException e) {
      throw SqliteFaults.of(file, "reading estimates", e);
    }
    return out;
  }

  /** The alarm events in [from, to), in the order they were stored. */
  public List<AlarmEventRow> alarmEvents(Instant from, Instant to) throws HistoryException {
    List<AlarmEventRow> out = new ArrayList<>();
    try (PreparedStatement p = conn.prepareStatement("SELECT time_ms, alarm_id, transition,"
        + " priority, value, limit_value, message FROM alarm_events"
        + " WHERE time_ms >= ? AND time_ms < ? ORDER BY time_ms, id")) {
      range(p, from, to);
      try (ResultSet r = p.executeQuery()) {
        while (r.next()) {
          out.add(new AlarmEventRow(Instant.ofEpochMilli(r.getLong(1)), r.getString(2),
              r.getString(3), r.getString(4), real(r, 5), real(r, 6), r.getString(7)));
        }
      }
    } catch (SQLException e) {
      throw SqliteFaults.of(file, "reading alarm events", e);
    }
    return out;
  }

  /** The operator actions in [from, to), in the order they were stored. */
  public List<OperatorActionRow> operatorActions(Instant from, Instant to)
      throws HistoryException {
    List<OperatorActionRow> out = new ArrayList<>();
    try (PreparedStatement p = conn.prepareStatement("SELECT time_ms, who, action, alarm_id,"
        + " reason, expiry_ms FROM operator_actions WHERE time_ms >= ? AND time_ms < ?"
        + " ORDER BY time_ms, id")) {
      range(p, from, to);
      try (ResultSet r = p.executeQuery()) {
        while (r.next()) {
          long expiry = r.getLong(6);
          Instant exp = r.wasNull() ? null : Instant.ofEpochMilli(expiry);
          out.add(new OperatorActionRow(Instant.ofEpochMilli(r.getLong(1)), r.getString(2),
              r.getString(3), r.getString(4), r.getString(5), exp));
        }
      }
    } catch (SQLException e) {
      throw SqliteFaults.of(file, "reading operator actions", e);
    }
    return out;
  }

  /** The fuel-trim suggestions in [from, to), in the order they were stored. */
  public List<SuggestionRow> suggestions(Instant from, Instant to) throws HistoryException {
    List<SuggestionRow> out = new ArrayList<>();
    try (PreparedStatement p = conn.prepareStatement("SELECT time_ms, verdict, trim_percent, limit_k,"
        + " hold_peak_upper_k, trim_peak_upper_k, hold_max_melt_fraction, trim_max_melt_fraction,"
        + " hold_conversion, trim_conversion, horizon_s, message, label FROM advisor_suggestions"
        + " WHERE time_ms >= ? AND time_ms < ? ORDER BY time_ms, id")) {
      range(p, from, to);
      try (ResultSet r = p.executeQuery()) {
        while (r.next()) {
          out.add(new SuggestionRow(Instant.ofEpochMilli(r.getLong(1)), r.getString(2), r.getDouble(3),
              real(r, 4), real(r, 5), real(r, 6), real(r, 7), real(r, 8), real(r, 9), real(r, 10), real(r, 11),
              r.getString(12), r.getString(13)));
        }
      }
    } catch (SQLException e) {
      throw SqliteFaults.of(file, "reading advisor suggestions", e);
    }
    return out;
  }

  /** The gaps that overlap [from, to), by start. */
  public List<GapRow> gaps(Instant from, Instant to) throws HistoryException {
    List<GapRow> out = new ArrayList<>();
    try (PreparedStatement p = conn.prepareStatement("SELECT start_ms, end_ms, reason FROM gaps"
        + " WHERE end_ms >= ? AND start_ms < ? ORDER BY start_ms, id")) {
      range(p, from, to);
      try (ResultSet r = p.executeQuery()) {
        while (r.next()) {
          out.add(new GapRow(Instant.ofEpochMilli(r.getLong(1)), Instant.ofEpochMilli(r.getLong(2)),
              r.getString(3)));
        }
      }
    } catch (SQLException e) {
      throw SqliteFaults.of(file, "reading gaps", e);
    }
    return out;
  }

  /** Every run, by start. */
  public List<RunRow> runs() throws HistoryException {
    List<RunRow> out = new ArrayList<>();
    try (Statement s = conn.createStatement();
        ResultSet r = s.executeQuery("SELECT run_id, started_ms, source, config_file, unit_name,"
            + " model_version FROM runs ORDER BY started_ms")) {
      while (r.next()) {
        out.add(new RunRow(r.getString(1), Instant.ofEpochMilli(r.getLong(2)),
            SourceKind.byStored(r.getString(3)), r.getString(4), r.getString(5), r.getString(6)));
      }
    } catch (SQLException e) {
      throw SqliteFaults.of(file, "reading runs", e);
    }
    return out;
  }

  /** The downsampled rows of one signal with start in [from, to). */
  public List<SampleSummaryRow> summaries(Signal signal, Instant from, Instant to)
      throws HistoryException {
    Integer key = null;
    for (Map.Entry<Integer, Signal> e : signalByKey.entrySet()) {
      if (e.getValue() == signal) {
        key = e.getKey();
      }
    }
    List<SampleSummaryRow> out = new ArrayList<>();
    if (key == null) {
      return out;
    }
    try (PreparedStatement p = conn.prepareStatement("SELECT start_ms, span_ms, min_value,"
        + " max_value, mean_value, value_count, worst_quality FROM sample_summaries"
        + " WHERE signal = ? AND start_ms >= ? AND start_ms < ? ORDER BY start_ms")) {
      p.setInt(1, key);
      p.setLong(2, from.toEpochMilli());
      p.setLong(3, to.toEpochMilli());
      try (ResultSet r = p.executeQuery()) {
        while (r.next()) {
          out.add(new SampleSummaryRow(signal, Instant.ofEpochMilli(r.getLong(1)),
              Duration.ofMillis(r.getLong(2)), real(r, 3), real(r, 4), real(r, 5), r.getLong(6),
              RowWriter.quality(r.getInt(7))));
        }
      }
    } catch (SQLException e) {
      throw SqliteFaults.of(file, "reading summaries", e);
    }
    return out;
  }

  private static void range(PreparedStatement p, Instant from, Instant to) throws SQLException {
    p.setLong(1, from.toEpochMilli());
    p.setLong(2, to.toEpochMilli());
  }

  private static double real(ResultSet r, int i) throws SQLException {
    double v = r.getDouble(i);
    return r.wasNull() ? Double.NaN : v;
  }

  @Override
  public void close() {
    HistoryDatabase.closeQuietly(conn);
  }
}
