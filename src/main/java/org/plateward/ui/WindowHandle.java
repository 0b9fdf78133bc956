package org.plateward.ui;

/** The open window, as the command that opened it sees it (no JavaFX types). */
public interface WindowHandle {
  /** Whether the operator has closed the window (or it was closed). */
  boolean closed();

  /** Closes the window and stops its render tick; the feed stays with its owner. */
  void close();
}
