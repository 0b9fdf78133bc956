package org.plateward.plant;

import java.util.EnumMap;
import java.util.Map;
import org.plateward.signals.Signal;

/**
 * The sensor models of every boundary signal and the composition analyzer's timing.
 *
 * <p>The analyzer draws one sample of the outlet gases every {@code analyzerPeriodS} (at
 * t = 0, P, 2P, ...); its result is published {@code analyzerDeadTimeS} later, on that frame
 * only. A frame in between carries no analyzer value (an empty cell with status
 * Uncertain_LastUsableValue in the replay file; over OPC UA the variable keeps the last
 * sample's DataValue and SourceTimestamp). The value published at time t describes the gas
 * sampled at t - dead time.
 *
 * @param sensors one model per signal
 * @param analyzerPeriodS time between analyzer samples, s
 * @param analyzerDeadTimeS delay from sampling to publication, s
 */
public record SensorSuite(Map<Signal, SensorSpec> sensors, double analyzerPeriodS, double analyzerDeadTimeS) {
  /** Default analyzer sample period, s. */
  public static final double DEFAULT_ANALYZER_PERIOD_S = 30.0;
  /** Default analyzer dead time (sample line and column), s. */
  public static final double DEFAULT_ANALYZER_DEAD_TIME_S = 60.0;

  public SensorSuite {
    EnumMap<Signal, SensorSpec> m = new EnumMap<>(Signal.class);
    m.putAll(sensors);
    if (m.size() != Signal.COUNT) {
      throw new IllegalArgumentException("every signal needs a sensor model");
    }
    sensors = java.util.Collections.unmodifiableMap(m);
    if (!(analyzerPeriodS > 0.0) || !(analyzerDeadTimeS >= 0.0)) {
      throw new IllegalArgumentException("analyzer period must be positive and dead time non-negative");
    }
  }

  public SensorSpec spec(Signal s) {
    return sensors.get(s);
  }

  /**
   * The default sensors of the demo unit (typical instrument classes; common practice, no single
   * source): flow meters 0.5 % of reading (air 0.75 %), pressure transmitters 0.3 kPa,
   * thermocouples 1 K (gas outlets 1.5 K) with lags of 8 s (inlet gas), 10 s (outlet gas) and
   * 15 s (plate-end, sheathed in the plate), analyzer 0.05 to 0.2 mol%, temperatures
   * transmitted to 0.1 K, flows to 0.01 (air 0.1), compositions to 0.01 mol%.
   */
  public static SensorSuite defaults() {
    Map<Signal, SensorSpec> m = new EnumMap<>(Signal.class);
    m.put(Signal.REF_GAS_FLOW, new SensorSpec(0.005, true, 0.0, 0.01, 0.005));
    m.put(Signal.REF_STEAM_FLOW, new SensorSpec(0.005, true, 0.0, 0.01, 0.005));
    m.put(Signal.REF_INLET_TEMP, new SensorSpec(1.0, false, 8.0, 0.1, 1.0));
    m.put(Signal.REF_PRESSURE, new SensorSpec(0.3, false, 0.0, 0.1));
    m.put(Signal.FUEL_FLOW, new SensorSpec(0.005, true, 0.0, 0.01, 0.005));
    m.put(Signal.AIR_FLOW, new SensorSpec(0.0075, true, 0.0, 0.1, 0.005));
    m.put(Signal.COMB_INLET_TEMP, new SensorSpec(1.0, false, 8.0, 0.1, 1.0));
    m.put(Signal.COMB_PRESSURE, new SensorSpec(0.3, false, 0.0, 0.1));
    m.put(Signal.REF_OUTLET_TEMP, new SensorSpec(1.5, false, 10.0, 0.1));
    m.put(Signal.COMB_OUTLET_TEMP, new SensorSpec(1.5, false, 10.0, 0.1));
    m.put(Signal.REF_OUTLET_CH4, new SensorSpec(0.1, false, 0.0, 0.01));
    m.put(Signal.REF_OUTLET_CO, new SensorSpec(0.15, false, 0.0, 0.01));
    m.put(Signal.REF_OUTLET_CO2, new SensorSpec(0.1, false, 0.0, 0.01));
    m.put(Signal.REF_OUTLET_H2, new SensorSpec(0.2, false, 0.0, 0.01));
    m.put(Signal.COMB_OUTLET_O2, new SensorSpec(0.05, false, 0.0, 0.01));
    m.put(Signal.PLATE_END_TEMP_REF_INLET, new SensorSpec(1.0, false, 15.0, 0.1));
    m.put(Signal.PLATE_END_TEMP_REF_OUTLET, new SensorSpec(1.0, false, 15.0, 0.1));
    return new SensorSuite(m, DEFAULT_ANALYZER_PERIOD_S, DEFAULT_ANALYZER_DEAD_TIME_S);
  }

  /**
   * The same sensors with no systematic error (calibrated perfectly): for tests that isolate
   * what the noise alone does, or that check recovery of model parameters, which a meter offset
   * would bias (no fit from boundary data can tell a meter offset from a parameter).
   */
  public SensorSuite withoutSystematicErrors() {
    Map<Signal, SensorSpec> m = new java.util.EnumMap<>(Signal.class);
    for (Map.Entry<Signal, SensorSpec> e : sensors.entrySet()) {
      SensorSpec s = e.getValue();
      m.put(e.getKey(), new SensorSpec(s.noiseSd(), s.relativeNoise(), s.lagS(), s.quantum()));
    }
    return new SensorSuite(m, analyzerPeriodS, analyzerDeadTimeS);
  }

  public SensorSuite withAnalyzer(double periodS, double deadTimeS) {
    return new SensorSuite(sensors, periodS, deadTimeS);
  }
}
