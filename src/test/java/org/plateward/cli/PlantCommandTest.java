package org.plateward.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.eclipse.milo.opcua.stack.core.types.builtin.unsigned.Unsigned.uint;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.net.ServerSocket;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
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
import org.eclipse.milo.opcua.stack.core.types.enumerated.TimestampsToReturn;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.config.PlatewardConfig;
import org.plateward.opcua.PlantEndpoint;
import org.plateward.opcua.PlantEndpointConfig;
import org.plateward.plant.EventKind;
import org.plateward.plant.PlantRun;
import org.plateward.plant.Scenario;
import org.plateward.plant.ScenarioEvent;
import org.plateward.plant.SensorSuite;
import org.plateward.plant.SimulatedPlant;
import org.plateward.plant.TruthSettings;
import org.plateward.signals.Signal;
import picocli.CommandLine;

/**
 * {@code plateward plant}: the plant-to-endpoint wiring seen by a real Milo client over
 * loopback, the exit codes for bad input, and byte-identical regeneration of a committed
 * recording. The endpoint's own behaviour (read-only, status mapping) is PlantEndpointTest's.
 */
class PlantCommandTest {
  private static String[] run(String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    CommandLine cl = PlatewardCommand.newCommandLine();
    cl.setOut(new PrintWriter(out));
    cl.setErr(new PrintWriter(err));
    int code = cl.execute(args);
    return new String[] {Integer.toString(code), out.toString(), err.toString()};
  }

  @Test
  @Timeout(60)
  void aMiloClientBrowsesReadsAndSubscribesToTheRunningPlant() throws Exception {
    var unit = PlatewardConfig.load(Path.of("config", "plateward.toml")).unit();
    ScenarioEvent dropout = new ScenarioEvent(EventKind.DROPOUT, 5, List.of(Signal.PLATE_END_TEMP_REF_INLET), null,
        Double.NaN, 0, 5, Double.NaN, Double.NaN);
    Scenario sc = new Scenario("wiring", 3, Instant.parse("2031-01-01T00:00:00Z"), 15, 1.0,
        TruthSettings.defaults().withCells(30), SensorSuite.defaults().withAnalyzer(4, 2), List.of(dropout));
    SimulatedPlant plant = new SimulatedPlant(unit, sc);
    try (PlantEndpoint endpoint = PlantEndpoint.start(PlantEndpointConfig.defaults().withPort(0))) {
      OpcUaClient client = OpcUaClient.create(endpoint.endpointUrl(), eps -> eps.stream().findFirst(),
          transport -> {}, config -> config.setRequestTimeout(uint(5_000)));
      client.connect();
      try {
        // browse: the skid object sits below Objects
        var refs = client.browse(new org.eclipse.milo.opcua.stack.core.types.structured.BrowseDescription(
            NodeIds.ObjectsFolder, org.eclipse.milo.opcua.stack.core.types.enumerated.BrowseDirection.Forward,
            NodeIds.HierarchicalReferences, true, uint(0), uint(63))).getReferences();
        assertThat(refs).anyMatch(r -> r.getBrowseName().name().startsWith("Skid"));

        Map<Signal, List<DataValue>> got = new ConcurrentHashMap<>();
        OpcUaSubscription sub = new OpcUaSubscription(client, 20.0);
        sub.create();
        List<OpcUaMonitoredItem> items = new ArrayList<>();
        for (Signal s : List.of(Signal.PLATE_END_TEMP_REF_INLET, Signal.REF_OUTLET_H2, Signal.FUEL_FLOW)) {
          got.put(s, new CopyOnWriteArrayList<>());
          OpcUaMonitoredItem item = OpcUaMonitoredItem.newDataItem(endpoint.nodeId(s));
          item.setSamplingInterval(10.0);
          item.setQueueSize(uint(100));
          item.setDataValueListener((it, v) -> got.get(s).add(v));
          items.add(item);
        }
        sub.addMonitoredItems(items);
        sub.synchronizeMonitoredItems();
        Thread.sleep(300);
        // 10x real time: 15 simulated seconds in 1.5 s, slow enough for 20 ms publishing
        PlantRun.run(plant, 10.0, PlantCommand.publisherTo(endpoint), null);
        Thread.sleep(500);
        List<DataValue> read = client.readValues(0.0, TimestampsToReturn.Both,
            List.of(endpoint.nodeId(Signal.FUEL_FLOW)));
        assertThat(read.get(0).statusCode().isGood()).isTrue();
        assertThat(((Number) read.get(0).value().value()).doubleValue()).isBetween(7.5, 8.5); // Nm3/h near 8.05
        sub.delete();

        List<DataValue> tc = got.get(Signal.PLATE_END_TEMP_REF_INLET);
        List<Instant> tcTimes = times(tc);
        // frames 5..9 are the dropout: Bad_SensorFailure (0x808C0000, StatusCode.csv)
        assertThat(tc).anyMatch(v -> v.statusCode().value() == StatusCodes.Bad_SensorFailure);
        for (DataValue v : tc) {
          long sec = v.sourceTime().getJavaInstant().getEpochSecond() - sc.start().getEpochSecond();
          if (v.statusCode().isBad() && v.statusCode().value() != StatusCodes.Bad_WaitingForInitialData) {
            assertThat(sec).isBetween(5L, 9L);
            assertThat(v.value().isNull()).isTrue();
          }
        }
        assertMonotonic(tcTimes);
        // the analyzer (period 4 s, dead time 2 s here) changes only when a result arrives:
        // its SourceTimestamps are 2, 6, 10, 14 s after the start, never the frames in between
        List<Instant> h2 = times(got.get(Signal.REF_OUTLET_H2));
        assertMonotonic(h2);
        for (Instant t : h2) {
          long sec = t.getEpochSecond() - sc.start().getEpochSecond();
          assertThat((sec - 2) % 4).as("analyzer result at " + sec + " s").isZero();
        }
        assertThat(h2).hasSizeGreaterThanOrEqualTo(3);
      } finally {
        client.disconnect();
      }
    }
  }

