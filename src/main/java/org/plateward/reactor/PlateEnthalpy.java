package org.plateward.reactor;

/**
 * One plate with its embedded buffer layer, per unit plan area. The state is the areal
 * enthalpy e of one plate, J/m2, zero for solid metal at {@link #REFERENCE_K}:
 *
 * <pre>
 *   e(T) = C (T - Tref) + Lambda phi(T),   C = rho_p c_p t_p + rho_b c_b t_b,   Lambda = rho_b L t_b
 * </pre>
 *
 * mapped by the enthalpy method ({@link LatentHeatMap}). Axial conduction runs through the
 * alloy and the buffer layer side by side (in parallel); the buffer's conductivity moves from
 * its solid to its liquid value with the melt fraction.
 */
public final class PlateEnthalpy {
  /** Reference temperature of zero enthalpy, K. */
  public static final double REFERENCE_K = 298.15;

  private final LatentHeatMap map;
  private final double conductanceSolidWPerK;
  private final double conductanceLiquidWPerK;

  public PlateEnthalpy(Geometry g, PlateMaterial plate, BufferMaterial buffer) {
    double tp = g.plateThicknessM();
    double tb = g.bufferThicknessM();
    double c = plate.densityKgPerM3() * plate.heatCapacityJPerKgK() * tp
        + buffer.densityKgPerM3() * buffer.heatCapacityJPerKgK() * tb;
    double latent = buffer.densityKgPerM3() * buffer.latentHeatJPerKg() * tb;
    this.map = new LatentHeatMap(c, latent, buffer.meltingPointK(), buffer.mushyBandK(), REFERENCE_K);
    this.conductanceSolidWPerK = plate.conductivityWPerMK() * tp + buffer.conductivitySolidWPerMK() * tb;
    this.conductanceLiquidWPerK = plate.conductivityWPerMK() * tp + buffer.conductivityLiquidWPerMK() * tb;
  }

  /** Plate temperature at areal enthalpy e, K. */
  public double tempK(double eJPerM2) {
    return map.tempK(eJPerM2);
  }

  /** Buffer melt fraction at areal enthalpy e, 0..1. */
  public double meltFraction(double eJPerM2) {
    return map.meltFraction(eJPerM2);
  }

  /** Areal enthalpy of a plate at temperature T, J/m2 (inside the band at the band's melt fraction). */
  public double enthalpyJPerM2(double tempK) {
    return map.enthalpy(tempK);
  }

  /** Areal enthalpy at temperature T and melt fraction phi (for states on the plateau), J/m2. */
  public double enthalpyJPerM2(double tempK, double meltFraction) {
    return map.capacity() * (tempK - REFERENCE_K) + map.latent() * meltFraction;
  }

  /** Axial conductance-thickness product at melt fraction phi, W/K (per m width, times m). */
  public double axialConductanceWPerK(double meltFraction) {
    return conductanceSolidWPerK + (conductanceLiquidWPerK - conductanceSolidWPerK) * meltFraction;
  }

  /** Sensible areal heat capacity C, J/(m2 K). */
  public double sensibleJPerM2K() {
    return map.capacity();
  }

  /** Latent areal capacity Lambda of the buffer layer, J/m2. */
  public double latentJPerM2() {
    return map.latent();
  }

  /** Enthalpy at which melting starts (lower edge of the mushy band), J/m2. */
  public double meltStartJPerM2() {
    return map.meltStart();
  }

  /** Enthalpy at which the buffer is fully melted, J/m2. */
  public double meltEndJPerM2() {
    return map.meltEnd();
  }
}
