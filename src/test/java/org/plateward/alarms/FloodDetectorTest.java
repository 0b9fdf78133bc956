package org.plateward.alarms;

import static org.assertj.core.api.Assertions.assertThat;
import static org.plateward.alarms.AlarmFixtures.T0;
import static org.plateward.alarms.AlarmFixtures.flags;
import static org.plateward.alarms.AlarmFixtures.none;
import static org.plateward.alarms.AlarmFixtures.plain;
import static org.plateward.alarms.AlarmFixtures.settings;

import org.junit.jupiter.api.Test;

/**
 * Flood detection against the published figure: a flood is MORE THAN 10 annunciated alarms per
 * operator in 10 minutes (REFERENCES.md §7: EEMUA 191-derived KPI grid "flood state 10 in 10
 * minutes" and a secondary source "more than 10 alarms in a 10-minute period", tagged [V2];
 * the ISA-18.2 metrics table gives "10-min periods with >10 alarms" as its flood-like
 * measure, tagged [M]). So 11 in 10 min is a flood and 10 is not.
 */
class FloodDetectorTest {
  @Test
  void elevenAnnunciationsInTenMinutesAreAFloodTenAreNot() {
    FloodDetector ten = FloodDetector.published();
    for (int i = 0; i < 10; i++) {
      ten.annunciated(T0.plusSeconds(50L * i)); // 10 within 7.5 min
    }
    assertThat(ten.flooding()).isFalse();
    assertThat(ten.episodes()).isEmpty();

    FloodDetector eleven = FloodDetector.published();
    for (int i = 0; i < 11; i++) {
      eleven.annunciated(T0.plusSeconds(50L * i)); // 11 within 8 min 20 s
    }
    assertThat(eleven.flooding()).isTrue();
    assertThat(eleven.episodes()).hasSize(1);
    assertThat(eleven.episodes().get(0).start()).isEqualTo(T0.plusSeconds(500));
  }

  @Test
  void elevenSpreadOverMoreThanTenMinutesAreNot() {
    // 11 annunciations 60 s apart span exactly 10 min: the window is (t - 10 min, t], so the
    // first has left it when the eleventh arrives
    FloodDetector d = FloodDetector.published();
    for (int i = 0; i <= 10; i++) {
      d.annunciated(T0.plusSeconds(60L * i));
    }
    assertThat(d.countInWindow()).isEqualTo(10);
    assertThat(d.flooding()).isFalse();
  }

  @Test
  void aFloodHasAStartAndAnEnd() {
    FloodDetector d = FloodDetector.published();
    for (int i = 0; i < 15; i++) {
      d.annunciated(T0.plusSeconds(10L * i)); // 15 within 140 s
    }
    assertThat(d.episodes().get(0).peakCount()).isEqualTo(15);
    d.advance(T0.plusSeconds(3600));
    FloodEpisode f = d.episodes().get(0);
    assertThat(f.ongoing()).isFalse();
    assertThat(f.start()).isEqualTo(T0.plusSeconds(100)); // the 11th
    // back to 10 in the window when the 5th (t = 40 s) leaves it, at 40 s + 10 min
    assertThat(f.end()).isEqualTo(T0.plusSeconds(640));
    assertThat(d.flooding()).isFalse();
  }

  @Test
  void theBoardCountsAnnunciationsAndNotOtherTransitions() {
    AlarmBoard b = new AlarmBoard(settings(0, plain()), AlarmAudit.NONE);
    // the connection drops and returns every 20 s: one annunciation per drop
    for (int i = 0; i < 22; i++) {
      b.evaluate(flags(10L * i, "ok", none(), i % 2 == 0, false));
      if (i % 2 == 0) {
        // acknowledgements are transitions, not annunciations
        b.acknowledge(T0.plusSeconds(10L * i + 1), "op1", AlarmKind.CONNECTION_LOST, null);
      }
    }
    assertThat(b.annunciationsInWindow()).isEqualTo(11);
    assertThat(b.flooding()).isTrue();
    assertThat(b.floods().get(0).start()).isEqualTo(T0.plusSeconds(200));
  }
}
