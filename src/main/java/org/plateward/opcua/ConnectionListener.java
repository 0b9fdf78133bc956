package org.plateward.opcua;

/**
 * Hears about the connection to the plant. Called on Plateward's own connection thread, never on
 * a Milo thread; keep handlers short.
 */
public interface ConnectionListener {
  /** The state changed; {@code reason} says why in plain words. */
  default void onStateChanged(ConnectionState from, ConnectionState to, String reason) {}

  /** A data gap ended: the session is back and subscriptions are restored. */
  default void onGap(DataGap gap) {}
}
