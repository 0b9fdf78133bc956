package org.plateward.opcua;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicInteger;
import org.eclipse.milo.opcua.sdk.server.OpcUaServer;
import org.eclipse.milo.opcua.sdk.server.servicesets.AttributeServiceSet;
import org.eclipse.milo.opcua.sdk.server.servicesets.MethodServiceSet;
import org.eclipse.milo.opcua.sdk.server.servicesets.NodeManagementServiceSet;
import org.eclipse.milo.opcua.sdk.server.servicesets.impl.DefaultAttributeServiceSet;
import org.eclipse.milo.opcua.sdk.server.servicesets.impl.DefaultMethodServiceSet;
import org.eclipse.milo.opcua.sdk.server.servicesets.impl.DefaultNodeManagementServiceSet;
import org.eclipse.milo.opcua.stack.core.UaException;
import org.eclipse.milo.opcua.stack.core.types.structured.*;
import org.eclipse.milo.opcua.stack.transport.server.ServiceRequestContext;

/**
 * Counts the attribute, method and node-management service requests a Milo server receives, by
 * wrapping Milo's default service sets (installed with {@code OpcUaServer.addServiceSet} before
 * start-up) and delegating every call to them.
 */
final class ServiceTally {
  private final Map<String, AtomicInteger> counts = new ConcurrentHashMap<>();

  int count(String service) {
    AtomicInteger c = counts.get(service);
    return c == null ? 0 : c.get();
  }

  /** Writes, calls and node-management requests together. */
  int mutating() {
    return count("Write") + count("HistoryUpdate") + count("Call") + count("AddNodes")
        + count("DeleteNodes") + count("AddReferences") + count("DeleteReferences");
  }

  private void hit(String service) {
    counts.computeIfAbsent(service, k -> new AtomicInteger()).incrementAndGet();
  }

  /** Installs the counting wrappers on every endpoint path of {@code server}. */
  void install(OpcUaServer server, String path) {
    var attributes = new DefaultAttributeServiceSet(server);
    var methods = new DefaultMethodServiceSet(server);
    var nodes = new DefaultNodeManagementServiceSet(server);
    server.addServiceSet(path, new AttributeServiceSet() {
      @Override
      public ReadResponse onRead(ServiceRequestContext c, ReadRequest r) throws UaException {
        hit("Read");
        return attributes.onRead(c, r);
      }

      @Override
      public HistoryReadResponse onHistoryRead(ServiceRequestContext c, HistoryReadRequest r) throws UaException {
        hit("HistoryRead");
        return attributes.onHistoryRead(c, r);
      }

      @Override
      public WriteResponse onWrite(ServiceRequestContext c, WriteRequest r) throws UaException {
        hit("Write");
        return attributes.onWrite(c, r);
      }

      @Override
      public HistoryUpdateResponse onHistoryUpdate(ServiceRequestContext c, HistoryUpdateRequest r) throws UaException {
        hit("HistoryUpdate");
        return attributes.onHistoryUpdate(c, r);
      }
    });
    server.addServiceSet(path, (MethodServiceSet) (c, r) -> {
      hit("Call");
      return methods.onCall(c, r);
    });
    server.addServiceSet(path, new NodeManagementServiceSet() {
      @Override
      public AddNodesResponse onAddNodes(ServiceRequestContext c, AddNodesRequest r) throws UaException {
        hit("AddNodes");
        return nodes.onAddNodes(c, r);
      }

      @Override
      public DeleteNodesResponse onDeleteNodes(ServiceRequestContext c, DeleteNodesRequest r) throws UaException {
        hit("DeleteNodes");
        return nodes.onDeleteNodes(c, r);
      }

      @Override
      public AddReferencesResponse onAddReferences(ServiceRequestContext c, AddReferencesRequest r) throws UaException {
        hit("AddReferences");
        return nodes.onAddReferences(c, r);
      }

      @Override
      public DeleteReferencesResponse onDeleteReferences(ServiceRequestContext c, DeleteReferencesRequest r) throws UaException {
        hit("DeleteReferences");
        return nodes.onDeleteReferences(c, r);
      }
    });
  }
}
