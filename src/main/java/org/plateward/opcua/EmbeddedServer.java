package org.plateward.opcua;

import java.io.IOException;
import java.net.BindException;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.net.ServerSocket;
import java.net.UnknownHostException;
import java.security.KeyPair;
import java.security.cert.X509Certificate;
import java.util.LinkedHashSet;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.function.Consumer;
import java.util.function.Function;
import org.eclipse.milo.opcua.sdk.server.EndpointConfig;
import org.eclipse.milo.opcua.sdk.server.ManagedNamespaceWithLifecycle;
import org.eclipse.milo.opcua.sdk.server.OpcUaServer;
import org.eclipse.milo.opcua.sdk.server.OpcUaServerConfig;
import org.eclipse.milo.opcua.sdk.server.identity.AnonymousIdentityValidator;
import org.eclipse.milo.opcua.sdk.server.identity.IdentityValidator;
import org.eclipse.milo.opcua.stack.core.security.CertificateValidator;
import org.eclipse.milo.opcua.stack.core.security.DefaultApplicationGroup;
import org.eclipse.milo.opcua.stack.core.security.DefaultCertificateManager;
import org.eclipse.milo.opcua.stack.core.security.DefaultServerCertificateValidator;
import org.eclipse.milo.opcua.stack.core.security.MemoryCertificateQuarantine;
import org.eclipse.milo.opcua.stack.core.security.MemoryCertificateStore;
import org.eclipse.milo.opcua.stack.core.security.MemoryTrustListManager;
import org.eclipse.milo.opcua.stack.core.security.RsaSha256CertificateFactory;
import org.eclipse.milo.opcua.stack.core.security.SecurityPolicy;
import org.eclipse.milo.opcua.stack.core.transport.TransportProfile;
import org.eclipse.milo.opcua.stack.core.types.builtin.DateTime;
import org.eclipse.milo.opcua.stack.core.types.builtin.LocalizedText;
import org.eclipse.milo.opcua.stack.core.types.enumerated.MessageSecurityMode;
import org.eclipse.milo.opcua.stack.core.types.structured.BuildInfo;
import org.eclipse.milo.opcua.stack.core.types.structured.UserTokenPolicy;
import org.eclipse.milo.opcua.stack.core.util.SelfSignedCertificateBuilder;
import org.eclipse.milo.opcua.stack.core.util.SelfSignedCertificateGenerator;
import org.eclipse.milo.opcua.stack.transport.server.tcp.OpcTcpServerTransport;
import org.eclipse.milo.opcua.stack.transport.server.tcp.OpcTcpServerTransportConfig;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The server scaffolding shared by Plateward's embedded OPC UA servers (the simulated plant and
 * the soft-sensor publisher): one TCP endpoint, an application certificate generated at start-up
 * and held in memory, one managed namespace, start-up and shut-down in the right order.
 *
 * <p>By default the endpoint offers SecurityPolicy None with anonymous identity, and so binds to
 * a loopback address only. A {@link Spec} may instead offer Basic256Sha256 with SignAndEncrypt and
 * a username identity validator; such a server may bind elsewhere.
 */
final class EmbeddedServer implements AutoCloseable {
  private static final Logger LOGGER = LoggerFactory.getLogger(EmbeddedServer.class);
  private static final long START_STOP_TIMEOUT_S = 20;

