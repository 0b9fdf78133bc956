package org.plateward.reactor;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/**
 * The structured Jacobian (re-marching only downstream of the perturbed cell) must equal the
 * plain forward-difference Jacobian that re-evaluates the whole model per column.
 */
class StructuredJacobianTest {
  @Test
  void equalsBruteForceFiniteDifferencesIncludingOutputsAndAMeltingCell() {
    PlateReactorModel m = new PlateReactorModel(DemoUnitFixture.refined(40));
    ModelParameters p = ModelParameters.nominal(m.spec());
    OperatingPoint u = m.spec().operatingPoint();
    double[] e = ModelConservationTest.transientState(m);
    int n = m.cells();
    ModelEvaluation base = m.newEvaluation();
    m.evaluate(e, u, p, base);
    double[][] j = new double[n][n];
    double[][] h = new double[ModelOutputs.COUNT][n];
    m.jacobian(e, u, p, base, j, h);
    ModelEvaluation pert = m.newEvaluation();
    double step = 1e-3 * m.plate().sensibleJPerM2K();
    for (int c = 0; c < n; c++) {
      double[] e2 = e.clone();
      e2[c] += step;
      m.evaluate(e2, u, p, pert);
      for (int r = 0; r < n; r++) {
        double brute = (pert.enthalpyRateWPerM2(r) - base.enthalpyRateWPerM2(r)) / step;
        assertThat(j[r][c]).isCloseTo(brute, org.assertj.core.api.Assertions.within(1e-9 * (1 + Math.abs(brute))));
      }
      for (int r = 0; r < ModelOutputs.COUNT; r++) {
        double brute = (pert.output(r) - base.output(r)) / step;
        assertThat(h[r][c]).isCloseTo(brute, org.assertj.core.api.Assertions.within(1e-9 * (1 + Math.abs(brute))));
      }
    }
  }
}
