package org.plateward.opcua;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.eclipse.milo.opcua.sdk.core.AccessLevel;
import org.eclipse.milo.opcua.sdk.core.Reference;
import org.eclipse.milo.opcua.sdk.server.OpcUaServer;
import org.eclipse.milo.opcua.sdk.server.nodes.UaFolderNode;
import org.eclipse.milo.opcua.sdk.server.nodes.UaVariableNode;
import org.eclipse.milo.opcua.stack.core.NodeIds;
import org.eclipse.milo.opcua.stack.core.types.builtin.DataValue;
import org.eclipse.milo.opcua.stack.core.types.builtin.DateTime;
import org.eclipse.milo.opcua.stack.core.types.builtin.LocalizedText;
import org.eclipse.milo.opcua.stack.core.types.builtin.NodeId;
import org.eclipse.milo.opcua.stack.core.types.builtin.StatusCode;
import org.eclipse.milo.opcua.stack.core.types.builtin.Variant;
import org.plateward.Advisory;
import org.plateward.signals.StatusName;

/**
 * The soft-sensor address space: {@code Objects/Plateward/<unit>/<quantity>}, read-only, with the
 * advisory caution as the unit folder's description and as its {@code Advisory} property. String
 * NodeIds are {@code <unit>/<quantity>}.
 */
final class EstimateNamespace extends SampledNamespace {
  /** Variables of each unit: browse name, data type, description. */
  enum Quantity {
    HIDDEN_PEAK_TEMPERATURE("HiddenPeakTemperature", NodeIds.Double, "hidden peak plate temperature [degC]"),
    HIDDEN_PEAK_TEMPERATURE_SD("HiddenPeakTemperatureSigma", NodeIds.Double, "standard deviation of the hidden peak temperature [K]"),
    HIDDEN_PEAK_POSITION("HiddenPeakPosition", NodeIds.Double, "position of the hidden peak from the reforming inlet [m]"),
    MELT_FRACTION("MeltFraction", NodeIds.Double, "overall melt fraction of the buffer layer [1]"),
    MAX_CELL_MELT_FRACTION("MaxCellMeltFraction", NodeIds.Double, "largest cell melt fraction of the buffer layer [1]"),
    TIME_TO_EXHAUST("TimeToExhaust", NodeIds.Double, "time-to-exhaust of the buffer layer [s]"),
    TIME_TO_EXHAUST_SD("TimeToExhaustSigma", NodeIds.Double, "standard deviation of the time-to-exhaust [s]"),
    ESTIMATOR_STATUS("EstimatorStatus", NodeIds.String, "estimator status"),
    ACTIVE_ALARMS("ActiveAlarms", NodeIds.Int32, "number of active alarms");

    final String browseName;
    final NodeId dataType;
    final String description;

    Quantity(String browseName, NodeId dataType, String description) {
      this.browseName = browseName;
      this.dataType = dataType;
      this.description = description;
    }
  }

  static final String ROOT = "Plateward";

  private final List<String> units;
  private final Map<String, UaVariableNode> variables = new HashMap<>();

  EstimateNamespace(OpcUaServer server, String namespaceUri, List<String> units) {
    super(server, namespaceUri);
    this.units = List.copyOf(units);
  }

  static String identifier(String unit, Quantity q) {
    return unit + "/" + q.browseName;
  }

  NodeId nodeId(String unit, Quantity q) {
    return newNodeId(identifier(unit, q));
  }

  UaVariableNode variable(String unit, Quantity q) {
    return variables.get(identifier(unit, q));
  }

  @Override
  protected void createNodes() {
    UaFolderNode root = folder(ROOT, ROOT, "Plateward soft-sensor estimates. " + Advisory.SHORT);
    root.addReference(
        new Reference(root.getNodeId(), NodeIds.Organizes, NodeIds.ObjectsFolder.expanded(), false));
    DataValue initial =
        new DataValue(
            Variant.NULL_VALUE,
            new StatusCode(StatusName.BAD_WAITING_FOR_INITIAL_DATA.code()),
            null,
            DateTime.now());
    for (String unit : units) {
      UaFolderNode f = folder(unit, unit, "estimates for unit " + unit + ". " + Advisory.SHORT);
      root.addOrganizes(f);
      UaVariableNode advisory =
          new UaVariableNode.UaVariableNodeBuilder(getNodeContext())
              .setNodeId(newNodeId(unit + "/Advisory"))
              .setBrowseName(newQualifiedName("Advisory"))
              .setDisplayName(LocalizedText.english("Advisory"))
              .setDescription(LocalizedText.english("caution that applies to every value here"))
              .setDataType(NodeIds.String)
              .setTypeDefinition(NodeIds.PropertyType)
              .setAccessLevel(AccessLevel.READ_ONLY)
              .setUserAccessLevel(AccessLevel.READ_ONLY)
              .setValue(new DataValue(new Variant(Advisory.SHORT)))
              .build();
      getNodeManager().addNode(advisory);
      f.addReference(new Reference(f.getNodeId(), NodeIds.HasProperty, advisory.getNodeId().expanded(), true));
      for (Quantity q : Quantity.values()) {
        UaVariableNode node =
            new UaVariableNode.UaVariableNodeBuilder(getNodeContext())
                .setNodeId(nodeId(unit, q))
                .setBrowseName(newQualifiedName(q.browseName))
                .setDisplayName(LocalizedText.english(q.browseName))
                .setDescription(LocalizedText.english(q.description + " (advisory estimate)"))
                .setDataType(q.dataType)
                .setTypeDefinition(NodeIds.BaseDataVariableType)
                .setAccessLevel(AccessLevel.READ_ONLY)
                .setUserAccessLevel(AccessLevel.READ_ONLY)
                .setValue(initial)
                .build();
        getNodeManager().addNode(node);
        f.addOrganizes(node);
        variables.put(identifier(unit, q), node);
      }
    }
  }

}
