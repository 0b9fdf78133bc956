package org.plateward.advisor;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.plateward.estimation.FilterSettings;
import org.plateward.plant.PlantSample;
import org.plateward.plant.SimulatedPlant;
import org.plateward.signals.Signal;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.ReactorDynamics;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.SoftSensorSettings;

class EstimateDrivenTrimTest {
  /** config/plateward.toml [alarms.peak_high]: 1110 degC, a design value of the invented demo unit. */
  private static final double PEAK_HIGH_K = 1110.0 + 273.15;

  @Test
  void closedLoopInSimulationFromTheSoftSensorsPosterior() throws Exception {
    // simulation only, not perfect information: the soft sensor (80 cells, nominal Nusselt
    // 7.541) runs over the fuel-surge plant's readings to 23 min (surge from 20 min, 2 min ramp);
    // the advisor forecasts from its posterior mean with 2 sigma of its peak; the truth is the
    // plant's 200-cell plate (Nusselt 7.9) run on with the scheduled inputs and the trimmed fuel
    FuelSurgeTwin fx = new FuelSurgeTwin();
    ReactorSoftSensor sensor = new ReactorSoftSensor(fx.unit, SoftSensorSettings.defaults(), FilterSettings.defaults());
    SimulatedPlant plant = new SimulatedPlant(fx.unit, fx.scenario);
    Estimate est = null;
    PlantSample last = null;
    while (plant.hasNext()) {
      last = plant.next();
      est = sensor.accept(last.frame());
      if (last.timeS() >= 23 * 60) {
        break;
      }
    }
    double t = last.timeS();
    // the advisor sees the measured inputs, as the soft sensor does
    var u = ReactorDynamics.operatingPoint(measuredInputs(last));
    PosteriorPlate post = PosteriorPlate.of(sensor);
    TrimSettings set = TrimSettings.defaults(PEAK_HIGH_K);
    FuelTrimAdvisor advisor = new FuelTrimAdvisor(sensor.model(), set);
    TrimSuggestion s = advisor.consider(t, post.enthalpyJPerM2(), u, post.parameters(), est.peakPlateTempSdK())
        .orElseThrow();
    System.out.printf("estimate at %.0f s: peak %.1f K (sd %.1f K, truth %.1f K), status %s%n%s%n", t,
        est.peakPlateTempK(), est.peakPlateTempSdK(), last.truth().peakPlateTempK(), est.status(), s.message());
    double hold = FuelSurgeTwin.truePeakMaxK(plant.plate(), plant.schedule(), fx.scenario, t, 0.0, set.horizonS());
    double trimmed = FuelSurgeTwin.truePeakMaxK(plant.plate(), plant.schedule(), fx.scenario, t, s.trim(), set.horizonS());
    System.out.printf("closed loop from the posterior: trim %.2f %%, true peak max hold %.1f K, trimmed %.1f K, limit %.1f K%n",
        100 * s.trim(), hold, trimmed, PEAK_HIGH_K);
    assertThat(s.verdict()).isEqualTo(TrimVerdict.TRIM);
    assertThat(s.trim()).isBetween(set.minTrim(), 0.0);
    assertThat(hold).isGreaterThan(PEAK_HIGH_K);
    assertThat(trimmed).isLessThan(PEAK_HIGH_K);

    // the same question with the sigma-point spread of the whole posterior (SpreadForecast):
    // the upper bound is mean + 2 sigma of the forecast peak over the points; the trim it
    // suggests must also keep the plant's true peak below the limit, within the bounds
    FuelTrimAdvisor spreadAdvisor = new FuelTrimAdvisor(sensor.model(), set);
    java.lang.management.ThreadMXBean cpu = java.lang.management.ManagementFactory.getThreadMXBean();
    long c0 = cpu.getCurrentThreadCpuTime();
    TrimSuggestion ss = spreadAdvisor.evaluate(t, PosteriorBelief.of(sensor), u);
    double costMs = (cpu.getCurrentThreadCpuTime() - c0) / 1e6;
    double trimmedSpread = FuelSurgeTwin.truePeakMaxK(plant.plate(), plant.schedule(), fx.scenario, t, ss.trim(),
        set.horizonS());
    System.out.printf("sigma-point advisor: %s trim %.2f %%, hold peak %.1f K +- %.1f K, trimmed upper %.1f K,"
        + " true peak max trimmed %.1f K; %d sigma points, %.0f ms thread CPU%n%s%n", ss.verdict(), 100 * ss.trim(),
        ss.hold().peakTempK(), ss.hold().peakSdK(), ss.trimmed().peakUpperK(), trimmedSpread,
        spreadAdvisor.lastSigmaPoints().size(), costMs, ss.message());
    assertThat(ss.verdict()).isEqualTo(TrimVerdict.TRIM);
    assertThat(ss.trim()).isBetween(set.minTrim(), 0.0);
    assertThat(ss.trimmed().peakUpperK()).isLessThanOrEqualTo(PEAK_HIGH_K + 1e-9);
    assertThat(trimmedSpread).isLessThan(PEAK_HIGH_K);
  }

  private static double[] measuredInputs(PlantSample s) {
    Signal[] in = {Signal.REF_GAS_FLOW, Signal.REF_STEAM_FLOW, Signal.REF_INLET_TEMP, Signal.REF_PRESSURE,
        Signal.FUEL_FLOW, Signal.AIR_FLOW, Signal.COMB_INLET_TEMP, Signal.COMB_PRESSURE};
    double[] u = new double[in.length];
    for (int k = 0; k < in.length; k++) {
      u[k] = s.frame().valueSi(in[k]); // OperatingPoint record order
    }
    return u;
  }
}
