package org.plateward.reactor;
import org.plateward.kinetics.XuFromentKinetics;
public class Scratch2 {
  public static void main(String[] a) {
    double[] c = new double[9]; double[] r = new double[3];
    for (double t : new double[]{850, 1000, 1200}) {
      XuFromentKinetics.constants(t, c);
      System.out.println(t + " consts " + java.util.Arrays.toString(c));
      // inlet wet: CH4 .2424 H2 .0102 H2O .745 CO2 .0013 ; P 3.2 bar
      double P = 3.2;
      XuFromentKinetics.rates(c, 0.2424*P, 0.745*P, 1e-9, 0.0013*P, 0.0102*P, r);
      System.out.println(" rates " + java.util.Arrays.toString(r));
    }
  }
}
