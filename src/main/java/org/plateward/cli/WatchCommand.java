package org.plateward.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import org.plateward.Advisory;
import java.nio.file.Path;
import org.plateward.config.FleetConfig;
import org.plateward.config.PlatewardConfig;
import org.plateward.live.FleetMonitor;
import org.plateward.live.FleetTable;
import org.plateward.history.HistoryRecorder;
import org.plateward.history.SourceKind;
import org.plateward.live.ConsoleView;
import org.plateward.live.OperatorConsole;
import org.plateward.live.LiveMonitor;
import org.plateward.live.TimeScale;
import org.plateward.opcua.EndpointPortInUseException;
import org.plateward.opcua.EstimatePublisher;
import org.plateward.opcua.PlantConnectionException;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code plateward watch}: live monitoring of the plant named in the configuration's {@code
 * [opcua]} section, with history and the soft-sensor publisher; the window where a display exists,
 * the console otherwise.
 */
@Command(
    name = "watch",
    mixinStandardHelpOptions = true,
    description = {
      "Monitor a plant live over OPC UA (read-only), per the [opcua] section of the configuration.",
      "Estimates go to the console, to history and to the soft-sensor publisher. Advisory only.",
      "With a fleet file ([[units]]) every unit is watched in one process: one connection per unit,",
      "the estimators on one shared pool, each unit under its own publisher folder, a table per refresh."
    })
public final class WatchCommand implements Callable<Integer> {
  @CommandLine.Mixin ConfigOption config;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Option(names = "--headless", description = "Console only, no window.")
  boolean headless;

  @Option(names = "--duration", paramLabel = "D", description = "Stop after this long, e.g. \"8 h\" (default: until Ctrl-C).")
  String duration;

  @Option(names = "--publish-port", paramLabel = "P", defaultValue = "" + EstimatePublisher.DEFAULT_PORT,
      description = "Port of the soft-sensor publisher on 127.0.0.1 (0 = any free port; default ${DEFAULT-VALUE}).")
  int publishPort;

  @Option(names = "--operator", paramLabel = "NAME",
      description = "Name stored with each alarm action typed on the console (default: the OS user).")
  String operator;

  @Option(names = "--refresh", paramLabel = "S", defaultValue = "5",
      description = "Seconds between status blocks (default ${DEFAULT-VALUE}).")
  double refreshS;

  @Option(names = "--data-dir", paramLabel = "DIR", defaultValue = "data",
      description = "Fleet files only: folder of the units' history files <unit id>.db (default: ${DEFAULT-VALUE}).")
  Path dataDir;

  @Option(names = "--threads", paramLabel = "N", defaultValue = "0",
      description = "Fleet files only: estimator threads shared by the units (default: one per processor).")
  int threads;

  @Override
  public Integer call() throws Exception {
    double durationS = LiveRun.durationS(spec, duration);
    FleetConfig fleet = config.loadFleet();
    PrintWriter err = spec.commandLine().getErr();
    PrintWriter out = spec.commandLine().getOut();
    if (fleet.listsUnits()) {
      return watchFleet(fleet, durationS, out, err);
    }
    PlatewardConfig cfg = fleet.units().get(0).config();
    if (cfg.opcua() == null) {
      err.println("plateward watch: " + cfg.file() + " has no [opcua] section, so there is no plant to "
          + "watch. Add one naming the endpoint and the tag map (config/opcua-demo.toml is the one for "
          + "the simulated plant), or run 'plateward demo' to watch the simulated plant.");
      err.flush();
      return PlatewardCommand.EXIT_BAD_INPUT;
    }
    if (!(refreshS > 0.0)) {
      throw new CommandLine.ParameterException(spec.commandLine(), "--refresh: must be positive, got " + refreshS);
    }
    out.println(Advisory.SHORT);
    String noWindow = headless ? "" : org.plateward.ui.WindowLauncher.displayProblem();
    if (noWindow != null && !noWindow.isEmpty()) {
      out.println("plateward watch: " + noWindow + "; running headless (console).");
    }
    out.flush();
    HistoryRecorder history = HistoryRecorder.start(cfg.history());
    EstimatePublisher publisher = null;
    LiveMonitor monitor = null;
    ConsoleView view = null;
    org.plateward.ui.WindowHandle win = null;
    LiveRun run = new LiveRun();
    try {
      out.println("history: " + cfg.history().databaseFile().toAbsolutePath()
          + (history.health().ok() ? "" : " - NOT KEEPING: " + history.health().reason()));
      try {
        publisher = EstimatePublisher.start("127.0.0.1", publishPort, EstimatePublisher.DEFAULT_NAMESPACE_URI,
            java.util.List.of(LiveMonitor.publishedName(cfg.unit().name())));
      } catch (EndpointPortInUseException e) {
        err.println("plateward watch: soft-sensor publisher: " + e.getMessage()
            + " (choose another with --publish-port)");
        return PlatewardCommand.EXIT_BAD_INPUT;
      }
      out.println("soft-sensor values: " + publisher.endpointUrl() + " (read-only)");
      out.println("connecting to " + cfg.opcua().endpointUrl() + " ...");
      out.flush();
      try {
        monitor = LiveMonitor.start(new LiveMonitor.Setup(cfg.unit(), cfg.opcua(), history, publisher,
            SourceKind.LIVE, cfg.file().toString(), PlatewardVersion.version(), TimeScale.REAL_TIME, cfg.alarms(),
            cfg.advisor()));
      } catch (PlantConnectionException e) {
        err.println("plateward watch: " + e.getMessage());
        return PlatewardCommand.EXIT_INTERNAL;
      }
      if (noWindow == null) {
        try {
          win = org.plateward.ui.WindowLauncher.open(new org.plateward.ui.LiveFeed(monitor, cfg.unit()), cfg.alarms(),
              "Plateward - watching " + cfg.unit().name() + " (advisory)");
          out.println("plateward watch: window open; close it to stop");
        } catch (IllegalStateException e) {
          out.println("plateward watch: " + e.getMessage() + "; running headless (console).");
        }
        out.flush();
      }
      org.plateward.ui.WindowHandle shown = win;
      view = ConsoleView.start(monitor, out, shown == null ? refreshS : Math.max(refreshS, 60));
      startOperatorConsole(monitor, out, operator);
      String why = run.await(durationS, () -> shown != null && shown.closed());
      out.println("plateward watch: stopping (" + why + ")");
      out.flush();
      return 0;
    } finally {
      if (win != null) {
        win.close();
        org.plateward.ui.WindowLauncher.shutdown();
      }
      if (view != null) {
        view.close();
      }
      if (monitor != null) {
        monitor.close();
      }
      if (publisher != null) {
        publisher.close();
      }
      history.flush(java.time.Duration.ofSeconds(10));
      history.close();
      out.println("plateward watch: history flushed to " + cfg.history().databaseFile());
      out.flush();
      run.done(err);
    }
  }

