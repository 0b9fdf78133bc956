package org.plateward.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.function.Consumer;
import org.plateward.config.Dimension;
import org.plateward.config.PlatewardConfig;
import org.plateward.config.Quantity;
import org.plateward.config.QuantityFormatException;
import org.plateward.config.ScenarioLoader;
import org.plateward.opcua.EndpointPortInUseException;
import org.plateward.opcua.PlantEndpoint;
import org.plateward.opcua.PlantEndpointConfig;
import org.plateward.plant.PlantRecorder;
import org.plateward.plant.PlantRun;
import org.plateward.plant.PlantSample;
import org.plateward.plant.Scenario;
import org.plateward.plant.SimulatedPlant;
import org.plateward.signals.Signal;
import org.plateward.signals.StatusName;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code plateward plant}: runs the simulated plant through a scenario, serving every boundary
 * signal on a read-only OPC UA endpoint and/or recording a replay file with the hidden truth.
 *
 * <p>Serving: always, except for {@code --record} with {@code --speed max} and no {@code --port}
 * (a fast recording has no live reader). Recording keeps the frames in memory and writes the
 * file when the run ends (time-to-exhaust is known only in hindsight).
 */
@Command(
    name = "plant",
    mixinStandardHelpOptions = true,
    description = {
      "Run the simulated plant (invented data) through a scenario: serve it over OPC UA and/or record a replay file.",
      "A run with --speed max prints how many times faster than real time it went."
    })
public final class PlantCommand implements Callable<Integer> {
  @CommandLine.Mixin ConfigOption config;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Option(names = "--scenario", required = true, paramLabel = "FILE", description = "Scenario file (TOML).")
  Path scenarioFile;

  @Option(names = "--port", paramLabel = "P",
      description = "TCP port of the OPC UA endpoint on 127.0.0.1 (default " + PlantEndpointConfig.DEFAULT_PORT + "; 0 = any free port).")
  Integer port;

  @Option(names = "--speed", paramLabel = "X|max", defaultValue = "1",
      description = "Simulated seconds per wall-clock second, or max (default: ${DEFAULT-VALUE}).")
  String speed;

  @Option(names = "--duration", paramLabel = "D", description = "Run length overriding the scenario's, e.g. \"30 min\".")
  String duration;

  @Option(names = "--record", paramLabel = "OUT.csv", description = "Write a replay file with status and truth columns.")
  Path record;

  @Option(names = "--cells", paramLabel = "N", description = "Cells of the truth grid, overriding the scenario (at least 3).")
  Integer cells;

  @Override
  public Integer call() throws Exception {
    PlatewardConfig cfg = config.load();
    Scenario scenario = ScenarioLoader.load(scenarioFile);
    double pace = parseSpeed();
    if (duration != null) {
      scenario = scenario.withDuration(parseDuration());
    }
    if (cells != null) {
      if (cells < 3) {
        throw new CommandLine.ParameterException(spec.commandLine(), "--cells: must be at least 3, got " + cells);
      }
      scenario = scenario.withTruth(scenario.truth().withCells(cells));
    }
    PrintWriter err = spec.commandLine().getErr();
    boolean serve = record == null || Double.isFinite(pace) || port != null;
    PlantEndpoint endpoint = null;
    if (serve) {
      int p = port == null ? PlantEndpointConfig.DEFAULT_PORT : port;
      if (p < 0 || p > 65535) {
        throw new CommandLine.ParameterException(spec.commandLine(), "--port: must be 0..65535, got " + p);
      }
      try {
        endpoint = PlantEndpoint.start(PlantEndpointConfig.defaults().withPort(p));
      } catch (EndpointPortInUseException e) {
        err.println("plateward plant: " + e.getMessage());
        err.flush();
        return PlatewardCommand.EXIT_BAD_INPUT;
      }
      err.println("plateward plant: serving " + endpoint.endpointUrl() + " (read-only, invented data)");
    }
    try {
      err.println("plateward plant: scenario " + scenario.name() + ", seed " + scenario.seed() + ", "
          + scenario.frames() + " frames, truth grid " + scenario.truth().cells() + " cells; solving the initial steady state");
      err.flush();
      SimulatedPlant plant = new SimulatedPlant(cfg.unit(), scenario);
      PlantRecorder recorder = record == null ? null : new PlantRecorder();
      Consumer<PlantSample> sink = s -> { };
      if (endpoint != null) {
        sink = sink.andThen(publisherTo(endpoint));
      }
      if (recorder != null) {
        sink = sink.andThen(recorder.sink());
      }
      long frames = plant.frames();
      PlantRun.Stats stats = PlantRun.run(plant, pace, sink, done -> {
        err.printf(Locale.ROOT, "plateward plant: %3d %% (%d of %d frames)%n", Math.round(100.0 * done / frames), done, frames);
        err.flush();
      });
      if (recorder != null) {
        recorder.write(record, scenario, scenarioFile.getFileName().toString(), cfg.unit().name());
        err.println("plateward plant: wrote " + record + " (" + recorder.size() + " frames)");
      }
      if (!Double.isFinite(pace)) {
        err.printf(Locale.ROOT, "plateward plant: simulated %.0f s in %.2f s of wall time: %.0fx real time (%d cells, one thread)%n",
            stats.simulatedS(), stats.wallS(), stats.speedUp(), scenario.truth().cells());
      }
      err.flush();
      return 0;
    } finally {
      if (endpoint != null) {
        endpoint.close();
      }
    }
  }

  /**
   * The sink that serves samples on an endpoint: analyzer channels without a new sample keep
   * their DataValue (value and SourceTimestamp of the last result).
   */
  static Consumer<PlantSample> publisherTo(PlantEndpoint endpoint) {
    return s -> endpoint.publish(s.frame(), held(s.status()));
  }

  private static Set<Signal> held(Map<Signal, StatusName> status) {
    if (status.isEmpty()) {
      return Set.of();
    }
    Set<Signal> hold = EnumSet.noneOf(Signal.class);
    status.forEach((sig, st) -> {
      if (st == StatusName.UNCERTAIN_LAST_USABLE_VALUE) {
        hold.add(sig);
      }
    });
    return hold;
  }

  private double parseSpeed() {
    if (speed.equalsIgnoreCase("max")) {
      return Double.POSITIVE_INFINITY;
    }
    try {
      double x = Double.parseDouble(speed);
      if (x > 0.0 && Double.isFinite(x)) {
        return x;
      }
    } catch (NumberFormatException e) {
      // reported below
    }
    throw new CommandLine.ParameterException(spec.commandLine(),
        "--speed: must be a positive number or max, got '" + speed + "'");
  }

  private double parseDuration() {
    try {
      double d = Quantity.parse(duration, Dimension.TIME).valueSi();
      if (d > 0.0) {
        return d;
      }
    } catch (QuantityFormatException e) {
      throw new CommandLine.ParameterException(spec.commandLine(), "--duration: " + e.getMessage());
    }
    throw new CommandLine.ParameterException(spec.commandLine(), "--duration: must be positive, got '" + duration + "'");
  }
}
