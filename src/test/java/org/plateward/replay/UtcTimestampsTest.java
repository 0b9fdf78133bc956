package org.plateward.replay;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** The fast path agrees with the JDK's {@link Instant#parse} (the reference) on every text. */
class UtcTimestampsTest {
  @Test
  void agreesWithInstantParseOnRandomInstants() {
    Random rnd = new Random(8);
    for (int k = 0; k < 50_000; k++) {
      Instant t = Instant.ofEpochSecond(rnd.nextInt(Integer.MAX_VALUE) * 2L, rnd.nextInt(4) == 0 ? 0 : rnd.nextInt(1_000_000_000));
      String text = t.toString();
      assertThat(UtcTimestamps.parse(text)).as(text).isEqualTo(Instant.parse(text));
      String millis = text.length() > 20 ? text.substring(0, 20) + text.substring(20, 21) + "Z" : text;
      assertThat(UtcTimestamps.parse(millis)).as(millis).isEqualTo(Instant.parse(millis));
    }
  }

  @Test
  void rejectsWhatInstantParseRejects() {
    for (String bad : new String[] {"2026-02-30T00:00:00Z", "2026-13-01T00:00:00Z",
        "2026-03-04T05:06:07.1234567890Z", "2026-03-04T05:6:07Z", "2026-03-04T05:06:0xZ", "2026-03-04T05:06:07"}) {
      assertThatThrownBy(() -> Instant.parse(bad)).as(bad).isInstanceOf(DateTimeParseException.class);
      assertThatThrownBy(() -> UtcTimestamps.parse(bad)).as(bad).isInstanceOf(DateTimeParseException.class);
    }
  }

  @Test
  void acceptsTheJdkQuirksTheSameWay() {
    // Instant.parse takes 24:00, a leap second, "07.Z" and a lower-case 't'; so must we
    for (String odd : new String[] {"2026-03-04T24:00:00Z", "2026-03-04T23:59:60Z", "2026-03-04T05:06:07.Z",
        "2026-03-04t05:06:07Z"}) {
      assertThat(UtcTimestamps.parse(odd)).as(odd).isEqualTo(Instant.parse(odd));
    }
  }
}
