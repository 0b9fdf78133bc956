package org.plateward.config;

import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A physical value written with its unit, as in {@code "600 mm"} or {@code "560 degC"}, held
 * in SI.
 *
 * @param valueSi the value in the SI unit of its dimension ({@link Dimension#siSymbol()})
 * @param dimension what kind of quantity it is
 * @param text the text it was parsed from, for messages
 */
public record Quantity(double valueSi, Dimension dimension, String text) {
  private static final Pattern FORM =
      Pattern.compile("\\s*([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*?)\\s*");

  /**
   * Parses a number followed by a unit of the given dimension.
   *
   * @param text for example {@code "320 kPa"}; blanks between number and unit are optional
   * @param dimension the dimension the value must have
   * @return the value converted to SI
   * @throws QuantityFormatException when the text is not "number unit", or the unit is not
   *     one of the dimension's units; the message names the expected dimension and its units
   */
  public static Quantity parse(String text, Dimension dimension) {
    Matcher m = FORM.matcher(text);
    String expected = "a unit of " + dimension.label() + " (" + dimension.unitList() + ")";
    if (!m.matches()) {
      throw new QuantityFormatException(
          "expected a number followed by " + expected + ", got \"" + text + "\"");
    }
    double number = Double.parseDouble(m.group(1));
    String unitText = m.group(2);
    if (unitText.isEmpty()) {
      throw new QuantityFormatException("has no unit: give " + expected + ", got \"" + text + "\"");
    }
    Dimension.UnitOfMeasure unit = dimension.find(unitText);
    if (unit == null) {
      List<Dimension> others = Dimension.accepting(unitText);
      String what = others.isEmpty()
          ? "\"" + unitText + "\" is not a known unit"
          : "\"" + unitText + "\" is a unit of " + others.get(0).label();
      throw new QuantityFormatException(
          "wrong unit: expected " + expected + ", got \"" + text + "\" (" + what + ")");
    }
    return new Quantity(unit.toSi(number), dimension, text.strip());
  }
}
