package org.plateward.advisor;

import org.plateward.reactor.ModelParameters;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.StateLayout;

/**
 * The part of the soft sensor's posterior a plate forecast depends on: the mean and covariance
 * of z = [x_0 … x_{N−1}, reforming activity, combustion activity, heat loss, heat-transfer
 * multiplier], where x_j = e_j / C is the filter's cell enthalpy coordinate (K; e in J/m2, C
 * the plate's sensible heat capacity per area). Thermocouple biases, sensor lags and analyzer
 * clones do not enter the plate's own dynamics and are left out.
 *
 * @param mean z, entries in K (cells), 1, 1, W/(m2 K), 1
 * @param covariance the matching block of the filter covariance P
 * @param cells number of cells N
 * @param capacityJPerM2K C, J/(m2 K)
 */
public record PosteriorBelief(double[] mean, double[][] covariance, int cells, double capacityJPerM2K) {
  /** Share of a parameter's mean below which a sigma point's parameter is held (they are positive by definition). */
  static final double PARAMETER_FLOOR = 0.05;

  public PosteriorBelief {
    if (mean.length != cells + StateLayout.PARAMETERS || covariance.length != mean.length) {
      throw new IllegalArgumentException("need " + (cells + StateLayout.PARAMETERS) + " entries, got "
          + mean.length + " and a " + covariance.length + "-row covariance");
    }
    mean = mean.clone();
    double[][] c = new double[covariance.length][];
    for (int i = 0; i < c.length; i++) {
      c[i] = covariance[i].clone();
    }
    covariance = c;
  }

  @Override
  public double[] mean() {
    return mean.clone();
  }

  @Override
  public double[][] covariance() {
    double[][] c = new double[covariance.length][];
    for (int i = 0; i < c.length; i++) {
      c[i] = covariance[i].clone();
    }
    return c;
  }

  /**
   * Reads the present posterior of {@code sensor} (its state and covariance block of the cells
   * and the four parameters).
   *
   * @throws IllegalStateException before the soft sensor has started
   */
  public static PosteriorBelief of(ReactorSoftSensor sensor) {
    double[] x = sensor.state();
    double[][] p = sensor.covariance();
    if (x == null || p == null) {
      throw new IllegalStateException("the soft sensor has not started: no posterior to advise from");
    }
    StateLayout l = sensor.layout();
    int n = l.cells();
    int[] idx = new int[n + StateLayout.PARAMETERS];
    for (int j = 0; j < n; j++) {
      idx[j] = j;
    }
    idx[n] = l.reformingActivity();
    idx[n + 1] = l.combustionActivity();
    idx[n + 2] = l.heatLoss();
    idx[n + 3] = l.heatTransfer();
    double[] z = new double[idx.length];
    double[][] c = new double[idx.length][idx.length];
    for (int a = 0; a < idx.length; a++) {
      z[a] = x[idx[a]];
      for (int b = 0; b < idx.length; b++) {
        c[a][b] = p[idx[a]][idx[b]];
      }
    }
    return new PosteriorBelief(z, c, n, sensor.model().plate().sensibleJPerM2K());
  }

  /** The plate at the mean. */
  public PosteriorPlate meanPlate() {
    return plateAt(mean);
  }

  /** Range a sigma point's cell may take around the mean profile (K of enthalpy coordinate). */
  static final double CELL_MARGIN_BELOW_K = 200.0;
  static final double CELL_MARGIN_ABOVE_K = 400.0;

  /**
   * The plate at a point z of this space: e_j = C z_j; each parameter held at or above
   * {@value #PARAMETER_FLOOR} of its mean (a sigma point far out in a wide parameter spread
   * must not give a negative activity or heat loss).
   */
  public PosteriorPlate plateAt(double[] z) {
    // a sigma point far out along a wide direction must not leave the physical range: each
    // cell is kept within [coldest mean cell − 200 K, hottest mean cell + 400 K] of enthalpy
    // coordinate (the upper margin holds a full melt, about 130 K of sensible heat, and more)
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (int j = 0; j < cells; j++) {
      lo = Math.min(lo, mean[j]);
      hi = Math.max(hi, mean[j]);
    }
    double[] e = new double[cells];
    for (int j = 0; j < cells; j++) {
      e[j] = Math.max(lo - CELL_MARGIN_BELOW_K, Math.min(hi + CELL_MARGIN_ABOVE_K, z[j])) * capacityJPerM2K;
    }
    return new PosteriorPlate(e, new ModelParameters(floor(z, cells), floor(z, cells + 1), floor(z, cells + 2),
        floor(z, cells + 3)));
  }

  private double floor(double[] z, int i) {
    return Math.max(z[i], PARAMETER_FLOOR * Math.abs(mean[i]));
  }
}
