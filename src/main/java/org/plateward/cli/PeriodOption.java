package org.plateward.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import org.plateward.history.HistoryException;
import org.plateward.replay.HistoryFrameSource;
import org.plateward.replay.ReplayFormatException;
import org.plateward.replay.ReplayFrameSource;
import org.plateward.softsensor.FrameSource;
import picocli.CommandLine;
import picocli.CommandLine.Option;

/**
 * The recorded period a command works on (a picocli mixin): {@code --input F.csv}, or {@code
 * --db F --from T1 --to T2} with ISO 8601 times with zone.
 */
public final class PeriodOption {
  @Option(names = "--input", paramLabel = "F.csv", description = "Replay file.")
  Path input;

  @Option(names = "--db", paramLabel = "F", description = "History database (with --from and --to).")
  Path db;

  @Option(names = "--from", paramLabel = "T1", description = "Start of the period (with --db), e.g. 2031-03-05T14:00:00Z.")
  String from;

  @Option(names = "--to", paramLabel = "T2", description = "End of the period (with --db, exclusive).")
  String to;

  /** Checks the combination; throws a parameter exception naming what is wrong. */
  void check(CommandLine cl) {
    if ((input == null) == (db == null)) {
      throw new CommandLine.ParameterException(cl, "give either --input F.csv or --db F --from T1 --to T2");
    }
    if (input != null && (from != null || to != null)) {
      throw new CommandLine.ParameterException(cl, "--from and --to go with --db");
    }
    if (db != null) {
      if (from == null || to == null) {
        throw new CommandLine.ParameterException(cl, "--db needs --from T1 and --to T2");
      }
      if (!toInstant(cl).isAfter(fromInstant(cl))) {
        throw new CommandLine.ParameterException(cl, "--to (" + to + ") must be after --from (" + from + ")");
      }
    }
  }

  boolean isHistory() {
    return db != null;
  }

  Path file() {
    return db != null ? db : input;
  }

  Instant fromInstant(CommandLine cl) {
    return instant(cl, "--from", from);
  }

  Instant toInstant(CommandLine cl) {
    return instant(cl, "--to", to);
  }

  /** Words for messages and file headers. */
  String describe(CommandLine cl) {
    return db != null ? db + " from " + fromInstant(cl) + " to " + toInstant(cl) : input.toString();
  }

  /**
   * Opens the frames.
   *
   * @throws ReplayFormatException when the replay file is absent or malformed
   * @throws HistoryException when the database cannot be read
   */
  FrameSource open(CommandLine cl) throws IOException, HistoryException {
    if (db != null) {
      if (!Files.isReadable(db)) {
        throw new HistoryException(HistoryException.Problem.CANNOT_OPEN, db + ": no such file or not readable");
      }
      return HistoryFrameSource.open(db, fromInstant(cl), toInstant(cl));
    }
    if (!Files.isReadable(input)) {
      throw new ReplayFormatException(input.toString(), 0, "--input", "no such file or not readable");
    }
    return ReplayFrameSource.open(input);
  }

  private static Instant instant(CommandLine cl, String option, String text) {
    try {
      return java.time.OffsetDateTime.parse(text).toInstant();
    } catch (java.time.format.DateTimeParseException e) {
      throw new CommandLine.ParameterException(cl,
          option + ": not an ISO 8601 time with zone such as 2031-03-05T14:00:00Z, got '" + text + "'");
    }
  }
}
