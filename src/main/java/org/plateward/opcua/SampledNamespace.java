package org.plateward.opcua;

import java.util.List;
import org.eclipse.milo.opcua.sdk.server.ManagedNamespaceWithLifecycle;
import org.eclipse.milo.opcua.sdk.server.OpcUaServer;
import org.eclipse.milo.opcua.sdk.server.items.DataItem;
import org.eclipse.milo.opcua.sdk.server.items.MonitoredItem;
import org.eclipse.milo.opcua.sdk.server.nodes.UaFolderNode;
import org.eclipse.milo.opcua.sdk.server.util.SubscriptionModel;
import org.eclipse.milo.opcua.stack.core.types.builtin.LocalizedText;

/**
 * A namespace of ours whose variables are sampled for subscriptions by Milo's
 * {@link SubscriptionModel}: the model's lifecycle, the four monitored-item hooks delegated to
 * it, a start-up task that builds the nodes, and a folder helper.
 */
abstract class SampledNamespace extends ManagedNamespaceWithLifecycle {
  private final SubscriptionModel subscriptionModel;

  SampledNamespace(OpcUaServer server, String namespaceUri) {
    super(server, namespaceUri);
    this.subscriptionModel = new SubscriptionModel(server, this);
    getLifecycleManager().addLifecycle(subscriptionModel);
    getLifecycleManager().addStartupTask(this::createNodes);
  }

  /** Builds the address space (runs at namespace start-up). */
  protected abstract void createNodes();

  /** A folder node added to this namespace (not yet referenced from a parent). */
  protected UaFolderNode folder(String nodeIdentifier, String browseName, String description) {
    UaFolderNode f = new UaFolderNode(
        getNodeContext(), newNodeId(nodeIdentifier), newQualifiedName(browseName), LocalizedText.english(browseName));
    if (description != null) {
      f.setDescription(LocalizedText.english(description));
    }
    getNodeManager().addNode(f);
    return f;
  }

  @Override
  public void onDataItemsCreated(List<DataItem> dataItems) {
    subscriptionModel.onDataItemsCreated(dataItems);
  }

  @Override
  public void onDataItemsModified(List<DataItem> dataItems) {
    subscriptionModel.onDataItemsModified(dataItems);
  }

  @Override
  public void onDataItemsDeleted(List<DataItem> dataItems) {
    subscriptionModel.onDataItemsDeleted(dataItems);
  }

  @Override
  public void onMonitoringModeChanged(List<MonitoredItem> monitoredItems) {
    subscriptionModel.onMonitoringModeChanged(monitoredItems);
  }
}
