package org.plateward.reactor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;

class GridTest {
  @Test
  void refinedGridCoversTheLengthAndIsFinerAtTheRefinementPoint() {
    Grid g = Grid.refined(0.6, 60, 4.0, 0.03, List.of(0.5));
    double sum = 0.0;
    for (int j = 0; j < g.cells(); j++) {
      assertThat(g.widthM(j)).isPositive();
      sum += g.widthM(j);
    }
    assertThat(sum).isCloseTo(0.6, within(1e-12));
    double atPoint = 0;
    double far = 0;
    for (int j = 0; j < g.cells(); j++) {
      if (g.faceM(j) <= 0.5 && g.faceM(j + 1) > 0.5) {
        atPoint = g.widthM(j);
      }
      if (g.faceM(j) <= 0.1 && g.faceM(j + 1) > 0.1) {
        far = g.widthM(j);
      }
    }
    // cell density ratio r = 4 at the point, 1 far away (up to the discrete mapping)
    assertThat(far / atPoint).isCloseTo(4.0, within(0.2));
  }

  @Test
  void uniformGridHasEqualCells() {
    Grid g = Grid.uniform(0.6, 7);
    for (int j = 0; j < 7; j++) {
      assertThat(g.widthM(j)).isCloseTo(0.6 / 7, within(1e-15));
    }
  }
}
