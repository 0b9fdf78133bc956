package org.plateward.history;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import org.plateward.history.HistoryException.Problem;
import org.sqlite.SQLiteConfig;
import org.sqlite.SQLiteOpenMode;

/**
 * Opens connections to a history file with the settings every connection needs: WAL journal,
 * a 5 s busy timeout (the driver's default is 3 s), IMMEDIATE transactions for the single
 * writer, a cap on the -wal file left after checkpoints. Readers are separate read-only
 * connections.
 */
final class HistoryDatabase {
  /** Busy timeout, ms: readers and the writer wait this long for each other's locks. */
  static final int BUSY_TIMEOUT_MS = 5000;

  /** The -wal file is truncated to this size after a checkpoint, bytes. */
  static final int JOURNAL_SIZE_LIMIT_BYTES = 64 * 1024 * 1024;

  private HistoryDatabase() {}

  /**
   * Opens the write connection, creating the file and its folder when absent, and migrates the
   * schema. Synchronous mode is NORMAL: with WAL the file stays consistent after a crash and at
   * most the last commits are lost on power loss.
   */
  static Connection openWriter(Path file, SchemaMigrator migrator, long maxDatabaseBytes)
      throws HistoryException {
    Path folder = file.toAbsolutePath().getParent();
    try {
      if (folder != null) {
        Files.createDirectories(folder);
      }
    } catch (AccessDeniedException e) {
      throw new HistoryException(Problem.READ_ONLY, "cannot create the history folder " + folder
          + ": permission denied", e);
    } catch (FileSystemException e) {
      throw new HistoryException(readOnlyFs(e) ? Problem.READ_ONLY : Problem.CANNOT_OPEN,
          "cannot create the history folder " + folder + ": " + reasonOf(e), e);
    } catch (IOException e) {
      throw new HistoryException(Problem.CANNOT_OPEN, "cannot create the history folder "
          + folder + ": " + e.getMessage(), e);
    }
    if (Files.exists(file) && !Files.isRegularFile(file)) {
      throw new HistoryException(Problem.CANNOT_OPEN, "history file " + file
          + " exists but is not a regular file");
    }
    SQLiteConfig cfg = new SQLiteConfig();
    cfg.setSynchronous(SQLiteConfig.SynchronousMode.NORMAL);
    cfg.setBusyTimeout(BUSY_TIMEOUT_MS);
    cfg.setTransactionMode(SQLiteConfig.TransactionMode.IMMEDIATE);
    cfg.setJournalSizeLimit(JOURNAL_SIZE_LIMIT_BYTES);
    cfg.setGetGeneratedKeys(false);
    Connection c = null;
    try {
      c = DriverManager.getConnection(url(file), cfg.toProperties());
      // check what the file is before anything is written to it (switching to WAL rewrites
      // the header)
      int version = migrator.check(c, file);
      String mode = pragma(c, "journal_mode = WAL");
      if (!"wal".equalsIgnoreCase(mode)) {
        throw new HistoryException(Problem.READ_ONLY, "history file " + file
            + " could not be switched to WAL journal mode (it stays in \"" + mode + "\"): is the"
            + " file or its folder read-only?");
      }
      if (version == 0) {
        try (Statement s = c.createStatement()) {
          // only takes effect before the first table; lets prune return freed pages to the disk
          s.execute("PRAGMA auto_vacuum = INCREMENTAL");
        }
      }
      migrator.migrate(c, file);
      try (Statement s = c.createStatement()) {
        if (Integer.parseInt(pragma(c, "application_id")) == 0) {
          s.execute("PRAGMA application_id = " + HistorySchema.APPLICATION_ID);
        }
        // proves the file can be written now, not at the first batch
        s.executeUpdate("INSERT OR REPLACE INTO prune_marks (what, through_ms) VALUES"
            + " ('last_opened', " + System.currentTimeMillis() + ")");
        if (maxDatabaseBytes > 0) {
          long pageSize = Long.parseLong(pragma(c, "page_size"));
          s.execute("PRAGMA max_page_count = " + Math.max(1, maxDatabaseBytes / pageSize));
        }
      }
      return c;
    } catch (SQLException e) {
      closeQuietly(c);
      throw SqliteFaults.of(file, "opening for writing", e);
    } catch (LinkageError e) {
      closeQuietly(c);
      throw nativeLibrary(e);
    } catch (HistoryException e) {
      closeQuietly(c);
      throw e;
    }
  }

  /** Opens a read-only connection to an existing history file and checks its version. */
  static Connection openReader(Path file) throws HistoryException {
    if (!Files.isRegularFile(file)) {
      throw new HistoryException(Problem.CANNOT_OPEN, "no history file " + file);
    }
    SQLiteConfig cfg = new SQLiteConfig();
    cfg.setReadOnly(true);
    cfg.setOpenMode(SQLiteOpenMode.READONLY);
    cfg.setBusyTimeout(BUSY_TIMEOUT_MS);
    Connection c = null;
    try {
      c = DriverManager.getConnection(url(file), cfg.toProperties());
      int version = new SchemaMigrator(HistorySchema.MIGRATIONS).check(c, file);
      int known = HistorySchema.currentVersion();
      if (version < known) {
        throw new HistoryException(Problem.NOT_A_HISTORY, "history file " + file + " has schema"
            + " version " + version + "; open it for writing once (plateward watch or demo) to"
            + " bring it to version " + known);
      }
      return c;
    } catch (SQLException e) {
      closeQuietly(c);
      throw SqliteFaults.of(file, "opening for reading", e);
    } catch (LinkageError e) {
      closeQuietly(c);
      throw nativeLibrary(e);
    } catch (HistoryException e) {
      closeQuietly(c);
      throw e;
    }
  }

  /**
   * The driver extracts its native library to the temporary folder; a folder mounted noexec
   * (or missing) makes that fail.
   */
  private static HistoryException nativeLibrary(LinkageError e) {
    return new HistoryException(Problem.IO, "the SQLite native library could not be loaded ("
        + e.getMessage() + "): start Plateward with -Dorg.sqlite.tmpdir=<a folder that allows"
        + " executables>", e);
  }

  static String url(Path file) {
    return "jdbc:sqlite:" + file.toAbsolutePath();
  }

  static String pragma(Connection c, String name) throws SQLException {
    try (Statement s = c.createStatement(); ResultSet r = s.executeQuery("PRAGMA " + name)) {
      return r.next() ? r.getString(1) : "";
    }
  }

  static void closeQuietly(Connection c) {
    if (c != null) {
      try {
        c.close();
      } catch (SQLException ignored) {
        // nothing more to do with a connection that failed
      }
    }
  }

  private static boolean readOnlyFs(FileSystemException e) {
    String r = e.getReason();
    return r != null && (r.contains("Read-only") || r.contains("Operation not permitted"));
  }

  private static String reasonOf(FileSystemException e) {
    return e.getReason() != null ? e.getReason() : e.getMessage();
  }
}
