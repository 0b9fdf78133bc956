package org.plateward.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.replay.EstimateWriter;

/**
 * {@code plateward replay} end to end on cuts of a committed recording: the estimates file has
 * one row per frame and the issue's columns, and bad input exits 2 with file:line: column.
 */
class ReplayCommandTest {
  @TempDir Path dir;

  /** The header and the first {@code rows} data rows of a recording. */
  private Path cut(String name, int rows, java.util.function.UnaryOperator<List<String>> edit) throws Exception {
    List<String> lines = Files.readAllLines(Path.of("replay-data", name + ".csv"));
    List<String> out = new ArrayList<>();
    int data = 0;
    for (String l : lines) {
      boolean isData = !l.startsWith("#") && !l.startsWith("timestamp");
      if (isData && data++ >= rows) {
        break;
      }
      out.add(l);
    }
    Path p = dir.resolve(name + "-cut.csv");
    Files.write(p, edit.apply(out));
    return p;
  }

  @Test
  void replayWritesOneEstimatePerFrameWithTheRequiredColumns() throws Exception {
    Path in = cut("feed-drop", 300, l -> l);
    Path out = dir.resolve("estimates.csv");
    var r = PlatewardCommandTest.run("replay", "--input", in.toString(), "--out", out.toString(), "--no-progress");
    assertThat(r.exit()).as(r.err()).isZero();
    assertThat(r.out()).contains("ADVISORY ONLY").contains("x real time").contains("peak plate temperature  RMSE");
    List<String> lines = Files.readAllLines(out);
    assertThat(lines.get(0)).startsWith("# Plateward estimates (ADVISORY ONLY");
    String header = lines.stream().filter(l -> l.startsWith("timestamp")).findFirst().orElseThrow();
    assertThat(List.of(header.split(","))).containsAll(List.of("timestamp", "peak_plate_temp_c", "peak_plate_temp_sd_c",
        "peak_position_m", "buffer_melt_fraction", "buffer_melt_fraction_sd", "max_cell_melt_fraction",
        "time_to_exhaust_s", "time_to_exhaust_sd_s", "nis", "estimator_status", "reforming_activity",
        "reforming_activity_sd", "combustion_activity", "heat_loss_w_m2k")).isEqualTo(EstimateWriter.COLUMNS);
    long rows = lines.stream().filter(l -> l.startsWith("20")).count();
    assertThat(rows).isEqualTo(300);
    String last = lines.get(lines.size() - 1);
    String[] cells = last.split(",", -1);
    assertThat(cells).hasSize(EstimateWriter.COLUMNS.size());
    // peak near the recording's steady 1045.9 degC (replay-data/README.md), status a known word
    assertThat(Double.parseDouble(cells[1])).isBetween(1020.0, 1070.0);
    assertThat(cells[12]).isIn("ok", "degraded", "untrustworthy");
  }

  @Test
  void shortRowsAreReadAsMissingAndCounted() throws Exception {
    Path in = cut("feed-drop", 120, l -> {
      List<String> m = new ArrayList<>(l);
      int row = m.size() - 10;
      String s = m.get(row);
      String[] cells = s.split(",", -1);
      m.set(row, String.join(",", java.util.Arrays.copyOf(cells, 30))); // a row cut after 30 cells
      return m;
    });
    var r = PlatewardCommandTest.run("replay", "--input", in.toString(), "--no-progress");
    assertThat(r.exit()).as(r.err()).isZero();
    assertThat(r.out()).contains("1 short rows read with their missing cells as missing values");
  }

  @Test
  void textInANumberExitsTwoWithFileAndLine() throws Exception {
    Path in = cut("feed-drop", 50, l -> {
      List<String> m = new ArrayList<>(l);
      int row = m.size() - 5;
      m.set(row, m.get(row).replaceFirst(",([0-9.]+),Good", ",abc,Good"));
      return m;
    });
    var r = PlatewardCommandTest.run("replay", "--input", in.toString(), "--no-progress");
    assertThat(r.exit()).isEqualTo(2);
    assertThat(r.err()).contains(in + ":").contains("is not a finite decimal number");
  }

