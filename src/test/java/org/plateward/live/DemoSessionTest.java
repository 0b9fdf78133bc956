package org.plateward.live;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.TimeUnit;
import java.util.function.BooleanSupplier;
import org.eclipse.milo.opcua.sdk.client.OpcUaClient;
import org.eclipse.milo.opcua.stack.core.types.builtin.DataValue;
import org.eclipse.milo.opcua.stack.core.types.enumerated.TimestampsToReturn;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestMethodOrder;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.Advisory;
import org.plateward.config.OpcuaSettings;
import org.plateward.config.PlatewardConfig;
import org.plateward.config.ScenarioLoader;
import org.plateward.history.EstimateRow;
import org.plateward.history.GapRow;
import org.plateward.history.HistoryReader;
import org.plateward.history.RunRow;
import org.plateward.history.SourceKind;
import org.plateward.opcua.ConnectionState;
import org.plateward.opcua.DataGap;
import org.plateward.plant.Scenario;
import org.plateward.signals.Frame;
import org.plateward.signals.Signal;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.EstimatorStatus;
import org.plateward.softsensor.ReactorSoftSensor;

/**
 * {@code plateward demo} end to end over loopback, one session for the class at 20 x real time:
 * the simulated plant served over OPC UA, the monitor on it, the publisher read by a second
 * Milo client, history read back; then a plant-server restart mid-run; then {@code replay --db}
 * over the stored period.
 */
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
@Timeout(60)
class DemoSessionTest {
  private static final double SPEED = 20.0;
  private static final long WAIT_MS = 20_000;

  @TempDir static Path dataDir;

  private static DemoSession session;
  private static Scenario scenario;
  private static final Map<Instant, Estimate> byTime = new ConcurrentHashMap<>();
  private static final List<Estimate> estimates = new CopyOnWriteArrayList<>();

  @BeforeAll
  static void start() throws Exception {
    PlatewardConfig cfg = PlatewardConfig.load(Path.of("config", "plateward.toml"));
    scenario = ScenarioLoader.load(Path.of("config", "scenarios", "fuel-surge.toml"));
    OpcuaSettings map = OpcuaSettings.load(Path.of("config", "opcua-demo.toml"));
    session = DemoSession.start(cfg, scenario, map, dataDir, SPEED, "test", line -> { });
    session.monitor().addEstimateListener(e -> {
      byTime.put(e.time(), e);
      estimates.add(e);
    });
  }

  @AfterAll
  static void stop() {
    if (session != null) {
      session.close();
    }
  }

