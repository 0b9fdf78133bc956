package org.plateward.reactor;

/**
 * An axial interval of a plate face that carries a catalyst washcoat.
 *
 * @param startM start of the zone measured from the reforming inlet, m
 * @param endM end of the zone, m (greater than {@code startM})
 */
public record Zone(double startM, double endM) {
  /** Length of the overlap of this zone with the interval [aM, bM], m. */
  public double overlapM(double aM, double bM) {
    return Math.max(0.0, Math.min(endM, bM) - Math.max(startM, aM));
  }
}
