package org.plateward.opcua;

/**
 * Where and how the simulated plant serves its OPC UA endpoint.
 *
 * @param host bind address and advertised hostname; must be a loopback address, because the
 *     endpoint offers security policy None only
 * @param port TCP port, 1..65535, or 0 to let the operating system pick a free one
 * @param path endpoint path, starting with '/'
 * @param skid browse name of the skid object below Objects
 * @param namespaceUri URI of the plant namespace
 */
public record PlantEndpointConfig(
    String host, int port, String path, String skid, String namespaceUri) {
  /** Default TCP port: one above the registered OPC UA discovery port 4840. */
  public static final int DEFAULT_PORT = 4841;

  public static final String DEFAULT_HOST = "127.0.0.1";
  public static final String DEFAULT_PATH = "/plateward/plant";
  public static final String DEFAULT_NAMESPACE_URI = "urn:plateward:sim-plant";

  public PlantEndpointConfig {
    if (port < 0 || port > 65535) {
      throw new IllegalArgumentException("port must be 0..65535: " + port);
    }
    if (path == null || !path.startsWith("/")) {
      throw new IllegalArgumentException("endpoint path must start with '/': " + path);
    }
    new PlantAddressLayout(skid); // validates the skid name
    if (namespaceUri == null || namespaceUri.isBlank()) {
      throw new IllegalArgumentException("namespace URI must not be empty");
    }
  }

  /** Defaults: 127.0.0.1:4841/plateward/plant, skid {@value PlantAddressLayout#DEFAULT_SKID}. */
  public static PlantEndpointConfig defaults() {
    return new PlantEndpointConfig(
        DEFAULT_HOST, DEFAULT_PORT, DEFAULT_PATH, PlantAddressLayout.DEFAULT_SKID, DEFAULT_NAMESPACE_URI);
  }

  public PlantEndpointConfig withPort(int newPort) {
    return new PlantEndpointConfig(host, newPort, path, skid, namespaceUri);
  }

  public PlantEndpointConfig withHost(String newHost) {
    return new PlantEndpointConfig(newHost, port, path, skid, namespaceUri);
  }
}
