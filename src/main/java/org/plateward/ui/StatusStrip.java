package org.plateward.ui;

import java.util.Locale;
import javafx.geometry.Insets;
import javafx.scene.control.Label;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.VBox;
import org.plateward.softsensor.EstimatorStatus;

/**
 * The lines every view keeps in sight: source and connection state, data age, the time shown,
 * the estimator's status with its reason, the hidden peak, and history. Colour only when a fact
 * is abnormal; the words say it too.
 */
final class StatusStrip {
  private final VBox root = new VBox(2);
  private final Label source = new Label();
  private final Label link = new Label();
  private final Label age = new Label();
  private final Label time = new Label();
  private final Label estimator = new Label();
  private final Label peak = new Label();
  private final Label history = new Label();

  StatusStrip() {
    link.setId("status-link");
    age.setId("status-age");
    estimator.setId("status-estimator");
    time.setId("status-time");
    peak.setId("status-peak");
    estimator.setWrapText(true);
    FlowPane line1 = new FlowPane(18, 2, link, age, time, history);
    FlowPane line2 = new FlowPane(18, 2, estimator);
    root.getChildren().addAll(source, line1, peak, line2);
    root.setPadding(new Insets(4, 8, 4, 8));
    root.setStyle("-fx-border-color: transparent transparent #888888 transparent;");
  }

  VBox node() {
    return root;
  }

  String estimatorText() {
    return estimator.getText();
  }

  /** Refreshes from the feed's status and the frame at the cursor. */
  void update(FeedStatus fs, Timeline tl, int i) {
    source.setText(fs.source() + "   (" + fs.clockNote() + ")");
    link.setText("link: " + fs.link());
    link.setStyle(fs.linkNormal() ? "" : abnormal());
    age.setText(Double.isNaN(fs.dataAgeS()) ? "data age: n/a" : String.format(Locale.ROOT, "data age: %.1f s", fs.dataAgeS()));
    age.setStyle(fs.dataAgeS() > 10 ? abnormal() : "");
    history.setText(fs.historyNote());
    history.setStyle(fs.historyNormal() ? "" : abnormal());
    if (i < 0) {
      time.setText("shown: no estimate yet");
      estimator.setText("estimator: waiting for the first frame");
      peak.setText("");
      return;
    }
    time.setText("shown: " + Timeline.instant(tl.timeS(i)));
    EstimatorStatus st = tl.status(i);
    String reason = tl.reason(i);
    estimator.setText("estimator: " + st.text().toUpperCase(Locale.ROOT) + (reason.isEmpty() ? "" : " - " + reason));
    estimator.setStyle(st == EstimatorStatus.UNTRUSTWORTHY ? abnormal()
        : st == EstimatorStatus.DEGRADED ? "-fx-font-weight: bold;" : "");
    peak.setText("hidden peak " + Units.tempWithSd(tl.value(Trace.PEAK_K, i), tl.value(Trace.PEAK_SD_K, i))
        + " (1σ) at " + Units.mm(tl.value(Trace.PEAK_POSITION_M, i))
        + "   |   buffer: hottest cell " + String.format(Locale.ROOT, "%.2f", tl.value(Trace.MELT_MAX_CELL, i))
        + ", overall " + Units.fraction(tl.value(Trace.MELT_OVERALL, i), tl.value(Trace.MELT_OVERALL_SD, i))
        + "   |   time-to-exhaust " + Units.exhaust(tl.value(Trace.TIME_TO_EXHAUST_S, i), tl.value(Trace.TIME_TO_EXHAUST_SD_S, i)));
    peak.setStyle("-fx-font-size: 14px; -fx-font-weight: bold;");
  }

  private static String abnormal() {
    return "-fx-text-fill: " + Palette.css(Palette.IMMEDIATE) + "; -fx-font-weight: bold;";
  }
}
