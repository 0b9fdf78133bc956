package org.plateward.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.EstimatorStatus;

/** The hand-over keeps order, takes bounded batches, and a live feed never blocks on it. */
class SnapshotMailboxTest {
  private static Snapshot at(long s) {
    double n = Double.NaN;
    Estimate e = new Estimate(Instant.ofEpochSecond(s), n, n, n, n, n, n, n, n, n, n, 0, EstimatorStatus.OK, "",
        n, n, n, n, n, n, n, n, n, n, new double[0], new double[0], new double[0], Map.of());
    return new Snapshot(null, e, null, null, List.of(), List.of(), null);
  }

  @Test
  void batchesComeOutInOrderAndBounded() {
    SnapshotMailbox m = new SnapshotMailbox(100, true);
    for (int i = 0; i < 10; i++) {
      m.offer(at(i));
    }
    List<Snapshot> out = new ArrayList<>();
    assertThat(m.drainTo(out, 4)).isEqualTo(4);
    assertThat(m.drainTo(out, 100)).isEqualTo(6);
    assertThat(out).extracting(s -> s.time().getEpochSecond()).containsExactly(0L, 1L, 2L, 3L, 4L, 5L, 6L, 7L, 8L, 9L);
    assertThat(m.pending()).isZero();
  }

  @Test
  void aLiveFeedDropsTheOldestInsteadOfWaiting() {
    SnapshotMailbox m = new SnapshotMailbox(3, false);
    for (int i = 0; i < 10; i++) {
      m.offer(at(i)); // would block forever if it waited: nobody drains
    }
    List<Snapshot> out = new ArrayList<>();
    m.drainTo(out, 100);
    assertThat(out).extracting(s -> s.time().getEpochSecond()).containsExactly(7L, 8L, 9L);
    assertThat(m.dropped()).isEqualTo(7);
  }
}
