package org.plateward.ui;

import java.util.Locale;
import java.util.function.DoubleUnaryOperator;
import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.control.Label;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import org.plateward.alarms.AlarmKind;
import org.plateward.alarms.AlarmSettings;
import org.plateward.reactor.UnitSpec;
import org.plateward.signals.Signal;

/**
 * Trends: the hidden peak ± σ with the limits, melt fraction, time-to-exhaust, each frame-rate
 * output against the model's prediction, and the main inputs, over a window of 10 min to 24 h
 * that ends at the cursor. Drawn on one canvas with min/max decimation per pixel column.
 */
public final class TrendsView implements TimelineView {
  /** The window choices, s. */
  static final double[] RANGES_S = {600, 3600, 4 * 3600, 24 * 3600};
  private static final String[] RANGE_NAMES = {"10 min", "1 h", "4 h", "24 h"};
  private static final DoubleUnaryOperator K_TO_C = Units::degC;
  private static final DoubleUnaryOperator SAME = v -> v;
  private static final DoubleUnaryOperator S_TO_MIN = v -> v / 60.0;

  private final BorderPane root = new BorderPane();
  private final CanvasPane canvas = new CanvasPane();
  private final TraceChart chart = new TraceChart();
  private final UnitSpec unit;
  private final double peakHighK;
  private final ToggleGroup ranges = new ToggleGroup();
  private double rangeS = RANGES_S[0];
  private Timeline last;
  private int lastIndex = -1;

  /**
   * @param unit the unit (limits drawn)
   * @param alarms alarm definitions (the peak_high limit drawn; may be null)
   */
  public TrendsView(UnitSpec unit, AlarmSettings alarms) {
    this.unit = unit;
    this.peakHighK = alarms == null ? Double.NaN : alarms.definition(AlarmKind.PEAK_HIGH).limit();
    HBox bar = new HBox(6);
    bar.setPadding(new Insets(4, 8, 4, 8));
    bar.getChildren().add(new Label("Window ending at the cursor:"));
    for (int i = 0; i < RANGES_S.length; i++) {
      ToggleButton b = new ToggleButton("_" + (i + 1) + "  " + RANGE_NAMES[i]);
      b.setMnemonicParsing(true);
      b.setToggleGroup(ranges);
      b.setUserData(RANGES_S[i]);
      b.setId("range-" + i);
      bar.getChildren().add(b);
      if (i == 0) {
        b.setSelected(true);
      }
    }
    ranges.selectedToggleProperty().addListener((o, was, now) -> {
      if (now == null) {
        was.setSelected(true);
        return;
      }
      rangeS = (Double) now.getUserData();
      redraw();
    });
    root.setTop(bar);
    root.setCenter(canvas);
    canvas.onResize(this::redraw);
  }

  @Override
  public String title() {
    return "Trends";
  }

  @Override
  public Node node() {
    return root;
  }

  /** The window length now, s. */
  double rangeS() {
    return rangeS;
  }

  /** Chooses the window length (one of {@link #RANGES_S}). */
  void selectRange(int i) {
    ranges.selectToggle(ranges.getToggles().get(i));
  }

  @Override
  public void show(Timeline tl, int index) {
    last = tl;
    lastIndex = index;
    redraw();
  }

  private void redraw() {
    GraphicsContext g = canvas.canvas().getGraphicsContext2D();
    double w = canvas.canvas().getWidth();
    double h = canvas.canvas().getHeight();
    g.clearRect(0, 0, w, h); // also drops the canvas's queued commands
    g.setFill(Palette.BACKGROUND);
    g.fillRect(0, 0, w, h);
    if (last == null || lastIndex < 0) {
      g.setFill(Palette.MUTED);
      g.fillText("waiting for the first estimate", 20, 30);
      return;
    }
    draw(g, w, h, last, last.timeS(lastIndex), rangeS);
  }

