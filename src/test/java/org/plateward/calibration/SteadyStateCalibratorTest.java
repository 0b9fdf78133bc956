package org.plateward.calibration;

import static org.assertj.core.api.Assertions.assertThat;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.plateward.plant.PlantSample;
import org.plateward.plant.TruthSettings;
import org.plateward.reactor.Grid;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.PlateReactorModel;
import org.plateward.softsensor.SoftSensorSettings;

/**
 * Calibration against a plant recording made with known parameters that differ from the
 * configured unit's: the catalyst activities of the plant unit, the plant's heat-loss
 * coefficient, and its Nusselt number 7.9, which the model (Nu 7.541, Shah and London 1978)
 * can only match through the heat-transfer multiplier, so the multiplier's truth is 7.9 / 7.541.
 */
class SteadyStateCalibratorTest {
  static PlateauRecording rec;
  static List<SteadyWindow> windows;
  static CalibrationResult result;
  static double fitCpuS;

  @BeforeAll
  static void recordAndFit() {
    rec = PlateauRecording.run();
    SteadyWindowDetector d = new SteadyWindowDetector(SteadinessTolerances.defaults());
    for (PlantSample s : rec.samples) {
      d.accept(s.frame());
    }
    windows = d.windows();
    PlateReactorModel model = new PlateReactorModel(rec.configured,
        Grid.uniform(rec.configured.geometry().lengthM(), 200), PlateReactorModel.Options.DEFAULT.withMultiplierOnMassTransfer());
    ThreadMXBean tb = ManagementFactory.getThreadMXBean();
    long c0 = tb.getCurrentThreadCpuTime();
    result = new SteadyStateCalibrator(model, MeasurementSigmas.of(SoftSensorSettings.defaults()))
        .fit(windows, ModelParameters.nominal(rec.configured));
    fitCpuS = (tb.getCurrentThreadCpuTime() - c0) / 1e9;
    System.out.printf("calibration of %d windows: %.1f s CPU, %d iterations, chi2 %.3g, s2 %.3g%n",
        windows.size(), fitCpuS, result.iterations(), result.chiSquare(), result.residualVariance());
    for (ParameterEstimate e : result.estimates()) {
      System.out.printf("  %-26s %.4f  95%% [%.4f, %.4f]  truth %.4f%n", e.parameter().key(), e.value(),
          e.ciLow(), e.ciHigh(), truth(e.parameter()));
    }
  }

  /** The plant's true value, averaged over the frames of the windows (activities decline slowly). */
  static double truth(FittedParameter p) {
    return truthOf(rec, p, windows);
  }

  /** The truth over the steady windows the default detector finds in {@code r}. */
  static double truthOf(PlateauRecording r, FittedParameter p) {
    SteadyWindowDetector d = new SteadyWindowDetector(SteadinessTolerances.defaults());
    for (PlantSample s : r.samples) {
      d.accept(s.frame());
    }
    return truthOf(r, p, d.windows());
  }

  static double truthOf(PlateauRecording rec, FittedParameter p, List<SteadyWindow> windows) {
    if (p == FittedParameter.HEAT_TRANSFER_MULTIPLIER) {
      return TruthSettings.DEFAULT_NUSSELT / PlateReactorModel.NUSSELT_UNIFORM_WALL_TEMP;
    }
    double sum = 0.0;
    int n = 0;
    for (PlantSample s : rec.samples) {
      for (SteadyWindow w : windows) {
        if (!s.frame().time().isBefore(w.from()) && !s.frame().time().isAfter(w.to())) {
          sum += switch (p) {
            case REFORMING_ACTIVITY -> s.truth().reformingActivity();
            case COMBUSTION_ACTIVITY -> s.truth().combustionActivity();
            case HEAT_LOSS -> s.truth().heatLossWPerM2K();
            default -> throw new IllegalStateException();
          };
          n++;
        }
      }
    }
    return sum / n;
  }

  @Test
  void findsOneWindowPerPlateauAndNoneAcrossAStep() {
    assertThat(windows).hasSize(4);
    for (SteadyWindow w : windows) {
      double a = (w.from().toEpochMilli() - PlateauRecording.T0.toEpochMilli()) / 1000.0;
      double b = (w.to().toEpochMilli() - PlateauRecording.T0.toEpochMilli()) / 1000.0;
      // the plateaus are [k, k + 1) holds; a window never contains a step time
      assertThat(Math.floor(a / PlateauRecording.HOLD_S)).isEqualTo(Math.floor(b / PlateauRecording.HOLD_S));
      assertThat(w.durationS()).isGreaterThanOrEqualTo(SteadinessTolerances.defaults().minDurationS() - 1.0);
    }
  }

  @Test
  void recoversThePlantParametersWithinTheirIntervals() {
    for (ParameterEstimate e : result.estimates()) {
      assertThat(e.identifiable()).as(e.parameter().key()).isTrue();
      assertThat(e.covers(truth(e.parameter()))).as(e.parameter().key() + " " + e).isTrue();
      // and the fit moved it from the configured value towards the truth
      assertThat(Math.abs(e.value() - truth(e.parameter())))
          .as(e.parameter().key()).isLessThan(Math.abs(e.start() - truth(e.parameter())));
    }
  }

  @Test
  void intervalsComeFromTheScaledCovarianceAndTheStudentQuantile() {
    // the 95 % two-sided t quantile for m - 4 degrees of freedom, from Commons Math
    double t = new org.apache.commons.math3.distribution.TDistribution(result.degreesOfFreedom())
        .inverseCumulativeProbability(0.975);
    assertThat(result.tQuantile()).isEqualTo(t);
    assertThat(result.degreesOfFreedom()).isEqualTo(result.residuals() - 4);
    assertThat(result.residualVariance()).isEqualTo(result.chiSquare() / result.degreesOfFreedom());
    for (ParameterEstimate e : result.estimates()) {
      // log-scale interval: ln(hi / value) = ln(value / lo) = t sd_theta, with sd = value sd_theta
      double sdTheta = e.sd() / e.value();
      assertThat(Math.log(e.ciHigh() / e.value())).isCloseTo(t * sdTheta, org.assertj.core.data.Offset.offset(1e-12));
      assertThat(Math.log(e.value() / e.ciLow())).isCloseTo(t * sdTheta, org.assertj.core.data.Offset.offset(1e-12));
    }
    double[][] c = result.correlation();
    for (int i = 0; i < 4; i++) {
      assertThat(c[i][i]).isCloseTo(1.0, org.assertj.core.data.Offset.offset(1e-12));
      for (int j = 0; j < 4; j++) {
        assertThat(c[i][j]).isEqualTo(c[j][i], org.assertj.core.data.Offset.offset(1e-12));
        assertThat(Math.abs(c[i][j])).isLessThanOrEqualTo(1.0 + 1e-12);
      }
    }
  }

  @Test
  void theFittedOutputsAreTheModelsSteadyStateAtTheFittedParameters() {
    PlateReactorModel model = new PlateReactorModel(rec.configured,
        Grid.uniform(rec.configured.geometry().lengthM(), 200), PlateReactorModel.Options.DEFAULT.withMultiplierOnMassTransfer());
    SteadyWindow w = windows.get(1);
    org.plateward.reactor.SteadySummary s = org.plateward.reactor.SteadySummary.solve(model, w.inputs(), result.fitted());
    assertThat(result.predicted()[1][org.plateward.reactor.ModelOutputs.REF_OUTLET_TEMP_K])
        .isCloseTo(s.refOutletTempK(), org.assertj.core.data.Offset.offset(1e-3));
  }
}
