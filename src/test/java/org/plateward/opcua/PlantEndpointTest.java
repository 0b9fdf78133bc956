package org.plateward.opcua;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.eclipse.milo.opcua.stack.core.types.builtin.unsigned.Unsigned.uint;

import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.net.ServerSocket;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.CopyOnWriteArrayList;
import org.eclipse.milo.opcua.sdk.client.OpcUaClient;
import org.eclipse.milo.opcua.sdk.client.subscriptions.OpcUaMonitoredItem;
import org.eclipse.milo.opcua.sdk.client.subscriptions.OpcUaSubscription;
import org.eclipse.milo.opcua.stack.core.NodeIds;
import org.eclipse.milo.opcua.stack.core.StatusCodes;
import org.eclipse.milo.opcua.stack.core.types.builtin.DataValue;
import org.eclipse.milo.opcua.stack.core.types.builtin.NodeId;
import org.eclipse.milo.opcua.stack.core.types.builtin.StatusCode;
import org.eclipse.milo.opcua.stack.core.types.builtin.Variant;
import org.eclipse.milo.opcua.stack.core.types.enumerated.BrowseDirection;
import org.eclipse.milo.opcua.stack.core.types.enumerated.BrowseResultMask;
import org.eclipse.milo.opcua.stack.core.types.enumerated.NodeClass;
import org.eclipse.milo.opcua.stack.core.types.enumerated.TimestampsToReturn;
import org.eclipse.milo.opcua.stack.core.types.structured.BrowseDescription;
import org.eclipse.milo.opcua.stack.core.types.structured.EUInformation;
import org.eclipse.milo.opcua.stack.core.types.structured.ReferenceDescription;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestMethodOrder;
import org.junit.jupiter.api.Timeout;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;

/**
 * A real Milo client talks to the plant endpoint over loopback. One server for the class.
 *
 * <p>Status code values are checked against the OPC Foundation's Schema/StatusCode.csv (copied in
 * REFERENCES.md §8) and against Milo's own {@link StatusCodes} table.
 */
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
@Timeout(30)
class PlantEndpointTest {
  private static final long WAIT_MS = 10_000;
  private static final Instant T0 = Instant.parse("2026-03-04T05:06:07Z");

  private static PlantEndpoint endpoint;
  private static OpcUaClient client;
  private static PlantAddressLayout layout;

  @BeforeAll
  static void startServerAndClient() throws Exception {
    endpoint = PlantEndpoint.start(PlantEndpointConfig.defaults().withPort(0));
    layout = new PlantAddressLayout(PlantAddressLayout.DEFAULT_SKID);
    client =
        OpcUaClient.create(
            endpoint.endpointUrl(),
            endpoints -> endpoints.stream().findFirst(),
            transport -> {},
            config -> config.setRequestTimeout(uint(5_000)));
    client.connect();
  }

  @AfterAll
  static void stop() throws Exception {
    if (client != null) {
      client.disconnect();
    }
    if (endpoint != null) {
      endpoint.close();
    }
  }

  @Test
  @Order(1)
  void beforeAnyFrameEveryVariableIsWaitingForInitialData() throws Exception {
    List<DataValue> values = client.readValues(0.0, TimestampsToReturn.Both, allNodeIds());
    for (DataValue v : values) {
      // Bad_WaitingForInitialData = 0x80320000 (StatusCode.csv)
      assertThat(v.statusCode().value()).isEqualTo(0x80320000L).isEqualTo(StatusCodes.Bad_WaitingForInitialData);
    }
  }

  @Test
  @Order(2)
  void browseFromObjectsReachesEverySignalVariableAtItsLayoutPath() throws Exception {
    Map<NodeId, List<String>> found = new HashMap<>();
    browseDown(NodeIds.ObjectsFolder, new ArrayList<>(), found, 0);
    Map<Signal, List<String>> bySignal = new EnumMap<>(Signal.class);
    for (Signal s : Signal.values()) {
      NodeId id = endpoint.nodeId(s);
      assertThat(id.getIdentifier()).isEqualTo(layout.nodeIdentifier(s));
      assertThat(found).containsKey(id);
      bySignal.put(s, found.get(id));
    }
    for (Signal s : Signal.values()) {
      assertThat(bySignal.get(s)).isEqualTo(layout.browsePath(s));
    }
    assertThat(bySignal.get(Signal.REF_OUTLET_CH4))
        .containsExactly("Skid-R1", "Analyzer", "ReformedGas", "CH4");
    // no other variables of ours below Objects than the 17 signals
    long ours =
        found.keySet().stream()
            .filter(id -> id.getNamespaceIndex().equals(endpoint.nodeId(Signal.FUEL_FLOW).getNamespaceIndex()))
            .count();
    assertThat(ours).isEqualTo(Signal.COUNT);
  }

