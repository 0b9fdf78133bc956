package org.plateward.live;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.UUID;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.BiConsumer;
import org.plateward.config.FleetConfig.FleetUnit;
import org.plateward.fleet.LaneStatus;
import org.plateward.fleet.UnitLane;
import org.plateward.fleet.UnitPool;
import org.plateward.fleet.UnitPublishing;
import org.plateward.history.GapRow;
import org.plateward.history.HistoryRecorder;
import org.plateward.history.RunRow;
import org.plateward.history.SourceKind;
import org.plateward.opcua.AlignedFrame;
import org.plateward.opcua.ConnectionListener;
import org.plateward.opcua.ConnectionState;
import org.plateward.opcua.DataGap;
import org.plateward.opcua.EstimatePublisher;
import org.plateward.opcua.PlantConnection;
import org.plateward.opcua.PlantConnectionException;
import org.plateward.estimation.FilterSettings;
import org.plateward.signals.Frame;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.SoftSensorSettings;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The live path for several units in one process: one {@link PlantConnection} per unit (its
 * own endpoint and tag map), each unit's aligned frames handed with {@link UnitLane#offer} (never
 * blocking the connection's frame thread; a full lane drops its oldest frame and counts it) to
 * its own lane on one shared {@link UnitPool}, and each estimate published under the unit's own
 * folder of one {@link EstimatePublisher} and, when a data folder is given, stored in the unit's
 * own history file {@code <data dir>/<unit id>.db}.
 *
 * <p>A unit whose endpoint cannot be reached at start is shown as "connection lost" and tried
 * again every {@link Setup#retryS()} seconds; once connected, the client reconnects by itself
 * and, as in {@link LiveMonitor}, the frames of a gap (every signal MISSING) keep its estimator
 * predicting without correction. The other units are not affected either way.
 *
 * <p>Each unit's advisory alarms are judged on its own lane with its own configured definitions
 * ({@link AdvisoryStage#alarmsOnly}; transitions go to the unit's history and to the change
 * listeners), and its active-alarm count is published. Which signals are Bad or stale is taken
 * on the frame thread by the live rule ({@link org.plateward.alarms.BadOrStale#live}, from the
 * aligner's stale flags) and handed to the lane with the frame's time. The fuel-trim advisor is not asked in a fleet: each
 * question costs a few forecasts, far more than an estimate, for every unit every 30 s. Operator
 * actions are taken per unit with {@code plateward watch} on that unit's own configuration.
 */
public final class FleetMonitor implements AutoCloseable {
  private static final Logger LOGGER = LoggerFactory.getLogger(FleetMonitor.class);

  /**
   * What the fleet monitor is built from.
   *
   * @param units the units, each with its own config and tag map (ids unique)
   * @param publisher started with every unit id among its units; owned by the caller
   * @param dataDir folder of the history files {@code <id>.db} (null: no history kept)
   * @param source live or demo, for the run rows
   * @param configFile the fleet file, for the run rows (may be null)
   * @param modelVersion program version, for the run rows (may be null)
   * @param clock wall clock to plant time
   * @param threads estimator threads of the shared pool, at least 1
   * @param laneCapacity frames that may wait per unit, at least 1
   * @param retryS wait between connection attempts to a unit never yet connected, s
   */
  public record Setup(
      List<FleetUnit> units,
      EstimatePublisher publisher,
      Path dataDir,
      SourceKind source,
      String configFile,
      String modelVersion,
      TimeScale clock,
      int threads,
      int laneCapacity,
      double retryS) {
    public Setup {
      units = List.copyOf(units);
      Objects.requireNonNull(publisher, "publisher");
      Objects.requireNonNull(source, "source");
      Objects.requireNonNull(clock, "clock");
      if (units.isEmpty()) {
        throw new IllegalArgumentException("a fleet monitor needs at least one unit");
      }
      if (!(retryS > 0.0)) {
        throw new IllegalArgumentException("retry interval must be positive, got " + retryS + " s");
      }
    }
  }

  /**
   * One unit seen from the console.
   *
   * @param unitId the unit
   * @param endpointUrl its plant endpoint
   * @param link its connection state (CONNECTING before the first attempt ended)
   * @param linkLost whether the unit has no live connection now (never connected, or
   *     reconnecting)
   * @param linkReason why, in plain words (empty when connected)
   * @param dataAgeS wall seconds since the last frame that carried a sample; NaN before any
   * @param latest its last estimate; null before the first
   * @param lane its lane in the pool (estimated, dropped, state)
   * @param historyFile its history file; null when none is kept
   * @param historyOk whether its history is being kept
   * @param alarms its advisory alarm statuses (empty when its configuration defines none)
   */
  public record UnitStatus(
      String unitId,
      String endpointUrl,
      ConnectionState link,
      boolean linkLost,
      String linkReason,
      double dataAgeS,
      Estimate latest,
      LaneStatus lane,
      Path historyFile,
      boolean historyOk,
      List<org.plateward.alarms.AlarmStatus> alarms) {
    public UnitStatus {
      alarms = List.copyOf(alarms);
    }

    /** Alarms standing (unacknowledged or acknowledged, not shelved or suppressed). */
    public int activeAlarms() {
      return AdvisoryStage.active(alarms);
    }
  }

  private final Setup setup;
  private final UnitPool pool;
  private final List<Member> members = new ArrayList<>();
  private final ScheduledExecutorService connector;
  private final List<BiConsumer<String, Estimate>> estimateListeners = new CopyOnWriteArrayList<>();
  private final List<java.util.function.Consumer<String>> changeListeners = new CopyOnWriteArrayList<>();
  private volatile boolean closed;

  private FleetMonitor(Setup setup) {
    this.setup = setup;
    this.pool = new UnitPool(setup.threads());
    AtomicInteger n = new AtomicInteger();
    this.connector = Executors.newScheduledThreadPool(Math.min(4, setup.units().size()), r -> {
      Thread t = new Thread(r, "plateward-fleet-connect-" + n.incrementAndGet());
      t.setDaemon(true);
      return t;
    });
  }

  /**
   * Opens every unit's history and lane and starts connecting to every unit's endpoint (in the
   * background: a unit that cannot be reached does not hold up the others). Returns at once.
   *
   * @param setup what to run
   * @return the running monitor
   */
  public static FleetMonitor start(Setup setup) {
    FleetMonitor m = new FleetMonitor(setup);
    try {
      for (FleetUnit u : setup.units()) {
        m.members.add(m.new Member(u));
      }
      for (Member mb : m.members) {
        m.connector.execute(mb::connect);
      }
    } catch (RuntimeException e) {
      m.close();
      throw e;
    }
    return m;
  }

  /** Receives every estimate with its unit id, on a pool thread; keep it short. */
  public void addEstimateListener(BiConsumer<String, Estimate> l) {
    estimateListeners.add(l);
  }

  /** Receives a line of plain words whenever a unit's link changes. */
  public void addChangeListener(java.util.function.Consumer<String> l) {
    changeListeners.add(l);
  }

  /** The unit ids, in fleet order. */
  public List<String> ids() {
    List<String> out = new ArrayList<>();
    for (Member m : members) {
      out.add(m.id);
    }
    return out;
  }

  /** A look at every unit now, in fleet order. */
  public List<UnitStatus> statuses() {
    Instant now = Instant.now();
    List<UnitStatus> out = new ArrayList<>();
    for (Member m : members) {
      out.add(m.status(now));
    }
    return out;
  }

  /** The clock that turns wall time into plant time. */
  public TimeScale clock() {
    return setup.clock();
  }

  /**
   * Stops connecting, closes every connection, lets each lane estimate the frames it holds (up to
   * 10 s), stops the pool and flushes and closes every history file. Idempotent.
   */
  @Override
  public synchronized void close() {
    if (closed) {
      return;
    }
    closed = true;
    connector.shutdownNow();
    for (Member m : members) {
      m.closeConnection();
    }
    long deadline = System.nanoTime() + 10_000_000_000L;
    for (Member m : members) {
      m.lane.endFeed();
    }
    for (Member m : members) {
      try {
        m.lane.await(Math.max(1, (deadline - System.nanoTime()) / 1_000_000L));
      } catch (TimeoutException e) {
        LOGGER.warn("unit {}: estimator still busy at close; {} frames left unestimated", m.id,
            m.lane.status().queued());
      } catch (InterruptedException e) {
        Thread.currentThread().interrupt();
        break;
      }
    }
    pool.close();
    for (Member m : members) {
      if (m.history != null) {
        m.history.flush(Duration.ofSeconds(10));
        m.history.close();
      }
    }
  }

  private void tell(String what) {
    String line = setup.clock().toPlant(Instant.now()).truncatedTo(java.time.temporal.ChronoUnit.SECONDS)
        + "  " + what;
    LOGGER.info("{}", what);
    for (java.util.function.Consumer<String> l : changeListeners) {
      try {
        l.accept(line);
      } catch (RuntimeException ex) {
        LOGGER.warn("change listener failed: {}", ex.toString());
      }
    }
  }

  /** One unit: its estimator, lane, history and connection. */
  private final class Member implements ConnectionListener {
    final String id;
    final FleetUnit unit;
    final ReactorSoftSensor sensor;
    final HistoryRecorder history;
    final UnitLane lane;
    final AdvisoryStage stage;
    volatile List<org.plateward.alarms.AlarmStatus> alarmStatuses = List.of();
    /** Bad-or-stale signals of the frames waiting in the lane, by plant time (bounded: dropped frames age out). */
    final java.util.Map<Instant, java.util.Set<String>> badOrStale = java.util.Collections.synchronizedMap(
        new java.util.LinkedHashMap<>(16, 0.75f, false) {
          @Override
          protected boolean removeEldestEntry(java.util.Map.Entry<Instant, java.util.Set<String>> eldest) {
            return size() > 2 * setup.laneCapacity() + 16;
          }
        });
    final String runId = UUID.randomUUID().toString();
    final AtomicBoolean failureShown = new AtomicBoolean();
    volatile PlantConnection connection;
    volatile ConnectionState link = ConnectionState.CONNECTING;
    volatile boolean everConnected;
    volatile String linkReason = "";
    volatile Instant lastDataWall;
    volatile Estimate latest;
    volatile boolean dataSeen;
    double retryWaitS;
    boolean lossTold; // connector thread only

    Member(FleetUnit unit) {
      this.id = unit.id();
      this.unit = unit;
      this.sensor = new ReactorSoftSensor(unit.unit(), SoftSensorSettings.defaults(), FilterSettings.defaults());
      this.history = openHistory(unit);
      this.stage = AdvisoryStage.alarmsOnly(unit.unit(), sensor, unit.config().alarms(),
          history == null ? org.plateward.alarms.AlarmAudit.NONE : new org.plateward.alarms.HistoryAlarmAudit(history));
      this.retryWaitS = setup.retryS();
      this.lane = pool.feed(id, sensor::accept, setup.laneCapacity(),
          UnitPublishing.sink(setup.publisher(), id, this::activeAlarms, (frame, e, truth) -> {
            // pool thread, this lane's task only: the sensor and the alarm board are ours alone here
            latest = e;
            if (history != null) {
              history.appendFrame(frame);
              history.appendEstimate(LiveMonitor.row(e, sensor.cellTempK()));
            }
            for (BiConsumer<String, Estimate> l : estimateListeners) {
              l.accept(id, e);
            }
          }));
    }

    /**
     * Judges this unit's alarms on an estimate (pool thread, before it is published) and returns
     * how many stand.
     */
    int activeAlarms(Frame frame, Estimate e) {
      if (stage.board() == null) {
        return 0;
      }
      boolean lost = link != ConnectionState.CONNECTED;
      boolean notKept = history != null && history.health().state() == org.plateward.history.HistoryHealth.State.NOT_KEEPING;
      java.util.Set<String> bos = badOrStale.remove(frame.time());
      if (bos == null) {
        bos = org.plateward.alarms.BadOrStale.recorded(frame); // not seen on the frame thread (cannot happen in order)
      }
      for (org.plateward.alarms.AlarmEvent ev : stage.judge(e, bos, lost, notKept)) {
        tell("unit " + id + ": alarm " + ev.alarm().key() + " [" + ev.priority().key() + "] " + ev.transition()
            + ": " + ev.message());
      }
      alarmStatuses = stage.board().statuses();
      return AdvisoryStage.active(alarmStatuses);
    }

    private HistoryRecorder openHistory(FleetUnit u) {
      if (setup.dataDir() == null) {
        return null;
      }
      Path db = setup.dataDir().resolve(u.id() + ".db");
      try {
        Files.createDirectories(setup.dataDir());
      } catch (IOException | SecurityException e) {
        // the recorder reports the folder as not kept; monitoring goes on
      }
      HistoryRecorder h = HistoryRecorder.start(DemoSession.withFile(u.config().history(), db));
      h.appendRun(new RunRow(runId, setup.clock().toPlant(Instant.now()), setup.source(),
          setup.configFile(), u.unit().name(), setup.modelVersion()));
      return h;
    }

    /** One connection attempt (connector thread); on failure the next is scheduled. */
    void connect() {
      if (closed) {
        return;
      }
      try {
        PlantConnection c = PlantConnection.open(unit.opcua(), this::onFrame, this);
        if (closed) {
          c.close();
          return;
        }
        connection = c;
        everConnected = true;
        if (c.state() == ConnectionState.CONNECTED) {
          link = ConnectionState.CONNECTED;
          linkReason = "";
        }
        tell("unit " + id + ": connected to " + unit.opcua().endpointUrl());
        for (String p : c.tagProblems()) {
          tell("unit " + id + ": tag problem: " + p);
        }
      } catch (PlantConnectionException | RuntimeException e) {
        boolean first = !lossTold;
        lossTold = true;
        link = ConnectionState.RECONNECTING;
        linkReason = e.getMessage() == null ? e.toString() : e.getMessage();
        if (first) {
          tell("unit " + id + ": connection lost: " + linkReason + " (trying again every "
              + String.format(java.util.Locale.ROOT, "%.0f", setup.retryS()) + " s; the other units carry on)");
        }
        if (!closed) {
          try {
            connector.schedule(this::connect, Math.round(retryWaitS * 1000), TimeUnit.MILLISECONDS);
          } catch (java.util.concurrent.RejectedExecutionException ignored) {
            // closing
          }
        }
      }
    }

    /** Frame thread of this unit's connection: hand on without waiting and return. */
    private void onFrame(AlignedFrame f) {
      if (f.samplesUsed() > 0) {
        lastDataWall = Instant.now();
      }
      if (!dataSeen) {
        if (!f.frame().anyUsable()) {
          return; // estimation starts with the first frame that carries a usable value
        }
        dataSeen = true;
      }
      if (closed) {
        return;
      }
      Frame plant = setup.clock().toPlant(f.frame());
      if (stage.board() != null) {
        badOrStale.put(plant.time(), org.plateward.alarms.BadOrStale.live(f.frame(), f.stale()));
      }
      try {
        if (!lane.offer(plant) && failureShown.compareAndSet(false, true)) {
          UnitPublishing.showFailure(setup.publisher(), lane.status());
          tell("unit " + id + ": estimator lane failed: " + lane.status().reason());
        }
      } catch (IllegalStateException e) {
        // the feed was ended: closing
      }
    }

    @Override
    public void onStateChanged(ConnectionState from, ConnectionState to, String reason) {
      link = to;
      linkReason = reason == null ? "" : reason;
      if (!closed) {
        tell("unit " + id + ": link " + from + " -> " + to + (reason == null ? "" : ": " + reason));
      }
    }

    @Override
    public void onGap(DataGap gap) {
      if (history != null) {
        history.appendGap(new GapRow(setup.clock().toPlant(gap.from()), setup.clock().toPlant(gap.to()),
            "OPC UA: " + gap.reason()));
      }
      tell(String.format(java.util.Locale.ROOT, "unit %s: data gap of %.1f s (wall): %s", id,
          gap.length().toMillis() / 1000.0, gap.reason()));
    }

    UnitStatus status(Instant now) {
      Instant data = lastDataWall;
      ConnectionState l = link;
      boolean lost = l == ConnectionState.RECONNECTING || (!everConnected && !linkReason.isEmpty());
      return new UnitStatus(id, unit.opcua().endpointUrl(), l, lost, l == ConnectionState.CONNECTED ? "" : linkReason,
          data == null ? Double.NaN : (now.toEpochMilli() - data.toEpochMilli()) / 1000.0,
          latest, lane.status(),
          history == null ? null : history.settings().databaseFile(),
          history != null && history.health().ok(), alarmStatuses);
    }

    void closeConnection() {
      PlantConnection c = connection;
      if (c != null) {
        c.close();
      }
    }
  }
}
