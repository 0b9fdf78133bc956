package org.plateward.ui;

import java.util.ArrayList;
import java.util.List;
import javafx.animation.AnimationTimer;
import javafx.geometry.Insets;
import javafx.scene.Parent;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import org.plateward.Advisory;
import org.plateward.alarms.AlarmSettings;

/**
 * The control-room window: the always-visible status strip and caution, and the six views as
 * tabs. One {@link AnimationTimer} is the render tick: on each pulse it takes a bounded batch of
 * snapshots from the {@link SnapshotMailbox} into the {@link Timeline}, moves the replay cursor,
 * and redraws the view on show (at most 20 times a second; the others redraw when selected).
 * The feed's thread never touches a node. Keyboard: Ctrl+1..6 choose the view; Ctrl+P, Ctrl+Left,
 * Ctrl+Right, Ctrl+N and Ctrl+End drive a replay; each button has a mnemonic (Alt+letter).
 */
public final class ControlRoomWindow {
  /** Snapshots taken in per pulse at most. */
  static final int BATCH = 4000;
  private static final long REDRAW_NS = 50_000_000L;
  private static final long STATUS_NS = 250_000_000L;

  private final DisplayFeed feed;
  private final SnapshotMailbox mailbox;
  private final Timeline timeline = new Timeline();
  private final PulseTimings timings = new PulseTimings(4096);
  private final PulseTimings cpuTimings = new PulseTimings(4096);
  private final PulseTimings[] viewTimings = new PulseTimings[6];
  private final java.lang.management.ThreadMXBean threads = java.lang.management.ManagementFactory.getThreadMXBean();
  private long lastReplayNs;
  private final ReplayCursor cursor;
  private final StatusStrip strip = new StatusStrip();
  private final TabPane tabs = new TabPane();
  private final PlateProfileView profile;
  private final TrendsView trends;
  private final AlarmsView alarms;
  private final AdvisorView advisor;
  private final ReplayView replay;
  private final HealthView health;
  private final List<TimelineView> views = new ArrayList<>();
  private final BorderPane root = new BorderPane();
  private final List<Snapshot> batch = new ArrayList<>();
  private final AnimationTimer pulse;
  private long lastPulseNs;
  private long lastRedrawNs;
  private long lastStatusNs;
  private int shownIndex = -2;
  private long shownVersion = -1;
  private TimelineView shownView;

  /**
   * Builds the window's scene graph (FX thread). Call {@link #start()} to begin.
   *
   * @param feed where the data come from
   * @param alarmSettings the alarm definitions (limits drawn in the trends; may be null)
   */
  public ControlRoomWindow(DisplayFeed feed, AlarmSettings alarmSettings) {
    this.feed = feed;
    ReplayFeed rf = feed.replay();
    this.mailbox = new SnapshotMailbox(20_000, rf != null);
    this.cursor = rf == null ? null : new ReplayCursor(rf);
    profile = new PlateProfileView(feed.unit(), feed.cellCentresM());
    trends = new TrendsView(feed.unit(), alarmSettings);
    alarms = new AlarmsView(feed);
    advisor = new AdvisorView(feed.unit());
    replay = new ReplayView(cursor, rf);
    health = new HealthView();
    views.addAll(List.of(profile, trends, alarms, advisor, replay, health));
    for (int i = 0; i < views.size(); i++) {
      Tab t = new Tab((i + 1) + " " + views.get(i).title(), views.get(i).node());
      t.setClosable(false);
      t.setId("view-" + i);
      tabs.getTabs().add(t);
    }
    tabs.getSelectionModel().selectedIndexProperty().addListener((o, a, b) -> shownIndex = -2);
    Label caution = new Label(Advisory.SHORT + " An estimate is only as good as the model and the measurements behind it.");
    caution.setId("caution");
    caution.setWrapText(true);
    caution.setPadding(new Insets(4, 8, 4, 8));
    caution.setStyle("-fx-font-weight: bold; -fx-border-color: #888888 transparent transparent transparent;");
    root.setTop(strip.node());
    root.setCenter(tabs);
    root.setBottom(caution);
    root.setStyle("-fx-base: " + Palette.css(Palette.BACKGROUND) + "; -fx-background-color: "
        + Palette.css(Palette.BACKGROUND) + "; -fx-control-inner-background: " + Palette.css(Palette.PLOT)
        + "; -fx-font-size: 12px;");
    for (int i = 0; i < viewTimings.length; i++) {
      viewTimings[i] = new PulseTimings(2048);
    }
    pulse = new AnimationTimer() {
      @Override
      public void handle(long now) {
        onPulse(now);
      }
    };
  }

  /** The root node (put it in a scene). */
  public Parent root() {
    return root;
  }

