package org.plateward.ui;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.function.Consumer;
import org.plateward.advisor.TrimSettings;
import org.plateward.live.AdvisoryStage;
import org.plateward.advisor.TrimSuggestion;
import org.plateward.alarms.ActionKind;
import org.plateward.alarms.ActionResult;
import org.plateward.alarms.AlarmAudit;
import org.plateward.alarms.AlarmBoard;
import org.plateward.alarms.AlarmEvent;
import org.plateward.alarms.BadOrStale;
import org.plateward.alarms.AlarmKind;
import org.plateward.alarms.AlarmSettings;
import org.plateward.alarms.HistoryAlarmAudit;
import org.plateward.estimation.FilterSettings;
import org.plateward.history.HistoryHealth;
import org.plateward.history.HistoryRecorder;
import org.plateward.reactor.UnitSpec;
import org.plateward.replay.HistoryFrameSource;
import org.plateward.replay.ReplayFrameSource;
import org.plateward.signals.Frame;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.FrameSource;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.SoftSensorSettings;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * A recording (a replay file or a period of history) run through the live path's estimator,
 * alarm board and fuel-trim advisor on the feed's own thread ("plateward-replay"), driven by
 * the window's replay controls: the feed estimates frames until its head reaches the time asked
 * for ({@link #runTo}), or until the next alarm annunciates or clears ({@link #runToNextAlarm}),
 * and then waits. Frames already estimated stay in the window's {@link Timeline}, so going back
 * never re-runs the estimator.
 *
 * <p>Operator actions act on the alarm board at the head's time and go to the audit (the
 * history recorder given, if any).
 */
public final class ReplayFeed implements DisplayFeed {
  private static final Logger LOG = LoggerFactory.getLogger(ReplayFeed.class);

  private final UnitSpec unit;
  private final String sourceName;
  private final FrameSource source;
  private final double firstS;
  private final double lastS;
  private final long frameCount;
  private final ReactorSoftSensor sensor;
  private final AdvisoryStage stage;
  private final AlarmBoard board;
  private final HistoryRecorder audit;
  private final ConcurrentLinkedQueue<Runnable> actions = new ConcurrentLinkedQueue<>();
  private final Object lock = new Object();
  private volatile double targetS = Double.NEGATIVE_INFINITY;
  private volatile boolean untilAlarm;
  private volatile double headS = Double.NaN;
  private volatile long estimated;
  private volatile boolean ended;
  private volatile boolean closed;
  private volatile String failure;
  private Thread thread;
  // feed thread only
  private TrimSuggestion advice;
  private Instant headTime;
  private Snapshot lastSnapshot;
  private Consumer<Snapshot> sink;

  private ReplayFeed(UnitSpec unit, AlarmSettings alarms, TrimSettings advisorSettings, String sourceName,
      FrameSource source, double firstS, double lastS, long frameCount, HistoryRecorder audit) {
    this.unit = unit;
    this.sourceName = sourceName;
    this.source = source;
    this.firstS = firstS;
    this.lastS = lastS;
    this.frameCount = frameCount;
    this.audit = audit;
    this.sensor = new ReactorSoftSensor(unit, SoftSensorSettings.defaults(), FilterSettings.defaults());
    this.stage = new AdvisoryStage(unit, sensor, alarms, advisorSettings,
        audit == null ? AlarmAudit.NONE : new HistoryAlarmAudit(audit));
    this.board = stage.board();
  }

  /**
   * A replay file. Its frames are counted first (one quick read) so the controls know the span.
   *
   * @param unit the unit the recording is of
   * @param alarms advisory alarm definitions (null: none judged, and no advice)
   * @param advisorSettings the fuel-trim advisor's settings (null: the defaults with the
   *     peak_high limit, as live)
   * @param file the replay file
   * @param audit where alarm transitions and operator actions go (null: not kept)
   * @throws IOException when the file cannot be read or is not a replay file
   */
  public static ReplayFeed ofFile(UnitSpec unit, AlarmSettings alarms, TrimSettings advisorSettings, Path file,
      HistoryRecorder audit) throws IOException {
    double first = Double.NaN;
    double last = Double.NaN;
    long n = 0;
    try (ReplayFrameSource scan = ReplayFrameSource.open(file)) {
      Frame f;
      while ((f = scan.next()) != null) {
        last = Timeline.seconds(f.time());
        if (n++ == 0) {
          first = last;
        }
      }
    }
    if (n == 0) {
      throw new IOException(file + ": no frames in the file");
    }
    return new ReplayFeed(unit, alarms, advisorSettings, "replay: " + file.getFileName(), ReplayFrameSource.open(file),
        first, last, n, audit);
  }

  /**
   * A period [from, to) of a history file; alarms and advisor as for {@link #ofFile}.
   *
   * @throws org.plateward.history.HistoryException when the history cannot be read
   */
  public static ReplayFeed ofHistory(UnitSpec unit, AlarmSettings alarms, TrimSettings advisorSettings, Path db,
      Instant from, Instant to, HistoryRecorder audit) throws org.plateward.history.HistoryException {
    return new ReplayFeed(unit, alarms, advisorSettings, "replay: " + db.getFileName() + " " + from + " .. " + to,
        HistoryFrameSource.open(db, from, to), Timeline.seconds(from), Timeline.seconds(to) - 1.0, -1, audit);
  }

  @Override
  public UnitSpec unit() {
    return unit;
  }

  @Override
  public double[] cellCentresM() {
    double[] c = new double[sensor.model().grid().cells()];
    for (int j = 0; j < c.length; j++) {
      c[j] = sensor.model().grid().centreM(j);
    }
    return c;
  }

  /** Time of the recording's first frame, epoch s. */
  public double firstS() {
    return firstS;
  }

  /** Time of its last frame (for a history period: the end of the period), epoch s. */
  public double lastS() {
    return lastS;
  }

  /** Time of the last frame estimated, epoch s (NaN before the first). */
  public double headS() {
    return headS;
  }

  /** Whether every frame has been estimated. */
  public boolean ended() {
    return ended;
  }

  /** Estimates until the head reaches {@code tS} (epoch s), then waits. */
  public void runTo(double tS) {
    if (tS > targetS) {
      targetS = tS;
      wake();
    }
  }

  /** Estimates until the next alarm annunciation or clearing (or the end), then waits. */
  public void runToNextAlarm() {
    untilAlarm = true;
    wake();
  }

  /** Whether the feed is estimating now (asked to reach a later time or the next alarm). */
  public boolean busy() {
    return !ended && (untilAlarm || targetS > (Double.isNaN(headS) ? Double.NEGATIVE_INFINITY : headS));
  }

  private void wake() {
    synchronized (lock) {
      lock.notifyAll();
    }
  }

  @Override
  public void start(Consumer<Snapshot> sink) {
    thread = new Thread(() -> loop(sink), "plateward-replay");
    thread.setDaemon(true);
    thread.start();
  }

  private void loop(Consumer<Snapshot> sink) {
    this.sink = sink;
    try {
      while (!closed) {
        Runnable a;
        while ((a = actions.poll()) != null) {
          a.run();
        }
        boolean want = !ended && (untilAlarm || Double.isNaN(headS) || headS < targetS);
        if (!want) {
          synchronized (lock) {
            if (actions.isEmpty() && !closed) {
              lock.wait(50);
            }
          }
          continue;
        }
        Frame f = source.next();
        if (f == null) {
          ended = true;
          untilAlarm = false;
          continue;
        }
        Snapshot s = step(f);
        headS = Timeline.seconds(f.time());
        estimated++;
        if (untilAlarm) {
          for (AlarmEvent ev : s.events()) {
            if (ev.to().annunciated() || ev.from().annunciated()) {
              untilAlarm = false;
              targetS = Math.max(targetS, headS);
            }
          }
        }
        lastSnapshot = s;
        sink.accept(s);
      }
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    } catch (IOException | RuntimeException e) {
      failure = e.getMessage();
      ended = true;
      LOG.error("replay stopped at {}: {}", source.position(), e.getMessage(), e);
    }
  }

  private Snapshot step(Frame f) {
    Estimate e = sensor.accept(f);
    headTime = e.time();
    // the live path's alarms and advice (AdvisoryStage); a recording has no link to lose, and
    // its MISSING values of continuously reporting signals stand for the aligner's stale flag
    List<AlarmEvent> events = stage.judge(e, BadOrStale.recorded(f), false,
        audit != null && audit.health().state() == HistoryHealth.State.NOT_KEEPING);
    stage.advise(e, sensor).ifPresent(sug -> {
      advice = sug;
      if (audit != null) {
        audit.appendSuggestion(AdvisoryStage.suggestionRow(sug, e.time()));
      }
    });
    return new Snapshot(f, e, EstimatorReadout.predictedOutputsK(sensor), sensor.lastFastChannelStatus(),
        board == null ? List.of() : board.statuses(), events, advice);
  }

  @Override
  public FeedStatus status() {
    String where = frameCount > 0
        ? String.format(java.util.Locale.ROOT, "%d of %d frames estimated", estimated, frameCount)
        : estimated + " frames estimated";
    String link = failure != null ? "replay stopped: " + failure : ended ? "replay: end of recording" : "replay";
    String hist = audit == null ? "alarm audit not kept (no audit file given)"
        : "alarm audit: " + audit.settings().databaseFile()
            + (audit.health().ok() ? "" : " - NOT KEEPING: " + audit.health().reason());
    return new FeedStatus(sourceName + " (" + where + ")", link, failure == null, Double.NaN,
        "recorded plant time", hist, audit == null || audit.health().ok());
  }

  @Override
  public CompletableFuture<ActionResult> alarmAction(ActionKind action, String who, AlarmKind alarm,
      String reason, Duration shelveFor) {
    CompletableFuture<ActionResult> f = new CompletableFuture<>();
    if (board == null) {
      f.completeExceptionally(new IllegalStateException("no advisory alarms are judged (no [alarms] configuration)"));
      return f;
    }
    actions.add(() -> {
      try {
        Instant now = headTime == null ? Timeline.instant(firstS) : headTime;
        ActionResult r = board.take(action, now, who, alarm, reason, shelveFor);
        if (r.accepted() && lastSnapshot != null && sink != null) {
          // the same frame again with the statuses after the action, so the window shows it now
          Snapshot p = lastSnapshot;
          lastSnapshot = new Snapshot(p.frame(), p.estimate(), p.predictedSi(), p.fastStatus(), board.statuses(),
              r.events(), p.advice());
          sink.accept(lastSnapshot);
        }
        f.complete(r);
      } catch (RuntimeException ex) {
        f.completeExceptionally(ex);
      }
    });
    wake();
    return f;
  }

  /** The alarm board's statuses now, read on the feed thread (for tests and the first paint). */
  CompletableFuture<List<org.plateward.alarms.AlarmStatus>> alarmStatuses() {
    CompletableFuture<List<org.plateward.alarms.AlarmStatus>> f = new CompletableFuture<>();
    actions.add(() -> f.complete(board == null ? List.of() : new ArrayList<>(board.statuses())));
    wake();
    return f;
  }

  @Override
  public ReplayFeed replay() {
    return this;
  }

  @Override
  public void close() {
    closed = true;
    wake();
    if (thread != null) {
      try {
        thread.join(5000);
      } catch (InterruptedException e) {
        Thread.currentThread().interrupt();
      }
    }
    try {
      source.close();
    } catch (IOException e) {
      LOG.warn("closing {}: {}", sourceName, e.toString());
    }
  }
}
