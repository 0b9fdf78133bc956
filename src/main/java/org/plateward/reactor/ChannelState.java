package org.plateward.reactor;

/**
 * The marched state of one channel: species molar flows and gas temperature at every cell
 * face, and the heat each cell's gas exchanges with the plate (per channel).
 */
final class ChannelState {
  final int cells;
  /** Molar flows per face, [face * 7 + species], mol/s per channel. */
  final double[] flows;
  /** Gas temperature per face, K. */
  final double[] tempK;
  /** Heat given to the plate by cell j (reaction heat minus convection), W per channel. */
  final double[] heatToPlateW;
  /** Reaction heat released at the wall in cell j, W per channel. */
  final double[] reactionHeatW;

  ChannelState(int cells) {
    this.cells = cells;
    this.flows = new double[(cells + 1) * GasFlux.NS];
    this.tempK = new double[cells + 1];
    this.heatToPlateW = new double[cells];
    this.reactionHeatW = new double[cells];
  }

  void copyFace(ChannelState from, int face) {
    System.arraycopy(from.flows, face * GasFlux.NS, flows, face * GasFlux.NS, GasFlux.NS);
    tempK[face] = from.tempK[face];
  }

  void copyFrom(ChannelState o) {
    System.arraycopy(o.flows, 0, flows, 0, flows.length);
    System.arraycopy(o.tempK, 0, tempK, 0, tempK.length);
    System.arraycopy(o.heatToPlateW, 0, heatToPlateW, 0, heatToPlateW.length);
    System.arraycopy(o.reactionHeatW, 0, reactionHeatW, 0, reactionHeatW.length);
  }

  double flow(int face, int species) {
    return flows[face * GasFlux.NS + species];
  }
}
