package org.plateward.estimation;

/** What an update did with one measurement channel. */
public enum ChannelStatus {
  /** Fused into the estimate. */
  USED,
  /** Not available (missing, Bad or stale): skipped, never filled with a guess. */
  MISSING,
  /** Rejected by its own gate: ν²/S_ii above the χ²₁ quantile. */
  GATED_SINGLE,
  /** Rejected by the joint gate: removed (largest ν²/S_ii first) until the joint NIS passed. */
  GATED_JOINT,
  /** A delayed measurement older than the stored history: dropped. */
  TOO_LATE
}
