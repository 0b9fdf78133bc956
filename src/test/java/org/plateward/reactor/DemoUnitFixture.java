package org.plateward.reactor;

import java.util.List;
import org.plateward.signals.EdgeUnit;

/** The invented demo unit built in code, so model tests do not depend on the config loader. */
public final class DemoUnitFixture {
  private DemoUnitFixture() {}

  public static UnitSpec spec(int cells) {
    Geometry g = new Geometry(0.60, 0.20, 0.002, 0.002, 0.0012, 0.0006, 24,
        List.of(new Zone(0.0, 0.50)), List.of(new Zone(0.05, 0.50)));
    // nickel alloy near 1000 K (Incropera Table A.1, Inconel X-750, interpolated)
    PlateMaterial plate = new PlateMaterial("nickel alloy", 8510, 590, 23, 1423.15);
    // copper: ITS-90 freezing point 1357.77 K; JANAF latent heat 206.7 kJ/kg; k from Incropera
    BufferMaterial cu = new BufferMaterial("copper", 8960, 470, 340, 165, 1357.77, 206.7e3, 2.0);
    CatalystSpec cat = new CatalystSpec(0.015, 1.0, 0.5);
    HeatLossSpec loss = new HeatLossSpec(5.0, 298.15);
    FeedGas feed = new FeedGas(0.95, 0.04, 0.005, 0.005);
    OperatingPoint op = new OperatingPoint(
        EdgeUnit.NM3_PER_H.toSi(19.5), EdgeUnit.KG_PER_H_STEAM.toSi(44.0), 833.15, 320e3,
        EdgeUnit.NM3_PER_H.toSi(8.05), EdgeUnit.NM3_PER_H.toSi(230.0), 793.15, 130e3);
    return new UnitSpec("TM-PR1", "Tarnmoor", g, plate, cu, cat, loss, feed, op, new GridSpec(cells, 4.0, 0.03));
  }
}
