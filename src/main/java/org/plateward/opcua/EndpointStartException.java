package org.plateward.opcua;

/** The plant endpoint failed to start for a reason other than a port in use. */
public final class EndpointStartException extends RuntimeException {
  public EndpointStartException(String message, Throwable cause) {
    super(message, cause);
  }
}
