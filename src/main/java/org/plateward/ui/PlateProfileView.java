package org.plateward.ui;

import java.util.Locale;
import javafx.geometry.VPos;
import javafx.scene.Node;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.text.TextAlignment;
import org.plateward.reactor.UnitSpec;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;

/**
 * Plate profile: the estimated plate temperature along the reactor with its ±2σ band, the
 * material limit and the buffer melting point as lines, the hidden peak marked with its value ±
 * σ and position, the two plate-end thermocouples as points, and a strip with each cell's melt
 * fraction below.
 */
final class PlateProfileView implements TimelineView {
  private final CanvasPane canvas = new CanvasPane();
  private final UnitSpec unit;
  private final double[] centresM;
  private Timeline last;
  private int index = -1;
  /** The text of the peak marker last drawn (for tests and screen readers). */
  private String peakText = "";

  PlateProfileView(UnitSpec unit, double[] centresM) {
    this.unit = unit;
    this.centresM = centresM.clone();
    canvas.onResize(this::redraw);
  }

  @Override
  public String title() {
    return "Plate profile";
  }

  @Override
  public Node node() {
    return canvas;
  }

  String peakText() {
    return peakText;
  }

  @Override
  public void show(Timeline tl, int i) {
    last = tl;
    index = i;
    redraw();
  }

