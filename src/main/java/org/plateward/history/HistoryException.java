package org.plateward.history;

/** History cannot be opened or written; {@link #problem()} says which kind of fault it is. */
public final class HistoryException extends Exception {
  /** The kinds of fault, each with whether trying again later can help. */
  public enum Problem {
    /** The file or its folder cannot be written. */
    READ_ONLY(true),
    /** The disk, or the configured size cap, is full. */
    FULL(true),
    /** The file cannot be opened or created (missing folder, permissions, not a file). */
    CANNOT_OPEN(true),
    /** The file is not an SQLite database, or its pages are damaged. */
    CORRUPT(false),
    /** An SQLite database, but not a Plateward history. */
    NOT_A_HISTORY(false),
    /** Written by a newer Plateward: schema version higher than this one understands. */
    NEWER_SCHEMA(false),
    /** Another input/output or database error. */
    IO(true);

    private final boolean retryable;

    Problem(boolean retryable) {
      this.retryable = retryable;
    }

    /** Whether the same operation may succeed later without the user changing anything. */
    public boolean retryable() {
      return retryable;
    }
  }

  private final Problem problem;

  public HistoryException(Problem problem, String message, Throwable cause) {
    super(message, cause);
    this.problem = problem;
  }

  public HistoryException(Problem problem, String message) {
    this(problem, message, null);
  }

  public Problem problem() {
    return problem;
  }
}
