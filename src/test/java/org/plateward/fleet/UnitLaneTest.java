package org.plateward.fleet;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.reactor.UnitSpec;
import org.plateward.replay.ReplayFrameSource;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;
import org.plateward.softsensor.EstimationLoop;
import org.plateward.softsensor.ReactorSoftSensor;

/**
 * The lane rules: failure isolation, back-pressure, drop-oldest with a count that obeys
 * taken = estimated + dropped, and a clear status.
 */
@Timeout(120)
class UnitLaneTest {
  @TempDir Path dir;

  private static Frame frame(int s) {
    double[] v = new double[Signal.values().length];
    Quality[] q = new Quality[v.length];
    java.util.Arrays.fill(q, Quality.MISSING);
    return new Frame(Instant.ofEpochSecond(1_900_000_000L + s), v, q);
  }

  @Test
  void oneUnitThrowingStopsOnlyThatUnitAndItsStatusSaysWhy() throws Exception {
    UnitSpec unit = FleetFixtures.unit30();
    List<Path> inputs = new ArrayList<>();
    for (int i = 0; i < 3; i++) {
      inputs.add(FleetFixtures.slice(dir, FleetFixtures.RECORDINGS.get(i), 0, 120, "in" + i));
    }
    List<String> serial = new ArrayList<>();
    for (Path p : inputs) {
      FleetFixtures.Fingerprint fp = new FleetFixtures.Fingerprint();
      try (ReplayFrameSource src = ReplayFrameSource.open(p)) {
        EstimationLoop.run(src, FleetFixtures.sensor(unit), (f, e, t) -> fp.add(e), null);
      }
      serial.add(fp.hex());
    }
    List<FleetFixtures.Fingerprint> fps = new ArrayList<>();
    List<UnitLane> lanes = new ArrayList<>();
    try (UnitPool pool = new UnitPool(2)) {
      for (int i = 0; i < 3; i++) {
        ReactorSoftSensor sensor = FleetFixtures.sensor(unit);
        FleetFixtures.Fingerprint fp = new FleetFixtures.Fingerprint();
        fps.add(fp);
        int[] n = {0};
        boolean faulty = i == 1;
        lanes.add(pool.replay("unit-" + i, ReplayFrameSource.open(inputs.get(i)), f -> {
          if (faulty && ++n[0] == 50) {
            throw new IllegalStateException("covariance not positive definite");
          }
          return sensor.accept(f);
        }, (f, e, t) -> fp.add(e)));
      }
      LaneStatus bad = lanes.get(1).await(60_000);
      assertThat(bad.state()).isEqualTo(LaneState.FAILED);
      assertThat(bad.estimated()).isEqualTo(49);
      assertThat(bad.reason()).contains("IllegalStateException: covariance not positive definite")
          .contains("at frame").contains(inputs.get(1).toString());
      for (int i : new int[] {0, 2}) {
        LaneStatus ok = lanes.get(i).await(60_000);
        assertThat(ok.state()).isEqualTo(LaneState.FINISHED);
        assertThat(ok.estimated()).isEqualTo(120);
        assertThat(fps.get(i).hex()).isEqualTo(serial.get(i));
      }
      assertThat(pool.statuses()).extracting(LaneStatus::state)
          .containsExactly(LaneState.FINISHED, LaneState.FAILED, LaneState.FINISHED);
    }
  }

  @Test
  void aFullLaneDropsTheOldestFrameAndCountsIt() throws Exception {
    CountDownLatch entered = new CountDownLatch(1);
    CountDownLatch release = new CountDownLatch(1);
    List<Instant> seen = Collections.synchronizedList(new ArrayList<>());
    try (UnitPool pool = new UnitPool(2)) {
      UnitLane lane = pool.feed("slow", f -> {
        entered.countDown();
        try {
          release.await();
        } catch (InterruptedException e) {
          Thread.currentThread().interrupt();
        }
        seen.add(f.time());
        return null;
      }, 4, null);
      assertThat(lane.offer(frame(0))).isTrue();
      assertThat(entered.await(10, TimeUnit.SECONDS)).isTrue(); // frame 0 is being estimated
      for (int s = 1; s <= 10; s++) {
        assertThat(lane.offer(frame(s))).isTrue();
      }
      LaneStatus mid = lane.status();
      assertThat(mid.queued()).isEqualTo(4);
      assertThat(mid.dropped()).isEqualTo(6);
      release.countDown();
      lane.endFeed();
      LaneStatus end = lane.await(10_000);
      assertThat(end.state()).isEqualTo(LaneState.FINISHED);
      // conservation: every frame taken was either estimated or dropped
      assertThat(end.accepted()).isEqualTo(end.estimated() + end.dropped()).isEqualTo(11);
      assertThat(seen).containsExactly(frame(0).time(), frame(7).time(), frame(8).time(),
          frame(9).time(), frame(10).time());
      assertThatThrownBy(() -> lane.offer(frame(11))).isInstanceOf(IllegalStateException.class);
    }
  }

  @Test
  void putWaitsWhileTheLaneIsFullAndLosesNothing() throws Exception {
    CountDownLatch entered = new CountDownLatch(1);
    CountDownLatch release = new CountDownLatch(1);
    List<Instant> seen = Collections.synchronizedList(new ArrayList<>());
    try (UnitPool pool = new UnitPool(1)) {
      UnitLane lane = pool.feed("slow", f -> {
        entered.countDown();
        try {
          release.await();
        } catch (InterruptedException e) {
          Thread.currentThread().interrupt();
        }
        seen.add(f.time());
        return null;
      }, 2, null);
      Thread producer = new Thread(() -> {
        try {
          for (int s = 0; s < 6; s++) {
            lane.put(frame(s));
          }
          lane.endFeed();
        } catch (InterruptedException e) {
          Thread.currentThread().interrupt();
        }
      });
      producer.start();
      assertThat(entered.await(10, TimeUnit.SECONDS)).isTrue();
      // frame 0 in the estimator, two waiting, the producer blocked on the fourth
      long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(10);
      while (lane.status().queued() < 2 && System.nanoTime() < deadline) {
        Thread.sleep(5);
      }
      Thread.sleep(200);
      assertThat(producer.isAlive()).isTrue();
      assertThat(lane.status().accepted()).isEqualTo(3);
      release.countDown();
      producer.join(10_000);
      LaneStatus end = lane.await(10_000);
      assertThat(end.estimated()).isEqualTo(6);
      assertThat(end.dropped()).isZero();
      assertThat(seen).hasSize(6).isSorted();
    }
  }

  @Test
  void aFailedFedLaneRefusesFramesAndCountsThem() throws Exception {
    try (UnitPool pool = new UnitPool(1)) {
      UnitLane lane = pool.feed("broken", f -> {
        throw new ArithmeticException("NaN in the plate enthalpy");
      }, 8, null);
      lane.offer(frame(0));
      LaneStatus s = lane.done().get(10, TimeUnit.SECONDS);
      assertThat(s.state()).isEqualTo(LaneState.FAILED);
      assertThat(s.reason()).startsWith("ArithmeticException: NaN in the plate enthalpy (at frame ");
      assertThat(lane.offer(frame(1))).isFalse();
      assertThat(lane.put(frame(2))).isFalse();
      assertThat(lane.status().dropped()).isEqualTo(2);
      assertThatThrownBy(() -> pool.feed("broken", f -> null, 1, null))
          .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("already has a lane");
    }
  }
}
