package org.plateward.reactor;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** Conservation laws: atoms per channel and energy over the unit (a law, not a fit). */
class ModelConservationTest {
  /** A state far from steady, with one cell inside the buffer's mushy band. */
  static double[] transientState(PlateReactorModel m) {
    int n = m.cells();
    double[] e = new double[n];
    for (int j = 0; j < n; j++) {
      double z = m.grid().centreM(j);
      e[j] = m.plate().enthalpyJPerM2(850 + 420 * Math.sin(Math.PI * z / m.grid().lengthM()));
    }
    int mid = n / 2;
    e[mid] = 0.5 * (m.plate().meltStartJPerM2() + m.plate().meltEndJPerM2());
    return e;
  }

  @Test
  void atomsOfCarbonHydrogenOxygenNitrogenAreConservedInBothChannels() {
    PlateReactorModel m = new PlateReactorModel(DemoUnitFixture.spec(60));
    ModelEvaluation ev = m.newEvaluation();
    m.evaluate(transientState(m), m.spec().operatingPoint(), ModelParameters.nominal(m.spec()), ev);
    assertThat(UnitBalances.elementRelativeError(m, ev)).isLessThan(1e-9);
  }

  @Test
  void energyClosesForAStateInTransitIncludingPlateStorage() {
    PlateReactorModel m = new PlateReactorModel(DemoUnitFixture.refined(45));
    ModelParameters p = ModelParameters.nominal(m.spec());
    ModelEvaluation ev = m.newEvaluation();
    m.evaluate(transientState(m), m.spec().operatingPoint(), p, ev);
    assertThat(UnitBalances.energyRelativeError(m, ev, p)).isLessThan(1e-9);
    // and the state is really in transit: without storage the balance is far off
    assertThat(UnitBalances.steadyEnergyRelativeError(m, ev, p)).isGreaterThan(1e-3);
  }

  @Test
  void steadyStateClosesEnergyAndElements() {
    PlateReactorModel m = new PlateReactorModel(DemoUnitFixture.spec(60));
    SteadySummary s = SteadySummary.solve(m, m.spec().operatingPoint(), ModelParameters.nominal(m.spec()));
    assertThat(s.energyBalanceRelError()).isLessThan(1e-6);
    assertThat(s.elementBalanceRelError()).isLessThan(1e-9);
  }
}
