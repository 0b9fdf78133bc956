package org.plateward.live;

import java.util.List;
import org.plateward.advisor.TrimSuggestion;
import org.plateward.alarms.AlarmStatus;
import java.nio.file.Path;
import java.time.Instant;
import org.plateward.history.HistoryHealth;
import org.plateward.opcua.ConnectionState;
import org.plateward.softsensor.Estimate;

/**
 * One look at the live monitor, for the console view (and later the window).
 *
 * @param unitName the reactor unit
 * @param endpointUrl the plant's OPC UA endpoint
 * @param link the connection state
 * @param linkReason why the link is in that state, plain words (may be empty)
 * @param dataAgeS wall seconds since the last frame that carried any new sample (NaN: none yet)
 * @param latest the latest estimate (null before the first)
 * @param frames frames estimated so far
 * @param blocks filter steps so far
 * @param droppedFrames frames not estimated because the estimator fell behind
 * @param history history health (null when history is not kept at all)
 * @param historyFile the history database
 * @param clock how plant time relates to the wall clock
 * @param wallNow when this look was taken
 * @param alarms the advisory alarms, most urgent first (empty when none are judged)
 * @param advice the last fuel-trim suggestion (null when none yet)
 */
public record MonitorStatus(
    String unitName,
    String endpointUrl,
    ConnectionState link,
    String linkReason,
    double dataAgeS,
    Estimate latest,
    long frames,
    long blocks,
    long droppedFrames,
    HistoryHealth history,
    Path historyFile,
    TimeScale clock,
    Instant wallNow,
    List<AlarmStatus> alarms,
    TrimSuggestion advice) {
  public MonitorStatus {
    alarms = alarms == null ? List.of() : List.copyOf(alarms);
  }
}
