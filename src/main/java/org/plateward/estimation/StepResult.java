package org.plateward.estimation;

import java.util.List;

/**
 * Immutable outcome of one measurement update: the posterior, what was done with each channel
 * and the health figures. Arrays are copied in and out.
 *
 * @param timeS time the update belongs to (s)
 * @param state posterior state x⁺, length n
 * @param covariance posterior covariance P⁺, n×n
 * @param innovation ν = z − h(x⁻) per channel (NaN where not available), length m
 * @param normalisedInnovation ν_i/√S_ii per channel (NaN where not available)
 * @param usedChannels indices of the channels fused, in order
 * @param innovationCovariance S of the used channels (|used|×|used|)
 * @param nis νᵀS⁻¹ν over the used channels (0 if none)
 * @param channelStatus what happened to each channel
 * @param varianceReduction per state 1 − P⁺_ii/P⁻_ii: how much this update pinned each state
 * @param covarianceRepaired true if P was found not positive definite since the last result and
 *     repaired
 * @param minEigenvalueBeforeRepair smallest eigenvalue found when repairing (NaN if no repair)
 * @param delayed true if this was a delayed measurement applied by rollback
 * @param processNoiseInflation factor λ applied to Q in the propagation that follows
 * @param nisConsistency windowed NIS summary after this update
 * @param driftAlarms active CUSUM alarms of this measurement model
 */
public record StepResult(
    double timeS,
    double[] state,
    double[][] covariance,
    double[] innovation,
    double[] normalisedInnovation,
    int[] usedChannels,
    double[][] innovationCovariance,
    double nis,
    ChannelStatus[] channelStatus,
    double[] varianceReduction,
    boolean covarianceRepaired,
    double minEigenvalueBeforeRepair,
    boolean delayed,
    double processNoiseInflation,
    NisConsistency nisConsistency,
    List<DriftAlarm> driftAlarms) {

  /** Copies every array so the result cannot alias filter internals. */
  public StepResult {
    state = state.clone();
    covariance = Matrices.copy(covariance);
    innovation = innovation.clone();
    normalisedInnovation = normalisedInnovation.clone();
    usedChannels = usedChannels.clone();
    innovationCovariance = Matrices.copy(innovationCovariance);
    channelStatus = channelStatus.clone();
    varianceReduction = varianceReduction.clone();
    driftAlarms = List.copyOf(driftAlarms);
  }

  @Override
  public double[] state() {
    return state.clone();
  }

  @Override
  public double[][] covariance() {
    return Matrices.copy(covariance);
  }

  @Override
  public double[] innovation() {
    return innovation.clone();
  }

  @Override
  public double[] normalisedInnovation() {
    return normalisedInnovation.clone();
  }

  @Override
  public int[] usedChannels() {
    return usedChannels.clone();
  }

  @Override
  public double[][] innovationCovariance() {
    return Matrices.copy(innovationCovariance);
  }

  @Override
  public ChannelStatus[] channelStatus() {
    return channelStatus.clone();
  }

  @Override
  public double[] varianceReduction() {
    return varianceReduction.clone();
  }

  /** Number of channels fused (the NIS degrees of freedom). */
  public int usedCount() {
    return usedChannels.length;
  }

  /** Number of channels with the given status. */
  public int count(ChannelStatus status) {
    int c = 0;
    for (ChannelStatus s : channelStatus) {
      if (s == status) {
        c++;
      }
    }
    return c;
  }

  /** Standard deviation √P_ii of one state (state units). */
  public double sigma(int i) {
    return Math.sqrt(covariance[i][i]);
  }
}
