package org.plateward.live;

import org.plateward.alarms.ActionKind;
import org.plateward.alarms.ActionResult;
import java.time.Duration;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.Future;
import java.util.concurrent.TimeoutException;
import org.plateward.advisor.TrimSettings;
import org.plateward.advisor.TrimSuggestion;
import org.plateward.alarms.AlarmAudit;
import org.plateward.alarms.AlarmKind;
import org.plateward.alarms.AlarmBoard;
import org.plateward.alarms.AlarmEvent;
import org.plateward.alarms.BadOrStale;
import org.plateward.alarms.AlarmSettings;
import org.plateward.alarms.AlarmStatus;
import org.plateward.alarms.HistoryAlarmAudit;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;
import java.util.UUID;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;
import org.plateward.estimation.FilterSettings;
import org.plateward.history.EstimateRow;
import org.plateward.history.GapRow;
import org.plateward.history.HistoryHealth;
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
import org.plateward.opcua.PublishedEstimate;
import org.plateward.config.OpcuaSettings;
import org.plateward.reactor.UnitSpec;
import org.plateward.signals.Frame;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.EstimatorStatus;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.SoftSensorSettings;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The live path: aligned frames from a {@link PlantConnection} go through one {@link
 * ReactorSoftSensor} on the monitor's own estimator thread (never on a Milo or connection
 * thread); each frame and its estimate go to history, the estimate to the soft-sensor publisher
 * and to the listeners. Gaps the connection reports are stored as gap rows; one run row is
 * stored at start.
 *
 * <p>The estimator is never reset: across a reconnect it keeps its state, and the frames of the
 * gap (every signal MISSING) make it predict without correction, so the estimate is degraded
 * and its uncertainty grows until data return.
 *
 * <p>History and publisher are optional and owned by the caller (closed after the monitor).
 */
public final class LiveMonitor implements AutoCloseable, AlarmActions {
  private static final Logger LOGGER = LoggerFactory.getLogger(LiveMonitor.class);
  /** Frames that may wait for the estimator: ten minutes at 1 Hz. */
  private static final int BACKLOG = 600;

  /**
   * What the monitor is built from.
   *
   * @param unit the reactor unit (its name labels the published nodes)
   * @param opcua connection and tag map
   * @param history where frames, estimates, gaps and the run go (null: not kept)
   * @param publisher where estimates are republished (null: not published)
   * @param source live or demo, for the run row
   * @param configFile the configuration file, for the run row (may be null)
   * @param modelVersion program version, for the run row (may be null)
   * @param clock wall clock to plant time
   * @param alarms advisory alarm definitions (null: no alarms are judged)
   * @param advisor fuel-trim advisor settings (null: the defaults with the peak_high limit;
   *     no advisor without alarms either)
   */
  public record Setup(
      UnitSpec unit,
      OpcuaSettings opcua,
      HistoryRecorder history,
      EstimatePublisher publisher,
      SourceKind source,
      String configFile,
      String modelVersion,
      TimeScale clock,
      AlarmSettings alarms,
      TrimSettings advisor) {
    public Setup {
      Objects.requireNonNull(unit, "unit");
      Objects.requireNonNull(opcua, "opcua");
      Objects.requireNonNull(source, "source");
      Objects.requireNonNull(clock, "clock");
    }
  }

  private final Setup setup;
  private volatile TimeScale clock;
  private final String unitName;
  private final ReactorSoftSensor sensor;
  private final AdvisoryStage stage;
  private final AlarmBoard alarms;
  private volatile TrimSuggestion advice;
  private volatile List<AlarmStatus> alarmStatuses = List.of();
  private final ThreadPoolExecutor estimator;
  private final List<Consumer<String>> changeListeners = new CopyOnWriteArrayList<>();
  private final List<Consumer<Estimate>> estimateListeners = new CopyOnWriteArrayList<>();
  private final List<java.util.function.BiConsumer<Frame, Estimate>> frameListeners = new CopyOnWriteArrayList<>();
  private final AtomicLong dropped = new AtomicLong();
  private final AtomicLong frames = new AtomicLong();
  private final String runId = UUID.randomUUID().toString();
  private volatile PlantConnection connection;
  private volatile ConnectionState link = ConnectionState.CONNECTING;
  private volatile String linkReason = "";
  private volatile Instant lastDataWall;
  private volatile Estimate latest;
  private volatile long blocks;
  private volatile boolean closed;
  private volatile boolean dataSeen;
  // estimator thread only
  private EstimatorStatus lastStatus;
  private HistoryHealth.State lastHistory = HistoryHealth.State.OK;

