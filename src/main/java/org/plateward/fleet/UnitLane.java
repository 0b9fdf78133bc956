package org.plateward.fleet;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.time.Instant;
import java.util.Map;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.Executor;
import java.util.concurrent.RejectedExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicLong;
import org.plateward.signals.Frame;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.EstimationLoop;
import org.plateward.softsensor.FrameSource;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * One unit in a {@link UnitPool}: its estimator, its sink and its frames, processed strictly in
 * order by at most one task at a time on the pool's shared threads.
 *
 * <p>Threading rules. A lane is either <em>fed</em> (frames come from {@link #put} or {@link
 * #offer}, from any thread, into a bounded queue) or <em>reading</em> (it pulls frames from its
 * own {@link FrameSource}, for replay). Whenever there is work and no task of this lane is
 * scheduled, one task is submitted; it handles up to {@link #FRAMES_PER_TURN} frames and then
 * either resubmits itself (so lanes take turns on the threads) or goes idle. The scheduled flag
 * and the executor hand-off order successive tasks, so the estimator, the sink and the source
 * are only ever touched by one thread at a time, each seeing the previous task's writes; none of
 * them need be thread-safe.
 *
 * <p>Failure isolation: anything the estimator, the sink or the source throws stops this lane
 * only. It becomes {@link LaneState#FAILED} with the reason, its queue is cleared (those frames
 * count as dropped), later frames are refused and counted, and the other lanes carry on.
 */
public final class UnitLane {
  private static final Logger LOGGER = LoggerFactory.getLogger(UnitLane.class);
  private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();
  /** Frames one task handles before it gives the thread to the next lane. */
  public static final int FRAMES_PER_TURN = 64;
  /** How often a blocked {@link #put} looks whether the lane failed meanwhile, ms. */
  private static final long PUT_RECHECK_MS = 50;

  /** A frame with the simulation truth that came with it (empty for plant data). */
  private record Fed(Frame frame, Map<String, Double> truth) {}

  private final String unitId;
  private final UnitEstimator estimator;
  private final EstimationLoop.Sink sink;
  private final Executor executor;
  private final ArrayBlockingQueue<Fed> queue;
  private final FrameSource source;
  private final int capacity;
  private final AtomicBoolean scheduled = new AtomicBoolean();
  private final CompletableFuture<LaneStatus> done = new CompletableFuture<>();
  private final AtomicLong accepted = new AtomicLong();
  private final AtomicLong dropped = new AtomicLong();
  private final long openedNanos = System.nanoTime();
  private final boolean cpuClock;

  private volatile LaneState state = LaneState.RUNNING;
  private volatile boolean feedEnded;
  private volatile String reason = "";
  private volatile long estimated;
  private volatile long cpuNanos;
  private volatile Instant firstFrame;
  private volatile Instant lastFrame;
  private volatile int maxQueued;
  private volatile long endedNanos;
  // touched only by the lane's current task
  private boolean sourceEnded;
  private Frame current;

  UnitLane(String unitId, UnitEstimator estimator, EstimationLoop.Sink sink, Executor executor,
      int capacity, FrameSource source) {
    this.unitId = unitId;
    this.estimator = estimator;
    this.sink = sink;
    this.executor = executor;
    this.source = source;
    this.capacity = capacity;
    this.queue = source == null ? new ArrayBlockingQueue<>(capacity) : null;
    this.cpuClock = THREADS.isCurrentThreadCpuTimeSupported();
  }

  /** The unit this lane estimates. */
  public String unitId() {
    return unitId;
  }

  /** How many frames may wait in a fed lane (0 for a lane reading its own source). */
  public int capacity() {
    return source == null ? capacity : 0;
  }

  /**
   * Hands a frame to a fed lane, waiting while its queue is full (back-pressure: the caller
   * runs no faster than the estimator). Returns false at once, counting the frame as dropped,
   * when the lane has failed.
   *
   * @param frame the next frame of this unit, in time order
   * @param truth simulation truth that goes with it (empty for plant data)
   * @return whether the frame was taken
   * @throws InterruptedException when interrupted while waiting
   * @throws IllegalStateException for a reading lane, or after {@link #endFeed()}
   */
  public boolean put(Frame frame, Map<String, Double> truth) throws InterruptedException {
    checkFeedable();
    Fed fed = new Fed(frame, truth);
    while (true) {
      if (state != LaneState.RUNNING) {
        dropped.incrementAndGet();
        return false;
      }
      if (queue.offer(fed, PUT_RECHECK_MS, TimeUnit.MILLISECONDS)) {
        break;
      }
    }
    accepted.incrementAndGet();
    noteQueued();
    schedule();
    return true;
  }

  /** {@link #put(Frame, Map)} without truth. */
  public boolean put(Frame frame) throws InterruptedException {
    return put(frame, Map.of());
  }

  /**
   * Hands a frame to a fed lane without waiting: when its queue is full the <em>oldest</em>
   * waiting frame is dropped and counted (the live choice: the estimate stays current and the
   * estimator sees a gap). Returns false, counting the frame as dropped, when the lane failed.
   *
   * @param frame the next frame of this unit, in time order
   * @return whether the frame was taken
   * @throws IllegalStateException for a reading lane, or after {@link #endFeed()}
   */
  public boolean offer(Frame frame) {
    checkFeedable();
    if (state != LaneState.RUNNING) {
      dropped.incrementAndGet();
      return false;
    }
    Fed fed = new Fed(frame, Map.of());
    synchronized (queue) {
      while (!queue.offer(fed)) {
        if (queue.poll() != null) {
          dropped.incrementAndGet();
        }
      }
    }
    accepted.incrementAndGet();
    noteQueued();
    schedule();
    return true;
  }

  /** No more frames will be fed; the lane finishes once its queue is estimated. Idempotent. */
  public void endFeed() {
    if (source != null) {
      throw new IllegalStateException("lane " + unitId + " reads its own source");
    }
    feedEnded = true;
    schedule();
  }

  /** Completes with the final status when the lane has finished or failed. */
  public CompletableFuture<LaneStatus> done() {
    return done;
  }

  /**
   * Waits for the lane to finish or fail.
   *
   * @param timeoutMs longest wait, ms
   * @return the final status
   * @throws TimeoutException when it is still running after the wait
   */
  public LaneStatus await(long timeoutMs) throws InterruptedException, TimeoutException {
    try {
      return done.get(timeoutMs, TimeUnit.MILLISECONDS);
    } catch (ExecutionException e) {
      throw new IllegalStateException("lane " + unitId + " completed abnormally", e.getCause());
    }
  }

  /** A snapshot of the counters and the state. Thread-safe. */
  public LaneStatus status() {
    long end = endedNanos;
    return new LaneStatus(unitId, state, accepted.get(), estimated, dropped.get(),
        queue == null ? 0 : queue.size(), maxQueued, firstFrame, lastFrame, cpuNanos,
        (end == 0 ? System.nanoTime() : end) - openedNanos,
        source == null ? 0 : source.partialFrames(), reason);
  }

  /** Starts a reading lane (called once by the pool). */
  void start() {
    schedule();
  }

  /** Fails a running lane from outside (pool closed). */
  void abandon(String why) {
    fail(why, null);
  }

  private void checkFeedable() {
    if (source != null) {
      throw new IllegalStateException("lane " + unitId + " reads its own source; it is not fed");
    }
    if (feedEnded) {
      throw new IllegalStateException("lane " + unitId + ": frame fed after endFeed()");
    }
  }

  private void noteQueued() {
    int q = queue.size();
    if (q > maxQueued) {
      maxQueued = q; // benign race: a high-water mark for display
    }
  }

  private void schedule() {
    if (state == LaneState.RUNNING && scheduled.compareAndSet(false, true)) {
      submit();
    }
  }

  private void submit() {
    try {
      executor.execute(this::turn);
    } catch (RejectedExecutionException e) {
      fail("the pool is closed", null);
    }
  }

  /** One turn on a pool thread: up to FRAMES_PER_TURN frames, then resubmit, go idle or end. */
  private void turn() {
    long c0 = cpuClock ? THREADS.getCurrentThreadCpuTime() : 0;
    Throwable thrown = null;
    try {
      for (int i = 0; i < FRAMES_PER_TURN && state == LaneState.RUNNING; i++) {
        Fed fed = nextFed();
        if (fed == null) {
          break;
        }
        step(fed);
      }
    } catch (Exception | Error e) {
      thrown = e;
    }
    if (cpuClock) {
      cpuNanos += THREADS.getCurrentThreadCpuTime() - c0; // one writer: the lane's current task
    }
    if (thrown != null) {
      fail(describe(thrown), thrown);
      if (thrown instanceof OutOfMemoryError oom) {
        throw oom;
      }
      return;
    }
    if (state != LaneState.RUNNING) {
      return;
    }
    if (source != null) {
      if (sourceEnded) {
        end(LaneState.FINISHED, "");
      } else {
        submit(); // scheduled stays true: this lane's next turn
      }
      return;
    }
    scheduled.set(false);
    if (!queue.isEmpty()) {
      schedule();
    } else if (feedEnded && scheduled.compareAndSet(false, true)) {
      // nothing can be fed after endFeed(), so an empty queue now stays empty
      if (queue.isEmpty()) {
        end(LaneState.FINISHED, "");
      } else {
        submit();
      }
    }
  }

  private Fed nextFed() throws IOException {
    if (source == null) {
      return queue.poll();
    }
    if (sourceEnded) {
      return null;
    }
    Frame f = source.next();
    if (f == null) {
      sourceEnded = true;
      return null;
    }
    accepted.incrementAndGet();
    return new Fed(f, source.truth());
  }

  private void step(Fed fed) throws IOException {
    current = fed.frame();
    Estimate e = estimator.accept(fed.frame());
    if (sink != null) {
      sink.accept(fed.frame(), e, fed.truth());
    }
    if (firstFrame == null) {
      firstFrame = fed.frame().time();
    }
    lastFrame = fed.frame().time();
    estimated = estimated + 1; // one writer: the lane's current task
    current = null;
  }

  private String describe(Throwable e) {
    StringBuilder b = new StringBuilder(e.getClass().getSimpleName());
    if (e.getMessage() != null) {
      b.append(": ").append(e.getMessage());
    }
    if (current != null) {
      b.append(" (at frame ").append(current.time());
      if (source != null && !source.position().isEmpty()) {
        b.append(", ").append(source.position());
      }
      b.append(')');
    }
    return b.toString();
  }

  private void fail(String why, Throwable cause) {
    synchronized (this) {
      if (state != LaneState.RUNNING) {
        return;
      }
      reason = why;
      state = LaneState.FAILED;
    }
    if (cause != null) {
      LOGGER.warn("unit {}: estimator lane failed, the other units carry on: {}", unitId, why, cause);
    } else {
      LOGGER.warn("unit {}: estimator lane stopped: {}", unitId, why);
    }
    if (queue != null) {
      synchronized (queue) {
        dropped.addAndGet(queue.size());
        queue.clear();
      }
    }
    finish();
  }

  private void end(LaneState to, String why) {
    synchronized (this) {
      if (state != LaneState.RUNNING) {
        return;
      }
      reason = why;
      state = to;
    }
    finish();
  }

  private void finish() {
    endedNanos = System.nanoTime();
    if (source != null) {
      try {
        source.close();
      } catch (IOException | RuntimeException e) {
        LOGGER.warn("unit {}: closing its source: {}", unitId, e.toString());
      }
    }
    done.complete(status());
  }
}
