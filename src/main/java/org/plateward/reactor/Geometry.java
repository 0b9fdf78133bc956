package org.plateward.reactor;

import java.util.List;

/**
 * Geometry of the plate stack. Reforming gas enters at z = 0, combustion gas at z = L.
 *
 * @param lengthM plate length in the flow direction, m
 * @param widthM plate width across the flow, m
 * @param reformingGapM gap of one reforming channel, m
 * @param combustionGapM gap of one combustion channel, m
 * @param plateThicknessM total thickness of the structural metal of one plate, m
 * @param bufferThicknessM thickness of the embedded latent-heat buffer layer of one plate, m
 * @param channelPairs number of reforming/combustion channel pairs in the stack
 * @param reformingCoating washcoated zones on the reforming faces
 * @param combustionCoating washcoated zones on the combustion faces
 */
public record Geometry(
    double lengthM,
    double widthM,
    double reformingGapM,
    double combustionGapM,
    double plateThicknessM,
    double bufferThicknessM,
    int channelPairs,
    List<Zone> reformingCoating,
    List<Zone> combustionCoating) {
  public Geometry {
    reformingCoating = List.copyOf(reformingCoating);
    combustionCoating = List.copyOf(combustionCoating);
  }

  /** Coated length of the zones inside [aM, bM], m. */
  static double coatedLengthM(List<Zone> zones, double aM, double bM) {
    double sum = 0.0;
    for (Zone z : zones) {
      sum += z.overlapM(aM, bM);
    }
    return sum;
  }
}
