package org.plateward.config;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import org.plateward.signals.EdgeUnit;

/**
 * The physical dimensions a configuration value can have, each with the units accepted for it
 * and their exact conversion to the SI unit used inside the program.
 *
 * <p>A value in a unit is converted as {@code si = value * scale + offset}; only the absolute
 * temperature units have an offset.
 */
public enum Dimension {
  LENGTH("length", "m", u("m", 1.0), u("cm", 1e-2), u("mm", 1e-3)),
  /** Absolute temperature. */
  TEMPERATURE("temperature", "K", u("K", 1.0), u("degC", 1.0, 273.15, "°C")),
  /** A temperature difference (a band or a span): kelvin only, never an offset. */
  TEMPERATURE_DIFFERENCE("temperature difference", "K", u("K", 1.0)),
  /** Absolute pressure. */
  PRESSURE("absolute pressure", "Pa", u("Pa", 1.0), u("kPa", 1e3), u("MPa", 1e6), u("bar", 1e5)),
  /**
   * Amount of an ideal gas per time. Normal cubic metres are taken at 0 degC and 101.325 kPa
   * (the same convention as {@link EdgeUnit#NM3_PER_H}).
   */
  GAS_FLOW(
      "gas flow",
      "mol/s",
      u("mol/s", 1.0),
      u("kmol/h", 1000.0 / 3600.0),
      u("Nm3/h", EdgeUnit.NM3_PER_H.toSi(1.0), "Nm³/h")),
  /** Amount of steam per time; mass units use M(H2O) = 18.01528 g/mol ({@link EdgeUnit#KG_PER_H_STEAM}). */
  STEAM_FLOW(
      "steam flow",
      "mol/s",
      u("kg/h", EdgeUnit.KG_PER_H_STEAM.toSi(1.0)),
      u("kg/s", 3600.0 * EdgeUnit.KG_PER_H_STEAM.toSi(1.0)),
      u("mol/s", 1.0),
      u("kmol/h", 1000.0 / 3600.0)),
  DENSITY("density", "kg/m3", u("kg/m3", 1.0, 0.0, "kg/m³"), u("g/cm3", 1000.0, 0.0, "g/cm³")),
  SPECIFIC_HEAT(
      "specific heat capacity",
      "J/(kg K)",
      u("J/(kg K)", 1.0, 0.0, "J/kg/K"),
      u("kJ/(kg K)", 1000.0, 0.0, "kJ/kg/K")),
  CONDUCTIVITY("thermal conductivity", "W/(m K)", u("W/(m K)", 1.0, 0.0, "W/m/K")),
  LATENT_HEAT("specific latent heat", "J/kg", u("J/kg", 1.0), u("kJ/kg", 1000.0)),
  AREAL_MASS("mass per area", "kg/m2", u("kg/m2", 1.0, 0.0, "kg/m²"), u("g/m2", 1e-3, 0.0, "g/m²")),
  HEAT_TRANSFER_COEFFICIENT(
      "heat-transfer coefficient", "W/(m2 K)", u("W/(m2 K)", 1.0, 0.0, "W/m2/K", "W/(m² K)")),
  /** A time or duration (scenario files). */
  TIME("time", "s", u("s", 1.0), u("min", 60.0), u("h", 3600.0), u("d", 86400.0)),
  /** A fraction written in per cent (scenario magnitudes): "8 %" is 0.08. */
  PERCENT("fraction in per cent", "1", u("%", 0.01));

  /** One accepted unit: its symbol, aliases and the affine map to SI. */
  public record UnitOfMeasure(String symbol, double scale, double offset, List<String> aliases) {
    /** Converts a value in this unit to SI. */
    public double toSi(double value) {
      return value * scale + offset;
    }

    boolean matches(String normalised) {
      if (normalise(symbol).equals(normalised)) {
        return true;
      }
      for (String a : aliases) {
        if (normalise(a).equals(normalised)) {
          return true;
        }
      }
      return false;
    }
  }

  private final String label;
  private final String siSymbol;
  private final List<UnitOfMeasure> units;

  Dimension(String label, String siSymbol, UnitOfMeasure... units) {
    this.label = label;
    this.siSymbol = siSymbol;
    this.units = List.of(units);
  }

  private static UnitOfMeasure u(String symbol, double scale) {
    return new UnitOfMeasure(symbol, scale, 0.0, List.of());
  }

  private static UnitOfMeasure u(String symbol, double scale, String alias) {
    return new UnitOfMeasure(symbol, scale, 0.0, List.of(alias));
  }

  private static UnitOfMeasure u(String symbol, double scale, double offset, String... aliases) {
    return new UnitOfMeasure(symbol, scale, offset, List.of(aliases));
  }

  /** Human name of the dimension, e.g. "length". */
  public String label() {
    return label;
  }

  /** Symbol of the SI unit values are converted to. */
  public String siSymbol() {
    return siSymbol;
  }

  /** The accepted units, preferred spelling first. */
  public List<UnitOfMeasure> units() {
    return units;
  }

  /** The accepted unit symbols joined for messages, e.g. "m, cm, mm". */
  public String unitList() {
    List<String> s = new ArrayList<>();
    for (UnitOfMeasure unit : units) {
      s.add(unit.symbol());
    }
    return String.join(", ", s);
  }

  /** The unit of this dimension written as {@code symbol}, or null. */
  public UnitOfMeasure find(String symbol) {
    String n = normalise(symbol);
    for (UnitOfMeasure unit : units) {
      if (unit.matches(n)) {
        return unit;
      }
    }
    return null;
  }

  /** All dimensions that accept this unit symbol (to explain a wrong unit). */
  public static List<Dimension> accepting(String symbol) {
    List<Dimension> out = new ArrayList<>();
    for (Dimension d : values()) {
      if (d.find(symbol) != null) {
        out.add(d);
      }
    }
    return Collections.unmodifiableList(out);
  }

  /** Unit spelling for comparison: no blanks, no multiplication dots, "°C" as "degC". */
  static String normalise(String symbol) {
    String s = symbol.strip().replace("°C", "degC").replace("℃", "degC");
    StringBuilder b = new StringBuilder(s.length());
    for (int i = 0; i < s.length(); i++) {
      char c = s.charAt(i);
      if (c != ' ' && c != '\t' && c != '*' && c != '·' && c != '.') {
        b.append(c);
      }
    }
    return b.toString().toLowerCase(Locale.ROOT).equals("degc") ? "degC" : b.toString();
  }
}
