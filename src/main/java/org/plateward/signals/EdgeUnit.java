package org.plateward.signals;

/**
 * Engineering units used at the edges (replay files, OPC UA tags, displays) and their exact
 * conversion to SI. Inside the program everything is SI.
 */
public enum EdgeUnit {
  /** Normal cubic metres per hour (0 degC, 101.325 kPa, ideal gas) to mol/s. */
  NM3_PER_H("Nm3/h", "mol/s", 101325.0 / (8.314462618 * 273.15) / 3600.0, 0.0),
  /** Steam mass flow kg/h to mol/s (M_H2O = 18.01528 g/mol). */
  KG_PER_H_STEAM("kg/h", "mol/s", 1.0 / 3600.0 / 0.01801528, 0.0),
  DEG_C("degC", "K", 1.0, 273.15),
  KPA_ABS("kPa(abs)", "Pa", 1000.0, 0.0),
  /** Mole per cent on a dry basis to mole fraction. */
  MOL_PCT_DRY("mol% dry", "1", 0.01, 0.0);

  private final String label;
  private final String siLabel;
  private final double scale;
  private final double offset;

  EdgeUnit(String label, String siLabel, double scale, double offset) {
    this.label = label;
    this.siLabel = siLabel;
    this.scale = scale;
    this.offset = offset;
  }

  public String label() {
    return label;
  }

  public String siLabel() {
    return siLabel;
  }

  public double toSi(double edgeValue) {
    return edgeValue * scale + offset;
  }

  public double fromSi(double siValue) {
    return (siValue - offset) / scale;
  }
}
