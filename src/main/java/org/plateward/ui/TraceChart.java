package org.plateward.ui;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Locale;
import java.util.function.DoubleUnaryOperator;
import javafx.geometry.VPos;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.paint.Color;
import javafx.scene.text.Font;
import javafx.scene.text.TextAlignment;

/**
 * Draws time traces on a canvas: one plot box with a title, unit, y grid and optional time
 * axis; traces decimated to min/max per pixel column ({@link MinMaxDecimator}) and stroked as
 * one polyline per run of filled columns; bands as one vertical stroke per column; limits as
 * dashed lines with their labels. Few paint changes, buffers reused. FX thread only.
 */
final class TraceChart {
  static final Font LABEL = Font.font("System", 11);
  static final Font TITLE = Font.font("System", 12);
  private static final DateTimeFormatter CLOCK = DateTimeFormatter.ofPattern("HH:mm", Locale.ROOT).withZone(ZoneOffset.UTC);
  private static final DateTimeFormatter CLOCK_S = DateTimeFormatter.ofPattern("HH:mm:ss", Locale.ROOT).withZone(ZoneOffset.UTC);

  private double[] a = new double[0];
  private double[] b = new double[0];
  /** The last decimations, so the range and the trace of one series share one pass. */
  private final java.util.Map<Object, double[][]> memo = new java.util.IdentityHashMap<>();
  private long memoVersion = -1;
  private double memoT0 = Double.NaN;
  private double memoT1 = Double.NaN;
  private int memoColumns = -1;
  private Timeline memoTimeline;
  private int[] starts = new int[1];
  private double[] xs = new double[0];
  private double[] ys = new double[0];

  /** Where one plot sits and what it spans. */
  static final class Box {
    final double x;
    final double y;
    final double w;
    final double h;
    final double t0S;
    final double t1S;
    double lo;
    double hi;

    Box(double x, double y, double w, double h, double t0S, double t1S) {
      this.x = x;
      this.y = y;
      this.w = w;
      this.h = h;
      this.t0S = t0S;
      this.t1S = t1S;
    }

    int columns() {
      return Math.max(1, (int) Math.floor(w));
    }

    double py(double v) {
      return y + h - (v - lo) / (hi - lo) * h;
    }
  }

  private void ensure(int n) {
    if (a.length < n) {
      a = new double[n];
      b = new double[n];
      xs = new double[2 * n];
      ys = new double[2 * n];
    }
  }

  /**
   * Fills {@code a}/{@code b} with the min/max per column of a series, from the memo when the
   * same series was decimated for the same timeline state, window and width.
   */
  private void decimated(Timeline tl, double[] values, Box box) {
    int n = box.columns();
    if (tl != memoTimeline || tl.version() != memoVersion || box.t0S != memoT0 || box.t1S != memoT1 || n != memoColumns) {
      memo.clear();
      memoTimeline = tl;
      memoVersion = tl.version();
      memoT0 = box.t0S;
      memoT1 = box.t1S;
      memoColumns = n;
      if (starts.length < n + 1) {
        starts = new int[n + 1];
      }
      MinMaxDecimator.columnStarts(tl.timesS(), tl.size(), box.t0S, box.t1S, n, starts);
    }
    double[][] m = memo.get(values);
    if (m == null) {
      m = new double[][] {new double[n], new double[n]};
      MinMaxDecimator.decimate(values, starts, n, m[0], m[1]);
      memo.put(values, m);
    }
    System.arraycopy(m[0], 0, a, 0, n);
    System.arraycopy(m[1], 0, b, 0, n);
  }

