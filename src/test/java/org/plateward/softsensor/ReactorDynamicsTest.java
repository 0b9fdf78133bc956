package org.plateward.softsensor;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.plateward.config.UnitConfigLoader;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.PlateReactorModel;
import org.plateward.reactor.SteadyStateSolver;
import org.plateward.reactor.SteadySummary;
import org.plateward.reactor.UnitSpec;

/**
 * The soft sensor's dynamics: the held Jacobian (structured differences over the cells, one
 * evaluation per parameter, analytic lag rows) against plain central differences of f over
 * every state (PITFALLS §3.9: check Jacobians against central differences), and the steady
 * state as a fixed point (f = 0 at the solver's answer: a conservation check).
 */
class ReactorDynamicsTest {

  @Test
  void heldJacobianMatchesCentralDifferences() throws Exception {
    UnitSpec unit = UnitConfigLoader.load(Path.of("config/plateward.toml")).withGrid(org.plateward.reactor.GridSpec.uniform(20));
    PlateReactorModel model = new PlateReactorModel(unit);
    StateLayout layout = new StateLayout(20, 1);
    ReactorDynamics dyn = new ReactorDynamics(model, layout, new double[] {10, 10, 15, 15}, 60, 3);
    ModelParameters p = ModelParameters.nominal(unit);
    double[] e = new double[20];
    model.uniformState(SteadySummary.HOT_START_K, e);
    e = new SteadyStateSolver(model).solve(unit.operatingPoint(), p, e).enthalpyJPerM2();
    int n = layout.size();
    double[] x = new double[n];
    for (int j = 0; j < 20; j++) {
      x[j] = e[j] / dyn.capacityJPerM2K();
    }
    x[layout.reformingActivity()] = 1.0;
    x[layout.combustionActivity()] = 0.5;
    x[layout.heatLoss()] = 5.0;
    x[layout.heatTransfer()] = 1.0;
    for (int k = 0; k < 4; k++) {
      x[layout.lag(k)] = 900.0 + 10 * k;
    }
    double[] u = ReactorDynamics.inputs(unit.operatingPoint());
    double[] f = new double[n];
    double[][] j = new double[n][n];
    dyn.evaluate(x, u, f, j);
    // the cells are at their steady state: f_cells = 0 to the solver's tolerance
    for (int c = 0; c < 20; c++) {
      assertThat(Math.abs(f[c])).as("steady f of cell %d, K/s", c).isLessThan(1e-6);
    }
    double[] fp = new double[n];
    double[] fm = new double[n];
    double worst = 0.0;
    double scale = 0.0;
    for (int c = 0; c < n; c++) {
      double h = c < 20 ? 0.01 : Math.max(1e-4, 1e-4 * Math.abs(x[c]));
      double[] xp = x.clone();
      double[] xm = x.clone();
      xp[c] += h;
      xm[c] -= h;
      dyn.derivative(xp, u, fp);
      dyn.derivative(xm, u, fm);
      for (int r = 0; r < n; r++) {
        double central = (fp[r] - fm[r]) / (2 * h);
        worst = Math.max(worst, Math.abs(central - j[r][c]));
        scale = Math.max(scale, Math.abs(central));
      }
    }
    System.out.printf("held Jacobian vs central differences: max |diff| %.3e of max entry %.3e%n", worst, scale);
    assertThat(worst).isLessThan(1e-3 * scale);
  }
}
