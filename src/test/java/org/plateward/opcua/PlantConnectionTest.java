package org.plateward.opcua;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.net.InetAddress;
import java.net.ServerSocket;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Predicate;
import org.eclipse.milo.opcua.sdk.client.OpcUaClient;
import org.eclipse.milo.opcua.stack.core.types.builtin.DataValue;
import org.eclipse.milo.opcua.stack.core.types.builtin.Variant;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestMethodOrder;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;

/**
 * The client against the simulated plant over loopback, one plant endpoint (restarted once) and
 * one connection for the class. Expected SI values come from the unit definitions (SI brochure:
 * T/K = t/degC + 273.15; 1 kPa = 1000 Pa; CODATA 2018 molar volume 22.413 969 54 L/mol at 0 degC,
 * 101.325 kPa) and not from our conversion code.
 */
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
@Timeout(40)
class PlantConnectionTest {
  private static final long WAIT_MS = 12_000;

  @TempDir static Path pki;

  private static final ServiceTally tally = new ServiceTally();
  private static volatile PlantEndpoint plant;
  private static int port;
  private static PlantConnection connection;
  private static final List<AlignedFrame> frames = new CopyOnWriteArrayList<>();
  private static final List<String> states = new CopyOnWriteArrayList<>();
  private static final List<DataGap> heardGaps = new CopyOnWriteArrayList<>();
  private static final ScheduledExecutorService feeder = Executors.newSingleThreadScheduledExecutor();
  private static final AtomicReference<Quality> outletQuality = new AtomicReference<>(Quality.GOOD);
  private static volatile boolean feeding = true;

  static final double[] SI = new double[Signal.COUNT];

  static {
    Arrays.fill(SI, 0.25);
    SI[Signal.REF_GAS_FLOW.ordinal()] = 19.5 / 0.02241396954 / 3600.0; // 19.5 Nm3/h
    SI[Signal.REF_INLET_TEMP.ordinal()] = 560.0 + 273.15;
    SI[Signal.REF_PRESSURE.ordinal()] = 320.0 * 1000.0;
    SI[Signal.REF_OUTLET_TEMP.ordinal()] = 700.0 + 273.15;
  }

  @BeforeAll
  static void start() throws Exception {
    plant = startPlant(0);
    port = plant.port();
    feeder.scheduleAtFixedRate(PlantConnectionTest::feed, 0, 50, TimeUnit.MILLISECONDS);
    connection =
        PlantConnection.open(
            TestSettings.plant(plant.endpointUrl(), pki),
            frames::add,
            new ConnectionListener() {
              @Override
              public void onStateChanged(ConnectionState from, ConnectionState to, String reason) {
                states.add(to.name());
              }

              @Override
              public void onGap(DataGap gap) {
                heardGaps.add(gap);
              }
            });
  }

  private static PlantEndpoint startPlant(int p) {
    return PlantEndpoint.start(
        PlantEndpointConfig.defaults().withPort(p),
        spec -> spec.withBeforeStartup(s -> tally.install(s, PlantEndpointConfig.DEFAULT_PATH)));
  }

  private static void feed() {
    if (!feeding) {
      return;
    }
    Quality[] q = new Quality[Signal.COUNT];
    Arrays.fill(q, Quality.GOOD);
    q[Signal.REF_OUTLET_TEMP.ordinal()] = outletQuality.get();
    PlantEndpoint p = plant;
    if (p != null) {
      p.publish(new Frame(Instant.now(), SI, q));
    }
  }

  @AfterAll
  static void stop() {
    feeder.shutdownNow();
    if (connection != null) {
      connection.close();
    }
    if (plant != null) {
      plant.close();
    }
  }

