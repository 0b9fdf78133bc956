package org.plateward.replay;

/**
 * A replay file that does not follow the format. The message reads {@code file:line: column:
 * message}; the CLI maps this exception to exit code 2.
 */
public final class ReplayFormatException extends RuntimeException {
  private final String file;
  private final long line;
  private final String column;
  private final String problem;

  /**
   * @param file file name as given by the caller
   * @param line 1-based physical line number
   * @param column the column (header name) the problem is in
   * @param problem what is wrong, in words
   */
  public ReplayFormatException(String file, long line, String column, String problem) {
    super(file + ":" + line + ": " + column + ": " + problem);
    this.file = file;
    this.line = line;
    this.column = column;
    this.problem = problem;
  }

  public String file() {
    return file;
  }

  public long line() {
    return line;
  }

  public String column() {
    return column;
  }

  public String problem() {
    return problem;
  }
}