  @Test
  @Order(1)
  void samplesArriveEstimatesAreStoredAndTheRepublishedNodesAreReadable() throws Exception {
    waitFor(() -> estimates.size() >= 80, "80 estimates");
    LiveMonitor m = session.monitor();

    // a second Milo client reads the publisher: the served peak is the estimate of the same time
    OpcUaClient client = OpcUaClient.create(session.publisher().endpointUrl());
    client.connect();
    try {
      String unit = LiveMonitor.publishedName("TM-PR1");
      DataValue peak = client.readValue(0.0, TimestampsToReturn.Both,
          session.publisher().nodeId(unit, "HiddenPeakTemperature"));
      DataValue status = client.readValue(0.0, TimestampsToReturn.Both,
          session.publisher().nodeId(unit, "EstimatorStatus"));
      assertThat(peak.statusCode().isGood()).isTrue();
      Instant t = peak.sourceTime().getJavaInstant();
      Estimate e = nearest(t);
      // OPC UA DateTime holds 100 ns ticks: the SourceTimestamp is the estimate time to 100 ns
      assertThat(Duration.between(e.time(), t).abs().toNanos()).isLessThan(100);
      assertThat((Double) peak.value().value()).isEqualTo(e.peakPlateTempK() - 273.15);
      assertThat((String) status.value().value()).startsWith(e.status().text());
    } finally {
      client.disconnect();
    }

    // the estimator sees one frame per plant second (opcua-demo.toml: frame_period = "1 s"),
    // though frames travel at 1/20 s of wall time
    List<Estimate> first = new ArrayList<>(estimates).subList(0, 60);
    for (int i = 1; i < first.size(); i++) {
      assertThat(Duration.between(first.get(i - 1).time(), first.get(i).time()).toMillis()).isEqualTo(1000);
    }
    // plant time starts when the monitor listens, on a whole plant second
    assertThat(first.get(0).time()).isBetween(scenario.start(), scenario.start().plusSeconds(10));
    assertThat(Duration.between(scenario.start(), first.get(0).time()).getNano()).isZero();

    assertThat(session.history().flush(Duration.ofSeconds(10))).isTrue();
    Instant from = scenario.start();
    Instant to = scenario.start().plusSeconds(7200);
    try (HistoryReader r = HistoryReader.open(dataDir.resolve("plateward.db"))) {
      List<Frame> frames = r.frames(from, to);
      List<EstimateRow> rows = r.estimates(from, to);
      assertThat(frames.size()).isGreaterThanOrEqualTo(60);
      assertThat(rows.size()).isGreaterThanOrEqualTo(60);
      assertThat(rows.subList(0, 60)).anyMatch(row -> Double.isFinite(row.peakPlateTempK()));
      // stored estimates are the ones computed
      for (EstimateRow row : rows.subList(0, 60)) {
        Estimate e = byTime.get(row.time());
        assertThat(e).as("estimate at %s", row.time()).isNotNull();
        assertThat(Double.compare(row.peakPlateTempK(), e.peakPlateTempK())).as("peak at %s", row.time()).isZero();
        assertThat(row.status()).isEqualTo(e.status().text());
        assertThat(row.cellTempK()).hasSize(row.cellMeltFraction().length);
      }
      // stored feed flow: the demo unit's 19.5 Nm3/h (config/plateward.toml) in mol/s through
      // the CODATA 2018 molar volume of an ideal gas at 0 degC, 101.325 kPa, 22.413 969 54 L/mol;
      // the meter's noise is 0.5 % of reading and its systematic error (accuracy class, one draw
      // per run) 0.5 % σ (README sensor table), so a 60-frame mean is within 0.5 % + 4 × 0.5 %
      double expected = 19.5 / 0.02241396954 / 3600.0;
      double sum = 0;
      int n = 0;
      for (Frame f : frames) {
        if (f.usable(Signal.REF_GAS_FLOW)) {
          sum += f.valueSi(Signal.REF_GAS_FLOW);
          n++;
        }
      }
      assertThat(n).isGreaterThanOrEqualTo(50);
      assertThat(sum / n).isCloseTo(expected, org.assertj.core.data.Percentage.withPercentage(2.5));
      List<RunRow> runs = r.runs();
      assertThat(runs).extracting(RunRow::runId).contains(m.runId());
      assertThat(runs).extracting(RunRow::source).contains(SourceKind.DEMO);
    }

    String block = StatusBlock.render(m.status());
    assertThat(block).contains(Advisory.SHORT).contains("CONNECTED").contains("hidden peak")
        .contains("+/-").contains("degC").containsAnyOf("time-to-exhaust", "no cell melts through")
        .contains("history     kept");
  }

  @Test
  @Order(2)
  void operatorActionsGoThroughTheBoardOnTheEstimatorThreadAndAreAudited() throws Exception {
    java.util.List<org.plateward.signals.Frame> frames = new CopyOnWriteArrayList<>();
    session.monitor().addFrameListener((f, e) -> frames.add(f));
    waitFor(() -> frames.size() >= 3, "frames at the frame listener");
    assertThat(frames.get(0).time()).isAfterOrEqualTo(scenario.start());
    var refused = session.monitor().alarmAction(org.plateward.alarms.ActionKind.SHELVE, "shift-a",
        org.plateward.alarms.AlarmKind.MELT_HIGH, null, Duration.ofMinutes(10)).get(10, TimeUnit.SECONDS);
    assertThat(refused.accepted()).isFalse();
    assertThat(refused.message()).contains("needs a reason");
    var out = session.monitor().alarmAction(org.plateward.alarms.ActionKind.REMOVE_FROM_SERVICE, "shift-a",
        org.plateward.alarms.AlarmKind.HISTORY_NOT_KEPT, "disk swap", null).get(10, TimeUnit.SECONDS);
    assertThat(out.accepted()).as(out.message()).isTrue();
    waitFor(() -> session.monitor().status().alarms().stream().anyMatch(a ->
        a.kind() == org.plateward.alarms.AlarmKind.HISTORY_NOT_KEPT
            && a.state() == org.plateward.alarms.AlarmState.OUT_OF_SERVICE), "the alarm out of service");
    var back = session.monitor().alarmAction(org.plateward.alarms.ActionKind.RETURN_TO_SERVICE, "shift-a",
        org.plateward.alarms.AlarmKind.HISTORY_NOT_KEPT, null, null).get(10, TimeUnit.SECONDS);
    assertThat(back.accepted()).as(back.message()).isTrue();
    session.history().flush(Duration.ofSeconds(10));
    try (HistoryReader r = HistoryReader.open(dataDir.resolve("plateward.db"))) {
      var acts = r.operatorActions(scenario.start(), scenario.start().plusSeconds(7200));
      assertThat(acts).extracting(a -> a.action() + " " + a.alarmId() + " " + a.who())
          .contains("remove_from_service history_not_kept shift-a", "return_to_service history_not_kept shift-a");
    }
  }

