package org.plateward.opcua;

import java.nio.file.Path;
import java.util.EnumMap;
import java.util.Map;
import org.plateward.config.OpcuaSettings;
import org.plateward.signals.Signal;

/** Fast-clock client settings for loopback tests. */
final class TestSettings {
  static final double SAMPLING_S = 0.05;
  static final double FRAME_S = 0.2;

  private TestSettings() {}

  /** Every signal mapped as PlantAddressLayout lays it out, with a 200 ms frame clock. */
  static OpcuaSettings plant(String url, Path pki) {
    return plant(url, pki, "None", "None", OpcuaSettings.Authentication.anonymous(), Map.of());
  }

  static OpcuaSettings plant(
      String url, Path pki, String policy, String mode, OpcuaSettings.Authentication auth,
      Map<Signal, String> nodeOverrides) {
    var layout = new PlantAddressLayout(PlantAddressLayout.DEFAULT_SKID);
    Map<Signal, OpcuaSettings.Tag> tags = new EnumMap<>(Signal.class);
    for (Signal s : Signal.values()) {
      String node = nodeOverrides.getOrDefault(
          s, "nsu=" + PlantEndpointConfig.DEFAULT_NAMESPACE_URI + ";s=" + layout.nodeIdentifier(s));
      tags.put(s, new OpcuaSettings.Tag(s, node, s.unit(), SAMPLING_S, 0.0));
    }
    return new OpcuaSettings(url, policy, mode, false, auth, "urn:plateward:monitor:test", pki,
        PlantEndpointConfig.DEFAULT_NAMESPACE_URI, SAMPLING_S, 5.0, FRAME_S, 0.1, 3.0, 2.0, tags);
  }
}
