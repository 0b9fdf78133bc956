package org.plateward.config;

import org.plateward.advisor.TrimSettings;
import org.plateward.alarms.AlarmKind;
import org.plateward.alarms.AlarmSettings;

import java.nio.file.Path;
import org.plateward.history.HistorySettings;
import org.plateward.reactor.UnitSpec;

/**
 * Everything read from one Plateward configuration file.
 *
 * <p>Each group of tables has its own reader; {@link #load} runs them all over the same parsed
 * document and collects their problems together. To add a section (for example
 * {@code [opcua]}): write a reader in the style of {@link UnitConfigLoader#read}, give this
 * record a component for its result and call the reader in {@link #load}. Top-level tables
 * that no reader owns yet are ignored, so a file may already carry sections that later
 * versions read; unknown keys inside an owned table are errors.
 *
 * @param file the file as the user named it
 * @param unit the reactor unit, SI
 * @param history how history is kept (the optional {@code [history]} table)
 * @param opcua how to reach the plant's OPC UA server and its tag map (the optional {@code
 *     [opcua]} section); null when the file has none
 * @param alarms the advisory alarm definitions (the optional {@code [alarms]} section); null
 *     when the file has none
 * @param advisor the fuel-trim advisor settings (the optional {@code [advisor]} section; its
 *     defaults, with the peak_high limit, when the file has none); null when the file has
 *     neither {@code [advisor]} nor {@code [alarms]}
 */
public record PlatewardConfig(
    Path file, UnitSpec unit, HistorySettings history, OpcuaSettings opcua, AlarmSettings alarms,
    TrimSettings advisor) {
  /** The file every command reads unless told otherwise. */
  public static final Path DEFAULT_FILE = Path.of("config", "plateward.toml");

  /**
   * Reads and checks a configuration file. Nothing is written.
   *
   * @param file the TOML file
   * @return the configuration
   * @throws InvalidConfigException with every problem found, each as file, line, field and
   *     message
   */
  public static PlatewardConfig load(Path file) throws InvalidConfigException {
    TomlDocument doc = TomlDocument.read(file);
    ErrorList errors = new ErrorList(file);
    UnitSpec unit = UnitConfigLoader.read(doc, errors);
    HistorySettings history = HistoryConfigReader.read(doc, errors);
    OpcuaSettings opcua = OpcuaSettings.read(doc, errors);
    AlarmSettings alarms = AlarmConfigReader.read(doc, errors);
    double peakHighK = alarms == null || alarms.definitions().get(AlarmKind.PEAK_HIGH) == null ? Double.NaN
        : alarms.definition(AlarmKind.PEAK_HIGH).limit();
    TrimSettings advisor = AdvisorConfigReader.read(doc, errors, peakHighK);
    errors.throwIfAny();
    if (advisor == null && !Double.isNaN(peakHighK)) {
      advisor = TrimSettings.defaults(peakHighK);
    }
    return new PlatewardConfig(file, unit, history, opcua, alarms, advisor);
  }
}