  @Test
  void nonMonotonicTimestampExitsTwo() throws Exception {
    Path in = cut("feed-drop", 50, l -> {
      List<String> m = new ArrayList<>(l);
      int a = m.size() - 5;
      String t = m.get(a);
      m.set(a, m.get(a - 1));
      m.set(a - 1, t);
      return m;
    });
    var r = PlatewardCommandTest.run("replay", "--input", in.toString(), "--no-progress");
    assertThat(r.exit()).isEqualTo(2);
    assertThat(r.err()).contains(in + ":").contains("timestamp");
  }

  @Test
  void unknownColumnExitsTwo() throws Exception {
    Path in = cut("feed-drop", 10, l -> {
      List<String> m = new ArrayList<>(l);
      for (int i = 0; i < m.size(); i++) {
        if (m.get(i).startsWith("timestamp")) {
          m.set(i, m.get(i).replace("ref_inlet_temp_c,", "ref_inlet_temp_k,"));
        }
      }
      return m;
    });
    var r = PlatewardCommandTest.run("replay", "--input", in.toString(), "--no-progress");
    assertThat(r.exit()).isEqualTo(2);
    assertThat(r.err()).contains("ref_inlet_temp_k");
  }

  @Test
  void recordingOfAnotherUnitExitsTwo() throws Exception {
    Path in = cut("feed-drop", 10, l -> {
      List<String> m = new ArrayList<>(l);
      for (int i = 0; i < m.size(); i++) {
        m.set(i, m.get(i).replace("unit=TM-PR1", "unit=XX-9"));
      }
      return m;
    });
    var r = PlatewardCommandTest.run("replay", "--input", in.toString(), "--no-progress");
    assertThat(r.exit()).isEqualTo(2);
    assertThat(r.err()).contains("unit: recording is of unit 'XX-9'");
  }

  /**
   * The headless replay judges the configured advisory alarms through the live path's stage: on
   * the first 25 min of the fuel surge the summary counts the same transitions as an
   * independent estimator + {@link org.plateward.live.AdvisoryStage} run over the same frames,
   * and lists the time-to-exhaust alarm the surge raises.
   */
  @Test
  void replaySummarisesTheAdvisoryAlarmsOfTheLivePath() throws Exception {
    Path in = cut("fuel-surge", 1500, l -> l);
    var cfg = org.plateward.config.PlatewardConfig.load(Path.of("config/plateward.toml"));
    var sensor = new org.plateward.softsensor.ReactorSoftSensor(cfg.unit(),
        org.plateward.softsensor.SoftSensorSettings.defaults(), org.plateward.estimation.FilterSettings.defaults());
    var stage = org.plateward.live.AdvisoryStage.alarmsOnly(cfg.unit(), sensor, cfg.alarms(),
        org.plateward.alarms.AlarmAudit.NONE);
    List<org.plateward.alarms.AlarmEvent> events = new ArrayList<>();
    try (var src = org.plateward.replay.ReplayFrameSource.open(in)) {
      org.plateward.signals.Frame f;
      while ((f = src.next()) != null) {
        var e = sensor.accept(f);
        events.addAll(stage.judge(e, org.plateward.alarms.BadOrStale.recorded(f), false, false));
      }
    }
    long annunciations = events.stream().filter(org.plateward.alarms.AlarmEvent::annunciation).count();
    assertThat(annunciations).isPositive();
    var r = PlatewardCommandTest.run("replay", "--input", in.toString(), "--no-progress");
    assertThat(r.exit()).as(r.err()).isZero();
    assertThat(r.out()).contains(String.format("advisory alarms (configured definitions): %d transitions, %d annunciations",
        events.size(), annunciations));
    assertThat(r.out()).contains("exhaust_low").contains("normal -> unacknowledged")
        .contains("fuel-trim advice not asked");
  }

  @Test
  void replayWithAdviceListsTheSuggestionsAndSeveralInputsRefuseIt() throws Exception {
    Path in = cut("fuel-surge", 300, l -> l);
    var r = PlatewardCommandTest.run("replay", "--input", in.toString(), "--advice", "--no-progress");
    assertThat(r.exit()).as(r.err()).isZero();
    assertThat(r.out()).containsPattern("fuel-trim suggestions \\(advisory\\): [1-9]");
    var two = PlatewardCommandTest.run("replay", "--input", in.toString(), "--input",
        cut("feed-drop", 10, l -> l).toString(), "--advice", "--no-progress");
    assertThat(two.exit()).isEqualTo(2);
    assertThat(two.err()).contains("--advice goes with one --input or with --db");
  }
}
