/**
 * Calibration of the model parameters from recorded plant data: steady windows are found in the
 * boundary signals ({@link org.plateward.calibration.SteadyWindowDetector}, tolerances in
 * {@link org.plateward.calibration.SteadinessTolerances}); the reforming and combustion
 * activities, the heat-loss coefficient and the heat-transfer multiplier are fitted to the
 * window means by Levenberg-Marquardt on the steady-state model ({@link
 * org.plateward.calibration.SteadyStateCalibrator}), with 95 % intervals, correlations and an
 * identifiability verdict ({@link org.plateward.calibration.CalibrationResult}). No I/O here;
 * {@code calibration.io} writes the parameter file and the plots. Advisory: a fit is for
 * review by an engineer, never applied by itself.
 */
package org.plateward.calibration;
