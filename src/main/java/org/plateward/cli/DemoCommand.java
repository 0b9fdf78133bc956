package org.plateward.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.plateward.Advisory;
import org.plateward.config.InvalidConfigException;
import org.plateward.config.OpcuaSettings;
import org.plateward.config.PlatewardConfig;
import org.plateward.config.ScenarioLoader;
import org.plateward.live.ConsoleView;
import org.plateward.live.OperatorConsole;
import org.plateward.live.DemoSession;
import org.plateward.opcua.PlantConnectionException;
import org.plateward.plant.Scenario;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code plateward demo}: the simulated plant (invented data) with an upset, served over OPC UA
 * on loopback, the monitor connected to it, the soft-sensor publisher, and history in a local
 * folder; the window where a display exists (the console otherwise).
 */
@Command(
    name = "demo",
    mixinStandardHelpOptions = true,
    description = {
      "Run the simulated plant (invented data) through a fuel surge and monitor it live over OPC UA.",
      "The plant is served on loopback; estimates go to the console, to history and to the",
      "soft-sensor publisher. Advisory only."
    })
public final class DemoCommand implements Callable<Integer> {
  /** The default upset: the fuel surge melts the buffer layer through within 25 plant minutes. */
  static final String DEFAULT_SCENARIO = "fuel-surge.toml";

  @CommandLine.Mixin ConfigOption config;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Option(names = "--headless", description = "Console only, no window.")
  boolean headless;

  @Option(names = "--duration", paramLabel = "D",
      description = "Stop after this much wall-clock time, e.g. \"6 min\" (default: end of the scenario or Ctrl-C).")
  String duration;

  @Option(names = "--data-dir", paramLabel = "DIR", defaultValue = "data",
      description = "Folder of the history database plateward.db (default: ${DEFAULT-VALUE}).")
  Path dataDir;

  @Option(names = "--speed", paramLabel = "X", defaultValue = "10",
      description = "Plant seconds per wall-clock second (default: ${DEFAULT-VALUE}).")
  double speed;

  @Option(names = "--scenario", paramLabel = "FILE",
      description = "Scenario file (default: scenarios/" + DEFAULT_SCENARIO + " beside the configuration).")
  Path scenarioFile;

  @Option(names = "--tag-map", paramLabel = "FILE",
      description = "The [opcua] tag map of the simulated plant (default: opcua-demo.toml beside the configuration).")
  Path tagMap;

  @Option(names = "--operator", paramLabel = "NAME",
      description = "Name stored with each alarm action typed on the console (default: the OS user).")
  String operator;

  @Option(names = "--refresh", paramLabel = "S", defaultValue = "5",
      description = "Wall-clock seconds between status blocks (default ${DEFAULT-VALUE}).")
  double refreshS;

  @Override
  public Integer call() throws Exception {
    double durationS = LiveRun.durationS(spec, duration);
    if (!(speed > 0.0) || speed > 100.0) {
      throw new CommandLine.ParameterException(spec.commandLine(),
          "--speed: must be more than 0 and at most 100, got " + speed);
    }
    if (!(refreshS > 0.0)) {
      throw new CommandLine.ParameterException(spec.commandLine(), "--refresh: must be positive, got " + refreshS);
    }
    PlatewardConfig cfg = config.load();
    Path folder = cfg.file().toAbsolutePath().getParent();
    Path scenarioPath = scenarioFile != null ? scenarioFile : folder.resolve("scenarios").resolve(DEFAULT_SCENARIO);
    Path mapPath = tagMap != null ? tagMap : folder.resolve("opcua-demo.toml");
    for (Path p : new Path[] {scenarioPath, mapPath}) {
      if (!Files.isReadable(p)) {
        throw new InvalidConfigException(java.util.List.of(new org.plateward.config.ConfigError(p, 0, null,
            "no such file (run from the folder that holds config/, or give --scenario / --tag-map)")));
      }
    }
    Scenario scenario = ScenarioLoader.load(scenarioPath);
    OpcuaSettings map = OpcuaSettings.load(mapPath);
    PrintWriter out = spec.commandLine().getOut();
    PrintWriter err = spec.commandLine().getErr();
    out.println(Advisory.SHORT);
    out.println("plateward demo: unit " + cfg.unit().name() + " (invented), scenario " + scenarioPath);
    String noWindow = headless ? "" : org.plateward.ui.WindowLauncher.displayProblem();
    if (noWindow != null && !noWindow.isEmpty()) {
      out.println("plateward demo: " + noWindow + "; running headless (console).");
    }
    boolean window = noWindow == null;
    out.flush();
    DemoSession session;
    try {
      session = DemoSession.start(cfg, scenario, map, dataDir, speed, PlatewardVersion.version(), line -> {
        out.println("plateward demo: " + line);
        out.flush();
      });
    } catch (PlantConnectionException e) {
      err.println("plateward demo: " + e.getMessage());
      err.flush();
      return PlatewardCommand.EXIT_INTERNAL;
    }
    LiveRun run = new LiveRun();
    org.plateward.ui.WindowHandle win = null;
    if (window) {
      try {
        win = org.plateward.ui.WindowLauncher.open(new org.plateward.ui.LiveFeed(session.monitor(), cfg.unit()),
            cfg.alarms(), "Plateward - demo, unit " + cfg.unit().name() + " (invented data, advisory)");
        out.println("plateward demo: window open; close it to stop");
      } catch (IllegalStateException e) {
        out.println("plateward demo: " + e.getMessage() + "; running headless (console).");
      }
      out.flush();
    }
    org.plateward.ui.WindowHandle shown = win;
    ConsoleView view = ConsoleView.start(session.monitor(), out, shown == null ? refreshS : Math.max(refreshS, 60));
    WatchCommand.startOperatorConsole(session.monitor(), out, operator);
    try {
      String why = run.await(durationS, () -> session.plant().ended() || (shown != null && shown.closed()));
      out.println("plateward demo: stopping (" + why + ")");
      out.flush();
      return 0;
    } finally {
      if (shown != null) {
        shown.close();
        org.plateward.ui.WindowLauncher.shutdown();
      }
      view.close();
      session.close();
      out.println("plateward demo: history flushed to " + dataDir.resolve("plateward.db")
          + "; replay it with: plateward replay --db " + dataDir.resolve("plateward.db")
          + " --from " + scenario.start() + " --to " + scenario.start().plusSeconds((long) scenario.durationS() + 1));
      out.flush();
      run.done(err);
    }
  }
}
