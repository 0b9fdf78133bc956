package org.plateward.plot;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;

/**
 * A small headless x-y chart drawn with Java2D: axes with nice ticks and labels, lines, point
 * markers, shaded bands (mean ± σ), horizontal limit lines, horizontal bars on named rows
 * (timelines) and a legend. Neutral background; colour is for the data and for limits. One
 * chart fills a rectangle of a {@link Graphics2D}; {@link #writePng} lays out one or more charts
 * in a grid and writes a PNG. Values are drawn as given (the caller converts to engineering
 * units and says which in the labels).
 */
public final class Chart {
  /** Neutral background (light grey), as high-performance display practice suggests. */
  public static final Color BACKGROUND = new Color(0xEE, 0xEE, 0xEC);
  public static final Color INK = new Color(0x33, 0x33, 0x33);
  public static final Color DATA = new Color(0x1F, 0x4E, 0x79);
  public static final Color DATA2 = new Color(0x7A, 0x7A, 0x7A);
  public static final Color LIMIT = new Color(0xB0, 0x1C, 0x1C);
  public static final Color BAND = new Color(0x1F, 0x4E, 0x79, 0x40);

  private enum Kind { LINE, POINTS, BAND, HLINE, VLINE, BAR }

  private record Series(Kind kind, double[] x, double[] y, double[] y2, Color color, String label, boolean dashed) {}

  private final String title;
  private final String xLabel;
  private final String yLabel;
  private final List<Series> series = new ArrayList<>();
  private String[] rows;
  private String[] xCategories;
  private double xMin = Double.NaN;
  private double xMax = Double.NaN;
  private double yMin = Double.NaN;
  private double yMax = Double.NaN;

  public Chart(String title, String xLabel, String yLabel) {
    this.title = title;
    this.xLabel = xLabel;
    this.yLabel = yLabel;
  }

  /** A polyline through the finite points (NaN breaks the line). */
  public Chart line(double[] x, double[] y, Color c, String label) {
    series.add(new Series(Kind.LINE, x.clone(), y.clone(), null, c, label, false));
    return this;
  }

  /** A dashed polyline. */
  public Chart dashed(double[] x, double[] y, Color c, String label) {
    series.add(new Series(Kind.LINE, x.clone(), y.clone(), null, c, label, true));
    return this;
  }

  /** Point markers. */
  public Chart points(double[] x, double[] y, Color c, String label) {
    series.add(new Series(Kind.POINTS, x.clone(), y.clone(), null, c, label, false));
    return this;
  }

  /** A shaded band between {@code lo} and {@code hi}. */
  public Chart band(double[] x, double[] lo, double[] hi, Color c, String label) {
    series.add(new Series(Kind.BAND, x.clone(), lo.clone(), hi.clone(), c, label, false));
    return this;
  }

  /** A horizontal line across the plot (a limit), dashed. */
  public Chart horizontal(double y, Color c, String label) {
    series.add(new Series(Kind.HLINE, new double[0], new double[] {y}, null, c, label, true));
    return this;
  }

  /** A vertical line (a moment), dashed. */
  public Chart vertical(double x, Color c, String label) {
    series.add(new Series(Kind.VLINE, new double[] {x}, new double[0], null, c, label, true));
    return this;
  }

  /** Named rows on the y axis (row 0 at the top) for {@link #bar}. */
  public Chart rows(String... names) {
    this.rows = names.clone();
    return this;
  }

  /** Named positions 0, 1, ... on the x axis instead of numbers. */
  public Chart xCategories(String... names) {
    this.xCategories = names.clone();
    return this;
  }

  /** A horizontal bar on row {@code row} from x0 to x1. */
  public Chart bar(int row, double x0, double x1, Color c, String label) {
    series.add(new Series(Kind.BAR, new double[] {x0, x1}, new double[] {row}, null, c, label, false));
    return this;
  }

  public Chart xRange(double lo, double hi) {
    xMin = lo;
    xMax = hi;
    return this;
  }

  public Chart yRange(double lo, double hi) {
    yMin = lo;
    yMax = hi;
    return this;
  }

