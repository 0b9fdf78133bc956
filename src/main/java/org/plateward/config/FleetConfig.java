package org.plateward.config;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.plateward.reactor.UnitSpec;
import org.plateward.signals.Signal;

/**
 * Several units run by one process, each with its own id, unit tables and tag map. A fleet file
 * lists them as an array of tables; each entry names files in the layout the rest of Plateward
 * already reads, relative to the fleet file:
 *
 * <pre>
 * [[units]]
 * id = "tm-pr2"                  # letters, digits, '-' and '_'; names its OPC UA folder and files
 * config = "tm-pr2.toml"         # the unit tables, as in config/plateward.toml
 * opcua = "tm-pr2-opcua.toml"    # its [opcua] section with the tag map; leave out when the
 *                                #   config file carries its own [opcua] section
 * </pre>
 *
 * <p>Checks, each reported as {@code file:line: field: message}: an entry's keys (with a
 * did-you-mean), a duplicate unit id, a unit without a tag map, a referenced file that is
 * missing or invalid (its own errors, in its own file), and two units claiming the same OPC UA
 * node on the same endpoint (reported at the later unit's tag, naming the earlier one). Nodes
 * are compared as written after the namespace URI of the section is applied, so {@code ns=2;}
 * and {@code nsu=...;} forms of one node are not recognised as the same.
 *
 * <p>A file without {@code [[units]]} is the ordinary single-unit file: {@link #load} reads it
 * through {@link PlatewardConfig#load} unchanged and gives one unit, its tag map optional as
 * before, its id the unit name with other characters replaced by '-'.
 *
 * @param file the fleet file as the user named it
 * @param units the units, in file order
 */
public record FleetConfig(Path file, List<FleetUnit> units) {
  /** The keys of one {@code [[units]]} entry. */
  static final List<String> KEYS = List.of("id", "config", "opcua");
  private static final String ID_PATTERN = "[A-Za-z0-9_-]+";

  public FleetConfig {
    units = List.copyOf(units);
  }

  /**
   * One unit of a fleet.
   *
   * @param id the unit id, unique in the fleet
   * @param config everything read from the unit's own file (unit tables, and [history],
   *     [alarms] and so on when it has them)
   * @param opcua its endpoint and tag map; null only for a single-unit file without one
   * @param opcuaFile the file the tag map was read from; null with {@code opcua}
   */
  public record FleetUnit(String id, PlatewardConfig config, OpcuaSettings opcua, Path opcuaFile) {
    /** The unit's specification, SI. */
    public UnitSpec unit() {
      return config.unit();
    }
  }

  /** Whether the file lists several units ({@code [[units]]}) rather than one. */
  public boolean listsUnits() {
    return units.size() != 1 || !units.get(0).config().file().equals(file);
  }

  /** The unit with this id, or null. */
  public FleetUnit unit(String id) {
    for (FleetUnit u : units) {
      if (u.id().equals(id)) {
        return u;
      }
    }
    return null;
  }

  /** The ids, in file order. */
  public List<String> ids() {
    List<String> out = new ArrayList<>();
    for (FleetUnit u : units) {
      out.add(u.id());
    }
    return out;
  }

  /** The id a single-unit file gets: its unit name, characters other than letters, digits, '-', '_' as '-'. */
  public static String idOf(UnitSpec unit) {
    return unit.name().replaceAll("[^A-Za-z0-9_-]", "-");
  }

