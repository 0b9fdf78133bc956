package org.plateward.advisor;

/** What the fuel-trim advisor concluded. */
public enum TrimVerdict {
  /** Holding the present fuel flow keeps the forecast peak upper bound below the limit. */
  NO_TRIM_NEEDED,
  /** A fuel reduction within the bounds keeps it below the limit. */
  TRIM,
  /** Not even the largest reduction allowed keeps it below the limit. */
  NO_TRIM_SUFFICES,
  /** No suggestion: the estimate it would be made from is not trustworthy (the reason says why). */
  HELD_BACK
}