  /**
   * Draws the chart into the rectangle (x, y, w, h) of {@code g}.
   */
  public void draw(Graphics2D g, int x, int y, int w, int h) {
    g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
    g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
    g.setColor(BACKGROUND);
    g.fillRect(x, y, w, h);
    Font font = new Font(Font.SANS_SERIF, Font.PLAIN, 11);
    g.setFont(font);
    FontMetrics fm = g.getFontMetrics();
    int left = x + (rows != null ? 12 + maxWidth(fm, rows) : 64);
    int right = x + w - 12;
    int top = y + 24;
    int legendRows = legendRows(fm, right - left);
    int bottom = y + h - 34 - legendRows * (fm.getHeight() + 2);
    int lineH = fm.getHeight() + 2;
    if (right - left < 20 || bottom - top < 20) {
      return;
    }
    double[] xr = xRangeOfData();
    double[] yr = rows != null ? new double[] {-0.5, rows.length - 0.5} : yRangeOfData();
    Frame fr = new Frame(left, right, top, bottom, xr[0], xr[1], yr[0], yr[1], rows != null);
    g.setColor(Color.WHITE);
    g.fillRect(left, top, right - left, bottom - top);
    drawTicks(g, fm, fr);
    Rectangle2D clip = new Rectangle2D.Double(left, top, right - left, bottom - top);
    java.awt.Shape oldClip = g.getClip();
    g.clip(clip);
    for (Series s : series) {
      drawSeries(g, fr, s);
    }
    g.setClip(oldClip);
    g.setColor(INK);
    g.setStroke(new BasicStroke(1f));
    g.drawRect(left, top, right - left, bottom - top);
    Font bold = font.deriveFont(Font.BOLD, 12f);
    g.setFont(bold);
    String shown = title;
    FontMetrics bm = g.getFontMetrics();
    while (shown.length() > 4 && bm.stringWidth(shown) > x + w - 6 - left) {
      shown = shown.substring(0, shown.length() - 2) + "…";
      shown = shown.substring(0, shown.length() - 2) + "…";
    }
    g.drawString(shown, left, y + 16);
    g.setFont(font);
    g.drawString(xLabel, left + (right - left - fm.stringWidth(xLabel)) / 2, bottom + 28);
    if (rows == null && yLabel != null && !yLabel.isEmpty()) {
      java.awt.geom.AffineTransform at = g.getTransform();
      g.rotate(-Math.PI / 2);
      g.drawString(yLabel, -(top + (bottom - top + fm.stringWidth(yLabel)) / 2), x + 12);
      g.setTransform(at);
    }
    drawLegend(g, fm, left, bottom + 28 + lineH, right - left);
  }

  /** Renders the chart alone into a new image. */
  public BufferedImage render(int widthPx, int heightPx) {
    BufferedImage img = new BufferedImage(widthPx, heightPx, BufferedImage.TYPE_INT_RGB);
    Graphics2D g = img.createGraphics();
    try {
      draw(g, 0, 0, widthPx, heightPx);
    } finally {
      g.dispose();
    }
    return img;
  }

  /**
   * Lays out the charts in a grid of {@code columns}, each {@code panelW} x {@code panelH}
   * pixels, and writes a PNG.
   *
   * @return the image size, pixels
   */
  public static java.awt.Dimension writePng(List<Chart> charts, int columns, int panelW, int panelH, Path file)
      throws IOException {
    int cols = Math.max(1, Math.min(columns, charts.size()));
    int rowsN = (charts.size() + cols - 1) / cols;
    BufferedImage img = new BufferedImage(cols * panelW, rowsN * panelH, BufferedImage.TYPE_INT_RGB);
    Graphics2D g = img.createGraphics();
    try {
      g.setColor(BACKGROUND);
      g.fillRect(0, 0, img.getWidth(), img.getHeight());
      for (int i = 0; i < charts.size(); i++) {
        charts.get(i).draw(g, (i % cols) * panelW, (i / cols) * panelH, panelW, panelH);
      }
    } finally {
      g.dispose();
    }
    if (!ImageIO.write(img, "png", file.toFile())) {
      throw new IOException("no PNG writer available for " + file);
    }
    return new java.awt.Dimension(img.getWidth(), img.getHeight());
  }

  /** Writes one chart as a PNG of the given size. */
  public void writePng(int widthPx, int heightPx, Path file) throws IOException {
    writePng(List.of(this), 1, widthPx, heightPx, file);
  }

  // --- layout ---------------------------------------------------------------------------

  private record Frame(int left, int right, int top, int bottom, double x0, double x1, double y0, double y1, boolean rowsDown) {
    double px(double v) {
      return left + (v - x0) / (x1 - x0) * (right - left);
    }