  /**
   * What to serve.
   *
   * @param host bind address and advertised hostname
   * @param port TCP port, or 0 for a free one
   * @param path endpoint path, starting with '/'
   * @param applicationUri the server's application URI (also in its certificate)
   * @param applicationName human-readable server name
   * @param secure true: Basic256Sha256 / SignAndEncrypt only; false: None only (loopback)
   * @param identityValidator user identity check; anonymous when null
   * @param clientCertificateValidator check of client application certificates (secure
   *     servers); Milo's default validator over an empty in-memory trust list when null
   * @param beforeStartup called with the server after it is built and before it starts (e.g.
   *     to install service sets)
   */
  record Spec(
      String host,
      int port,
      String path,
      String applicationUri,
      String applicationName,
      boolean secure,
      IdentityValidator identityValidator,
      CertificateValidator clientCertificateValidator,
      Consumer<OpcUaServer> beforeStartup) {

    /** An insecure, anonymous loopback server. */
    static Spec loopback(String host, int port, String path, String uri, String name) {
      return new Spec(host, port, path, uri, name, false, null, null, s -> {});
    }

    Spec withBeforeStartup(Consumer<OpcUaServer> hook) {
      return new Spec(host, port, path, applicationUri, applicationName, secure,
          identityValidator, clientCertificateValidator, hook);
    }

    Spec withSecurity(
        boolean newSecure, IdentityValidator validator, CertificateValidator clientValidator) {
      return new Spec(host, port, path, applicationUri, applicationName, newSecure, validator,
          clientValidator, beforeStartup);
    }
  }

  private final Spec spec;
  private final int port;
  private final OpcUaServer server;
  private final ManagedNamespaceWithLifecycle namespace;
  private final X509Certificate certificate;
  private boolean closed;

  private EmbeddedServer(
      Spec spec,
      int port,
      OpcUaServer server,
      ManagedNamespaceWithLifecycle namespace,
      X509Certificate certificate) {
    this.spec = spec;
    this.port = port;
    this.server = server;
    this.namespace = namespace;
    this.certificate = certificate;
  }

  /**
   * Builds and starts a server with one namespace. Returns once clients can connect.
   *
   * @param spec what to serve
   * @param namespaceFactory builds the namespace on the new server
   * @throws EndpointPortInUseException when the port is held by another program
   * @throws IllegalArgumentException when an insecure server is asked to bind off loopback
   * @throws EndpointStartException when the server fails to start for another reason
   */
  static <N extends ManagedNamespaceWithLifecycle> EmbeddedServer start(
      Spec spec, Function<OpcUaServer, N> namespaceFactory) {
    InetAddress address = address(spec.host(), !spec.secure());
    int port = spec.port() == 0 ? freePort(address) : spec.port();
    ensurePortFree(spec.host(), address, port);
    if (!spec.secure()) {
      LOGGER.warn(
          "{} offers SecurityPolicy None with anonymous access; bound to loopback {} only",
          spec.applicationName(),
          spec.host());
    }
    OpcUaServer server;
    X509Certificate certificate;
    try {
      KeyPair keyPair = SelfSignedCertificateGenerator.generateRsaKeyPair(2048);
      certificate =
          new SelfSignedCertificateBuilder(keyPair)
              .setCommonName(spec.applicationName())
              .setOrganization("Plateward")
              .setApplicationUri(spec.applicationUri())
              .addDnsName("localhost")
              .addIpAddress(address.getHostAddress())
              .build();
      server =
          new OpcUaServer(
              serverConfig(spec, port, keyPair, certificate), transportProfile -> tcpTransport());
    } catch (Exception e) {
      throw new EndpointStartException(
          "could not configure the OPC UA server " + spec.applicationName(), e);
    }
    spec.beforeStartup().accept(server);
    N namespace = namespaceFactory.apply(server);
    namespace.startup();
    try {
      server.startup().get(START_STOP_TIMEOUT_S, TimeUnit.SECONDS);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      namespace.shutdown();
      throw new EndpointStartException("interrupted while starting " + spec.applicationName(), e);
    } catch (ExecutionException | TimeoutException e) {
      namespace.shutdown();
      server.shutdown();
      if (hasCause(e, BindException.class)) {
        throw new EndpointPortInUseException(spec.host(), port, e);
      }
      throw new EndpointStartException(spec.applicationName() + " did not start: " + e, e);
    }
    return new EmbeddedServer(spec, port, server, namespace, certificate);
  }

  /** The endpoint URL, e.g. {@code opc.tcp://127.0.0.1:4841/plateward/plant}. */
  String endpointUrl() {
    return "opc.tcp://" + spec.host() + ":" + port + spec.path();
  }

  int port() {
    return port;
  }

