package org.plateward.cli;

import java.io.PrintWriter;
import org.plateward.config.ConfigError;
import org.plateward.config.InvalidConfigException;
import org.plateward.replay.ReplayFormatException;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import picocli.CommandLine;

/**
 * Turns exceptions escaping a command into exit codes: configuration errors are printed one
 * per line as {@code file:line: field: message} and give exit code 2; anything else is an
 * internal failure, exit code 1, with a one-line message (the stack trace goes to the log).
 */
final class FailureHandler implements CommandLine.IExecutionExceptionHandler {
  private static final Logger LOG = LoggerFactory.getLogger(FailureHandler.class);

  @Override
  public int handleExecutionException(
      Exception ex, CommandLine cmd, CommandLine.ParseResult parseResult) {
    PrintWriter err = cmd.getErr();
    if (ex instanceof InvalidConfigException invalid) {
      for (ConfigError e : invalid.errors()) {
        err.println(e.format());
      }
      int n = invalid.errors().size();
      err.println(n + (n == 1 ? " problem" : " problems") + " found; nothing was changed.");
      err.flush();
      return PlatewardCommand.EXIT_BAD_INPUT;
    }
    if (ex instanceof ReplayFormatException bad) {
      err.println(bad.getMessage());
      err.println("1 problem found; nothing was written.");
      err.flush();
      return PlatewardCommand.EXIT_BAD_INPUT;
    }
    LOG.error("internal failure in '{}'", cmd.getCommandName(), ex);
    err.println("plateward: internal failure: " + ex);
    err.flush();
    return PlatewardCommand.EXIT_INTERNAL;
  }
}
