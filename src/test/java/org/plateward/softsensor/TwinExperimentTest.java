package org.plateward.softsensor;

import static org.assertj.core.api.Assertions.assertThat;

import org.assertj.core.api.SoftAssertions;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Twin experiments: the soft sensor on its own 80-cell grid (refined at the combustion front) against the plant simulator's
 * 200-cell truth (which also has a Nusselt number of 7.9 against the model's 7.541, a 6 % higher
 * heat loss and, in one recording, catalyst deactivation), on every committed recording.
 *
 * <p>Targets are those of issue 4; the reference is the simulation truth written into each
 * recording, and the χ² bands come from Commons Math's {@code ChiSquaredDistribution}. Every
 * figure is checked with soft assertions so one run reports all of them.
 */
class TwinExperimentTest {
  /*
   * Issue 4's targets NOT yet met (measured at commit time on the 80-cell front-refined grid,
   * recordings with the meters' systematic errors; the issue stays open for them): max-cell melt
   * fraction error <= 0.2 (feed-drop 0.61: the truth's hottest 3 mm cell melts to 0.61 while the
   * estimate peaks just below the band; fuel-surge 1.00 for a few seconds at the refreeze, which
   * the estimate makes about 40 s early); 2σ coverage <= 99 % (analyzer-outage and
   * catalyst-ageing 100 %); mean NEES of the peak inside its band (0.40 / 0.51 / 1.55 / 2.35 for
   * analyzer-outage / catalyst-ageing / feed-drop / fuel-surge: one draw of constant meter errors
   * per recording, so a single run's NEES is not an average over error draws). What is met is
   * asserted below, so a regression fails the build.
   */

  @ParameterizedTest(name = "{0}")
  @ValueSource(strings = {"feed-drop", "fuel-surge", "analyzer-outage", "catalyst-ageing"})
  void estimatorMeetsTheTargetsItMeetsOnEveryRecording(String recording) {
    TwinRun run = TwinRun.of(recording);
    TwinScore s = run.score;
    SoftAssertions soft = new SoftAssertions();
    soft.assertThat(s.scoredFrames()).as("scored frames").isGreaterThan(6000);
    // peak error after a 10-minute start-up: <= 10 K RMS (truth: the 200-cell plant)
    soft.assertThat(s.peakRmseK()).as("peak RMSE, K").isLessThanOrEqualTo(10.0);
    // <= 25 K max, the figure (measured 10.1 / 16.5 / 5.3 / 7.1 K in the order above)
    soft.assertThat(s.peakMaxErrorK()).as("peak max error, K").isLessThanOrEqualTo(25.0);
    // truth inside ±2σ in at least 85 % of frames overall and at least 70 % inside each upset
    // (measured overall 97.6 / 86.7 / 100 / 100 %, in the upsets 97.5 / 92.1 / 100 / 100 %)
    soft.assertThat(s.coverage()).as("2σ coverage overall").isGreaterThanOrEqualTo(0.85);
    for (TwinScore.Upset u : s.upsets()) {
      soft.assertThat(u.coverage()).as("2σ coverage in the upset at %.0f s", u.startS()).isGreaterThanOrEqualTo(0.70);
    }
    // overall melt fraction error <= 0.05
    soft.assertThat(s.maxOverallMeltError()).as("overall melt fraction error").isLessThanOrEqualTo(0.05);
    soft.assertAll();
  }
}
