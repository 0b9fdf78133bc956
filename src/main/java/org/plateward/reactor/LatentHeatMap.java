package org.plateward.reactor;

/**
 * The enthalpy method's temperature-enthalpy map for a material with a phase change (Voller
 * and Prakash 1987; Alexiades and Solomon 1993): enthalpy e = C (T - Tref) + Lambda phi(T),
 * with the latent heat Lambda released over the mushy band [Tm - dT/2, Tm + dT/2] by the
 * smooth step phi = 3 s^2 - 2 s^3, s = (T - Tm + dT/2)/dT. The smooth step makes de/dT
 * continuous (C at both band edges), so the model's Jacobian has no jump when a cell starts
 * or finishes melting; the inverse inside the band is found by Newton on the cubic. The
 * capacities may be per volume, per area or per cell.
 */
public final class LatentHeatMap {
  private final double capacity;
  private final double latent;
  private final double referenceK;
  private final double bandLowK;
  private final double bandK;
  private final double eLow;
  private final double eHigh;

  /**
   * @param capacity sensible heat capacity C (J/K per chosen measure)
   * @param latent latent heat Lambda (J per chosen measure)
   * @param meltingPointK Tm, K
   * @param bandK mushy band width, K (greater than zero)
   * @param referenceK temperature of zero enthalpy, K (below the band)
   */
  public LatentHeatMap(double capacity, double latent, double meltingPointK, double bandK, double referenceK) {
    if (!(bandK > 0.0)) {
      throw new IllegalArgumentException("mushy band must be positive, got " + bandK);
    }
    this.capacity = capacity;
    this.latent = latent;
    this.referenceK = referenceK;
    this.bandK = bandK;
    this.bandLowK = meltingPointK - 0.5 * bandK;
    this.eLow = capacity * (bandLowK - referenceK);
    this.eHigh = eLow + capacity * bandK + latent;
  }

  public double tempK(double e) {
    if (e <= eLow) {
      return referenceK + e / capacity;
    }
    if (e >= eHigh) {
      return referenceK + (e - latent) / capacity;
    }
    return bandLowK + bandK * bandPosition(e);
  }

  /** s in [0, 1] solving C dT s + Lambda (3 s^2 - 2 s^3) = e - e_low (monotone in s). */
  private double bandPosition(double e) {
    double target = e - eLow;
    double cdt = capacity * bandK;
    double s = target / (eHigh - eLow);
    for (int it = 0; it < 50; it++) {
      double f = cdt * s + latent * s * s * (3.0 - 2.0 * s) - target;
      double df = cdt + 6.0 * latent * s * (1.0 - s);
      double ds = f / df;
      s = Math.max(0.0, Math.min(1.0, s - ds));
      if (Math.abs(ds) < 1e-15) {
        break;
      }
    }
    return s;
  }

  private static double smoothStep(double s) {
    return s * s * (3.0 - 2.0 * s);
  }

  public double meltFraction(double e) {
    if (e <= eLow) {
      return 0.0;
    }
    if (e >= eHigh) {
      return 1.0;
    }
    return smoothStep(bandPosition(e));
  }

  /** Enthalpy at temperature T (inside the band, at the band's melt fraction). */
  public double enthalpy(double tempK) {
    double phi = tempK <= bandLowK ? 0.0 : tempK >= bandLowK + bandK ? 1.0 : smoothStep((tempK - bandLowK) / bandK);
    return capacity * (tempK - referenceK) + latent * phi;
  }

  /** Enthalpy at which melting starts. */
  public double meltStart() {
    return eLow;
  }

  /** Enthalpy at which the material is fully melted. */
  public double meltEnd() {
    return eHigh;
  }

  public double capacity() {
    return capacity;
  }

  public double latent() {
    return latent;
  }
}