  /**
   * The y range that holds a trace's columns (edge units), widened by the extra values given,
   * with a 5 % margin; [NaN, NaN] when there is nothing.
   */
  double[] range(Timeline tl, double[] values, Box box, DoubleUnaryOperator edge, double... extra) {
    int n = box.columns();
    ensure(n);
    decimated(tl, values, box);
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (int c = 0; c < n; c++) {
      if (!Double.isNaN(a[c])) {
        double p = edge.applyAsDouble(a[c]);
        double q = edge.applyAsDouble(b[c]);
        lo = Math.min(lo, Math.min(p, q));
        hi = Math.max(hi, Math.max(p, q));
      }
    }
    for (double e : extra) {
      if (Double.isFinite(e)) {
        lo = Math.min(lo, e);
        hi = Math.max(hi, e);
      }
    }
    return new double[] {lo, hi};
  }

  /** Sets the box's y range, with a margin and a minimum span. */
  static void setRange(Box box, double lo, double hi, double minSpan) {
    if (!Double.isFinite(lo) || !Double.isFinite(hi)) {
      lo = 0;
      hi = 1;
    }
    if (hi - lo < minSpan) {
      double m = 0.5 * (lo + hi);
      lo = m - minSpan / 2;
      hi = m + minSpan / 2;
    }
    double pad = 0.06 * (hi - lo);
    box.lo = lo - pad;
    box.hi = hi + pad;
  }

  /** The plot frame, title, unit, y ticks and (when asked) the time labels below. */
  void frame(GraphicsContext g, Box box, String title, boolean timeLabels) {
    g.setFill(Palette.PLOT);
    g.fillRect(box.x, box.y, box.w, box.h);
    g.setStroke(Palette.GRID);
    g.setLineWidth(1);
    g.setLineDashes();
    g.setFont(LABEL);
    g.setTextBaseline(VPos.CENTER);
    g.setTextAlign(TextAlignment.RIGHT);
    double step = niceStep((box.hi - box.lo) / 4);
    double first = Math.ceil(box.lo / step) * step;
    for (double v = first; v <= box.hi; v += step) {
      double py = Math.round(box.py(v)) + 0.5;
      g.strokeLine(box.x, py, box.x + box.w, py);
      g.setFill(Palette.MUTED);
      g.fillText(tick(v, step), box.x - 4, py);
    }
    double tStep = timeStep(box.t1S - box.t0S);
    double tFirst = Math.ceil(box.t0S / tStep) * tStep;
    g.setTextAlign(TextAlignment.CENTER);
    g.setTextBaseline(VPos.TOP);
    for (double t = tFirst; t < box.t1S; t += tStep) {
      double px = Math.round(box.x + (t - box.t0S) / (box.t1S - box.t0S) * box.w) + 0.5;
      g.strokeLine(px, box.y, px, box.y + box.h);
      if (timeLabels) {
        g.setFill(Palette.MUTED);
        g.fillText((tStep < 60 ? CLOCK_S : CLOCK).format(Instant.ofEpochSecond((long) t)), px, box.y + box.h + 2);
      }
    }
    g.setStroke(Palette.MUTED);
    g.strokeRect(box.x + 0.5, box.y + 0.5, box.w - 1, box.h - 1);
    g.setFill(Palette.TEXT);
    g.setFont(TITLE);
    g.setTextAlign(TextAlignment.LEFT);
    g.setTextBaseline(VPos.BOTTOM);
    g.fillText(title, box.x, box.y - 2);
  }

  /**
   * Largest time between two filled columns that is still drawn as connected, s: a wider run of
   * empty columns is a gap in the data and stays open.
   */
  static final double CONNECT_S = 10.0;

  private int maxEmptyColumns(Box box) {
    double sPerColumn = (box.t1S - box.t0S) / box.columns();
    return Math.max(1, (int) Math.floor(CONNECT_S / sPerColumn));
  }

