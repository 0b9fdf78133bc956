package org.plateward.bench;

import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.plateward.config.UnitConfigLoader;
import org.plateward.estimation.FilterSettings;
import org.plateward.replay.ReplayFrameSource;
import org.plateward.signals.Frame;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.SoftSensorSettings;

/**
 * One frame through the reactor soft sensor (the configured grid: 80 cells, 105 states; 5 s filter blocks), frames of
 * a committed recording held in memory (no CSV parsing in the figure). The recording is fed in
 * a loop with its times shifted by its length. µs per frame; x real time = 1e6 / figure at 1 Hz.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class SoftSensorBench {
  @Param({"catalyst-ageing", "fuel-surge"})
  public String recording;

  private final List<Frame> frames = new ArrayList<>();
  private ReactorSoftSensor sensor;
  private int k;
  private long cycle;
  private long spanS;

  @Setup
  public void setup() throws Exception {
    var unit = UnitConfigLoader.load(Path.of("config/plateward.toml"));
    try (var src = ReplayFrameSource.open(Path.of("replay-data", recording + ".csv"))) {
      Frame f;
      while ((f = src.next()) != null) {
        frames.add(f);
      }
    }
    spanS = frames.get(frames.size() - 1).time().getEpochSecond() - frames.get(0).time().getEpochSecond() + 1;
    sensor = new ReactorSoftSensor(unit, SoftSensorSettings.defaults(), FilterSettings.defaults());
  }

  @Benchmark
  public Estimate frame() {
    Frame f = frames.get(k);
    if (++k == frames.size()) {
      k = 0;
      cycle++;
    }
    if (cycle > 0) {
      Instant t = f.time().plusSeconds(cycle * spanS);
      f = new Frame(t, f.valuesSi(), f.quality());
    }
    return sensor.accept(f);
  }
}
