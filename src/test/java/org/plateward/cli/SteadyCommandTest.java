package org.plateward.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;

class SteadyCommandTest {
  @Test
  void jsonHasTheDocumentedKeysAndClosedBalances() throws Exception {
    PlatewardCommandTest.Run r = PlatewardCommandTest.run("steady", "--json", "--cells", "30");
    assertThat(r.exit()).isZero();
    JsonNode j = new ObjectMapper().readTree(r.out());
    for (String k : new String[] {"peak_plate_temp_c", "peak_position_m", "ref_outlet_temp_c", "comb_outlet_temp_c",
        "methane_conversion", "comb_methane_conversion", "buffer_melt_fraction", "energy_balance_rel_error",
        "element_balance_rel_error", "cells"}) {
      assertThat(j.has(k)).as(k).isTrue();
    }
    assertThat(j.get("cells").asInt()).isEqualTo(30);
    assertThat(j.get("energy_balance_rel_error").asDouble()).isLessThan(1e-6);
    assertThat(j.get("element_balance_rel_error").asDouble()).isLessThan(1e-9);
    assertThat(j.get("methane_conversion").asDouble()).isBetween(0.0, 1.0);
    assertThat(j.get("caution").asText()).contains("ADVISORY");
  }

  @Test
  void tableCarriesTheCautions() {
    PlatewardCommandTest.Run r = PlatewardCommandTest.run("steady", "--cells", "20");
    assertThat(r.exit()).isZero();
    assertThat(r.out()).contains("hidden peak plate temperature").contains("advisory").contains("never writes to the plant");
  }

  @Test
  void tooFewCellsIsABadArgument() {
    PlatewardCommandTest.Run r = PlatewardCommandTest.run("steady", "--cells", "2");
    assertThat(r.exit()).isEqualTo(2);
    assertThat(r.err()).contains("--cells").contains("at least 3");
  }
}
