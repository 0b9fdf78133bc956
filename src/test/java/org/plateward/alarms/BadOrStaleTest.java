package org.plateward.alarms;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Instant;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;

/**
 * The one rule for the "signal Bad or stale" alarm, live and recorded: Bad counts for every
 * signal; stale (live: the aligner's flag; recorded: MISSING) only for signals that report
 * continuously, not for the analyzer, which is silent between results by design.
 */
class BadOrStaleTest {
  private static Frame frame(Quality fuel, Quality ch4, Quality o2) {
    Signal[] all = Signal.values();
    double[] v = new double[all.length];
    Quality[] q = new Quality[all.length];
    Arrays.fill(v, 1.0);
    Arrays.fill(q, Quality.GOOD);
    q[Signal.FUEL_FLOW.ordinal()] = fuel;
    q[Signal.REF_OUTLET_CH4.ordinal()] = ch4;
    q[Signal.COMB_OUTLET_O2.ordinal()] = o2;
    for (int i = 0; i < all.length; i++) {
      if (q[i] == Quality.MISSING) {
        v[i] = Double.NaN;
      }
    }
    return new Frame(Instant.parse("2031-03-05T14:00:00Z"), v, q);
  }

  @Test
  void badCountsForEverySignalLiveAndRecorded() {
    Frame f = frame(Quality.BAD, Quality.BAD, Quality.GOOD);
    Set<String> want = Set.of(Signal.FUEL_FLOW.id(), Signal.REF_OUTLET_CH4.id());
    assertThat(BadOrStale.live(f, Set.of())).isEqualTo(want);
    assertThat(BadOrStale.recorded(f)).isEqualTo(want);
  }

  @Test
  void staleCountsOnlyForContinuousSignals() {
    // live: the aligner flags the fuel meter and the analyzer's CH4 stale (both MISSING then)
    Frame f = frame(Quality.MISSING, Quality.MISSING, Quality.GOOD);
    assertThat(BadOrStale.live(f, EnumSet.of(Signal.FUEL_FLOW, Signal.REF_OUTLET_CH4)))
        .containsExactly(Signal.FUEL_FLOW.id());
    // recorded: the same frame as stored reads the same
    assertThat(BadOrStale.recorded(f)).containsExactly(Signal.FUEL_FLOW.id());
  }

  @Test
  void uncertainAndGoodDoNotCount() {
    Frame f = frame(Quality.UNCERTAIN, Quality.GOOD, Quality.UNCERTAIN);
    assertThat(BadOrStale.live(f, Set.of())).isEmpty();
    assertThat(BadOrStale.recorded(f)).isEmpty();
  }
}
