package org.plateward.cli;

import java.io.PrintWriter;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.plateward.config.PlatewardConfig;
import org.plateward.reactor.Geometry;
import org.plateward.reactor.UnitSpec;
import org.plateward.reactor.Zone;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * {@code plateward check}: reads and validates the configuration and prints a short summary of
 * the unit. Every problem is reported as {@code file:line: field: message} with exit code 2.
 * Nothing is ever written.
 */
@Command(
    name = "check",
    mixinStandardHelpOptions = true,
    description = "Validate the configuration file and summarise the unit it describes.")
public final class CheckCommand implements Callable<Integer> {
  @CommandLine.Mixin ConfigOption config;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() throws Exception {
    PrintWriter out = spec.commandLine().getOut();
    if (java.nio.file.Files.isRegularFile(config.file())) {
      org.plateward.config.FleetConfig fleet = org.plateward.config.FleetConfig.load(config.file());
      if (fleet.listsUnits()) {
        out.println(fleet.file() + ": valid, " + fleet.units().size() + " units");
        for (org.plateward.config.FleetConfig.FleetUnit u : fleet.units()) {
          out.println("unit " + u.id() + " (" + u.opcua().tags().size() + " tags from " + u.opcuaFile()
              + " on " + u.opcua().endpointUrl() + "):");
          out.print(summary(u.config()).replaceAll("(?m)^", "  "));
        }
        out.flush();
        return 0;
      }
    }
    PlatewardConfig cfg = config.load();
    out.print(summary(cfg));
    out.flush();
    return 0;
  }

  /** A few lines describing the unit, engineering units labelled. */
  static String summary(PlatewardConfig cfg) {
    UnitSpec u = cfg.unit();
    Geometry g = u.geometry();
    StringBuilder b = new StringBuilder();
    b.append(cfg.file()).append(": valid\n");
    line(b, "unit", u.name() + " at " + u.site());
    line(b, "plates", mm(g.lengthM()) + " long x " + mm(g.widthM()) + " wide, "
        + g.channelPairs() + " channel pairs");
    line(b, "gaps", mm(g.reformingGapM()) + " reforming, " + mm(g.combustionGapM()) + " combustion");
    line(b, "plate", mm(g.plateThicknessM()) + " " + u.plate().name() + ", limit "
        + degC(u.plate().materialLimitK()));
    line(b, "buffer", mm(g.bufferThicknessM()) + " " + u.buffer().name() + ", melts at "
        + degC(u.buffer().meltingPointK()));
    line(b, "coating", "reforming " + zones(g.reformingCoating()) + "; combustion "
        + zones(g.combustionCoating()));
    line(b, "model", u.grid().cells() + " cells");
    return b.toString();
  }

  private static void line(StringBuilder b, String label, String text) {
    b.append(String.format(Locale.ROOT, "  %-8s %s%n", label, text));
  }

  private static String mm(double m) {
    // four significant figures, no trailing zeros: 0.6 m -> "600 mm", 0.0012 m -> "1.2 mm"
    return new BigDecimal(m * 1e3).round(new MathContext(4)).stripTrailingZeros().toPlainString()
        + " mm";
  }

  private static String degC(double k) {
    return String.format(Locale.ROOT, "%.2f degC", k - 273.15);
  }

  private static String zones(List<Zone> zones) {
    if (zones.isEmpty()) {
      return "none";
    }
    StringBuilder b = new StringBuilder();
    for (Zone z : zones) {
      if (b.length() > 0) {
        b.append(", ");
      }
      b.append(mm(z.startM()).replace(" mm", "")).append("-").append(mm(z.endM()));
    }
    return b.toString();
  }
}
