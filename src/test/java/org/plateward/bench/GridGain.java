package org.plateward.bench;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.plateward.config.UnitConfigLoader;
import org.plateward.reactor.Grid;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.OperatingPoint;
import org.plateward.reactor.PlateReactorModel;
import org.plateward.reactor.SteadySummary;
import org.plateward.reactor.UnitSpec;

/**
 * Grid study (not a test): the steady hidden peak of several grids at the configured operating
 * point and its change when the reforming feed moves ±2 %, all with the plant's physics (Nu 7.9,
 * heat loss 5.3 W/(m2 K); on the estimator's grids as Nu 7.541 times the multiplier). A grid
 * whose steady state is not found at a point says so.
 */
public final class GridGain {
  private GridGain() {}

  private record Case(String name, Grid grid, double nusselt, double multiplier) {}

  public static void main(String[] args) throws Exception {
    UnitSpec unit = UnitConfigLoader.load(Path.of(args.length > 0 ? args[0] : "config/plateward.toml"));
    double length = unit.geometry().lengthM();
    double nu = PlateReactorModel.NUSSELT_UNIFORM_WALL_TEMP;
    double mult = 7.9 / nu;
    List<Case> cases = List.of(
        new Case("plant, 200 uniform", Grid.uniform(length, 200), 7.9, 1.0),
        new Case("400 uniform", Grid.uniform(length, 400), 7.9, 1.0),
        new Case("configured grid", Grid.forUnit(unit.geometry(), unit.grid()), nu, mult),
        new Case("configured x2", Grid.forUnit(unit.geometry(), unit.grid().withCells(2 * unit.grid().cells())), nu, mult),
        new Case("80 uniform", Grid.uniform(length, 80), nu, mult),
        new Case("60 uniform", Grid.uniform(length, 60), nu, mult));
    OperatingPoint u = unit.operatingPoint();
    double[] feed = {1.0, 0.98, 1.02};
    ModelParameters truth = ModelParameters.nominal(unit).withHeatLoss(5.3);
    for (Case c : cases) {
      PlateReactorModel m = new PlateReactorModel(unit, c.grid(), new PlateReactorModel.Options(c.nusselt()));
      StringBuilder sb = new StringBuilder(String.format(Locale.ROOT, "%-20s", c.name()));
      double base = Double.NaN;
      for (double f : feed) {
        OperatingPoint up = new OperatingPoint(u.reformingGasFlowMolPerS() * f, u.steamFlowMolPerS() * f,
            u.reformingInletTempK(), u.reformingPressurePa(), u.fuelFlowMolPerS(), u.airFlowMolPerS(),
            u.combustionInletTempK(), u.combustionPressurePa());
        try {
          double peakC = SteadySummary.solve(m, up, truth.withHeatTransferMultiplier(c.multiplier())).peakPlateTempK() - 273.15;
          if (f == 1.0) {
            base = peakC;
            sb.append(String.format(Locale.ROOT, " peak %.2f degC", peakC));
          } else {
            sb.append(String.format(Locale.ROOT, " | feed x%.2f: %+.2f K", f, peakC - base));
          }
        } catch (RuntimeException e) {
          sb.append(String.format(Locale.ROOT, " | feed x%.2f: no steady state found", f));
        }
      }
      System.out.println(sb);
    }
  }
}
