package org.plateward.opcua;

import static org.eclipse.milo.opcua.stack.core.types.builtin.unsigned.Unsigned.uint;

import java.io.IOException;
import java.net.InetAddress;
import java.net.UnknownHostException;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.cert.X509Certificate;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.function.Consumer;
import org.eclipse.milo.opcua.sdk.client.OpcUaClient;
import org.eclipse.milo.opcua.sdk.client.SessionActivityListener;
import org.eclipse.milo.opcua.sdk.client.UaSession;
import org.eclipse.milo.opcua.sdk.client.identity.AnonymousProvider;
import org.eclipse.milo.opcua.sdk.client.identity.IdentityProvider;
import org.eclipse.milo.opcua.sdk.client.identity.UsernameProvider;
import org.eclipse.milo.opcua.sdk.client.subscriptions.MonitoredItemServiceOperationResult;
import org.eclipse.milo.opcua.sdk.client.subscriptions.MonitoredItemSynchronizationException;
import org.eclipse.milo.opcua.sdk.client.subscriptions.OpcUaMonitoredItem;
import org.eclipse.milo.opcua.sdk.client.subscriptions.OpcUaSubscription;
import org.eclipse.milo.opcua.stack.core.StatusCodes;
import org.eclipse.milo.opcua.stack.core.UaException;
import org.eclipse.milo.opcua.stack.core.security.CertificateValidator;
import org.eclipse.milo.opcua.stack.core.security.DefaultClientCertificateValidator;
import org.eclipse.milo.opcua.stack.core.security.FileBasedCertificateQuarantine;
import org.eclipse.milo.opcua.stack.core.security.FileBasedTrustListManager;
import org.eclipse.milo.opcua.stack.core.security.SecurityPolicy;
import org.eclipse.milo.opcua.stack.core.types.builtin.DataValue;
import org.eclipse.milo.opcua.stack.core.types.builtin.DateTime;
import org.eclipse.milo.opcua.stack.core.types.builtin.ExpandedNodeId;
import org.eclipse.milo.opcua.stack.core.types.builtin.LocalizedText;
import org.eclipse.milo.opcua.stack.core.types.builtin.NodeId;
import org.eclipse.milo.opcua.stack.core.types.builtin.StatusCode;
import org.eclipse.milo.opcua.stack.core.types.enumerated.DataChangeTrigger;
import org.eclipse.milo.opcua.stack.core.types.enumerated.DeadbandType;
import org.eclipse.milo.opcua.stack.core.types.enumerated.MessageSecurityMode;
import org.eclipse.milo.opcua.stack.core.types.structured.DataChangeFilter;
import org.eclipse.milo.opcua.stack.core.types.structured.EndpointDescription;
import org.eclipse.milo.opcua.stack.core.util.CertificateUtil;
import org.eclipse.milo.opcua.stack.core.util.EndpointUtil;
import org.plateward.config.OpcuaSettings;
import org.plateward.signals.Signal;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Plateward's link to a plant's OPC UA server (Milo client SDK): one session, one subscription
 * with a monitored item per mapped signal, and aligned {@link AlignedFrame}s on a fixed clock.
 *
 * <p><b>Read-only by construction.</b> This class offers no write, method call or node
 * management, and the Milo client it holds never leaves it; the only services it uses are
 * discovery, session, subscription, monitored-item and (for the namespace table) read.
 *
 * <p>Threads: Milo's callbacks only copy values into a bounded {@link SampleQueue} and return.
 * Frames are built on our own frame thread; subscription repair and listener calls run on our
 * own control thread. After the first successful connect Milo's session state machine
 * reconnects by itself (immediately, then with doubling waits up to 16 s); when the server lost
 * our subscription (restart) this class creates it again.
 */
public final class PlantConnection implements AutoCloseable {
  private static final Logger LOGGER = LoggerFactory.getLogger(PlantConnection.class);
  private static final int QUEUE_CAPACITY = 65_536;

