package org.plateward.ui;

import java.util.Locale;
import javafx.geometry.Insets;
import javafx.geometry.VPos;
import javafx.scene.Node;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.control.Label;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.VBox;
import javafx.scene.text.TextAlignment;
import org.plateward.Advisory;
import org.plateward.advisor.TrimOutlook;
import org.plateward.advisor.TrimSuggestion;
import org.plateward.advisor.TrimVerdict;
import org.plateward.reactor.UnitSpec;

/**
 * Advisor: the fuel-trim suggestion in force at the cursor, its forecast when holding the fuel
 * against the forecast with the trim (peak with its upper bound against the limit, hottest-cell
 * melt, methane conversion), and the advisory label. The window only draws what the advisor
 * forecast.
 */
final class AdvisorView implements TimelineView {
  private final BorderPane root = new BorderPane();
  private final Label label = new Label("ADVISORY - a suggestion only; Plateward never writes to the plant.");
  private final Label text = new Label("no fuel-trim suggestion yet (the advisor is asked every 30 s of plant time)");
  private final CanvasPane canvas = new CanvasPane();
  private final UnitSpec unit;
  private TrimSuggestion shown;

  AdvisorView(UnitSpec unit) {
    this.unit = unit;
    label.setStyle("-fx-font-weight: bold; -fx-font-size: 14px;");
    text.setId("advisor-text");
    text.setWrapText(true);
    text.setStyle("-fx-font-family: monospace;");
    Label caution = new Label(Advisory.SHORT);
    caution.setWrapText(true);
    VBox top = new VBox(6, label, text, caution);
    top.setPadding(new Insets(8));
    root.setTop(top);
    root.setCenter(canvas);
    canvas.onResize(this::redraw);
  }

  @Override
  public String title() {
    return "Advisor";
  }

  @Override
  public Node node() {
    return root;
  }

  /** The suggestion text shown (for tests). */
  String text() {
    return text.getText();
  }

  @Override
  public void show(Timeline tl, int index) {
    TrimSuggestion s = index < 0 ? null : tl.advice(index);
    if (s == shown) {
      return;
    }
    shown = s;
    if (s != null) {
      text.setText("suggested at " + Timeline.instant(s.timeS()) + ":\n" + s.message().replace("  " + Advisory.SHORT, "").strip());
    }
    redraw();
  }

