package org.plateward.ui;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import javafx.application.Platform;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.Scene;
import javafx.scene.image.WritableImage;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.plateward.alarms.AlarmSettings;

/** Starts the toolkit (once per process) and shows windows; FX types live here. */
final class ControlRoomApp {
  private static final AtomicBoolean STARTED = new AtomicBoolean();

  private ControlRoomApp() {}

  /** Starts the JavaFX platform unless running; waits for it. */
  static void startToolkit() {
    if (STARTED.compareAndSet(false, true)) {
      CountDownLatch up = new CountDownLatch(1);
      try {
        Platform.startup(up::countDown);
      } catch (IllegalStateException alreadyRunning) {
        up.countDown();
      } catch (RuntimeException | LinkageError e) {
        STARTED.set(false);
        throw new IllegalStateException("the window cannot start: " + e.getMessage(), e);
      }
      Platform.setImplicitExit(false);
      try {
        up.await(20, TimeUnit.SECONDS);
      } catch (InterruptedException e) {
        Thread.currentThread().interrupt();
      }
    }
  }

  static final class Handle implements WindowHandle {
    final Stage stage;
    final ControlRoomWindow window;
    final AtomicBoolean closed = new AtomicBoolean();

    Handle(Stage stage, ControlRoomWindow window) {
      this.stage = stage;
      this.window = window;
    }

    @Override
    public boolean closed() {
      return closed.get();
    }

    @Override
    public void close() {
      if (closed.compareAndSet(false, true)) {
        onFx(() -> {
          window.stop();
          stage.close();
          return null;
        });
      } else {
        window.mailbox().close();
      }
    }
  }

  static WindowHandle open(DisplayFeed feed, AlarmSettings alarms, String title) {
    startToolkit();
    return onFx(() -> {
      ControlRoomWindow w = new ControlRoomWindow(feed, alarms);
      Stage stage = new Stage();
      Scene scene = new Scene(w.root(), 1500, 1000);
      w.bindKeys(scene);
      stage.setScene(scene);
      stage.setTitle(title);
      Handle h = new Handle(stage, w);
      stage.setOnHidden(e -> {
        h.closed.set(true);
        w.stop();
      });
      stage.show();
      stage.requestFocus();
      w.start();
      return h;
    });
  }

  static List<Path> screenshots(WindowHandle handle, Path dir, double atS, double timeoutS) throws Exception {
    Handle h = (Handle) handle;
    ControlRoomWindow w = h.window;
    Files.createDirectories(dir);
    long deadline = System.nanoTime() + (long) (timeoutS * 1e9);
    ReplayCursor c = w.cursor();
    if (c != null && !Double.isNaN(atS)) {
      onFx(() -> {
        c.scrubTo(atS);
        return null;
      });
    }
    while (System.nanoTime() < deadline) {
      boolean ready = onFx(() -> {
        Timeline tl = w.timeline();
        if (tl.size() == 0) {
          return false;
        }
        double shown = c != null ? c.cursorS() : tl.timeS(tl.size() - 1);
        double want = Double.isNaN(atS) ? tl.timeS(0) + 30 : atS;
        return shown >= want - 1.0;
      });
      if (ready) {
        break;
      }
      Thread.sleep(100);
    }
    List<Path> out = new ArrayList<>();
    String[] names = {"plate-profile", "trends", "alarms", "advisor", "replay", "estimator-health"};
    for (int i = 0; i < names.length; i++) {
      int k = i;
      onFx(() -> {
        if (k == 1) {
          w.trends().selectRange(1); // the trends over the last hour
        }
        w.tabs().getSelectionModel().select(k);
        w.invalidate();
        w.pulseNow();
        return null;
      });
      Thread.sleep(400); // let layout and a few pulses settle
      WritableImage img = onFx(() -> {
        w.invalidate();
        w.pulseNow();
        return h.stage.getScene().snapshot(null);
      });
      Path f = dir.resolve(String.format(Locale.ROOT, "window-%d-%s.png", i + 1, names[i]));
      ImageIO.write(SwingFXUtils.fromFXImage(img, null), "png", f.toFile());
      out.add(f);
    }
    return out;
  }

  /** Runs on the FX thread and waits for the result. */
  static <T> T onFx(java.util.concurrent.Callable<T> work) {
    if (Platform.isFxApplicationThread()) {
      try {
        return work.call();
      } catch (Exception e) {
        throw new IllegalStateException(e.getMessage(), e);
      }
    }
    CompletableFuture<T> f = new CompletableFuture<>();
    Platform.runLater(() -> {
      try {
        f.complete(work.call());
      } catch (Throwable e) {
        f.completeExceptionally(e);
      }
    });
    try {
      return f.get(30, TimeUnit.SECONDS);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new IllegalStateException("interrupted", e);
    } catch (java.util.concurrent.ExecutionException e) {
      throw new IllegalStateException(e.getCause().getMessage(), e.getCause());
    } catch (java.util.concurrent.TimeoutException e) {
      throw new IllegalStateException("the window did not answer within 30 s", e);
    }
  }
}
