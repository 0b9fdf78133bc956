package org.plateward.signals;

import static org.assertj.core.api.Assertions.assertThat;

import org.eclipse.milo.opcua.stack.core.StatusCodes;
import org.junit.jupiter.api.Test;

class StatusNameTest {
  /** Every entry agrees with Milo's generated table of the OPC Foundation StatusCode.csv. */
  @Test
  void codesAgreeWithMiloStatusCodeTable() throws Exception {
    for (StatusName s : StatusName.values()) {
      if (s.text().equals("Good") || s.text().equals("Uncertain") || s.text().equals("Bad")) {
        continue; // the bare severities are not rows of the table
      }
      long milo = StatusCodes.class.getField(s.text()).getLong(null);
      assertThat(s.code()).as(s.text()).isEqualTo(milo);
      assertThat(StatusCodes.lookup(s.code()).orElseThrow()[0]).isEqualTo(s.text());
    }
  }

  @Test
  void severityFollowsBits31And30() {
    // 00 Good, 01 Uncertain, 10 Bad (OPC 10000-4 §7.39, REFERENCES.md §8)
    for (StatusName s : StatusName.values()) {
      Quality expected = s.text().startsWith("Good") ? Quality.GOOD
          : s.text().startsWith("Uncertain") ? Quality.UNCERTAIN : Quality.BAD;
      assertThat(s.quality()).as(s.text()).isEqualTo(expected);
    }
  }

  @Test
  void byTextFindsEveryNameAndNothingElse() {
    for (StatusName s : StatusName.values()) {
      assertThat(StatusName.byText(s.text())).isSameAs(s);
    }
    assertThat(StatusName.byText("bad_sensorfailure")).isNull();
    assertThat(StatusName.byText("Bad_Sensor")).isNull();
  }

  @Test
  void missingIsWaitingBeforeTheFirstValueAndNoCommunicationAfter() {
    assertThat(StatusName.forQuality(Quality.MISSING, false)).isEqualTo(StatusName.BAD_WAITING_FOR_INITIAL_DATA);
    assertThat(StatusName.forQuality(Quality.MISSING, true)).isEqualTo(StatusName.BAD_NO_COMMUNICATION);
    assertThat(StatusName.forQuality(Quality.BAD, true).code()).isEqualTo(0x808C0000L);
    assertThat(StatusName.forQuality(Quality.UNCERTAIN, true).code()).isEqualTo(0x40930000L);
  }
}
