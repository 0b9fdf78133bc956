package org.plateward.reactor;

/**
 * How the plate is divided into cells.
 *
 * @param cells number of cells (at least 3)
 * @param refinement peak ratio of cell density at the refinement points to the background
 *     density; 1 gives a uniform grid
 * @param refinementWidthM half-width of the refined regions, m
 */
public record GridSpec(int cells, double refinement, double refinementWidthM) {
  public static GridSpec uniform(int cells) {
    return new GridSpec(cells, 1.0, 0.01);
  }

  public GridSpec withCells(int n) {
    return new GridSpec(n, refinement, refinementWidthM);
  }
}
