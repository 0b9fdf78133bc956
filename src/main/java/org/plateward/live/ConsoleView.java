package org.plateward.live;

import java.io.PrintWriter;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;

/**
 * The headless console: the status block every few seconds, and one line whenever the link,
 * the estimator status or history changes. Prints on its own thread.
 */
public final class ConsoleView implements AutoCloseable {
  private final LiveMonitor monitor;
  private final PrintWriter out;
  private final ScheduledExecutorService timer;
  private volatile String lastBlock = "";

  private ConsoleView(LiveMonitor monitor, PrintWriter out) {
    this.monitor = monitor;
    this.out = out;
    this.timer = Executors.newSingleThreadScheduledExecutor(r -> {
      Thread t = new Thread(r, "plateward-console");
      t.setDaemon(true);
      return t;
    });
  }

  /**
   * Starts printing.
   *
   * @param monitor the monitor to show
   * @param out where to print
   * @param refreshS seconds between status blocks, &gt; 0
   */
  public static ConsoleView start(LiveMonitor monitor, PrintWriter out, double refreshS) {
    ConsoleView v = new ConsoleView(monitor, out);
    monitor.addChangeListener(line -> v.timer.execute(() -> v.print("-- " + line + "\n")));
    long ms = Math.max(100, Math.round(refreshS * 1000));
    v.timer.scheduleAtFixedRate(v::block, ms, ms, TimeUnit.MILLISECONDS);
    return v;
  }

  /** The last block printed. */
  public String lastBlock() {
    return lastBlock;
  }

  /** Prints the block now. */
  public void block() {
    String b = StatusBlock.render(monitor.status());
    lastBlock = b;
    print(b);
  }

  private synchronized void print(String text) {
    out.print(text);
    out.flush();
  }

  /** Stops printing (after the last block, printed now). */
  @Override
  public void close() {
    timer.shutdown();
    try {
      timer.awaitTermination(2, TimeUnit.SECONDS);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    }
    block();
  }
}
