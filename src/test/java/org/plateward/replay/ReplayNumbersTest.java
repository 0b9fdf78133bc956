package org.plateward.replay;

import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigDecimal;
import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;

class ReplayNumbersTest {
  /**
   * The cell has 9 significant digits: it parses to the same number as the JDK formatter's
   * 9-significant-digit scientific notation ({@code %.8e}), a reference independent of our
   * BigDecimal path.
   */
  @Test
  void nineSignificantDigitsAgreeWithTheJdkFormatter() {
    Random rnd = new Random(20260304);
    for (int k = 0; k < 20_000; k++) {
      double v = (rnd.nextDouble() - 0.3) * Math.pow(10, rnd.nextInt(12) - 4);
      String cell = ReplayNumbers.format(v);
      assertThat(cell).doesNotContain("e", "E", ",");
      double reference = Double.parseDouble(String.format(Locale.ROOT, "%.8e", v));
      assertThat(Double.parseDouble(cell)).as("%s -> %s", v, cell).isEqualTo(reference);
      assertThat(new BigDecimal(cell).stripTrailingZeros().precision()).isLessThanOrEqualTo(9);
      assertThat(Math.abs(Double.parseDouble(cell) - v)).isLessThanOrEqualTo(5e-9 * Math.abs(v));
    }
  }

  @Test
  void exactAndSpecialValues() {
    assertThat(ReplayNumbers.format(850.0)).isEqualTo("850");
    assertThat(ReplayNumbers.format(-0.0)).isEqualTo("0");
    assertThat(ReplayNumbers.format(0.1)).isEqualTo("0.1");
    assertThat(ReplayNumbers.format(101.325)).isEqualTo("101.325");
    assertThat(ReplayNumbers.format(1.0 / 3.0)).isEqualTo("0.333333333");
    assertThat(ReplayNumbers.format(123456789012.0)).isEqualTo("123456789000");
    assertThat(ReplayNumbers.format(Double.NaN)).isEmpty();
  }

  @Test
  void parseAcceptsDecimalsAndRejectsEverythingElse() {
    assertThat(ReplayNumbers.parse("1")).isEqualTo(1.0);
    assertThat(ReplayNumbers.parse("-1.5")).isEqualTo(-1.5);
    assertThat(ReplayNumbers.parse(".5")).isEqualTo(0.5);
    assertThat(ReplayNumbers.parse("5.")).isEqualTo(5.0);
    assertThat(ReplayNumbers.parse("+2E+2")).isEqualTo(200.0);
    assertThat(ReplayNumbers.parse("1e-3")).isEqualTo(0.001);
    for (String bad : new String[] {"", ".", "-", "NaN", "Infinity", "0x1p3", "1d", "1f", "1e", "1e+", "--1", "1,0", " 1", "1 ", "1e999", "1.2.3"}) {
      assertThat(ReplayNumbers.parse(bad)).as("'%s'", bad).isNaN();
    }
  }
}