  /**
   * One trace over runs of columns without a data gap. Where the columns hold a sample or so
   * each, a polyline through them (min and max of each column). Where they hold many (a long
   * window), a solid trace is drawn as its min/max envelope, one filled polygon per run (at least
   * 1 px high), and a dashed one as a dashed line through each column's mid-range: a zigzag
   * polyline over noisy columns would be many times longer than the plot is wide, and stroking
   * (let alone dashing) it is what costs the rasteriser.
   */
  void trace(GraphicsContext g, Timeline tl, double[] values, Box box, DoubleUnaryOperator edge, Color c,
      double width, boolean dashed) {
    int n = box.columns();
    ensure(n);
    decimated(tl, values, box);
    double samplesPerColumn = samplesIn(tl, box) / (double) n;
    boolean dense = samplesPerColumn > 1.5;
    g.setStroke(c);
    g.setFill(c);
    g.setLineWidth(width);
    if (dashed) {
      g.setLineDashes(5, 3);
    } else {
      g.setLineDashes();
    }
    int maxEmpty = maxEmptyColumns(box);
    int k = 0;
    int lastFilled = -1;
    int runStart = -1;
    for (int col = 0; col <= n; col++) {
      boolean filled = col < n && !Double.isNaN(a[col]);
      if (col == n || (filled && lastFilled >= 0 && col - lastFilled > maxEmpty)) {
        if (dense && !dashed) {
          if (runStart >= 0) {
            envelope(g, box, edge, runStart, lastFilled, width);
          }
        } else {
          flush(g, k);
        }
        k = 0;
        runStart = -1;
      }
      if (!filled) {
        continue;
      }
      if (runStart < 0) {
        runStart = col;
      }
      lastFilled = col;
      if (dense && !dashed) {
        continue;
      }
      double px = box.x + col + 0.5;
      double p = clampY(box, box.py(edge.applyAsDouble(a[col])));
      double q = clampY(box, box.py(edge.applyAsDouble(b[col])));
      if (dense) {
        xs[k] = px;
        ys[k++] = 0.5 * (p + q);
      } else {
        xs[k] = px;
        ys[k++] = p;
        if (q != p) {
          xs[k] = px;
          ys[k++] = q;
        }
      }
    }
    g.setLineDashes();
  }

  /** Samples of the timeline inside the box's window. */
  private static int samplesIn(Timeline tl, Box box) {
    return MinMaxDecimator.firstAtOrAfter(tl.timesS(), tl.size(), box.t1S)
        - MinMaxDecimator.firstAtOrAfter(tl.timesS(), tl.size(), box.t0S);
  }

  /** The min/max envelope of columns [from, to] as one filled polygon, at least {@code width} px high. */
  private void envelope(GraphicsContext g, Box box, DoubleUnaryOperator edge, int from, int to, double width) {
    int m = 0;
    double half = 0.5 * width;
    for (int col = from; col <= to; col++) {
      if (!Double.isNaN(a[col])) {
        xs[m] = box.x + col + 0.5;
        ys[m++] = clampY(box, box.py(edge.applyAsDouble(b[col])) - half); // max is up on screen
      }
    }
    int up = m;
    for (int j = up - 1; j >= 0; j--) {
      int col = (int) Math.floor(xs[j] - box.x);
      xs[m] = xs[j];
      ys[m++] = clampY(box, box.py(edge.applyAsDouble(a[col])) + half);
    }
    if (up == 1) {
      g.fillRect(xs[0] - half, ys[0], width, Math.max(width, ys[1] - ys[0]));
    } else {
      g.fillPolygon(xs, ys, m);
    }
  }

  private void flush(GraphicsContext g, int k) {
    if (k >= 2) {
      g.strokePolyline(xs, ys, k);
    } else if (k == 1) {
      g.strokeLine(xs[0] - 0.5, ys[0], xs[0] + 0.5, ys[0]);
    }
  }

  private static double clampY(Box box, double py) {
    return Math.max(box.y, Math.min(box.y + box.h, py));
  }

