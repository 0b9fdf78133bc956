package org.plateward.config;

import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.plateward.reactor.BufferMaterial;
import org.plateward.reactor.CatalystSpec;
import org.plateward.reactor.FeedGas;
import org.plateward.reactor.Geometry;
import org.plateward.reactor.GridSpec;
import org.plateward.reactor.HeatLossSpec;
import org.plateward.reactor.OperatingPoint;
import org.plateward.reactor.PlateMaterial;
import org.plateward.reactor.UnitSpec;
import org.plateward.reactor.Zone;

/**
 * Reads the reactor unit — the tables {@code [unit]}, {@code [geometry]}, {@code [plate]},
 * {@code [buffer]}, {@code [catalyst]}, {@code [heat_loss]}, {@code [feed_gas]},
 * {@code [operating_point]} and {@code [model]} — into a {@link UnitSpec} in SI, and checks it.
 * See README.md for the table layout.
 */
public final class UnitConfigLoader {
  /** The tables this loader owns. */
  static final List<String> TABLES =
      List.of("unit", "geometry", "plate", "buffer", "catalyst", "heat_loss", "feed_gas",
          "operating_point", "model");

  /** Tolerance on the sum of the feed mole fractions. */
  static final double FEED_SUM_TOLERANCE = 1e-6;

  /** Upper limit of the mushy band, K: wider bands smear the melting front too much. */
  static final double MAX_MUSHY_BAND_K = 10.0;

  private UnitConfigLoader() {}

  /**
   * Loads and checks the unit described in a configuration file. Nothing is written.
   *
   * @param file the TOML file
   * @return the unit, SI throughout
   * @throws InvalidConfigException with every problem found, each with file, line and field
   */
  public static UnitSpec load(Path file) throws InvalidConfigException {
    return PlatewardConfig.load(file).unit();
  }

