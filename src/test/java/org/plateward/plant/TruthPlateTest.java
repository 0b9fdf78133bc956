package org.plateward.plant;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.plateward.reactor.ModelEvaluation;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.OperatingPoint;
import org.plateward.reactor.UnitBalances;
import org.plateward.reactor.UnitSpec;

/**
 * The truth plate and its integrator: conservation laws (energy, C/H/O/N atoms) at steady state
 * and through a transient, and time-step convergence of the linearly implicit step.
 */
class TruthPlateTest {
  private final UnitSpec unit = PlantFixture.unit();

  private OperatingPoint fuelStep(double factor) {
    OperatingPoint u = unit.operatingPoint();
    return new OperatingPoint(u.reformingGasFlowMolPerS(), u.steamFlowMolPerS(), u.reformingInletTempK(),
        u.reformingPressurePa(), u.fuelFlowMolPerS() * factor, u.airFlowMolPerS(), u.combustionInletTempK(),
        u.combustionPressurePa());
  }

  private ModelParameters truthParameters(TruthSettings t) {
    return ModelParameters.nominal(unit).withHeatLoss(t.heatLossWPerM2K());
  }

  @Test
  void steadyStartAndTransientCloseEnergyAndElementBalances() {
    TruthSettings t = TruthSettings.defaults();
    ModelParameters p = truthParameters(t);
    TruthPlate plate = new TruthPlate(unit, t, unit.operatingPoint(), p);
    ModelEvaluation ev = plate.evaluate(unit.operatingPoint(), p);
    // conservation of energy and atoms; same tolerances as the reduced-order model's tests
    assertThat(UnitBalances.energyRelativeError(plate.model(), ev, p)).isLessThan(1e-6);
    assertThat(UnitBalances.elementRelativeError(plate.model(), ev)).isLessThan(1e-9);

    // a 5 % fuel step: during the transient dE/dt is large, the storage-inclusive balance
    // H_in - H_out - Q_loss - dE/dt = 0 still holds at every frame (conservation of energy)
    OperatingPoint u = fuelStep(1.05);
    int n = plate.model().cells();
    double w = unit.geometry().widthM();
    double[] area = new double[n];
    for (int j = 0; j < n; j++) {
      area[j] = 2.0 * w * plate.model().grid().widthM(j);
    }
    double e0 = stored(plate.enthalpyJPerM2(), area);
    double integral = 0.0;
    double prevRate = storageRate(plate.evaluate(u, p), area);
    double maxRate = 0.0;
    for (int k = 0; k < 600; k++) {
      plate.advance(u, p, 1.0, 1);
      ev = plate.evaluate(u, p);
      assertThat(UnitBalances.energyRelativeError(plate.model(), ev, p)).as("frame " + k).isLessThan(1e-6);
      assertThat(UnitBalances.elementRelativeError(plate.model(), ev)).as("frame " + k).isLessThan(1e-9);
      double rate = storageRate(ev, area);
      maxRate = Math.max(maxRate, Math.abs(rate));
      integral += 0.5 * (rate + prevRate); // trapezoid of dE/dt over 1 s
      prevRate = rate;
    }
    double stored = stored(plate.enthalpyJPerM2(), area) - e0;
    assertThat(maxRate).as("a real transient").isGreaterThan(1.0);
    // the stored energy equals the time integral of the net inflow (first-order method, 1 s steps: 1 %)
    assertThat(stored).isCloseTo(integral, org.assertj.core.data.Percentage.withPercentage(1.0));
  }

  private static double stored(double[] e, double[] area) {
    double s = 0.0;
    for (int j = 0; j < e.length; j++) {
      s += e[j] * area[j];
    }
    return s;
  }

  private static double storageRate(ModelEvaluation ev, double[] area) {
    double s = 0.0;
    for (int j = 0; j < area.length; j++) {
      s += ev.enthalpyRateWPerM2(j) * area[j];
    }
    return s;
  }

  @Test
  void oneSecondStepsFollowEighthSecondStepsWithinOneKelvin() {
    // step response to a 5 % fuel step on the 200-cell truth grid, 10 min, dt = 1 s vs 1/8 s
    TruthSettings t = TruthSettings.defaults();
    ModelParameters p = truthParameters(t);
    TruthPlate coarse = new TruthPlate(unit, t, unit.operatingPoint(), p);
    TruthPlate fine = new TruthPlate(unit, t, unit.operatingPoint(), p);
    OperatingPoint u = fuelStep(1.05);
    double worst = 0.0;
    double rise = 0.0;
    double start = peak(coarse, u, p);
    for (int k = 0; k < 600; k++) {
      coarse.advance(u, p, 1.0, 1);
      fine.advance(u, p, 1.0, 8);
      double a = peak(coarse, u, p);
      double b = peak(fine, u, p);
      worst = Math.max(worst, Math.abs(a - b));
      rise = Math.max(rise, b - start);
    }
    assertThat(rise).as("the step heats the hot spot").isGreaterThan(20.0);
    assertThat(worst).isLessThan(1.0);
  }

  private static double peak(TruthPlate plate, OperatingPoint u, ModelParameters p) {
    plate.evaluate(u, p);
    return plate.hiddenTruth().peakTempK();
  }

  @Test
  void timeToExhaustCountsDownToTheNextFullyMeltedFrame() {
    double[] t = {0, 1, 2, 3, 4, 5, 6};
    double[] melt = {0, 0.2, 0.9, 1.0, 1.0, 0.5, 0.4};
    double[] tte = TimeToExhaust.inHindsight(t, melt);
    assertThat(tte).startsWith(3.0, 2.0, 1.0, 0.0, 0.0);
    assertThat(tte[5]).isNaN();
    assertThat(tte[6]).isNaN();
    assertThat(tte).hasSize(7);
  }
}
