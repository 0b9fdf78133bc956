package org.plateward.opcua;

/**
 * The connection to the plant's OPC UA server could not be set up. The message is meant for the
 * operator: what went wrong and what to do, with no stack trace needed.
 */
public final class PlantConnectionException extends Exception {
  public PlantConnectionException(String message) {
    super(message);
  }

  public PlantConnectionException(String message, Throwable cause) {
    super(message, cause);
  }
}
