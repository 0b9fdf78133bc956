package org.plateward.ui;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javafx.application.Platform;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.TableCell;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.plateward.alarms.ActionKind;
import org.plateward.alarms.ActionResult;
import org.plateward.alarms.AlarmEvent;
import org.plateward.alarms.AlarmState;
import org.plateward.alarms.AlarmStatus;

/**
 * Alarms: the advisory alarms that are annunciated, shelved or out of service, and the recent
 * transitions; acknowledge, shelve (reason and duration required) and unshelve go to the alarm
 * board through the feed, which writes the audit trail. Priority is a shape and a word as well
 * as a colour.
 */
final class AlarmsView implements TimelineView {
  /** Shelve durations offered. */
  static final Duration[] SHELVE_FOR = {Duration.ofMinutes(10), Duration.ofMinutes(30), Duration.ofHours(1), Duration.ofHours(2)};

  private final DisplayFeed feed;
  private final BorderPane root = new BorderPane();
  private final TableView<AlarmStatus> table = new TableView<>();
  private final ObservableList<AlarmStatus> rows = FXCollections.observableArrayList();
  private final ListView<AlarmEvent> recent = new ListView<>();
  private final ObservableList<AlarmEvent> recentRows = FXCollections.observableArrayList();
  private final TextField operator = new TextField(System.getProperty("user.name", "operator"));
  private final TextField reason = new TextField();
  private final ChoiceBox<Duration> shelveFor = new ChoiceBox<>(FXCollections.observableArrayList(SHELVE_FOR));
  private final Button ack = new Button("_Acknowledge");
  private final Button shelve = new Button("_Shelve");
  private final Button unshelve = new Button("_Unshelve");
  private final Label answer = new Label("");
  private final Label counts = new Label("");
  private Object shownAlarms;
  private int shownEvents = -1;
  private double shownUpToS = Double.NaN;
  private boolean actionsAllowed = true;
  private String actionsWhy = "";

  AlarmsView(DisplayFeed feed) {
    this.feed = feed;
    table.setId("alarm-table");
    table.setItems(rows);
    table.setPlaceholder(new Label("no alarm annunciated, shelved or out of service"));
    TableColumn<AlarmStatus, AlarmStatus> pr = new TableColumn<>("Priority");
    pr.setCellValueFactory(c -> new ReadOnlyObjectWrapper<>(c.getValue()));
    pr.setCellFactory(c -> new TableCell<>() {
      @Override
      protected void updateItem(AlarmStatus a, boolean empty) {
        super.updateItem(a, empty);
        setText(empty || a == null ? null : PriorityMark.word(a.priority()));
        setGraphic(empty || a == null ? null : PriorityMark.of(a.priority()));
      }
    });
    pr.setPrefWidth(120);
    TableColumn<AlarmStatus, String> name = new TableColumn<>("Alarm");
    name.setCellValueFactory(c -> new ReadOnlyObjectWrapper<>(c.getValue().kind().title() + " (" + c.getValue().kind().key() + ")"));
    name.setPrefWidth(330);
    TableColumn<AlarmStatus, String> state = new TableColumn<>("State");
    state.setCellValueFactory(c -> new ReadOnlyObjectWrapper<>(stateWords(c.getValue().state())));
    state.setPrefWidth(200);
    TableColumn<AlarmStatus, String> value = new TableColumn<>("Judged value / limit");
    value.setCellValueFactory(c -> new ReadOnlyObjectWrapper<>(judged(c.getValue())));
    value.setPrefWidth(300);
    TableColumn<AlarmStatus, String> shelf = new TableColumn<>("Shelved until / reason");
    shelf.setCellValueFactory(c -> new ReadOnlyObjectWrapper<>(shelfText(c.getValue())));
    shelf.setPrefWidth(360);
    table.getColumns().addAll(List.of(pr, name, state, value, shelf));
    table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);

