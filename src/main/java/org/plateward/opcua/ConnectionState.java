package org.plateward.opcua;

/** Where the link to the plant's OPC UA server stands. */
public enum ConnectionState {
  /** First connection attempt in progress. */
  CONNECTING,
  /** Session active; subscriptions deliver data. */
  CONNECTED,
  /** Session lost; the client is re-establishing it (with backoff) and will restore subscriptions. */
  RECONNECTING,
  /** Closed by us; no more data. */
  CLOSED
}
