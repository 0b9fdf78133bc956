package org.plateward.alarms;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The lifecycle as a transition table: every state × every trigger, each allowed and each
 * refused transition.
 *
 * <p>Expected table written from the ANSI/ISA-18.2 / IEC 62682 alarm state transition diagram
 * (2009 edition, states A–G; REFERENCES.md §7, lettering [M], from memory): B on a new
 * condition from A or D; B→C on acknowledge, B→D on clear; C→A on clear; D→A on acknowledge,
 * D→B on a new condition; shelve, suppress and remove-from-service reach G, H, I from the
 * A–D group; leaving G, H, I goes back by the process condition.
 */
class AlarmLifecycleTest {
  private static final List<Trigger> COLUMNS = List.of(
      Trigger.CONDITION_ACTIVE, Trigger.CONDITION_CLEAR, Trigger.SUPPRESSION_STARTS,
      Trigger.SUPPRESSION_ENDS, Trigger.SHELF_EXPIRES, Trigger.ACKNOWLEDGE, Trigger.SHELVE,
      Trigger.UNSHELVE, Trigger.REMOVE_FROM_SERVICE, Trigger.RETURN_TO_SERVICE);

  // letters: a move; ".": stays, no event; "R": refused; "ret": back by the conditions
  //            active clear supp+ supp- expire ack  shelve unshelve remove return
  private static final String[] TABLE = {
      "A   B      .     H     .     R      R    G      R        I      R",
      "B   .      D     H     .     R      C    G      R        I      R",
      "C   .      A     H     .     R      R    G      R        I      R",
      "D   B      .     H     .     R      A    G      R        I      R",
      "G   .      .     .     .     ret    R    R      ret      I      R",
      "H   .      .     .     ret   R      R    R      R        I      R",
      "I   .      .     .     .     R      R    R      R        R      ret",
  };

  static Stream<Arguments> table() {
    List<Arguments> rows = new ArrayList<>();
    for (String line : TABLE) {
      String[] cells = line.trim().split("\\s+");
      AlarmState from = state(cells[0].charAt(0));
      for (int i = 0; i < COLUMNS.size(); i++) {
        rows.add(Arguments.of(from, COLUMNS.get(i), cells[i + 1]));
      }
    }
    assertThat(rows).hasSize(AlarmState.values().length * Trigger.values().length);
    return rows.stream();
  }

  private static AlarmState state(char letter) {
    for (AlarmState s : AlarmState.values()) {
      if (s.letter() == letter) {
        return s;
      }
    }
    throw new AssertionError(letter);
  }

  @ParameterizedTest(name = "{0} + {1} -> {2}")
  @MethodSource("table")
  void everyStateAndTrigger(AlarmState from, Trigger trigger, String expected) {
    // each cell is checked under all four combinations of condition and suppression; a cell
    // that is not "ret" must not depend on them except where the diagram says so
    for (boolean active : new boolean[] {false, true}) {
      for (boolean suppressed : new boolean[] {false, true}) {
        Transition t = AlarmLifecycle.next(from, trigger, active, suppressed);
        switch (expected) {
          case "." -> {
            assertThat(t.kind()).isEqualTo(Transition.Kind.STAY);
            assertThat(t.to()).isEqualTo(from);
          }
          case "R" -> {
            assertThat(t.kind()).isEqualTo(Transition.Kind.REFUSE);
            assertThat(t.to()).as("a refusal changes nothing").isEqualTo(from);
            assertThat(t.reason()).isNotBlank();
          }
          case "ret" -> {
            assertThat(t.kind()).isEqualTo(Transition.Kind.MOVE);
            // the end of a suppression is the one exit that ignores the suppression flag
            AlarmState back = suppressed && trigger != Trigger.SUPPRESSION_ENDS
                ? AlarmState.SUPPRESSED_BY_DESIGN
                : active ? AlarmState.UNACKNOWLEDGED : AlarmState.NORMAL;
            assertThat(t.to()).isEqualTo(back);
          }
          default -> {
            assertThat(t.kind()).isEqualTo(Transition.Kind.MOVE);
            assertThat(t.to()).isEqualTo(state(expected.charAt(0)));
          }
        }
        if (!trigger.byOperator() && trigger != Trigger.SHELF_EXPIRES) {
          assertThat(t.kind()).as("process and design triggers are never refused")
              .isNotEqualTo(Transition.Kind.REFUSE);
        }
      }
    }
  }
}
