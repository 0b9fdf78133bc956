package org.plateward.config;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.plant.EventKind;
import org.plateward.plant.Scenario;
import org.plateward.plant.ScenarioEvent;
import org.plateward.signals.Signal;

/**
 * Every key of a scenario file reaches the plant in SI (conversions by the SI definitions:
 * 1 min = 60 s, 1 h = 3600 s, 1 % = 0.01).
 */
class ScenarioValuesTest {
  @Test
  void shippedFuelSurgeScenarioIsReadAsWritten() throws Exception {
    Scenario s = ScenarioLoader.load(Path.of("config/scenarios/fuel-surge.toml"));
    assertThat(s.name()).isEqualTo("fuel-surge");
    assertThat(s.seed()).isEqualTo(4102);
    assertThat(s.durationS()).isEqualTo(7200.0);
    assertThat(s.samplePeriodS()).isEqualTo(1.0);
    assertThat(s.truth().cells()).isEqualTo(200);
    assertThat(s.truth().nusselt()).isEqualTo(7.9);
    assertThat(s.truth().heatLossWPerM2K()).isCloseTo(5.3, within(1e-12));
    assertThat(s.truth().reformingDeactivationTimeS()).isCloseTo(4000 * 3600.0, within(1e-6));
    ScenarioEvent surge = s.events().get(0);
    assertThat(surge.kind()).isEqualTo(EventKind.FUEL_SURGE);
    assertThat(surge.atS()).isEqualTo(1200.0);
    assertThat(surge.magnitude()).isCloseTo(0.06, within(1e-12));
    assertThat(surge.rampS()).isEqualTo(120.0);
    assertThat(surge.durationS()).isEqualTo(1200.0);
    ScenarioEvent stuck = s.events().get(1);
    assertThat(stuck.kind()).isEqualTo(EventKind.STUCK);
    assertThat(stuck.targets()).containsExactly(Signal.AIR_FLOW);
    assertThat(stuck.atS()).isEqualTo(85 * 60.0);
    assertThat(stuck.durationS()).isEqualTo(600.0);
  }

  @Test
  void driftSpikesAgeingAndAnalyzerTargetsConvertToSi(@TempDir Path dir) throws Exception {
    Path f = dir.resolve("all.toml");
    Files.writeString(f, String.join("\n",
        "[scenario]", "name = \"all\"", "seed = 1", "start = \"2031-01-01T00:00:00Z\"", "duration = \"3 h\"",
        "sample_period = \"1 s\"",
        "[sensors]", "analyzer_period = \"45 s\"", "analyzer_dead_time = \"2 min\"",
        "[[event]]", "at = \"1 h\"", "kind = \"drift\"", "target = \"plate_end_temp_ref_outlet_c\"",
        "magnitude = \"0.5 K/min\"",
        "[[event]]", "at = \"10 min\"", "kind = \"spikes\"", "target = \"ref_outlet_temp_c\"", "magnitude = \"12 K\"",
        "interval = \"5 min\"",
        "[[event]]", "at = \"0 s\"", "kind = \"catalyst_ageing\"", "magnitude = \"30 %\"", "time_constant = \"2 h\"",
        "[[event]]", "at = \"25 min\"", "kind = \"dropout\"", "target = \"analyzer\"", "duration = \"20 min\"",
        "[[event]]", "at = \"30 min\"", "kind = \"inlet_temp_step\"", "target = \"comb_inlet_temp_c\"",
        "magnitude = \"-15 K\"", "ramp = \"1 min\"",
        ""));
    Scenario s = ScenarioLoader.load(f);
    assertThat(s.sensors().analyzerPeriodS()).isEqualTo(45.0);
    assertThat(s.sensors().analyzerDeadTimeS()).isEqualTo(120.0);
    List<ScenarioEvent> e = s.events();
    assertThat(e.get(0).magnitude()).as("0.5 K/min in K/s").isCloseTo(0.5 / 60.0, within(1e-15));
    assertThat(e.get(0).atS()).isEqualTo(3600.0);
    assertThat(e.get(1).magnitude()).isCloseTo(12.0, within(1e-12));
    assertThat(e.get(1).intervalS()).isEqualTo(300.0);
    assertThat(e.get(2).magnitude()).isCloseTo(0.30, within(1e-12));
    assertThat(e.get(2).timeConstantS()).isEqualTo(7200.0);
    assertThat(e.get(2).catalyst()).isEqualTo("reforming");
    assertThat(e.get(3).targets()).containsExactly(Signal.REF_OUTLET_CH4, Signal.REF_OUTLET_CO,
        Signal.REF_OUTLET_CO2, Signal.REF_OUTLET_H2, Signal.COMB_OUTLET_O2);
    assertThat(e.get(3).durationS()).isEqualTo(1200.0);
    assertThat(e.get(4).magnitude()).isCloseTo(-15.0, within(1e-12));
    assertThat(e.get(4).rampS()).isEqualTo(60.0);
    assertThat(e.get(4).targets()).containsExactly(Signal.COMB_INLET_TEMP);
  }
}
