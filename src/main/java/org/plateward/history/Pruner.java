package org.plateward.history;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

/**
 * Retention and downsampling, run on the writer connection in short transactions (one hour of
 * raw data each) so the writer can commit queued entries between them.
 *
 * <ul>
 *   <li>Raw samples older than {@code now - rawRetention} (rounded down to a whole span) become
 *       one row per signal and span in {@code sample_summaries}: min, max, mean and count of
 *       the values, and the worst quality; then the raw rows are deleted.
 *   <li>Estimates older than that keep only the last one of each span.
 *   <li>Summaries, estimates and gaps older than {@code now - summaryRetention} are deleted.
 *   <li>Alarm events, operator actions and runs are the audit trail and are never deleted.
 * </ul>
 */
final class Pruner {
  static final long CHUNK_MS = 3_600_000L;
  private static final String ESTIMATES_MARK = "estimates_thinned_through";

  private final Connection c;
  private final HistorySettings settings;
  private final Runnable between;

  /**
   * @param between run after each chunk's commit (the writer stores queued entries there)
   */
  Pruner(Connection c, HistorySettings settings, Runnable between) {
    this.c = c;
    this.settings = settings;
    this.between = between;
  }

  PruneReport prune(Instant now) throws SQLException {
    long span = settings.summarySpan().toMillis();
    long nowMs = now.toEpochMilli();
    long rawCutoff = Math.floorDiv(nowMs - settings.rawRetention().toMillis(), span) * span;
    long oldCutoff = nowMs - settings.summaryRetention().toMillis();
    long chunk = Math.max(span, CHUNK_MS / span * span);
    long summarised = 0;
    long written = 0;
    long thinned = 0;
    while (true) {
      Long first = scalar("SELECT min(time_ms) FROM samples");
      if (first == null || first >= rawCutoff) {
        break;
      }
      long start = Math.floorDiv(first, span) * span;
      long end = Math.min(rawCutoff, start + chunk);
      begin();
      try (PreparedStatement ins = c.prepareStatement("INSERT OR REPLACE INTO sample_summaries"
              + " (signal, start_ms, span_ms, min_value, max_value, mean_value, value_count,"
              + " worst_quality) SELECT signal, (time_ms / ?1) * ?1, ?1, min(value), max(value),"
              + " avg(value), count(value), max(quality) FROM samples"
              + " WHERE time_ms >= ?2 AND time_ms < ?3 GROUP BY signal, time_ms / ?1");
          PreparedStatement del = c.prepareStatement(
              "DELETE FROM samples WHERE time_ms >= ? AND time_ms < ?")) {
        ins.setLong(1, span);
        ins.setLong(2, start);
        ins.setLong(3, end);
        written += ins.executeUpdate();
        del.setLong(1, start);
        del.setLong(2, end);
        summarised += del.executeUpdate();
        commit();
      } catch (SQLException e) {
        rollback();
        throw e;
      }
      between.run();
    }
    Long mark = scalar("SELECT through_ms FROM prune_marks WHERE what = '" + ESTIMATES_MARK + "'");
    long from = mark == null ? Long.MIN_VALUE : mark;
    while (true) {
      Long first = scalarWith("SELECT min(time_ms) FROM estimates WHERE time_ms >= ?", from);
      if (first == null || first >= rawCutoff) {
        break;
      }
      long start = Math.floorDiv(first, span) * span;
      long end = Math.min(rawCutoff, start + chunk);
      begin();
      try (PreparedStatement del = c.prepareStatement("DELETE FROM estimates"
              + " WHERE time_ms >= ?2 AND time_ms < ?3 AND time_ms NOT IN (SELECT max(time_ms)"
              + " FROM estimates WHERE time_ms >= ?2 AND time_ms < ?3 GROUP BY time_ms / ?1)");
          PreparedStatement m = c.prepareStatement(
              "INSERT OR REPLACE INTO prune_marks (what, through_ms) VALUES (?, ?)")) {
        del.setLong(1, span);
        del.setLong(2, start);
        del.setLong(3, end);
        thinned += del.executeUpdate();
        m.setString(1, ESTIMATES_MARK);
        m.setLong(2, end);
        m.executeUpdate();
        commit();
      } catch (SQLException e) {
        rollback();
        throw e;
      }
      from = end;
      between.run();
    }
    long summariesExpired = 0;
    long estimatesExpired;
    long gapsExpired;
    List<Integer> keys = new ArrayList<>();
    try (Statement s = c.createStatement(); ResultSet r = s.executeQuery("SELECT id FROM signals")) {
      while (r.next()) {
        keys.add(r.getInt(1));
      }
    }
    begin();
    try (PreparedStatement sum = c.prepareStatement(
            "DELETE FROM sample_summaries WHERE signal = ? AND start_ms < ?");
        PreparedStatement est = c.prepareStatement("DELETE FROM estimates WHERE time_ms < ?");
        PreparedStatement gap = c.prepareStatement("DELETE FROM gaps WHERE end_ms < ?")) {
      for (int k : keys) {
        sum.setInt(1, k);
        sum.setLong(2, oldCutoff);
        summariesExpired += sum.executeUpdate();
      }
      est.setLong(1, oldCutoff);
      estimatesExpired = est.executeUpdate();
      gap.setLong(1, oldCutoff);
      gapsExpired = gap.executeUpdate();
      commit();
    } catch (SQLException e) {
      rollback();
      throw e;
    }
    try (Statement s = c.createStatement()) {
      s.execute("PRAGMA incremental_vacuum");
      s.execute("PRAGMA wal_checkpoint(TRUNCATE)");
    }
    return new PruneReport(summarised, written, thinned, summariesExpired, estimatesExpired,
        gapsExpired);
  }

  private Long scalar(String sql) throws SQLException {
    try (Statement s = c.createStatement(); ResultSet r = s.executeQuery(sql)) {
      if (!r.next()) {
        return null;
      }
      long v = r.getLong(1);
      return r.wasNull() ? null : v;
    }
  }

  private Long scalarWith(String sql, long arg) throws SQLException {
    try (PreparedStatement p = c.prepareStatement(sql)) {
      p.setLong(1, arg);
      try (ResultSet r = p.executeQuery()) {
        if (!r.next()) {
          return null;
        }
        long v = r.getLong(1);
        return r.wasNull() ? null : v;
      }
    }
  }

  private void begin() throws SQLException {
    try (Statement s = c.createStatement()) {
      s.execute("BEGIN IMMEDIATE");
    }
  }

  private void commit() throws SQLException {
    try (Statement s = c.createStatement()) {
      s.execute("COMMIT");
    }
  }

  private void rollback() {
    try (Statement s = c.createStatement()) {
      s.execute("ROLLBACK");
    } catch (SQLException ignored) {
      // no transaction was open
    }
  }
}
