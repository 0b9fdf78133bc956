package org.plateward.advisor;

import org.plateward.reactor.ModelParameters;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.StateLayout;

/**
 * The part of the soft sensor's posterior mean the advisor forecasts from: the cell enthalpies
 * (the filter stores e/C, C the plate's sensible heat capacity per area) and the parameters.
 *
 * @param enthalpyJPerM2 plate enthalpy per cell on the soft sensor's grid, J/m2
 * @param parameters estimated model parameters
 */
public record PosteriorPlate(double[] enthalpyJPerM2, ModelParameters parameters) {

  public PosteriorPlate {
    enthalpyJPerM2 = enthalpyJPerM2.clone();
  }

  @Override
  public double[] enthalpyJPerM2() {
    return enthalpyJPerM2.clone();
  }

  /**
   * Reads the present posterior mean of {@code sensor}; forecast it on {@code sensor.model()}.
   *
   * @throws IllegalStateException before the soft sensor has started
   */
  public static PosteriorPlate of(ReactorSoftSensor sensor) {
    double[] x = sensor.state();
    if (x == null) {
      throw new IllegalStateException("the soft sensor has not started: no posterior to advise from");
    }
    StateLayout l = sensor.layout();
    double c = sensor.model().plate().sensibleJPerM2K();
    double[] e = new double[l.cells()];
    for (int j = 0; j < e.length; j++) {
      e[j] = x[j] * c; // e_j = C (e_j / C)
    }
    ModelParameters p = new ModelParameters(x[l.reformingActivity()], x[l.combustionActivity()], x[l.heatLoss()],
        x[l.heatTransfer()]);
    return new PosteriorPlate(e, p);
  }
}
