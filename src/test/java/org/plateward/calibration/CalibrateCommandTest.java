package org.plateward.calibration;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.dataformat.toml.TomlMapper;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.calibration.io.CalibrationPlots;
import org.plateward.cli.PlatewardCommand;
import org.plateward.plot.PixelStats;

/** {@code plateward calibrate} end to end on a recording of the simulated plant (invented data). */
class CalibrateCommandTest {
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

  @Test
  void fitsTheRecordingWritesTheParameterFileAndPlotsAndNeverOverwrites() throws Exception {
    PlateauRecording rec = PlateauRecording.run();
    Path csv = dir.resolve("plateaus.csv");
    rec.write(csv);
    Path params = dir.resolve("params.toml");
    Run r = run("calibrate", "--input", csv.toString(), "--out", params.toString());
    System.out.print(r.out());
    assertThat(r.exit()).as(r.err()).isZero();
    assertThat(r.out()).contains("ADVISORY ONLY").contains("4 steady windows").contains("95 % interval");

    JsonNode t = new TomlMapper().readTree(params.toFile());
    double ref = t.at("/catalyst/reforming_activity").asDouble();
    assertThat(ref).isEqualTo(t.at("/calibration/reforming_activity/value").asDouble());
    for (FittedParameter p : FittedParameter.values()) {
      JsonNode e = t.at("/calibration/" + p.key());
      double truth = SteadyStateCalibratorTest.truthOf(rec, p);
      assertThat(truth).as(p.key()).isBetween(e.get("ci95_low").asDouble(), e.get("ci95_high").asDouble());
      assertThat(e.get("identifiable").asBoolean()).isTrue();
    }
    assertThat(t.at("/heat_loss/coefficient").asText()).endsWith(" W/(m2 K)");
    assertThat(Files.readString(params)).startsWith("# Plateward model parameters").contains("ADVISORY ONLY");

    for (String name : List.of("params-fit.png", "params-residuals.png")) {
      BufferedImage img = PixelStats.read(dir.resolve(name));
      if (name.endsWith("fit.png")) {
        assertThat(img.getWidth()).isEqualTo(3 * CalibrationPlots.PANEL_W);
        assertThat(img.getHeight()).isEqualTo(3 * CalibrationPlots.PANEL_H);
      } else {
        assertThat(img.getWidth()).isEqualTo(CalibrationPlots.RESIDUALS_W);
        assertThat(img.getHeight()).isEqualTo(CalibrationPlots.RESIDUALS_H);
      }
      assertThat(PixelStats.greyVariance(img)).as(name).isGreaterThan(100.0);
      assertThat(PixelStats.colours(img, 50)).as(name).isGreaterThanOrEqualTo(10);
    }

    byte[] before = Files.readAllBytes(params);
    Run again = run("calibrate", "--input", csv.toString(), "--out", params.toString(), "--cells", "30");
    assertThat(again.exit()).isEqualTo(PlatewardCommand.EXIT_BAD_INPUT);
    assertThat(again.err()).contains(params.toString()).contains("exists").contains("--force");
    assertThat(Files.readAllBytes(params)).isEqualTo(before);
  }

  @Test
  void aHistoryPeriodGivesTheSameWindowsAsTheReplayFile() throws Exception {
    PlateauRecording rec = PlateauRecording.run();
    Path db = dir.resolve("history.db");
    try (org.plateward.history.HistoryRecorder h = org.plateward.history.HistoryRecorder.start(
        org.plateward.history.HistorySettings.at(db))) {
      for (var s : rec.samples) {
        h.appendFrame(s.frame());
      }
      assertThat(h.flush(java.time.Duration.ofSeconds(60))).isTrue();
    }
    java.time.Instant from = rec.samples.get(0).frame().time();
    java.time.Instant to = rec.samples.get(rec.samples.size() - 1).frame().time().plusSeconds(1);
    // a coarse grid keeps this fast; the windows do not depend on it
    Run r = run("calibrate", "--db", db.toString(), "--from", from.toString(), "--to", to.toString(), "--cells", "30");
    assertThat(r.exit()).as(r.err()).isZero();
    SteadyWindowDetector d = new SteadyWindowDetector(SteadinessTolerances.defaults());
    rec.samples.forEach(s -> d.accept(s.frame()));
    assertThat(r.out()).contains(d.windows().size() + " steady windows in " + db);
    for (SteadyWindow w : d.windows()) {
      assertThat(r.out()).contains(w.from() + " .. " + w.to());
    }
  }

  /** The first {@code rows} data rows of a committed recording. */
  private Path cut(String name, int rows) throws Exception {
    List<String> out = new ArrayList<>();
    int data = 0;
    for (String l : Files.readAllLines(Path.of("replay-data", name + ".csv"))) {
      boolean isData = !l.startsWith("#") && !l.startsWith("timestamp");
      if (isData && data++ >= rows) {
        break;
      }
      out.add(l);
    }
    Path p = dir.resolve(name + "-cut.csv");
    Files.write(p, out);
    return p;
  }

  @Test
  void aPeriodWithoutASteadyWindowSaysSoAndWritesNothing() throws Exception {
    Path in = cut("feed-drop", 400); // under 7 min: shorter than the 10 min minimum
    Path params = dir.resolve("none.toml");
    Run r = run("calibrate", "--input", in.toString(), "--out", params.toString());
    assertThat(r.exit()).isEqualTo(PlatewardCommand.EXIT_BAD_INPUT);
    assertThat(r.err()).contains("no steady window found").contains("longest steady stretch").contains("Nothing was written");
    assertThat(Files.exists(params)).isFalse();
  }

  @Test
  void forceReplacesAnExistingFile() throws Exception {
    Path in = cut("feed-drop", 400);
    Path params = dir.resolve("p.toml");
    Files.writeString(params, "old\n");
    Run r = run("calibrate", "--input", in.toString(), "--out", params.toString(), "--min-window", "4",
        "--cells", "30", "--force");
    assertThat(r.exit()).as(r.err() + r.out()).isZero();
    assertThat(Files.readString(params)).startsWith("# Plateward model parameters");
    assertThat(Files.exists(dir.resolve("p-fit.png"))).isTrue();
  }
}