  private final OpcuaSettings settings;
  private final OpcUaClient client;
  private final FileBasedTrustListManager trustList;
  private final SampleQueue queue = new SampleQueue(QUEUE_CAPACITY);
  private final FrameAligner aligner;
  private final Object alignerLock = new Object();
  private final Consumer<AlignedFrame> frameSink;
  private final ScheduledExecutorService frameThread;
  private final ScheduledExecutorService controlThread;
  private final List<ConnectionListener> listeners = new CopyOnWriteArrayList<>();
  private final List<String> tagProblems = new CopyOnWriteArrayList<>();
  private final List<DataGap> gaps = new CopyOnWriteArrayList<>();
  private final Map<Signal, NodeId> nodes = new EnumMap<>(Signal.class);
  private final long periodNanos;
  private final long delayNanos;

  private volatile ConnectionState state = ConnectionState.CONNECTING;
  private volatile OpcUaSubscription subscription;
  private volatile Instant lostAt;
  private volatile String lostReason;
  private Instant lastFrameTime;

  private PlantConnection(
      OpcuaSettings settings,
      OpcUaClient client,
      FileBasedTrustListManager trustList,
      Consumer<AlignedFrame> frameSink) {
    this.settings = settings;
    this.client = client;
    this.trustList = trustList;
    this.frameSink = frameSink;
    Map<Signal, Double> sampling = new EnumMap<>(Signal.class);
    settings.tags().forEach((s, t) -> sampling.put(s, t.samplingIntervalS()));
    this.aligner =
        new FrameAligner(
            sampling, settings.staleMultiple(), settings.clockSkewLimitS(), settings.framePeriodS());
    this.periodNanos = Math.round(settings.framePeriodS() * 1e9);
    this.delayNanos = Math.round(settings.frameDelayS() * 1e9);
    this.frameThread = Executors.newSingleThreadScheduledExecutor(r -> daemon(r, "plateward-frames"));
    this.controlThread = Executors.newSingleThreadScheduledExecutor(r -> daemon(r, "plateward-opcua"));
  }