  @Test
  @Order(3)
  void aPlantServerRestartIsAGapAndTheEstimatorContinuesWithoutReset() throws Exception {
    LiveMonitor m = session.monitor();
    ReactorSoftSensor sensor = m.sensor();
    long blocksBefore = sensor.blocks();
    int before = estimates.size();
    double sdBefore = estimates.get(before - 1).peakPlateTempSdK();

    session.plant().stopServing();
    waitFor(() -> m.status().link() == ConnectionState.RECONNECTING, "link RECONNECTING");
    Thread.sleep(1500);
    session.plant().resumeServing();
    waitFor(() -> m.status().link() == ConnectionState.CONNECTED && !m.connection().gaps().isEmpty(),
        "reconnect and a gap");
    int resumed = estimates.size();
    waitFor(() -> estimates.size() >= resumed + 60 && m.status().dataAgeS() < 1.0, "frames after the restart");

    assertThat(m.sensor()).isSameAs(sensor);
    assertThat(sensor.blocks()).isGreaterThan(blocksBefore + 10);
    // frames during the gap are MISSING: degraded, and the peak's uncertainty grew (prediction
    // without correction adds process noise every step, Kalman 1960)
    DataGap gap = m.connection().gaps().get(0);
    Instant gapFrom = session.clock().toPlant(gap.from());
    Instant gapTo = session.clock().toPlant(gap.to());
    List<Estimate> inGap = estimates.stream()
        .filter(e -> e.time().isAfter(gapFrom.plusSeconds(10)) && e.time().isBefore(gapTo)).toList();
    assertThat(inGap).isNotEmpty();
    assertThat(inGap).allMatch(e -> e.status() != EstimatorStatus.OK);
    assertThat(inGap.stream().mapToDouble(Estimate::peakPlateTempSdK).max().orElseThrow()).isGreaterThan(sdBefore);
    // time runs on without a jump: one estimate per plant second throughout
    List<Estimate> all = new ArrayList<>(estimates);
    for (int i = Math.max(1, before - 5); i < all.size(); i++) {
      assertThat(Duration.between(all.get(i - 1).time(), all.get(i).time()).toMillis()).isEqualTo(1000);
    }

    assertThat(session.history().flush(Duration.ofSeconds(10))).isTrue();
    try (HistoryReader r = HistoryReader.open(dataDir.resolve("plateward.db"))) {
      List<GapRow> gaps = r.gaps(scenario.start(), scenario.start().plusSeconds(7200));
      assertThat(gaps).anySatisfy(g -> {
        assertThat(g.reason()).startsWith("OPC UA");
        // stored in plant time: the wall-clock gap times the speed (history keeps milliseconds)
        assertThat(Math.abs(Duration.between(g.start(), g.end()).toMillis()
            - gap.length().toNanos() * SPEED / 1e6)).isLessThan(2.0 * SPEED);
        assertThat(g.start()).isBetween(gapFrom.minusSeconds(1), gapFrom.plusSeconds(1));
      });
    }
  }

  @Test
  @Order(4)
  void replayFromHistoryRunsTheStoredPeriodThroughTheEstimator() throws Exception {
    session.close();
    long stored;
    Instant from = scenario.start();
    Instant to = scenario.start().plusSeconds(7200);
    try (HistoryReader r = HistoryReader.open(dataDir.resolve("plateward.db"))) {
      stored = r.frames(from, to).size();
    }
    Path out = dataDir.resolve("estimates.csv");
    Cli c = Cli.run("replay", "--db", dataDir.resolve("plateward.db").toString(), "--from", from.toString(),
        "--to", to.toString(), "--out", out.toString(), "--no-progress");
    assertThat(c.exit()).as(c.err()).isZero();
    assertThat(c.out()).contains(Advisory.SHORT).contains("replayed " + stored + " frames");
    long rows = java.nio.file.Files.readAllLines(out).stream().filter(l -> l.startsWith("2031")).count();
    assertThat(rows).isEqualTo(stored);

    Cli bad = Cli.run("replay", "--db", dataDir.resolve("plateward.db").toString(), "--from", "yesterday",
        "--to", to.toString());
    assertThat(bad.exit()).isEqualTo(2);
    assertThat(bad.err()).contains("--from").contains("ISO 8601");
  }

  private static Estimate nearest(Instant t) {
    Estimate best = null;
    for (Estimate e : estimates) {
      if (best == null || Duration.between(e.time(), t).abs().compareTo(Duration.between(best.time(), t).abs()) < 0) {
        best = e;
      }
    }
    return best;
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
