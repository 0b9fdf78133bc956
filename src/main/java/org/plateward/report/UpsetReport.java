package org.plateward.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.plateward.alarms.AlarmAudit;
import org.plateward.alarms.AlarmBoard;
import org.plateward.alarms.AlarmEvent;
import org.plateward.alarms.AlarmInputs;
import org.plateward.alarms.BadOrStale;
import org.plateward.alarms.AlarmSettings;
import org.plateward.alarms.HistoryAlarmAudit;
import org.plateward.alarms.OperatorAction;
import org.plateward.history.AlarmEventRow;
import org.plateward.history.EstimateRow;
import org.plateward.reactor.Grid;
import org.plateward.reactor.UnitSpec;
import org.plateward.signals.Frame;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.EstimationLoop;
import org.plateward.softsensor.FrameSource;
import org.plateward.softsensor.ReactorSoftSensor;

/**
 * Builds an upset report: gathers an {@link UpsetRecord} from an estimator run over frames (with
 * the configured advisory alarms evaluated over it) or from stored estimates and alarm events,
 * then writes the plots, the CSV files and summary.txt into a folder.
 */
public final class UpsetReport {
  private final UnitSpec unit;
  private final AlarmSettings alarms;
  private final UpsetRecord record = new UpsetRecord();
  private final List<String> notes = new ArrayList<>();

  /** @param alarms the configured alarm definitions (null: none configured) */
  public UpsetReport(UnitSpec unit, AlarmSettings alarms) {
    this.unit = unit;
    this.alarms = alarms;
  }

  public UpsetRecord record() {
    return record;
  }

  /** Adds a note for summary.txt. */
  public void note(String n) {
    notes.add(n);
  }

  /**
   * Runs the soft sensor over every frame of {@code source}; the configured alarms are evaluated
   * on each estimate (their events become the report's alarm events). A Bad signal counts as
   * Bad; a recording carries no staleness, connection or history health, so those alarms stay
   * normal.
   */
  public EstimationLoop.Stats runEstimator(FrameSource source, ReactorSoftSensor sensor) throws IOException {
    AlarmBoard board = alarms == null ? null : new AlarmBoard(alarms, new AlarmAudit() {
      @Override
      public void event(AlarmEvent e) {
        record.addAlarm(HistoryAlarmAudit.row(e));
      }

      @Override
      public void action(OperatorAction a) {}
    });
    if (board == null) {
      note("no [alarms] in the configuration: no alarms were evaluated");
    } else {
      note("alarms were evaluated over the period with the configured definitions (advisory)");
    }
    return EstimationLoop.run(source, sensor, (Frame f, Estimate e, java.util.Map<String, Double> truth) -> {
      record.add(ReportPoint.of(e));
      if (board != null) {
        // the live rule for a recorded frame (BadOrStale): history has no link to lose
        board.evaluate(new AlarmInputs(e.time(), e.peakPlateTempK(), e.peakPlateTempSdK(), e.maxCellMeltFraction(),
            e.timeToExhaustS(), e.status().text(), BadOrStale.recorded(f), false, false));
      }
    }, null);
  }

  /** Takes stored estimates and the stored alarm events of the same period. */
  public void addStored(List<EstimateRow> estimates, List<AlarmEventRow> events) {
    for (EstimateRow r : estimates) {
      record.add(ReportPoint.of(r));
    }
    for (AlarmEventRow e : events) {
      record.addAlarm(e);
    }
    note("estimates and alarm events as stored in history (the profile σ is not stored, so the snapshots show none)");
  }

  /**
   * Writes the report into {@code dir} (which must exist).
   *
   * @param title the report's title
   * @param sourceLines where the data came from, for summary.txt
   */
  public List<KeyFigure> write(Path dir, String title, List<String> sourceLines) throws IOException {
    Grid g = Grid.forUnit(unit.geometry(), unit.grid());
    double[] centres = new double[g.cells()];
    for (int j = 0; j < centres.length; j++) {
      centres[j] = g.centreM(j);
    }
    for (UpsetRecord.Snapshot s : record.snapshots()) {
      if (s.point().cellTempK().length != centres.length) {
        // a stored profile of another grid: spread its cells uniformly over the plate
        int n = s.point().cellTempK().length;
        centres = new double[n];
        for (int j = 0; j < n; j++) {
          centres[j] = (j + 0.5) * unit.geometry().lengthM() / n;
        }
        note("stored profiles have " + n + " cells, not the configured grid's " + g.cells() + "; drawn on a uniform grid");
        break;
      }
    }
    ReportPlots.write(dir, record, unit, centres, alarms);
    List<KeyFigure> figures = KeyFigures.of(record);
    ReportFiles.writeAlarms(dir.resolve(ReportFiles.ALARMS), record.alarms());
    ReportFiles.writeFigures(dir.resolve(ReportFiles.FIGURES), figures);
    ReportFiles.writeSummary(dir.resolve(ReportFiles.SUMMARY), title, sourceLines, figures, notes);
    return figures;
  }
}
