package org.plateward.history;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.List;
import org.plateward.history.HistoryException.Problem;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Brings a history file to the newest schema version by applying the missing migrations in
 * order, each in its own transaction, and refuses a file written by a newer schema.
 *
 * <p>Version 0 is an empty SQLite file (no tables). A file with tables but no
 * {@code schema_version} table is not a Plateward history and is refused untouched.
 */
public final class SchemaMigrator {
  private static final Logger LOG = LoggerFactory.getLogger(SchemaMigrator.class);

  private final List<Migration> migrations;

  /**
   * @param migrations the steps, versions 1, 2, ... in order without holes
   */
  public SchemaMigrator(List<Migration> migrations) {
    for (int i = 0; i < migrations.size(); i++) {
      if (migrations.get(i).version() != i + 1) {
        throw new IllegalArgumentException("migration " + i + " has version "
            + migrations.get(i).version() + ", expected " + (i + 1));
      }
    }
    this.migrations = List.copyOf(migrations);
  }

  /** The newest version this migrator knows. */
  public int latestVersion() {
    return migrations.size();
  }

  /**
   * The schema version of an open file: 0 for an empty file.
   *
   * @throws HistoryException NOT_A_HISTORY when the file has other tables but no version table
   */
  static int versionOf(Connection c, Path file) throws SQLException, HistoryException {
    try (Statement s = c.createStatement()) {
      boolean hasVersionTable;
      int tables;
      try (ResultSet r = s.executeQuery("SELECT count(*), "
          + "coalesce(sum(name = 'schema_version'), 0) FROM sqlite_schema WHERE type = 'table'")) {
        r.next();
        tables = r.getInt(1);
        hasVersionTable = r.getInt(2) > 0;
      }
      if (!hasVersionTable) {
        if (tables == 0) {
          return 0;
        }
        throw new HistoryException(Problem.NOT_A_HISTORY, "file " + file + " is an SQLite"
            + " database with " + tables + " table(s) but no schema_version table: not a Plateward"
            + " history; it was left untouched: name another file in [history] path");
      }
      try (ResultSet r = s.executeQuery("SELECT coalesce(max(version), 0) FROM schema_version")) {
        r.next();
        return r.getInt(1);
      }
    }
  }

  /**
   * Applies the missing steps. The connection must be in auto-commit mode; it is left so.
   *
   * @return the version of the file afterwards
   * @throws HistoryException NEWER_SCHEMA when the file is newer than this migrator,
   *     NOT_A_HISTORY for a foreign database
   */
  public int migrate(Connection c, Path file) throws SQLException, HistoryException {
    int version = check(c, file);
    for (Migration m : migrations.subList(version, migrations.size())) {
      apply(c, m);
      LOG.info("history file {}: schema version {} ({})", file, m.version(), m.description());
    }
    return latestVersion();
  }

  /**
   * Reads the version of a file without writing to it.
   *
   * @return the file's version, at most {@link #latestVersion()}
   * @throws HistoryException NEWER_SCHEMA or NOT_A_HISTORY
   */
  public int check(Connection c, Path file) throws SQLException, HistoryException {
    int version = versionOf(c, file);
    if (version > latestVersion()) {
      throw new HistoryException(Problem.NEWER_SCHEMA, "history file " + file + " has schema"
          + " version " + version + ", newer than version " + latestVersion() + " that this"
          + " Plateward understands; it was left untouched: open it with a newer Plateward, or"
          + " name another file in [history] path");
    }
    return version;
  }

  private static void apply(Connection c, Migration m) throws SQLException {
    c.setAutoCommit(false);
    try (Statement s = c.createStatement()) {
      if (m.version() == 1) {
        s.execute("CREATE TABLE schema_version (version INTEGER PRIMARY KEY,"
            + " applied_ms INTEGER NOT NULL, description TEXT NOT NULL)");
      }
      for (String sql : m.statements()) {
        s.execute(sql);
      }
      try (PreparedStatement p = c.prepareStatement(
          "INSERT INTO schema_version (version, applied_ms, description) VALUES (?, ?, ?)")) {
        p.setInt(1, m.version());
        p.setLong(2, System.currentTimeMillis());
        p.setString(3, m.description());
        p.executeUpdate();
      }
      c.commit();
    } catch (SQLException e) {
      c.rollback();
      throw e;
    } finally {
      c.setAutoCommit(true);
    }
  }
}
