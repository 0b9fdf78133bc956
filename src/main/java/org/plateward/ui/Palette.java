package org.plateward.ui;

import javafx.scene.paint.Color;
import org.plateward.alarms.Priority;

/**
 * The window's colours after the practice of ANSI/ISA-101.01: a neutral grey background, dark
 * grey and black for normal values, and colour only where something is abnormal (alarm
 * priorities, an untrustworthy estimator, a lost link). Every colour is paired with a shape or a
 * word elsewhere, so nothing depends on colour alone.
 */
public final class Palette {
  private Palette() {}

  /** Background of every view. */
  public static final Color BACKGROUND = Color.rgb(208, 208, 208);
  /** Plot area (slightly lighter than the background). */
  public static final Color PLOT = Color.rgb(222, 222, 222);
  /** Text and normal traces. */
  public static final Color TEXT = Color.rgb(20, 20, 20);
  /** Secondary text, axes and grid labels. */
  public static final Color MUTED = Color.rgb(85, 85, 85);
  /** Grid lines. */
  public static final Color GRID = Color.rgb(190, 190, 190);
  /** The main estimate trace. */
  public static final Color ESTIMATE = Color.rgb(25, 25, 25);
  /** A second trace in the same plot (model prediction, second signal). */
  public static final Color SECOND = Color.rgb(70, 85, 120);
  /** The model's prediction, drawn wide and light under the measured trace. */
  public static final Color MODEL = Color.rgb(160, 168, 182);
  /** Uncertainty bands (±σ, ±2σ). */
  public static final Color BAND = Color.rgb(150, 160, 175, 0.45);
  /** Limit lines. */
  public static final Color LIMIT = Color.rgb(60, 60, 60);
  /** Abnormal, most urgent. */
  public static final Color IMMEDIATE = Color.rgb(200, 30, 30);
  /** Abnormal, act within minutes. */
  public static final Color PROMPT = Color.rgb(230, 120, 0);
  /** Abnormal, act within the shift. */
  public static final Color ROUTINE = Color.rgb(215, 185, 0);
  /** For awareness (shown with its shape). */
  public static final Color NOTICE = Color.rgb(110, 60, 160);

  /** The colour of an alarm priority. */
  public static Color of(Priority p) {
    return switch (p) {
      case IMMEDIATE -> IMMEDIATE;
      case PROMPT -> PROMPT;
      case ROUTINE -> ROUTINE;
      case NOTICE -> NOTICE;
    };
  }

  /** CSS rgb() text of a colour. */
  public static String css(Color c) {
    return String.format(java.util.Locale.ROOT, "rgba(%d,%d,%d,%.2f)", (int) Math.round(c.getRed() * 255),
        (int) Math.round(c.getGreen() * 255), (int) Math.round(c.getBlue() * 255), c.getOpacity());
  }
}
