package org.plateward.fleet;

/** Where one unit's lane in the {@link UnitPool} stands. */
public enum LaneState {
  /** Taking frames (or reading its source) and estimating. */
  RUNNING("running"),
  /** Its feed ended and every frame taken was estimated. */
  FINISHED("finished"),
  /** Its estimator, sink or source threw; the lane takes no more frames (the reason says why). */
  FAILED("failed");

  private final String text;

  LaneState(String text) {
    this.text = text;
  }

  /** The word shown in summaries. */
  public String text() {
    return text;
  }
}
