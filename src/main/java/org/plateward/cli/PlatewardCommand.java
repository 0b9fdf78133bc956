package org.plateward.cli;

import java.util.List;
import java.util.function.Supplier;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code plateward} command: one subcommand per job. Exit codes: 0 done, 2 bad input
 * (configuration errors, bad arguments), 1 internal failure.
 */
@Command(
    name = "plateward",
    mixinStandardHelpOptions = true,
    versionProvider = PlatewardVersion.class,
    description = {
      "Advisory soft sensor for counter-current catalytic plate reformers.",
      "Advisory only: it never writes to the plant; site safety systems, operating procedures,"
          + " local codes and licensed engineering practice take precedence."
    },
    synopsisSubcommandLabel = "COMMAND",
    commandListHeading = "%nCommands:%n")
public final class PlatewardCommand implements Runnable {
  /** Exit code for bad input: configuration errors and bad arguments. */
  public static final int EXIT_BAD_INPUT = CommandLine.ExitCode.USAGE;

  /** Exit code for an internal failure. */
  public static final int EXIT_INTERNAL = CommandLine.ExitCode.SOFTWARE;

  /**
   * The subcommands, in the order {@code --help} lists them. Add a job by adding its command
   * object here.
   */
  static List<Supplier<Object>> subcommands() {
    return List.of(CheckCommand::new, SteadyCommand::new, PlantCommand::new, ReplayCommand::new,
        CalibrateCommand::new, ReportCommand::new, WatchCommand::new, DemoCommand::new);
  }

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Override
  public void run() {
    // no subcommand: show what there is to do
    spec.commandLine().usage(spec.commandLine().getOut());
  }

  /** A fully wired command line (subcommands, error handling); tests run it in-process. */
  public static CommandLine newCommandLine() {
    CommandLine cl = new CommandLine(new PlatewardCommand());
    for (Supplier<Object> sub : subcommands()) {
      cl.addSubcommand(sub.get());
    }
    cl.setExecutionExceptionHandler(new FailureHandler());
    return cl;
  }

  public static void main(String[] args) {
    System.exit(newCommandLine().execute(args));
  }
}
