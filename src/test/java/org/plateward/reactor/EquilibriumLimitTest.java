package org.plateward.reactor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.plateward.thermo.Reaction;
import org.plateward.thermo.Species;

/**
 * The reforming channel over an isothermal plate: a long, well-catalysed channel must deliver
 * the equilibrium composition at the plate temperature and pressure (a thermodynamic limit:
 * the outlet's reaction quotients equal the JANAF-checked equilibrium constants). Trade sense (common practice, no source): more
 * conversion at higher temperature, less at higher pressure for a fixed steam-to-carbon ratio.
 */
class EquilibriumLimitTest {
  static final int CH4 = Species.CH4.ordinal();
  static final int H2O = Species.H2O.ordinal();
  static final int CO = Species.CO.ordinal();
  static final int CO2 = Species.CO2.ordinal();
  static final int H2 = Species.H2.ordinal();

  /** An isothermal reforming channel: combustion starved of fuel, coated over the whole length. */
  static ModelEvaluation isothermal(double plateK, double pressurePa, double loadingScale, double lengthM) {
    UnitSpec d = DemoUnitFixture.spec(80);
    Geometry g0 = d.geometry();
    Geometry g = new Geometry(lengthM, g0.widthM(), g0.reformingGapM(), g0.combustionGapM(), g0.plateThicknessM(),
        g0.bufferThicknessM(), g0.channelPairs(), List.of(new Zone(0.0, lengthM)), List.of());
    CatalystSpec cat = new CatalystSpec(d.catalyst().reformingLoadingKgPerM2() * loadingScale, 1.0, 0.0);
    OperatingPoint u0 = d.operatingPoint();
    OperatingPoint u = new OperatingPoint(u0.reformingGasFlowMolPerS(), u0.steamFlowMolPerS(), u0.reformingInletTempK(),
        pressurePa, 0.0, u0.airFlowMolPerS(), u0.combustionInletTempK(), u0.combustionPressurePa());
    UnitSpec spec = new UnitSpec(d.name(), d.site(), g, d.plate(), d.buffer(), cat, d.heatLoss(), d.feedGas(), u, d.grid());
    PlateReactorModel m = new PlateReactorModel(spec);
    double[] e = new double[m.cells()];
    m.uniformState(plateK, e);
    ModelEvaluation ev = m.newEvaluation();
    m.evaluate(e, u, ModelParameters.nominal(spec), ev);
    return ev;
  }

  static double conversion(ModelEvaluation ev, int cells) {
    return 1.0 - ev.reformingFlowMolPerS(cells, CH4) / ev.reformingFlowMolPerS(0, CH4);
  }

  @Test
  void longChannelReachesEquilibriumAtPlateTemperatureAndPressure() {
    // at equilibrium the reaction quotients equal the equilibrium constants (law of mass action,
    // ideal gas, 1 bar standard state); K from Gibbs energies checked against NIST-JANAF
    for (double tK : new double[] {950.0, 1050.0, 1150.0}) {
      double pBar = 3.2;
      ModelEvaluation ev = isothermal(tK, pBar * 1e5, 20.0, 1.5);
      int n = ev.cells();
      double tot = 0.0;
      double[] y = new double[Species.COUNT];
      for (int k = 0; k < Species.COUNT; k++) {
        y[k] = ev.reformingFlowMolPerS(n, k);
        tot += y[k];
      }
      double[] p = new double[Species.COUNT];
      for (int k = 0; k < Species.COUNT; k++) {
        p[k] = y[k] / tot * pBar;
      }
      double qSmr = p[CO] * Math.pow(p[H2], 3) / (p[CH4] * p[H2O]);
      double qWgs = p[CO2] * p[H2] / (p[CO] * p[H2O]);
      assertThat(ev.reformingGasTempK()[n]).as("gas reaches the wall").isCloseTo(tK, within(0.5));
      assertThat(qSmr / Reaction.STEAM_REFORMING.equilibriumConstant(tK)).as("SMR at %.0f K", tK).isCloseTo(1.0, within(0.01));
      assertThat(qWgs / Reaction.WATER_GAS_SHIFT.equilibriumConstant(tK)).as("WGS at %.0f K", tK).isCloseTo(1.0, within(0.01));
    }
  }

  @Test
  void conversionRisesWithTemperatureAndFallsWithPressure() {
    // common practice (no source): endothermic, mole-increasing reforming
    double c900 = conversion(isothermal(900, 320e3, 1.0, 0.6), 80);
    double c1000 = conversion(isothermal(1000, 320e3, 1.0, 0.6), 80);
    double c1100 = conversion(isothermal(1100, 320e3, 1.0, 0.6), 80);
    assertThat(c900).isLessThan(c1000);
    assertThat(c1000).isLessThan(c1100);
    double p2 = conversion(isothermal(1000, 200e3, 20.0, 1.5), 80);
    double p10 = conversion(isothermal(1000, 1000e3, 20.0, 1.5), 80);
    double p25 = conversion(isothermal(1000, 2500e3, 20.0, 1.5), 80);
    assertThat(p2).isGreaterThan(p10);
    assertThat(p10).isGreaterThan(p25);
  }
}
