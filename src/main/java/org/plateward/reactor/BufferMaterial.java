package org.plateward.reactor;

/**
 * The latent-heat buffer metal embedded in each plate. One heat capacity is used for both
 * phases; the conductivity switches with melt fraction.
 *
 * @param name metal name for reports
 * @param densityKgPerM3 density of the solid, kg/m3
 * @param heatCapacityJPerKgK specific heat capacity, J/(kg K)
 * @param conductivitySolidWPerMK conductivity of the solid, W/(m K)
 * @param conductivityLiquidWPerMK conductivity of the melt, W/(m K)
 * @param meltingPointK melting point, K
 * @param latentHeatJPerKg latent heat of fusion, J/kg
 * @param mushyBandK width of the temperature band the latent heat is spread over, K
 */
public record BufferMaterial(
    String name,
    double densityKgPerM3,
    double heatCapacityJPerKgK,
    double conductivitySolidWPerMK,
    double conductivityLiquidWPerMK,
    double meltingPointK,
    double latentHeatJPerKg,
    double mushyBandK) {}