  /** Reads the unit tables of a parsed document; problems go to {@code errors}. */
  static UnitSpec read(TomlDocument doc, ErrorList errors) {
    if (doc.root().has("units")) {
      // a fleet file (FleetConfig): say so once instead of one "missing table" per unit table
      errors.add(doc.lineOf("units", 1), "units", "this file lists several units ([[units]]); "
          + "give a command that runs one unit the file with that unit's tables (its config = ...)");
      return null;
    }
    TableReader u = TableReader.open(doc, errors, "unit", List.of("name", "site"));
    String name = u.text("name");
    String site = u.text("site");
    u.finish();

    TableReader g = TableReader.open(doc, errors, "geometry",
        List.of("length", "width", "reforming_gap", "combustion_gap", "plate_thickness",
            "buffer_thickness", "channel_pairs", "reforming_coating", "combustion_coating"));
    double lengthM = g.quantity("length", Dimension.LENGTH, Bound.POSITIVE);
    double widthM = g.quantity("width", Dimension.LENGTH, Bound.POSITIVE);
    double refGapM = g.quantity("reforming_gap", Dimension.LENGTH, Bound.POSITIVE);
    double combGapM = g.quantity("combustion_gap", Dimension.LENGTH, Bound.POSITIVE);
    double plateM = g.quantity("plate_thickness", Dimension.LENGTH, Bound.POSITIVE);
    double bufferM = g.quantity("buffer_thickness", Dimension.LENGTH, Bound.POSITIVE);
    Integer pairs = g.count("channel_pairs", 1);
    List<Zone> refZones = zones(g, "reforming_coating", lengthM);
    List<Zone> combZones = zones(g, "combustion_coating", lengthM);
    g.finish();

    TableReader p = TableReader.open(doc, errors, "plate",
        List.of("material", "density", "heat_capacity", "conductivity", "material_limit"));
    String plateName = p.text("material");
    double plateRho = p.quantity("density", Dimension.DENSITY, Bound.POSITIVE);
    double plateCp = p.quantity("heat_capacity", Dimension.SPECIFIC_HEAT, Bound.POSITIVE);
    double plateK = p.quantity("conductivity", Dimension.CONDUCTIVITY, Bound.POSITIVE);
    double limitK = p.quantity("material_limit", Dimension.TEMPERATURE, Bound.POSITIVE);
    p.finish();

    TableReader b = TableReader.open(doc, errors, "buffer",
        List.of("material", "density", "heat_capacity", "conductivity_solid",
            "conductivity_liquid", "melting_point", "latent_heat", "mushy_band"));
    String bufferName = b.text("material");
    double bufRho = b.quantity("density", Dimension.DENSITY, Bound.POSITIVE);
    double bufCp = b.quantity("heat_capacity", Dimension.SPECIFIC_HEAT, Bound.POSITIVE);
    double kSolid = b.quantity("conductivity_solid", Dimension.CONDUCTIVITY, Bound.POSITIVE);
    double kLiquid = b.quantity("conductivity_liquid", Dimension.CONDUCTIVITY, Bound.POSITIVE);
    double meltK = b.quantity("melting_point", Dimension.TEMPERATURE, Bound.POSITIVE);
    double latent = b.quantity("latent_heat", Dimension.LATENT_HEAT, Bound.POSITIVE);
    double mushyK = b.quantity("mushy_band", Dimension.TEMPERATURE_DIFFERENCE, Bound.ANY);
    if (!Double.isNaN(mushyK) && !(mushyK > 0.0 && mushyK <= MAX_MUSHY_BAND_K)) {
      b.error("mushy_band", "must be more than 0 K and at most " + fmt(MAX_MUSHY_BAND_K)
          + " K, got " + b.written("mushy_band"));
    }
    b.finish();

    TableReader c = TableReader.open(doc, errors, "catalyst",
        List.of("reforming_loading", "reforming_activity", "combustion_activity"));
    double loading = c.quantity("reforming_loading", Dimension.AREAL_MASS, Bound.POSITIVE);
    double refAct = c.number("reforming_activity", Bound.POSITIVE);
    double combAct = c.number("combustion_activity", Bound.POSITIVE);
    c.finish();

    TableReader h = TableReader.open(doc, errors, "heat_loss", List.of("coefficient", "ambient"));
    double lossCoeff =
        h.quantity("coefficient", Dimension.HEAT_TRANSFER_COEFFICIENT, Bound.NON_NEGATIVE);
    double ambientK = h.quantity("ambient", Dimension.TEMPERATURE, Bound.POSITIVE);
    h.finish();

    TableReader f = TableReader.open(doc, errors, "feed_gas",
        List.of("methane", "hydrogen", "carbon_dioxide", "nitrogen"));
    double xCh4 = f.fraction("methane");
    double xH2 = f.fraction("hydrogen");
    double xCo2 = f.fraction("carbon_dioxide");
    double xN2 = f.fraction("nitrogen");
    double sum = xCh4 + xH2 + xCo2 + xN2;
    if (!Double.isNaN(sum) && Math.abs(sum - 1.0) > FEED_SUM_TOLERANCE) {
      errors.add(f.headerLine(), "feed_gas", "dry mole fractions must sum to 1 (within 1e-6), got "
          + fmt(sum) + " (methane + hydrogen + carbon_dioxide + nitrogen)");
    }
    f.finish();

    TableReader o = TableReader.open(doc, errors, "operating_point",
        List.of("reforming_gas_flow", "steam_flow", "reforming_inlet_temp", "reforming_pressure",
            "fuel_flow", "air_flow", "combustion_inlet_temp", "combustion_pressure"));
    double refFlow = o.quantity("reforming_gas_flow", Dimension.GAS_FLOW, Bound.POSITIVE);
    double steam = o.quantity("steam_flow", Dimension.STEAM_FLOW, Bound.POSITIVE);
    double refInK = o.quantity("reforming_inlet_temp", Dimension.TEMPERATURE, Bound.POSITIVE);
    double refPa = o.quantity("reforming_pressure", Dimension.PRESSURE, Bound.POSITIVE);
    double fuel = o.quantity("fuel_flow", Dimension.GAS_FLOW, Bound.POSITIVE);
    double air = o.quantity("air_flow", Dimension.GAS_FLOW, Bound.POSITIVE);
    double combInK = o.quantity("combustion_inlet_temp", Dimension.TEMPERATURE, Bound.POSITIVE);
    double combPa = o.quantity("combustion_pressure", Dimension.PRESSURE, Bound.POSITIVE);
    o.finish();

    // the buffer must be solid at both inlets and melt before the plate reaches its limit
    if (!Double.isNaN(meltK)) {
      checkMeltAbove(b, meltK, o, "reforming_inlet_temp", refInK);
      checkMeltAbove(b, meltK, o, "combustion_inlet_temp", combInK);
      if (!Double.isNaN(limitK) && meltK >= limitK) {
        b.error("melting_point", "must be below the plate material limit plate.material_limit = "
            + p.written("material_limit") + " (else the plate fails before the buffer melts), got "
            + b.written("melting_point"));
      }
    }

    TableReader m = TableReader.open(doc, errors, "model",
        List.of("cells", "grid_refinement", "refinement_width"));
    Integer cells = m.count("cells", 3);
    double refinement = m.number("grid_refinement", Bound.POSITIVE);
    if (!Double.isNaN(refinement) && refinement < 1.0) {
      m.error("grid_refinement", "must be at least 1 (1 gives a uniform grid), got "
          + m.written("grid_refinement"));
    }
    double refWidthM = m.quantity("refinement_width", Dimension.LENGTH, Bound.POSITIVE);
    m.finish();

    if (!errors.isEmpty()) {
      return null;
    }
    return new UnitSpec(
        name,
        site,
        new Geometry(lengthM, widthM, refGapM, combGapM, plateM, bufferM, pairs, refZones, combZones),
        new PlateMaterial(plateName, plateRho, plateCp, plateK, limitK),
        new BufferMaterial(bufferName, bufRho, bufCp, kSolid, kLiquid, meltK, latent, mushyK),
        new CatalystSpec(loading, refAct, combAct),
        new HeatLossSpec(lossCoeff, ambientK),
        new FeedGas(xCh4, xH2, xCo2, xN2),
        new OperatingPoint(refFlow, steam, refInK, refPa, fuel, air, combInK, combPa),
        new GridSpec(cells, refinement, refWidthM));
  }

