package org.plateward.ui;

import java.time.Instant;
import java.util.Locale;
import javafx.collections.FXCollections;
import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.Slider;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;

/**
 * Replay: play, pause, speed, scrub and jump to the next alarm over a recording. Keyboard:
 * Ctrl+P plays or pauses, Ctrl+Left / Ctrl+Right step one minute, Ctrl+N jumps to the next
 * alarm, Ctrl+End to the last frame estimated (the window binds them).
 */
final class ReplayView implements TimelineView {
  static final double[] SPEEDS = {1, 10, 60, 600, ReplayCursor.MAX};

  private final VBox root = new VBox(10);
  private final ReplayCursor cursor;
  private final ReplayFeed feed;
  private final Button play = new Button("_Play");
  private final Button next = new Button("Next _alarm");
  private final Button back = new Button("_Back 1 min");
  private final Button fwd = new Button("_Forward 1 min");
  private final Button end = new Button("_Latest estimated");
  private final ChoiceBox<Double> speed = new ChoiceBox<>();
  private final Slider scrub = new Slider();
  private final Label time = new Label();
  private final Label note = new Label();
  private final Label recording = new Label();
  private final javafx.scene.control.ListView<org.plateward.alarms.AlarmEvent> marks = new javafx.scene.control.ListView<>();
  private int marksShown = -1;
  private boolean updating;
  private Timeline last;

  /** @param cursor the replay cursor (null for a live feed: the view says so) */
  ReplayView(ReplayCursor cursor, ReplayFeed feed) {
    this.cursor = cursor;
    this.feed = feed;
    root.setPadding(new Insets(12));
    if (cursor == null) {
      root.getChildren().add(new Label("Live feed: the replay controls apply to recordings "
          + "(plateward replay --ui --input F.csv, or --db F --from T1 --to T2)."));
      return;
    }
    play.setId("replay-play");
    next.setId("replay-next-alarm");
    scrub.setId("replay-scrub");
    time.setId("replay-time");
    note.setId("replay-note");
    speed.setId("replay-speed");
    speed.setItems(FXCollections.observableArrayList(SPEEDS[0], SPEEDS[1], SPEEDS[2], SPEEDS[3], SPEEDS[4]));
    speed.setConverter(new javafx.util.StringConverter<>() {
      @Override
      public String toString(Double d) {
        return d == null ? "" : d.isInfinite() ? "as fast as the estimator goes" : String.format(Locale.ROOT, "%.0f x real time", d);
      }

      @Override
      public Double fromString(String s) {
        return null;
      }
    });
    speed.setValue(cursor.speed());
    speed.valueProperty().addListener((o, a, b) -> {
      if (b != null) {
        cursor.speed(b);
      }
    });
    play.setOnAction(e -> cursor.togglePlay());
    next.setOnAction(e -> {
      if (last != null) {
        cursor.nextAlarm(last);
      }
    });
    back.setOnAction(e -> cursor.step(-60));
    fwd.setOnAction(e -> cursor.step(60));
    end.setOnAction(e -> cursor.toHead());
    scrub.setMin(feed.firstS());
    scrub.setMax(feed.lastS());
    scrub.setValue(feed.firstS());
    scrub.valueProperty().addListener((o, a, b) -> {
      if (!updating) {
        cursor.scrubTo(b.doubleValue());
      }
    });
    Label sLabel = new Label("_Speed:");
    sLabel.setMnemonicParsing(true);
    sLabel.setLabelFor(speed);
    HBox buttons = new HBox(8, play, back, fwd, next, end, sLabel, speed);
    buttons.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
    HBox.setHgrow(scrub, Priority.ALWAYS);
    time.setStyle("-fx-font-size: 14px; -fx-font-weight: bold;");
    marks.setId("replay-marks");
    marks.setCellFactory(l -> new javafx.scene.control.ListCell<>() {
      @Override
      protected void updateItem(org.plateward.alarms.AlarmEvent e, boolean empty) {
        super.updateItem(e, empty);
        setGraphic(empty || e == null ? null : PriorityMark.of(e.priority()));
        setText(empty || e == null ? null : e.time() + "  " + PriorityMark.word(e.priority()) + "  " + e.alarm().key()
            + ": " + AlarmsView.stateWords(e.to()));
      }
    });
    marks.setOnMouseClicked(e -> {
      if (e.getClickCount() == 2) {
        jumpToMark();
      }
    });
    marks.setOnKeyPressed(e -> {
      if (e.getCode() == javafx.scene.input.KeyCode.ENTER) {
        jumpToMark();
      }
    });
    VBox.setVgrow(marks, Priority.ALWAYS);
    Label mLabel = new Label("Alarm annunciations and clearings estimated so far (_Enter or double-click: go there):");
    mLabel.setMnemonicParsing(true);
    mLabel.setLabelFor(marks);
    root.getChildren().addAll(recording, buttons,
        new Label("Scrub (drag, or Ctrl+Left / Ctrl+Right):"), scrub, time, note,
        new Label("Keyboard: Ctrl+P play/pause, Ctrl+Left/Right one minute, Ctrl+N next alarm, Ctrl+End latest estimated."
            + " Operator actions on alarms apply at the latest estimated time."), mLabel, marks);
  }

  private void jumpToMark() {
    var e = marks.getSelectionModel().getSelectedItem();
    if (e != null) {
      cursor.pause();
      cursor.scrubTo(Timeline.seconds(e.time()));
    }
  }

  @Override
  public String title() {
    return "Replay";
  }

  @Override
  public Node node() {
    return root;
  }

  /** Updates the controls (called every pulse, whichever view is shown; cheap). */
  void refresh(Timeline tl, double cursorS) {
    last = tl;
    if (cursor == null) {
      return;
    }
    play.setText(cursor.playing() ? "_Pause" : "_Play");
    recording.setText("Recording: " + feed.status().source());
    if (!Double.isNaN(cursorS) && !scrub.isValueChanging()) {
      updating = true;
      scrub.setValue(cursorS);
      updating = false;
    }
    double head = feed.headS();
    time.setText(Double.isNaN(cursorS) ? "no frame yet"
        : String.format(Locale.ROOT, "cursor %s   (%.1f min into the recording; estimated up to %s)",
            Timeline.instant(cursorS), (cursorS - feed.firstS()) / 60.0,
            Double.isNaN(head) ? "-" : Instant.ofEpochMilli(Math.round(head * 1000)).toString()));
    note.setText(cursor.note());
    java.util.List<org.plateward.alarms.AlarmEvent> ev = tl.events();
    if (ev.size() != marksShown) {
      marksShown = ev.size();
      java.util.List<org.plateward.alarms.AlarmEvent> m = new java.util.ArrayList<>();
      for (var e : ev) {
        if (e.to().annunciated() != e.from().annunciated() || e.to() == org.plateward.alarms.AlarmState.UNACKNOWLEDGED
            && e.from() != org.plateward.alarms.AlarmState.UNACKNOWLEDGED) {
          m.add(e);
        }
      }
      marks.getItems().setAll(m);
    }
  }

  @Override
  public void show(Timeline tl, int index) {
    last = tl;
  }
}
