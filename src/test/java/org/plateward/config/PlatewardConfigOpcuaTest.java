package org.plateward.config;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.signals.Signal;

/** The optional {@code [opcua]} section as part of the whole configuration. */
class PlatewardConfigOpcuaTest {
  @Test
  void withoutTheSectionThereIsNoPlantToReach() throws Exception {
    assertThat(PlatewardConfig.load(ConfigFixtures.DEMO).opcua()).isNull();
  }

  @Test
  void theSectionIsReadWithTheUnit(@TempDir Path dir) throws Exception {
    Path f = dir.resolve("site.toml");
    Files.writeString(f, Files.readString(ConfigFixtures.DEMO) + "\n"
        + Files.readString(Path.of("config", "opcua-demo.toml")));
    PlatewardConfig cfg = PlatewardConfig.load(f);
    assertThat(cfg.unit().name()).isEqualTo("TM-PR1");
    assertThat(cfg.opcua().endpointUrl()).isEqualTo("opc.tcp://127.0.0.1:4841/plateward/plant");
    assertThat(cfg.opcua().tags()).hasSize(Signal.COUNT);
  }

  @Test
  void itsProblemsAreReportedWithTheOthers(@TempDir Path dir) throws Exception {
    Path f = dir.resolve("half.toml");
    Files.writeString(f, Files.readString(ConfigFixtures.DEMO).replace("cells = 80", "cells = 0")
        + "\n[opcua]\nendpoint = \"opc.tcp://localhost:4840\"\n");
    var e = catchThrowableOfType(InvalidConfigException.class, () -> PlatewardConfig.load(f));
    int header = ConfigFixtures.lineOf(f, "^\\[opcua\\]");
    assertThat(e.errors()).extracting(ConfigError::format)
        .contains(f + ":" + header + ": opcua.security_policy: missing; add it to [opcua]")
        .anyMatch(s -> s.contains("model.cells"));
  }
}