  private static void checkMeltAbove(
      TableReader buffer, double meltK, TableReader op, String inletKey, double inletK) {
    if (!Double.isNaN(inletK) && meltK <= inletK) {
      buffer.error("melting_point", "must be above operating_point." + inletKey + " = "
          + op.written(inletKey) + " (the buffer would melt at the inlet), got "
          + buffer.written("melting_point"));
    }
  }

  /** Reads coated zones and checks each lies inside [0, length] with start before end. */
  private static List<Zone> zones(TableReader g, String key, double lengthM) {
    List<TableReader.ZoneEntry> entries = g.zones(key);
    if (entries == null) {
      return null;
    }
    List<Zone> out = new ArrayList<>();
    List<TableReader.ZoneEntry> ok = new ArrayList<>();
    for (TableReader.ZoneEntry z : entries) {
      if (Double.isNaN(z.startM()) || Double.isNaN(z.endM())) {
        continue;
      }
      String span = "{start = \"" + z.startText() + "\", end = \"" + z.endText() + "\"}";
      if (z.startM() >= z.endM()) {
        g.errorAt(z, "start must be before end, got " + span);
      } else if (!Double.isNaN(lengthM) && z.endM() > lengthM) {
        g.errorAt(z, "must lie within the plate, 0 to geometry.length = " + g.written("length")
            + ", got " + span);
      } else {
        for (TableReader.ZoneEntry other : ok) {
          if (z.startM() < other.endM() && other.startM() < z.endM()) {
            g.errorAt(z, "overlaps " + other.field() + ", got " + span);
          }
        }
        ok.add(z);
        out.add(new Zone(z.startM(), z.endM()));
      }
    }
    return out;
  }

  private static String fmt(double v) {
    return new BigDecimal(v).round(new MathContext(9)).stripTrailingZeros().toPlainString();
  }
}