  @Test
  @Order(3)
  void variablesAreReadOnlyDoublesWithEngineeringUnits() throws Exception {
    for (Signal s : Signal.values()) {
      var node = client.getAddressSpace().getVariableNode(endpoint.nodeId(s));
      // AccessLevel bit 0 = CurrentRead, bit 1 = CurrentWrite (OPC 10000-3 §8.57)
      assertThat(node.readAccessLevel().intValue()).as(s.id()).isEqualTo(1);
      assertThat(node.readUserAccessLevel().intValue()).as(s.id()).isEqualTo(1);
      assertThat(node.readDataType()).isEqualTo(NodeIds.Double);
    }
    EUInformation eu = engineeringUnits(endpoint.nodeId(Signal.REF_OUTLET_TEMP));
    // UNECE code CEL packs to 0x43454C = 4408652 (OPC UA units table; from memory)
    assertThat(eu.getUnitId()).isEqualTo(4408652);
    assertThat(eu.getDisplayName().text()).isEqualTo("degC");
  }

  @Test
  @Order(4)
  void readReturnsPublishedValuesInEdgeUnitsWithMappedStatusAndTimestamps() throws Exception {
    double[] si = new double[Signal.COUNT];
    Quality[] q = new Quality[Signal.COUNT];
    Arrays.fill(q, Quality.GOOD);
    // 1 Nm3 of ideal gas at 0 degC, 101.325 kPa is 1/0.02241396954 mol
    // (CODATA 2018 molar volume 22.413 969 54 L/mol)
    si[Signal.REF_GAS_FLOW.ordinal()] = 5.0 / 0.02241396954 / 3600.0;
    // 18.01528 g/mol for H2O (IUPAC standard atomic weights H 1.00794, O 15.9994)
    si[Signal.REF_STEAM_FLOW.ordinal()] = 9.0 / 3600.0 / 0.01801528;
    si[Signal.REF_INLET_TEMP.ordinal()] = 773.15; // 500 degC, T/K = t/degC + 273.15 (SI brochure)
    si[Signal.REF_PRESSURE.ordinal()] = 101325.0; // 1 atm = 101.325 kPa exactly
    si[Signal.REF_OUTLET_H2.ordinal()] = 0.25;
    si[Signal.REF_OUTLET_CO.ordinal()] = Double.NaN;
    q[Signal.REF_OUTLET_CO.ordinal()] = Quality.MISSING;
    q[Signal.FUEL_FLOW.ordinal()] = Quality.UNCERTAIN;
    q[Signal.AIR_FLOW.ordinal()] = Quality.BAD;
    Instant t = T0;
    Instant before = Instant.now();
    endpoint.publish(new Frame(t, si, q));

    List<DataValue> v = client.readValues(0.0, TimestampsToReturn.Both, allNodeIds());
    assertThat(value(v, Signal.REF_GAS_FLOW)).isCloseTo(5.0, org.assertj.core.data.Offset.offset(1e-6));
    assertThat(value(v, Signal.REF_STEAM_FLOW)).isCloseTo(9.0, org.assertj.core.data.Offset.offset(1e-9));
    assertThat(value(v, Signal.REF_INLET_TEMP)).isCloseTo(500.0, org.assertj.core.data.Offset.offset(1e-9));
    assertThat(value(v, Signal.REF_PRESSURE)).isCloseTo(101.325, org.assertj.core.data.Offset.offset(1e-12));
    assertThat(value(v, Signal.REF_OUTLET_H2)).isCloseTo(25.0, org.assertj.core.data.Offset.offset(1e-12));

    DataValue good = v.get(Signal.REF_GAS_FLOW.ordinal());
    assertThat(good.statusCode().value()).isEqualTo(0x00000000L); // Good
    assertThat(good.sourceTime().getJavaInstant()).isEqualTo(t);
    // Milo 1.1.2 stamps the ServerTimestamp of a Read with the time of the read, so it lies
    // between our publish and the end of the read
    Instant serverTime = good.serverTime().getJavaInstant();
    assertThat(serverTime).isBetween(before.minusMillis(1), Instant.now().plusMillis(1));
    // Uncertain_SensorNotAccurate = 0x40930000, Bad_SensorFailure = 0x808C0000 (StatusCode.csv)
    assertThat(v.get(Signal.FUEL_FLOW.ordinal()).statusCode().value())
        .isEqualTo(0x40930000L).isEqualTo(StatusCodes.Uncertain_SensorNotAccurate);
    assertThat(v.get(Signal.FUEL_FLOW.ordinal()).statusCode().isUncertain()).isTrue();
    assertThat(v.get(Signal.AIR_FLOW.ordinal()).statusCode().value())
        .isEqualTo(0x808C0000L).isEqualTo(StatusCodes.Bad_SensorFailure);
    // MISSING before the signal ever had a value: still waiting for initial data
    DataValue missing = v.get(Signal.REF_OUTLET_CO.ordinal());
    assertThat(missing.statusCode().value()).isEqualTo(0x80320000L);
    assertThat(missing.value().isNull()).isTrue();

    // next frame: the analyzer value that had a value goes missing -> Bad_NoCommunication
    q[Signal.REF_OUTLET_H2.ordinal()] = Quality.MISSING;
    si[Signal.REF_OUTLET_H2.ordinal()] = Double.NaN;
    endpoint.publish(new Frame(t.plusSeconds(1), si, q));
    DataValue lost =
        client.readValues(0.0, TimestampsToReturn.Both, List.of(endpoint.nodeId(Signal.REF_OUTLET_H2))).get(0);
    assertThat(lost.statusCode().value()).isEqualTo(0x80310000L).isEqualTo(StatusCodes.Bad_NoCommunication);
    assertThat(lost.sourceTime().getJavaInstant()).isEqualTo(t.plusSeconds(1));
  }

