package org.plateward.config;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

class SpellingTest {
  @Test
  void distanceMatchesTheTextbookExamples() {
    // kitten -> sitting needs 3 edits: the standard worked example of the Levenshtein distance
    assertThat(Spelling.distance("kitten", "sitting")).isEqualTo(3);
    // optimal string alignment counts an adjacent swap as one edit, but may not edit a
    // substring twice: d(ca, abc) = 3 (true Damerau-Levenshtein gives 2) [from memory]
    assertThat(Spelling.distance("ca", "abc")).isEqualTo(3);
    assertThat(Spelling.distance("widht", "width")).isEqualTo(1);
    assertThat(Spelling.distance("", "abc")).isEqualTo(3);
    assertThat(Spelling.distance("same", "same")).isZero();
  }

  @Test
  void suggestsOnlyCloseCandidates() {
    List<String> keys = List.of("length", "width", "reforming_gap", "combustion_gap");
    assertThat(Spelling.closest("widht", keys)).isEqualTo("width");
    assertThat(Spelling.closest("lenght", keys)).isEqualTo("length");
    assertThat(Spelling.closest("reformin_gap", keys)).isEqualTo("reforming_gap");
    assertThat(Spelling.closest("colour", keys)).isNull();
    assertThat(Spelling.closest("x", List.of())).isNull();
  }
}