  private LiveMonitor(Setup setup) {
    this.setup = setup;
    this.clock = setup.clock();
    this.unitName = publishedName(setup.unit().name());
    this.sensor = new ReactorSoftSensor(setup.unit(), SoftSensorSettings.defaults(), FilterSettings.defaults());
    this.stage = new AdvisoryStage(setup.unit(), sensor, setup.alarms(), setup.advisor(),
        setup.history() == null ? AlarmAudit.NONE : new HistoryAlarmAudit(setup.history()));
    this.alarms = stage.board();
    this.estimator =
        new ThreadPoolExecutor(1, 1, 0L, TimeUnit.MILLISECONDS, new ArrayBlockingQueue<>(BACKLOG),
            r -> {
              Thread t = new Thread(r, "plateward-estimator");
              t.setDaemon(true);
              return t;
            },
            (r, ex) -> dropped.incrementAndGet());
  }

  /**
   * Stores the run row, connects to the plant and starts estimating. Returns once the first
   * session is active.
   *
   * @throws PlantConnectionException with a plain message when the endpoint cannot be used
   */
  public static LiveMonitor start(Setup setup) throws PlantConnectionException {
    LiveMonitor m = new LiveMonitor(setup);
    if (setup.history() != null) {
      setup.history().appendRun(new RunRow(m.runId, m.clock.toPlant(Instant.now()),
          setup.source(), setup.configFile(), setup.unit().name(), setup.modelVersion()));
      m.lastHistory = setup.history().health().state();
    }
    try {
      m.connection = PlantConnection.open(setup.opcua(), m::onFrame, m.new Link());
    } catch (PlantConnectionException e) {
      m.estimator.shutdownNow();
      throw e;
    }
    if (m.connection.state() == ConnectionState.CONNECTED) {
      m.link = ConnectionState.CONNECTED;
    }
    for (String p : m.connection.tagProblems()) {
      m.tell("tag problem: " + p);
    }
    return m;
  }

  /** The name the unit's nodes are published under (letters, digits, '-' and '_'). */
  public static String publishedName(String unitName) {
    String s = unitName.replaceAll("[^A-Za-z0-9_-]+", "_");
    return s.isEmpty() ? "unit" : s;
  }

  /**
   * Replaces the wall-to-plant clock before any data arrived (the demo starts its plant only once
   * the monitor is connected, and pins plant time then).
   *
   * @throws IllegalStateException once a frame with a usable value has been seen
   */
  public void pinClock(TimeScale newClock) {
    if (dataSeen) {
      throw new IllegalStateException("the clock is fixed once data arrived");
    }
    this.clock = Objects.requireNonNull(newClock, "clock");
  }

  /** The estimator; the same instance for the monitor's whole life. */
  public ReactorSoftSensor sensor() {
    return sensor;
  }

  /** The connection to the plant. */
  public PlantConnection connection() {
    return connection;
  }

  /** Id of the run row stored at start. */
  public String runId() {
    return runId;
  }

  /** Receives a line of plain words whenever the link, estimator or history status changes. */
  public void addChangeListener(Consumer<String> l) {
    changeListeners.add(l);
  }

  /** Receives every estimate, on the estimator thread; keep it short. */
  public void addEstimateListener(Consumer<Estimate> l) {
    estimateListeners.add(l);
  }