  /** Binds the keyboard shortcuts to a scene holding {@link #root()}. */
  public void bindKeys(Scene scene) {
    for (int i = 0; i < views.size(); i++) {
      int k = i;
      scene.getAccelerators().put(new KeyCodeCombination(KeyCode.getKeyCode(String.valueOf(i + 1)),
          KeyCombination.SHORTCUT_DOWN), () -> tabs.getSelectionModel().select(k));
    }
    if (cursor != null) {
      scene.getAccelerators().put(new KeyCodeCombination(KeyCode.P, KeyCombination.SHORTCUT_DOWN), cursor::togglePlay);
      scene.getAccelerators().put(new KeyCodeCombination(KeyCode.LEFT, KeyCombination.SHORTCUT_DOWN), () -> cursor.step(-60));
      scene.getAccelerators().put(new KeyCodeCombination(KeyCode.RIGHT, KeyCombination.SHORTCUT_DOWN), () -> cursor.step(60));
      scene.getAccelerators().put(new KeyCodeCombination(KeyCode.N, KeyCombination.SHORTCUT_DOWN), () -> cursor.nextAlarm(timeline));
      scene.getAccelerators().put(new KeyCodeCombination(KeyCode.END, KeyCombination.SHORTCUT_DOWN), cursor::toHead);
    }
  }

  /** Starts the feed and the render tick (FX thread). */
  public void start() {
    feed.start(mailbox::offer);
    pulse.start();
  }

  /** Stops the render tick and lets a waiting feed go (FX thread); the feed is closed by its owner. */
  public void stop() {
    pulse.stop();
    mailbox.close();
  }

  /** Runs one pulse now (FX thread; tests). */
  void pulseNow() {
    onPulse(System.nanoTime());
  }

  private void onPulse(long now) {
    long t0 = System.nanoTime();
    long c0 = threads.getCurrentThreadCpuTime();
    batch.clear();
    mailbox.drainTo(batch, BATCH);
    for (Snapshot s : batch) {
      timeline.append(s);
    }
    double wallDt = lastPulseNs == 0 ? 0 : Math.min(0.5, (now - lastPulseNs) / 1e9);
    lastPulseNs = now;
    int index;
    if (cursor != null) {
      double c = cursor.tick(wallDt, timeline);
      index = Double.isNaN(c) ? -1 : timeline.indexAt(c);
      // controls follow a scrub or jump at once, and a playing cursor four times a second
      if (now - lastReplayNs >= STATUS_NS || (!cursor.playing() && index != shownIndex)) {
        replay.refresh(timeline, c);
        lastReplayNs = now;
      }
      boolean atHead = index == timeline.size() - 1;
      alarms.allowActions(atHead, "actions apply at the latest estimated time: go there first (Ctrl+End)");
    } else {
      index = timeline.size() - 1;
    }
    TimelineView view = views.get(tabs.getSelectionModel().getSelectedIndex());
    boolean changed = index != shownIndex || timeline.version() != shownVersion || view != shownView;
    if (changed && (view != shownView || now - lastRedrawNs >= REDRAW_NS)) {
      view.show(timeline, index);
      if (view != alarms) {
        alarms.show(timeline, index); // cheap unless the alarm list changed
      }
      shownIndex = index;
      shownVersion = timeline.version();
      shownView = view;
      lastRedrawNs = now;
    }
    if (now - lastStatusNs >= STATUS_NS || changed && index != shownIndex) {
      strip.update(feed.status(), timeline, index);
      lastStatusNs = now;
    }
    long busy = System.nanoTime() - t0;
    timings.add(busy);
    cpuTimings.add(threads.getCurrentThreadCpuTime() - c0);
    viewTimings[tabs.getSelectionModel().getSelectedIndex()].add(busy);
  }

  // --- for tests, screenshots and the benchmark ------------------------------------------------

  Timeline timeline() {
    return timeline;
  }

  PulseTimings timings() {
    return timings;
  }

  /** The FX thread's CPU time per pulse (excludes time the thread waited for a core). */
  PulseTimings cpuTimings() {
    return cpuTimings;
  }

  /** Busy time per pulse while view i was shown. */
  PulseTimings viewTimings(int i) {
    return viewTimings[i];
  }

  ReplayCursor cursor() {
    return cursor;
  }

  TabPane tabs() {
    return tabs;
  }

  List<TimelineView> views() {
    return views;
  }

  PlateProfileView profile() {
    return profile;
  }

  TrendsView trends() {
    return trends;
  }

  AlarmsView alarms() {
    return alarms;
  }

  AdvisorView advisor() {
    return advisor;
  }

  HealthView health() {
    return health;
  }

  StatusStrip strip() {
    return strip;
  }

  SnapshotMailbox mailbox() {
    return mailbox;
  }

  /** Forces the shown view to redraw on the next pulse. */
  void invalidate() {
    shownIndex = -2;
    shownView = null;
  }
}