  @Test
  @Order(5)
  void subscribedClientReceivesEveryFrameWithBadDropoutAndMonotonicSourceTimestamps()
      throws Exception {
    Map<NodeId, List<DataValue>> received = new ConcurrentHashMap<>();
    var subscription = new OpcUaSubscription(client, 50.0);
    subscription.create();
    List<OpcUaMonitoredItem> items = new ArrayList<>();
    for (Signal s : Signal.values()) {
      NodeId id = endpoint.nodeId(s);
      received.put(id, new CopyOnWriteArrayList<>());
      OpcUaMonitoredItem item = OpcUaMonitoredItem.newDataItem(id);
      item.setSamplingInterval(50.0);
      item.setQueueSize(uint(10));
      item.setDataValueListener((it, value) -> received.get(id).add(value));
      items.add(item);
    }
    subscription.addMonitoredItems(items);
    subscription.synchronizeMonitoredItems();
    try {
      NodeId outletTemp = endpoint.nodeId(Signal.REF_OUTLET_TEMP);
      waitFor(() -> !received.get(outletTemp).isEmpty()); // initial value
      int frames = 8;
      int badFrame = 4;
      Instant start = T0.plusSeconds(100);
      for (int k = 0; k < frames; k++) {
        double[] si = new double[Signal.COUNT];
        Quality[] q = new Quality[Signal.COUNT];
        Arrays.fill(q, Quality.GOOD);
        Arrays.fill(si, 1000.0 + k);
        if (k == badFrame) {
          q[Signal.REF_OUTLET_TEMP.ordinal()] = Quality.BAD;
        }
        endpoint.publish(new Frame(start.plusSeconds(k), si, q));
        Instant frameTime = start.plusSeconds(k);
        // wait until this frame has arrived before publishing the next one
        waitFor(() -> received.get(outletTemp).stream().anyMatch(dv -> frameTime.equals(sourceTime(dv))));
      }
      List<DataValue> got = received.get(outletTemp).stream()
          .filter(dv -> sourceTime(dv) != null && !sourceTime(dv).isBefore(start)).toList();
      assertThat(got).hasSize(frames);
      for (int k = 0; k < frames; k++) {
        DataValue dv = got.get(k);
        assertThat(sourceTime(dv)).isEqualTo(start.plusSeconds(k));
        assertThat(((Number) dv.value().value()).doubleValue())
            .isCloseTo(1000.0 + k - 273.15, org.assertj.core.data.Offset.offset(1e-9));
        if (k == badFrame) {
          assertThat(dv.statusCode().isBad()).isTrue();
          assertThat(dv.statusCode().value()).isEqualTo(StatusCodes.Bad_SensorFailure);
        } else {
          assertThat(dv.statusCode().isGood()).isTrue();
        }
      }
      // SourceTimestamps arrive strictly increasing on every item
      for (Signal s : Signal.values()) {
        List<Instant> times = received.get(endpoint.nodeId(s)).stream()
            .map(PlantEndpointTest::sourceTime).filter(x -> x != null).toList();
        for (int i = 1; i < times.size(); i++) {
          assertThat(times.get(i)).as(s.id()).isAfter(times.get(i - 1));
        }
      }
    } finally {
      subscription.delete();
    }
  }

