package org.plateward.live;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import org.plateward.config.OpcuaSettings;
import org.plateward.config.PlatewardConfig;
import org.plateward.history.HistoryRecorder;
import org.plateward.history.HistorySettings;
import org.plateward.history.SourceKind;
import org.plateward.opcua.EstimatePublisher;
import org.plateward.opcua.PlantConnectionException;
import org.plateward.plant.Scenario;
import org.plateward.plant.SimulatedPlant;
import org.plateward.signals.Signal;

/**
 * {@code plateward demo} in one object: the simulated plant (invented data) served on a
 * loopback OPC UA endpoint, the live monitor connected to it over real OPC UA, the soft-sensor
 * publisher, and history in a local folder. Everything binds to free loopback ports.
 */
public final class DemoSession implements AutoCloseable {
  /** Shortest wall-clock sampling interval and frame period the demo asks for, s. */
  static final double MIN_WALL_PERIOD_S = 0.01;

  private final DemoPlant plant;
  private final EstimatePublisher publisher;
  private final HistoryRecorder history;
  private final LiveMonitor monitor;
  private final TimeScale clock;
  private boolean closed;

  private DemoSession(DemoPlant plant, EstimatePublisher publisher, HistoryRecorder history,
      LiveMonitor monitor, TimeScale clock) {
    this.plant = plant;
    this.publisher = publisher;
    this.history = history;
    this.monitor = monitor;
    this.clock = clock;
  }

  /**
   * Starts the demo. Solves the plant's initial steady state first (a few seconds).
   *
   * @param cfg the unit configuration
   * @param scenario the upset scenario the plant runs
   * @param demoMap the {@code [opcua]} settings for the simulated plant (its endpoint is
   *     replaced by the one bound, its periods divided by the speed)
   * @param dataDir folder of the history database {@code plateward.db} (created if absent)
   * @param speed plant seconds per wall second
   * @param version program version, for the run row
   * @param say receives one line per thing started, for the console
   * @throws PlantConnectionException when the monitor cannot connect to its own plant
   */
  public static DemoSession start(PlatewardConfig cfg, Scenario scenario, OpcuaSettings demoMap,
      Path dataDir, double speed, String version, Consumer<String> say) throws PlantConnectionException {
    HistoryRecorder history = null;
    DemoPlant plant = null;
    EstimatePublisher publisher = null;
    try {
      Path db = dataDir.resolve("plateward.db");
      try {
        Files.createDirectories(dataDir);
      } catch (java.io.IOException | SecurityException e) {
        // the recorder reports the folder as not kept; monitoring goes on
      }
      history = HistoryRecorder.start(withFile(cfg.history(), db));
      say.accept("history: " + db.toAbsolutePath() + (history.health().ok() ? ""
          : " - NOT KEEPING: " + history.health().reason()));
      say.accept("simulated plant: scenario " + scenario.name() + " (invented data), solving its initial steady state");
      SimulatedPlant sim = new SimulatedPlant(cfg.unit(), scenario);
      plant = DemoPlant.serve(sim);
      say.accept("simulated plant: serving " + plant.endpointUrl() + " (read-only, loopback), "
          + speed + " x real time");
      publisher = EstimatePublisher.start("127.0.0.1", 0, EstimatePublisher.DEFAULT_NAMESPACE_URI,
          List.of(LiveMonitor.publishedName(cfg.unit().name())));
      say.accept("soft-sensor values: " + publisher.endpointUrl() + " (namespace "
          + publisher.namespaceUri() + ", read-only)");
      double wallPeriodS = demoMap.framePeriodS() / speed;
      LiveMonitor monitor = LiveMonitor.start(new LiveMonitor.Setup(cfg.unit(),
          scaled(demoMap, plant.endpointUrl(), speed), history, publisher, SourceKind.DEMO,
          cfg.file() == null ? null : cfg.file().toString(), version,
          new TimeScale(origin(Instant.now(), wallPeriodS), scenario.start(), speed), cfg.alarms(), cfg.advisor()));
      // plant time starts now that the monitor listens: frame 0 is served at the origin
      TimeScale clock = new TimeScale(origin(Instant.now().plusMillis(300), wallPeriodS), scenario.start(), speed);
      monitor.pinClock(clock);
      plant.begin(clock);
      say.accept("monitor: connected to " + plant.endpointUrl() + " over OPC UA");
      return new DemoSession(plant, publisher, history, monitor, clock);
    } catch (PlantConnectionException | RuntimeException e) {
      if (publisher != null) {
        publisher.close();
      }
      if (plant != null) {
        plant.close();
      }
      if (history != null) {
        history.close();
      }
      throw e;
    }
  }

  /**
   * The demo map on the bound endpoint and the demo's clock: sampling, publishing, frame period
   * and frame delay divided by the speed (so the estimator sees one frame per plant second),
   * never below {@value #MIN_WALL_PERIOD_S} s of wall time.
   */
  public static OpcuaSettings scaled(OpcuaSettings s, String endpointUrl, double speed) {
    Map<Signal, OpcuaSettings.Tag> tags = new EnumMap<>(Signal.class);
    s.tags().forEach((sig, t) -> tags.put(sig, new OpcuaSettings.Tag(sig, t.nodeId(), t.unit(),
        wall(t.samplingIntervalS(), speed), t.deadband())));
    return new OpcuaSettings(endpointUrl, s.securityPolicy(), s.securityMode(), s.allowInsecureRemote(),
        s.auth(), s.applicationUri(), s.pkiDir(), s.namespaceUri(), wall(s.publishingIntervalS(), speed),
        s.requestTimeoutS(), wall(s.framePeriodS(), speed), wall(s.frameDelayS(), speed),
        s.staleMultiple(), s.clockSkewLimitS(), tags);
  }

  /**
   * The first whole multiple of the wall frame period at or after {@code t}: the client's frames
   * fall on whole multiples of its period, so plant frame times then fall on whole plant periods.
   */
  static Instant origin(Instant t, double wallPeriodS) {
    long p = Math.max(1, Math.round(Math.max(MIN_WALL_PERIOD_S, wallPeriodS) * 1e9));
    long ns = t.getEpochSecond() * 1_000_000_000L + t.getNano();
    long k = Math.floorDiv(ns + p - 1, p);
    return Instant.ofEpochSecond(0, k * p);
  }

  private static double wall(double plantS, double speed) {
    return Math.max(MIN_WALL_PERIOD_S, plantS / speed);
  }

  /** History settings with another database file. */
  public static HistorySettings withFile(HistorySettings h, Path file) {
    return new HistorySettings(file, h.rawRetention(), h.summaryRetention(), h.summarySpan(),
        h.batchInterval(), h.maxBatchEntries(), h.queueCapacity(), h.maxDatabaseBytes(), h.retryInterval());
  }

  public DemoPlant plant() {
    return plant;
  }

  public LiveMonitor monitor() {
    return monitor;
  }

  public EstimatePublisher publisher() {
    return publisher;
  }

  public HistoryRecorder history() {
    return history;
  }

  public TimeScale clock() {
    return clock;
  }

  /** Stops the plant, the monitor, the publisher, and flushes and closes history. Idempotent. */
  @Override
  public synchronized void close() {
    if (closed) {
      return;
    }
    closed = true;
    if (monitor == null) {
      return;
    }
    monitor.close();
    plant.close();
    publisher.close();
    history.flush(Duration.ofSeconds(10));
    history.close();
  }
}
