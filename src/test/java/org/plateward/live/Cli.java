package org.plateward.live;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.plateward.cli.PlatewardCommand;
import picocli.CommandLine;

/** Runs the {@code plateward} command line in-process and keeps what it printed. */
record Cli(int exit, String out, String err) {
  static Cli run(String... args) {
    CommandLine cl = PlatewardCommand.newCommandLine();
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    cl.setOut(new PrintWriter(out, true));
    cl.setErr(new PrintWriter(err, true));
    int code = cl.execute(args);
    return new Cli(code, out.toString(), err.toString());
  }
}
