package org.plateward.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.plateward.config.ConfigFixtures;
import picocli.CommandLine;

class PlatewardCommandTest {
  /** One in-process run: exit code and what went to stdout and stderr. */
  record Run(int exit, String out, String err) {}

  static Run run(CommandLine cl, String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    cl.setOut(new PrintWriter(out, true));
    cl.setErr(new PrintWriter(err, true));
    int exit = cl.execute(args);
    return new Run(exit, out.toString(), err.toString());
  }

  static Run run(String... args) {
    return run(PlatewardCommand.newCommandLine(), args);
  }

  @Test
  void checkOnTheDefaultConfigSucceedsAndSummarisesTheUnit() {
    Run r = run("check");
    assertThat(r.exit()).isZero();
    assertThat(r.err()).isEmpty();
    assertThat(r.out())
        .startsWith("config/plateward.toml: valid")
        .contains("TM-PR1 at Tarnmoor gas-to-liquids pilot")
        .contains("600 mm long x 200 mm wide, 24 channel pairs")
        .contains("0.6 mm copper, melts at 1084.62 degC") // ITS-90: 1357.77 K - 273.15
        .contains("80 cells");
  }

  @Test
  void checkTakesTheConfigOptionInBothSpellings() {
    assertThat(run("check", "-c", ConfigFixtures.DEMO.toString()).exit()).isZero();
    assertThat(run("check", "--config", ConfigFixtures.DEMO.toString()).exit()).isZero();
  }

  static Stream<ConfigFixtures.Case> cases() {
    return ConfigFixtures.cases().stream();
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("cases")
  void checkOnABrokenFileExitsTwoWithFileLineField(ConfigFixtures.Case c) {
    Run r = run("check", "-c", c.file().toString());
    assertThat(r.exit()).isEqualTo(2);
    assertThat(r.out()).isEmpty();
    assertThat(r.err()).startsWith(c.prefix()).contains(c.messagePart());
    assertThat(r.err()).doesNotContain("Exception").doesNotContain("\tat ");
  }

  @Test
  void aMissingConfigFileIsBadInput() {
    Run r = run("check", "-c", "no/such/plateward.toml");
    assertThat(r.exit()).isEqualTo(2);
    assertThat(r.err()).startsWith("no/such/plateward.toml: no such file");
  }

  @Test
  void onlyTheDefaultFileGetsTheWorkingFolderHint() {
    // the default path exists here (tests run in the project folder), so only the other
    // branch can be exercised in-process: a named file gets the plain message
    Run r = run("check", "-c", "config/none.toml");
    assertThat(r.exit()).isEqualTo(2);
    assertThat(r.err()).startsWith("config/none.toml: no such file" + System.lineSeparator());
  }

  @Test
  void badArgumentsAreBadInput() {
    assertThat(run("check", "--no-such-option").exit()).isEqualTo(2);
    assertThat(run("no-such-command").exit()).isEqualTo(2);
  }

  @Test
  void helpAndVersionSucceed() {
    Run help = run("--help");
    assertThat(help.exit()).isZero();
    assertThat(help.out()).contains("check").contains("Advisory only");
    Run version = run("--version");
    assertThat(version.exit()).isZero();
    assertThat(version.out()).startsWith("plateward ");
    Run checkHelp = run("check", "--help");
    assertThat(checkHelp.out()).contains("-c, --config=FILE").contains("config/plateward.toml");
  }

  @CommandLine.Command(name = "fail")
  static final class FailingCommand implements Callable<Integer> {
    @Override
    public Integer call() {
      throw new IllegalStateException("simulated fault");
    }
  }

  @Test
  void anInternalFailureExitsOneWithAOneLineMessage() {
    CommandLine cl = PlatewardCommand.newCommandLine();
    cl.addSubcommand(new FailingCommand());
    Run r = run(cl, "fail");
    assertThat(r.exit()).isEqualTo(1);
    assertThat(r.err()).isEqualTo("plateward: internal failure: java.lang.IllegalStateException: simulated fault"
        + System.lineSeparator());
  }
}
