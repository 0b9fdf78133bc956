package org.plateward.reactor;

/**
 * Result and workspace of one model evaluation: dx/dt, outputs and profiles. Reused between
 * calls to avoid allocation; not thread-safe. Arrays returned by accessors are copies.
 */
public final class ModelEvaluation {
  final int cells;
  /** d(e_j)/dt, W/m2 of plate. */
  final double[] dedt;
  final double[] plateK;
  final double[] melt;
  /** Conduction minus heat loss per cell, W/m2 (the local part of dedt). */
  final double[] local;
  final double[] outputs = new double[ModelOutputs.COUNT];
  final ChannelState reforming;
  final ChannelState combustion;
  // Jacobian scratch
  final ChannelState reformingScratch;
  final ChannelState combustionScratch;
  final double[] plateScratch;
  final double[] meltScratch;

  public ModelEvaluation(int cells) {
    this.cells = cells;
    dedt = new double[cells];
    plateK = new double[cells];
    melt = new double[cells];
    local = new double[cells];
    plateScratch = new double[cells];
    meltScratch = new double[cells];
    reforming = new ChannelState(cells);
    combustion = new ChannelState(cells);
    reformingScratch = new ChannelState(cells);
    combustionScratch = new ChannelState(cells);
  }

  public int cells() {
    return cells;
  }

  /** Rate of change of each cell's areal plate enthalpy, W/m2. */
  public double[] enthalpyRateWPerM2() {
    return dedt.clone();
  }

  /** d(e_j)/dt of one cell, W/m2. */
  public double enthalpyRateWPerM2(int cell) {
    return dedt[cell];
  }

  public double[] plateTempK() {
    return plateK.clone();
  }

  public double plateTempK(int cell) {
    return plateK[cell];
  }

  public double[] meltFraction() {
    return melt.clone();
  }

  public double meltFraction(int cell) {
    return melt[cell];
  }

  /** Outputs y in SI, indexed by {@link ModelOutputs}. */
  public double[] outputs() {
    return outputs.clone();
  }

  public double output(int index) {
    return outputs[index];
  }

  /** Reforming gas temperature at each face, K. */
  public double[] reformingGasTempK() {
    return reforming.tempK.clone();
  }

  /** Combustion gas temperature at each face, K. */
  public double[] combustionGasTempK() {
    return combustion.tempK.clone();
  }

  /** Molar flow of one species at a face in the reforming channel, mol/s per channel. */
  public double reformingFlowMolPerS(int face, int species) {
    return reforming.flow(face, species);
  }

  /** Molar flow of one species at a face in the combustion channel, mol/s per channel. */
  public double combustionFlowMolPerS(int face, int species) {
    return combustion.flow(face, species);
  }

  /** Heat given to the plate by each reforming-channel cell, W per channel. */
  public double[] reformingHeatToPlateW() {
    return reforming.heatToPlateW.clone();
  }

  /** Heat given to the plate by each combustion-channel cell, W per channel. */
  public double[] combustionHeatToPlateW() {
    return combustion.heatToPlateW.clone();
  }
}
