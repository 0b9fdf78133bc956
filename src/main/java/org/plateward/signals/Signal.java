package org.plateward.signals;

/**
 * The canonical boundary signals of one plate reformer unit. The id is the column name in
 * replay files and the key of the tag map; the unit in the id is the edge unit.
 */
public enum Signal {
  REF_GAS_FLOW("ref_gas_flow_nm3_h", "reforming feed gas flow (dry)", EdgeUnit.NM3_PER_H, Kind.INPUT),
  REF_STEAM_FLOW("ref_steam_flow_kg_h", "reforming steam flow", EdgeUnit.KG_PER_H_STEAM, Kind.INPUT),
  REF_INLET_TEMP("ref_inlet_temp_c", "reforming mixture inlet temperature", EdgeUnit.DEG_C, Kind.INPUT),
  REF_PRESSURE("ref_pressure_kpa", "reforming channel pressure (absolute)", EdgeUnit.KPA_ABS, Kind.INPUT),
  FUEL_FLOW("fuel_flow_nm3_h", "combustion fuel (methane) flow", EdgeUnit.NM3_PER_H, Kind.INPUT),
  AIR_FLOW("air_flow_nm3_h", "combustion air flow", EdgeUnit.NM3_PER_H, Kind.INPUT),
  COMB_INLET_TEMP("comb_inlet_temp_c", "combustion mixture inlet temperature", EdgeUnit.DEG_C, Kind.INPUT),
  COMB_PRESSURE("comb_pressure_kpa", "combustion channel pressure (absolute)", EdgeUnit.KPA_ABS, Kind.INPUT),
  REF_OUTLET_TEMP("ref_outlet_temp_c", "reformed gas outlet temperature", EdgeUnit.DEG_C, Kind.OUTPUT),
  COMB_OUTLET_TEMP("comb_outlet_temp_c", "flue gas outlet temperature", EdgeUnit.DEG_C, Kind.OUTPUT),
  REF_OUTLET_CH4("ref_outlet_ch4_pct", "reformed gas methane, dry basis", EdgeUnit.MOL_PCT_DRY, Kind.ANALYZER),
  REF_OUTLET_CO("ref_outlet_co_pct", "reformed gas carbon monoxide, dry basis", EdgeUnit.MOL_PCT_DRY, Kind.ANALYZER),
  REF_OUTLET_CO2("ref_outlet_co2_pct", "reformed gas carbon dioxide, dry basis", EdgeUnit.MOL_PCT_DRY, Kind.ANALYZER),
  REF_OUTLET_H2("ref_outlet_h2_pct", "reformed gas hydrogen, dry basis", EdgeUnit.MOL_PCT_DRY, Kind.ANALYZER),
  COMB_OUTLET_O2("comb_outlet_o2_pct", "flue gas oxygen, dry basis", EdgeUnit.MOL_PCT_DRY, Kind.ANALYZER),
  PLATE_END_TEMP_REF_INLET(
      "plate_end_temp_ref_inlet_c", "plate thermocouple at the reforming inlet end (z = 0)", EdgeUnit.DEG_C, Kind.OUTPUT),
  PLATE_END_TEMP_REF_OUTLET(
      "plate_end_temp_ref_outlet_c", "plate thermocouple at the reforming outlet end (z = L)", EdgeUnit.DEG_C, Kind.OUTPUT);

  /** What a signal is to the estimator. */
  public enum Kind {
    /** A model input u (flows, inlet conditions). */
    INPUT,
    /** A fast measured output y. */
    OUTPUT,
    /** A measured output from the sampling composition analyzer (period and dead time). */
    ANALYZER
  }

  public static final int COUNT = values().length;

  private final String id;
  private final String meaning;
  private final EdgeUnit unit;
  private final Kind kind;

  Signal(String id, String meaning, EdgeUnit unit, Kind kind) {
    this.id = id;
    this.meaning = meaning;
    this.unit = unit;
    this.kind = kind;
  }

  public String id() {
    return id;
  }

  public String meaning() {
    return meaning;
  }

  public EdgeUnit unit() {
    return unit;
  }

  public Kind kind() {
    return kind;
  }

  /** The signal with this id, or null. */
  public static Signal byId(String id) {
    for (Signal s : values()) {
      if (s.id.equals(id)) {
        return s;
      }
    }
    return null;
  }
}
