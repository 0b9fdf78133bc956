package org.plateward.reactor;

/**
 * The hottest plate temperature and where it sits, reconstructed between cell centres by the
 * parabola through the hottest cell and its two neighbours (exact for a quadratic profile on
 * any spacing). At an end cell the end value is used (the plate ends are adiabatic).
 *
 * @param tempK peak plate temperature, K
 * @param positionM its position from the reforming inlet, m
 * @param cell index of the hottest cell
 */
public record HiddenPeak(double tempK, double positionM, int cell) {

  /** Locates the peak of a cell-centred profile. */
  public static HiddenPeak of(Grid grid, double[] plateK) {
    int n = plateK.length;
    int i = 0;
    for (int j = 1; j < n; j++) {
      if (plateK[j] > plateK[i]) {
        i = j;
      }
    }
    if (i == 0 || i == n - 1) {
      return new HiddenPeak(plateK[i], i == 0 ? grid.centreM(0) : grid.centreM(n - 1), i);
    }
    double x0 = grid.centreM(i - 1);
    double x1 = grid.centreM(i);
    double x2 = grid.centreM(i + 1);
    double y0 = plateK[i - 1];
    double y1 = plateK[i];
    double y2 = plateK[i + 1];
    // divided differences of the interpolating parabola y = y1 + b (x - x1) + c (x - x1)^2 ...
    double d01 = (y1 - y0) / (x1 - x0);
    double d12 = (y2 - y1) / (x2 - x1);
    double c = (d12 - d01) / (x2 - x0);
    if (c >= 0.0) {
      return new HiddenPeak(y1, x1, i);
    }
    // y = y0 + d01 (x - x0) + c (x - x0)(x - x1); dy/dx = 0
    double xv = 0.5 * (x0 + x1) - d01 / (2.0 * c);
    xv = Math.max(x0, Math.min(x2, xv));
    double yv = y0 + d01 * (xv - x0) + c * (xv - x0) * (xv - x1);
    return new HiddenPeak(Math.max(yv, y1), xv, i);
  }
}