  /**
   * Reads a fleet file and every file it names, or a single-unit file. Nothing is written.
   *
   * @param file the TOML file
   * @return the units
   * @throws InvalidConfigException with every problem found in any of the files, each as
   *     file, line, field and message
   */
  public static FleetConfig load(Path file) throws InvalidConfigException {
    TomlDocument doc = TomlDocument.read(file);
    if (!doc.root().has("units")) {
      PlatewardConfig single = PlatewardConfig.load(file);
      return new FleetConfig(file, List.of(
          new FleetUnit(idOf(single.unit()), single, single.opcua(), single.opcua() == null ? null : file)));
    }
    ErrorList errors = new ErrorList(file);
    List<ConfigError> nested = new ArrayList<>();
    List<FleetUnit> units = new ArrayList<>();
    JsonNode list = doc.root().get("units");
    int listLine = doc.lineOf("units", 1);
    for (String t : UnitConfigLoader.TABLES) {
      if (doc.root().has(t)) {
        errors.add(doc.lineOf(t, 1), t, "a file lists either one unit (the [" + t + "] tables) or "
            + "several ([[units]] entries naming their own files), not both");
        break;
      }
    }
    if (!list.isArray() || list.isEmpty() || !list.get(0).isObject()) {
      errors.add(listLine, "units", "must be one or more [[units]] tables, each with id, config and "
          + "opcua (the tag map)");
      errors.throwIfAny();
    }
    Path base = file.toAbsolutePath().getParent();
    Map<String, String> idAt = new HashMap<>();
    Map<String, Claim> claims = new LinkedHashMap<>();
    Map<Path, String> tagFiles = new HashMap<>();
    for (int i = 0; i < list.size(); i++) {
      String path = "units[" + i + "]";
      JsonNode n = list.get(i);
      if (!n.isObject()) {
        errors.add(doc.lineOf(path, listLine), path, "must be a [[units]] table");
        continue;
      }
      TableReader t = TableReader.element(doc, errors, path, n);
      String id = required(t, "id", "the unit id, e.g. id = \"tm-pr2\"");
      String config = required(t, "config", "the file with the unit tables, e.g. config = \"tm-pr2.toml\"");
      String opcua = t.has("opcua") ? textOf(t, "opcua") : null;
      t.finish();
      if (id != null) {
        if (!id.matches(ID_PATTERN)) {
          t.error("id", "must be letters, digits, '-' or '_' (it names the unit's OPC UA folder and "
              + "files), got \"" + id + "\"");
          id = null;
        } else if (idAt.containsKey(id)) {
          t.error("id", "duplicate unit id \"" + id + "\": already used by " + idAt.get(id));
          id = null;
        } else {
          idAt.put(id, path + " (line " + t.lineOf("id") + ")");
        }
      }
      PlatewardConfig unitCfg = config == null ? null : nestedConfig(t, "config", base, config, nested);
      OpcuaSettings tags = null;
      Path tagFile = null;
      if (opcua != null) {
        Path p = resolve(t, "opcua", base, opcua);
        if (p != null) {
          try {
            tags = OpcuaSettings.load(p);
            tagFile = p;
            if (tags == null) {
              t.error("opcua", "\"" + opcua + "\" has no [opcua] section, so unit "
                  + (id == null ? path : "\"" + id + "\"") + " has no tag map");
            }
          } catch (InvalidConfigException e) {
            nested.addAll(e.errors());
          }
        }
        if (unitCfg != null && unitCfg.opcua() != null) {
          t.error("opcua", "the unit's config file \"" + config + "\" has its own [opcua] section too; "
              + "keep one tag map per unit");
        }
      } else if (unitCfg != null) {
        tags = unitCfg.opcua();
        tagFile = unitCfg.file();
        if (tags == null) {
          errors.add(t.headerLine(), path + ".opcua", "missing: unit "
              + (id == null ? path : "\"" + id + "\"") + " has no tag map; add opcua = \"<file with "
              + "its [opcua] section and [opcua.tags.*] tables>\" or put that section in \"" + config + "\"");
        }
      }
      if (tags != null && tagFile != null) {
        Path key = tagFile.toAbsolutePath().normalize();
        String earlier = tagFiles.putIfAbsent(key, id == null ? path : "\"" + id + "\"");
        if (earlier != null) {
          t.error(opcua != null ? "opcua" : "config", "reads the same tag map (" + tagFile + ") as unit "
              + earlier + "; each unit needs its own tags and nodes");
        } else {
          checkNodes(id == null ? path : id, tags, tagFile, claims, nested);
        }
      }
      if (id != null && unitCfg != null && tags != null) {
        units.add(new FleetUnit(id, unitCfg, tags, tagFile));
      }
    }
    List<ConfigError> all = new ArrayList<>(nested);
    try {
      errors.throwIfAny();
    } catch (InvalidConfigException e) {
      all.addAll(0, e.errors());
    }
    if (!all.isEmpty()) {
      throw new InvalidConfigException(all);
    }
    return new FleetConfig(file, units);
  }

  /** Who holds an OPC UA node: unit, signal and where its tag is written. */
  private record Claim(String unit, Signal signal, Path file, int line) {}

  private static void checkNodes(String unit, OpcuaSettings tags, Path tagFile,
      Map<String, Claim> claims, List<ConfigError> out) {
    TomlDocument doc;
    try {
      doc = TomlDocument.read(tagFile);
    } catch (InvalidConfigException e) {
      return; // read once already; cannot fail differently now
    }
    for (OpcuaSettings.Tag tag : tags.tags().values()) {
      String field = "opcua.tags." + tag.signal().id() + ".node";
      int line = doc.lineOf(field, doc.lineOf("opcua.tags." + tag.signal().id(), 1));
      String key = tags.endpointUrl() + " " + tag.nodeId();
      Claim mine = new Claim(unit, tag.signal(), tagFile, line);
      Claim earlier = claims.putIfAbsent(key, mine);
      if (earlier != null) {
        out.add(new ConfigError(tagFile, line, field, "node \"" + tag.nodeId() + "\" on "
            + tags.endpointUrl() + " is already claimed by unit \"" + earlier.unit() + "\" ("
            + earlier.file() + ":" + earlier.line() + ", its " + earlier.signal().id()
            + "); each unit reads its own nodes"));
      }
    }
  }

  private static String required(TableReader t, String key, String hint) {
    if (!t.has(key)) {
      t.error(key, "missing; every [[units]] entry needs " + hint);
      return null;
    }
    return textOf(t, key);
  }

  private static String textOf(TableReader t, String key) {
    JsonNode v = t.raw(key);
    if (!v.isTextual() || v.asText().isBlank()) {
      t.error(key, "must be a non-empty text in quotes, got " + t.written(key));
      return null;
    }
    return v.asText().strip();
  }

  private static Path resolve(TableReader t, String key, Path base, String name) {
    Path p = Path.of(name);
    Path r = p.isAbsolute() ? p : base.resolve(p).normalize();
    if (!Files.isRegularFile(r)) {
      t.error(key, "no such file \"" + name + "\" (looked for " + r + ")");
      return null;
    }
    return r;
  }

  private static PlatewardConfig nestedConfig(
      TableReader t, String key, Path base, String name, List<ConfigError> nested) {
    Path p = resolve(t, key, base, name);
    if (p == null) {
      return null;
    }
    try {
      TomlDocument d = TomlDocument.read(p);
      if (d.root().has("units")) {
        t.error(key, "\"" + name + "\" is itself a fleet file; name a file with the unit tables");
        return null;
      }
      return PlatewardConfig.load(p);
    } catch (InvalidConfigException e) {
      nested.addAll(e.errors());
      return null;
    }
  }
}
