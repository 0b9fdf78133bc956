package org.plateward.opcua;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.eclipse.milo.opcua.sdk.client.OpcUaClient;
import org.eclipse.milo.opcua.stack.core.NodeIds;
import org.eclipse.milo.opcua.stack.core.StatusCodes;
import org.eclipse.milo.opcua.stack.core.types.builtin.DataValue;
import org.eclipse.milo.opcua.stack.core.types.builtin.NodeId;
import org.eclipse.milo.opcua.stack.core.types.builtin.StatusCode;
import org.eclipse.milo.opcua.stack.core.types.builtin.Variant;
import org.eclipse.milo.opcua.stack.core.types.enumerated.TimestampsToReturn;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.plateward.Advisory;

/** A second, plain Milo client reads what the publisher serves. */
@Timeout(40)
class EstimatePublisherTest {
  private static final List<String> NAMES =
      List.of("HiddenPeakTemperature", "HiddenPeakTemperatureSigma", "HiddenPeakPosition",
          "MeltFraction", "MaxCellMeltFraction", "TimeToExhaust", "TimeToExhaustSigma",
          "EstimatorStatus", "ActiveAlarms");

  @Test
  void aSecondClientReadsThePublishedEstimatesAndCannotWriteThem() throws Exception {
    try (EstimatePublisher pub =
        EstimatePublisher.start("127.0.0.1", 0, EstimatePublisher.DEFAULT_NAMESPACE_URI, List.of("TM-PR1"))) {
      Instant t = Instant.parse("2026-05-06T07:08:09Z");
      pub.publish("TM-PR1", new PublishedEstimate(t, 1012.5, 7.25, 0.143, 0.125, 0.5,
          Double.POSITIVE_INFINITY, Double.NaN, "tracking", 2));

      OpcUaClient client = OpcUaClient.create(pub.endpointUrl());
      client.connect();
      try {
        List<NodeId> ids = new ArrayList<>();
        for (String n : NAMES) {
          ids.add(pub.nodeId("TM-PR1", n));
        }
        List<DataValue> v = client.readValues(0.0, TimestampsToReturn.Both, ids);
        assertThat(v.get(0).value().value()).isEqualTo(1012.5);
        assertThat(v.get(1).value().value()).isEqualTo(7.25);
        assertThat(v.get(2).value().value()).isEqualTo(0.143);
        assertThat(v.get(3).value().value()).isEqualTo(0.125);
        assertThat(v.get(4).value().value()).isEqualTo(0.5);
        assertThat(v.get(5).value().value()).isEqualTo(Double.POSITIVE_INFINITY);
        // NaN is never served as a number: Bad_NoCommunication 0x80310000 (StatusCode.csv)
        assertThat(v.get(6).statusCode().value()).isEqualTo(0x80310000L);
        assertThat(v.get(6).value().isNull()).isTrue();
        assertThat(v.get(7).value().value()).isEqualTo("tracking");
        assertThat(v.get(8).value().value()).isEqualTo(2);
        assertThat(v.get(0).sourceTime().getJavaInstant()).isEqualTo(t);

        // namespace by URI, advisory as a property
        assertThat(client.getNamespaceTable().getIndex(EstimatePublisher.DEFAULT_NAMESPACE_URI))
            .isEqualTo(ids.get(0).getNamespaceIndex());
        NodeId advisory = new NodeId(ids.get(0).getNamespaceIndex(), "TM-PR1/Advisory");
        assertThat(client.readValue(0.0, TimestampsToReturn.Neither, advisory).value().value())
            .isEqualTo(Advisory.SHORT);
        var node = client.getAddressSpace().getVariableNode(ids.get(0));
        assertThat(node.readDataType()).isEqualTo(NodeIds.Double);
        // AccessLevel bit 0 CurrentRead only (OPC 10000-3 §8.57)
        assertThat(node.readAccessLevel().intValue()).isEqualTo(1);
        List<StatusCode> w = client.writeValues(List.of(ids.get(0)),
            List.of(DataValue.valueOnly(new Variant(1.0))));
        assertThat(w.get(0).value()).isIn(StatusCodes.Bad_UserAccessDenied, StatusCodes.Bad_NotWritable);
      } finally {
        client.disconnect();
      }
      assertThatThrownBy(() -> pub.publish("other", null)).isInstanceOf(IllegalArgumentException.class);
    }
  }
}