  /**
   * Connects, subscribes to every mapped tag and starts delivering frames. Returns once the first
   * session is active. A tag the server does not know (e.g. Bad_NodeIdUnknown) does not stop the
   * connection: it is reported in {@link #tagProblems()} and its signal stays MISSING.
   *
   * @param settings the {@code [opcua]} section
   * @param frames receives one {@link AlignedFrame} per frame period, on Plateward's frame thread;
   *     it should hand the frame on quickly
   * @param listeners connection listeners to register before the first state change
   * @throws PlantConnectionException with a plain message when the endpoint cannot be reached,
   *     offers no matching security, refuses the identity, or presents a certificate we do not
   *     trust (the message says which folder to move it to)
   */
  public static PlantConnection open(
      OpcuaSettings settings, Consumer<AlignedFrame> frames, ConnectionListener... listeners)
      throws PlantConnectionException {
    String url = settings.endpointUrl();
    SecurityPolicy policy = policy(settings.securityPolicy());
    MessageSecurityMode mode = MessageSecurityMode.valueOf(settings.securityMode());
    String host = EndpointUtil.getHost(url);
    int port = EndpointUtil.getPort(url);
    boolean loopback = isLoopback(host);
    if (policy == SecurityPolicy.None) {
      if (!loopback && !settings.allowInsecureRemote()) {
        throw new PlantConnectionException(
            "OPC UA endpoint "
                + url
                + " is not on this machine, and security_policy = \"None\" would send plant data"
                + " unprotected; choose a secure policy such as \"Basic256Sha256\" with"
                + " security_mode = \"SignAndEncrypt\", or set allow_insecure_remote = true in"
                + " [opcua] if the network is otherwise protected");
      }
      LOGGER.warn(
          "OPC UA link to {} uses SecurityPolicy None (no signing, no encryption){}",
          url,
          loopback ? "; acceptable on loopback only" : "; allowed by allow_insecure_remote");
    }

    Path pki = settings.pkiDir();
    FileBasedTrustListManager trust = null;
    CertificateValidator validator = null;
    FileBasedCertificateQuarantine quarantine = null;
    ClientCertificate own = null;
    if (policy != SecurityPolicy.None) {
      try {
        trust = FileBasedTrustListManager.createAndInitialize(pki);
        quarantine = FileBasedCertificateQuarantine.create(pki.resolve("rejected"));
        validator = new DefaultClientCertificateValidator(trust, quarantine);
        own = ClientCertificate.loadOrCreate(pki.resolve("own"), settings.applicationUri());
      } catch (IOException e) {
        closeQuietly(trust);
        throw new PlantConnectionException(
            "cannot set up the certificate folder " + pki + ": " + e.getMessage(), e);
      }
    }

    IdentityProvider identity;
    try {
      identity =
          settings.auth().kind() == OpcuaSettings.Authentication.Kind.USERNAME
              ? new UsernameProvider(settings.auth().username(), settings.auth().password())
              : new AnonymousProvider();
    } catch (IllegalStateException e) {
      closeQuietly(trust);
      throw new PlantConnectionException(e.getMessage());
    }

    List<EndpointDescription> offered = new ArrayList<>();
    EndpointDescription[] chosen = new EndpointDescription[1];
    OpcUaClient client;
    final ClientCertificate ownCert = own;
    final CertificateValidator certValidator = validator;
    try {
      client =
          OpcUaClient.create(
              url,
              endpoints -> {
                offered.addAll(endpoints);
                Optional<EndpointDescription> e =
                    endpoints.stream()
                        .filter(d -> policy.getUri().equals(d.getSecurityPolicyUri()))
                        .filter(d -> d.getSecurityMode() == mode)
                        .findFirst()
                        .map(d -> EndpointUtil.updateUrl(d, host, port));
                e.ifPresent(d -> chosen[0] = d);
                return e;
              },
              transport -> {},
              cfg -> {
                cfg.setApplicationName(LocalizedText.english("Plateward monitor"))
                    .setApplicationUri(settings.applicationUri())
                    .setProductUri("urn:plateward")
                    .setIdentityProvider(identity)
                    .setRequestTimeout(uint(Math.round(settings.requestTimeoutS() * 1000)))
                    .setSessionTimeout(uint(60_000))
                    .setKeepAliveInterval(uint(2_000));
                if (ownCert != null) {
                  cfg.setKeyPair(ownCert.keyPair())
                      .setCertificate(ownCert.certificate())
                      .setCertificateChain(new X509Certificate[] {ownCert.certificate()})
                      .setCertificateValidator(certValidator);
                }
              });
    } catch (UaException e) {
      closeQuietly(trust);
      if (!offered.isEmpty() && chosen[0] == null) {
        throw new PlantConnectionException(noMatchingEndpoint(url, settings, offered));
      }
      throw new PlantConnectionException(unreachable(url, e));
    }

    var connection = new PlantConnection(settings, client, trust, frames);
    for (ConnectionListener l : listeners) {
      connection.addListener(l);
    }
    int rejectedBefore = quarantine == null ? 0 : quarantine.getRejectedCertificates().size();
    try {
      client.connect();
    } catch (UaException e) {
      connection.shutdownQuietly();
      int rejectedAfter = quarantine == null ? 0 : quarantine.getRejectedCertificates().size();
      throw new PlantConnectionException(
          connectFailure(url, settings, e, chosen[0], rejectedAfter > rejectedBefore));
    }
    connection.start();
    return connection;
  }

  /** The current state. */
  public ConnectionState state() {
    return state;
  }

  public void addListener(ConnectionListener l) {
    listeners.add(l);
  }

  public void removeListener(ConnectionListener l) {
    listeners.remove(l);
  }

  /** One plain message per tag the server refused (unknown node, unknown namespace, ...). */
  public List<String> tagProblems() {
    return List.copyOf(tagProblems);
  }

  /** Every data gap that has ended so far, oldest first. */
  public List<DataGap> gaps() {
    return List.copyOf(gaps);
  }

  /** Samples waiting between Milo's callbacks and the frame thread (a health metric). */
  public int queueDepth() {
    return queue.depth();
  }

  /** Samples dropped because the queue was full. */
  public long droppedSamples() {
    return queue.dropped();
  }

  /** The endpoint this connection talks to. */
  public String endpointUrl() {
    return settings.endpointUrl();
  }

