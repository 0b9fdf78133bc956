package org.plateward.reactor;

public class Scratch {
  static UnitSpec withFuel(UnitSpec s, double f) {
    OperatingPoint o = s.operatingPoint();
    return new UnitSpec(s.name(), s.site(), s.geometry(), s.plate(), s.buffer(), s.catalyst(), s.heatLoss(), s.feedGas(),
      new OperatingPoint(o.reformingGasFlowMolPerS(), o.steamFlowMolPerS(), o.reformingInletTempK(), o.reformingPressurePa(), o.fuelFlowMolPerS()*f, o.airFlowMolPerS(), o.combustionInletTempK(), o.combustionPressurePa()), s.grid());
  }
  public static void main(String[] a) {
    int n = a.length > 0 ? Integer.parseInt(a[0]) : 40;
    UnitSpec s = DemoUnitFixture.spec(n);
    
    ModelParameters p = ModelParameters.nominal(s);
    if (a.length > 2) p = p.withReformingActivity(Double.parseDouble(a[1])).withCombustionActivity(Double.parseDouble(a[2]));
    if (a.length > 3) s = withFuel(s, Double.parseDouble(a[3]));
    PlateReactorModel m = new PlateReactorModel(s);
    double[] e = new double[n];
    m.uniformState(1250, e);
    ModelEvaluation ev = m.newEvaluation();
    m.evaluate(e, s.operatingPoint(), p, ev);
    //System.out.println("dedt0 " + java.util.Arrays.toString(ev.enthalpyRateWPerM2()));
    System.out.println("y " + java.util.Arrays.toString(ev.outputs()));
    long t0 = System.nanoTime();
    SteadySummary ss = SteadySummary.solve(m, s.operatingPoint(), p);
    System.out.printf("solve %.1f ms%n", (System.nanoTime() - t0) / 1e6);
    System.out.println(ss);
    double[] t = ss.plateTempK(); double[] z = ss.cellCentresM();
    for (int j = 0; j < n; j+=3) System.out.printf("%.4f %.1f%n", z[j], t[j]);
  }
}
