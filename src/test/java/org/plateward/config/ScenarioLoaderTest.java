package org.plateward.config;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.plateward.plant.EventKind;
import org.plateward.plant.Scenario;
import org.plateward.plant.ScenarioEvent;
import org.plateward.signals.Signal;

/** Scenario files: the committed ones load; each malformed fixture gives its file:line: field: message. */
class ScenarioLoaderTest {
  private static final Path DIR = Path.of("src", "test", "resources", "scenarios");

  private static List<String> errors(String fixture) {
    Path f = DIR.resolve(fixture);
    try {
      ScenarioLoader.load(f);
    } catch (InvalidConfigException e) {
      return e.errors().stream().map(ConfigError::format).toList();
    }
    throw new AssertionError(fixture + " loaded without error");
  }

  @Test
  void unknownEventKindNamesLineFieldAndSuggestion() {
    assertThat(errors("unknown-kind.toml")).containsExactly(
        DIR.resolve("unknown-kind.toml") + ":10: event[0].kind: unknown event kind \"fule_surge\"; did you mean \"fuel_surge\"?");
  }

  @Test
  void eventPastTheDurationIsRefused() {
    assertThat(errors("past-duration.toml")).containsExactly(
        DIR.resolve("past-duration.toml") + ":9: event[0].at: event past the duration: starts at \"90 min\" but the scenario ends at 1 h");
  }

  @Test
  void negativeFeedDropIsRefused() {
    assertThat(errors("negative-magnitude.toml")).singleElement().asString()
        .startsWith(DIR.resolve("negative-magnitude.toml") + ":11: event[0].magnitude: must be positive");
  }

  @Test
  void unknownTargetSignalGetsDidYouMean() {
    assertThat(errors("unknown-target.toml")).containsExactly(DIR.resolve("unknown-target.toml")
        + ":11: event[0].target: unknown target signal \"plate_end_temp_ref_outlt_c\"; did you mean \"plate_end_temp_ref_outlet_c\"?");
  }

  @Test
  void driftWithoutPerTimeIsRefused() {
    assertThat(errors("drift-not-a-rate.toml")).singleElement().asString()
        .contains(":12: event[0].magnitude: a drift is a rate");
  }

  @Test
  void missingSeedIsReportedAtTheTableHeader() {
    assertThat(errors("missing-seed.toml")).singleElement().asString()
        .startsWith(DIR.resolve("missing-seed.toml") + ":1: scenario.seed: missing");
  }

  @Test
  void everyProblemOfAFileIsReported() {
    List<String> e = errors("two-errors.toml");
    assertThat(e).hasSize(2);
    assertThat(e.get(0)).contains(":12: event[0].magnitude: must be positive");
    assertThat(e.get(1)).contains(":18: event[1].magnitude: stuck takes no magnitude");
  }

  @Test
  void missingFileIsAConfigError() {
    assertThatThrownBy(() -> ScenarioLoader.load(DIR.resolve("nope.toml")))
        .isInstanceOf(InvalidConfigException.class).hasMessageContaining("no such file");
  }

  @Test
  void committedScenariosLoadWithTheirUnitsConverted() throws Exception {
    List<Path> files;
    try (Stream<Path> s = Files.list(Path.of("config", "scenarios"))) {
      files = s.filter(p -> p.toString().endsWith(".toml")).sorted().toList();
    }
    assertThat(files).hasSizeGreaterThanOrEqualTo(4);
    for (Path f : files) {
      Scenario sc = ScenarioLoader.load(f);
      assertThat(sc.durationS()).as(f.toString()).isGreaterThanOrEqualTo(7200.0);
      assertThat(sc.samplePeriodS()).isEqualTo(1.0);
      for (ScenarioEvent ev : sc.events()) {
        assertThat(ev.atS()).as(f + " settles 15 min first").isGreaterThanOrEqualTo(900.0);
      }
    }
    Scenario outage = ScenarioLoader.load(Path.of("config", "scenarios", "analyzer-outage.toml"));
    ScenarioEvent drift = outage.events().stream().filter(e -> e.kind() == EventKind.DRIFT).findFirst().orElseThrow();
    assertThat(drift.targets()).containsExactly(Signal.PLATE_END_TEMP_REF_OUTLET);
    assertThat(drift.magnitude()).isEqualTo(0.5 / 60.0); // 0.5 K/min in K/s
    ScenarioEvent dropout = outage.events().stream().filter(e -> e.kind() == EventKind.DROPOUT).findFirst().orElseThrow();
    assertThat(dropout.targets()).hasSize(5).allMatch(s -> s.kind() == Signal.Kind.ANALYZER);
    assertThat(dropout.durationS()).isEqualTo(1200.0);
  }
}
