package org.plateward.opcua;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Instant;
import java.util.EnumMap;
import java.util.Map;
import org.eclipse.milo.opcua.stack.core.StatusCodes;
import org.junit.jupiter.api.Test;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;

/** The aligner's rules on hand-made sample sequences; status codes checked against Milo's table. */
class FrameAlignerTest {
  private static final Instant T0 = Instant.parse("2026-01-01T00:00:00Z");

  private static FrameAligner aligner() {
    Map<Signal, Double> sampling = new EnumMap<>(Signal.class);
    sampling.put(Signal.REF_INLET_TEMP, 1.0);
    sampling.put(Signal.REF_PRESSURE, 1.0);
    return new FrameAligner(sampling, 3.0, 2.0, 1.0);
  }

  private static Sample at(Signal s, double v, long sourceMs, long receivedMs) {
    return new Sample(s, v, Quality.GOOD, 0L, T0.plusMillis(sourceMs), null, T0.plusMillis(receivedMs));
  }

  @Test
  void theFrameHoldsTheLastSampleAtOrBeforeItsTimeBySourceTimestamp() {
    FrameAligner a = aligner();
    a.accept(at(Signal.REF_INLET_TEMP, 800.0, 200, 300));
    a.accept(at(Signal.REF_INLET_TEMP, 801.0, 900, 1000));
    a.accept(at(Signal.REF_INLET_TEMP, 802.0, 1100, 1150)); // belongs to the next frame
    AlignedFrame f1 = a.frameAt(T0.plusMillis(1000));
    assertThat(f1.frame().valueSi(Signal.REF_INLET_TEMP)).isEqualTo(801.0);
    assertThat(f1.samplesUsed()).isEqualTo(3);
    AlignedFrame f2 = a.frameAt(T0.plusMillis(2000));
    assertThat(f2.frame().valueSi(Signal.REF_INLET_TEMP)).isEqualTo(802.0);
    // a signal never seen is MISSING but not stale; an unmapped one likewise
    assertThat(f2.frame().quality(Signal.REF_PRESSURE)).isEqualTo(Quality.MISSING);
    assertThat(f2.stale()).isEmpty();
    assertThat(f2.frame().quality(Signal.FUEL_FLOW)).isEqualTo(Quality.MISSING);
  }

  @Test
  void aValueOlderThanThreeSamplingIntervalsIsStaleNeverHeld() {
    FrameAligner a = aligner();
    a.accept(at(Signal.REF_INLET_TEMP, 800.0, 1000, 1010));
    assertThat(a.frameAt(T0.plusMillis(4000)).frame().quality(Signal.REF_INLET_TEMP)).isEqualTo(Quality.GOOD);
    AlignedFrame f = a.frameAt(T0.plusMillis(4001));
    assertThat(f.frame().quality(Signal.REF_INLET_TEMP)).isEqualTo(Quality.MISSING);
    assertThat(f.frame().valueSi(Signal.REF_INLET_TEMP)).isNaN();
    assertThat(f.stale()).containsExactly(Signal.REF_INLET_TEMP);
  }

  @Test
  void clockSkewBeyondTheLimitIsFlaggedAndAlignedOnReceiveTime() {
    FrameAligner a = aligner();
    // server clock 10 s ahead: source 11 s, received at 1 s local
    a.accept(at(Signal.REF_PRESSURE, 3.2e5, 11_000, 1000));
    AlignedFrame f = a.frameAt(T0.plusMillis(1000));
    assertThat(f.clockSkewed()).containsExactly(Signal.REF_PRESSURE);
    assertThat(f.frame().valueSi(Signal.REF_PRESSURE)).isEqualTo(3.2e5);
    // without a SourceTimestamp the ServerTimestamp is used
    Sample s = new Sample(Signal.REF_INLET_TEMP, 1.0, Quality.GOOD, 0L, null, T0.plusMillis(500), T0.plusMillis(900));
    assertThat(s.alignmentTime()).isEqualTo(T0.plusMillis(500));
  }

  @Test
  void afterAConnectionLossOldSamplesCannotReappear() {
    FrameAligner a = aligner();
    a.accept(at(Signal.REF_INLET_TEMP, 800.0, 900, 950));
    a.invalidate(T0.plusMillis(1000));
    AlignedFrame f = a.frameAt(T0.plusMillis(1500));
    assertThat(f.frame().quality(Signal.REF_INLET_TEMP)).isEqualTo(Quality.MISSING);
    assertThat(f.stale()).containsExactly(Signal.REF_INLET_TEMP);
  }

  @Test
  void statusCodeSeverityMapsToQuality() {
    // severity bits 31:30 (OPC 10000-4 §7.39): codes from Milo's StatusCodes table
    assertThat(StatusQuality.of(StatusCodes.Good_Clamped, true)).isEqualTo(Quality.GOOD);
    assertThat(StatusQuality.of(StatusCodes.Uncertain_SensorNotAccurate, true)).isEqualTo(Quality.UNCERTAIN);
    assertThat(StatusQuality.of(StatusCodes.Uncertain_LastUsableValue, true)).isEqualTo(Quality.UNCERTAIN);
    assertThat(StatusQuality.of(StatusCodes.Bad_SensorFailure, true)).isEqualTo(Quality.BAD);
    assertThat(StatusQuality.of(StatusCodes.Bad_WaitingForInitialData, false)).isEqualTo(Quality.BAD);
    // Good without a number is nothing to use
    assertThat(StatusQuality.of(StatusCodes.Good, false)).isEqualTo(Quality.BAD);
  }

  @Test
  void theQueueDropsTheOldestWhenFullAndCountsIt() {
    SampleQueue q = new SampleQueue(2);
    q.offer(at(Signal.REF_INLET_TEMP, 1.0, 0, 0));
    q.offer(at(Signal.REF_INLET_TEMP, 2.0, 0, 0));
    q.offer(at(Signal.REF_INLET_TEMP, 3.0, 0, 0));
    var out = new java.util.ArrayList<Sample>();
    assertThat(q.drainTo(out)).isEqualTo(2);
    assertThat(out.get(0).valueSi()).isEqualTo(2.0);
    assertThat(q.dropped()).isEqualTo(1);
  }
}
