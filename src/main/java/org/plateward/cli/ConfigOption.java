package org.plateward.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.plateward.config.ConfigError;
import org.plateward.config.InvalidConfigException;
import org.plateward.config.PlatewardConfig;
import picocli.CommandLine.Option;

/** The {@code -c/--config} option every command takes (a picocli mixin). */
public final class ConfigOption {
  @Option(
      names = {"-c", "--config"},
      paramLabel = "FILE",
      defaultValue = "config/plateward.toml",
      description = "Configuration file (default: ${DEFAULT-VALUE}).")
  Path file;

  /** The configuration file named on the command line or the default. */
  public Path file() {
    return file;
  }

  /**
   * Loads and checks the configuration.
   *
   * @throws InvalidConfigException with every problem; the command line reports them and
   *     exits with code 2
   */
  public PlatewardConfig load() throws InvalidConfigException {
    if (file.equals(PlatewardConfig.DEFAULT_FILE) && !Files.exists(file)) {
      throw new InvalidConfigException(List.of(new ConfigError(file, 0, null,
          "no such file (the default: run from the folder that holds config/, or give -c FILE)")));
    }
    return PlatewardConfig.load(file);
  }

  /**
   * Loads the configuration as a fleet: a file with {@code [[units]]} and every file it names,
   * or an ordinary single-unit file as a fleet of one.
   *
   * @throws InvalidConfigException with every problem, in whichever file it is
   */
  public org.plateward.config.FleetConfig loadFleet() throws InvalidConfigException {
    if (file.equals(PlatewardConfig.DEFAULT_FILE) && !Files.exists(file)) {
      throw new InvalidConfigException(List.of(new ConfigError(file, 0, null,
          "no such file (the default: run from the folder that holds config/, or give -c FILE)")));
    }
    return org.plateward.config.FleetConfig.load(file);
  }
}
