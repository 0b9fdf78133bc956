package org.plateward.opcua;

import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.eclipse.milo.opcua.sdk.core.AccessLevel;
import org.eclipse.milo.opcua.sdk.core.Reference;
import org.eclipse.milo.opcua.sdk.server.OpcUaServer;
import org.eclipse.milo.opcua.sdk.server.nodes.UaFolderNode;
import org.eclipse.milo.opcua.sdk.server.nodes.UaVariableNode;
import org.eclipse.milo.opcua.sdk.server.util.SubscriptionModel;
import org.eclipse.milo.opcua.stack.core.NodeIds;
import org.eclipse.milo.opcua.stack.core.types.builtin.DataValue;
import org.eclipse.milo.opcua.stack.core.types.builtin.DateTime;
import org.eclipse.milo.opcua.stack.core.types.builtin.LocalizedText;
import org.eclipse.milo.opcua.stack.core.types.builtin.NodeId;
import org.eclipse.milo.opcua.stack.core.types.builtin.StatusCode;
import org.eclipse.milo.opcua.stack.core.types.builtin.Variant;
import org.eclipse.milo.opcua.stack.core.types.structured.EUInformation;
import org.plateward.signals.EdgeUnit;
import org.plateward.signals.Signal;
import org.plateward.signals.StatusName;

/**
 * The simulated plant's address space: one folder per skid area and one read-only Double
 * variable per {@link Signal}, in the signal's edge unit, laid out by {@link PlantAddressLayout}.
 * Monitored items are served by Milo's {@link SubscriptionModel}, which samples the variables at
 * each item's sampling interval.
 */
final class PlantNamespace extends SampledNamespace {
  private final PlantAddressLayout layout;
  private final Map<Signal, UaVariableNode> variables = new EnumMap<>(Signal.class);

  PlantNamespace(OpcUaServer server, String namespaceUri, PlantAddressLayout layout) {
    super(server, namespaceUri);
    this.layout = layout;
  }

  /** The variable serving this signal; present once the namespace has started. */
  UaVariableNode variable(Signal signal) {
    return variables.get(signal);
  }

  NodeId nodeId(Signal signal) {
    return newNodeId(layout.nodeIdentifier(signal));
  }

  @Override
  protected void createNodes() {
    UaFolderNode skid = folder(layout.skid(), layout.skid(), null);
    skid.addReference(
        new Reference(skid.getNodeId(), NodeIds.Organizes, NodeIds.ObjectsFolder.expanded(), false));

    Map<String, UaFolderNode> folders = new HashMap<>();
    DataValue initial =
        new DataValue(
            Variant.NULL_VALUE,
            new StatusCode(StatusName.BAD_WAITING_FOR_INITIAL_DATA.code()),
            null,
            DateTime.now());
    for (Signal signal : Signal.values()) {
      List<String> rel = PlantAddressLayout.relativePath(signal);
      UaFolderNode parent = skid;
      StringBuilder path = new StringBuilder(layout.skid());
      for (String area : rel.subList(0, rel.size() - 1)) {
        path.append('/').append(area);
        UaFolderNode p = parent;
        String key = path.toString();
        parent =
            folders.computeIfAbsent(
                key,
                k -> {
                  UaFolderNode f = folder(k, area, null);
                  p.addOrganizes(f);
                  return f;
                });
      }
      String name = rel.get(rel.size() - 1);
      EdgeUnit unit = signal.unit();
      UaVariableNode node =
          new UaVariableNode.UaVariableNodeBuilder(getNodeContext())
              .setNodeId(nodeId(signal))
              .setBrowseName(newQualifiedName(name))
              .setDisplayName(LocalizedText.english(name))
              .setDescription(
                  LocalizedText.english(
                      signal.meaning() + " [" + unit.label() + "], signal " + signal.id()))
              .setDataType(NodeIds.Double)
              .setTypeDefinition(NodeIds.BaseDataVariableType)
              .setAccessLevel(AccessLevel.READ_ONLY)
              .setUserAccessLevel(AccessLevel.READ_ONLY)
              .setValue(initial)
              .build();
      getNodeManager().addNode(node);
      parent.addOrganizes(node);
      node.setEngineeringUnits(engineeringUnits(unit));
      variables.put(signal, node);
    }
  }

  /**
   * EngineeringUnits property (OPC 10000-8 §5.6.3). Codes from the UNECE Recommendation 20 list
   * (from memory: CEL degree Celsius, KPA kilopascal, E93 kilogram per hour, P1 percent); the
   * unitId packs the code's ASCII characters big-endian. Normal cubic metres per hour have no
   * code there that we are sure of, so they carry unitId -1 ("not available") in our own
   * namespace.
   */
  static EUInformation engineeringUnits(EdgeUnit unit) {
    String code =
        switch (unit) {
          case DEG_C -> "CEL";
          case KPA_ABS -> "KPA";
          case KG_PER_H_STEAM -> "E93";
          case MOL_PCT_DRY -> "P1";
          case NM3_PER_H -> null;
        };
    String description =
        switch (unit) {
          case NM3_PER_H -> "normal cubic metre per hour (0 degC, 101.325 kPa)";
          case KG_PER_H_STEAM -> "kilogram per hour";
          case DEG_C -> "degree Celsius";
          case KPA_ABS -> "kilopascal, absolute";
          case MOL_PCT_DRY -> "mole per cent, dry basis";
        };
    if (code == null) {
      return new EUInformation(
          "urn:plateward:units",
          -1,
          LocalizedText.english(unit.label()),
          LocalizedText.english(description));
    }
    int unitId = 0;
    for (char c : code.toCharArray()) {
      unitId = (unitId << 8) | c;
    }
    return new EUInformation(
        "http://www.opcfoundation.org/UA/units/un/cefact",
        unitId,
        LocalizedText.english(unit.label()),
        LocalizedText.english(description));
  }
}
