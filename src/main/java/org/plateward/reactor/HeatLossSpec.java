package org.plateward.reactor;

/**
 * Heat lost from the plates to the casing and surroundings.
 *
 * @param coefficientWPerM2K loss coefficient referred to the plan area of one plate, W/(m2 K)
 * @param ambientK temperature the heat is lost to, K
 */
public record HeatLossSpec(double coefficientWPerM2K, double ambientK) {}