  OpcUaServer server() {
    return server;
  }

  /** The server's application certificate (self-signed, generated at start-up). */
  X509Certificate certificate() {
    return certificate;
  }

  /** Stops the namespace, then the server. Idempotent. */
  @Override
  public synchronized void close() {
    if (closed) {
      return;
    }
    closed = true;
    namespace.shutdown();
    try {
      server.shutdown().get(START_STOP_TIMEOUT_S, TimeUnit.SECONDS);
      LOGGER.info("{} at {} stopped", spec.applicationName(), endpointUrl());
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    } catch (ExecutionException | TimeoutException e) {
      LOGGER.warn("{} did not shut down cleanly: {}", spec.applicationName(), e.toString());
    }
  }

  private static InetAddress address(String host, boolean loopbackOnly) {
    InetAddress address;
    try {
      address = InetAddress.getByName(host);
    } catch (UnknownHostException e) {
      throw new IllegalArgumentException("unknown host for the OPC UA endpoint: " + host, e);
    }
    if (loopbackOnly && !address.isLoopbackAddress()) {
      throw new IllegalArgumentException(
          "an endpoint with SecurityPolicy None binds to loopback only; "
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

  private static OpcUaServerConfig serverConfig(
      Spec spec, int port, KeyPair keyPair, X509Certificate certificate) throws Exception {
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
    CertificateValidator clientValidator =
        spec.clientCertificateValidator() != null
            ? spec.clientCertificateValidator()
            : new DefaultServerCertificateValidator(trustList, quarantine);
    var group =
        DefaultApplicationGroup.createAndInitialize(
            trustList, new MemoryCertificateStore(), factory, clientValidator);

    IdentityValidator identity =
        spec.identityValidator() != null
            ? spec.identityValidator()
            : AnonymousIdentityValidator.INSTANCE;
    UserTokenPolicy token =
        spec.identityValidator() != null
            ? OpcUaServerConfig.USER_TOKEN_POLICY_USERNAME
            : OpcUaServerConfig.USER_TOKEN_POLICY_ANONYMOUS;

    Set<EndpointConfig> endpoints = new LinkedHashSet<>();
    EndpointConfig.Builder b =
        EndpointConfig.newBuilder()
            .setTransportProfile(TransportProfile.TCP_UASC_UABINARY)
            .setBindAddress(spec.host())
            .setBindPort(port)
            .setHostname(spec.host())
            .setPath(spec.path())
            .setCertificate(certificate)
            .addTokenPolicies(token);
    if (spec.secure()) {
      endpoints.add(
          b.setSecurityPolicy(SecurityPolicy.Basic256Sha256)
              .setSecurityMode(MessageSecurityMode.SignAndEncrypt)
              .build());
      // discovery (GetEndpoints) is served unsecured on the same path, as OPC UA requires
      endpoints.add(
          EndpointConfig.newBuilder()
              .setTransportProfile(TransportProfile.TCP_UASC_UABINARY)
              .setBindAddress(spec.host())
              .setBindPort(port)
              .setHostname(spec.host())
              .setPath(spec.path() + "/discovery")
              .setCertificate(certificate)
              .setSecurityPolicy(SecurityPolicy.None)
              .setSecurityMode(MessageSecurityMode.None)
              .build());
    } else {
      endpoints.add(
          b.setSecurityPolicy(SecurityPolicy.None).setSecurityMode(MessageSecurityMode.None).build());
    }

    return OpcUaServerConfig.builder()
        .setApplicationUri(spec.applicationUri())
        .setApplicationName(LocalizedText.english(spec.applicationName()))
        .setProductUri("urn:plateward")
        .setBuildInfo(
            new BuildInfo(
                "urn:plateward",
                "Plateward",
                spec.applicationName(),
                OpcUaServer.SDK_VERSION,
                "",
                DateTime.now()))
        .setEndpoints(endpoints)
        .setCertificateManager(new DefaultCertificateManager(quarantine, group))
        .setIdentityValidator(identity)
        .build();
  }
}
