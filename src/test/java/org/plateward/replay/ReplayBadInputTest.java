package org.plateward.replay;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;
import org.plateward.signals.StatusName;

/** Every malformed input gives a ReplayFormatException reading file:line: column: message. */
class ReplayBadInputTest {
  private static final String F = "bad.csv";

  private static List<ReplayRecord> readAll(String text) throws IOException {
    try (ReplayReader r = ReplayReader.open(new StringReader(text), F)) {
      List<ReplayRecord> out = new ArrayList<>();
      r.forEachRemaining(out::add);
      return out;
    }
  }

  private static ReplayFormatException failure(String text) {
    Throwable t = org.assertj.core.api.Assertions.catchThrowable(() -> readAll(text));
    assertThat(t).isInstanceOf(ReplayFormatException.class);
    return (ReplayFormatException) t;
  }

  @Test
  void unknownHeaderColumnSuggestsTheClosestName() {
    var e = failure("# scenario=x\n\ntimestamp,ref_gas_flow_nm3h\n2026-03-04T05:06:07Z,1\n");
    assertThat(e.getMessage())
        .startsWith("bad.csv:3: ref_gas_flow_nm3h: unknown column; did you mean 'ref_gas_flow_nm3_h'?");
    assertThat(e.line()).isEqualTo(3);
    assertThat(e.column()).isEqualTo("ref_gas_flow_nm3h");
  }

  @Test
  void unknownStatusColumnSuggestsTheStatusOfTheSignal() {
    var e = failure("timestamp,fuel_flow_nm3_h,status_fuel_flow_nm3\n");
    assertThat(e.getMessage())
        .startsWith("bad.csv:1: status_fuel_flow_nm3: unknown column; did you mean 'status_fuel_flow_nm3_h'?");
  }

  @Test
  void farOffColumnGetsNoSuggestion() {
    var e = failure("timestamp,pressure\n");
    assertThat(e.getMessage()).startsWith("bad.csv:1: pressure: unknown column (expected");
  }

  @Test
  void missingTimestampColumn() {
    var e = failure("ref_gas_flow_nm3_h,fuel_flow_nm3_h\n1,2\n");
    assertThat(e.getMessage()).startsWith("bad.csv:1: timestamp: missing timestamp column");
  }

  @Test
  void timestampNotFirst() {
    var e = failure("fuel_flow_nm3_h,timestamp\n");
    assertThat(e.getMessage()).isEqualTo("bad.csv:1: timestamp: must be the first column (found as column 2)");
  }

  @Test
  void duplicateColumn() {
    var e = failure("timestamp,fuel_flow_nm3_h,air_flow_nm3_h,fuel_flow_nm3_h\n");
    assertThat(e.getMessage()).isEqualTo("bad.csv:1: fuel_flow_nm3_h: duplicate column");
  }

  @Test
  void statusWithoutItsValueColumn() {
    var e = failure("timestamp,status_fuel_flow_nm3_h\n");
    assertThat(e.getMessage()).isEqualTo(
        "bad.csv:1: status_fuel_flow_nm3_h: status column without the value column fuel_flow_nm3_h");
  }

  @Test
  void noHeaderRow() {
    assertThat(failure("# only a comment\n").getMessage()).isEqualTo("bad.csv:1: timestamp: no header row");
  }

  @Test
  void timestampGoingBackwards() {
    var e = failure("timestamp,fuel_flow_nm3_h\n2026-03-04T05:06:07Z,1\n2026-03-04T05:06:06Z,1\n");
    assertThat(e.getMessage()).isEqualTo(
        "bad.csv:3: timestamp: timestamp goes backwards: 2026-03-04T05:06:06Z after 2026-03-04T05:06:07Z");
  }

  @Test
  void duplicateTimestamp() {
    var e = failure("timestamp,fuel_flow_nm3_h\n2026-03-04T05:06:07Z,1\n# note\n2026-03-04T05:06:07.000Z,1\n");
    assertThat(e.getMessage()).startsWith("bad.csv:4: timestamp: duplicate timestamp 2026-03-04T05:06:07.000Z");
  }

  @Test
  void timestampWithoutUtcDesignator() {
    var e = failure("timestamp,fuel_flow_nm3_h\n2026-03-04T05:06:07+01:00,1\n");
    assertThat(e.getMessage()).startsWith("bad.csv:2: timestamp: '2026-03-04T05:06:07+01:00' is not an ISO 8601 UTC time");
    e = failure("timestamp,fuel_flow_nm3_h\n2026-03-04 05:06:07,1\n");
    assertThat(e.line()).isEqualTo(2);
  }

  @Test
  void nanInANumberCell() {
    var e = failure("timestamp,fuel_flow_nm3_h,air_flow_nm3_h\n2026-03-04T05:06:07Z,1.5,NaN\n");
    assertThat(e.getMessage()).startsWith("bad.csv:2: air_flow_nm3_h: 'NaN' is not a finite decimal number");
  }

