package org.plateward.ui;

import java.nio.file.Path;
import org.plateward.alarms.AlarmSettings;

/**
 * Opens the control-room window for a command, or says in one line why it cannot, so the
 * command falls back to the console. This class names no JavaFX type, so a headless run never
 * loads the toolkit.
 */
public final class WindowLauncher {
  private WindowLauncher() {}

  /**
   * Why no window can be shown here, in one line; null when a display seems available.
   * Linux and other X11/Wayland systems need {@code DISPLAY} or {@code WAYLAND_DISPLAY}; the
   * headless glass of the tests ({@code glass.platform=Monocle}) counts as a display.
   */
  public static String displayProblem() {
    if ("Monocle".equals(System.getProperty("glass.platform"))) {
      return null;
    }
    if (Boolean.getBoolean("java.awt.headless") && System.getProperty("glass.platform") == null
        && System.getenv("DISPLAY") == null) {
      return "no display (java.awt.headless is set and DISPLAY is not)";
    }
    String os = System.getProperty("os.name", "").toLowerCase(java.util.Locale.ROOT);
    if (os.contains("win") || os.contains("mac")) {
      return null;
    }
    if (isBlank(System.getenv("DISPLAY")) && isBlank(System.getenv("WAYLAND_DISPLAY"))) {
      return "no display (neither DISPLAY nor WAYLAND_DISPLAY is set)";
    }
    try {
      Class.forName("javafx.application.Platform");
    } catch (ClassNotFoundException | LinkageError e) {
      return "JavaFX is not on the class path";
    }
    return null;
  }

  private static boolean isBlank(String s) {
    return s == null || s.isBlank();
  }

  /**
   * Opens the window on the feed and starts it.
   *
   * @param feed the data (started by the window)
   * @param alarms alarm definitions, for the limits drawn (may be null)
   * @param title the window title
   * @return the window
   * @throws IllegalStateException with one line when the toolkit cannot start (no display)
   */
  public static WindowHandle open(DisplayFeed feed, AlarmSettings alarms, String title) {
    return ControlRoomApp.open(feed, alarms, title);
  }

  /**
   * Saves one PNG per view into {@code dir} once the window shows the frame at {@code atS}
   * (epoch s; for a replay the cursor is moved there; NaN: once 30 s of frames are in), then
   * returns the files written.
   *
   * @throws Exception when the window cannot be snapshotted or the files cannot be written
   */
  public static java.util.List<Path> screenshots(WindowHandle window, Path dir, double atS, double timeoutS)
      throws Exception {
    return ControlRoomApp.screenshots(window, dir, atS, timeoutS);
  }

  /**
   * Called when the command is done with every window. The toolkit is left running (the
   * program's main ends the JVM; a toolkit once exited cannot start again in the same JVM, which
   * commands run in-process, as in the tests, would otherwise meet).
   */
  public static void shutdown() {
    // nothing to do: windows are closed by their handles
  }
}
