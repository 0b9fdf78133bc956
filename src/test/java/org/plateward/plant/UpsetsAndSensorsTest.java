package org.plateward.plant;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.stat.descriptive.SummaryStatistics;
import org.junit.jupiter.api.Test;
import org.plateward.reactor.UnitSpec;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;
import org.plateward.signals.StatusName;

/**
 * The upsets do what their names say (on a coarse 40-cell truth grid, for speed), and the sensor
 * models match their definitions: sample statistics of the noise (Commons Math), the analytic
 * first-order step response, the analyzer's period and dead time, and each fault.
 */
class UpsetsAndSensorsTest {
  private static final int CELLS = 40;
  private final UnitSpec unit = PlantFixture.unit();

  private List<PlantSample> run(double durationS, List<ScenarioEvent> events) {
    SimulatedPlant plant = new SimulatedPlant(unit, PlantFixture.scenario(durationS, CELLS, events));
    List<PlantSample> out = new ArrayList<>();
    while (plant.hasNext()) {
      out.add(plant.next());
    }
    return out;
  }

  private static double peakC(PlantSample s) {
    return s.truth().peakPlateTempK() - 273.15;
  }

  @Test
  void feedDropAndFuelSurgeRaiseThePeakAndMoreSteamLowersIt() {
    double base = peakC(run(1, List.of()).get(0));
    double drop = peakC(last(run(900, List.of(PlantFixture.upset(EventKind.FEED_DROP, 60, 0.03, 60, 1e9)))));
    double surge = peakC(last(run(900, List.of(PlantFixture.upset(EventKind.FUEL_SURGE, 60, 0.03, 60, 1e9)))));
    double steam = peakC(last(run(900, List.of(PlantFixture.upset(EventKind.STEAM_TO_CARBON, 60, 3.5, 60, 1e9)))));
    // sensitivities of MODEL.md: ~10 K per 1 % feed, ~15 K per 1 % fuel (order of magnitude)
    assertThat(drop - base).isBetween(10.0, 80.0);
    assertThat(surge - base).isBetween(15.0, 120.0);
    assertThat(steam).isLessThan(base - 2.0);
  }

  @Test
  void upsetsShapeTheTrueInputsWithTheirRamps() {
    TruthSettings t = TruthSettings.defaults();
    ScenarioEvent drop = PlantFixture.upset(EventKind.FEED_DROP, 100, 0.10, 50, 300);
    ScenarioEvent inlet = new ScenarioEvent(EventKind.INLET_TEMP_STEP, 0, List.of(Signal.COMB_INLET_TEMP), null,
        -20.0, 0, 1e9, Double.NaN, Double.NaN);
    ScenarioEvent ageing = new ScenarioEvent(EventKind.CATALYST_AGEING, 100, List.of(), "reforming", 0.4, 0, 1e9,
        3600.0, Double.NaN);
    UpsetSchedule s = new UpsetSchedule(unit, t, List.of(drop, inlet, ageing));
    double gas0 = unit.operatingPoint().reformingGasFlowMolPerS();
    assertThat(s.inputsAt(100).reformingGasFlowMolPerS()).isEqualTo(gas0);
    assertThat(s.inputsAt(125).reformingGasFlowMolPerS()).isCloseTo(gas0 * 0.95, within(1e-12)); // half-way up the ramp
    assertThat(s.inputsAt(200).reformingGasFlowMolPerS()).isCloseTo(gas0 * 0.90, within(1e-12));
    assertThat(s.inputsAt(425).reformingGasFlowMolPerS()).isCloseTo(gas0 * 0.95, within(1e-12)); // ramping back
    assertThat(s.inputsAt(460).reformingGasFlowMolPerS()).isEqualTo(gas0);
    // steam-to-carbon held through a feed drop
    assertThat(s.inputsAt(200).steamFlowMolPerS() / s.inputsAt(200).reformingGasFlowMolPerS())
        .isCloseTo(unit.operatingPoint().steamFlowMolPerS() / gas0, within(1e-12));
    assertThat(s.inputsAt(10).combustionInletTempK()).isEqualTo(unit.operatingPoint().combustionInletTempK() - 20.0);
    // a(t) = a0 exp(-t/tau_bg) (1 - m (1 - exp(-(t - t0)/tau))), evaluated by hand at t0 + tau
    double expected = Math.exp(-3700.0 / t.reformingDeactivationTimeS()) * (1.0 - 0.4 * (1.0 - Math.exp(-1.0)));
    assertThat(s.parametersAt(3700).reformingActivity()).isCloseTo(expected, within(1e-12));
    assertThat(s.parametersAt(3700).heatLossCoefficientWPerM2K()).isEqualTo(t.heatLossWPerM2K());
  }

