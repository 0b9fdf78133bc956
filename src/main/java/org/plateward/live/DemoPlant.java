package org.plateward.live;

import java.util.EnumSet;
import java.util.Set;
import org.plateward.opcua.PlantEndpoint;
import org.plateward.opcua.PlantEndpointConfig;
import org.plateward.plant.PlantSample;
import org.plateward.plant.SimulatedPlant;
import org.plateward.signals.Frame;
import org.plateward.signals.Signal;
import org.plateward.signals.StatusName;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The demo's simulated plant on its own thread, paced by a {@link TimeScale} and served on a
 * loopback {@link PlantEndpoint} (invented data). Each frame is served with its wall-clock
 * instant as SourceTimestamp; analyzer channels without a new result keep their DataValue.
 * The endpoint can be stopped and started again on the same port while the plant runs on (a
 * server restart, as a site sees one).
 */
public final class DemoPlant implements AutoCloseable {
  private static final Logger LOGGER = LoggerFactory.getLogger(DemoPlant.class);

  private final SimulatedPlant plant;
  private volatile TimeScale clock;
  private final PlantEndpointConfig endpointConfig;
  private final Thread thread;
  private final String url;
  private final Object endpointLock = new Object();
  private volatile PlantEndpoint endpoint;
  private volatile boolean running = true;
  private volatile long served;

  private DemoPlant(SimulatedPlant plant, PlantEndpoint endpoint, PlantEndpointConfig config) {
    this.plant = plant;
    this.endpoint = endpoint;
    this.endpointConfig = config.withPort(endpoint.port());
    this.url = endpoint.endpointUrl();
    this.thread = new Thread(this::run, "plateward-demo-plant");
    this.thread.setDaemon(true);
  }

  /**
   * Serves the plant on a free loopback port; its variables stay without data until {@link
   * #begin}.
   *
   * @param plant the plant at its first frame (initial steady state solved)
   */
  public static DemoPlant serve(SimulatedPlant plant) {
    return serve(plant, PlantEndpointConfig.defaults().skid());
  }

  /**
   * Serves the plant on a free loopback port under {@code Objects/<skid>} (several simulated
   * skids side by side, each on its own endpoint).
   *
   * @param plant the plant at its first frame (initial steady state solved)
   * @param skid browse name of the skid object: letters, digits, '-' and '_'
   */
  public static DemoPlant serve(SimulatedPlant plant, String skid) {
    PlantEndpointConfig c = PlantEndpointConfig.defaults();
    c = new PlantEndpointConfig(c.host(), 0, c.path(), skid, c.namespaceUri());
    PlantEndpoint ep = PlantEndpoint.start(c);
    return new DemoPlant(plant, ep, c);
  }

  /**
   * Starts the plant.
   *
   * @param pacing frame k (at plant offset t_k) is served at {@code pacing.toWall(t_k)}
   */
  public void begin(TimeScale pacing) {
    this.clock = pacing;
    thread.start();
  }

  /** The endpoint URL (stays the same across a restart). */
  public String endpointUrl() {
    return url;
  }

  public int port() {
    return endpointConfig.port();
  }

  /** Frames served so far. */
  public long served() {
    return served;
  }

  /** Whether the scenario has begun and not yet ended. */
  public boolean running() {
    return thread.isAlive();
  }

  /** Whether the scenario has begun and ended. */
  public boolean ended() {
    return clock != null && !thread.isAlive();
  }

  /** Waits for the end of the scenario, at most {@code millis} (0: forever). */
  public void join(long millis) throws InterruptedException {
    thread.join(millis);
  }

  /** Stops the OPC UA server; the plant runs on unserved. */
  public void stopServing() {
    synchronized (endpointLock) {
      PlantEndpoint ep = endpoint;
      endpoint = null;
      if (ep != null) {
        ep.close();
      }
    }
  }

  /** Starts the OPC UA server again on the same port. */
  public void resumeServing() {
    synchronized (endpointLock) {
      if (endpoint == null) {
        endpoint = PlantEndpoint.start(endpointConfig);
      }
    }
  }

  private void run() {
    try {
      while (running && plant.hasNext()) {
        PlantSample s = plant.next();
        long waitNs = java.time.Duration.between(java.time.Instant.now(), clock.toWall(s.timeS())).toNanos();
        if (waitNs > 0) {
          Thread.sleep(waitNs / 1_000_000L, (int) (waitNs % 1_000_000L));
        }
        PlantEndpoint ep = endpoint;
        if (ep != null) {
          Frame f = s.frame();
          ep.publish(new Frame(clock.toWall(s.timeS()), f.valuesSi(), f.quality()), held(s));
        }
        served++;
      }
      if (running) {
        LOGGER.info("demo scenario {} ended after {} frames", plant.scenario().name(), served);
      }
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    } catch (RuntimeException e) {
      LOGGER.error("simulated plant stopped", e);
    }
  }

  /** Analyzer channels between results: nothing new to report, the DataValue stays. */
  private static Set<Signal> held(PlantSample s) {
    if (s.status().isEmpty()) {
      return Set.of();
    }
    Set<Signal> hold = EnumSet.noneOf(Signal.class);
    s.status().forEach((sig, st) -> {
      if (st == StatusName.UNCERTAIN_LAST_USABLE_VALUE) {
        hold.add(sig);
      }
    });
    return hold;
  }

  /** Stops the plant and its server. */
  @Override
  public void close() {
    running = false;
    thread.interrupt();
    try {
      thread.join(5000);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    }
    stopServing();
  }
}
