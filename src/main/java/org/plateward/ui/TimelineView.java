package org.plateward.ui;

import javafx.scene.Node;

/** One view of the window: draws the timeline at the cursor's frame. FX thread only. */
interface TimelineView {
  /** The view's name (a tab). */
  String title();

  /** The view's node. */
  Node node();

  /**
   * Shows the frame at {@code index} of the timeline (the cursor); index is -1 when the timeline
   * is empty.
   */
  void show(Timeline tl, int index);
}
