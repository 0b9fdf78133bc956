package org.plateward.ui;

import java.util.Arrays;
import java.util.Locale;
import java.util.Map;
import javafx.geometry.Insets;
import javafx.geometry.VPos;
import javafx.scene.Node;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.control.Label;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;
import javafx.scene.text.TextAlignment;
import org.plateward.estimation.ChannelStatus;
import org.plateward.estimation.ChiSquareTable;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;
import org.plateward.softsensor.EstimatorStatus;

/**
 * Estimator health: NIS per degree of freedom over the last hour against its two-sided 95 % χ²
 * band (per update: [χ²₀.₀₂₅(m), χ²₀.₉₇₅(m)] / m for m channels fused), what the filter did with
 * each frame-rate channel (used, missing, gated), every signal's value and quality, and the
 * observability diagnostic (share of the open-loop uncertainty the measurements remove).
 */
final class HealthView implements TimelineView {
  private static final double WINDOW_S = 3600;
  private static final Signal[] FAST = {Signal.REF_OUTLET_TEMP, Signal.COMB_OUTLET_TEMP,
      Signal.PLATE_END_TEMP_REF_INLET, Signal.PLATE_END_TEMP_REF_OUTLET};

  private final BorderPane root = new BorderPane();
  private final CanvasPane nisCanvas = new CanvasPane();
  private final CanvasPane obsCanvas = new CanvasPane();
  private final TraceChart chart = new TraceChart();
  private final GridPane table = new GridPane();
  private final Label status = new Label();
  private final Label[] value = new Label[Signal.COUNT];
  private final Label[] quality = new Label[Signal.COUNT];
  private final Label[] use = new Label[Signal.COUNT];
  private final ChiSquareTable lower = new ChiSquareTable(0.025, 10);
  private final ChiSquareTable upper = new ChiSquareTable(0.975, 10);
  private double[] nisPerDof = new double[0];
  private double[] bandLo = new double[0];
  private double[] bandHi = new double[0];
  private int derived;
  private Timeline last;
  private int index = -1;
  private long tableAtNs;

  HealthView() {
    status.setId("health-status");
    status.setWrapText(true);
    table.setHgap(14);
    table.setVgap(1);
    table.setPadding(new Insets(4, 8, 4, 8));
    String[] head = {"signal", "meaning", "value", "quality", "filter use (last step)"};
    for (int c = 0; c < head.length; c++) {
      Label l = new Label(head[c]);
      l.setStyle("-fx-font-weight: bold;");
      table.add(l, c, 0);
    }
    for (Signal s : Signal.values()) {
      int r = s.ordinal() + 1;
      table.add(new Label(s.id()), 0, r);
      table.add(new Label(s.meaning()), 1, r);
      value[s.ordinal()] = new Label("");
      quality[s.ordinal()] = new Label("");
      use[s.ordinal()] = new Label("");
      table.add(value[s.ordinal()], 2, r);
      table.add(quality[s.ordinal()], 3, r);
      table.add(use[s.ordinal()], 4, r);
    }
    nisCanvas.setPrefHeight(230);
    obsCanvas.setPrefHeight(170);
    VBox left = new VBox(6, status, nisCanvas, obsCanvas);
    left.setPadding(new Insets(6, 8, 6, 8));
    VBox.setVgrow(nisCanvas, javafx.scene.layout.Priority.ALWAYS);
    root.setCenter(left);
    javafx.scene.control.ScrollPane sp = new javafx.scene.control.ScrollPane(table);
    sp.setFitToWidth(true);
    sp.setPrefHeight(380);
    root.setBottom(sp);
    nisCanvas.onResize(this::redraw);
    obsCanvas.onResize(this::redraw);
  }

  @Override
  public String title() {
    return "Estimator health";
  }

  @Override
  public Node node() {
    return root;
  }

  @Override
  public void show(Timeline tl, int i) {
    last = tl;
    index = i;
    if (i < 0) {
      return;
    }
    EstimatorStatus st = tl.status(i);
    String reason = tl.reason(i);
    status.setText("estimator " + st.text().toUpperCase(Locale.ROOT) + (reason.isEmpty() ? "" : ": " + reason));
    status.setStyle(st == EstimatorStatus.UNTRUSTWORTHY ? "-fx-text-fill: " + Palette.css(Palette.IMMEDIATE) + "; -fx-font-weight: bold;"
        : st == EstimatorStatus.DEGRADED ? "-fx-font-weight: bold;" : "");
    derive(tl);
    redraw();
    long now = System.nanoTime();
    if (now - tableAtNs < 400_000_000L) {
      return; // the signal table (labels, CSS) at most 2.5 times a second
    }
    tableAtNs = now;
    for (Signal s : Signal.values()) {
      double v = tl.value(s, i);
      value[s.ordinal()].setText(Double.isFinite(v)
          ? String.format(Locale.ROOT, "%.2f %s", s.unit().fromSi(v), s.unit().label()) : "-");
      Quality q = tl.quality(s, i);
      quality[s.ordinal()].setText(q.name().toLowerCase(Locale.ROOT));
      quality[s.ordinal()].setStyle(q == Quality.BAD ? "-fx-text-fill: " + Palette.css(Palette.IMMEDIATE) + "; -fx-font-weight: bold;" : "");
    }
    for (int k = 0; k < 4; k++) {
      ChannelStatus cs = tl.fastStatus(k, i);
      String word = cs == null ? "-" : switch (cs) {
        case USED -> "used";
        case MISSING -> "missing (not fused)";
        case GATED_SINGLE -> "GATED (own χ² gate)";
        case GATED_JOINT -> "GATED (joint χ² gate)";
        case TOO_LATE -> "too late";
      };
      Label l = use[FAST[k].ordinal()];
      l.setText(word);
      l.setStyle(cs == ChannelStatus.GATED_SINGLE || cs == ChannelStatus.GATED_JOINT
          ? "-fx-text-fill: " + Palette.css(Palette.PROMPT) + "; -fx-font-weight: bold;" : "");
    }
    for (Signal s : Signal.values()) {
      if (s.kind() == Signal.Kind.ANALYZER) {
        use[s.ordinal()].setText("analyzer (fused at its sample time)");
      } else if (s.kind() == Signal.Kind.INPUT) {
        use[s.ordinal()].setText("model input");
      }
    }
  }

