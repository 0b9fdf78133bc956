package org.plateward.reactor;

/**
 * The structural plate alloy. Properties are taken constant at the operating temperature.
 *
 * @param name alloy name for reports
 * @param densityKgPerM3 density, kg/m3
 * @param heatCapacityJPerKgK specific heat capacity, J/(kg K)
 * @param conductivityWPerMK thermal conductivity, W/(m K)
 * @param materialLimitK highest plate temperature the site allows for this alloy, K
 */
public record PlateMaterial(
    String name,
    double densityKgPerM3,
    double heatCapacityJPerKgK,
    double conductivityWPerMK,
    double materialLimitK) {}
