package org.plateward.ui;

import javafx.scene.canvas.Canvas;
import javafx.scene.layout.Pane;

/** A canvas that fills its pane and asks for a redraw when resized. */
final class CanvasPane extends Pane {
  private final Canvas canvas = new Canvas();
  private Runnable onResize = () -> {};

  CanvasPane() {
    getChildren().add(canvas);
    setMinSize(200, 150);
  }

  Canvas canvas() {
    return canvas;
  }

  void onResize(Runnable r) {
    onResize = r;
  }

  @Override
  protected void layoutChildren() {
    double w = Math.floor(getWidth());
    double h = Math.floor(getHeight());
    if (w != canvas.getWidth() || h != canvas.getHeight()) {
      canvas.setWidth(w);
      canvas.setHeight(h);
      onResize.run();
    }
  }
}