  /** Stops frames, deletes nothing on the server beyond our own session, and disconnects. */
  @Override
  public void close() {
    if (state == ConnectionState.CLOSED) {
      return;
    }
    ConnectionState before = state;
    state = ConnectionState.CLOSED;
    frameThread.shutdownNow();
    try {
      client.disconnectAsync().get(5, TimeUnit.SECONDS);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    } catch (Exception e) {
      LOGGER.debug("disconnect from {}: {}", settings.endpointUrl(), e.toString());
    }
    closeQuietly(trustList);
    for (ConnectionListener l : listeners) {
      safely(() -> l.onStateChanged(before, ConnectionState.CLOSED, "closed"));
    }
    controlThread.shutdownNow();
  }

  // --- set-up ---------------------------------------------------------------------------------

  private void start() throws PlantConnectionException {
    resolveNodes();
    try {
      subscribe();
    } catch (UaException e) {
      shutdownQuietly();
      throw new PlantConnectionException(
          "OPC UA endpoint " + settings.endpointUrl() + " refused our subscription: "
              + statusText(e.getStatusCode()));
    }
    client.addSessionActivityListener(
        new SessionActivityListener() {
          @Override
          public void onSessionActive(UaSession session) {
            Instant at = Instant.now();
            controlThread.execute(() -> sessionActive(at));
          }

          @Override
          public void onSessionInactive(UaSession session) {
            Instant at = Instant.now();
            controlThread.execute(() -> sessionLost(at, "session to the OPC UA server lost"));
          }
        });
    setState(ConnectionState.CONNECTED, "session active at " + settings.endpointUrl());
    long now = System.nanoTime();
    frameThread.scheduleAtFixedRate(
        this::frameTick, periodNanos - (now % periodNanos), periodNanos / 4, TimeUnit.NANOSECONDS);
  }

  private void resolveNodes() {
    for (OpcuaSettings.Tag t : settings.tags().values()) {
      try {
        ExpandedNodeId x = ExpandedNodeId.parse(t.nodeId());
        Optional<NodeId> id = x.toNodeId(client.getNamespaceTable());
        if (id.isEmpty()) {
          problem(t, "the server has no namespace " + x.getNamespaceUri()
              + " (check namespace / node in [opcua.tags." + t.signal().id() + "])");
        } else {
          nodes.put(t.signal(), id.get());
        }
      } catch (RuntimeException e) {
        problem(t, "not a NodeId the client can parse: " + e.getMessage());
      }
    }
  }

  private void subscribe() throws UaException {
    var sub = new OpcUaSubscription(client, settings.publishingIntervalS() * 1000.0);
    sub.setSubscriptionListener(new Supervisor());
    sub.create();
    List<OpcUaMonitoredItem> items = new ArrayList<>();
    for (var e : nodes.entrySet()) {
      OpcuaSettings.Tag tag = settings.tags().get(e.getKey());
      OpcUaMonitoredItem item = OpcUaMonitoredItem.newDataItem(e.getValue());
      double samplingMs = tag.samplingIntervalS() * 1000.0;
      item.setSamplingInterval(samplingMs);
      // queue >= ceil(publishing / sampling) + 1, so no sample is lost between publishes
      long q = (long) Math.ceil(settings.publishingIntervalS() * 1000.0 / samplingMs) + 1;
      item.setQueueSize(uint(q));
      item.setDiscardOldest(true);
      // StatusValueTimestamp: a new SourceTimestamp is an update even when the value repeats
      item.setFilter(
          new DataChangeFilter(
              DataChangeTrigger.StatusValueTimestamp,
              uint(tag.deadband() > 0.0 ? DeadbandType.Absolute.getValue() : DeadbandType.None.getValue()),
              tag.deadband()));
      Signal signal = e.getKey();
      item.setUserObject(signal);
      item.setDataValueListener((it, value) -> onValue(signal, tag, value));
      items.add(item);
    }
    sub.addMonitoredItems(items);
    try {
      sub.synchronizeMonitoredItems();
    } catch (MonitoredItemSynchronizationException e) {
      List<OpcUaMonitoredItem> refused = new ArrayList<>();
      for (MonitoredItemServiceOperationResult r : e.getCreateResults()) {
        StatusCode sc = r.operationResult().orElse(r.serviceResult());
        if (sc != null && !sc.isGood()) {
          Signal s = (Signal) r.monitoredItem().getUserObject().orElseThrow();
          problem(settings.tags().get(s), describeItemFailure(sc));
          refused.add(r.monitoredItem());
        }
      }
      sub.removeMonitoredItems(refused);
      for (OpcUaMonitoredItem it : refused) {
        nodes.remove((Signal) it.getUserObject().orElseThrow());
      }
    }
    for (OpcUaMonitoredItem it : sub.getMonitoredItems()) {
      Signal s = (Signal) it.getUserObject().orElseThrow();
      double asked = settings.tags().get(s).samplingIntervalS() * 1000.0;
      it.getRevisedSamplingInterval()
          .filter(r -> Math.abs(r - asked) > 1e-6)
          .ifPresent(r -> LOGGER.warn("tag {}: server revised the sampling interval from {} ms to {} ms",
              s.id(), asked, r));
    }
    subscription = sub;
  }

