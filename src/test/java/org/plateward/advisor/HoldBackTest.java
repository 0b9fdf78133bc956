package org.plateward.advisor;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.plateward.Advisory;
import org.plateward.config.PlatewardConfig;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.PlateReactorModel;
import org.plateward.reactor.SteadyStateSolver;
import org.plateward.reactor.SteadySummary;
import org.plateward.reactor.UnitSpec;

class HoldBackTest {
  /** config/plateward.toml [alarms.peak_high]: 1110 degC, a design value of the invented demo unit. */
  private static final double PEAK_HIGH_K = 1110.0 + 273.15;

  @Test
  void anUntrustworthyEstimateGetsNoTrimOnlyItsReason() throws Exception {
    UnitSpec unit = PlatewardConfig.load(Path.of("config", "plateward.toml")).unit();
    PlateReactorModel model = new PlateReactorModel(unit);
    double[] hot = new double[model.cells()];
    model.uniformState(SteadySummary.HOT_START_K, hot);
    double[] steady = new SteadyStateSolver(model).solve(unit.operatingPoint(), ModelParameters.nominal(unit), hot)
        .enthalpyJPerM2();
    FuelTrimAdvisor advisor = new FuelTrimAdvisor(model, TrimSettings.defaults(PEAK_HIGH_K));

    String why = "innovations inconsistent (NIS 41.2 over 12 dof)";
    TrimSuggestion held = advisor.holdBack(0.0, why).orElseThrow();
    assertThat(held.verdict()).isEqualTo(TrimVerdict.HELD_BACK);
    assertThat(held.trim()).isZero();
    assertThat(held.hold()).isNull();
    assertThat(held.message()).contains("no fuel-trim suggestion").contains(why).contains(Advisory.SHORT)
        .doesNotContain("trim combustion fuel by");
    // the same reason again: nothing new; another reason: said at once
    assertThat(advisor.holdBack(10.0, why)).isEmpty();
    assertThat(advisor.holdBack(20.0, "inputs stale").orElseThrow().reason()).isEqualTo("inputs stale");

    // trust returns 10 s later: the advisor speaks at once (no minimum interval after a hold-back)
    Optional<TrimSuggestion> back = advisor.consider(30.0, steady, unit.operatingPoint(), ModelParameters.nominal(unit),
        5.0);
    assertThat(back).isPresent();
    assertThat(back.get().verdict()).isEqualTo(TrimVerdict.NO_TRIM_NEEDED);
    // and a hold-back withdraws a standing suggestion at once, inside the minimum interval
    assertThat(advisor.holdBack(35.0, why)).isPresent();
  }
}