  private static List<Instant> times(List<DataValue> values) {
    return values.stream().filter(v -> v.sourceTime() != null && v.sourceTime().getUtcTime() > 0)
        .map(v -> v.sourceTime().getJavaInstant()).toList();
  }

  private static void assertMonotonic(List<Instant> t) {
    for (int i = 1; i < t.size(); i++) {
      assertThat(t.get(i)).isAfter(t.get(i - 1));
    }
  }

  @Test
  void portInUseExitsTwoNamingThePort() throws Exception {
    try (ServerSocket holder = new ServerSocket()) {
      holder.bind(new InetSocketAddress(InetAddress.getByName("127.0.0.1"), 0));
      int port = holder.getLocalPort();
      String[] r = run("plant", "--scenario", "config/scenarios/feed-drop.toml", "--port", Integer.toString(port));
      assertThat(r[0]).isEqualTo("2");
      assertThat(r[2]).contains("port " + port).contains("in use");
    }
  }

  @Test
  void badScenarioExitsTwoWithFileLineField() {
    String[] r = run("plant", "--scenario", "src/test/resources/scenarios/unknown-kind.toml", "--speed", "max",
        "--record", "/dev/null");
    assertThat(r[0]).isEqualTo("2");
    assertThat(r[2]).contains("unknown-kind.toml:10: event[0].kind: unknown event kind");
  }

  @Test
  void badSpeedAndDurationExitTwo() {
    assertThat(run("plant", "--scenario", "config/scenarios/feed-drop.toml", "--speed", "fast")[0]).isEqualTo("2");
    assertThat(run("plant", "--scenario", "config/scenarios/feed-drop.toml", "--speed", "max", "--record", "x.csv",
        "--duration", "10 furlong")[0]).isEqualTo("2");
  }

  @Test
  @Timeout(120)
  void regeneratingTheFeedDropRecordingIsByteIdentical(@TempDir Path dir) throws Exception {
    // the documented command of replay-data/README.md, into a temporary file
    Path out = dir.resolve("feed-drop.csv");
    String[] r = run("plant", "--scenario", "config/scenarios/feed-drop.toml", "--speed", "max", "--record", out.toString());
    assertThat(r[0]).as(r[2]).isEqualTo("0");
    assertThat(Files.mismatch(out, Path.of("replay-data", "feed-drop.csv"))).isEqualTo(-1L);
  }
}
