package org.plateward.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.Slider;
import javafx.scene.image.WritableImage;
import javafx.scene.input.KeyCode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.alarms.AlarmKind;
import org.plateward.alarms.AlarmState;
import org.plateward.alarms.AlarmStatus;
import org.plateward.history.HistoryReader;
import org.plateward.history.HistoryRecorder;
import org.plateward.history.HistorySettings;
import org.plateward.history.OperatorActionRow;
import org.plateward.history.AlarmEventRow;
import org.testfx.api.FxRobot;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The window on the fuel-surge recording (invented data from the project's plant simulator)
 * through the real replay path, headless. Checks that every view draws, that an acknowledge
 * changes the alarm's state and writes the audit row, and that the replay controls move time.
 */
class ControlRoomWindowTest {
  /** 30 min into the recording: 10 min after the fuel surge began, the buffer is melting. */
  private static final double AT_S = 1800;

  @Test
  void everyViewRendersFromTheRecording() throws Exception {
    try (WindowFixture w = WindowFixture.open(WindowFixture.FUEL_SURGE, null)) {
      double t = w.feed.firstS() + AT_S;
      w.fxRun(() -> w.window.cursor().scrubTo(t));
      w.awaitCursor(t, 60);
      int[] minDark = {20_000, 20_000, 2_000, 5_000, 500, 5_000};
      for (int v = 0; v < 6; v++) {
        WritableImage img = w.snapshotOf(v);
        // below the status strip and tabs, above the caution: the view's own drawing
        int dark = WindowFixture.darkPixels(img, 120, (int) img.getHeight() - 60);
        assertThat(dark).as("dark pixels drawn by view %d (%s)", v, w.window.views().get(v).title())
            .isGreaterThan(minDark[v]);
      }
      int i = w.fx(() -> w.window.timeline().indexAt(t));
      Timeline tl = w.window.timeline();
      double peakK = w.fx(() -> tl.value(Trace.PEAK_K, i));
      // the profile's marker names the estimate's hidden peak in degC with its sigma and position
      String label = w.fx(() -> w.window.profile().peakText());
      assertThat(label).startsWith("hidden peak ")
          .contains(String.format(Locale.ROOT, "%.1f ±", peakK - 273.15)).contains("mm");
      // by 10 min after the surge the buffer of the hottest cell melts (replay-data/README.md:
      // first cell fully melted at 1507 s), so the melt alarm is annunciated
      List<AlarmStatus> rows = w.fx(() -> w.window.alarms().rows());
      assertThat(rows).extracting(AlarmStatus::kind).contains(AlarmKind.MELT_HIGH);
      assertThat(w.fx(() -> w.window.advisor().text())).contains("ADVISORY");
      assertThat(w.fx(() -> w.window.strip().estimatorText())).startsWith("estimator: ");
    }
  }

  @Test
  void acknowledgingAnAlarmChangesItsStateAndWritesTheAuditRow(@TempDir Path dir) throws Exception {
    Path db = dir.resolve("audit.db");
    HistoryRecorder audit = HistoryRecorder.start(HistorySettings.at(db));
    Instant actedAfter;
    try (WindowFixture w = WindowFixture.open(WindowFixture.FUEL_SURGE, audit)) {
      double t = w.feed.firstS() + AT_S;
      w.fxRun(() -> w.window.cursor().scrubTo(t));
      w.awaitCursor(t, 60);
      w.snapshotOf(2);
      assertThat(w.fx(() -> w.window.alarms().select(AlarmKind.MELT_HIGH))).isTrue();
      AlarmState before = w.fx(() -> state(w.window.alarms().rows(), AlarmKind.MELT_HIGH));
      assertThat(before).isEqualTo(AlarmState.UNACKNOWLEDGED);
      actedAfter = Instant.ofEpochMilli((long) (t * 1000));
      FxRobot robot = new FxRobot();
      robot.clickOn("#alarm-operator").eraseText(40).write("shift-b");
      robot.clickOn("#alarm-reason").write("melt seen, fuel being reduced");
      w.fx(() -> w.window.alarms().select(AlarmKind.MELT_HIGH));
      robot.clickOn("#alarm-ack");
      WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> w.fx(() -> {
        w.window.pulseNow();
        return state(w.window.alarms().rows(), AlarmKind.MELT_HIGH) == AlarmState.ACKNOWLEDGED;
      }));
      assertThat(w.fx(() -> ((javafx.scene.control.Label) w.stage.getScene().lookup("#alarm-answer")).getText()))
          .startsWith("done: ");
    }
    assertThat(audit.flush(Duration.ofSeconds(10))).isTrue();
    audit.close();
    try (HistoryReader r = HistoryReader.open(db)) {
      List<OperatorActionRow> acts = r.operatorActions(Instant.EPOCH, Instant.parse("2100-01-01T00:00:00Z"));
      assertThat(acts).hasSize(1);
      OperatorActionRow a = acts.get(0);
      assertThat(a.who()).isEqualTo("shift-b");
      assertThat(a.action()).isEqualTo("acknowledge");
      assertThat(a.alarmId()).isEqualTo("melt_high");
      assertThat(a.reason()).isEqualTo("melt seen, fuel being reduced");
      assertThat(a.time()).isAfterOrEqualTo(actedAfter.minusSeconds(1));
      List<AlarmEventRow> ev = r.alarmEvents(Instant.EPOCH, Instant.parse("2100-01-01T00:00:00Z"));
      assertThat(ev).anySatisfy(e -> {
        assertThat(e.alarmId()).isEqualTo("melt_high");
        assertThat(e.transition()).isEqualTo("unacknowledged -> acknowledged");
      });
    }
  }

  @Test
  void replayControlsMoveTime() throws Exception {
    try (WindowFixture w = WindowFixture.open(WindowFixture.FUEL_SURGE, null)) {
      double first = w.feed.firstS();
      w.snapshotOf(4);
      FxRobot robot = new FxRobot();
      // scrub: the slider to 25 min into the recording
      Slider s = (Slider) w.stage.getScene().lookup("#replay-scrub");
      w.fxRun(() -> s.setValue(first + 1500));
      w.awaitCursor(first + 1500, 60);
      assertThat(w.fx(() -> w.window.cursor().cursorS())).isEqualTo(first + 1500);
      // keyboard: one minute back
      robot.press(KeyCode.CONTROL).press(KeyCode.LEFT).release(KeyCode.LEFT).release(KeyCode.CONTROL);
      WaitForAsyncUtils.waitFor(10, TimeUnit.SECONDS, () -> w.fx(() -> {
        w.window.pulseNow();
        return w.window.cursor().cursorS() == first + 1440;
      }));
      // jump to the next alarm: lands on the first annunciation or clearing after the cursor
      double from = w.fx(() -> w.window.cursor().cursorS());
      robot.clickOn("#replay-next-alarm");
      WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> w.fx(() -> {
        w.window.pulseNow();
        return w.window.cursor().cursorS() > from;
      }));
      double at = w.fx(() -> w.window.cursor().cursorS());
      var ev = w.fx(() -> w.window.timeline().nextEventAfter(from));
      assertThat(ev).isNotNull();
      assertThat(at).isEqualTo(Timeline.seconds(ev.time()));
      assertThat(ev.to().annunciated() || ev.from().annunciated()).isTrue();
      assertThat(w.fx(() -> w.window.cursor().playing())).isFalse();
      String shown = w.fx(() -> ((javafx.scene.control.Label) w.stage.getScene().lookup("#replay-time")).getText());
      assertThat(shown).contains(Timeline.instant(at).toString());
    }
  }

  private static AlarmState state(List<AlarmStatus> rows, AlarmKind k) {
    for (AlarmStatus a : rows) {
      if (a.kind() == k) {
        return a.state();
      }
    }
    return AlarmState.NORMAL;
  }
}
