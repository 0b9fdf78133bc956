package org.plateward.opcua;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.plateward.signals.Signal;

/**
 * Where each boundary signal sits in the simulated plant's address space, below
 * {@code Objects/<skid>}. The browse path of a signal is {@code <skid>/<area>/.../<name>}, and the
 * string NodeId of its variable is that same path joined with {@code /}, in the plant namespace.
 *
 * <pre>
 * Objects/&lt;skid&gt;/Reforming/FeedGasFlow          ref_gas_flow_nm3_h
 *                    /Reforming/SteamFlow            ref_steam_flow_kg_h
 *                    /Reforming/InletTemperature     ref_inlet_temp_c
 *                    /Reforming/Pressure             ref_pressure_kpa
 *                    /Reforming/OutletTemperature    ref_outlet_temp_c
 *                    /Combustion/FuelFlow            fuel_flow_nm3_h
 *                    /Combustion/AirFlow             air_flow_nm3_h
 *                    /Combustion/InletTemperature    comb_inlet_temp_c
 *                    /Combustion/Pressure            comb_pressure_kpa
 *                    /Combustion/OutletTemperature   comb_outlet_temp_c
 *                    /Plate/EndTemperatureReformingInlet   plate_end_temp_ref_inlet_c
 *                    /Plate/EndTemperatureReformingOutlet  plate_end_temp_ref_outlet_c
 *                    /Analyzer/ReformedGas/CH4       ref_outlet_ch4_pct
 *                    /Analyzer/ReformedGas/CO        ref_outlet_co_pct
 *                    /Analyzer/ReformedGas/CO2       ref_outlet_co2_pct
 *                    /Analyzer/ReformedGas/H2        ref_outlet_h2_pct
 *                    /Analyzer/FlueGas/O2            comb_outlet_o2_pct
 * </pre>
 */
public final class PlantAddressLayout {
  /** The skid name used when none is configured (an invented skid). */
  public static final String DEFAULT_SKID = "Skid-R1";

  private static final Map<Signal, List<String>> RELATIVE = new EnumMap<>(Signal.class);

  static {
    put(Signal.REF_GAS_FLOW, "Reforming", "FeedGasFlow");
    put(Signal.REF_STEAM_FLOW, "Reforming", "SteamFlow");
    put(Signal.REF_INLET_TEMP, "Reforming", "InletTemperature");
    put(Signal.REF_PRESSURE, "Reforming", "Pressure");
    put(Signal.REF_OUTLET_TEMP, "Reforming", "OutletTemperature");
    put(Signal.FUEL_FLOW, "Combustion", "FuelFlow");
    put(Signal.AIR_FLOW, "Combustion", "AirFlow");
    put(Signal.COMB_INLET_TEMP, "Combustion", "InletTemperature");
    put(Signal.COMB_PRESSURE, "Combustion", "Pressure");
    put(Signal.COMB_OUTLET_TEMP, "Combustion", "OutletTemperature");
    put(Signal.PLATE_END_TEMP_REF_INLET, "Plate", "EndTemperatureReformingInlet");
    put(Signal.PLATE_END_TEMP_REF_OUTLET, "Plate", "EndTemperatureReformingOutlet");
    put(Signal.REF_OUTLET_CH4, "Analyzer", "ReformedGas", "CH4");
    put(Signal.REF_OUTLET_CO, "Analyzer", "ReformedGas", "CO");
    put(Signal.REF_OUTLET_CO2, "Analyzer", "ReformedGas", "CO2");
    put(Signal.REF_OUTLET_H2, "Analyzer", "ReformedGas", "H2");
    put(Signal.COMB_OUTLET_O2, "Analyzer", "FlueGas", "O2");
    if (RELATIVE.size() != Signal.COUNT) {
      throw new ExceptionInInitializerError("every signal needs a place in the plant layout");
    }
  }

  private final String skid;

  /**
   * @param skid browse name of the skid object below Objects; letters, digits, '-' and '_' only
   */
  public PlantAddressLayout(String skid) {
    if (skid == null || !skid.matches("[A-Za-z0-9_-]+")) {
      throw new IllegalArgumentException(
          "skid name must be letters, digits, '-' or '_': " + skid);
    }
    this.skid = skid;
  }

  private static void put(Signal s, String... path) {
    RELATIVE.put(s, List.of(path));
  }

  public String skid() {
    return skid;
  }

  /** Browse names from the skid object (exclusive) down to the signal's variable (inclusive). */
  public static List<String> relativePath(Signal signal) {
    return RELATIVE.get(signal);
  }

  /** Browse names from below Objects down to the signal's variable, starting with the skid. */
  public List<String> browsePath(Signal signal) {
    var path = new java.util.ArrayList<String>();
    path.add(skid);
    path.addAll(RELATIVE.get(signal));
    return List.copyOf(path);
  }

  /** The string identifier of the signal's NodeId in the plant namespace. */
  public String nodeIdentifier(Signal signal) {
    return String.join("/", browsePath(signal));
  }
}