  @Test
  @Order(6)
  void writeToEveryPlantVariableIsRefusedAsUserAccessDenied() throws Exception {
    List<NodeId> ids = allNodeIds();
    List<DataValue> before = client.readValues(0.0, TimestampsToReturn.Both, ids);
    List<DataValue> writes =
        Collections.nCopies(ids.size(), DataValue.valueOnly(new Variant(123.0)));
    List<StatusCode> results = client.writeValues(ids, writes);
    for (StatusCode sc : results) {
      // Observed with Milo 1.1.2: the refusal comes back as Bad_UserAccessDenied = 0x801F0000
      // (StatusCode.csv: "User does not have permission to perform the requested operation"),
      // not Bad_NotWritable = 0x803B0000; both AccessLevel and UserAccessLevel are CurrentRead.
      assertThat(sc.isBad()).isTrue();
      assertThat(sc.value()).isEqualTo(0x801F0000L).isEqualTo(StatusCodes.Bad_UserAccessDenied);
    }
    List<DataValue> after = client.readValues(0.0, TimestampsToReturn.Both, ids);
    for (int i = 0; i < ids.size(); i++) {
      assertThat(after.get(i).value()).isEqualTo(before.get(i).value());
    }
  }

  @Test
  void portInUseFailsWithTheNamedPort() throws Exception {
    try (ServerSocket holder = new ServerSocket()) {
      holder.bind(new InetSocketAddress(InetAddress.getByName("127.0.0.1"), 0));
      int port = holder.getLocalPort();
      assertThatThrownBy(() -> PlantEndpoint.start(PlantEndpointConfig.defaults().withPort(port)))
          .isInstanceOf(EndpointPortInUseException.class)
          .hasMessageContaining("port " + port)
          .satisfies(e -> assertThat(((EndpointPortInUseException) e).port()).isEqualTo(port));
    }
  }

  @Test
  void nonLoopbackHostIsRefusedBecauseSecurityIsNone() {
    // 192.0.2.1 is in TEST-NET-1 (RFC 5737), never a loopback address
    assertThatThrownBy(() -> PlantEndpoint.start(PlantEndpointConfig.defaults().withHost("192.0.2.1")))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("loopback");
  }

  private static List<NodeId> allNodeIds() {
    return Arrays.stream(Signal.values()).map(endpoint::nodeId).toList();
  }

  private static double value(List<DataValue> v, Signal s) {
    DataValue dv = v.get(s.ordinal());
    assertThat(dv.statusCode().isGood()).as(s.id()).isTrue();
    return ((Number) dv.value().value()).doubleValue();
  }

  private static Instant sourceTime(DataValue dv) {
    return dv.sourceTime() == null ? null : dv.sourceTime().getJavaInstant();
  }

  private static void waitFor(java.util.function.BooleanSupplier condition) throws InterruptedException {
    long deadline = System.nanoTime() + Duration.ofMillis(WAIT_MS).toNanos();
    while (!condition.getAsBoolean()) {
      if (System.nanoTime() > deadline) {
        throw new AssertionError("condition not met within " + WAIT_MS + " ms");
      }
      Thread.sleep(10);
    }
  }

  private static EUInformation engineeringUnits(NodeId variable) throws Exception {
    var result = client.browse(new BrowseDescription(variable, BrowseDirection.Forward,
        NodeIds.HasProperty, true, uint(NodeClass.Variable.getValue()), uint(BrowseResultMask.All.getValue())));
    for (ReferenceDescription rd : result.getReferences()) {
      if ("EngineeringUnits".equals(rd.getBrowseName().name())) {
        NodeId id = rd.getNodeId().toNodeId(client.getNamespaceTable()).orElseThrow();
        Object value = client.readValues(0.0, TimestampsToReturn.Neither, List.of(id)).get(0).value().value();
        if (value instanceof org.eclipse.milo.opcua.stack.core.types.builtin.ExtensionObject xo) {
          return (EUInformation) xo.decode(client.getStaticEncodingContext());
        }
        return (EUInformation) value;
      }
    }
    throw new AssertionError("no EngineeringUnits property on " + variable);
  }

  /** Depth-first browse over hierarchical references; records each variable's browse path. */
  private static void browseDown(NodeId node, List<String> path, Map<NodeId, List<String>> found, int depth)
      throws Exception {
    if (depth > 6) {
      return;
    }
    var result = client.browse(new BrowseDescription(node, BrowseDirection.Forward,
        NodeIds.HierarchicalReferences, true,
        uint(NodeClass.Object.getValue() | NodeClass.Variable.getValue()),
        uint(BrowseResultMask.All.getValue())));
    if (result.getReferences() == null) {
      return;
    }
    for (ReferenceDescription rd : result.getReferences()) {
      var child = rd.getNodeId().toNodeId(client.getNamespaceTable());
      if (child.isEmpty() || child.get().getNamespaceIndex().intValue() == 0) {
        continue; // standard nodes (Server object and its children) are not ours
      }
      List<String> childPath = new ArrayList<>(path);
      childPath.add(rd.getBrowseName().name());
      if (rd.getNodeClass() == NodeClass.Variable) {
        found.put(child.get(), childPath);
      } else {
        browseDown(child.get(), childPath, found, depth + 1);
      }
    }
  }
}
