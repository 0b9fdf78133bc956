package org.plateward.ui;

import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import javafx.scene.Scene;
import javafx.scene.image.PixelReader;
import javafx.scene.image.WritableImage;
import javafx.stage.Stage;
import org.plateward.config.PlatewardConfig;
import org.plateward.history.HistoryRecorder;
import org.testfx.api.FxToolkit;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The window on a replay recording through the real replay path (replay file → soft sensor →
 * alarm board → advisor on the feed's thread → mailbox → render tick), on the headless
 * Monocle glass the build configures.
 */
final class WindowFixture implements AutoCloseable {
  static final Path CONFIG = Path.of("config", "plateward.toml");
  static final Path FUEL_SURGE = Path.of("replay-data", "fuel-surge.csv");

  final PlatewardConfig cfg;
  final ReplayFeed feed;
  final ControlRoomWindow window;
  final Stage stage;

  private WindowFixture(PlatewardConfig cfg, ReplayFeed feed, ControlRoomWindow window, Stage stage) {
    this.cfg = cfg;
    this.feed = feed;
    this.window = window;
    this.stage = stage;
  }

  /** Opens the window on a recording (audit: the recorder given, or none). */
  static WindowFixture open(Path recording, HistoryRecorder audit) throws Exception {
    Stage primary = FxToolkit.registerPrimaryStage();
    PlatewardConfig cfg = PlatewardConfig.load(CONFIG);
    ReplayFeed feed = ReplayFeed.ofFile(cfg.unit(), cfg.alarms(), cfg.advisor(), recording, audit);
    ControlRoomWindow[] w = new ControlRoomWindow[1];
    FxToolkit.setupStage(stage -> {
      w[0] = new ControlRoomWindow(feed, cfg.alarms());
      Scene scene = new Scene(w[0].root(), 1400, 950);
      w[0].bindKeys(scene);
      stage.setScene(scene);
      stage.show();
      stage.toFront();
      stage.requestFocus();
      w[0].start();
    });
    WaitForAsyncUtils.waitForFxEvents();
    return new WindowFixture(cfg, feed, w[0], primary);
  }

  /** Runs on the FX thread and waits. */
  <T> T fx(java.util.concurrent.Callable<T> c) throws Exception {
    return WaitForAsyncUtils.asyncFx(c).get(30, TimeUnit.SECONDS);
  }

  void fxRun(Runnable r) throws Exception {
    fx(() -> {
      r.run();
      return null;
    });
  }

  /** Waits until the cursor stands at or after t (epoch s). */
  void awaitCursor(double tS, double timeoutS) throws Exception {
    WaitForAsyncUtils.waitFor((long) (timeoutS * 1000), TimeUnit.MILLISECONDS,
        () -> fx(() -> window.cursor().cursorS() >= tS - 1e-6));
  }

  /** Selects view i, redraws it and snapshots the scene. */
  WritableImage snapshotOf(int view) throws Exception {
    fxRun(() -> window.tabs().getSelectionModel().select(view));
    WaitForAsyncUtils.waitForFxEvents();
    return fx(() -> {
      window.invalidate();
      window.pulseNow();
      stage.getScene().getRoot().applyCss();
      stage.getScene().getRoot().layout();
      return stage.getScene().snapshot(null);
    });
  }

  /** Pixels in the band [y0, y1) of an image that are darker than the background by more than 60 levels. */
  static int darkPixels(WritableImage img, int y0, int y1) {
    PixelReader r = img.getPixelReader();
    int n = 0;
    for (int y = y0; y < Math.min(y1, (int) img.getHeight()); y++) {
      for (int x = 0; x < (int) img.getWidth(); x++) {
        int argb = r.getArgb(x, y);
        int g = ((argb >> 16 & 0xff) + (argb >> 8 & 0xff) + (argb & 0xff)) / 3;
        if (g < 208 - 60) {
          n++;
        }
      }
    }
    return n;
  }

  @Override
  public void close() throws Exception {
    fxRun(window::stop);
    feed.close();
    FxToolkit.cleanupStages();
  }
}
