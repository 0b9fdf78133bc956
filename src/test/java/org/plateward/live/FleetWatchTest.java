package org.plateward.live;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.BooleanSupplier;
import org.eclipse.milo.opcua.sdk.client.OpcUaClient;
import org.eclipse.milo.opcua.stack.core.types.builtin.DataValue;
import org.eclipse.milo.opcua.stack.core.types.enumerated.TimestampsToReturn;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.Advisory;
import org.plateward.config.FleetConfig;
import org.plateward.config.ScenarioLoader;
import org.plateward.fleet.LaneStatus;
import org.plateward.history.EstimateRow;
import org.plateward.history.HistoryReader;
import org.plateward.history.SourceKind;
import org.plateward.opcua.EstimatePublisher;
import org.plateward.plant.Scenario;
import org.plateward.plant.SimulatedPlant;
import org.plateward.signals.Frame;
import org.plateward.signals.Signal;
import org.plateward.softsensor.Estimate;

/**
 * {@code plateward watch} on a fleet file, over loopback (127.0.0.1): two simulated plants
 * (invented data, invented skids Skid-R2 and Skid-R3, each on its own endpoint), the example
 * fleet file pointed at them, one fleet monitor at 10 x real time. Both units estimate, a
 * second Milo client reads each unit's own values from its own publisher folder, and after one
 * plant's endpoint stops the other unit keeps estimating. Every wait is bounded.
 */
@Timeout(60)
class FleetWatchTest {
  private static final double SPEED = 10.0;
  private static final long WAIT_MS = 20_000;

  @TempDir Path dir;

  private final Map<String, Map<Instant, Estimate>> byUnit = new ConcurrentHashMap<>();

