package org.plateward.reactor;
public class Scratch3 {
  public static void main(String[] a) {
    for (int n : new int[]{30, 100, 30}) {
      UnitSpec s = DemoUnitFixture.spec(n);
      PlateReactorModel m = new PlateReactorModel(s);
      ModelParameters p = ModelParameters.nominal(s);
      SteadySummary ss = SteadySummary.solve(m, s.operatingPoint(), p);
      System.out.println(n + " peak " + ss.peakPlateTempK() + " conv " + ss.methaneConversion() + " it " + ss.iterations());
      double[] e = new double[n];
      for (int j = 0; j < n; j++) e[j] = m.plate().enthalpyJPerM2(ss.plateTempK()[j]);
      ModelEvaluation ev = m.newEvaluation();
      double[][] J = new double[n][n]; double[][] H = new double[9][n];
      for (int r = 0; r < 3; r++) {
        long t0 = System.nanoTime(); int k = 20000;
        for (int i = 0; i < k; i++) m.evaluate(e, s.operatingPoint(), p, ev);
        long t1 = System.nanoTime(); int kj = 500;
        for (int i = 0; i < kj; i++) m.jacobian(e, s.operatingPoint(), p, ev, J, H);
        long t2 = System.nanoTime();
        System.out.printf("N=%d f %.2f us  jac %.3f ms%n", n, (t1 - t0) / 1e3 / k, (t2 - t1) / 1e6 / kj);
      }
    }
  }
}
