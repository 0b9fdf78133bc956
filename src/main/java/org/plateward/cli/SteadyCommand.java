package org.plateward.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.plateward.Advisory;
import org.plateward.config.PlatewardConfig;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.PlateReactorModel;
import org.plateward.reactor.SteadySummary;
import org.plateward.reactor.UnitSpec;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code plateward steady}: the steady state of the configured unit at its normal operating
 * point (hot start, lit branch), as a short table or one JSON object.
 */
@Command(
    name = "steady",
    mixinStandardHelpOptions = true,
    description = "Solve and summarise the steady state of the configured unit at its operating point.")
public final class SteadyCommand implements Callable<Integer> {
  @CommandLine.Mixin ConfigOption config;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Option(names = "--json", description = "Print one JSON object instead of the table.")
  boolean json;

  @Option(names = "--cells", paramLabel = "N", description = "Override the number of model cells (at least 3).")
  Integer cells;

  @Override
  public Integer call() throws Exception {
    PlatewardConfig cfg = config.load();
    UnitSpec unit = cfg.unit();
    if (cells != null) {
      if (cells < 3) {
        throw new CommandLine.ParameterException(spec.commandLine(), "--cells: must be at least 3, got " + cells);
      }
      unit = unit.withGrid(unit.grid().withCells(cells));
    }
    PlateReactorModel model = new PlateReactorModel(unit);
    SteadySummary s = SteadySummary.solve(model, unit.operatingPoint(), ModelParameters.nominal(unit));
    PrintWriter out = spec.commandLine().getOut();
    if (json) {
      out.println(new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsString(jsonFields(unit, s)));
    } else {
      out.print(table(unit, s));
    }
    out.flush();
    return 0;
  }

  static Map<String, Object> jsonFields(UnitSpec unit, SteadySummary s) {
    Map<String, Object> m = new LinkedHashMap<>();
    m.put("unit", unit.name());
    m.put("site", unit.site());
    m.put("peak_plate_temp_c", s.peakPlateTempK() - 273.15);
    m.put("peak_position_m", s.peakPositionM());
    m.put("ref_outlet_temp_c", s.refOutletTempK() - 273.15);
    m.put("comb_outlet_temp_c", s.combOutletTempK() - 273.15);
    m.put("methane_conversion", s.methaneConversion());
    m.put("comb_methane_conversion", s.combMethaneConversion());
    m.put("buffer_melt_fraction", s.bufferMeltFraction());
    m.put("max_cell_melt_fraction", s.maxCellMeltFraction());
    m.put("buffer_melting_point_c", unit.buffer().meltingPointK() - 273.15);
    m.put("margin_to_melting_k", unit.buffer().meltingPointK() - s.peakPlateTempK());
    m.put("energy_balance_rel_error", s.energyBalanceRelError());
    m.put("element_balance_rel_error", s.elementBalanceRelError());
    m.put("cells", s.cells());
    m.put("solver_iterations", s.iterations());
    m.put("caution", Advisory.SHORT);
    return m;
  }

  static String table(UnitSpec unit, SteadySummary s) {
    StringBuilder b = new StringBuilder();
    b.append("Steady state of ").append(unit.name()).append(" at ").append(unit.site())
        .append(" (").append(s.cells()).append(" cells, ").append(s.iterations()).append(" solver iterations)\n");
    row(b, "hidden peak plate temperature", String.format(Locale.ROOT, "%.1f degC at z = %.3f m",
        s.peakPlateTempK() - 273.15, s.peakPositionM()));
    row(b, "margin to buffer melting", String.format(Locale.ROOT, "%.1f K (melts at %.2f degC)",
        unit.buffer().meltingPointK() - s.peakPlateTempK(), unit.buffer().meltingPointK() - 273.15));
    row(b, "buffer melt fraction", String.format(Locale.ROOT, "%.3f overall, %.3f in the hottest cell",
        s.bufferMeltFraction(), s.maxCellMeltFraction()));
    row(b, "reformed gas outlet", String.format(Locale.ROOT, "%.1f degC", s.refOutletTempK() - 273.15));
    row(b, "flue gas outlet", String.format(Locale.ROOT, "%.1f degC", s.combOutletTempK() - 273.15));
    row(b, "methane conversion", String.format(Locale.ROOT, "%.2f %% reforming, %.2f %% combustion",
        100 * s.methaneConversion(), 100 * s.combMethaneConversion()));
    row(b, "balances (relative)", String.format(Locale.ROOT, "energy %.1e, elements %.1e",
        s.energyBalanceRelError(), s.elementBalanceRelError()));
    b.append('\n').append(Advisory.FULL).append('\n');
    return b.toString();
  }

  private static void row(StringBuilder b, String label, String value) {
    b.append(String.format(Locale.ROOT, "  %-31s %s%n", label, value));
  }
}
