package org.plateward.config;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.opcua.PlantAddressLayout;
import org.plateward.signals.EdgeUnit;
import org.plateward.signals.Signal;

class OpcuaSettingsTest {
  @Test
  void theDemoSectionMapsEverySignalToThePlantLayout() throws Exception {
    OpcuaSettings s = OpcuaSettings.load(Path.of("config", "opcua-demo.toml"));
    assertThat(s.tags()).hasSize(Signal.COUNT);
    var layout = new PlantAddressLayout(PlantAddressLayout.DEFAULT_SKID);
    for (Signal sig : Signal.values()) {
      OpcuaSettings.Tag t = s.tags().get(sig);
      assertThat(t.nodeId()).isEqualTo("nsu=urn:plateward:sim-plant;s=" + layout.nodeIdentifier(sig));
      assertThat(t.unit()).isEqualTo(sig.unit());
    }
    assertThat(s.framePeriodS()).isEqualTo(1.0);
    assertThat(s.publishingIntervalS()).isEqualTo(0.5); // "500 ms"
    assertThat(s.auth().kind()).isEqualTo(OpcuaSettings.Authentication.Kind.ANONYMOUS);
  }

  @Test
  void mistakesAreReportedWithFileLineAndField(@TempDir Path dir) throws Exception {
    Path f = dir.resolve("bad.toml");
    Files.writeString(f, String.join("\n",
        "[opcua]",
        "endpoint = \"opc.tcp://127.0.0.1:4841/x\"",
        "security_policy = \"Basic256Sha265\"",
        "security_mode = \"SignAndEncrypt\"",
        "frame_period = \"1 fortnight\"",
        "",
        "[opcua.auth]",
        "kind = \"username\"",
        "username = \"op\"",
        "password = \"hunter2\"",
        "",
        "[opcua.tags.ref_inlet_temp_c]",
        "node = \"s=Skid/T\"",
        "unit = \"kPa(abs)\"",
        "sampling_interval = \"1 s\"",
        "",
        "[opcua.tags.ref_inlet_tmp_c]",
        "node = \"ns=2;s=Skid/T\"",
        "unit = \"degC\"",
        "sampling_interval = \"1 s\"",
        ""));
    assertThatThrownBy(() -> OpcuaSettings.load(f))
        .isInstanceOf(InvalidConfigException.class)
        .hasMessageContaining(f + ":3: opcua.security_policy: unknown value \"Basic256Sha265\"; did you mean \"Basic256Sha256\"?")
        .hasMessageContaining(f + ":5: opcua.frame_period: must be a duration")
        .hasMessageContaining(f + ":10: opcua.auth.password: a password never goes in the configuration")
        .hasMessageContaining("opcua.auth.kind: a username identity needs password_env")
        .hasMessageContaining(f + ":13: opcua.tags.ref_inlet_temp_c.node: has no namespace")
        .hasMessageContaining(f + ":14: opcua.tags.ref_inlet_temp_c.unit: \"kPa(abs)\" does not measure")
        .hasMessageContaining(f + ":17: opcua.tags.ref_inlet_tmp_c: no signal \"ref_inlet_tmp_c\"; did you mean \"ref_inlet_temp_c\"?");
  }

  @Test
  void durationsConvertToSeconds() {
    assertThat(OpcuaSettings.parseDurationS("500 ms")).isEqualTo(0.5);
    assertThat(OpcuaSettings.parseDurationS("2 min")).isEqualTo(120.0);
    assertThat(OpcuaSettings.parseDurationS("1.5 s")).isEqualTo(1.5);
    assertThat(OpcuaSettings.parseDurationS("1.5")).isNaN();
    assertThat(EdgeUnit.DEG_C.label()).isEqualTo("degC");
  }
}
