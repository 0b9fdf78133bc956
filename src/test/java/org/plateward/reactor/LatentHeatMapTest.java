package org.plateward.reactor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class LatentHeatMapTest {
  final LatentHeatMap map = new LatentHeatMap(8552.0, 1.11e6, 1357.77, 2.0, 298.15);

  @Test
  void temperatureAndEnthalpyAreInverseEverywhere() {
    for (double t = 1300.0; t < 1400.0; t += 0.0137) {
      assertThat(map.tempK(map.enthalpy(t))).isCloseTo(t, within(1e-9));
    }
  }

  @Test
  void halfMeltedAtTheMeltingPointAndFullyMeltedAtTheBandTop() {
    assertThat(map.meltFraction(map.enthalpy(1357.77))).isCloseTo(0.5, within(1e-12));
    assertThat(map.meltFraction(map.enthalpy(1358.77))).isEqualTo(1.0);
    assertThat(map.meltFraction(map.enthalpy(1356.77))).isEqualTo(0.0);
  }

  @Test
  void heatCapacityIsContinuousAtBothBandEdges() {
    // the smooth step makes de/dT continuous: C on both sides of each edge
    double h = 1e-6;
    for (double edge : new double[] {1356.77, 1358.77}) {
      double below = (map.enthalpy(edge) - map.enthalpy(edge - h)) / h;
      double above = (map.enthalpy(edge + h) - map.enthalpy(edge)) / h;
      assertThat(above).isCloseTo(below, within(1e-3 * below + 0.02 * 1.11e6 * h));
      assertThat(below).isCloseTo(8552.0, within(5.0));
    }
  }

  @Test
  void latentPartEqualsLambda() {
    assertThat(map.meltEnd() - map.meltStart() - 8552.0 * 2.0).isCloseTo(1.11e6, within(1e-6));
  }
}
