package org.plateward.bench;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.plateward.reactor.DemoUnitFixture;
import org.plateward.reactor.ModelEvaluation;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.OperatingPoint;
import org.plateward.reactor.PlateReactorModel;
import org.plateward.reactor.UnitSpec;

/**
 * f(x) and the full Jacobian (df/de and dh/de) of the reactor model at the demo unit's steady
 * state. Run: mvn -B -q test-compile exec:exec@bench -Dbench.args="ModelBench -f 1 -wi 3 -i 5"
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class ModelBench {
  @Param({"30", "100"})
  int cells;

  PlateReactorModel model;
  OperatingPoint u;
  ModelParameters p;
  double[] e;
  ModelEvaluation ev;
  double[][] dfde;
  double[][] dhde;

  @Setup
  public void setup() {
    UnitSpec spec = DemoUnitFixture.spec(cells);
    model = new PlateReactorModel(spec);
    u = spec.operatingPoint();
    p = ModelParameters.nominal(spec);
    e = DemoUnitFixture.steadyState(model);
    ev = model.newEvaluation();
    model.evaluate(e, u, p, ev);
    dfde = new double[cells][cells];
    dhde = new double[9][cells];
  }

  @Benchmark
  public double derivative() {
    model.evaluate(e, u, p, ev);
    return ev.enthalpyRateWPerM2(cells / 2);
  }

  @Benchmark
  public double jacobian() {
    model.jacobian(e, u, p, ev, dfde, dhde);
    return dfde[cells / 2][cells / 2];
  }
}
