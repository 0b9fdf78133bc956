package org.plateward.calibration;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Instant;
import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;

class SteadyWindowDetectorTest {
  static final Instant T0 = Instant.parse("2031-04-02T00:00:00Z");

  /** Constant signals except the fuel flow, which follows {@code fuel(t)}; analyzer every 30 s. */
  static Frame frame(int k, double fuelMolPerS) {
    double[] v = new double[Signal.COUNT];
    Quality[] q = new Quality[Signal.COUNT];
    Arrays.fill(q, Quality.GOOD);
    for (Signal s : Signal.values()) {
      v[s.ordinal()] = switch (s.kind()) {
        case INPUT -> 1.0 + s.ordinal();
        case OUTPUT -> 900.0;
        case ANALYZER -> 0.1;
      };
      if (s.kind() == Signal.Kind.ANALYZER && k % 30 != 0) {
        v[s.ordinal()] = Double.NaN;
        q[s.ordinal()] = Quality.MISSING;
      }
    }
    v[Signal.FUEL_FLOW.ordinal()] = fuelMolPerS;
    return new Frame(T0.plusSeconds(k), v, q);
  }

  @Test
  void constantSignalsAreOneWindowWithTheirValuesAsMeans() {
    SteadyWindowDetector d = new SteadyWindowDetector(SteadinessTolerances.defaults());
    for (int k = 0; k < 1800; k++) {
      d.accept(frame(k, 0.1));
    }
    var w = d.windows();
    assertThat(w).hasSize(1);
    assertThat(w.get(0).frames()).isEqualTo(1800);
    assertThat(w.get(0).inputs().fuelFlowMolPerS()).isCloseTo(0.1, org.assertj.core.data.Offset.offset(1e-15));
    assertThat(w.get(0).outputSi(0)).isEqualTo(900.0);
    assertThat(w.get(0).outputCounts()[org.plateward.reactor.ModelOutputs.REF_DRY_H2]).isEqualTo(60);
  }

  @Test
  void aSlowRampIsSteadyOnlyAsLongAsItStaysInsideTheBand() {
    // fuel ramps by 1 % of its value every 400 s: a 1 % band holds at most 400 s of it (the
    // block means of a linear ramp differ by exactly the rate times the block spacing)
    SteadinessTolerances tol = SteadinessTolerances.defaults();
    SteadyWindowDetector d = new SteadyWindowDetector(tol);
    double rate = 0.01 / 400.0;
    for (int k = 0; k < 3600; k++) {
      d.accept(frame(k, 0.1 * (1.0 + rate * k)));
    }
    assertThat(d.windows()).isEmpty();
    SteadyWindowDetector.LongestRun run = d.longestRun();
    assertThat(run.endedBy()).isEqualTo(Signal.FUEL_FLOW);
    // block means spaced 120 s differ by 0.3 % of the flow: 4 steps (480 s of means) fit in
    // 1 %, so the run holds 4 blocks: 480 s minus the last frame's second
    assertThat(run.durationS()).isBetween(400.0, 480.0);
  }

  @Test
  void aBlockWithoutAFastSignalEndsTheRun() {
    SteadyWindowDetector d = new SteadyWindowDetector(SteadinessTolerances.defaults());
    for (int k = 0; k < 1800; k++) {
      Frame f = frame(k, 0.1);
      if (k >= 960 && k < 1080) { // the whole of block 8 (blocks of 120 s from the first frame) with the reformed-gas thermocouple Bad
        double[] v = f.valuesSi();
        Quality[] q = f.quality();
        v[Signal.REF_OUTLET_TEMP.ordinal()] = Double.NaN;
        q[Signal.REF_OUTLET_TEMP.ordinal()] = Quality.BAD;
        f = new Frame(f.time(), v, q);
      }
      d.accept(f);
    }
    var w = d.windows();
    assertThat(w).hasSize(2);
    assertThat(w.get(0).to()).isBefore(T0.plusSeconds(960));
    assertThat(w.get(1).from()).isAfterOrEqualTo(T0.plusSeconds(1080));
  }
}