  @Test
  void noiseHasItsDocumentedSpreadAndZeroMean() {
    List<PlantSample> s = run(1200, List.of());
    SensorSuite suite = SensorSuite.defaults();
    for (Signal sig : List.of(Signal.REF_PRESSURE, Signal.FUEL_FLOW, Signal.REF_GAS_FLOW)) {
      SummaryStatistics st = new SummaryStatistics();
      for (PlantSample p : s) {
        st.addValue(sig.unit().fromSi(p.frame().valueSi(sig)) - sig.unit().fromSi(p.truth().boundarySi(sig)));
      }
      SensorSpec spec = suite.spec(sig);
      double sd = spec.relativeNoise() ? spec.noiseSd() * sig.unit().fromSi(s.get(0).truth().boundarySi(sig)) : spec.noiseSd();
      // quantisation adds q^2/12 to the variance (uniform rounding error)
      double expected = Math.sqrt(sd * sd + spec.quantum() * spec.quantum() / 12.0);
      // 1201 samples: the sample sd is within ~10 % of sigma with overwhelming probability
      assertThat(st.getStandardDeviation()).as(sig.id()).isCloseTo(expected, within(0.1 * expected));
      // the mean error is the meter's systematic error (its accuracy class, one draw per run):
      // inside 4 sigma of it, plus what the noise leaves of the mean
      double acc = spec.relativeNoise() ? spec.accuracySd() * sig.unit().fromSi(s.get(0).truth().boundarySi(sig)) : spec.accuracySd();
      assertThat(Math.abs(st.getMean())).as(sig.id())
          .isLessThan(4.0 * acc + 4.0 * expected / Math.sqrt(st.getN()) + spec.quantum());
    }
  }

  @Test
  void systematicMeterErrorIsHeldOverTheRun() {
    // the fuel meter's mean error over the first and the last 600 s of one run agree (a held
    // calibration offset)
    double[] firstLast = new double[2];
    List<PlantSample> s = run(1200, List.of());
    for (int half = 0; half < 2; half++) {
      SummaryStatistics st = new SummaryStatistics();
      for (PlantSample p : s.subList(half * 600, half * 600 + 600)) {
        st.addValue(p.frame().valueSi(Signal.FUEL_FLOW) / p.truth().boundarySi(Signal.FUEL_FLOW) - 1.0);
      }
      firstLast[half] = st.getMean();
    }
    // noise 0.5 % per frame: the mean of 600 frames is good to 0.02 % (1 sigma)
    assertThat(firstLast[1]).isCloseTo(firstLast[0], within(1e-3));
    assertThat(Math.abs(firstLast[0])).isLessThan(4 * 0.005 + 1e-3);
  }

  @Test
  void thermocoupleFollowsAFirstOrderLagAfterAnInletStep() {
    ScenarioEvent step = new ScenarioEvent(EventKind.INLET_TEMP_STEP, 100, List.of(Signal.REF_INLET_TEMP), null,
        30.0, 0, 1e9, Double.NaN, Double.NaN);
    List<PlantSample> s = run(200, List.of(step));
    double tau = SensorSuite.defaults().spec(Signal.REF_INLET_TEMP).lagS();
    // the level before the step as the thermocouple reads it (its systematic error cancels)
    double before = 0.0;
    for (int k = 70; k < 100; k++) {
      before += Signal.REF_INLET_TEMP.unit().fromSi(s.get(k).frame().valueSi(Signal.REF_INLET_TEMP)) / 30.0;
    }
    // average the noise out over 30 s: first-order response y = 30 (1 - exp(-(t - 100)/tau)) (analytic)
    // discretised exactly at 1 s: y_k = 30 (1 - (1 - alpha)^k), alpha = 1 - exp(-1/tau)
    double sumErr = 0.0;
    for (int k = 1; k <= 30; k++) {
      double y = Signal.REF_INLET_TEMP.unit().fromSi(s.get(100 + k).frame().valueSi(Signal.REF_INLET_TEMP)) - before;
      double analytic = 30.0 * (1.0 - Math.exp(-k / tau));
      sumErr += y - analytic;
    }
    assertThat(sumErr / 30.0).isCloseTo(0.0, within(3.0 * 1.0 / Math.sqrt(30) + 3.0 * 1.0 / Math.sqrt(30) + 0.1));
  }

