package org.plateward.plant;

import java.util.Map;
import org.plateward.signals.Frame;
import org.plateward.signals.Signal;
import org.plateward.signals.StatusName;

/**
 * One frame of the simulated plant: what its instruments show and the hidden truth behind it.
 *
 * @param index frame number from 0
 * @param timeS seconds since the first frame
 * @param frame the readings in SI, with qualities
 * @param status explicit status names for signals whose status is not the one the quality
 *     implies (analyzer frames without a new sample); empty otherwise
 * @param truth the hidden truth at the frame time
 */
public record PlantSample(long index, double timeS, Frame frame, Map<Signal, StatusName> status, Truth truth) {
  public PlantSample {
    status = Map.copyOf(status);
  }

  /**
   * The simulation-only truth of one frame, SI.
   *
   * @param peakPlateTempK hottest plate temperature, K
   * @param peakPositionM its position from the reforming inlet, m
   * @param bufferMeltFraction length-weighted overall melt fraction
   * @param maxCellMeltFraction largest melt fraction of any cell
   * @param reformingActivity true reforming activity multiplier
   * @param combustionActivity true combustion activity multiplier
   * @param heatLossWPerM2K true heat-loss coefficient, W/(m2 K)
   * @param boundarySi the boundary values before any sensor effect, SI, by signal ordinal
   */
  public record Truth(
      double peakPlateTempK,
      double peakPositionM,
      double bufferMeltFraction,
      double maxCellMeltFraction,
      double reformingActivity,
      double combustionActivity,
      double heatLossWPerM2K,
      double[] boundarySi) {
    public Truth {
      boundarySi = boundarySi.clone();
    }

    @Override
    public double[] boundarySi() {
      return boundarySi.clone();
    }

    /** True boundary value of one signal, SI. */
    public double boundarySi(Signal s) {
      return boundarySi[s.ordinal()];
    }
  }
}
