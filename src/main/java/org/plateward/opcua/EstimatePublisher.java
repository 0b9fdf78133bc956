package org.plateward.opcua;

import java.util.List;
import org.eclipse.milo.opcua.stack.core.types.builtin.DataValue;
import org.eclipse.milo.opcua.stack.core.types.builtin.DateTime;
import org.eclipse.milo.opcua.stack.core.types.builtin.NodeId;
import org.eclipse.milo.opcua.stack.core.types.builtin.StatusCode;
import org.eclipse.milo.opcua.stack.core.types.builtin.Variant;
import org.plateward.signals.StatusName;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Republishes Plateward's soft-sensor estimates as an OPC UA server of its own (own port, own
 * namespace, read-only variables), so a site's existing OPC UA clients and historians can read
 * them. Layout: {@code Objects/Plateward/<unit>/HiddenPeakTemperature}, {@code
 * HiddenPeakTemperatureSigma}, {@code HiddenPeakPosition}, {@code MeltFraction}, {@code
 * MaxCellMeltFraction}, {@code TimeToExhaust}, {@code TimeToExhaustSigma}, {@code
 * EstimatorStatus}, {@code ActiveAlarms}, plus an {@code Advisory} property. String NodeIds are
 * {@code <unit>/<name>}.
 *
 * <p>Like the plant endpoint it offers SecurityPolicy None, anonymous, on loopback only.
 */
public final class EstimatePublisher implements AutoCloseable {
  private static final Logger LOGGER = LoggerFactory.getLogger(EstimatePublisher.class);

  public static final String DEFAULT_NAMESPACE_URI = "urn:plateward:soft-sensor";
  public static final String DEFAULT_PATH = "/plateward/estimates";
  /** Default port: two above the registered OPC UA discovery port 4840 (the plant uses 4841). */
  public static final int DEFAULT_PORT = 4842;

  private final EmbeddedServer server;
  private final EstimateNamespace namespace;
  private final List<String> units;
  private final String namespaceUri;

  private EstimatePublisher(
      EmbeddedServer server, EstimateNamespace namespace, List<String> units, String namespaceUri) {
    this.server = server;
    this.namespace = namespace;
    this.units = units;
    this.namespaceUri = namespaceUri;
  }

  /**
   * Starts the publisher. Returns once clients can connect.
   *
   * @param host loopback bind address, e.g. 127.0.0.1
   * @param port TCP port, or 0 for a free one
   * @param namespaceUri namespace of the estimate nodes
   * @param units names of the units served (letters, digits, '-' and '_'), each under its own
   *     folder {@code Objects/Plateward/<unit>}
   * @throws EndpointPortInUseException when the port is taken
   * @throws IllegalArgumentException for a non-loopback host, a bad or a repeated unit name
   */
  public static EstimatePublisher start(String host, int port, String namespaceUri, List<String> units) {
    java.util.Set<String> seen = new java.util.HashSet<>();
    for (String u : units) {
      if (u == null || !u.matches("[A-Za-z0-9_-]+")) {
        throw new IllegalArgumentException("unit name must be letters, digits, '-' or '_': " + u);
      }
      if (!seen.add(u)) {
        throw new IllegalArgumentException("unit " + u + " is listed twice; each unit has one folder");
      }
    }
    List<String> copy = List.copyOf(units);
    EstimateNamespace[] ns = new EstimateNamespace[1];
    EmbeddedServer server =
        EmbeddedServer.start(
            EmbeddedServer.Spec.loopback(host, port, DEFAULT_PATH, namespaceUri + ":server",
                "Plateward soft-sensor publisher"),
            s -> ns[0] = new EstimateNamespace(s, namespaceUri, copy));
    LOGGER.info("soft-sensor publisher up at {} (namespace {})", server.endpointUrl(), namespaceUri);
    return new EstimatePublisher(server, ns[0], copy, namespaceUri);
  }

  public String endpointUrl() {
    return server.endpointUrl();
  }

  public int port() {
    return server.port();
  }

  public String namespaceUri() {
    return namespaceUri;
  }

  /** The units served, each under its own folder, in the order given at start. */
  public List<String> units() {
    return units;
  }

  /** NodeId (with the server's namespace index) of one published quantity, by browse name. */
  public NodeId nodeId(String unit, String browseName) {
    for (EstimateNamespace.Quantity q : EstimateNamespace.Quantity.values()) {
      if (q.browseName.equals(browseName)) {
        return namespace.nodeId(unit, q);
      }
    }
    throw new IllegalArgumentException("no published quantity " + browseName);
  }

  /**
   * Sets every variable of one unit. A NaN is served as Bad_NoCommunication with no value, never
   * as a number; an infinite time-to-exhaust (not melting) is served as is. Thread-safe.
   *
   * @param unit a unit given at start
   * @param e the estimate; units as in {@link PublishedEstimate}
   */
  public void publish(String unit, PublishedEstimate e) {
    if (!units.contains(unit)) {
      throw new IllegalArgumentException("unit " + unit + " is not published (units: " + units + ")");
    }
    DateTime source = new DateTime(e.time());
    DateTime now = DateTime.now();
    synchronized (this) {
      for (EstimateNamespace.Quantity q : EstimateNamespace.Quantity.values()) {
        Variant v =
            switch (q) {
              case HIDDEN_PEAK_TEMPERATURE -> number(e.peakTempC());
              case HIDDEN_PEAK_TEMPERATURE_SD -> number(e.peakTempSdK());
              case HIDDEN_PEAK_POSITION -> number(e.peakPositionM());
              case MELT_FRACTION -> number(e.meltFraction());
              case MAX_CELL_MELT_FRACTION -> number(e.maxCellMeltFraction());
              case TIME_TO_EXHAUST -> number(e.timeToExhaustS());
              case TIME_TO_EXHAUST_SD -> number(e.timeToExhaustSdS());
              case ESTIMATOR_STATUS -> new Variant(e.status() == null ? "" : e.status());
              case ACTIVE_ALARMS -> new Variant(e.activeAlarms());
            };
        StatusName status = v.isNull() ? StatusName.BAD_NO_COMMUNICATION : StatusName.GOOD;
        namespace.variable(unit, q).setValue(new DataValue(v, new StatusCode(status.code()), source, now));
      }
    }
  }

  private static Variant number(double x) {
    // time-to-exhaust may be +Inf (not melting): a valid Double, served as is
    return Double.isNaN(x) ? Variant.NULL_VALUE : new Variant(x);
  }

  @Override
  public void close() {
    server.close();
  }
}