    double py(double v) {
      double f = (v - y0) / (y1 - y0);
      return rowsDown ? top + f * (bottom - top) : bottom - f * (bottom - top);
    }
  }

  private double[] xRangeOfData() {
    if (xCategories != null) {
      return new double[] {-0.5, xCategories.length - 0.5};
    }
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (Series s : series) {
      if (s.kind == Kind.HLINE) {
        continue;
      }
      for (double v : s.x) {
        if (Double.isFinite(v)) {
          lo = Math.min(lo, v);
          hi = Math.max(hi, v);
        }
      }
    }
    if (Double.isFinite(xMin)) {
      lo = xMin;
      hi = xMax;
    }
    return pad(lo, hi, 0.0);
  }

  private double[] yRangeOfData() {
    if (Double.isFinite(yMin)) {
      return new double[] {yMin, yMax};
    }
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (Series s : series) {
      if (s.kind == Kind.VLINE || s.kind == Kind.BAR) {
        continue;
      }
      for (double[] arr : new double[][] {s.y, s.y2}) {
        if (arr == null) {
          continue;
        }
        for (double v : arr) {
          if (Double.isFinite(v)) {
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
          }
        }
      }
    }
    return pad(lo, hi, 0.05);
  }

  private static double[] pad(double lo, double hi, double frac) {
    if (!Double.isFinite(lo) || !Double.isFinite(hi)) {
      return new double[] {0.0, 1.0};
    }
    if (hi - lo < 1e-12 * Math.max(1.0, Math.abs(hi))) {
      double d = Math.max(1e-6, 0.05 * Math.abs(hi));
      return new double[] {lo - d, hi + d};
    }
    double d = (hi - lo) * frac;
    return new double[] {lo - d, hi + d};
  }

  private void drawTicks(Graphics2D g, FontMetrics fm, Frame fr) {
    g.setStroke(new BasicStroke(1f));
    if (xCategories != null) {
      for (int i = 0; i < xCategories.length; i++) {
        int px = (int) Math.round(fr.px(i));
        g.setColor(new Color(0xDD, 0xDD, 0xDD));
        g.drawLine(px, fr.top, px, fr.bottom);
        g.setColor(INK);
        String s = xCategories[i];
        g.drawString(s, px - fm.stringWidth(s) / 2, fr.bottom + 14);
      }
    } else {
      double st = Ticks.step(fr.x0, fr.x1, Math.max(2, (fr.right - fr.left) / 90));
      for (double v : Ticks.values(fr.x0, fr.x1, st)) {
        int px = (int) Math.round(fr.px(v));
        g.setColor(new Color(0xDD, 0xDD, 0xDD));
        g.drawLine(px, fr.top, px, fr.bottom);
        g.setColor(INK);
        String s = Ticks.label(v, st);
        g.drawString(s, px - fm.stringWidth(s) / 2, fr.bottom + 14);
      }
    }
    if (rows != null) {
      for (int i = 0; i < rows.length; i++) {
        int py = (int) Math.round(fr.py(i));
        g.setColor(INK);
        g.drawString(rows[i], fr.left - 6 - fm.stringWidth(rows[i]), py + fm.getAscent() / 2 - 1);
      }
      return;
    }
    double st = Ticks.step(fr.y0, fr.y1, Math.max(2, (fr.bottom - fr.top) / 45));
    for (double v : Ticks.values(fr.y0, fr.y1, st)) {
      int py = (int) Math.round(fr.py(v));
      g.setColor(new Color(0xDD, 0xDD, 0xDD));
      g.drawLine(fr.left, py, fr.right, py);
      g.setColor(INK);
      String s = Ticks.label(v, st);
      g.drawString(s, fr.left - 4 - fm.stringWidth(s), py + fm.getAscent() / 2 - 1);
    }
  }