  /** NIS per dof and its band for the frames not yet derived (kept beside the timeline). */
  private void derive(Timeline tl) {
    int n = tl.size();
    if (nisPerDof.length < n) {
      int cap = Math.max(n, nisPerDof.length * 2 + 1024);
      nisPerDof = Arrays.copyOf(nisPerDof, cap);
      bandLo = Arrays.copyOf(bandLo, cap);
      bandHi = Arrays.copyOf(bandHi, cap);
    }
    double[] nis = tl.trace(Trace.NIS);
    double[] dof = tl.trace(Trace.NIS_DOF);
    for (int i = derived; i < n; i++) {
      int m = (int) dof[i];
      if (m >= 1 && Double.isFinite(nis[i])) {
        nisPerDof[i] = nis[i] / m;
        bandLo[i] = lower.quantile(m) / m;
        bandHi[i] = upper.quantile(m) / m;
      } else {
        nisPerDof[i] = Double.NaN;
        bandLo[i] = Double.NaN;
        bandHi[i] = Double.NaN;
      }
    }
    derived = n;
  }

  private void redraw() {
    GraphicsContext g = nisCanvas.canvas().getGraphicsContext2D();
    double w = nisCanvas.canvas().getWidth();
    double h = nisCanvas.canvas().getHeight();
    g.clearRect(0, 0, w, h);
    g.setFill(Palette.BACKGROUND);
    g.fillRect(0, 0, w, h);
    if (last == null || index < 0) {
      return;
    }
    double t1 = last.timeS(index) + 0.5;
    TraceChart.Box b = new TraceChart.Box(56, 22, Math.max(50, w - 70), Math.max(40, h - 44), t1 - WINDOW_S, t1);
    double[] r = chart.range(last, nisPerDof, b, v -> v, 0.0, 3.0);
    double[] rb = chart.range(last, bandHi, b, v -> v, 0.0);
    TraceChart.setRange(b, 0, Math.min(Math.max(r[1], rb[1]), 12), 1);
    chart.frame(g, b, "NIS per degree of freedom of each update, last hour (dashed: its two-sided 95 % χ² band"
        + " for the channels fused; the status judges the mean over the last 100 updates)", true);
    chart.trace(g, last, bandLo, b, v -> v, Palette.LIMIT, 1, true);
    chart.trace(g, last, bandHi, b, v -> v, Palette.LIMIT, 1, true);
    chart.trace(g, last, nisPerDof, b, v -> v, Palette.ESTIMATE, 1, false);

    GraphicsContext o = obsCanvas.canvas().getGraphicsContext2D();
    double ow = obsCanvas.canvas().getWidth();
    double oh = obsCanvas.canvas().getHeight();

    o.clearRect(0, 0, ow, oh);
    o.setFill(Palette.BACKGROUND);
    o.fillRect(0, 0, ow, oh);
    o.setFill(Palette.TEXT);
    o.setFont(TraceChart.TITLE);
    o.setTextBaseline(VPos.TOP);
    o.setTextAlign(TextAlignment.LEFT);
    Map<String, Double> obs = last.observability(index);
    o.fillText("Observability: share of the open-loop uncertainty (10 min window) the measurements remove, 0..1"
        + (obs.isEmpty() ? " - not yet (first window incomplete)" : ""), 10, 4);
    int k = 0;
    double left = 230;
    double bw = Math.max(50, ow - left - 120);
    o.setFont(TraceChart.LABEL);
    for (Map.Entry<String, Double> e : obs.entrySet()) {
      double y = 26 + k * 22;
      if (y + 18 > oh) {
        break;
      }
      double v = e.getValue() == null ? Double.NaN : e.getValue();
      o.setFill(Palette.TEXT);
      o.setTextAlign(TextAlignment.RIGHT);
      o.setTextBaseline(VPos.CENTER);
      o.fillText(e.getKey(), left - 8, y + 8);
      o.setFill(Palette.PLOT);
      o.fillRect(left, y, bw, 16);
      if (Double.isFinite(v)) {
        o.setFill(Palette.SECOND);
        o.fillRect(left, y + 2, bw * Math.max(0, Math.min(1, v)), 12);
      }
      o.setFill(Palette.TEXT);
      o.setTextAlign(TextAlignment.LEFT);
      o.fillText(Double.isFinite(v) ? String.format(Locale.ROOT, "%.2f", v) : "n/a", left + bw + 8, y + 8);
      k++;
    }
  }
}
