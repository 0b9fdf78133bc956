package org.plateward.calibration;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.plateward.reactor.Grid;
import org.plateward.reactor.ModelEvaluation;
import org.plateward.reactor.ModelOutputs;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.PlateReactorModel;
import org.plateward.reactor.UnitSpec;

/**
 * The calibration model's heat-transfer multiplier m stands for the plant's Nusselt number over
 * the model's: h = m Nu k / D_h and k_m = m Sh D / D_h with Sh = Nu (heat and mass transfer
 * analogy), so a model with Nu 7.541 and m = 7.9 / 7.541 is the same function as one with
 * Nu 7.9 and m = 1 (exactly, up to rounding) — and is not when m scales heat transfer only.
 */
class MultiplierEquivalenceTest {
  @Test
  void multiplierOnHeatAndMassTransferEqualsAnotherNusseltNumber() {
    UnitSpec u = PlateauRecording.demoUnit();
    Grid g = Grid.uniform(u.geometry().lengthM(), 40);
    double m = 7.9 / PlateReactorModel.NUSSELT_UNIFORM_WALL_TEMP;
    PlateReactorModel both = new PlateReactorModel(u, g, PlateReactorModel.Options.DEFAULT);
    PlateReactorModel heatOnly = new PlateReactorModel(u, g, PlateReactorModel.Options.DEFAULT.withMultiplierOnHeatTransferOnly());
    PlateReactorModel plant = new PlateReactorModel(u, g, new PlateReactorModel.Options(7.9));
    ModelParameters p = ModelParameters.nominal(u);
    double[] e = new double[g.cells()];
    for (int j = 0; j < e.length; j++) {
      e[j] = plant.plate().enthalpyJPerM2(800.0 + 8.0 * j); // a warm, uneven profile, all lit
    }
    ModelEvaluation a = both.newEvaluation();
    ModelEvaluation b = plant.newEvaluation();
    ModelEvaluation c = heatOnly.newEvaluation();
    both.evaluate(e, u.operatingPoint(), p.withHeatTransferMultiplier(m), a);
    plant.evaluate(e, u.operatingPoint(), p, b);
    heatOnly.evaluate(e, u.operatingPoint(), p.withHeatTransferMultiplier(m), c);
    double worstBoth = 0.0;
    double worstHeatOnly = 0.0;
    for (int j = 0; j < e.length; j++) {
      double scale = Math.abs(b.enthalpyRateWPerM2(j)) + 1.0;
      worstBoth = Math.max(worstBoth, Math.abs(a.enthalpyRateWPerM2(j) - b.enthalpyRateWPerM2(j)) / scale);
      worstHeatOnly = Math.max(worstHeatOnly, Math.abs(c.enthalpyRateWPerM2(j) - b.enthalpyRateWPerM2(j)) / scale);
    }
    assertThat(worstBoth).isLessThan(1e-9);
    assertThat(worstHeatOnly).isGreaterThan(1e-6);
    for (int k = 0; k < ModelOutputs.COUNT; k++) {
      assertThat(a.output(k)).isCloseTo(b.output(k), org.assertj.core.data.Offset.offset(1e-9 * Math.abs(b.output(k)) + 1e-12));
    }
  }
}
