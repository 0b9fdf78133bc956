package org.plateward.advisor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.plateward.config.PlatewardConfig;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.OperatingPoint;
import org.plateward.reactor.PlateReactorModel;
import org.plateward.reactor.SteadyStateSolver;
import org.plateward.reactor.SteadySummary;
import org.plateward.reactor.UnitSpec;

class TrimHysteresisTest {
  @Test
  void aTrimInForceIsWithdrawnOnlyBelowTheDeadbandAndNotWithinTheInterval() throws Exception {
    // the rule of TrimSettings (deadband 3 K, interval 120 s) checked on the demo unit's steady
    // state, whose held forecast is known exactly: a steady state does not move (f(e) = 0)
    UnitSpec unit = PlatewardConfig.load(Path.of("config", "plateward.toml")).unit();
    PlateReactorModel model = new PlateReactorModel(unit);
    ModelParameters p = ModelParameters.nominal(unit);
    OperatingPoint u = unit.operatingPoint();
    double[] e = new double[model.cells()];
    model.uniformState(SteadySummary.HOT_START_K, e);
    e = new SteadyStateSolver(model).solve(u, p, e).enthalpyJPerM2();
    TrimForecast f = new TrimForecast(model);
    f.setState(e, u, p);
    double holdUpper = f.forecast(0.0, 5.0, 2.0, 900).peakUpperK();
    double limit = holdUpper + 1.5; // holding is safe, but within the 3 K deadband
    TrimSettings set = new TrimSettings(-0.15, 0.0, limit, 2.0, 900.0, 3.0, 120.0, 0.005, 5e-4);

    FuelTrimAdvisor advisor = new FuelTrimAdvisor(model, set);
    TrimSuggestion first = advisor.consider(0.0, e, TrimForecast.trimmed(u, 0.06), p, 5.0).orElseThrow();
    assertThat(first.verdict()).isEqualTo(TrimVerdict.TRIM); // +6 % fuel heats the plate past the limit
    assertThat(advisor.consider(60.0, e, u, p, 5.0)).isEmpty(); // within 120 s: the suggestion stands
    assertThat(advisor.current()).isSameAs(first);

    Optional<TrimSuggestion> later = advisor.consider(200.0, e, u, p, 5.0);
    assertThat(later).isPresent();
    assertThat(later.get().verdict()).isEqualTo(TrimVerdict.TRIM); // not yet clearly safe
    assertThat(later.get().limitK()).isEqualTo(limit - 3.0);
    assertThat(later.get().trimmed().peakUpperK()).isLessThanOrEqualTo(limit - 3.0);

    TrimSuggestion fresh = new FuelTrimAdvisor(model, set).evaluate(200.0, e, u, p, 5.0);
    assertThat(fresh.verdict()).isEqualTo(TrimVerdict.NO_TRIM_NEEDED); // without a trim in force
  }

  @Test
  void badSettingsAreRefusedWithTheFieldNamed() {
    assertThatThrownBy(() -> new TrimSettings(0.05, 0.0, 1383.15, 2, 900, 3, 120, 0.005, 5e-4))
        .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("min_trim");
    assertThatThrownBy(() -> new TrimSettings(-0.15, 0.0, 1383.15, 2, 900, -1, 120, 0.005, 5e-4))
        .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("deadband");
    assertThatThrownBy(() -> new TrimSettings(-0.15, 0.0, 1383.15, 2, 0, 3, 120, 0.005, 5e-4))
        .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("horizon");
  }
}
