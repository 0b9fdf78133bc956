package org.plateward.calibration;

import java.time.Instant;
import org.plateward.reactor.ModelOutputs;
import org.plateward.reactor.OperatingPoint;

/**
 * One steady window of a recording: where it lies and the window means of the inputs and of
 * the measured outputs, SI.
 *
 * @param from time of the first frame in the window
 * @param to time of the last frame in the window
 * @param frames frames in the window
 * @param inputs mean of each input over the window
 * @param outputsSi mean of each measured output over the window, {@link ModelOutputs} order (NaN
 *     when the window holds no usable value of it)
 * @param outputCounts how many usable values each mean is made of
 */
public record SteadyWindow(
    Instant from, Instant to, int frames, OperatingPoint inputs, double[] outputsSi, int[] outputCounts) {
  public SteadyWindow {
    if (outputsSi.length != ModelOutputs.COUNT || outputCounts.length != ModelOutputs.COUNT) {
      throw new IllegalArgumentException("one mean per model output");
    }
    outputsSi = outputsSi.clone();
    outputCounts = outputCounts.clone();
  }

  @Override
  public double[] outputsSi() {
    return outputsSi.clone();
  }

  @Override
  public int[] outputCounts() {
    return outputCounts.clone();
  }

  /** Mean of one output, SI (NaN when none). */
  public double outputSi(int index) {
    return outputsSi[index];
  }

  /** Length of the window, s. */
  public double durationS() {
    return (to.toEpochMilli() - from.toEpochMilli()) / 1000.0;
  }
}
