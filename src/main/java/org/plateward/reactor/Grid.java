package org.plateward.reactor;

import java.util.ArrayList;
import java.util.List;

/**
 * A one-dimensional, possibly non-uniform division of the plate into cells along z. Faces are
 * at {@code faceM(0) = 0 < ... < faceM(N) = L}.
 *
 * <p>A refined grid places cells with density {@code 1 + (r - 1) exp(-((z - z_k)/w)^2)}
 * (summed over refinement points z_k, capped at r) and maps the cumulative density onto
 * equal steps, so refinement is smooth and the cell count is exact.
 */
public final class Grid {
  private final double[] facesM;

  private Grid(double[] facesM) {
    this.facesM = facesM;
  }

  /** A uniform grid of {@code cells} cells over {@code lengthM}. */
  public static Grid uniform(double lengthM, int cells) {
    double[] f = new double[cells + 1];
    for (int i = 0; i <= cells; i++) {
      f[i] = lengthM * i / cells;
    }
    f[cells] = lengthM;
    return new Grid(f);
  }

  /**
   * A grid refined around the given points.
   *
   * @param lengthM plate length, m
   * @param cells number of cells
   * @param refinement peak density ratio (1 = uniform)
   * @param widthM half-width of each refined region, m
   * @param pointsM refinement points, m
   */
  public static Grid refined(
      double lengthM, int cells, double refinement, double widthM, List<Double> pointsM) {
    if (refinement <= 1.0 || pointsM.isEmpty()) {
      return uniform(lengthM, cells);
    }
    int fine = 20000;
    double[] cumulative = new double[fine + 1];
    double dz = lengthM / fine;
    for (int i = 1; i <= fine; i++) {
      double z = (i - 0.5) * dz;
      cumulative[i] = cumulative[i - 1] + density(z, refinement, widthM, pointsM) * dz;
    }
    double total = cumulative[fine];
    double[] f = new double[cells + 1];
    int k = 0;
    for (int i = 1; i < cells; i++) {
      double target = total * i / cells;
      while (cumulative[k + 1] < target) {
        k++;
      }
      double frac = (target - cumulative[k]) / (cumulative[k + 1] - cumulative[k]);
      f[i] = (k + frac) * dz;
    }
    f[cells] = lengthM;
    return new Grid(f);
  }

  /** The grid the spec asks for: refined at every coated-zone edge. */
  public static Grid forUnit(Geometry g, GridSpec spec) {
    List<Double> points = new ArrayList<>();
    for (Zone z : g.combustionCoating()) {
      // the combustion gas flows from z = L towards 0: the front sits at the zone's upstream
      // (high-z) edge, where fresh fuel first meets the catalyst
      if (z.endM() < g.lengthM() - 1e-9) {
        points.add(z.endM());
      }
    }
    for (Zone z : g.reformingCoating()) {
      addEdges(points, z, g.lengthM());
    }
    return refined(g.lengthM(), spec.cells(), spec.refinement(), spec.refinementWidthM(), points);
  }

  private static void addEdges(List<Double> points, Zone z, double lengthM) {
    if (z.startM() > 1e-9) {
      points.add(z.startM());
    }
    if (z.endM() < lengthM - 1e-9) {
      points.add(z.endM());
    }
  }

  private static double density(double z, double r, double w, List<Double> points) {
    double d = 1.0;
    for (double p : points) {
      double s = (z - p) / w;
      d += (r - 1.0) * Math.exp(-s * s);
    }
    return Math.min(d, r);
  }

  public int cells() {
    return facesM.length - 1;
  }

  public double faceM(int i) {
    return facesM[i];
  }

  public double widthM(int cell) {
    return facesM[cell + 1] - facesM[cell];
  }

  public double centreM(int cell) {
    return 0.5 * (facesM[cell] + facesM[cell + 1]);
  }

  public double lengthM() {
    return facesM[facesM.length - 1];
  }

  /** Copy of the face positions, m. */
  public double[] facesM() {
    return facesM.clone();
  }

  /** Smallest cell width, m. */
  public double minWidthM() {
    double m = Double.MAX_VALUE;
    for (int i = 0; i < cells(); i++) {
      m = Math.min(m, widthM(i));
    }
    return m;
  }
}
