package org.plateward.ui;

import java.time.Duration;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.function.Consumer;
import org.plateward.alarms.ActionKind;
import org.plateward.alarms.ActionResult;
import org.plateward.alarms.AlarmEvent;
import org.plateward.alarms.AlarmKind;
import org.plateward.alarms.AlarmState;
import org.plateward.alarms.AlarmStatus;
import org.plateward.live.LiveMonitor;
import org.plateward.live.MonitorStatus;
import org.plateward.live.StatusBlock;
import org.plateward.opcua.ConnectionState;
import org.plateward.reactor.UnitSpec;

/**
 * The live monitor as the window's feed ({@code plateward demo} and {@code plateward watch}):
 * each frame's snapshot is built in the monitor's frame listener, on the estimator thread.
 * Alarm transitions are read off the successive alarm statuses (the monitor judges them; the
 * window only notices the change of state). The monitor is owned by the caller.
 */
public final class LiveFeed implements DisplayFeed {
  private final LiveMonitor monitor;
  private final UnitSpec unit;
  // estimator thread only
  private final Map<AlarmKind, AlarmState> lastStates = new EnumMap<>(AlarmKind.class);

  /**
   * @param monitor the running monitor (owned by the caller)
   * @param unit the unit it watches
   */
  public LiveFeed(LiveMonitor monitor, UnitSpec unit) {
    this.monitor = monitor;
    this.unit = unit;
  }

  @Override
  public UnitSpec unit() {
    return unit;
  }

  @Override
  public double[] cellCentresM() {
    var g = monitor.sensor().model().grid();
    double[] c = new double[g.cells()];
    for (int j = 0; j < c.length; j++) {
      c[j] = g.centreM(j);
    }
    return c;
  }

  @Override
  public void start(Consumer<Snapshot> sink) {
    monitor.addFrameListener((frame, e) -> {
      MonitorStatus st = monitor.status();
      List<AlarmEvent> events = new ArrayList<>();
      for (AlarmStatus a : st.alarms()) {
        AlarmState before = lastStates.getOrDefault(a.kind(), AlarmState.NORMAL);
        if (before != a.state()) {
          events.add(new AlarmEvent(e.time(), a.kind(), before, a.state(), a.priority(), a.value(), a.limit(),
              a.kind().title() + ": " + a.state().word().replace('_', ' ')));
          lastStates.put(a.kind(), a.state());
        }
      }
      sink.accept(new Snapshot(frame, e, EstimatorReadout.predictedOutputsK(monitor.sensor()),
          monitor.sensor().lastFastChannelStatus(), st.alarms(), events, st.advice()));
    });
  }

  @Override
  public FeedStatus status() {
    MonitorStatus s = monitor.status();
    String clock = s.clock().realTime() ? "plant time = wall clock"
        : String.format(Locale.ROOT, "simulated plant time, %s x real time", trim(s.clock().speed()));
    String hist = s.history() == null ? "history not kept"
        : "history " + StatusBlock.historyWord(s.history().state()) + ": " + s.historyFile()
            + (s.history().ok() || s.history().reason() == null ? "" : " - " + s.history().reason());
    String link = s.link().name().toLowerCase(Locale.ROOT)
        + (s.linkReason() == null || s.linkReason().isEmpty() || s.link() == ConnectionState.CONNECTED
            ? "" : " (" + s.linkReason() + ")");
    return new FeedStatus("live: " + s.unitName() + " at " + s.endpointUrl()
        + (s.droppedFrames() > 0 ? ", " + s.droppedFrames() + " frames dropped (estimator behind)" : ""),
        link, s.link() == ConnectionState.CONNECTED, s.dataAgeS(), clock, hist,
        s.history() == null || s.history().ok());
  }

  private static String trim(double x) {
    return x == Math.rint(x) ? String.valueOf((long) x) : String.valueOf(x);
  }

  @Override
  public CompletableFuture<ActionResult> alarmAction(ActionKind action, String who, AlarmKind alarm,
      String reason, Duration shelveFor) {
    return monitor.alarmAction(action, who, alarm, reason, shelveFor);
  }

  @Override
  public void close() {
    // the monitor belongs to the command that started it
  }
}
