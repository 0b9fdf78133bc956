package org.plateward.softsensor;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Scenario-specific checks of issue 4 against the simulation truth of the committed recordings.
 * Event times are those of config/scenarios/*.toml (documented in replay-data/README.md).
 */
class ScenarioChecksTest {

  @Test
  void driftingPlateEndThermocoupleIsFlaggedWithinFifteenMinutes() {
    // analyzer-outage.toml: from 60 min the plate-end thermocouple at z = L drifts +0.5 K/min
    TwinRun run = TwinRun.of("analyzer-outage");
    double driftStartS = 3600.0;
    assertThat(run.drift).as("drift flags").isNotEmpty();
    var flag = run.drift.get(0);
    double raisedS = flag.raisedAtTimeS() - run.start.getEpochSecond();
    System.out.printf("drift flagged on channel %d at %.0f s, %.1f min after it began%n", flag.channel(), raisedS,
        (raisedS - driftStartS) / 60.0);
    assertThat(flag.channel()).as("flagged channel (3 = plate end z = L)").isEqualTo(3);
    assertThat(raisedS).isBetween(driftStartS, driftStartS + 15 * 60.0);
    // and the drifting channel carries no weight afterwards
    assertThat(run.at(6000).estimate().reason()).contains("plate_end_temp_ref_outlet_c drifting");
  }

  @Test
  void uncertaintyGrowsDuringTheAnalyzerOutageAndShrinksAfter() {
    // analyzer-outage.toml: every analyzer channel Bad 25–45 min; the analyzer is what pins the
    // reforming activity, so its σ must grow over the outage and fall once results return
    TwinRun run = TwinRun.of("analyzer-outage");
    double before = run.at(25 * 60 + 60).estimate().reformingActivitySd();
    double end = run.at(45 * 60).estimate().reformingActivitySd();
    double after = run.at(45 * 60 + 600).estimate().reformingActivitySd();
    System.out.printf("reforming activity sd: %.4f at 26 min, %.4f at 45 min, %.4f at 55 min%n", before, end, after);
    assertThat(end).isGreaterThan(before);
    assertThat(after).isLessThan(end);
  }

  @Test
  void reformingActivityTrackedWithinTenPercentOneHourIntoAgeing() {
    // catalyst-ageing.toml: from 15 min the reforming activity declines (45 %, τ = 1.5 h)
    TwinRun run = TwinRun.of("catalyst-ageing");
    for (double t : new double[] {3600.0, 15 * 60 + 3600.0}) {
      TwinRun.Row r = run.at(t);
      double truth = r.truth().get("truth_reforming_activity");
      double est = r.estimate().reformingActivity();
      System.out.printf("reforming activity at %.0f s: %.3f vs truth %.3f (%.1f %%)%n", t, est, truth,
          100 * (est - truth) / truth);
      assertThat(Math.abs(est - truth) / truth).isLessThanOrEqualTo(0.10);
    }
  }

  @Test
  void timeToFirstFullMeltLiesInsideItsForecastSpread() {
    // Issue 4 asks for 10 %: NOT met (measured at commit: 63 % of the 138 frames TwinScore scores
    // within 10 %, worst 29 %; over eight other plant seeds 0-82 %, since the melt-through time
    // moves some 15 % per 0.25 % of fuel and the meters' systematic errors are only partly
    // learnt); the issue stays open for it. Asserted: the truth lies
    // inside the forecast's own ±2σ in at least 95 % of the frames (its spread is honest), and
    // every frame is forecast (a number, not "none within the horizon").
    // fuel-surge.toml: +6 % fuel from 20 min (2 min ramp) for 20 min; the forecast holds the
    // present inputs, so it is scored once the ramp is over (from 22 min) while the truth lies
    // between 60 and 600 s
    TwinRun run = TwinRun.of("fuel-surge");
    List<String> outside = new ArrayList<>();
    int n = 0;
    int within10 = 0;
    for (TwinRun.Row r : run.rows) {
      Double truth = r.truth().get("truth_time_to_exhaust_s");
      Double melt = r.truth().get("truth_max_cell_melt_fraction");
      if (melt != null && melt >= 0.999) {
        break; // the first cell is through: "time until the first full melt" ends here
      }
      if (r.tS() < 22 * 60 || truth == null || !(truth >= 60 && truth <= 600)) {
        continue; // an empty truth cell reads as NaN
      }
      n++;
      double est = r.estimate().timeToExhaustS();
      double sd = r.estimate().timeToExhaustSdS();
      assertThat(est).as("forecast at %.0f s", r.tS()).isFinite();
      if (Math.abs(est - truth) <= 0.1 * truth) {
        within10++;
      }
      if (!(Math.abs(est - truth) <= 2.0 * sd)) {
        outside.add(String.format("t=%.0f s: %.0f ± %.0f vs %.0f", r.tS(), est, sd, truth));
      }
    }
    System.out.printf("time-to-exhaust: %d of %d frames within 10 %%; %d outside ±2σ: %s%n", within10, n,
        outside.size(), outside.size() > 8 ? outside.subList(0, 8) + " ..." : outside);
    assertThat(n).isGreaterThan(60);
    assertThat(outside.size()).isLessThanOrEqualTo(n / 20);
    // the summary's own count (its frames: flows held until the melt-through) agrees
    assertThat(run.score.exhaustInside2Sd()).isGreaterThanOrEqualTo(0.95);
  }
}
