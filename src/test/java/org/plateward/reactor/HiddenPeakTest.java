package org.plateward.reactor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Peak reconstruction is exact for a quadratic profile on any spacing (Lagrange interpolation). */
class HiddenPeakTest {
  @Test
  void recoversTheVertexOfAParabolaOnANonUniformGrid() {
    Grid g = Grid.refined(0.6, 37, 5.0, 0.02, List.of(0.47));
    int n = g.cells();
    double[] t = new double[n];
    double z0 = 0.4713;
    for (int j = 0; j < n; j++) {
      double dz = g.centreM(j) - z0;
      t[j] = 1300.0 - 2.0e4 * dz * dz;
    }
    HiddenPeak p = HiddenPeak.of(g, t);
    assertThat(p.positionM()).isCloseTo(z0, within(1e-9));
    assertThat(p.tempK()).isCloseTo(1300.0, within(1e-7));
  }

  @Test
  void endCellPeakIsTheEndValue() {
    Grid g = Grid.uniform(1.0, 10);
    double[] t = {10, 9, 8, 7, 6, 5, 4, 3, 2, 1};
    HiddenPeak p = HiddenPeak.of(g, t);
    assertThat(p.tempK()).isEqualTo(10.0);
    assertThat(p.cell()).isZero();
  }
}