  private void redraw() {
    GraphicsContext g = canvas.canvas().getGraphicsContext2D();
    double w = canvas.canvas().getWidth();
    double h = canvas.canvas().getHeight();
    g.clearRect(0, 0, w, h);
    g.setFill(Palette.BACKGROUND);
    g.fillRect(0, 0, w, h);
    g.setFont(TraceChart.LABEL);
    if (last == null || index < 0 || last.cellTempK(index).length == 0) {
      g.setFill(Palette.MUTED);
      g.setTextBaseline(VPos.TOP);
      g.fillText("waiting for the estimator to start (every input needs a usable value)", 20, 20);
      peakText = "";
      return;
    }
    float[] t = last.cellTempK(index);
    float[] sd = last.cellTempSdK(index);
    float[] melt = last.cellMelt(index);
    double lengthM = unit.geometry().lengthM();
    double meltC = Units.degC(unit.buffer().meltingPointK());
    double limitC = Units.degC(unit.plate().materialLimitK());
    double left = 62;
    double right = 20;
    double top = 40;
    double stripH = 70;
    double plotH = Math.max(80, h - top - stripH - 90);
    double pw = Math.max(100, w - left - right);
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (int j = 0; j < t.length; j++) {
      lo = Math.min(lo, Units.degC(t[j] - 2 * sd[j]));
      hi = Math.max(hi, Units.degC(t[j] + 2 * sd[j]));
    }
    double[] ends = {last.value(Signal.PLATE_END_TEMP_REF_INLET, index), last.value(Signal.PLATE_END_TEMP_REF_OUTLET, index)};
    for (double e : ends) {
      if (Double.isFinite(e)) {
        lo = Math.min(lo, Units.degC(e));
      }
    }
    hi = Math.max(hi, limitC);
    TraceChart.Box b = new TraceChart.Box(left, top, pw, plotH, 0, 1);
    TraceChart.setRange(b, lo, hi, 50);
    // frame and y grid
    g.setFill(Palette.PLOT);
    g.fillRect(b.x, b.y, b.w, b.h);
    g.setLineWidth(1);
    double step = TraceChart.niceStep((b.hi - b.lo) / 5);
    g.setTextAlign(TextAlignment.RIGHT);
    g.setTextBaseline(VPos.CENTER);
    for (double v = Math.ceil(b.lo / step) * step; v <= b.hi; v += step) {
      double py = Math.round(b.py(v)) + 0.5;
      g.setStroke(Palette.GRID);
      g.strokeLine(b.x, py, b.x + b.w, py);
      g.setFill(Palette.MUTED);
      g.fillText(String.format(Locale.ROOT, "%.0f", v), b.x - 4, py);
    }
    g.setTextAlign(TextAlignment.CENTER);
    g.setTextBaseline(VPos.TOP);
    double zStep = TraceChart.niceStep(lengthM * 1000 / 8);
    for (double z = 0; z <= lengthM * 1000 + 1e-6; z += zStep) {
      double px = Math.round(left + z / (lengthM * 1000) * pw) + 0.5;
      g.setStroke(Palette.GRID);
      g.strokeLine(px, b.y, px, b.y + b.h);
      g.setFill(Palette.MUTED);
      g.fillText(String.format(Locale.ROOT, "%.0f", z), px, b.y + b.h + 3);
    }
    g.fillText("position from the reforming inlet, mm (combustion gas enters at the right)", left + pw / 2, b.y + b.h + 17);
    g.setStroke(Palette.MUTED);
    g.strokeRect(b.x + 0.5, b.y + 0.5, b.w - 1, b.h - 1);
    // ±2σ band as a polygon
    int n = t.length;
    double[] xs = new double[2 * n + 2];
    double[] ys = new double[2 * n + 2];
    for (int j = 0; j < n; j++) {
      xs[j] = px(centresM[j], lengthM, left, pw);
      ys[j] = b.py(Units.degC(t[j] + 2 * sd[j]));
      xs[2 * n - 1 - j] = xs[j];
      ys[2 * n - 1 - j] = b.py(Units.degC(t[j] - 2 * sd[j]));
    }
    g.setFill(Palette.BAND);
    g.fillPolygon(xs, ys, 2 * n);
    // limits
    TraceChart.limit(g, b, limitC, String.format(Locale.ROOT, "material limit %.0f °C", limitC));
    TraceChart.limit(g, b, meltC, String.format(Locale.ROOT, "buffer melting %.1f °C", meltC));
    // estimate
    double[] lx = new double[n];
    double[] ly = new double[n];
    for (int j = 0; j < n; j++) {
      lx[j] = px(centresM[j], lengthM, left, pw);
      ly[j] = b.py(Units.degC(t[j]));
    }
    g.setStroke(Palette.ESTIMATE);
    g.setLineWidth(2);
    g.strokePolyline(lx, ly, n);
    // plate-end measurements as points (hollow square when not Good)
    Signal[] endSig = {Signal.PLATE_END_TEMP_REF_INLET, Signal.PLATE_END_TEMP_REF_OUTLET};
    for (int k = 0; k < 2; k++) {
      double v = ends[k];
      double x = k == 0 ? left + 4 : left + pw - 4;
      if (Double.isFinite(v)) {
        double y = b.py(Units.degC(v));
        boolean good = last.quality(endSig[k], index) == Quality.GOOD;
        g.setLineWidth(1.5);
        g.setStroke(Palette.SECOND);
        g.setFill(Palette.SECOND);
        if (good) {
          g.fillOval(x - 5, y - 5, 10, 10);
        } else {
          g.strokeRect(x - 5, y - 5, 10, 10);
        }
        g.setFill(Palette.TEXT);
        g.setTextAlign(k == 0 ? TextAlignment.LEFT : TextAlignment.RIGHT);
        g.setTextBaseline(VPos.BOTTOM);
        g.fillText(String.format(Locale.ROOT, "measured %.1f °C%s", Units.degC(v), good ? "" : " (" + last.quality(endSig[k], index).name().toLowerCase(Locale.ROOT) + ")"),
            k == 0 ? x + 8 : x - 8, y - 6);
      }
    }
    // hidden peak marker
    double pk = last.value(Trace.PEAK_K, index);
    double pkSd = last.value(Trace.PEAK_SD_K, index);
    double pos = last.value(Trace.PEAK_POSITION_M, index);
    if (Double.isFinite(pk) && Double.isFinite(pos)) {
      double x = px(pos, lengthM, left, pw);
      double y = b.py(Units.degC(pk));
      g.setFill(Palette.TEXT);
      g.fillPolygon(new double[] {x - 7, x + 7, x}, new double[] {y - 14, y - 14, y - 2}, 3);
      peakText = "hidden peak " + Units.tempWithSd(pk, pkSd) + " (1σ) at " + Units.mm(pos);
      boolean rightSide = x > left + pw * 0.6;
      javafx.scene.text.Text probe = new javafx.scene.text.Text(peakText);
      probe.setFont(TraceChart.TITLE);
      double tw = probe.getLayoutBounds().getWidth();
      double tx = rightSide ? x + 8 - tw : x - 8;
      double ty = Math.max(b.y + 2, y - 34);
      g.setFill(Palette.BACKGROUND);
      g.fillRect(tx - 4, ty - 2, tw + 8, 18);
      g.setStroke(Palette.MUTED);
      g.setLineWidth(1);
      g.strokeRect(tx - 4 + 0.5, ty - 2 + 0.5, tw + 8, 18);
      g.setFill(Palette.TEXT);
      g.setTextAlign(TextAlignment.LEFT);
      g.setTextBaseline(VPos.TOP);
      g.setFont(TraceChart.TITLE);
      g.fillText(peakText, tx, ty);
      g.setFont(TraceChart.LABEL);
    }
    g.setFill(Palette.TEXT);
    g.setFont(TraceChart.TITLE);
    g.setTextAlign(TextAlignment.LEFT);
    g.setTextBaseline(VPos.TOP);
    g.fillText("Estimated plate temperature along the reactor, °C (line: mean; band: ±2σ; points: plate-end thermocouples)", left, 8);
    // melt-fraction strip
    double sy = b.y + b.h + 44;
    g.fillText(String.format(Locale.ROOT, "Melt fraction per cell (bar height 0..1); overall %s, hottest cell %.2f",
        Units.fraction(last.value(Trace.MELT_OVERALL, index), last.value(Trace.MELT_OVERALL_SD, index)),
        last.value(Trace.MELT_MAX_CELL, index)), left, sy - 18);
    g.setFill(Palette.PLOT);
    g.fillRect(left, sy, pw, stripH);
    for (int j = 0; j < n; j++) {
      double zl = j == 0 ? 0 : 0.5 * (centresM[j - 1] + centresM[j]);
      double zr = j == n - 1 ? lengthM : 0.5 * (centresM[j] + centresM[j + 1]);
      double x0 = px(zl, lengthM, left, pw);
      double x1 = px(zr, lengthM, left, pw);
      double m = Math.max(0, Math.min(1, melt[j]));
      // fully melted cells are abnormal: the only coloured bars
      g.setFill(m >= 0.999 ? Palette.PROMPT : Palette.SECOND);
      g.fillRect(x0, sy + stripH * (1 - m), Math.max(1, x1 - x0 - 0.5), stripH * m);
    }
    g.setStroke(Palette.MUTED);
    g.setLineWidth(1);
    g.strokeRect(left + 0.5, sy + 0.5, pw - 1, stripH - 1);
    g.setFill(Palette.MUTED);
    g.setTextAlign(TextAlignment.RIGHT);
    g.setTextBaseline(VPos.CENTER);
    g.fillText("1", left - 4, sy + 2);
    g.fillText("0", left - 4, sy + stripH - 2);
  }

  private static double px(double zM, double lengthM, double left, double pw) {
    return left + zM / lengthM * pw;
  }
}