  /**
   * Receives every frame (plant time) with its estimate, on the estimator thread, after the
   * alarms were judged and the advisor asked; keep it short. Inside the call the estimator may be
   * read ({@link #sensor()}), since it is the estimator's own thread.
   */
  public void addFrameListener(java.util.function.BiConsumer<Frame, Estimate> l) {
    frameListeners.add(l);
  }

  /**
   * Takes one operator action on an advisory alarm, on the estimator thread (the alarm board's
   * owner), timed at plant time now but never before the last estimate, as on the console;
   * the board writes the audit trail (history, when kept).
   *
   * @param action what to do
   * @param who the operator
   * @param alarm the alarm
   * @param reason reason or comment (required for shelve and removal from service)
   * @param shelveFor how long a shelve lasts from the action time (null for other actions)
   * @return the board's answer; refused with a message when no alarms are judged, completed
   *     exceptionally when the monitor is closed
   */
  public java.util.concurrent.CompletableFuture<org.plateward.alarms.ActionResult> alarmAction(
      org.plateward.alarms.ActionKind action, String who, AlarmKind alarm, String reason,
      java.time.Duration shelveFor) {
    java.util.concurrent.CompletableFuture<org.plateward.alarms.ActionResult> f =
        new java.util.concurrent.CompletableFuture<>();
    if (alarms == null) {
      f.completeExceptionally(new IllegalStateException("no advisory alarms are judged (no [alarms] configuration)"));
      return f;
    }
    try {
      estimator.execute(() -> {
        try {
          org.plateward.alarms.ActionResult r = takeNow(action, who, alarm, reason, shelveFor);
          if (r.accepted()) {
            tell("operator " + r.message());
          }
          f.complete(r);
        } catch (RuntimeException ex) {
          f.completeExceptionally(ex);
        }
      });
    } catch (java.util.concurrent.RejectedExecutionException ex) {
      f.completeExceptionally(new IllegalStateException("the monitor is closed or its estimator is behind", ex));
    }
    return f;
  }

  /**
   * One operator action on the estimator thread, timed at plant time now but never before the
   * last estimate (the board has judged up to it; the plant clock may trail it by a frame).
   */
  private ActionResult takeNow(ActionKind kind, String who, AlarmKind alarm, String reason, Duration shelveFor) {
    Instant now = clock.toPlant(Instant.now());
    Estimate last = latest;
    if (last != null && last.time().isAfter(now)) {
      now = last.time();
    }
    ActionResult r = alarms.take(kind, now, who, alarm, reason, shelveFor);
    alarmStatuses = alarms.statuses();
    return r;
  }

  /** A consistent look at the monitor now. */
  public MonitorStatus status() {
    Instant now = Instant.now();
    Instant data = lastDataWall;
    HistoryRecorder h = setup.history();
    return new MonitorStatus(
        setup.unit().name(),
        setup.opcua().endpointUrl(),
        link,
        linkReason,
        data == null ? Double.NaN : (now.toEpochMilli() - data.toEpochMilli()) / 1000.0,
        latest,
        frames.get(),
        blocks,
        dropped.get(),
        h == null ? null : h.health(),
        h == null ? null : h.settings().databaseFile(),
        clock,
        now,
        alarmStatuses,
        advice);
  }

  /** Stops the connection, then lets the estimator finish the frames it holds (up to 10 s). */
  @Override
  public void close() {
    if (closed) {
      return;
    }
    closed = true;
    PlantConnection c = connection;
    if (c != null) {
      c.close();
    }
    estimator.shutdown();
    try {
      if (!estimator.awaitTermination(10, TimeUnit.SECONDS)) {
        LOGGER.warn("estimator still busy after 10 s; {} frames left unestimated",
            estimator.getQueue().size());
        estimator.shutdownNow();
      }
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      estimator.shutdownNow();
    }
  }