  @Test
  void analyzerPublishesEveryPeriodAfterItsDeadTimeAndNothingInBetween() {
    List<PlantSample> s = run(300, List.of());
    SensorSuite suite = SensorSuite.defaults();
    int period = (int) suite.analyzerPeriodS();
    int dead = (int) suite.analyzerDeadTimeS();
    for (PlantSample p : s) {
      long k = p.index();
      boolean arrives = k >= dead && (k - dead) % period == 0;
      assertThat(p.frame().usable(Signal.REF_OUTLET_H2)).as("frame " + k).isEqualTo(arrives);
      if (!arrives) {
        assertThat(p.frame().quality(Signal.REF_OUTLET_H2)).isEqualTo(Quality.MISSING);
        assertThat(p.status().get(Signal.REF_OUTLET_H2))
            .isEqualTo(k < dead ? null : StatusName.UNCERTAIN_LAST_USABLE_VALUE);
      }
    }
  }

  @Test
  void faultsDriftStickSpikeAndDropOut() {
    Signal tc = Signal.PLATE_END_TEMP_REF_OUTLET;
    ScenarioEvent drift = new ScenarioEvent(EventKind.DRIFT, 100, List.of(tc), null, 1.0 / 60.0, 0, 600, Double.NaN, Double.NaN);
    ScenarioEvent stuck = new ScenarioEvent(EventKind.STUCK, 100, List.of(Signal.AIR_FLOW), null, Double.NaN, 0, 300, Double.NaN, Double.NaN);
    ScenarioEvent drop = new ScenarioEvent(EventKind.DROPOUT, 200, List.of(Signal.FUEL_FLOW), null, Double.NaN, 0, 60, Double.NaN, Double.NaN);
    ScenarioEvent spikes = new ScenarioEvent(EventKind.SPIKES, 0, List.of(Signal.REF_PRESSURE), null, 20_000.0, 0, 1e9, Double.NaN, 20.0);
    List<PlantSample> s = run(700, List.of(drift, stuck, drop, spikes));
    // drift: reading minus truth grows at 1 K/min; least-squares slope over 100..699 s (noise averages out)
    org.apache.commons.math3.stat.regression.SimpleRegression reg = new org.apache.commons.math3.stat.regression.SimpleRegression();
    for (int k = 100; k < 700; k++) {
      PlantSample p = s.get(k);
      reg.addData(p.timeS(), p.frame().valueSi(tc) - p.truth().boundarySi(tc));
    }
    assertThat(reg.getSlope() * 60.0).isCloseTo(1.0, within(0.02));
    // stuck: one value for the whole fault, Good status
    double held = s.get(100).frame().valueSi(Signal.AIR_FLOW);
    for (int k = 100; k < 400; k++) {
      assertThat(s.get(k).frame().valueSi(Signal.AIR_FLOW)).isEqualTo(held);
      assertThat(s.get(k).frame().quality(Signal.AIR_FLOW)).isEqualTo(Quality.GOOD);
    }
    assertThat(s.get(400).frame().valueSi(Signal.AIR_FLOW)).isNotEqualTo(held);
    // dropout: BAD and no value, exactly for its duration
    for (int k = 195; k < 265; k++) {
      boolean out = k >= 200 && k < 260;
      assertThat(s.get(k).frame().quality(Signal.FUEL_FLOW)).as("frame " + k).isEqualTo(out ? Quality.BAD : Quality.GOOD);
      assertThat(Double.isNaN(s.get(k).frame().valueSi(Signal.FUEL_FLOW))).isEqualTo(out);
    }
    // spikes of 20 kPa on a 0.3 kPa-noise signal: about one per 20 s, each single-frame
    int count = 0;
    for (PlantSample p : s) {
      if (Math.abs(p.frame().valueSi(Signal.REF_PRESSURE) - p.truth().boundarySi(Signal.REF_PRESSURE)) > 10_000.0) {
        count++;
      }
    }
    // Poisson-like count with mean 701/20 = 35: within +-4 sd (sd ~ 5.8)
    assertThat(count).isBetween(12, 58);
  }

  @Test
  void sameScenarioAndSeedGiveIdenticalFrames() {
    List<ScenarioEvent> ev = List.of(PlantFixture.upset(EventKind.FUEL_SURGE, 30, 0.05, 30, 1e9));
    List<PlantSample> a = run(120, ev);
    List<PlantSample> b = run(120, ev);
    for (int k = 0; k < a.size(); k++) {
      assertThat(a.get(k).frame()).isEqualTo(b.get(k).frame());
      assertThat(a.get(k).truth().peakPlateTempK()).isEqualTo(b.get(k).truth().peakPlateTempK());
    }
  }

  private static PlantSample last(List<PlantSample> s) {
    return s.get(s.size() - 1);
  }
}
