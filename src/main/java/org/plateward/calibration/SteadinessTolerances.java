package org.plateward.calibration;

import java.util.Locale;
import org.plateward.signals.Signal;

/**
 * What "steady" means for window detection: the signals are averaged over blocks of {@code
 * blockS}; a window is a run of consecutive blocks, at least {@code minDurationS} long, over
 * which every signal's block means stay inside a band of the given full width (largest block
 * mean minus smallest). SI throughout.
 *
 * @param blockS averaging block, s (smooths sensor noise before the band test)
 * @param minDurationS shortest steady window, s
 * @param flowRelative band of the four flows, relative to the window's mean flow
 * @param inletTempK band of the two inlet temperatures, K
 * @param pressurePa band of the two channel pressures, Pa
 * @param outputTempK band of the four measured output temperatures (gas outlets, plate ends), K
 * @param analyzerMoleFraction band of the five analyzer compositions, mole fraction (dry)
 */
public record SteadinessTolerances(
    double blockS,
    double minDurationS,
    double flowRelative,
    double inletTempK,
    double pressurePa,
    double outputTempK,
    double analyzerMoleFraction) {

  public SteadinessTolerances {
    if (!(blockS > 0.0) || !(minDurationS >= blockS) || !(flowRelative > 0.0) || !(inletTempK > 0.0)
        || !(pressurePa > 0.0) || !(outputTempK > 0.0) || !(analyzerMoleFraction > 0.0)) {
      throw new IllegalArgumentException("tolerances must be positive and the minimum duration at least one block");
    }
  }

  /**
   * Defaults (design values of ours, no single source): 2 min blocks, 10 min minimum, flows
   * within 1 % of their mean, inlet temperatures within 2.5 K, pressures within 2 kPa, output
   * temperatures within 3 K, analyzer within 0.6 mol%. At the demo unit's instrument noise
   * (flows 0.5 % per value; thermocouples 1-1.5 K with 8-15 s lags, so about 0.4-0.6 K on a
   * block mean; analyzer up to 0.2 mol% per result, four results a block) the range of ten
   * block means of a truly steady signal stays below about half of each band.
   */
  public static SteadinessTolerances defaults() {
    return new SteadinessTolerances(120.0, 600.0, 0.01, 2.5, 2000.0, 3.0, 0.006);
  }

  public SteadinessTolerances withMinDurationS(double s) {
    return new SteadinessTolerances(blockS, s, flowRelative, inletTempK, pressurePa, outputTempK, analyzerMoleFraction);
  }

  /** Full band width allowed for {@code s} when the window's mean of it is {@code meanSi}, SI. */
  public double bandSi(Signal s, double meanSi) {
    return switch (s) {
      case REF_GAS_FLOW, REF_STEAM_FLOW, FUEL_FLOW, AIR_FLOW -> flowRelative * Math.abs(meanSi);
      case REF_INLET_TEMP, COMB_INLET_TEMP -> inletTempK;
      case REF_PRESSURE, COMB_PRESSURE -> pressurePa;
      case REF_OUTLET_TEMP, COMB_OUTLET_TEMP, PLATE_END_TEMP_REF_INLET, PLATE_END_TEMP_REF_OUTLET -> outputTempK;
      case REF_OUTLET_CH4, REF_OUTLET_CO, REF_OUTLET_CO2, REF_OUTLET_H2, COMB_OUTLET_O2 -> analyzerMoleFraction;
    };
  }

  /** The tolerances in words, engineering units, for command output and file headers. */
  public String describe() {
    return String.format(Locale.ROOT,
        "%.0f s block means of every signal inside a band for at least %.0f min: flows %.1f %% of"
            + " their mean, inlet temperatures %.1f K, pressures %.1f kPa, output temperatures %.1f K,"
            + " analyzer %.2f mol%%",
        blockS, minDurationS / 60.0, 100 * flowRelative, inletTempK, pressurePa / 1000.0, outputTempK,
        100 * analyzerMoleFraction);
  }
}
