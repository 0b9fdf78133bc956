package org.plateward.reactor;
public class Scratch6 {
  public static void main(String[] a) {
    PlateReactorModel m = new PlateReactorModel(DemoUnitFixture.refined(40));
    ModelParameters p = ModelParameters.nominal(m.spec());
    OperatingPoint u = m.spec().operatingPoint();
    double[] e = ModelConservationTest.transientState(m);
    int n = m.cells();
    ModelEvaluation ev = m.newEvaluation(); ModelEvaluation ev2 = m.newEvaluation();
    m.evaluate(e, u, p, ev);
    double[] base = ev.enthalpyRateWPerM2();
    m.evaluate(e, u, p, ev);
    double[] again = ev.enthalpyRateWPerM2();
    for (int k = 0; k < n; k++) if (base[k] != again[k]) System.out.println("re-eval differs at " + k + ": " + base[k] + " vs " + again[k]);
  }
}
