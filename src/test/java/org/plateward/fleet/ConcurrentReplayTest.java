package org.plateward.fleet;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.reactor.UnitSpec;
import org.plateward.replay.ReplayFrameSource;
import org.plateward.softsensor.EstimationLoop;
import org.plateward.softsensor.ReactorSoftSensor;

/**
 * Issue 8: 50 units replayed concurrently on the pool give results identical, bit for bit, to
 * running them one by one through {@link EstimationLoop} on the calling thread. The reference
 * is the single-threaded loop every other replay test checks; any shared mutable state, lost
 * frame or reordering between units would change a fingerprint.
 */
@Timeout(300)
class ConcurrentReplayTest {
  static final int UNITS = 50;
  static final int ROWS = 180;

  @TempDir Path dir;

  @Test
  void fiftyUnitsOnThePoolMatchFiftyRunsOneByOne() throws Exception {
    UnitSpec unit = FleetFixtures.unit30();
    List<Path> inputs = new ArrayList<>();
    for (int i = 0; i < UNITS; i++) {
      String rec = FleetFixtures.RECORDINGS.get(i % FleetFixtures.RECORDINGS.size());
      // a different stretch of the recording for each unit: 100 s apart
      inputs.add(FleetFixtures.slice(dir, rec, 100 * (i / FleetFixtures.RECORDINGS.size()), ROWS, "u" + i));
    }

    // one by one, on this thread
    List<String> serial = new ArrayList<>();
    for (Path p : inputs) {
      FleetFixtures.Fingerprint fp = new FleetFixtures.Fingerprint();
      try (ReplayFrameSource src = ReplayFrameSource.open(p)) {
        EstimationLoop.run(src, FleetFixtures.sensor(unit), (f, e, t) -> fp.add(e), null);
      }
      serial.add(fp.hex());
    }

    // all at once on the pool: more threads than cores, so turns interleave and migrate
    List<FleetFixtures.Fingerprint> fps = new ArrayList<>();
    ConcurrentHashMap<String, AtomicInteger> inFlight = new ConcurrentHashMap<>();
    ConcurrentHashMap<String, Instant> lastTime = new ConcurrentHashMap<>();
    AtomicInteger overlaps = new AtomicInteger();
    AtomicInteger disorder = new AtomicInteger();
    List<UnitLane> lanes = new ArrayList<>();
    try (UnitPool pool = new UnitPool(4)) {
      for (int i = 0; i < UNITS; i++) {
        String id = "u" + i;
        FleetFixtures.Fingerprint fp = new FleetFixtures.Fingerprint();
        fps.add(fp);
        inFlight.put(id, new AtomicInteger());
        ReactorSoftSensor sensor = FleetFixtures.sensor(unit);
        lanes.add(pool.replay(id, ReplayFrameSource.open(inputs.get(i)), f -> {
          if (inFlight.get(id).incrementAndGet() != 1) {
            overlaps.incrementAndGet();
          }
          try {
            return sensor.accept(f);
          } finally {
            inFlight.get(id).decrementAndGet();
          }
        }, (f, e, t) -> {
          Instant prev = lastTime.put(id, f.time());
          if (prev != null && !f.time().isAfter(prev)) {
            disorder.incrementAndGet();
          }
          fp.add(e);
        }));
      }
      for (UnitLane l : lanes) {
        LaneStatus s = l.await(240_000);
        assertThat(s.state()).as(s.reason()).isEqualTo(LaneState.FINISHED);
        assertThat(s.estimated()).isEqualTo(ROWS);
        assertThat(s.dropped()).isZero();
      }
    }
    assertThat(overlaps).as("an estimator ran on two threads at once").hasValue(0);
    assertThat(disorder).as("frames of a unit out of order").hasValue(0);
    for (int i = 0; i < UNITS; i++) {
      assertThat(fps.get(i).hex()).as("unit u" + i).isEqualTo(serial.get(i));
    }
    // the 50 inputs are really different, so the comparison is not 50 copies of one run
    assertThat(new java.util.HashSet<>(serial)).hasSize(UNITS);
  }
}