  // --- Milo callbacks: copy and return --------------------------------------------------------

  private void onValue(Signal signal, OpcuaSettings.Tag tag, DataValue value) {
    Instant received = Instant.now();
    Object v = value.value() == null ? null : value.value().value();
    double edge = v instanceof Number n ? n.doubleValue() : Double.NaN;
    boolean numeric = Double.isFinite(edge);
    long code = value.statusCode() == null ? 0L : value.statusCode().value();
    queue.offer(
        new Sample(
            signal,
            numeric ? tag.unit().toSi(edge) : Double.NaN,
            StatusQuality.of(code, numeric),
            code,
            instant(value.sourceTime()),
            instant(value.serverTime()),
            received));
  }

  /** Watches the subscription and rebuilds it when the server lost it. */
  private final class Supervisor implements OpcUaSubscription.SubscriptionListener {
    @Override
    public void onTransferFailed(OpcUaSubscription sub, StatusCode status) {
      controlThread.execute(() -> recreate(sub, "transfer after reconnect failed: " + statusText(status)));
    }

    @Override
    public void onStatusChanged(OpcUaSubscription sub, StatusCode status) {
      if (status.value() == StatusCodes.Bad_Timeout) {
        controlThread.execute(() -> recreate(sub, "subscription timed out on the server"));
      }
    }

    @Override
    public void onWatchdogTimerElapsed(OpcUaSubscription sub) {
      controlThread.execute(
          () -> {
            LOGGER.warn("no publish response from {} within the watchdog time", settings.endpointUrl());
            if (client.getSessionFsm().getState() == org.eclipse.milo.opcua.sdk.client.session.State.Active) {
              safely(sub::delete);
              recreate(sub, "subscription silent (watchdog)");
            }
          });
    }

    @Override
    public void onNotificationDataLost(OpcUaSubscription sub) {
      LOGGER.warn("notifications lost from {} (republish failed); frames show the gap as stale",
          settings.endpointUrl());
    }
  }

  // --- control thread -------------------------------------------------------------------------

  private void recreate(OpcUaSubscription sub, String why) {
    if (state == ConnectionState.CLOSED) {
      return;
    }
    LOGGER.info("restoring subscription on {}: {}", settings.endpointUrl(), why);
    try {
      sub.create();
      sub.synchronizeMonitoredItems();
      LOGGER.info("subscription restored on {}", settings.endpointUrl());
    } catch (UaException e) {
      LOGGER.warn("could not restore the subscription on {} ({}); retrying in 2 s",
          settings.endpointUrl(), statusText(e.getStatusCode()));
      controlThread.schedule(() -> recreate(sub, why), 2, TimeUnit.SECONDS);
    }
  }

  private void sessionLost(Instant at, String why) {
    if (state == ConnectionState.CLOSED || lostAt != null) {
      return;
    }
    lostAt = at;
    lostReason = why;
    synchronized (alignerLock) {
      aligner.invalidate(at);
    }
    setState(ConnectionState.RECONNECTING, why + "; reconnecting");
  }

  private void sessionActive(Instant at) {
    if (state == ConnectionState.CLOSED) {
      return;
    }
    Instant from = lostAt;
    if (from != null) {
      lostAt = null;
      DataGap gap = new DataGap(from, at, lostReason);
      gaps.add(gap);
      LOGGER.warn("data gap {} .. {} ({} s): {}", gap.from(), gap.to(),
          gap.length().toMillis() / 1000.0, gap.reason());
      for (ConnectionListener l : listeners) {
        safely(() -> l.onGap(gap));
      }
    }
    if (state != ConnectionState.CONNECTED) {
      setState(ConnectionState.CONNECTED, "session active at " + settings.endpointUrl());
    }
  }

