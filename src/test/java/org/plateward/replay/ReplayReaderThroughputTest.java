package org.plateward.replay;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.signals.Frame;
import org.plateward.signals.Signal;

/** A day at 1 s (86,400 rows, all 41 columns) is written and read back; rows/s are printed. */
class ReplayReaderThroughputTest {
  @TempDir Path dir;

  @Test
  void readsADayAtOneSecond() throws IOException {
    int rows = 86_400;
    Path file = dir.resolve("day.csv");
    var frames = ReplayRoundTripTest.frames(42, 1_000);
    double writtenSum = 0;
    long w0 = System.nanoTime();
    try (ReplayWriter w = ReplayWriter.create(file, ReplayRoundTripTest.layout())) {
      java.time.Instant t0 = java.time.Instant.parse("2026-03-04T00:00:00Z");
      for (int k = 0; k < rows; k++) {
        var f = frames.get(k % frames.size());
        Frame frame = new Frame(t0.plusSeconds(k), f.frame().valuesSi(), f.frame().quality());
        w.write(frame, Map.of(), f.truth());
        writtenSum += f.truth().get(ReplayColumns.TRUTH_PEAK_PLATE_TEMP_C);
      }
    }
    double writeS = (System.nanoTime() - w0) / 1e9;

    long r0 = System.nanoTime();
    long count = 0;
    double readSum = 0;
    long partial;
    try (ReplayReader r = ReplayReader.open(file)) {
      while (r.hasNext()) {
        ReplayRecord rec = r.next();
        readSum += rec.truth(ReplayColumns.TRUTH_PEAK_PLATE_TEMP_C);
        count++;
      }
      partial = r.partialRowCount();
    }
    double readS = (System.nanoTime() - r0) / 1e9;
    System.out.printf(
        "replay file: %d rows, %d columns, %.1f MB; write %.2f s (%.0f rows/s); read %.2f s (%.0f rows/s)%n",
        rows, ReplayRoundTripTest.layout().columnNames().size(), Files.size(file) / 1e6,
        writeS, rows / writeS, readS, rows / readS);
    assertThat(count).isEqualTo(rows);
    assertThat(partial).isZero();
    // the sum of a truth column is preserved to the writer's 5e-9 relative precision
    assertThat(Math.abs(readSum - writtenSum)).isLessThanOrEqualTo(5e-9 * writtenSum);
  }
}
