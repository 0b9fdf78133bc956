package org.plateward.history;

import java.time.Instant;
import java.util.Objects;

/**
 * One start of the monitor, as history keeps it.
 *
 * @param runId unique id of the run (for example a UUID)
 * @param started when the run started
 * @param source live, replay or demo
 * @param configFile the configuration file the run read (may be null)
 * @param unitName the reactor unit's name from the config (may be null)
 * @param modelVersion version of the model and estimator (may be null)
 */
public record RunRow(
    String runId, Instant started, SourceKind source, String configFile, String unitName,
    String modelVersion) {
  public RunRow {
    Objects.requireNonNull(runId, "runId");
    Objects.requireNonNull(started, "started");
    Objects.requireNonNull(source, "source");
  }
}