  /**
   * Draws every trend panel for the window (t1 − range, t1]; used by the view and the benchmark.
   *
   * @param g where to draw (its canvas is w × h px)
   * @param tl the frames
   * @param t1S window end, epoch s
   * @param range window length, s
   */
  public void draw(GraphicsContext g, double w, double h, Timeline tl, double t1S, double range) {
    double t1 = t1S + 0.5;
    double t0 = t1 - range;
    int panels = 7;
    double left = 62;
    double right = 12;
    double top = 22;
    double gap = 26;
    double ph = Math.max(30, (h - top - 22 - gap * (panels - 1)) / panels);
    double pw = Math.max(50, w - left - right);
    double y = top;
    double meltC = Units.degC(unit.buffer().meltingPointK());
    double limitC = Units.degC(unit.plate().materialLimitK());

    // 1 hidden peak ± 2σ, limits
    TraceChart.Box b = new TraceChart.Box(left, y, pw, ph, t0, t1);
    double[] r = chart.range(tl, tl.trace(Trace.PEAK_K), b, K_TO_C, meltC);
    TraceChart.setRange(b, r[0] - 5, r[1] + 5, 20);
    chart.frame(g, b, "Hidden peak plate temperature, °C (band ±2σ)", false);
    chart.band(g, tl, tl.trace(Trace.PEAK_K), tl.trace(Trace.PEAK_SD_K), 2.0, b, K_TO_C, Palette.BAND);
    TraceChart.limit(g, b, limitC, String.format(Locale.ROOT, "material limit %.0f °C", limitC));
    TraceChart.limit(g, b, meltC, String.format(Locale.ROOT, "buffer melting %.1f °C", meltC));
    TraceChart.limit(g, b, Units.degC(peakHighK), String.format(Locale.ROOT, "peak_high alarm %.0f °C", Units.degC(peakHighK)));
    chart.trace(g, tl, tl.trace(Trace.PEAK_K), b, K_TO_C, Palette.ESTIMATE, 1.5, false);
    y += ph + gap;

    // 2 melt fraction
    b = new TraceChart.Box(left, y, pw, ph, t0, t1);
    r = chart.range(tl, tl.trace(Trace.MELT_MAX_CELL), b, SAME, 0.0);
    TraceChart.setRange(b, 0, Math.max(r[1], 0.05), 0.05);
    chart.frame(g, b, "Melt fraction: overall ±σ (black), hottest cell (dashed)", false);
    chart.band(g, tl, tl.trace(Trace.MELT_OVERALL), tl.trace(Trace.MELT_OVERALL_SD), 1.0, b, SAME, Palette.BAND);
    chart.trace(g, tl, tl.trace(Trace.MELT_OVERALL), b, SAME, Palette.ESTIMATE, 1.5, false);
    chart.trace(g, tl, tl.trace(Trace.MELT_MAX_CELL), b, SAME, Palette.SECOND, 1.2, true);
    y += ph + gap;

    // 3 time-to-exhaust
    b = new TraceChart.Box(left, y, pw, ph, t0, t1);
    TraceChart.setRange(b, 0, 30, 30);
    chart.frame(g, b, "Time-to-exhaust, min (band ±σ; blank: none forecast within 30 min)", false);
    chart.band(g, tl, tl.trace(Trace.TIME_TO_EXHAUST_S), tl.trace(Trace.TIME_TO_EXHAUST_SD_S), 1.0, b, S_TO_MIN, Palette.BAND);
    chart.trace(g, tl, tl.trace(Trace.TIME_TO_EXHAUST_S), b, S_TO_MIN, Palette.ESTIMATE, 1.5, false);
    y += ph + gap;

    // 4 gas outlet temperatures, measured vs model
    b = new TraceChart.Box(left, y, pw, ph, t0, t1);
    double[] r1 = chart.range(tl, tl.signal(Signal.REF_OUTLET_TEMP), b, K_TO_C);
    double[] r2 = chart.range(tl, tl.signal(Signal.COMB_OUTLET_TEMP), b, K_TO_C);
    TraceChart.setRange(b, Math.min(r1[0], r2[0]), Math.max(r1[1], r2[1]), 10);
    chart.frame(g, b, "Gas outlets, °C: reformed gas (black) and flue gas (blue-grey) measured, on the model's prediction (wide light line)", false);
    chart.trace(g, tl, tl.trace(Trace.PREDICTED_REF_OUTLET_K), b, K_TO_C, Palette.MODEL, 4.0, false);
    chart.trace(g, tl, tl.trace(Trace.PREDICTED_COMB_OUTLET_K), b, K_TO_C, Palette.MODEL, 4.0, false);
    chart.trace(g, tl, tl.signal(Signal.REF_OUTLET_TEMP), b, K_TO_C, Palette.ESTIMATE, 1.0, false);
    chart.trace(g, tl, tl.signal(Signal.COMB_OUTLET_TEMP), b, K_TO_C, Palette.SECOND, 1.0, false);
    y += ph + gap;

    // 5 plate ends, measured vs model
    b = new TraceChart.Box(left, y, pw, ph, t0, t1);
    r1 = chart.range(tl, tl.signal(Signal.PLATE_END_TEMP_REF_INLET), b, K_TO_C);
    r2 = chart.range(tl, tl.signal(Signal.PLATE_END_TEMP_REF_OUTLET), b, K_TO_C);
    TraceChart.setRange(b, Math.min(r1[0], r2[0]), Math.max(r1[1], r2[1]), 10);
    chart.frame(g, b, "Plate ends, °C: z = 0 (black) and z = L (blue-grey) measured, on the model's prediction (wide light line)", false);
    chart.trace(g, tl, tl.trace(Trace.PREDICTED_PLATE_END_INLET_K), b, K_TO_C, Palette.MODEL, 4.0, false);
    chart.trace(g, tl, tl.trace(Trace.PREDICTED_PLATE_END_OUTLET_K), b, K_TO_C, Palette.MODEL, 4.0, false);
    chart.trace(g, tl, tl.signal(Signal.PLATE_END_TEMP_REF_INLET), b, K_TO_C, Palette.ESTIMATE, 1.0, false);
    chart.trace(g, tl, tl.signal(Signal.PLATE_END_TEMP_REF_OUTLET), b, K_TO_C, Palette.SECOND, 1.0, false);
    y += ph + gap;

    // 6 fuel flow (input)
    DoubleUnaryOperator nm3h = v -> Signal.FUEL_FLOW.unit().fromSi(v);
    b = new TraceChart.Box(left, y, pw, ph, t0, t1);
    r = chart.range(tl, tl.signal(Signal.FUEL_FLOW), b, nm3h);
    TraceChart.setRange(b, r[0], r[1], 0.5);
    chart.frame(g, b, "Input: combustion fuel flow, Nm3/h", false);
    chart.trace(g, tl, tl.signal(Signal.FUEL_FLOW), b, nm3h, Palette.ESTIMATE, 1.0, false);
    y += ph + gap;

    // 7 reforming feed gas and air (input)
    b = new TraceChart.Box(left, y, pw, ph, t0, t1);
    r1 = chart.range(tl, tl.signal(Signal.REF_GAS_FLOW), b, nm3h);
    TraceChart.setRange(b, r1[0], r1[1], 0.5);
    chart.frame(g, b, "Input: reforming feed gas flow, Nm3/h", true);
    chart.trace(g, tl, tl.signal(Signal.REF_GAS_FLOW), b, nm3h, Palette.ESTIMATE, 1.0, false);
  }
}
