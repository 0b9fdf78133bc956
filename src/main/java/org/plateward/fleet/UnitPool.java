package org.plateward.fleet;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.plateward.softsensor.EstimationLoop;
import org.plateward.softsensor.FrameSource;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Many units' estimators in one process on one fixed set of threads (by default one per
 * available processor). Each unit gets a {@link UnitLane}: its frames are estimated strictly in
 * order, by one task at a time, so no estimator is ever touched by two threads at once; lanes
 * take turns of at most {@link UnitLane#FRAMES_PER_TURN} frames, so a busy unit cannot starve
 * the others. A fed lane has a bounded queue: {@link UnitLane#put} waits when it is full
 * (back-pressure), {@link UnitLane#offer} drops the oldest frame and counts it. A lane whose
 * estimator, sink or source throws fails alone; its status says why.
 *
 * <p>The task queue of the pool holds at most one task per lane, so it is bounded by the
 * number of lanes.
 */
public final class UnitPool implements AutoCloseable {
  private static final Logger LOGGER = LoggerFactory.getLogger(UnitPool.class);
  private static final AtomicInteger POOLS = new AtomicInteger();
  /** How long {@link #close()} waits for running turns, s. */
  private static final long CLOSE_WAIT_S = 10;

  private final ThreadPoolExecutor executor;
  private final int threads;
  private final Map<String, UnitLane> lanes = new LinkedHashMap<>();

  /** A pool with one thread per available processor. */
  public UnitPool() {
    this(Runtime.getRuntime().availableProcessors());
  }

  /**
   * @param threads number of estimator threads, at least 1
   */
  public UnitPool(int threads) {
    if (threads < 1) {
      throw new IllegalArgumentException("a unit pool needs at least one thread, got " + threads);
    }
    this.threads = threads;
    int pool = POOLS.incrementAndGet();
    AtomicInteger n = new AtomicInteger();
    ThreadFactory factory = r -> {
      Thread t = new Thread(r, "plateward-units-" + pool + "-" + n.incrementAndGet());
      t.setDaemon(true);
      return t;
    };
    this.executor = new ThreadPoolExecutor(threads, threads, 0L, TimeUnit.MILLISECONDS,
        new LinkedBlockingQueue<>(), factory);
  }

  /** Number of estimator threads. */
  public int threads() {
    return threads;
  }

  /**
   * Opens a fed lane: frames come from {@link UnitLane#put} or {@link UnitLane#offer}.
   *
   * @param unitId the unit, unique in this pool
   * @param estimator the unit's estimator (used by this lane only)
   * @param capacity frames that may wait, at least 1
   * @param sink receives each frame and its estimate, in order, on a pool thread; may be null
   * @return the lane
   * @throws IllegalArgumentException for a unit already in the pool or a capacity below 1
   */
  public synchronized UnitLane feed(
      String unitId, UnitEstimator estimator, int capacity, EstimationLoop.Sink sink) {
    if (capacity < 1) {
      throw new IllegalArgumentException("lane capacity must be at least 1 frame, got " + capacity);
    }
    UnitLane lane = new UnitLane(unitId, estimator, sink, executor, capacity, null);
    add(lane);
    return lane;
  }

  /**
   * Opens a reading lane and starts it: the lane pulls frames from {@code source} on the pool
   * until it ends, then closes it. For replay.
   *
   * @param unitId the unit (or input), unique in this pool
   * @param source the frames; owned and closed by the lane
   * @param estimator the unit's estimator (used by this lane only)
   * @param sink receives each frame, its estimate and its truth, in order, on a pool thread;
   *     may be null
   * @return the lane, already running
   * @throws IllegalArgumentException for a unit already in the pool
   */
  public synchronized UnitLane replay(
      String unitId, FrameSource source, UnitEstimator estimator, EstimationLoop.Sink sink) {
    UnitLane lane = new UnitLane(unitId, estimator, sink, executor, 1, source);
    add(lane);
    lane.start();
    return lane;
  }

  private void add(UnitLane lane) {
    if (executor.isShutdown()) {
      throw new IllegalStateException("the unit pool is closed");
    }
    if (lanes.putIfAbsent(lane.unitId(), lane) != null) {
      throw new IllegalArgumentException("unit " + lane.unitId() + " already has a lane in this pool");
    }
  }

  /** The lane of a unit, or null. */
  public synchronized UnitLane lane(String unitId) {
    return lanes.get(unitId);
  }

  /** A snapshot of every lane, in the order they were opened. */
  public synchronized List<LaneStatus> statuses() {
    List<LaneStatus> out = new ArrayList<>();
    for (UnitLane l : lanes.values()) {
      out.add(l.status());
    }
    return out;
  }

  /**
   * Stops the pool: no new turns start, running turns get up to 10 s to end, and every lane
   * still running is marked failed ("the pool is closed"). Idempotent.
   */
  @Override
  public void close() {
    List<UnitLane> all;
    synchronized (this) {
      all = new ArrayList<>(lanes.values());
    }
    executor.shutdown();
    try {
      if (!executor.awaitTermination(CLOSE_WAIT_S, TimeUnit.SECONDS)) {
        LOGGER.warn("unit pool: turns still running after {} s; interrupting", CLOSE_WAIT_S);
        executor.shutdownNow();
      }
    } catch (InterruptedException e) {
      executor.shutdownNow();
      Thread.currentThread().interrupt();
    }
    for (UnitLane l : all) {
      l.abandon("the pool is closed");
    }
  }
}
