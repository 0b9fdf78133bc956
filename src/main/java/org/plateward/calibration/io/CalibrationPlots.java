package org.plateward.calibration.io;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.plateward.calibration.CalibrationResult;
import org.plateward.plot.Chart;
import org.plateward.reactor.ModelOutputs;
import org.plateward.signals.EdgeUnit;
import org.plateward.signals.Signal;

/**
 * The calibration's residual plots, headless: measured against fitted for each output over the
 * windows (engineering units, ±σ of one reading shaded), and the weighted residual of every
 * window per output with the ±2 lines.
 */
public final class CalibrationPlots {
  public static final int PANEL_W = 420;
  public static final int PANEL_H = 260;
  public static final int RESIDUALS_W = 1000;
  public static final int RESIDUALS_H = 420;

  private CalibrationPlots() {}

  /** Writes the measured-vs-fitted grid (3 x 3 panels of {@value #PANEL_W} x {@value #PANEL_H}). */
  public static java.awt.Dimension writeFit(CalibrationResult r, Path file) throws IOException {
    int nw = r.windows().size();
    double[] x = new double[nw];
    for (int w = 0; w < nw; w++) {
      x[w] = w + 1;
    }
    List<Chart> panels = new ArrayList<>();
    for (int m = 0; m < ModelOutputs.COUNT; m++) {
      Signal s = ModelOutputs.signal(m);
      EdgeUnit u = s.unit();
      double[] meas = new double[nw];
      double[] fit = new double[nw];
      double[] lo = new double[nw];
      double[] hi = new double[nw];
      for (int w = 0; w < nw; w++) {
        meas[w] = u.fromSi(r.measured()[w][m]);
        fit[w] = u.fromSi(r.predicted()[w][m]);
        double sd = r.sigmaSi()[m] / (u == EdgeUnit.DEG_C ? 1.0 : 0.01);
        lo[w] = meas[w] - sd;
        hi[w] = meas[w] + sd;
      }
      Chart c = new Chart(s.meaning(), "steady window", u.label())
          .band(x, lo, hi, Chart.BAND, "measured ± σ of one reading")
          .points(x, meas, Chart.DATA, "measured (window mean)")
          .line(x, fit, Chart.LIMIT, "fitted model");
      if (nw == 1) {
        c.xRange(0.5, 1.5);
      } else {
        c.xRange(0.75, nw + 0.25);
      }
      panels.add(c);
    }
    return Chart.writePng(panels, 3, PANEL_W, PANEL_H, file);
  }

  /** Writes the weighted residuals per output ({@value #RESIDUALS_W} x {@value #RESIDUALS_H}). */
  public static java.awt.Dimension writeResiduals(CalibrationResult r, Path file) throws IOException {
    int nw = r.windows().size();
    String[] names = new String[ModelOutputs.COUNT];
    for (int m = 0; m < ModelOutputs.COUNT; m++) {
      names[m] = shortName(ModelOutputs.signal(m));
    }
    Chart c = new Chart("Weighted residuals (measured - fitted) / σ, one point per window", "output", "residual / σ")
        .xCategories(names)
        .horizontal(2.0, Chart.DATA2, "±2")
        .horizontal(-2.0, Chart.DATA2, "±2")
        .horizontal(0.0, Chart.INK, "");
    for (int w = 0; w < nw; w++) {
      double[] x = new double[ModelOutputs.COUNT];
      double[] y = new double[ModelOutputs.COUNT];
      for (int m = 0; m < ModelOutputs.COUNT; m++) {
        x[m] = m - 0.3 + 0.6 * (nw == 1 ? 0.5 : (double) w / (nw - 1));
        y[m] = (r.measured()[w][m] - r.predicted()[w][m]) / r.sigmaSi()[m];
      }
      c.points(x, y, w % 2 == 0 ? Chart.DATA : Chart.LIMIT, w == 0 ? "windows 1.." + nw + " left to right" : "");
    }
    c.writePng(RESIDUALS_W, RESIDUALS_H, file);
    return new java.awt.Dimension(RESIDUALS_W, RESIDUALS_H);
  }

  private static String shortName(Signal s) {
    return switch (s) {
      case REF_OUTLET_TEMP -> "T ref out";
      case COMB_OUTLET_TEMP -> "T flue out";
      case REF_OUTLET_CH4 -> "CH4";
      case REF_OUTLET_CO -> "CO";
      case REF_OUTLET_CO2 -> "CO2";
      case REF_OUTLET_H2 -> "H2";
      case COMB_OUTLET_O2 -> "O2 flue";
      case PLATE_END_TEMP_REF_INLET -> "T plate z=0";
      case PLATE_END_TEMP_REF_OUTLET -> "T plate z=L";
      default -> s.id();
    };
  }
}
