package org.plateward.ui;

import javafx.scene.Node;
import javafx.scene.shape.Circle;
import javafx.scene.shape.Polygon;
import javafx.scene.shape.Rectangle;
import javafx.scene.shape.Shape;
import org.plateward.alarms.Priority;

/**
 * The mark of an alarm priority: a shape of its own per priority (triangle, diamond, square,
 * circle, most urgent first), filled with the priority's colour and outlined in black, always
 * shown beside the priority's word, so the priority reads without colour.
 */
final class PriorityMark {
  private PriorityMark() {}

  static Node of(Priority p) {
    Shape s = switch (p) {
      case IMMEDIATE -> new Polygon(7, 0, 14, 13, 0, 13);
      case PROMPT -> new Polygon(7, 0, 14, 7, 7, 14, 0, 7);
      case ROUTINE -> new Rectangle(12, 12);
      case NOTICE -> new Circle(6.5);
    };
    s.setFill(Palette.of(p));
    s.setStroke(Palette.TEXT);
    s.setStrokeWidth(1);
    return s;
  }

  /** The word shown beside the mark. */
  static String word(Priority p) {
    return p.key().toUpperCase(java.util.Locale.ROOT);
  }
}