  /** A band v ± k·sd as one filled polygon per run of columns without a data gap. */
  void band(GraphicsContext g, Timeline tl, double[] values, double[] sd, double k, Box box, DoubleUnaryOperator edge,
      Color c) {
    int n = box.columns();
    ensure(n);
    decimated(tl, values, box); // refreshes the shared column boundaries
    MinMaxDecimator.decimateBand(values, sd, k, starts, n, a, b);
    g.setFill(c);
    int maxEmpty = maxEmptyColumns(box);
    int runStart = -1;
    int lastFilled = -1;
    for (int col = 0; col <= n; col++) {
      boolean filled = col < n && !Double.isNaN(a[col]);
      boolean breakHere = col == n || (filled && lastFilled >= 0 && col - lastFilled > maxEmpty);
      if (breakHere && runStart >= 0) {
        fillRun(g, box, edge, runStart, lastFilled);
        runStart = -1;
      }
      if (filled) {
        if (runStart < 0) {
          runStart = col;
        }
        lastFilled = col;
      }
    }
  }

  /** Upper edge left to right, lower edge right to left, over the filled columns of [from, to]. */
  private void fillRun(GraphicsContext g, Box box, DoubleUnaryOperator edge, int from, int to) {
    int m = 0;
    for (int col = from; col <= to; col++) {
      if (!Double.isNaN(a[col])) {
        xs[m] = box.x + col + 0.5;
        ys[m++] = clampY(box, box.py(edge.applyAsDouble(b[col])));
      }
    }
    int up = m;
    for (int j = up - 1; j >= 0; j--) {
      int col = (int) Math.floor(xs[j] - box.x);
      xs[m] = xs[j];
      ys[m++] = clampY(box, box.py(edge.applyAsDouble(a[col])));
    }
    if (up == 1) {
      g.fillRect(xs[0] - 0.5, Math.min(ys[0], ys[1]), 1, Math.abs(ys[1] - ys[0]) + 1);
    } else {
      g.fillPolygon(xs, ys, m);
    }
  }

  /** A dashed horizontal limit at v (edge units) with its label, when inside the range. */
  static void limit(GraphicsContext g, Box box, double v, String label) {
    if (!(v > box.lo && v < box.hi)) {
      return;
    }
    double py = Math.round(box.py(v)) + 0.5;
    g.setStroke(Palette.LIMIT);
    g.setLineWidth(1);
    g.setLineDashes(8, 4);
    g.strokeLine(box.x, py, box.x + box.w, py);
    g.setLineDashes();
    g.setFont(LABEL);
    g.setTextAlign(TextAlignment.LEFT);
    g.setTextBaseline(VPos.BOTTOM);
    double tw = label.length() * 6.2; // close enough for the 11 px label font
    g.setFill(Palette.PLOT);
    g.fillRect(box.x + 3, py - 14, tw + 4, 13);
    g.setFill(Palette.MUTED);
    g.fillText(label, box.x + 5, py - 1);
  }

  /** A vertical cursor line at t. */
  static void cursor(GraphicsContext g, Box box, double tS) {
    if (tS < box.t0S || tS > box.t1S) {
      return;
    }
    double px = Math.round(box.x + (tS - box.t0S) / (box.t1S - box.t0S) * box.w) + 0.5;
    g.setStroke(Palette.TEXT);
    g.setLineWidth(1);
    g.setLineDashes(2, 2);
    g.strokeLine(px, box.y, px, box.y + box.h);
    g.setLineDashes();
  }

  static double niceStep(double raw) {
    if (!(raw > 0) || !Double.isFinite(raw)) {
      return 1;
    }
    double p = Math.pow(10, Math.floor(Math.log10(raw)));
    double m = raw / p;
    return (m < 1.5 ? 1 : m < 3.5 ? 2 : m < 7.5 ? 5 : 10) * p;
  }

  private static double timeStep(double spanS) {
    double[] steps = {10, 30, 60, 120, 300, 600, 900, 1800, 3600, 7200, 10800, 21600};
    for (double s : steps) {
      if (spanS / s <= 8) {
        return s;
      }
    }
    return 43200;
  }

  private static String tick(double v, double step) {
    v = Math.abs(v) < step * 1e-6 ? 0.0 : v; // no "-0"
    if (step >= 1) {
      return String.format(Locale.ROOT, "%.0f", v);
    }
    int digits = (int) Math.max(0, Math.ceil(-Math.log10(step)));
    return String.format(Locale.ROOT, "%." + digits + "f", v);
  }
}