  // --- frame thread: hand on and return -----------------------------------------------------

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
    if (!estimator.isShutdown()) {
      estimator.execute(() -> estimate(f));
    }
  }

  // --- estimator thread ---------------------------------------------------------------------

  private void estimate(AlignedFrame aligned) {
    Frame frame = clock.toPlant(aligned.frame());
    HistoryRecorder h = setup.history();
    try {
      if (h != null) {
        h.appendFrame(frame);
      }
      Estimate e = sensor.accept(frame);
      blocks = sensor.blocks();
      latest = e;
      frames.incrementAndGet();
      if (h != null) {
        h.appendEstimate(row(e, sensor.cellTempK()));
      }
      int active = judgeAlarms(e, aligned, h);
      advise(e);
      if (setup.publisher() != null) {
        setup.publisher().publish(unitName, published(e, active));
      }
      for (Consumer<Estimate> l : estimateListeners) {
        l.accept(e);
      }
      for (java.util.function.BiConsumer<Frame, Estimate> l : frameListeners) {
        l.accept(frame, e);
      }
      noticeChanges(e, h);
    } catch (RuntimeException ex) {
      LOGGER.error("estimate of the frame at {} failed; the next frame continues", frame.time(), ex);
    }
  }

  /** Asks the advisor through the stage; a new suggestion is told and stored in history. */
  private void advise(Estimate e) {
    stage.advise(e, sensor).ifPresent(sug -> {
      advice = sug;
      tell("advisor " + sug.message().lines().findFirst().orElse(""));
      HistoryRecorder h = setup.history();
      if (h != null) {
        h.appendSuggestion(AdvisoryStage.suggestionRow(sug, e.time()));
      }
    });
  }

  // --- operator actions (any thread; carried out on the estimator thread) ---------------------

  /** Whether advisory alarms are judged (there is a board to act on). */
  public boolean hasAlarms() {
    return alarms != null;
  }

  /**
   * Carries out an operator action on the alarm board, on the estimator thread (the board has
   * one owner), at the present plant time (never before the last estimate). Accepted actions go
   * to the audit trail with {@code who}.
   *
   * @param kind acknowledge, shelve, unshelve, ...
   * @param who the operator
   * @param alarm the alarm
   * @param reason the reason (required for shelve), or null
   * @param shelveFor how long to shelve (shelve only), or null
   * @return what became of it
   */
  @Override
  public ActionResult act(ActionKind kind, String who, AlarmKind alarm, String reason, Duration shelveFor) {
    if (alarms == null) {
      return new ActionResult(false, "no advisory alarms are configured", null, List.of());
    }
    Future<ActionResult> f;
    try {
      f = estimator.submit(() -> takeNow(kind, who, alarm, reason, shelveFor));
    } catch (java.util.concurrent.RejectedExecutionException ex) {
      return new ActionResult(false, "the monitor is stopping or busy; try again", null, List.of());
    }
    try {
      return f.get(10, TimeUnit.SECONDS);
    } catch (InterruptedException ex) {
      Thread.currentThread().interrupt();
      return new ActionResult(false, "interrupted", null, List.of());
    } catch (ExecutionException | TimeoutException ex) {
      return new ActionResult(false, "the action could not be carried out: " + ex, null, List.of());
    }
  }

  /** The alarm states now (as of the last estimate or action). */
  @Override
  public List<AlarmStatus> statuses() {
    return alarmStatuses;
  }

  /** Judges the advisory alarms on this estimate; returns how many are active. */
  private int judgeAlarms(Estimate e, AlignedFrame aligned, HistoryRecorder h) {
    if (alarms == null) {
      return 0;
    }
    List<AlarmEvent> events = stage.judge(e, BadOrStale.live(aligned.frame(), aligned.stale()),
        link != ConnectionState.CONNECTED, h != null && h.health().state() == HistoryHealth.State.NOT_KEEPING);
    for (AlarmEvent ev : events) {
      tell("alarm " + ev.alarm().key() + " [" + ev.priority().key() + "] " + ev.transition() + ": " + ev.message());
    }
    alarmStatuses = alarms.statuses();
    return AdvisoryStage.active(alarmStatuses);
  }

  private void noticeChanges(Estimate e, HistoryRecorder h) {
    if (e.status() != lastStatus) {
      String reason = e.reason() == null || e.reason().isEmpty() ? "" : ": " + e.reason();
      tell("estimator " + (lastStatus == null ? "" : lastStatus.text() + " -> ") + e.status().text() + reason);
      lastStatus = e.status();
    }
    if (h != null) {
      HistoryHealth hh = h.health();
      if (hh.state() != lastHistory) {
        tell("history " + StatusBlock.historyWord(lastHistory) + " -> " + StatusBlock.historyWord(hh.state())
            + (hh.reason() == null ? "" : ": " + hh.reason()));
        lastHistory = hh.state();
      }
    }
  }

  private void tell(String what) {
    String line = clock.toPlant(Instant.now()).truncatedTo(java.time.temporal.ChronoUnit.SECONDS)
        + "  " + what;
    LOGGER.info("{}", what);
    for (Consumer<String> l : changeListeners) {
      try {
        l.accept(line);
      } catch (RuntimeException ex) {
        LOGGER.warn("change listener failed: {}", ex.toString());
      }
    }
  }

  /** Hears the connection (on the connection's control thread). */
  private final class Link implements ConnectionListener {
    @Override
    public void onStateChanged(ConnectionState from, ConnectionState to, String reason) {
      link = to;
      linkReason = reason == null ? "" : reason;
      if (!closed) {
        tell("link " + from + " -> " + to + (reason == null ? "" : ": " + reason));
      }
    }

    @Override
    public void onGap(DataGap gap) {
      HistoryRecorder h = setup.history();
      if (h != null) {
        h.appendGap(new GapRow(clock.toPlant(gap.from()), clock.toPlant(gap.to()),
            "OPC UA: " + gap.reason()));
      }
      tell(String.format(java.util.Locale.ROOT, "data gap of %.1f s (wall) stored: %s",
          gap.length().toMillis() / 1000.0, gap.reason()));
    }
  }

  // --- mapping --------------------------------------------------------------------------------

  /**
   * What history keeps of an estimate: the scalars, the tracked parameters and the profiles.
   *
   * @param e the estimate
   * @param cellTempK the estimator's cell temperatures at the same time, K (null before start)
   */
  static EstimateRow row(Estimate e, double[] cellTempK) {
    Map<String, Double> p = new TreeMap<>();
    p.put("reforming_activity", e.reformingActivity());
    p.put("combustion_activity", e.combustionActivity());
    p.put("heat_loss_w_m2k", e.heatLossWPerM2K());
    p.put("heat_transfer_multiplier", e.heatTransferMultiplier());
    p.put("plate_end_bias_ref_inlet_k", e.biasInletK());
    p.put("plate_end_bias_ref_outlet_k", e.biasOutletK());
    double[] melt = e.cellMeltFraction();
    double[] temps = cellTempK;
    if (temps == null) {
      temps = new double[melt.length];
      java.util.Arrays.fill(temps, Double.NaN);
    }
    return new EstimateRow(e.time(), e.peakPlateTempK(), e.peakPlateTempSdK(), e.peakPositionM(),
        e.bufferMeltFraction(), e.bufferMeltFractionSd(), e.maxCellMeltFraction(),
        e.timeToExhaustS(), e.timeToExhaustSdS(), e.nis(), e.status().text(),
        e.reason() == null || e.reason().isEmpty() ? null : e.reason(), p, temps, melt);
  }

  /** What the publisher serves for an estimate (see {@link org.plateward.fleet.UnitPublishing#published}). */
  static PublishedEstimate published(Estimate e, int activeAlarms) {
    return org.plateward.fleet.UnitPublishing.published(e, activeAlarms);
  }

  /** Where history is kept (for messages). */
  public Path historyFile() {
    return setup.history() == null ? null : setup.history().settings().databaseFile();
  }
}