  private static AlignedFrame awaitFrame(Predicate<AlignedFrame> p) throws InterruptedException {
    long end = System.currentTimeMillis() + WAIT_MS;
    int seen = frames.size();
    while (System.currentTimeMillis() < end) {
      List<AlignedFrame> snapshot = List.copyOf(frames);
      for (int i = seen; i < snapshot.size(); i++) {
        if (p.test(snapshot.get(i))) {
          return snapshot.get(i);
        }
      }
      seen = snapshot.size();
      Thread.sleep(20);
    }
    throw new AssertionError("no frame matched within " + WAIT_MS + " ms; frames: " + frames.size());
  }

  private static boolean allGood(AlignedFrame f) {
    for (Signal s : Signal.values()) {
      if (f.frame().quality(s) != Quality.GOOD) {
        return false;
      }
    }
    return true;
  }

  @Test
  @Order(1)
  void publishedValuesArriveAsAlignedFramesInSi() throws Exception {
    assertThat(connection.state()).isEqualTo(ConnectionState.CONNECTED);
    assertThat(connection.tagProblems()).isEmpty();
    AlignedFrame f = awaitFrame(PlantConnectionTest::allGood);
    assertThat(f.frame().valueSi(Signal.REF_INLET_TEMP)).isCloseTo(833.15, org.assertj.core.data.Offset.offset(1e-9));
    assertThat(f.frame().valueSi(Signal.REF_PRESSURE)).isCloseTo(320_000.0, org.assertj.core.data.Offset.offset(1e-6));
    // 19.5 Nm3/h / 22.41396954 L/mol / 3600 s/h = 0.24167... mol/s
    assertThat(f.frame().valueSi(Signal.REF_GAS_FLOW)).isCloseTo(19.5 / 0.02241396954 / 3600.0,
        org.assertj.core.data.Offset.offset(1e-9));
    for (Signal s : Signal.values()) {
      assertThat(f.frame().valueSi(s)).as(s.id()).isCloseTo(SI[s.ordinal()],
          org.assertj.core.data.Offset.offset(1e-9 * Math.max(1.0, SI[s.ordinal()])));
    }
    assertThat(f.stale()).isEmpty();
    assertThat(f.clockSkewed()).isEmpty();
    // frames are on the fixed 200 ms clock
    assertThat(f.frame().time().toEpochMilli() % 200).isZero();
  }

  @Test
  @Order(2)
  void aDropoutArrivesAsBad() throws Exception {
    outletQuality.set(Quality.BAD);
    AlignedFrame f = awaitFrame(a -> a.frame().quality(Signal.REF_OUTLET_TEMP) == Quality.BAD);
    // the plant serves BAD as Bad_SensorFailure (severity bits 10, StatusCode.csv): not usable
    assertThat(f.frame().usable(Signal.REF_OUTLET_TEMP)).isFalse();
    assertThat(f.frame().quality(Signal.REF_INLET_TEMP)).isEqualTo(Quality.GOOD);
    outletQuality.set(Quality.GOOD);
    awaitFrame(PlantConnectionTest::allGood);
  }

  @Test
  @Order(3)
  void withoutUpdatesEverySignalTurnsStaleAndMissing() throws Exception {
    feeding = false;
    // 3 x 50 ms sampling < one 200 ms frame, so the limit is one frame period
    AlignedFrame f = awaitFrame(a -> a.stale().size() == Signal.COUNT);
    for (Signal s : Signal.values()) {
      assertThat(f.frame().quality(s)).isEqualTo(Quality.MISSING);
      assertThat(f.frame().valueSi(s)).isNaN();
    }
    feeding = true;
    awaitFrame(PlantConnectionTest::allGood);
  }

  @Test
  @Order(4)
  void afterAServerRestartTheClientReconnectsResubscribesAndReportsTheGap() throws Exception {
    Instant before = Instant.now();
    PlantEndpoint old = plant;
    plant = null;
    old.close();
    awaitFrame(a -> a.frame().quality(Signal.REF_INLET_TEMP) == Quality.MISSING);
    Thread.sleep(1000);
    plant = startPlant(port);
    AlignedFrame f = awaitFrame(PlantConnectionTest::allGood);
    assertThat(f.frame().time()).isAfter(before);
    assertThat(connection.state()).isEqualTo(ConnectionState.CONNECTED);
    assertThat(states).contains("RECONNECTING");
    List<DataGap> gaps = connection.gaps();
    assertThat(gaps).hasSize(1);
    assertThat(heardGaps).isEqualTo(gaps);
    DataGap g = gaps.get(0);
    assertThat(g.from()).isAfterOrEqualTo(before);
    // the plant was down at least the 1 s we waited
    assertThat(g.length().toMillis()).isGreaterThanOrEqualTo(1000);
  }