  /**
   * A fleet file: every unit on one {@link FleetMonitor}, one publisher, a table every refresh.
   */
  private int watchFleet(FleetConfig fleet, double durationS, PrintWriter out, PrintWriter err)
      throws InterruptedException {
    if (!(refreshS > 0.0)) {
      throw new CommandLine.ParameterException(spec.commandLine(), "--refresh: must be positive, got " + refreshS);
    }
    if (threads < 0) {
      throw new CommandLine.ParameterException(spec.commandLine(), "--threads: must be 1 or more, got " + threads);
    }
    out.println(Advisory.SHORT);
    out.println("plateward watch: fleet " + fleet.file() + ", " + fleet.units().size() + " units: "
        + String.join(", ", fleet.ids()) + " (console; no alarms or fuel-trim advice per unit yet)");
    out.flush();
    EstimatePublisher publisher;
    try {
      publisher = EstimatePublisher.start("127.0.0.1", publishPort, EstimatePublisher.DEFAULT_NAMESPACE_URI,
          fleet.ids());
    } catch (EndpointPortInUseException e) {
      err.println("plateward watch: soft-sensor publisher: " + e.getMessage()
          + " (choose another with --publish-port)");
      err.flush();
      return PlatewardCommand.EXIT_BAD_INPUT;
    }
    FleetMonitor monitor = null;
    java.util.concurrent.ScheduledExecutorService table = null;
    LiveRun run = new LiveRun();
    try {
      out.println("soft-sensor values: " + publisher.endpointUrl() + " (read-only), one folder per unit "
          + "under Objects/Plateward");
      out.println("history: one file per unit in " + dataDir.toAbsolutePath() + " (<unit id>.db)");
      for (FleetConfig.FleetUnit u : fleet.units()) {
        out.println("unit " + u.id() + ": connecting to " + u.opcua().endpointUrl());
      }
      out.flush();
      monitor = FleetMonitor.start(new FleetMonitor.Setup(fleet.units(), publisher, dataDir, SourceKind.LIVE,
          fleet.file().toString(), PlatewardVersion.version(), TimeScale.REAL_TIME,
          threads == 0 ? Runtime.getRuntime().availableProcessors() : threads, FLEET_LANE_FRAMES, FLEET_RETRY_S));
      FleetMonitor m = monitor;
      m.addChangeListener(line -> {
        synchronized (out) {
          out.println(line);
          out.flush();
        }
      });
      table = java.util.concurrent.Executors.newSingleThreadScheduledExecutor(r -> {
        Thread t = new Thread(r, "plateward-fleet-table");
        t.setDaemon(true);
        return t;
      });
      long every = Math.max(1, Math.round(refreshS * 1000));
      table.scheduleAtFixedRate(() -> {
        String text = FleetTable.render(m.statuses(), m.clock().toPlant(java.time.Instant.now()), null);
        synchronized (out) {
          out.print(text);
          out.flush();
        }
      }, every, every, java.util.concurrent.TimeUnit.MILLISECONDS);
      String why = run.await(durationS, () -> false);
      out.println("plateward watch: stopping (" + why + ")");
      out.flush();
      return 0;
    } finally {
      if (table != null) {
        table.shutdownNow();
      }
      if (monitor != null) {
        java.util.List<FleetMonitor.UnitStatus> last = monitor.statuses();
        monitor.close();
        out.print(FleetTable.render(last, monitor.clock().toPlant(java.time.Instant.now()), null));
      }
      publisher.close();
      out.println("plateward watch: history flushed to " + dataDir + " (one <unit id>.db per unit)");
      out.flush();
      run.done(err);
    }
  }

  /** Frames that may wait per unit in fleet watch: ten minutes at 1 Hz. */
  static final int FLEET_LANE_FRAMES = 600;
  /** Wait between connection attempts to a fleet unit never yet reached, s. */
  static final double FLEET_RETRY_S = 10.0;

  /**
   * Reads operator commands (ack, shelve, unshelve, alarms, help) from stdin on a daemon thread
   * when the monitor judges alarms.
   */
  static void startOperatorConsole(org.plateward.live.LiveMonitor monitor, java.io.PrintWriter out, String operator) {
    if (!monitor.hasAlarms()) {
      return;
    }
    String who = OperatorConsole.operatorName(operator);
    new OperatorConsole(monitor, who, out).start(
        new java.io.InputStreamReader(System.in, java.nio.charset.StandardCharsets.UTF_8));
    out.println("operator console: type help for alarm commands (actions stored as \"" + who + "\")");
    out.flush();
  }
}
