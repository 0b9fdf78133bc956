package org.plateward.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code plateward replay --input a --input b ... --out-dir DIR}: each input's estimates file is
 * byte-identical to the one a single-input run writes (the reference path every other replay
 * test checks), a summary line per input and a total, and a broken input fails alone.
 */
@Timeout(240)
class ReplayManyTest {
  @TempDir Path dir;

  private Path cut(String name, int from, int rows, String as) throws Exception {
    List<String> out = new ArrayList<>();
    int data = 0;
    for (String l : Files.readAllLines(Path.of("replay-data", name + ".csv"))) {
      if (l.startsWith("#") || l.startsWith("timestamp")) {
        out.add(l);
      } else if (data++ >= from) {
        out.add(l);
        if (data >= from + rows) {
          break;
        }
      }
    }
    Path p = dir.resolve(as + ".csv");
    Files.write(p, out);
    return p;
  }

  @Test
  void severalInputsWriteWhatSingleRunsWriteAndSummariseEach() throws Exception {
    Path a = cut("feed-drop", 0, 150, "a");
    Path b = cut("fuel-surge", 200, 150, "b");
    Path c = cut("catalyst-ageing", 400, 150, "c");
    Path outDir = dir.resolve("est");
    var r = PlatewardCommandTest.run("replay", "--input", a.toString(), "--input", b.toString(), "--input", c.toString(),
        "--out-dir", outDir.toString(), "--threads", "2", "--no-progress");
    assertThat(r.exit()).as(r.err()).isZero();
    assertThat(r.out()).contains("ADVISORY ONLY")
        .contains(a + " (TM-PR1): 150 frames").contains(b + " (TM-PR1): 150 frames").contains(c + " (TM-PR1): 150 frames")
        .contains("peak plate temperature vs truth: RMSE")
        .containsPattern("total: 3 inputs, 450 frames \\(0\\.1 h of data\\) in [0-9.]+ s on 2 threads \\([0-9.]+ s CPU\\): [0-9]+ x real time");
    for (Path in : List.of(a, b, c)) {
      Path single = dir.resolve(in.getFileName() + ".single.csv");
      var one = PlatewardCommandTest.run("replay", "--input", in.toString(), "--out", single.toString(), "--no-progress");
      assertThat(one.exit()).as(one.err()).isZero();
      String name = in.getFileName().toString().replace(".csv", ".estimates.csv");
      assertThat(Files.readAllBytes(outDir.resolve(name))).as(name).isEqualTo(Files.readAllBytes(single));
    }
  }

  @Test
  void aBrokenInputFailsAloneAndItsPartialFileIsRemoved() throws Exception {
    Path good = cut("feed-drop", 0, 80, "good");
    Path bad = cut("fuel-surge", 0, 80, "bad");
    List<String> lines = new ArrayList<>(Files.readAllLines(bad));
    int row = lines.size() - 20;
    String[] cells = lines.get(row).split(",", -1);
    cells[1] = "lots";
    lines.set(row, String.join(",", cells));
    Files.write(bad, lines);
    Path outDir = dir.resolve("est");
    var r = PlatewardCommandTest.run("replay", "--input", good.toString(), "--input", bad.toString(),
        "--out-dir", outDir.toString(), "--no-progress");
    assertThat(r.exit()).isEqualTo(PlatewardCommand.EXIT_BAD_INPUT);
    assertThat(r.out()).contains(good + " (TM-PR1): 80 frames")
        .contains(bad + " (TM-PR1): FAILED after ").contains("no estimates written")
        .contains("total: 2 inputs (1 failed)");
    assertThat(r.err()).contains(bad + ":" + (row + 1));
    assertThat(outDir.resolve("good.estimates.csv")).exists();
    assertThat(outDir.resolve("bad.estimates.csv")).doesNotExist();
  }

  @Test
  void withAFleetConfigEachInputNamesItsUnit() throws Exception {
    Path in = cut("feed-drop", 0, 40, "x");
    Path fleet = dir.resolve("fleet.toml");
    Files.writeString(fleet, "[[units]]\nid = \"tm-pr1\"\nconfig = \"" + Path.of("config/plateward.toml").toAbsolutePath()
        + "\"\nopcua = \"" + Path.of("config/opcua-demo.toml").toAbsolutePath() + "\"\n\n[[units]]\nid = \"tm-pr9\"\nconfig = \""
        + Path.of("config/examples/fleet/tm-pr2.toml").toAbsolutePath() + "\"\nopcua = \""
        + Path.of("config/examples/fleet/tm-pr2-opcua.toml").toAbsolutePath() + "\"\n");
    var ok = PlatewardCommandTest.run("replay", "-c", fleet.toString(), "--input", "tm-pr1=" + in, "--no-progress");
    assertThat(ok.exit()).as(ok.err()).isZero();
    assertThat(ok.out()).contains(in + " (tm-pr1): 40 frames");
    var typo = PlatewardCommandTest.run("replay", "-c", fleet.toString(), "--input", "tm-rp1=" + in, "--no-progress");
    assertThat(typo.exit()).isEqualTo(PlatewardCommand.EXIT_BAD_INPUT);
    assertThat(typo.err()).contains("no unit 'tm-rp1'").contains("did you mean 'tm-pr1'?");
    // the recording is of TM-PR1, not of the unit tm-pr9 describes
    var wrong = PlatewardCommandTest.run("replay", "-c", fleet.toString(), "--input", "tm-pr9=" + in, "--no-progress");
    assertThat(wrong.exit()).isEqualTo(PlatewardCommand.EXIT_BAD_INPUT);
    assertThat(wrong.err()).contains("recording is of unit 'TM-PR1'").contains("describes 'TM-PR2'");
  }
}
