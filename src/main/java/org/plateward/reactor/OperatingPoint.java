package org.plateward.reactor;

/**
 * The eight measured inputs of the unit (totals for the whole stack), SI.
 *
 * @param reformingGasFlowMolPerS dry reforming feed gas flow, mol/s
 * @param steamFlowMolPerS steam flow, mol/s
 * @param reformingInletTempK reforming mixture inlet temperature, K
 * @param reformingPressurePa reforming channel pressure, Pa (absolute)
 * @param fuelFlowMolPerS combustion fuel (methane) flow, mol/s
 * @param airFlowMolPerS combustion air flow, mol/s
 * @param combustionInletTempK combustion mixture inlet temperature, K
 * @param combustionPressurePa combustion channel pressure, Pa (absolute)
 */
public record OperatingPoint(
    double reformingGasFlowMolPerS,
    double steamFlowMolPerS,
    double reformingInletTempK,
    double reformingPressurePa,
    double fuelFlowMolPerS,
    double airFlowMolPerS,
    double combustionInletTempK,
    double combustionPressurePa) {}
