package org.plateward.advisor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.plateward.estimation.FilterSettings;
import org.plateward.plant.SimulatedPlant;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.SoftSensorSettings;

class PosteriorPlateTest {
  @Test
  void readsTheSameTemperaturesAndParametersTheSoftSensorReports() throws Exception {
    // consistency with the soft sensor's own public read-outs: T_j = T(e_j) from our enthalpies
    // equals cellTempK(), and the parameters equal those of the estimate
    FuelSurgeTwin fx = new FuelSurgeTwin();
    ReactorSoftSensor sensor = new ReactorSoftSensor(fx.unit, SoftSensorSettings.defaults(), FilterSettings.defaults());
    assertThatThrownBy(() -> PosteriorPlate.of(sensor)).isInstanceOf(IllegalStateException.class)
        .hasMessageContaining("not started");
    SimulatedPlant plant = new SimulatedPlant(fx.unit, fx.scenario);
    Estimate est = null;
    long t0 = System.nanoTime();
    for (int k = 0; k < 120; k++) {
      est = sensor.accept(plant.next().frame());
    }
    System.out.printf("120 frames through the soft sensor in %.1f s%n", (System.nanoTime() - t0) / 1e9);
    PosteriorPlate post = PosteriorPlate.of(sensor);
    double[] tK = sensor.cellTempK();
    double[] e = post.enthalpyJPerM2();
    assertThat(e).hasSize(sensor.model().cells());
    for (int j = 0; j < e.length; j++) {
      assertThat(sensor.model().plate().tempK(e[j])).isCloseTo(tK[j], within(1e-9 * tK[j]));
    }
    assertThat(post.parameters().reformingActivity()).isEqualTo(est.reformingActivity());
    assertThat(post.parameters().combustionActivity()).isEqualTo(est.combustionActivity());
    assertThat(post.parameters().heatLossCoefficientWPerM2K()).isEqualTo(est.heatLossWPerM2K());
    assertThat(post.parameters().heatTransferMultiplier()).isEqualTo(est.heatTransferMultiplier());
  }
}