  private void setState(ConnectionState to, String reason) {
    ConnectionState from = state;
    if (from == to || from == ConnectionState.CLOSED) {
      return;
    }
    state = to;
    LOGGER.info("OPC UA {} -> {}: {}", from, to, reason);
    for (ConnectionListener l : listeners) {
      safely(() -> l.onStateChanged(from, to, reason));
    }
  }

  // --- frame thread ---------------------------------------------------------------------------

  private void frameTick() {
    try {
      Instant now = Instant.now();
      long ns = now.getEpochSecond() * 1_000_000_000L + now.getNano() - delayNanos;
      Instant due = Instant.ofEpochSecond(0, Math.floorDiv(ns, periodNanos) * periodNanos);
      List<Sample> batch = new ArrayList<>();
      queue.drainTo(batch);
      List<AlignedFrame> out = new ArrayList<>();
      synchronized (alignerLock) {
        for (Sample s : batch) {
          aligner.accept(s);
        }
        if (lastFrameTime == null) {
          lastFrameTime = due.minusNanos(periodNanos);
        }
        // catch up at most a minute of frames after a stall
        Instant first = lastFrameTime.plusNanos(periodNanos);
        if (Duration.between(first, due).toSeconds() > 60) {
          first = due.minusSeconds(60);
        }
        for (Instant t = first; !t.isAfter(due); t = t.plusNanos(periodNanos)) {
          out.add(aligner.frameAt(t));
          lastFrameTime = t;
        }
      }
      for (AlignedFrame f : out) {
        frameSink.accept(f);
      }
    } catch (RuntimeException e) {
      LOGGER.error("frame alignment failed; next tick continues", e);
    }
  }

  // --- messages -------------------------------------------------------------------------------

  private void problem(OpcuaSettings.Tag tag, String what) {
    String msg = "tag " + tag.signal().id() + " (node " + tag.nodeId() + "): " + what;
    tagProblems.add(msg);
    LOGGER.warn("{}; the signal stays MISSING", msg);
  }

  private static String describeItemFailure(StatusCode sc) {
    long v = sc.value();
    if (v == StatusCodes.Bad_NodeIdUnknown) {
      return "Bad_NodeIdUnknown: the server has no such node; check the node in the tag map";
    }
    if (v == StatusCodes.Bad_NodeIdInvalid) {
      return "Bad_NodeIdInvalid: the NodeId is not valid on this server";
    }
    if (v == StatusCodes.Bad_AttributeIdInvalid) {
      return "Bad_AttributeIdInvalid: the node is not a variable (has no value to subscribe to)";
    }
    if (v == StatusCodes.Bad_FilterNotAllowed || v == StatusCodes.Bad_DeadbandFilterInvalid) {
      return statusText(sc) + ": the server refuses the deadband on this node; set deadband = 0";
    }
    return statusText(sc) + ": the server refused the monitored item";
  }

  private static String unreachable(String url, UaException e) {
    String detail = rootMessage(e);
    return "cannot reach OPC UA endpoint " + url + " (" + detail + "); check that the server "
        + "runs, the host and port in [opcua] endpoint, and any firewall between";
  }

  private static String noMatchingEndpoint(String url, OpcuaSettings s, List<EndpointDescription> offered) {
    List<String> list = new ArrayList<>();
    for (EndpointDescription d : offered) {
      String uri = d.getSecurityPolicyUri();
      list.add(uri.substring(uri.indexOf('#') + 1) + "/" + d.getSecurityMode());
    }
    return "OPC UA endpoint " + url + " offers no endpoint with security_policy \""
        + s.securityPolicy() + "\" and security_mode \"" + s.securityMode() + "\"; it offers: "
        + String.join(", ", list);
  }