    recent.setId("alarm-recent");
    recent.setItems(recentRows);
    recent.setCellFactory(l -> new ListCell<>() {
      @Override
      protected void updateItem(AlarmEvent e, boolean empty) {
        super.updateItem(e, empty);
        if (empty || e == null) {
          setText(null);
          setGraphic(null);
          return;
        }
        setGraphic(PriorityMark.of(e.priority()));
        setText(e.time() + "  " + PriorityMark.word(e.priority()) + "  " + e.alarm().key() + "  "
            + stateWords(e.from()) + " -> " + stateWords(e.to()) + "  " + e.message());
      }
    });
    recent.setPrefHeight(220);

    shelveFor.setValue(SHELVE_FOR[1]);
    shelveFor.setConverter(new javafx.util.StringConverter<>() {
      @Override
      public String toString(Duration d) {
        return d == null ? "" : d.toMinutes() >= 60 ? d.toHours() + " h" : d.toMinutes() + " min";
      }

      @Override
      public Duration fromString(String s) {
        return null;
      }
    });
    operator.setId("alarm-operator");
    reason.setId("alarm-reason");
    reason.setPromptText("reason (required to shelve; comment for acknowledge)");
    reason.setPrefColumnCount(30);
    ack.setId("alarm-ack");
    shelve.setId("alarm-shelve");
    unshelve.setId("alarm-unshelve");
    answer.setId("alarm-answer");
    ack.setOnAction(e -> act(ActionKind.ACKNOWLEDGE));
    shelve.setOnAction(e -> act(ActionKind.SHELVE));
    unshelve.setOnAction(e -> act(ActionKind.UNSHELVE));
    Label opLabel = new Label("_Operator:");
    opLabel.setMnemonicParsing(true);
    opLabel.setLabelFor(operator);
    Label rLabel = new Label("_Reason:");
    rLabel.setMnemonicParsing(true);
    rLabel.setLabelFor(reason);
    Label sLabel = new Label("shelve _for");
    sLabel.setMnemonicParsing(true);
    sLabel.setLabelFor(shelveFor);
    HBox actions = new HBox(6, opLabel, operator, rLabel, reason, sLabel, shelveFor, ack, shelve, unshelve);
    actions.setPadding(new Insets(6, 8, 2, 8));
    actions.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
    HBox.setHgrow(reason, Priority.ALWAYS);
    Label head = new Label("Active, shelved and out-of-service advisory alarms (most urgent first); select one, then act:");
    VBox top = new VBox(4, head, counts);
    top.setPadding(new Insets(6, 8, 2, 8));
    VBox bottom = new VBox(4, actions, answer, new Label("Recent transitions (newest first):"), recent);
    bottom.setPadding(new Insets(0, 8, 8, 8));
    root.setTop(top);
    root.setCenter(table);
    root.setBottom(bottom);
  }

  @Override
  public String title() {
    return "Alarms";
  }

  @Override
  public Node node() {
    return root;
  }

  /** Enables the actions, or disables them with the reason shown. */
  void allowActions(boolean allowed, String why) {
    if (allowed == actionsAllowed && why.equals(actionsWhy)) {
      return;
    }
    actionsAllowed = allowed;
    actionsWhy = why;
    ack.setDisable(!allowed);
    shelve.setDisable(!allowed);
    unshelve.setDisable(!allowed);
    if (!allowed) {
      answer.setText(why);
    }
  }

  /** The table's rows (FX thread). */
  List<AlarmStatus> rows() {
    return new ArrayList<>(rows);
  }

  /** Selects the alarm row of a kind; false when not shown. */
  boolean select(org.plateward.alarms.AlarmKind kind) {
    for (int i = 0; i < rows.size(); i++) {
      if (rows.get(i).kind() == kind) {
        table.getSelectionModel().select(i);
        return true;
      }
    }
    return false;
  }

  @Override
  public void show(Timeline tl, int index) {
    if (index < 0) {
      return;
    }
    List<AlarmStatus> all = tl.alarms(index);
    double upTo = tl.timeS(index);
    if (all != shownAlarms) {
      shownAlarms = all;
      AlarmStatus sel = table.getSelectionModel().getSelectedItem();
      List<AlarmStatus> shown = new ArrayList<>();
      int normal = 0;
      int suppressed = 0;
      for (AlarmStatus a : all) {
        if (a.state() == AlarmState.NORMAL) {
          normal++;
        } else if (a.state() == AlarmState.SUPPRESSED_BY_DESIGN) {
          suppressed++;
        } else {
          shown.add(a);
        }
      }
      rows.setAll(shown);
      if (sel != null) {
        select(sel.kind());
      } else if (!rows.isEmpty()) {
        table.getSelectionModel().select(0);
      }
      counts.setText(all.isEmpty() ? "no advisory alarms are judged (no [alarms] configuration)"
          : String.format(Locale.ROOT, "%d shown, %d normal, %d suppressed by design (estimator untrustworthy or inputs Bad)",
              shown.size(), normal, suppressed));
    }
    List<AlarmEvent> ev = tl.events();
    int upToCount = eventsUpTo(ev, upTo);
    if (upToCount != shownEvents) {
      shownEvents = upToCount;
      shownUpToS = upTo;
      List<AlarmEvent> r = new ArrayList<>();
      for (int k = upToCount - 1; k >= 0 && r.size() < 200; k--) {
        r.add(ev.get(k));
      }
      recentRows.setAll(r);
    }
  }

  /** How many of the events (in time order) are at or before t. */
  private static int eventsUpTo(List<AlarmEvent> ev, double tS) {
    int lo = 0;
    int hi = ev.size();
    while (lo < hi) {
      int mid = (lo + hi) >>> 1;
      if (Timeline.seconds(ev.get(mid).time()) <= tS + 1e-6) {
        lo = mid + 1;
      } else {
        hi = mid;
      }
    }
    return lo;
  }

  private void act(ActionKind kind) {
    AlarmStatus a = table.getSelectionModel().getSelectedItem();
    if (a == null) {
      answer.setText("select an alarm first");
      return;
    }
    String why = reason.getText() == null ? "" : reason.getText().strip();
    Duration d = kind == ActionKind.SHELVE ? shelveFor.getValue() : null;
    answer.setText(kind.word().replace('_', ' ') + " " + a.kind().key() + " ...");
    feed.alarmAction(kind, operator.getText(), a.kind(), why.isEmpty() ? null : why, d)
        .whenComplete((ActionResult r, Throwable ex) -> Platform.runLater(() -> {
          if (ex != null) {
            answer.setText("not done: " + ex.getMessage());
          } else {
            answer.setText((r.accepted() ? "done: " : "refused: ") + r.message()
                + (r.accepted() ? " (written to the audit trail)" : ""));
            if (r.accepted()) {
              reason.clear();
            }
          }
        }));
  }

  static String stateWords(AlarmState s) {
    return switch (s) {
      case NORMAL -> "normal";
      case UNACKNOWLEDGED -> "ACTIVE, unacknowledged";
      case ACKNOWLEDGED -> "active, acknowledged";
      case RETURNED_UNACKNOWLEDGED -> "cleared, unacknowledged";
      case SHELVED -> "shelved";
      case SUPPRESSED_BY_DESIGN -> "suppressed by design";
      case OUT_OF_SERVICE -> "out of service";
    };
  }

  private static String judged(AlarmStatus a) {
    if (!Double.isFinite(a.limit())) {
      return a.conditionActive() ? "condition present" : "condition absent";
    }
    return switch (a.kind().limitKind()) {
      case TEMPERATURE -> String.format(Locale.ROOT, "mean + kσ %.1f °C / limit %.1f °C", Units.degC(a.value()), Units.degC(a.limit()));
      case FRACTION -> String.format(Locale.ROOT, "%.2f / limit %.2f", a.value(), a.limit());
      case TIME -> (Double.isInfinite(a.value()) || Double.isNaN(a.value()) ? "none forecast"
          : String.format(Locale.ROOT, "%.1f min", a.value() / 60)) + String.format(Locale.ROOT, " / limit %.1f min", a.limit() / 60);
      case NONE -> "";
    };
  }

  private static String shelfText(AlarmStatus a) {
    if (a.shelvedUntil() != null) {
      return a.shelvedUntil() + " by " + a.shelvedBy() + (a.reason() == null ? "" : ": " + a.reason());
    }
    return a.reason() == null ? "" : a.reason();
  }
}
