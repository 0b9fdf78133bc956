package org.plateward.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.Advisory;
import org.plateward.alarms.AlarmBoard;
import org.plateward.alarms.AlarmInputs;
import org.plateward.alarms.HistoryAlarmAudit;
import org.plateward.cli.PlatewardCommand;
import org.plateward.config.PlatewardConfig;
import org.plateward.estimation.FilterSettings;
import org.plateward.history.AlarmEventRow;
import org.plateward.history.EstimateRow;
import org.plateward.history.HistoryReader;
import org.plateward.history.HistoryRecorder;
import org.plateward.history.HistorySettings;
import org.plateward.plot.PixelStats;
import org.plateward.replay.ReplayColumns;
import org.plateward.replay.ReplayReader;
import org.plateward.replay.ReplayRecord;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.SoftSensorSettings;

/** {@code plateward report} end to end on recordings of the simulated plant (invented data). */
class ReportCommandTest {
  @TempDir Path dir;

  record Run(int exit, String out, String err) {}

  static Run run(String... args) {
    java.io.StringWriter out = new java.io.StringWriter();
    java.io.StringWriter err = new java.io.StringWriter();
    var cl = PlatewardCommand.newCommandLine();
    cl.setOut(new java.io.PrintWriter(out));
    cl.setErr(new java.io.PrintWriter(err));
    int code = cl.execute(args);
    return new Run(code, out.toString(), err.toString());
  }

  static void assertImages(Path out) throws Exception {
    for (String name : ReportPlots.FILES) {
      BufferedImage img = PixelStats.read(out.resolve(name));
      assertThat(img.getWidth()).as(name).isEqualTo(ReportPlots.WIDTH);
      assertThat(img.getHeight()).as(name).isEqualTo(ReportPlots.HEIGHT);
      // not blank: a plain fill has variance 0; axes, text and data lift it well above 100
      assertThat(PixelStats.greyVariance(img)).as(name).isGreaterThan(100.0);
      assertThat(PixelStats.colours(img, 50)).as(name).isGreaterThanOrEqualTo(10);
    }
  }

  static Map<String, String> figures(Path out) throws Exception {
    Map<String, String> m = new TreeMap<>();
    for (List<String> row : CsvRows.read(out.resolve(ReportFiles.FIGURES))) {
      m.put(row.get(0), row.get(1));
    }
    return m;
  }

  @Test
  void reportOfTheTwoHourFuelSurgeRecording() throws Exception {
    Path in = Path.of("replay-data", "fuel-surge.csv");
    Path out = dir.resolve("report");
    long t0 = System.nanoTime();
    Run r = run("report", "--input", in.toString(), "--out", out.toString());
    System.out.printf("report of the 2 h recording: %.1f s wall%n", (System.nanoTime() - t0) / 1e9);
    assertThat(r.exit()).as(r.err()).isZero();
    assertThat(r.out()).contains("ADVISORY ONLY").contains("report written to");
    assertImages(out);
    String summary = Files.readString(out.resolve(ReportFiles.SUMMARY));
    assertThat(summary).contains(Advisory.FULL).contains("Key figures").contains("highest hidden peak");

    // first melt-through against the recording's own truth column (the simulated plant's
    // 200-cell truth): within 2 min
    Instant truthFirst = null;
    try (ReplayReader rr = ReplayReader.open(in)) {
      while (rr.hasNext() && truthFirst == null) {
        ReplayRecord rec = rr.next();
        if (rec.truth(ReplayColumns.TRUTH_MAX_CELL_MELT_FRACTION) >= UpsetRecord.MELT_THROUGH) {
          truthFirst = rec.frame().time();
        }
      }
    }
    Map<String, String> fig = figures(out);
    Instant est = Instant.parse(fig.get("first_melt_through"));
    assertThat(Duration.between(truthFirst, est).abs()).isLessThan(Duration.ofMinutes(2));
    // the alarm CSV has one row per transition, with the header of the stated columns
    List<List<String>> rows = CsvRows.read(out.resolve(ReportFiles.ALARMS));
    assertThat(rows.get(0)).isEqualTo(ReportFiles.ALARM_COLUMNS);
    assertThat(rows).hasSize(1 + Integer.parseInt(fig.get("alarm_events")));
    assertThat(rows.stream().skip(1).map(x -> x.get(1))).contains("peak_high", "melt_high", "exhaust_low");

    // an existing folder that is not empty is refused, and left as it was
    byte[] before = Files.readAllBytes(out.resolve(ReportFiles.SUMMARY));
    Run again = run("report", "--input", in.toString(), "--out", out.toString());
    assertThat(again.exit()).isEqualTo(PlatewardCommand.EXIT_BAD_INPUT);
    assertThat(again.err()).contains(out.toString()).contains("not empty").contains("--force");
    assertThat(Files.readAllBytes(out.resolve(ReportFiles.SUMMARY))).isEqualTo(before);
  }

