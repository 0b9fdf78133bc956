package org.plateward.opcua;

/**
 * The plant endpoint could not bind its TCP port because something else holds it. The CLI maps
 * this to exit code 2.
 */
public final class EndpointPortInUseException extends RuntimeException {
  private final String host;
  private final int port;

  public EndpointPortInUseException(String host, int port, Throwable cause) {
    super(
        "OPC UA endpoint: port "
            + port
            + " on "
            + host
            + " is already in use; stop the program holding it or choose another with --port",
        cause);
    this.host = host;
    this.port = port;
  }

  public String host() {
    return host;
  }

  public int port() {
    return port;
  }
}