  @Test
  @Order(5)
  void aNodeTheServerDoesNotKnowGivesAClearMessageAndTheRestStillFlows() throws Exception {
    var settings =
        TestSettings.plant(plant.endpointUrl(), pki, "None", "None",
            org.plateward.config.OpcuaSettings.Authentication.anonymous(),
            Map.of(Signal.FUEL_FLOW, "nsu=" + PlantEndpointConfig.DEFAULT_NAMESPACE_URI + ";s=Skid-R1/NoSuchNode"));
    List<AlignedFrame> got = new CopyOnWriteArrayList<>();
    try (PlantConnection c = PlantConnection.open(settings, got::add)) {
      assertThat(c.tagProblems()).hasSize(1);
      assertThat(c.tagProblems().get(0))
          .contains("fuel_flow_nm3_h")
          .contains("Skid-R1/NoSuchNode")
          .contains("Bad_NodeIdUnknown");
      long end = System.currentTimeMillis() + WAIT_MS;
      while (got.stream().noneMatch(a -> a.frame().quality(Signal.AIR_FLOW) == Quality.GOOD)
          && System.currentTimeMillis() < end) {
        Thread.sleep(20);
      }
      AlignedFrame a = got.get(got.size() - 1);
      assertThat(a.frame().quality(Signal.AIR_FLOW)).isEqualTo(Quality.GOOD);
      assertThat(a.frame().quality(Signal.FUEL_FLOW)).isEqualTo(Quality.MISSING);
    }
  }

  @Test
  @Order(6)
  void anUnreachableEndpointGivesAClearMessage() throws Exception {
    int free;
    try (ServerSocket s = new ServerSocket(0, 1, InetAddress.getLoopbackAddress())) {
      free = s.getLocalPort();
    }
    var settings = TestSettings.plant("opc.tcp://127.0.0.1:" + free + "/plateward/plant", pki);
    assertThatThrownBy(() -> PlantConnection.open(settings, f -> {}))
        .isInstanceOf(PlantConnectionException.class)
        .hasMessageContaining("cannot reach OPC UA endpoint opc.tcp://127.0.0.1:" + free)
        .hasMessageContaining("check that the server runs");
  }

  @Test
  @Order(7)
  void securityNoneIsRefusedForARemoteEndpoint() {
    var settings = TestSettings.plant("opc.tcp://192.0.2.10:4841/plateward/plant", pki);
    // 192.0.2.0/24 is TEST-NET-1 (RFC 5737): never routed, and refused before any traffic
    assertThatThrownBy(() -> PlantConnection.open(settings, f -> {}))
        .isInstanceOf(PlantConnectionException.class)
        .hasMessageContaining("not on this machine")
        .hasMessageContaining("allow_insecure_remote");
  }

  @Test
  @Order(8)
  void theServerReceivedNoWriteCallOrNodeManagementFromOurClient() throws Exception {
    assertThat(tally.count("Read")).as("the tally sees our requests at all").isPositive();
    assertThat(tally.mutating()).isZero();
    // the tally can fail: a plain Milo client's write is counted (and refused, read-only)
    OpcUaClient raw = OpcUaClient.create(plant.endpointUrl());
    raw.connect();
    try {
      raw.writeValues(List.of(plant.nodeId(Signal.FUEL_FLOW)),
          List.of(DataValue.valueOnly(new Variant(1.0))));
    } finally {
      raw.disconnect();
    }
    assertThat(tally.count("Write")).isEqualTo(1);
  }
}
