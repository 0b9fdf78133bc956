package org.plateward.advisor;

/**
 * The open-loop forecast for one fuel-flow trim, inputs otherwise held.
 *
 * @param trim relative change of the fuel flow, fuel = (1 + trim) fuel_now (−0.05 is 5 % less)
 * @param peakTempK highest hidden peak plate temperature over the horizon, K
 * @param peakUpperK that peak plus k σ of the present peak estimate, K
 * @param maxCellMeltFraction highest melt fraction any cell reaches over the horizon, 0..1
 * @param methaneConversion reforming methane conversion at the horizon, 1 − F_CH4,out / F_CH4,in
 * @param horizonS forecast horizon, s
 * @param peakSdK the σ the upper bound was formed with, K: the present peak estimate's (plain
 *     forecast) or the sigma points' spread of the peak over the horizon ({@link SpreadForecast})
 */
public record TrimOutlook(
    double trim,
    double peakTempK,
    double peakUpperK,
    double maxCellMeltFraction,
    double methaneConversion,
    double horizonS,
    double peakSdK) {}
