package org.plateward.plant;

import java.time.Instant;
import java.util.List;

/**
 * A scripted run of the simulated plant: where it starts, how long it runs, how it differs
 * from the configured unit, and the timeline of upsets and sensor faults.
 *
 * @param name short name (recorded in the replay header)
 * @param seed seed of every random stream (noise, spikes)
 * @param start time of the first frame
 * @param durationS run length, s (frames at 0, period, ..., duration)
 * @param samplePeriodS time between frames, s
 * @param truth the plant's physics settings
 * @param sensors the sensor models
 * @param events the timeline, in file order
 */
public record Scenario(
    String name,
    long seed,
    Instant start,
    double durationS,
    double samplePeriodS,
    TruthSettings truth,
    SensorSuite sensors,
    List<ScenarioEvent> events) {
  public Scenario {
    events = List.copyOf(events);
    if (!(samplePeriodS > 0.0) || !(durationS >= samplePeriodS)) {
      throw new IllegalArgumentException("need 0 < sample period <= duration");
    }
  }

  /** Number of frames: one at t = 0 and one per sample period up to the duration. */
  public long frames() {
    return (long) Math.floor(durationS / samplePeriodS + 1e-9) + 1;
  }

  /** The same scenario cut (or stretched) to another duration; events past it never happen. */
  public Scenario withDuration(double newDurationS) {
    return new Scenario(name, seed, start, newDurationS, samplePeriodS, truth, sensors, events);
  }

  /** The same scenario with another seed: other noise and other meter errors, the same events. */
  public Scenario withSeed(long newSeed) {
    return new Scenario(name, newSeed, start, durationS, samplePeriodS, truth, sensors, events);
  }

  /** The same scenario with other sensor models (for example without systematic errors). */
  public Scenario withSensors(SensorSuite s) {
    return new Scenario(name, seed, start, durationS, samplePeriodS, truth, s, events);
  }

  public Scenario withTruth(TruthSettings t) {
    return new Scenario(name, seed, start, durationS, samplePeriodS, t, sensors, events);
  }
}