  private static String connectFailure(
      String url, OpcuaSettings s, UaException e, EndpointDescription chosen, boolean rejectedNew) {
    long code = e.getStatusCode() == null ? 0 : e.getStatusCode().value();
    if (rejectedNew
        || code == StatusCodes.Bad_CertificateUntrusted
        || code == StatusCodes.Bad_SecurityChecksFailed && s.pkiDir() != null
            && !"None".equals(s.securityPolicy())) {
      return untrusted(url, s.pkiDir(), chosen);
    }
    if (code == StatusCodes.Bad_UserAccessDenied
        || code == StatusCodes.Bad_IdentityTokenRejected
        || code == StatusCodes.Bad_IdentityTokenInvalid) {
      return "OPC UA endpoint " + url + " refused the identity " + s.auth() + " ("
          + statusText(e.getStatusCode()) + "): check the username and the password in "
          + (s.auth().passwordEnv() != null ? "environment variable " + s.auth().passwordEnv()
              : s.auth().passwordFile() != null ? "file " + s.auth().passwordFile() : "[opcua.auth]");
    }
    if (code == StatusCodes.Bad_IdentityTokenInvalid || code == StatusCodes.Bad_UserAccessDenied) {
      return "OPC UA endpoint " + url + " refused the identity " + s.auth();
    }
    return "cannot connect to OPC UA endpoint " + url + ": " + statusText(e.getStatusCode())
        + " (" + rootMessage(e) + ")";
  }

  private static String untrusted(String url, Path pki, EndpointDescription chosen) {
    String who = "";
    try {
      if (chosen != null && chosen.getServerCertificate() != null
          && chosen.getServerCertificate().isNotNull()) {
        X509Certificate c = CertificateUtil.decodeCertificate(chosen.getServerCertificate().bytesOrEmpty());
        String sha1 = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-1").digest(c.getEncoded()));
        who = " (" + c.getSubjectX500Principal().getName() + ", SHA-1 thumbprint " + sha1 + ")";
      }
    } catch (Exception ignored) {
      // the message stays useful without the subject
    }
    return "the certificate of OPC UA server " + url + who + " is not trusted, so the "
        + "connection was refused. It was saved in " + pki.resolve("rejected") + ". If you trust "
        + "this server (compare the thumbprint with its administrator), move that file to "
        + pki.resolve("trusted").resolve("certs") + " and connect again.";
  }

  static String statusText(StatusCode sc) {
    if (sc == null) {
      return "no status";
    }
    return StatusCodes.lookup(sc.value()).map(a -> a[0]).orElse(String.format("0x%08X", sc.value()));
  }

  private static String rootMessage(Throwable e) {
    Throwable t = e;
    while (t.getCause() != null && t.getCause() != t) {
      t = t.getCause();
    }
    String m = t.getMessage();
    return m == null || m.isBlank() ? t.getClass().getSimpleName() : m;
  }

  // --- helpers --------------------------------------------------------------------------------

  private static Instant instant(DateTime t) {
    // the 1601 epoch ("null" DateTime) means absent
    return t == null || t.isNull() || t.getUtcTime() <= 0 ? null : t.getJavaInstant();
  }

  private static SecurityPolicy policy(String name) {
    return SecurityPolicy.valueOf(name);
  }

  private static boolean isLoopback(String host) {
    try {
      return InetAddress.getByName(host).isLoopbackAddress();
    } catch (UnknownHostException e) {
      return false;
    }
  }

  private void shutdownQuietly() {
    state = ConnectionState.CLOSED;
    frameThread.shutdownNow();
    controlThread.shutdownNow();
    try {
      client.disconnectAsync().get(5, TimeUnit.SECONDS);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    } catch (ExecutionException | java.util.concurrent.TimeoutException e) {
      LOGGER.debug("disconnect: {}", e.toString());
    }
    closeQuietly(trustList);
  }

  private static void closeQuietly(FileBasedTrustListManager t) {
    if (t != null) {
      try {
        t.close();
      } catch (IOException e) {
        LOGGER.debug("trust list close: {}", e.toString());
      }
    }
  }

  private interface Action {
    void run() throws Exception;
  }

  private static void safely(Action a) {
    try {
      a.run();
    } catch (Exception e) {
      LOGGER.warn("ignored: {}", e.toString());
    }
  }

  private static Thread daemon(Runnable r, String name) {
    Thread t = new Thread(r, name);
    t.setDaemon(true);
    return t;
  }
}