  @Test
  void twoUnitsEstimatePublishTheirOwnValuesAndOneLostEndpointLeavesTheOtherGoing() throws Exception {
    Path src = Path.of("config", "examples", "fleet");
    for (String f : List.of("fleet.toml", "tm-pr2.toml", "tm-pr2-opcua.toml", "tm-pr3.toml")) {
      Files.copy(src.resolve(f), dir.resolve(f));
    }
    FleetConfig example = FleetConfig.load(dir.resolve("fleet.toml"));
    Scenario surge = ScenarioLoader.load(Path.of("config", "scenarios", "fuel-surge.toml"));
    Scenario drop = ScenarioLoader.load(Path.of("config", "scenarios", "feed-drop.toml"));
    DemoPlant plantA = DemoPlant.serve(new SimulatedPlant(example.unit("tm-pr2").unit(), surge), "Skid-R2");
    DemoPlant plantB = null;
    EstimatePublisher pub = null;
    FleetMonitor fleet = null;
    try {
      plantB = DemoPlant.serve(new SimulatedPlant(example.unit("tm-pr3").unit(), drop), "Skid-R3");
      // the example fleet file, its two endpoints moved to the ports the plants bound
      retarget(dir.resolve("tm-pr2-opcua.toml"), plantA.endpointUrl());
      retarget(dir.resolve("tm-pr3.toml"), plantB.endpointUrl());
      FleetConfig cfg = FleetConfig.load(dir.resolve("fleet.toml"));
      assertThat(cfg.ids()).containsExactly("tm-pr2", "tm-pr3");
      List<FleetConfig.FleetUnit> units = new ArrayList<>();
      for (FleetConfig.FleetUnit u : cfg.units()) {
        units.add(new FleetConfig.FleetUnit(u.id(), u.config(),
            DemoSession.scaled(u.opcua(), u.opcua().endpointUrl(), SPEED), u.opcuaFile()));
      }
      pub = EstimatePublisher.start("127.0.0.1", 0, EstimatePublisher.DEFAULT_NAMESPACE_URI, cfg.ids());
      double wallPeriodS = 1.0 / SPEED; // the example tag maps: frame_period = "1 s"
      TimeScale clock = new TimeScale(DemoSession.origin(Instant.now().plusMillis(300), wallPeriodS),
          surge.start(), SPEED);
      fleet = FleetMonitor.start(new FleetMonitor.Setup(units, pub, dir.resolve("data"), SourceKind.DEMO,
          cfg.file().toString(), "test", clock, 2, 64, 1.0));
      fleet.addEstimateListener((id, e) -> byUnit.computeIfAbsent(id, k -> new ConcurrentHashMap<>()).put(e.time(), e));
      plantA.begin(clock);
      plantB.begin(clock);

      // a few seconds of wall time, some thirty plant seconds: both units estimate
      waitFor(() -> count("tm-pr2") >= 30 && count("tm-pr3") >= 30, "30 estimates of each unit");
      FleetMonitor f = fleet;
      waitFor(() -> f.statuses().stream().allMatch(s -> s.latest() != null
          && Double.isFinite(s.latest().peakPlateTempK())), "a finite hidden peak of each unit");

      // each unit's nodes carry that unit's own estimate
      double[] peaks = new double[2];
      OpcUaClient client = OpcUaClient.create(pub.endpointUrl());
      client.connect();
      try {
        peaks[0] = readOwn(client, pub, "tm-pr2");
        peaks[1] = readOwn(client, pub, "tm-pr3");
      } finally {
        client.disconnect();
      }
      // two plants with their own upsets and sensor noise (fuel-surge, feed-drop: own seeds)
      assertThat(peaks[0]).isNotEqualTo(peaks[1]);

      String table = FleetTable.render(fleet.statuses(), clock.toPlant(Instant.now()), null);
      assertThat(table).startsWith(Advisory.SHORT).contains("tm-pr2").contains("tm-pr3")
          .contains("connected").contains("+/-").contains("degC").doesNotContain("connection lost");
      // each unit's alarms from its own configuration: TM-PR2 defines them (judged on its lane,
      // every definition present), TM-PR3 defines none
      List<FleetMonitor.UnitStatus> unitsNow = fleet.statuses();
      assertThat(unitsNow.get(0).alarms()).extracting(org.plateward.alarms.AlarmStatus::kind)
          .containsExactlyInAnyOrder(org.plateward.alarms.AlarmKind.values());
      assertThat(unitsNow.get(1).alarms()).isEmpty();
      assertThat(table.lines().filter(l -> l.startsWith("unit")).findFirst().orElseThrow()).contains("alarms");
      assertThat(FleetTable.alarms(unitsNow.get(0))).isNotEqualTo("-");
      assertThat(FleetTable.alarms(unitsNow.get(1))).isEqualTo("-");

      // one plant's endpoint goes away: its unit shows "connection lost", the other estimates on
      plantA.stopServing();
      waitFor(() -> f.statuses().get(0).linkLost(), "unit tm-pr2 connection lost");
      int bBefore = count("tm-pr3");
      Instant bLastBefore = f.statuses().get(1).latest().time();
      waitFor(() -> count("tm-pr3") >= bBefore + 20, "20 more estimates of tm-pr3");
      List<FleetMonitor.UnitStatus> after = fleet.statuses();
      assertThat(after.get(0).linkLost()).isTrue();
      assertThat(after.get(1).linkLost()).isFalse();
      assertThat(after.get(1).latest().time()).isAfter(bLastBefore.plusSeconds(15));
      assertThat(after.get(1).dataAgeS()).isLessThan(2.0);
      String lostTable = FleetTable.render(after, clock.toPlant(Instant.now()), null);
      assertThat(lostTable.lines().filter(l -> l.startsWith("tm-pr2")).findFirst().orElseThrow())
          .contains("connection lost");
      assertThat(lostTable.lines().filter(l -> l.startsWith("tm-pr3")).findFirst().orElseThrow())
          .contains("connected").doesNotContain("lost");
      client = OpcUaClient.create(pub.endpointUrl());
      client.connect();
      try {
        readOwn(client, pub, "tm-pr3");
      } finally {
        client.disconnect();
      }

      fleet.close();
      // every frame a lane took was estimated or counted as dropped
      for (FleetMonitor.UnitStatus s : fleet.statuses()) {
        LaneStatus l = s.lane();
        assertThat(l.accepted()).as(s.unitId()).isEqualTo(l.estimated() + l.dropped());
      }
      checkHistory(dir.resolve("data").resolve("tm-pr2.db"), "tm-pr2", surge.start());
      checkHistory(dir.resolve("data").resolve("tm-pr3.db"), "tm-pr3", surge.start());

      // the command line on the same fleet file, plant A still down: its unit is shown as
      // "connection lost" from the start, the other unit is watched
      Path cliData = dir.resolve("cli-data");
      Cli c = Cli.run("watch", "--headless", "--duration", "4 s", "--refresh", "1", "--publish-port", "0",
          "--data-dir", cliData.toString(), "-c", dir.resolve("fleet.toml").toString());
      assertThat(c.exit()).as(c.err()).isZero();
      assertThat(c.out()).startsWith(Advisory.SHORT).contains("2 units: tm-pr2, tm-pr3");
      List<String> last2 = c.out().lines().filter(l -> l.startsWith("tm-pr")).toList();
      assertThat(last2.size()).isGreaterThanOrEqualTo(4); // at least two tables of two lines
      String a = last2.get(last2.size() - 2);
      String b = last2.get(last2.size() - 1);
      assertThat(a).startsWith("tm-pr2").contains("connection lost").contains("waiting");
      assertThat(b).startsWith("tm-pr3").contains("connected").doesNotContain("lost");
      assertThat(cliData.resolve("tm-pr2.db")).exists();
      try (HistoryReader r = HistoryReader.open(cliData.resolve("tm-pr3.db"))) {
        Instant now = Instant.now();
        List<EstimateRow> rows = r.estimates(now.minusSeconds(600), now.plusSeconds(600));
        // real time, frame_period = "1 s": one estimate per wall second, in order
        assertThat(rows.size()).isGreaterThanOrEqualTo(2);
        for (int i = 1; i < rows.size(); i++) {
          assertThat(Duration.between(rows.get(i - 1).time(), rows.get(i).time()).toMillis()).isEqualTo(1000);
        }
        assertThat(r.runs()).extracting(x -> x.source()).containsExactly(SourceKind.LIVE);
      }
    } finally {
      if (fleet != null) {
        fleet.close();
      }
      if (pub != null) {
        pub.close();
      }
      plantA.close();
      if (plantB != null) {
        plantB.close();
      }
    }
  }

