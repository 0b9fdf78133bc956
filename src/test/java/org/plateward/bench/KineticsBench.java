package org.plateward.bench;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.plateward.kinetics.CatalyticCombustion;
import org.plateward.kinetics.XuFromentKinetics;
import org.plateward.thermo.IdealGasThermo;
import org.plateward.thermo.MixtureProperties;

/**
 * Cost per call of the hot-path thermo and kinetics methods. Short by design (the build
 * machine is shared):
 * {@code mvn -o -q test-compile exec:exec@bench -Dbench.args="KineticsBench -f 1 -wi 2 -i 3 -w 1s -r 1s"}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Fork(1)
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 3, time = 1)
public class KineticsBench {

  private final double[] constants = new double[XuFromentKinetics.CONSTANTS];
  private final double[] rates = new double[3];
  private final double[] x = {0.15, 0.45, 0.05, 0.05, 0.28, 0.0, 0.02};
  private final double[] h = new double[7];
  /** Varies per call so the JIT cannot fold the temperature. */
  private double tempK = 800.0;

  private double nextTemp() {
    tempK = tempK > 1100.0 ? 800.0 : tempK + 0.37;
    return tempK;
  }

  /** Reference point for the machine's speed: one Math.exp of a varying argument. */
  @Benchmark
  public double expBaseline() {
    return Math.exp(-240.1e3 / (8.314 * nextTemp()));
  }

  @Benchmark
  public double xuFromentConstants() {
    XuFromentKinetics.constants(nextTemp(), constants);
    return constants[7];
  }

  @Benchmark
  public double xuFromentRates() {
    double p = nextTemp() * 1e-3; // vary the inputs slightly
    XuFromentKinetics.rates(constants, 2.0 + p, 6.0, 0.1, 0.5, 1.0 + p, rates);
    return rates[0] + rates[1] + rates[2];
  }

  @Benchmark
  public double enthalpiesAllSpecies() {
    IdealGasThermo.enthalpiesJPerMol(nextTemp(), h);
    return h[0];
  }

  @Benchmark
  public double mixtureHeatCapacity() {
    return MixtureProperties.heatCapacityJPerMolK(x, nextTemp());
  }

  @Benchmark
  public double mixtureViscosity() {
    return MixtureProperties.viscosityPaS(x, nextTemp());
  }

  @Benchmark
  public double mixtureConductivity() {
    return MixtureProperties.thermalConductivityWPerMK(x, nextTemp());
  }

  @Benchmark
  public double combustionRateConstant() {
    return CatalyticCombustion.effectiveRateConstantMPerS(
        CatalyticCombustion.surfaceRateConstantMPerS(nextTemp()), 0.05);
  }
}
