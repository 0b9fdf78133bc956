package org.plateward.reactor;
import org.plateward.kinetics.*; import org.plateward.thermo.*;
public class Scratch4 {
  public static void main(String[] a) {
    double[] c = new double[9]; double[] r = new double[3]; double[] x = {0.1,0.5,0.05,0.05,0.28,0.0,0.02};
    double sink = 0;
    for (int rep = 0; rep < 3; rep++) {
      int k = 2_000_000;
      long t0 = System.nanoTime();
      for (int i = 0; i < k; i++) { XuFromentKinetics.constants(1000 + (i & 255), c); sink += c[7]; }
      long t1 = System.nanoTime();
      for (int i = 0; i < k; i++) { XuFromentKinetics.rates(c, 0.3+1e-9*i, 1.5, 0.1, 0.2, 1.0, r); sink += r[0]; }
      long t2 = System.nanoTime();
      for (int i = 0; i < k; i++) { sink += MixtureProperties.thermalConductivityWPerMK(x, 1000 + (i & 255)); }
      long t3 = System.nanoTime();
      for (int i = 0; i < k; i++) { sink += MixtureProperties.diffusivityInMixtureM2PerS(0, x, 1000 + (i & 255), 1.3e5); }
      long t4 = System.nanoTime();
      for (int i = 0; i < k; i++) { sink += IdealGasThermo.enthalpyJPerMol(i % 7, 1000 + (i & 255)); }
      long t5 = System.nanoTime();
      for (int i = 0; i < k; i++) { sink += CatalyticCombustion.surfaceRateConstantMPerS(1000 + (i & 255)); }
      long t6 = System.nanoTime();
      System.out.printf("constants %.1f ns rates %.1f ns cond %.1f ns diff %.1f ns h %.1f ns ks %.1f ns%n", (t1-t0)/(double)k, (t2-t1)/(double)k, (t3-t2)/(double)k, (t4-t3)/(double)k, (t5-t4)/(double)k, (t6-t5)/(double)k);
    }
    System.out.println(sink);
  }
}