  /** Reads a unit's published peak and status and checks them against its estimate of that time. */
  private double readOwn(OpcUaClient client, EstimatePublisher pub, String id) throws Exception {
    List<DataValue> v = client.readValues(0.0, TimestampsToReturn.Both, List.of(
        pub.nodeId(id, "HiddenPeakTemperature"), pub.nodeId(id, "EstimatorStatus")));
    assertThat(v.get(0).statusCode().isGood()).as(id).isTrue();
    Instant t = v.get(0).sourceTime().getJavaInstant();
    // the publisher serves before the estimate listener runs: wait for that listener
    waitFor(() -> byUnit.get(id).containsKey(t), id + " estimate at " + t);
    Estimate e = byUnit.get(id).get(t);
    // a Double crosses OPC UA unchanged (IEEE 754 binary64 on the wire, OPC 10000-6 §5.2.2.3)
    double peak = (Double) v.get(0).value().value();
    assertThat(peak).as(id).isEqualTo(e.peakPlateTempK() - 273.15);
    assertThat((String) v.get(1).value().value()).as(id).startsWith(e.status().text());
    return peak;
  }

  /** The unit's own history file holds the estimates computed for it, bit for bit. */
  private void checkHistory(Path db, String id, Instant from) throws Exception {
    assertThat(db).exists();
    try (HistoryReader r = HistoryReader.open(db)) {
      List<EstimateRow> rows = r.estimates(from, from.plusSeconds(7200));
      Map<Instant, Estimate> mine = byUnit.get(id);
      assertThat(rows).hasSize(mine.size());
      for (EstimateRow row : rows) {
        Estimate e = mine.get(row.time());
        assertThat(e).as("%s estimate at %s", id, row.time()).isNotNull();
        assertThat(Double.compare(row.peakPlateTempK(), e.peakPlateTempK())).as("%s peak at %s", id, row.time()).isZero();
      }
      assertThat(r.runs()).hasSize(1);
      assertThat(r.runs().get(0).unitName()).isEqualTo(id.toUpperCase(java.util.Locale.ROOT));
      List<Frame> frames = r.frames(from, from.plusSeconds(7200));
      // stored feed flow: the example units' 19.5 Nm3/h in mol/s through the CODATA 2018 molar
      // volume of an ideal gas at 0 degC, 101.325 kPa, 22.413 969 54 L/mol; the meter's noise is
      // 0.5 % of reading and its systematic error 0.5 % σ (README sensor table), so a mean over
      // the first 20 frames (before any upset) is within 0.5 % + 4 × 0.5 %
      double expected = 19.5 / 0.02241396954 / 3600.0;
      double sum = 0;
      int n = 0;
      for (Frame fr : frames.subList(0, Math.min(20, frames.size()))) {
        if (fr.usable(Signal.REF_GAS_FLOW)) {
          sum += fr.valueSi(Signal.REF_GAS_FLOW);
          n++;
        }
      }
      assertThat(n).as(id).isGreaterThanOrEqualTo(15);
      assertThat(sum / n).as(id).isCloseTo(expected, org.assertj.core.data.Percentage.withPercentage(2.5));
    }
  }

  private int count(String id) {
    Map<Instant, Estimate> m = byUnit.get(id);
    return m == null ? 0 : m.size();
  }

  private static void retarget(Path file, String url) throws Exception {
    String s = Files.readString(file);
    String old = "opc.tcp://127.0.0.1:4841/plateward/plant";
    assertThat(s).contains(old);
    Files.writeString(file, s.replace(old, url));
  }

  private static void waitFor(BooleanSupplier c, String what) throws InterruptedException {
    long end = System.currentTimeMillis() + WAIT_MS;
    while (!c.getAsBoolean()) {
      if (System.currentTimeMillis() > end) {
        throw new AssertionError("timed out waiting for " + what);
      }
      Thread.sleep(50);
    }
  }
}
