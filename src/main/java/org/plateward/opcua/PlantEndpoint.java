package org.plateward.opcua;

import java.security.cert.X509Certificate;
import java.util.EnumMap;
import java.util.Map;
import java.util.Set;
import java.util.function.UnaryOperator;
import org.eclipse.milo.opcua.sdk.server.nodes.UaVariableNode;
import org.eclipse.milo.opcua.stack.core.types.builtin.DataValue;
import org.eclipse.milo.opcua.stack.core.types.builtin.DateTime;
import org.eclipse.milo.opcua.stack.core.types.builtin.NodeId;
import org.eclipse.milo.opcua.stack.core.types.builtin.StatusCode;
import org.eclipse.milo.opcua.stack.core.types.builtin.Variant;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;
import org.plateward.signals.StatusName;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The simulated plant as an OPC UA server (Milo server SDK): one read-only Double variable per
 * boundary signal, in its edge unit, below {@code Objects/<skid>} (see {@link
 * PlantAddressLayout}). The endpoint offers SecurityPolicy None with anonymous identity, and so
 * binds to loopback only. Its application certificate is self-signed, generated at start-up and
 * held in memory.
 *
 * <p>Values are pushed with {@link #publish(Frame)}; subscribed clients see them at their
 * monitored items' sampling interval.
 */
public final class PlantEndpoint implements AutoCloseable {
  private static final Logger LOGGER = LoggerFactory.getLogger(PlantEndpoint.class);

  private final PlantEndpointConfig config;
  private final EmbeddedServer server;
  private final PlantNamespace namespace;
  private final Map<Signal, UaVariableNode> variables;
  private final boolean[] hadValue = new boolean[Signal.COUNT];
  private final Object publishLock = new Object();
  private boolean closed;

  private PlantEndpoint(PlantEndpointConfig config, EmbeddedServer server, PlantNamespace namespace) {
    this.config = config;
    this.server = server;
    this.namespace = namespace;
    Map<Signal, UaVariableNode> m = new EnumMap<>(Signal.class);
    for (Signal s : Signal.values()) {
      m.put(s, namespace.variable(s));
    }
    this.variables = m;
  }

  /**
   * Builds and starts the endpoint. Returns once clients can connect.
   *
   * @throws EndpointPortInUseException when the configured port is held by another program
   * @throws IllegalArgumentException when the host is not a loopback address
   * @throws EndpointStartException when the server fails to start for another reason
   */
  public static PlantEndpoint start(PlantEndpointConfig config) {
    return start(config, UnaryOperator.identity());
  }

  /**
   * As {@link #start(PlantEndpointConfig)}, with the server spec adjusted first (tests: security,
   * identity validators, service-set wrappers).
   */
  static PlantEndpoint start(PlantEndpointConfig config, UnaryOperator<EmbeddedServer.Spec> adjust) {
    var layout = new PlantAddressLayout(config.skid());
    EmbeddedServer.Spec spec =
        adjust.apply(
            EmbeddedServer.Spec.loopback(
                config.host(),
                config.port(),
                config.path(),
                config.namespaceUri() + ":server",
                "Plateward simulated plant"));
    PlantNamespace[] ns = new PlantNamespace[1];
    EmbeddedServer server =
        EmbeddedServer.start(
            spec, s -> ns[0] = new PlantNamespace(s, config.namespaceUri(), layout));
    var endpoint = new PlantEndpoint(config, server, ns[0]);
    LOGGER.info("plant endpoint up at {} (namespace {})", endpoint.endpointUrl(), config.namespaceUri());
    return endpoint;
  }

  /** The endpoint URL clients connect to, e.g. {@code opc.tcp://127.0.0.1:4841/plateward/plant}. */
  public String endpointUrl() {
    return server.endpointUrl();
  }

  /** The TCP port actually bound (differs from the configuration when that asked for port 0). */
  public int port() {
    return server.port();
  }

  public String namespaceUri() {
    return config.namespaceUri();
  }

  /** NodeId of the variable serving this signal, with the server's namespace index. */
  public NodeId nodeId(Signal signal) {
    return namespace.nodeId(signal);
  }

  /** The server's self-signed application certificate. */
  X509Certificate certificate() {
    return server.certificate();
  }

  /**
   * Sets every signal variable from one frame: the value in the signal's edge unit, the
   * SourceTimestamp to the frame time, the ServerTimestamp to now, and the StatusCode from the
   * frame quality by {@link StatusName#forQuality}. A usable quality with a non-finite value is
   * served as MISSING. Thread-safe; does no I/O and waits only for a concurrent publish.
   *
   * @param frame values in SI
   */
  public void publish(Frame frame) {
    publish(frame, Set.of());
  }

  /**
   * Like {@link #publish(Frame)}, except that the signals in {@code hold} keep the DataValue
   * they have (value, StatusCode and SourceTimestamp): a sampling instrument, such as the
   * composition analyzer between two results, has nothing new to report.
   *
   * @param frame values in SI
   * @param hold signals left unchanged in this frame
   */
  public void publish(Frame frame, Set<Signal> hold) {
    DateTime source = new DateTime(frame.time());
    synchronized (publishLock) {
      if (closed) {
        return;
      }
      DateTime serverTime = DateTime.now();
      for (Signal s : Signal.values()) {
        if (hold.contains(s)) {
          continue;
        }
        int i = s.ordinal();
        double si = frame.valueSi(s);
        Quality q = frame.quality(s);
        boolean finite = Double.isFinite(si);
        if (q.usable() && !finite) {
          q = Quality.MISSING;
        }
        StatusName status = StatusName.forQuality(q, hadValue[i]);
        hadValue[i] |= q != Quality.MISSING;
        Variant value =
            finite && q != Quality.MISSING ? new Variant(s.unit().fromSi(si)) : Variant.NULL_VALUE;
        variables
            .get(s)
            .setValue(new DataValue(value, new StatusCode(status.code()), source, serverTime));
      }
    }
  }

  /** Stops the namespace, then the server. Idempotent. */
  @Override
  public void close() {
    synchronized (publishLock) {
      if (closed) {
        return;
      }
      closed = true;
    }
    server.close();
  }
}
