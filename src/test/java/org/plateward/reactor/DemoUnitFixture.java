package org.plateward.reactor;

import java.nio.file.Path;
import org.plateward.config.UnitConfigLoader;

/** The invented demo unit of config/plateward.toml, for model tests. */
public final class DemoUnitFixture {
  public static final Path CONFIG = Path.of("config/plateward.toml");

  private DemoUnitFixture() {}

  /** The demo unit as configured. */
  public static UnitSpec spec() {
    try {
      return UnitConfigLoader.load(CONFIG);
    } catch (Exception e) {
      throw new IllegalStateException("demo config does not load: " + e.getMessage(), e);
    }
  }

  /** The demo unit on a uniform grid of {@code cells} cells. */
  public static UnitSpec spec(int cells) {
    return spec().withGrid(GridSpec.uniform(cells));
  }

  /** The demo unit on a grid refined at the coated-zone edges. */
  public static UnitSpec refined(int cells) {
    return spec().withGrid(new GridSpec(cells, 4.0, 0.03));
  }

  /** Steady state of a unit at its operating point and nominal parameters. */
  public static double[] steadyState(PlateReactorModel m) {
    UnitSpec s = m.spec();
    double[] e0 = new double[m.cells()];
    m.uniformState(SteadySummary.HOT_START_K, e0);
    return new SteadyStateSolver(m).solve(s.operatingPoint(), ModelParameters.nominal(s), e0).enthalpyJPerM2();
  }
}