  private void drawSeries(Graphics2D g, Frame fr, Series s) {
    g.setColor(s.color);
    g.setStroke(s.dashed
        ? new BasicStroke(1.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f, new float[] {6f, 4f}, 0f)
        : new BasicStroke(1.6f));
    switch (s.kind) {
      case LINE -> {
        Path2D.Double p = new Path2D.Double();
        boolean pen = false;
        for (int i = 0; i < s.x.length; i++) {
          if (!Double.isFinite(s.x[i]) || !Double.isFinite(s.y[i])) {
            pen = false;
            continue;
          }
          double px = fr.px(s.x[i]);
          double py = fr.py(clampY(fr, s.y[i]));
          if (pen) {
            p.lineTo(px, py);
          } else {
            p.moveTo(px, py);
            pen = true;
          }
        }
        g.draw(p);
      }
      case POINTS -> {
        for (int i = 0; i < s.x.length; i++) {
          if (Double.isFinite(s.x[i]) && Double.isFinite(s.y[i])) {
            int px = (int) Math.round(fr.px(s.x[i]));
            int py = (int) Math.round(fr.py(s.y[i]));
            g.drawOval(px - 3, py - 3, 6, 6);
          }
        }
      }
      case BAND -> {
        int i = 0;
        while (i < s.x.length) {
          Path2D.Double p = new Path2D.Double();
          int start = i;
          while (i < s.x.length && Double.isFinite(s.y[i]) && Double.isFinite(s.y2[i]) && Double.isFinite(s.x[i])) {
            i++;
          }
          if (i - start >= 2) {
            p.moveTo(fr.px(s.x[start]), fr.py(clampY(fr, s.y2[start])));
            for (int k = start + 1; k < i; k++) {
              p.lineTo(fr.px(s.x[k]), fr.py(clampY(fr, s.y2[k])));
            }
            for (int k = i - 1; k >= start; k--) {
              p.lineTo(fr.px(s.x[k]), fr.py(clampY(fr, s.y[k])));
            }
            p.closePath();
            g.fill(p);
          }
          i++;
        }
      }
      case HLINE -> {
        int py = (int) Math.round(fr.py(s.y[0]));
        g.drawLine(fr.left, py, fr.right, py);
      }
      case VLINE -> {
        int px = (int) Math.round(fr.px(s.x[0]));
        g.drawLine(px, fr.top, px, fr.bottom);
      }
      case BAR -> {
        double row = s.y[0];
        double y0 = fr.py(row - 0.3);
        double y1 = fr.py(row + 0.3);
        double x0 = fr.px(s.x[0]);
        double x1 = Math.max(fr.px(s.x[1]), x0 + 2);
        g.fill(new Rectangle2D.Double(x0, Math.min(y0, y1), x1 - x0, Math.abs(y1 - y0)));
      }
    }
  }

  private static double clampY(Frame fr, double v) {
    double lo = Math.min(fr.y0, fr.y1);
    double hi = Math.max(fr.y0, fr.y1);
    double d = 10 * (hi - lo);
    return Math.max(lo - d, Math.min(hi + d, v));
  }

  private List<Series> legendItems() {
    List<Series> items = new ArrayList<>();
    List<String> seen = new ArrayList<>();
    for (Series s : series) {
      if (s.label != null && !s.label.isEmpty() && !seen.contains(s.label)) {
        seen.add(s.label);
        items.add(s);
      }
    }
    return items;
  }

  private int legendRows(FontMetrics fm, int width) {
    int rowsN = 0;
    int used = width + 1;
    for (Series s : legendItems()) {
      int w = 30 + fm.stringWidth(s.label);
      if (used + w > width) {
        rowsN++;
        used = 0;
      }
      used += w;
    }
    return rowsN;
  }

  private void drawLegend(Graphics2D g, FontMetrics fm, int x, int y, int width) {
    int cx = x;
    int cy = y;
    boolean first = true;
    for (Series s : legendItems()) {
      int w = 30 + fm.stringWidth(s.label);
      if (!first && cx + w > x + width) {
        cx = x;
        cy += fm.getHeight() + 2;
      }
      first = false;
      g.setColor(s.color);
      int my = cy - fm.getAscent() / 2;
      switch (s.kind) {
        case POINTS -> g.drawOval(cx + 6, my - 3, 6, 6);
        case BAND, BAR -> g.fillRect(cx, my - 4, 18, 8);
        default -> {
          g.setStroke(s.dashed
              ? new BasicStroke(1.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f, new float[] {4f, 3f}, 0f)
              : new BasicStroke(1.6f));
          g.drawLine(cx, my, cx + 18, my);
        }
      }
      g.setColor(INK);
      g.drawString(s.label, cx + 22, cy);
      cx += w;
    }
  }

  private static int maxWidth(FontMetrics fm, String[] names) {
    int m = 0;
    for (String s : names) {
      m = Math.max(m, fm.stringWidth(s));
    }
    return m;
  }
}
