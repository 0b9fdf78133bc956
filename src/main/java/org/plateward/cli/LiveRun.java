package org.plateward.cli;

import java.io.PrintWriter;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.function.BooleanSupplier;
import org.plateward.config.Dimension;
import org.plateward.config.Quantity;
import org.plateward.config.QuantityFormatException;
import picocli.CommandLine;

/**
 * What {@code watch} and {@code demo} share: the {@code --duration} option and the wait until it
 * passes, Ctrl-C, or the source ends; the clean-up then runs once, on the command's thread, and
 * a Ctrl-C waits for it (history flushed) before the JVM exits.
 */
final class LiveRun {
  private final CountDownLatch stop = new CountDownLatch(1);
  private final CountDownLatch cleaned = new CountDownLatch(1);
  private final Thread hook = new Thread(this::interrupted, "plateward-shutdown");

  /** Parses {@code --duration}; NaN when not given. */
  static double durationS(CommandLine.Model.CommandSpec spec, String text) {
    if (text == null) {
      return Double.NaN;
    }
    try {
      double d = Quantity.parse(text, Dimension.TIME).valueSi();
      if (d > 0.0) {
        return d;
      }
    } catch (QuantityFormatException e) {
      throw new CommandLine.ParameterException(spec.commandLine(), "--duration: " + e.getMessage());
    }
    throw new CommandLine.ParameterException(spec.commandLine(), "--duration: must be positive, got '" + text + "'");
  }

  /**
   * Waits for the duration (NaN: no limit), Ctrl-C, or {@code ended}, polled twice a second.
   *
   * @return why the wait ended, in words
   */
  String await(double durationS, BooleanSupplier ended) throws InterruptedException {
    Runtime.getRuntime().addShutdownHook(hook);
    long deadline = Double.isNaN(durationS) ? Long.MAX_VALUE : System.nanoTime() + Math.round(durationS * 1e9);
    while (true) {
      long left = deadline - System.nanoTime();
      if (left <= 0) {
        return "duration reached";
      }
      if (stop.await(Math.min(left, 500_000_000L), TimeUnit.NANOSECONDS)) {
        return "interrupted (Ctrl-C)";
      }
      if (ended.getAsBoolean()) {
        return "the source ended";
      }
    }
  }

  /** Runs after the clean-up: lets a waiting Ctrl-C go, and removes the hook otherwise. */
  void done(PrintWriter err) {
    cleaned.countDown();
    try {
      Runtime.getRuntime().removeShutdownHook(hook);
    } catch (IllegalStateException | IllegalArgumentException e) {
      // shutting down already, or never added
    }
    err.flush();
  }

  private void interrupted() {
    stop.countDown();
    try {
      cleaned.await(15, TimeUnit.SECONDS);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    }
  }
}