  private void redraw() {
    GraphicsContext g = canvas.canvas().getGraphicsContext2D();
    double w = canvas.canvas().getWidth();
    double h = canvas.canvas().getHeight();
    g.clearRect(0, 0, w, h);
    g.setFill(Palette.BACKGROUND);
    g.fillRect(0, 0, w, h);
    if (shown == null) {
      return;
    }
    if (shown.verdict() == TrimVerdict.HELD_BACK) {
      // no forecast was made: nothing to plot, the reason is in the text beside
      g.setFill(Palette.TEXT);
      g.setFont(TraceChart.TITLE);
      g.setTextBaseline(VPos.TOP);
      g.setTextAlign(TextAlignment.LEFT);
      g.fillText("Advice held back: no forecast (see the reason)", 20, 20);
      return;
    }
    TrimOutlook hold = shown.hold();
    TrimOutlook trim = shown.trimmed();
    boolean two = shown.verdict() != TrimVerdict.NO_TRIM_NEEDED;
    double left = 170;
    double pw = Math.max(100, w - left - 40);
    double top = 40;
    // forecast peak over the horizon: bar to the mean, whisker to the upper bound, limit line
    double limitC = Units.degC(shown.limitK());
    double meltC = Units.degC(unit.buffer().meltingPointK());
    double lo = Math.min(Units.degC(Math.min(hold.peakTempK(), trim.peakTempK())), meltC) - 40;
    double hi = Math.max(Units.degC(Math.max(hold.peakUpperK(), trim.peakUpperK())), limitC) + 15;
    g.setFill(Palette.TEXT);
    g.setFont(TraceChart.TITLE);
    g.setTextBaseline(VPos.TOP);
    g.setTextAlign(TextAlignment.LEFT);
    g.fillText(String.format(Locale.ROOT, "Forecast over %.0f min: highest hidden peak (bar) and its upper bound (whisker), °C",
        hold.horizonS() / 60), 20, 10);
    TrimOutlook[] rows = two ? new TrimOutlook[] {hold, trim} : new TrimOutlook[] {hold};
    String[] names = two ? new String[] {"hold fuel", String.format(Locale.ROOT, "trim %+.1f %%", 100 * shown.trim())}
        : new String[] {"hold fuel"};
    double barH = 30;
    for (int i = 0; i < rows.length; i++) {
      double y = top + i * (barH + 34);
      double x1 = left + (Units.degC(rows[i].peakTempK()) - lo) / (hi - lo) * pw;
      double x2 = left + (Units.degC(rows[i].peakUpperK()) - lo) / (hi - lo) * pw;
      g.setFill(Palette.PLOT);
      g.fillRect(left, y, pw, barH);
      boolean over = rows[i].peakUpperK() > shown.limitK();
      g.setFill(over ? Palette.PROMPT : Palette.SECOND);
      g.fillRect(left, y + 6, Math.max(1, x1 - left), barH - 12);
      g.setStroke(Palette.TEXT);
      g.setLineWidth(2);
      g.strokeLine(x1, y + barH / 2, x2, y + barH / 2);
      g.strokeLine(x2, y + 4, x2, y + barH - 4);
      g.setFill(Palette.TEXT);
      g.setFont(TraceChart.TITLE);
      g.setTextAlign(TextAlignment.RIGHT);
      g.setTextBaseline(VPos.CENTER);
      g.fillText(names[i], left - 8, y + barH / 2);
      g.setTextAlign(TextAlignment.LEFT);
      g.setFont(TraceChart.LABEL);
      g.setTextBaseline(VPos.TOP);
      g.fillText(String.format(Locale.ROOT, "peak %.1f °C, upper bound %.1f °C%s", Units.degC(rows[i].peakTempK()),
          Units.degC(rows[i].peakUpperK()), over ? "  - ABOVE THE LIMIT" : "  - below the limit"), left + 4, y + barH + 1);
    }
    double yEnd = top + rows.length * (barH + 34);
    double lx = left + (limitC - lo) / (hi - lo) * pw;
    g.setStroke(Palette.LIMIT);
    g.setLineWidth(1);
    g.setLineDashes(8, 4);
    g.strokeLine(lx, top - 6, lx, yEnd - 20);
    double mx = left + (meltC - lo) / (hi - lo) * pw;
    g.strokeLine(mx, top - 6, mx, yEnd - 20);
    g.setLineDashes();
    g.setFill(Palette.MUTED);
    g.setTextAlign(TextAlignment.CENTER);
    g.setTextBaseline(VPos.TOP);
    g.fillText(String.format(Locale.ROOT, "limit %.0f °C", limitC), lx, yEnd - 18);
    g.fillText(String.format(Locale.ROOT, "buffer melting %.1f °C", meltC), mx, Math.abs(mx - lx) < 140 ? yEnd - 4 : yEnd - 18);
    // melt and conversion side by side
    double y = yEnd + 30;
    g.setTextAlign(TextAlignment.LEFT);
    g.setFill(Palette.TEXT);
    g.setFont(TraceChart.TITLE);
    g.fillText("Hottest-cell melt fraction over the horizon, and methane conversion at its end, %", 20, y);
    for (int i = 0; i < rows.length; i++) {
      double yy = y + 26 + i * 30;
      double m = rows[i].maxCellMeltFraction();
      g.setFill(Palette.PLOT);
      g.fillRect(left, yy, pw / 2 - 20, 20);
      g.setFill(m >= 0.999 ? Palette.PROMPT : Palette.SECOND);
      g.fillRect(left, yy + 3, (pw / 2 - 20) * Math.max(0, Math.min(1, m)), 14);
      g.setFill(Palette.TEXT);
      g.setTextAlign(TextAlignment.RIGHT);
      g.setTextBaseline(VPos.CENTER);
      g.fillText(names[i], left - 8, yy + 10);
      g.setTextAlign(TextAlignment.LEFT);
      g.setFont(TraceChart.LABEL);
      g.fillText(String.format(Locale.ROOT, "melt %.0f %%   conversion %.1f %%", 100 * m, 100 * rows[i].methaneConversion()),
          left + pw / 2, yy + 10);
      g.setFont(TraceChart.TITLE);
    }
  }
}