  /** The history row of an estimate, as the live monitor stores it. */
  static EstimateRow row(Estimate e) {
    Map<String, Double> p = new TreeMap<>();
    p.put("reforming_activity", e.reformingActivity());
    p.put("combustion_activity", e.combustionActivity());
    double[] temps = e.cellPlateTempK();
    if (temps.length == 0) {
      temps = new double[e.cellMeltFraction().length];
      java.util.Arrays.fill(temps, Double.NaN);
    }
    return new EstimateRow(e.time(), e.peakPlateTempK(), e.peakPlateTempSdK(), e.peakPositionM(),
        e.bufferMeltFraction(), e.bufferMeltFractionSd(), e.maxCellMeltFraction(), e.timeToExhaustS(),
        e.timeToExhaustSdS(), e.nis(), e.status().text(), e.reason().isEmpty() ? null : e.reason(), p, temps,
        e.cellMeltFraction());
  }

  @Test
  void reportOfAHistoryPeriodListsExactlyTheStoredAlarmEvents() throws Exception {
    PlatewardConfig cfg = PlatewardConfig.load(Path.of("config", "plateward.toml"));
    Path db = dir.resolve("history.db");
    Instant first = null;
    Instant last = null;
    // the live path's pieces: recorder, soft sensor, alarm board auditing to history
    try (HistoryRecorder rec = HistoryRecorder.start(HistorySettings.at(db))) {
      ReactorSoftSensor sensor = new ReactorSoftSensor(cfg.unit(), SoftSensorSettings.defaults(), FilterSettings.defaults());
      AlarmBoard board = new AlarmBoard(cfg.alarms(), new HistoryAlarmAudit(rec));
      try (ReplayReader rr = ReplayReader.open(Path.of("replay-data", "fuel-surge.csv"))) {
        for (int k = 0; k < 2400 && rr.hasNext(); k++) {
          var f = rr.next().frame();
          first = first == null ? f.time() : first;
          last = f.time();
          rec.appendFrame(f);
          Estimate e = sensor.accept(f);
          rec.appendEstimate(row(e));
          Set<String> bad = new TreeSet<>();
          for (Signal s : Signal.values()) {
            if (f.quality(s) == Quality.BAD) {
              bad.add(s.id());
            }
          }
          board.evaluate(new AlarmInputs(e.time(), e.peakPlateTempK(), e.peakPlateTempSdK(), e.maxCellMeltFraction(),
              e.timeToExhaustS(), e.status().text(), bad, false, false));
        }
      }
      assertThat(rec.flush(Duration.ofSeconds(60))).isTrue();
    }
    Instant to = last.plusSeconds(1);
    Path out = dir.resolve("db-report");
    Files.createDirectories(out); // an empty folder is accepted
    Run r = run("report", "--db", db.toString(), "--from", first.toString(), "--to", to.toString(), "--out", out.toString());
    assertThat(r.exit()).as(r.err()).isZero();
    assertImages(out);

    List<AlarmEventRow> stored;
    try (HistoryReader hr = HistoryReader.open(db)) {
      stored = hr.alarmEvents(first, to);
    }
    assertThat(stored).isNotEmpty();
    List<List<String>> rows = CsvRows.read(out.resolve(ReportFiles.ALARMS));
    assertThat(rows.get(0)).isEqualTo(ReportFiles.ALARM_COLUMNS);
    assertThat(rows).hasSize(stored.size() + 1);
    for (int i = 0; i < stored.size(); i++) {
      AlarmEventRow a = stored.get(i);
      List<String> c = rows.get(i + 1);
      AlarmEventRow b = new AlarmEventRow(Instant.parse(c.get(0)), c.get(1), c.get(2), c.get(3),
          c.get(4).isEmpty() ? Double.NaN : Double.parseDouble(c.get(4)),
          c.get(5).isEmpty() ? Double.NaN : Double.parseDouble(c.get(5)), c.get(6));
      assertThat(b).isEqualTo(a);
    }
    assertThat(Files.readString(out.resolve(ReportFiles.SUMMARY))).contains("stored in history");
  }
}
