package org.plateward.history;

import java.nio.file.Path;
import java.sql.SQLException;
import org.plateward.history.HistoryException.Problem;

/** Turns SQLite result codes into a {@link HistoryException} with plain words. */
final class SqliteFaults {
  // primary result codes, https://www.sqlite.org/rescode.html
  private static final int SQLITE_PERM = 3;
  private static final int SQLITE_IOERR = 10;
  private static final int SQLITE_CORRUPT = 11;
  private static final int SQLITE_FULL = 13;
  private static final int SQLITE_CANTOPEN = 14;
  private static final int SQLITE_READONLY = 8;
  private static final int SQLITE_NOTADB = 26;

  private SqliteFaults() {}

  static HistoryException of(Path file, String doing, SQLException e) {
    int code = e.getErrorCode() & 0xff;
    String detail = e.getMessage();
    return switch (code) {
      case SQLITE_READONLY, SQLITE_PERM -> new HistoryException(Problem.READ_ONLY,
          "history file " + file + " is read-only (" + doing + "): check the permissions of the"
              + " file and its folder", e);
      case SQLITE_FULL -> new HistoryException(Problem.FULL,
          "history file " + file + " is full (" + doing + "): the disk or the [history]"
              + " size cap is reached; free space or prune older history", e);
      case SQLITE_CANTOPEN -> new HistoryException(Problem.CANNOT_OPEN,
          "cannot open history file " + file + " (" + doing + "): the file or its folder cannot"
              + " be created or written", e);
      case SQLITE_CORRUPT, SQLITE_NOTADB -> new HistoryException(Problem.CORRUPT,
          "history file " + file + " is not a readable SQLite database or is damaged (" + doing
              + "); it was left untouched: move it aside to start a new history", e);
      case SQLITE_IOERR -> new HistoryException(Problem.IO,
          "input/output error on history file " + file + " (" + doing + "): " + detail, e);
      default -> new HistoryException(Problem.IO,
          "history file " + file + ": " + doing + " failed: " + detail, e);
    };
  }
}
