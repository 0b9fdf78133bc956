package org.plateward.history;

/** Where the frames of a run come from. */
public enum SourceKind {
  /** A real OPC UA endpoint ({@code plateward watch}). */
  LIVE("live"),
  /** A recorded period run again ({@code plateward replay}). */
  REPLAY("replay"),
  /** The simulated plant of {@code plateward demo}. */
  DEMO("demo");

  private final String stored;

  SourceKind(String stored) {
    this.stored = stored;
  }

  /** The text stored in the {@code runs.source} column. */
  public String stored() {
    return stored;
  }

  /** The kind stored as {@code text}, or null. */
  public static SourceKind byStored(String text) {
    for (SourceKind k : values()) {
      if (k.stored.equals(text)) {
        return k;
      }
    }
    return null;
  }
}
