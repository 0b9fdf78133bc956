package org.plateward.softsensor;

/**
 * Tuning of the reactor soft sensor; the reasoning behind each default is in the package
 * documentation.
 *
 * @param blockS length of one filter step: frames inside a block are averaged (s)
 * @param jacobianRefreshS longest time a model Jacobian is held (s)
 * @param jacobianRefreshK largest cell-temperature change a Jacobian is held over (K)
 * @param lagS first-order time constants of reformed gas outlet, flue gas outlet and the two
 *     plate-end thermocouples (s)
 * @param temperatureNoiseK white noise of the same four sensors, 1σ per frame (K)
 * @param temperatureFloorK model representation error of the same four outputs, 1σ (K)
 * @param analyzerNoiseMolPct analyzer noise of CH4, CO, CO2, H2 (reformed gas) and O2 (flue
 *     gas), 1σ (mol% dry)
 * @param analyzerFloorMolPct model representation error of the same five outputs (mol%)
 * @param analyzerPeriodS time between analyzer samples (s)
 * @param analyzerDeadTimeS time from drawing a sample to publishing its result (s)
 * @param inputNoiseRelative flow meter noise, relative, 1σ per frame
 * @param inputTempNoiseK inlet thermocouple noise, 1σ per frame (K)
 * @param inputBiasRelative slowly wandering systematic error of the flow meters (accuracy),
 *     relative, 1σ
 * @param inputBiasTempK the same for the inlet thermocouples (K)
 * @param inputBiasTimeS correlation time of those systematic errors (s)
 * @param cellNoiseK2PerS structural process noise density per cell (K²/s)
 * @param activityDriftPerHour 1σ random-walk drift of each catalyst activity over one hour,
 *     relative
 * @param heatLossDriftPerHour 1σ random-walk drift of the heat-loss coefficient over one hour,
 *     relative
 * @param biasDriftKPerHour 1σ random-walk drift of a healthy plate-end thermocouple (K over one
 *     hour)
 * @param heatTransferPrior prior mean of the heat-transfer multiplier
 * @param heatTransferPriorSd its prior standard deviation
 * @param heatTransferDriftPerHour 1σ random-walk drift of the multiplier over one hour
 * @param driftWindowS window of the thermocouple bias-rate test (s)
 * @param horizonS time-to-exhaust forecast horizon (s)
 * @param forecastEveryS how often the time-to-exhaust forecast is recomputed (s)
 * @param startupS time after start during which the estimate is reported as settling (s)
 */
public record SoftSensorSettings(
    double blockS,
    double jacobianRefreshS,
    double jacobianRefreshK,
    double[] lagS,
    double[] temperatureNoiseK,
    double[] temperatureFloorK,
    double[] analyzerNoiseMolPct,
    double[] analyzerFloorMolPct,
    double analyzerPeriodS,
    double analyzerDeadTimeS,
    double inputNoiseRelative,
    double inputTempNoiseK,
    double inputBiasRelative,
    double inputBiasTempK,
    double inputBiasTimeS,
    double cellNoiseK2PerS,
    double activityDriftPerHour,
    double heatLossDriftPerHour,
    double biasDriftKPerHour,
    double heatTransferPrior,
    double heatTransferPriorSd,
    double heatTransferDriftPerHour,
    double driftWindowS,
    double horizonS,
    double forecastEveryS,
    double startupS) {

  public SoftSensorSettings {
    lagS = lagS.clone();
    temperatureNoiseK = temperatureNoiseK.clone();
    temperatureFloorK = temperatureFloorK.clone();
    analyzerNoiseMolPct = analyzerNoiseMolPct.clone();
    analyzerFloorMolPct = analyzerFloorMolPct.clone();
    if (!(blockS >= 1.0)) {
      throw new IllegalArgumentException("blockS must be >= 1 s, got " + blockS);
    }
  }

  /**
   * Prior mean of the heat-transfer multiplier: the model uses Nu = 7.541 (uniform wall
   * temperature); a real wall lies between that and 8.235 (uniform heat flux, Shah and London
   * 1978), so the prior is the midpoint of the two limits over 7.541.
   */
  public static final double HEAT_TRANSFER_PRIOR = 0.5 * (7.541 + 8.235) / 7.541;
  /** Prior σ: a quarter of the range between the two limits, so ±2σ spans it. */
  public static final double HEAT_TRANSFER_PRIOR_SD = 0.25 * (8.235 - 7.541) / 7.541;

  /** The defaults for the demo unit's instrument set (see the package documentation). */
  public static SoftSensorSettings defaults() {
    return new SoftSensorSettings(
        5.0, 60.0, 3.0,
        new double[] {10.0, 10.0, 15.0, 15.0},
        new double[] {1.5, 1.5, 1.0, 1.0},
        new double[] {0.2, 0.2, 0.2, 0.2},
        new double[] {0.1, 0.15, 0.1, 0.2, 0.05},
        new double[] {0.04, 0.04, 0.04, 0.08, 0.02},
        30.0, 60.0,
        0.005, 1.0,
        0.005, 1.0, 21600.0,
        2e-3,
        0.05, 0.2, 2.0,
        HEAT_TRANSFER_PRIOR, HEAT_TRANSFER_PRIOR_SD, 0.01, 600.0,
        1800.0, 30.0, 600.0);
  }

  /** Copy with another block length (s). */
  public SoftSensorSettings withBlockS(double v) {
    return new SoftSensorSettings(v, jacobianRefreshS, jacobianRefreshK, lagS, temperatureNoiseK,
        temperatureFloorK, analyzerNoiseMolPct, analyzerFloorMolPct, analyzerPeriodS, analyzerDeadTimeS,
        inputNoiseRelative, inputTempNoiseK, inputBiasRelative, inputBiasTempK, inputBiasTimeS, cellNoiseK2PerS, activityDriftPerHour, heatLossDriftPerHour,
        biasDriftKPerHour, heatTransferPrior, heatTransferPriorSd, heatTransferDriftPerHour, driftWindowS, horizonS, forecastEveryS,
        startupS);
  }

  /** Copy with another analyzer schedule (s). */
  public SoftSensorSettings withAnalyzer(double periodS, double deadTimeS) {
    return new SoftSensorSettings(blockS, jacobianRefreshS, jacobianRefreshK, lagS, temperatureNoiseK,
        temperatureFloorK, analyzerNoiseMolPct, analyzerFloorMolPct, periodS, deadTimeS,
        inputNoiseRelative, inputTempNoiseK, inputBiasRelative, inputBiasTempK, inputBiasTimeS, cellNoiseK2PerS, activityDriftPerHour, heatLossDriftPerHour,
        biasDriftKPerHour, heatTransferPrior, heatTransferPriorSd, heatTransferDriftPerHour, driftWindowS, horizonS, forecastEveryS,
        startupS);
  }
}
