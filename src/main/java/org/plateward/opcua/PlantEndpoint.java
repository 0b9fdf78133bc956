package org.plateward.opcua;

import java.io.IOException;
import java.net.BindException;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.net.ServerSocket;
import java.net.UnknownHostException;
import java.security.KeyPair;
import java.security.cert.X509Certificate;
import java.util.EnumMap;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import org.eclipse.milo.opcua.sdk.server.EndpointConfig;
import org.eclipse.milo.opcua.sdk.server.OpcUaServer;
import org.eclipse.milo.opcua.sdk.server.OpcUaServerConfig;
import org.eclipse.milo.opcua.sdk.server.identity.AnonymousIdentityValidator;
import org.eclipse.milo.opcua.sdk.server.nodes.UaVariableNode;
import org.eclipse.milo.opcua.stack.core.security.DefaultApplicationGroup;
import org.eclipse.milo.opcua.stack.core.security.DefaultCertificateManager;
import org.eclipse.milo.opcua.stack.core.security.DefaultServerCertificateValidator;
import org.eclipse.milo.opcua.stack.core.security.MemoryCertificateQuarantine;
import org.eclipse.milo.opcua.stack.core.security.MemoryCertificateStore;
import org.eclipse.milo.opcua.stack.core.security.MemoryTrustListManager;
import org.eclipse.milo.opcua.stack.core.security.RsaSha256CertificateFactory;
import org.eclipse.milo.opcua.stack.core.security.SecurityPolicy;
import org.eclipse.milo.opcua.stack.core.transport.TransportProfile;
import org.eclipse.milo.opcua.stack.core.types.builtin.DataValue;
import org.eclipse.milo.opcua.stack.core.types.builtin.DateTime;
import org.eclipse.milo.opcua.stack.core.types.builtin.LocalizedText;
import org.eclipse.milo.opcua.stack.core.types.builtin.NodeId;
import org.eclipse.milo.opcua.stack.core.types.builtin.StatusCode;
import org.eclipse.milo.opcua.stack.core.types.builtin.Variant;
import org.eclipse.milo.opcua.stack.core.types.enumerated.MessageSecurityMode;
import org.eclipse.milo.opcua.stack.core.types.structured.BuildInfo;
import org.eclipse.milo.opcua.stack.core.util.SelfSignedCertificateBuilder;
import org.eclipse.milo.opcua.stack.core.util.SelfSignedCertificateGenerator;
import org.eclipse.milo.opcua.stack.transport.server.tcp.OpcTcpServerTransport;
import org.eclipse.milo.opcua.stack.transport.server.tcp.OpcTcpServerTransportConfig;
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
  private static final long START_STOP_TIMEOUT_S = 20;

  private final PlantEndpointConfig config;
  private final int port;
  private final OpcUaServer server;
  private final PlantNamespace namespace;
  private final Map<Signal, UaVariableNode> variables;
  private final boolean[] hadValue = new boolean[Signal.COUNT];
  private final Object publishLock = new Object();
  private boolean closed;

  private PlantEndpoint(
      PlantEndpointConfig config, int port, OpcUaServer server, PlantNamespace namespace) {
    this.config = config;
    this.port = port;
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
    InetAddress address = loopbackAddress(config.host());
    int port = config.port() == 0 ? freePort(address) : config.port();
    ensurePortFree(config.host(), address, port);
    LOGGER.warn(
        "plant endpoint offers SecurityPolicy None with anonymous access; bound to loopback {} only",
        config.host());

    OpcUaServer server;
    try {
      server = new OpcUaServer(serverConfig(config, port), transportProfile -> tcpTransport());
    } catch (Exception e) {
      throw new EndpointStartException("could not configure the plant OPC UA server", e);
    }
    var layout = new PlantAddressLayout(config.skid());
    var namespace = new PlantNamespace(server, config.namespaceUri(), layout);
    namespace.startup();
    try {
      server.startup().get(START_STOP_TIMEOUT_S, TimeUnit.SECONDS);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      namespace.shutdown();
      throw new EndpointStartException("interrupted while starting the plant endpoint", e);
    } catch (ExecutionException | TimeoutException e) {
      namespace.shutdown();
      server.shutdown();
      if (hasCause(e, BindException.class)) {
        throw new EndpointPortInUseException(config.host(), port, e);
      }
      throw new EndpointStartException("the plant OPC UA server did not start: " + e, e);
    }
    var endpoint = new PlantEndpoint(config, port, server, namespace);
    LOGGER.info("plant endpoint up at {} (namespace {})", endpoint.endpointUrl(), config.namespaceUri());
    return endpoint;
  }

  /** The endpoint URL clients connect to, e.g. {@code opc.tcp://127.0.0.1:4841/plateward/plant}. */
  public String endpointUrl() {
    return "opc.tcp://" + config.host() + ":" + port + config.path();
  }

  /** The TCP port actually bound (differs from the configuration when that asked for port 0). */
  public int port() {
    return port;
  }

  public String namespaceUri() {
    return config.namespaceUri();
  }

  /** NodeId of the variable serving this signal, with the server's namespace index. */
  public NodeId nodeId(Signal signal) {
    return namespace.nodeId(signal);
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
    namespace.shutdown();
    try {
      server.shutdown().get(START_STOP_TIMEOUT_S, TimeUnit.SECONDS);
      LOGGER.info("plant endpoint at {} stopped", endpointUrl());
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    } catch (ExecutionException | TimeoutException e) {
      LOGGER.warn("plant endpoint did not shut down cleanly: {}", e.toString());
    }
  }

  private static InetAddress loopbackAddress(String host) {
    InetAddress address;
    try {
      address = InetAddress.getByName(host);
    } catch (UnknownHostException e) {
      throw new IllegalArgumentException("unknown host for the plant endpoint: " + host, e);
    }
    if (!address.isLoopbackAddress()) {
      throw new IllegalArgumentException(
          "the plant endpoint offers SecurityPolicy None and binds to loopback only; "
              + host
              + " is not a loopback address");
    }
    return address;
  }

  private static int freePort(InetAddress address) {
    try (ServerSocket s = new ServerSocket(0, 1, address)) {
      return s.getLocalPort();
    } catch (IOException e) {
      throw new EndpointStartException("could not find a free port on " + address, e);
    }
  }

  private static void ensurePortFree(String host, InetAddress address, int port) {
    try (ServerSocket s = new ServerSocket()) {
      s.setReuseAddress(true);
      s.bind(new InetSocketAddress(address, port));
    } catch (BindException e) {
      throw new EndpointPortInUseException(host, port, e);
    } catch (IOException e) {
      throw new EndpointStartException("could not probe port " + port + " on " + host, e);
    }
  }

  private static boolean hasCause(Throwable t, Class<? extends Throwable> type) {
    for (Throwable c = t; c != null; c = c.getCause()) {
      if (type.isInstance(c)) {
        return true;
      }
    }
    return false;
  }

  private static OpcTcpServerTransport tcpTransport() {
    return new OpcTcpServerTransport(OpcTcpServerTransportConfig.newBuilder().build());
  }

  private static OpcUaServerConfig serverConfig(PlantEndpointConfig config, int port)
      throws Exception {
    String applicationUri = config.namespaceUri() + ":server";
    KeyPair keyPair = SelfSignedCertificateGenerator.generateRsaKeyPair(2048);
    X509Certificate certificate =
        new SelfSignedCertificateBuilder(keyPair)
            .setCommonName("Plateward simulated plant")
            .setOrganization("Plateward")
            .setApplicationUri(applicationUri)
            .addDnsName("localhost")
            .addIpAddress(config.host())
            .build();
    X509Certificate[] chain = {certificate};

    var trustList = new MemoryTrustListManager();
    var quarantine = new MemoryCertificateQuarantine();
    var factory =
        new RsaSha256CertificateFactory() {
          @Override
          protected KeyPair createRsaSha256KeyPair() {
            return keyPair;
          }

          @Override
          protected X509Certificate[] createRsaSha256CertificateChain(KeyPair kp) {
            return chain;
          }
        };
    var group =
        DefaultApplicationGroup.createAndInitialize(
            trustList,
            new MemoryCertificateStore(),
            factory,
            new DefaultServerCertificateValidator(trustList, quarantine));

    EndpointConfig endpoint =
        EndpointConfig.newBuilder()
            .setTransportProfile(TransportProfile.TCP_UASC_UABINARY)
            .setBindAddress(config.host())
            .setBindPort(port)
            .setHostname(config.host())
            .setPath(config.path())
            .setCertificate(certificate)
            .setSecurityPolicy(SecurityPolicy.None)
            .setSecurityMode(MessageSecurityMode.None)
            .addTokenPolicies(OpcUaServerConfig.USER_TOKEN_POLICY_ANONYMOUS)
            .build();

    return OpcUaServerConfig.builder()
        .setApplicationUri(applicationUri)
        .setApplicationName(LocalizedText.english("Plateward simulated plant"))
        .setProductUri("urn:plateward")
        .setBuildInfo(
            new BuildInfo(
                "urn:plateward",
                "Plateward",
                "Plateward simulated plant",
                OpcUaServer.SDK_VERSION,
                "",
                DateTime.now()))
        .setEndpoints(Set.of(endpoint))
        .setCertificateManager(new DefaultCertificateManager(quarantine, group))
        .setIdentityValidator(AnonymousIdentityValidator.INSTANCE)
        .build();
  }
}
