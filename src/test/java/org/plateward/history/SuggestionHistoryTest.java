package org.plateward.history;

import static org.assertj.core.api.Assertions.assertThat;
import static org.plateward.history.HistoryFixtures.T0;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SuggestionHistoryTest {
  @TempDir Path dir;

  private static SuggestionRow row(int k) {
    return new SuggestionRow(T0.plusSeconds(30L * k), k % 2 == 0 ? "trim" : "held_back", -2.0 - 0.125 * k,
        1383.15, 1418.25 + k, 1382.5, 1.0, 0.875, 0.994, 0.989, k % 2 == 0 ? 900.0 : Double.NaN,
        "ADVISORY: trim combustion fuel by -2.0 %\n  hold ... (" + k + ")", "ADVISORY");
  }

  @Test
  void suggestionsRoundTripForAPeriod() throws Exception {
    Path file = dir.resolve("h.db");
    try (HistoryRecorder r = HistoryRecorder.start(HistoryFixtures.settings(file))) {
      for (int k = 0; k < 5; k++) {
        assertThat(r.appendSuggestion(row(k))).isTrue();
      }
      assertThat(r.flush(Duration.ofSeconds(10))).isTrue();
      assertThat(r.health().ok()).as(r.health().reason()).isTrue();
    }
    try (HistoryReader h = HistoryReader.open(file)) {
      // [from, to): rows 1, 2, 3 (30, 60, 90 s); NaN comes back as NaN (stored as NULL)
      List<SuggestionRow> got = h.suggestions(T0.plusSeconds(30), T0.plusSeconds(120));
      assertThat(got).containsExactly(row(1), row(2), row(3));
    }
    // independent check with plain SQL: the label is stored in every row
    assertThat(HistoryFixtures.count(file, "SELECT count(*) FROM advisor_suggestions WHERE label = 'ADVISORY'"))
        .isEqualTo(5);
    assertThat(HistoryFixtures.count(file, "SELECT max(version) FROM schema_version")).isEqualTo(2);
  }

  @Test
  void migratingAVersionOneFileKeepsEveryEarlierRow() throws Exception {
    Path file = dir.resolve("v1.db");
    try (HistoryRecorder r = HistoryRecorder.start(HistoryFixtures.settings(file),
        new SchemaMigrator(List.of(HistorySchema.V1)))) {
      for (int k = 0; k < 3; k++) {
        r.appendFrame(HistoryFixtures.frame(T0.plusSeconds(k)));
        r.appendEstimate(HistoryFixtures.estimate(T0.plusSeconds(k), 12));
      }
      r.appendOperatorAction(new OperatorActionRow(T0, "op", "acknowledge", "peak_high", null, null));
      assertThat(r.flush(Duration.ofSeconds(10))).isTrue();
    }
    assertThat(HistoryFixtures.count(file, "SELECT max(version) FROM schema_version")).isEqualTo(1);
    List<EstimateRow> before;
    try (HistoryRecorder r = HistoryRecorder.start(HistoryFixtures.settings(file))) {
      assertThat(r.health().ok()).as(r.health().reason()).isTrue();
      r.appendSuggestion(row(0));
      assertThat(r.flush(Duration.ofSeconds(10))).isTrue();
    }
    assertThat(HistoryFixtures.count(file, "SELECT max(version) FROM schema_version")).isEqualTo(2);
    try (HistoryReader h = HistoryReader.open(file)) {
      // the rows written under version 1 read back as they were written
      assertThat(h.frames(T0, T0.plusSeconds(3))).hasSize(3);
      assertThat(h.frames(T0, T0.plusSeconds(3)).get(2)).isEqualTo(HistoryFixtures.frame(T0.plusSeconds(2)));
      before = h.estimates(T0, T0.plusSeconds(3));
      assertThat(before).hasSize(3);
      for (int k = 0; k < 3; k++) {
        EstimateRow w = HistoryFixtures.estimate(T0.plusSeconds(k), 12);
        assertThat(before.get(k).time()).isEqualTo(w.time());
        assertThat(before.get(k).peakPlateTempK()).isEqualTo(w.peakPlateTempK());
        assertThat(before.get(k).status()).isEqualTo(w.status());
      }
      assertThat(h.operatorActions(T0, T0.plusSeconds(1))).hasSize(1);
      assertThat(h.suggestions(T0, T0.plusSeconds(1))).containsExactly(row(0));
    }
  }
}