  @Test
  void textInANumberCell() {
    var e = failure("timestamp,fuel_flow_nm3_h,truth_peak_plate_temp_c\n2026-03-04T05:06:07Z,1.5,hot\n");
    assertThat(e.getMessage()).startsWith("bad.csv:2: truth_peak_plate_temp_c: 'hot' is not a finite decimal number");
    for (String notANumber : List.of("Infinity", "0x1p3", "1d", "1e", "--1", " 1", "1e999")) {
      var e2 = failure("timestamp,fuel_flow_nm3_h\n2026-03-04T05:06:07Z," + notANumber + "\n");
      assertThat(e2.column()).as(notANumber).isEqualTo("fuel_flow_nm3_h");
    }
  }

  @Test
  void rowWithTooManyCells() {
    var e = failure("timestamp,fuel_flow_nm3_h\n2026-03-04T05:06:07Z,1\n2026-03-04T05:06:08Z,1,2\n");
    assertThat(e.getMessage()).isEqualTo("bad.csv:3: column 3: row has 3 cells, the header 2");
  }

  @Test
  void unknownStatusName() {
    var e = failure("timestamp,fuel_flow_nm3_h,status_fuel_flow_nm3_h\n2026-03-04T05:06:07Z,1,Bad_SensorFail\n");
    assertThat(e.getMessage()).isEqualTo(
        "bad.csv:2: status_fuel_flow_nm3_h: unknown OPC UA status name 'Bad_SensorFail'; did you mean 'Bad_SensorFailure'?");
  }

  @Test
  void shortRowIsReadAsMissingValuesAndCounted() throws IOException {
    String text = "timestamp,fuel_flow_nm3_h,air_flow_nm3_h,truth_time_to_exhaust_s\n"
        + "2026-03-04T05:06:07Z,1,2,30\n"
        + "2026-03-04T05:06:08Z,1\n"
        + "2026-03-04T05:06:09Z\n"
        + "2026-03-04T05:06:10Z,1,2,\n";
    try (ReplayReader r = ReplayReader.open(new StringReader(text), F)) {
      List<ReplayRecord> rows = new ArrayList<>();
      r.forEachRemaining(rows::add);
      assertThat(rows).hasSize(4);
      assertThat(r.partialRowCount()).isEqualTo(2);
      assertThat(r.rowCount()).isEqualTo(4);
      ReplayRecord shortRow = rows.get(1);
      assertThat(shortRow.line()).isEqualTo(3);
      assertThat(shortRow.frame().quality(Signal.FUEL_FLOW)).isEqualTo(Quality.GOOD);
      assertThat(shortRow.frame().quality(Signal.AIR_FLOW)).isEqualTo(Quality.MISSING);
      assertThat(shortRow.frame().valueSi(Signal.AIR_FLOW)).isNaN();
      assertThat(shortRow.truth(ReplayColumns.TRUTH_TIME_TO_EXHAUST_S)).isNaN();
      assertThat(rows.get(0).truth(ReplayColumns.TRUTH_TIME_TO_EXHAUST_S)).isEqualTo(30.0);
      // a trailing empty cell is a full row with an empty (missing) truth value
      assertThat(rows.get(3).truth().get(ReplayColumns.TRUTH_TIME_TO_EXHAUST_S)).isNaN();
    }
  }

  @Test
  void emptyCellIsMissingWithNaNAndStatusSetsTheSeverityOfFilledValues() throws IOException {
    String text = "\uFEFF# scenario=feed-drop seed=7 model=0.1.0\n"
        + "timestamp,ref_outlet_temp_c,status_ref_outlet_temp_c,comb_outlet_temp_c,status_comb_outlet_temp_c,fuel_flow_nm3_h\n"
        + "2026-03-04T05:06:07.250Z,850,Uncertain_SensorNotAccurate,,Bad_NoCommunication,\n"
        + "2026-03-04T05:06:08Z,851,Bad_SensorFailure,700,,3\n";
    try (ReplayReader r = ReplayReader.open(new StringReader(text), F)) {
      assertThat(r.header().metadata()).containsEntry("scenario", "feed-drop").containsEntry("seed", "7")
          .containsEntry("model", "0.1.0");
      ReplayRecord a = r.next();
      assertThat(a.frame().time()).isEqualTo(java.time.Instant.parse("2026-03-04T05:06:07.250Z"));
      // T/K = t/degC + 273.15 (SI brochure)
      assertThat(a.frame().valueSi(Signal.REF_OUTLET_TEMP)).isEqualTo(1123.15);
      assertThat(a.frame().quality(Signal.REF_OUTLET_TEMP)).isEqualTo(Quality.UNCERTAIN);
      assertThat(a.frame().quality(Signal.COMB_OUTLET_TEMP)).isEqualTo(Quality.MISSING);
      assertThat(a.frame().valueSi(Signal.COMB_OUTLET_TEMP)).isNaN();
      assertThat(a.status()).containsEntry(Signal.COMB_OUTLET_TEMP, StatusName.BAD_NO_COMMUNICATION);
      assertThat(a.frame().quality(Signal.FUEL_FLOW)).isEqualTo(Quality.MISSING);
      assertThat(a.frame().quality(Signal.AIR_FLOW)).isEqualTo(Quality.MISSING); // no column at all
      ReplayRecord b = r.next();
      assertThat(b.frame().quality(Signal.REF_OUTLET_TEMP)).isEqualTo(Quality.BAD);
      assertThat(b.frame().quality(Signal.COMB_OUTLET_TEMP)).isEqualTo(Quality.GOOD);
      assertThat(r.hasNext()).isFalse();
    }
  }
}
