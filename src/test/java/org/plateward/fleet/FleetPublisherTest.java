package org.plateward.fleet;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;
import org.eclipse.milo.opcua.sdk.client.OpcUaClient;
import org.eclipse.milo.opcua.sdk.client.nodes.UaNode;
import org.eclipse.milo.opcua.stack.core.types.builtin.DataValue;
import org.eclipse.milo.opcua.stack.core.types.builtin.NodeId;
import org.eclipse.milo.opcua.stack.core.types.enumerated.TimestampsToReturn;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.opcua.EstimatePublisher;
import org.plateward.reactor.UnitSpec;
import org.plateward.replay.ReplayFrameSource;
import org.plateward.signals.Frame;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.ReactorSoftSensor;

/**
 * Loopback (127.0.0.1): two units estimated on the pool publish under their own folders, and a
 * plain Milo client reads each unit's last estimate from that unit's nodes; a third unit whose
 * estimator fails shows "failed: ..." and no values. Every wait is bounded.
 */
@Timeout(90)
class FleetPublisherTest {
  @TempDir Path dir;

  private static List<Frame> frames(Path p) throws Exception {
    List<Frame> out = new ArrayList<>();
    try (ReplayFrameSource src = ReplayFrameSource.open(p)) {
      Frame f;
      while ((f = src.next()) != null) {
        out.add(f);
      }
    }
    return out;
  }

  @Test
  void aClientReadsEachUnitsEstimateFromItsOwnNodes() throws Exception {
    UnitSpec unit = FleetFixtures.unit30();
    List<String> ids = List.of("tm-pr2", "tm-pr3", "tm-pr4");
    List<List<Frame>> feeds = List.of(
        frames(FleetFixtures.slice(dir, "feed-drop", 0, 60, "a")),
        frames(FleetFixtures.slice(dir, "fuel-surge", 1500, 60, "b")),
        frames(FleetFixtures.slice(dir, "analyzer-outage", 0, 60, "c")));
    try (EstimatePublisher pub = EstimatePublisher.start("127.0.0.1", 0, EstimatePublisher.DEFAULT_NAMESPACE_URI, ids);
        UnitPool pool = new UnitPool(2)) {
      List<AtomicReference<Estimate>> last = new ArrayList<>();
      List<UnitLane> lanes = new ArrayList<>();
      for (int i = 0; i < 3; i++) {
        AtomicReference<Estimate> ref = new AtomicReference<>();
        last.add(ref);
        ReactorSoftSensor sensor = FleetFixtures.sensor(unit);
        UnitEstimator est = i < 2 ? sensor::accept : f -> {
          throw new IllegalStateException("thermocouple map inconsistent");
        };
        lanes.add(pool.feed(ids.get(i), est, 16, UnitPublishing.sink(pub, ids.get(i), (f, e, t) -> ref.set(e))));
      }
      for (int i = 0; i < 3; i++) {
        for (Frame f : feeds.get(i)) {
          if (!lanes.get(i).put(f)) {
            break;
          }
        }
        lanes.get(i).endFeed();
      }
      List<LaneStatus> end = new ArrayList<>();
      for (UnitLane l : lanes) {
        end.add(l.await(60_000));
      }
      assertThat(end.get(0).state()).isEqualTo(LaneState.FINISHED);
      assertThat(end.get(1).state()).isEqualTo(LaneState.FINISHED);
      assertThat(end.get(2).state()).isEqualTo(LaneState.FAILED);
      UnitPublishing.showFailure(pub, end.get(2));

      OpcUaClient client = OpcUaClient.create(pub.endpointUrl());
      client.connect();
      try {
        // one folder per unit under Objects/Plateward
        NodeId root = new NodeId(pub.nodeId("tm-pr2", "HiddenPeakTemperature").getNamespaceIndex(), "Plateward");
        List<String> folders = new ArrayList<>();
        for (UaNode n : client.getAddressSpace().browseNodes(root)) {
          folders.add(n.getBrowseName().name());
        }
        assertThat(folders).containsAll(ids);
        double[] peaks = new double[2];
        for (int i = 0; i < 2; i++) {
          Estimate e = last.get(i).get();
          List<DataValue> v = client.readValues(0.0, TimestampsToReturn.Both, List.of(
              pub.nodeId(ids.get(i), "HiddenPeakTemperature"), pub.nodeId(ids.get(i), "MeltFraction"),
              pub.nodeId(ids.get(i), "EstimatorStatus")));
          // a Double crosses OPC UA unchanged (IEEE 754 binary64 on the wire, OPC 10000-6 §5.2.2.3)
          peaks[i] = (Double) v.get(0).value().value();
          assertThat(peaks[i]).isEqualTo(e.peakPlateTempK() - 273.15);
          assertThat((Double) v.get(1).value().value()).isEqualTo(e.bufferMeltFraction());
          assertThat((String) v.get(2).value().value()).startsWith(e.status().text());
          assertThat(v.get(0).sourceTime().getJavaInstant()).isEqualTo(feeds.get(i).get(59).time());
        }
        assertThat(peaks[0]).isNotEqualTo(peaks[1]);
        List<DataValue> failed = client.readValues(0.0, TimestampsToReturn.Both, List.of(
            pub.nodeId("tm-pr4", "HiddenPeakTemperature"), pub.nodeId("tm-pr4", "EstimatorStatus")));
        // Bad_NoCommunication 0x80310000 (OPC 10000-4 status codes): no value, never a stale number
        assertThat(failed.get(0).statusCode().value()).isEqualTo(0x80310000L);
        assertThat((String) failed.get(1).value().value())
            .startsWith("failed: IllegalStateException: thermocouple map inconsistent");
      } finally {
        client.disconnect();
      }
    }
  }
}
