package org.plateward.live;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.ServerSocket;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.Advisory;
import org.plateward.config.OpcuaSettings;
import org.plateward.config.PlatewardConfig;
import org.plateward.history.WriteProtection;
import org.plateward.config.ScenarioLoader;
import org.plateward.history.HistoryHealth;

/**
 * The live path when things are wrong: history cannot be kept, the configuration names no
 * plant, the plant cannot be reached; and {@code plateward demo} from the command line.
 */
@Timeout(60)
class LiveFaultTest {
  @TempDir Path dir;

  @Test
  @SuppressWarnings("try") // the protection acts by being open
  void aReadOnlyDataFolderLeavesMonitoringRunningAndTheStatusBlockSaysHistoryIsNotKept() throws Exception {
    PlatewardConfig cfg = PlatewardConfig.load(Path.of("config", "plateward.toml"));
    Path data = Files.createDirectory(dir.resolve("data"));
    try (WriteProtection u = WriteProtection.of(data);
        DemoSession s = DemoSession.start(cfg, ScenarioLoader.load(Path.of("config", "scenarios", "fuel-surge.toml")),
            OpcuaSettings.load(Path.of("config", "opcua-demo.toml")), data, 20.0, "test", line -> { })) {
      long end = System.currentTimeMillis() + 20_000;
      while (s.monitor().status().frames() < 60 && System.currentTimeMillis() < end) {
        Thread.sleep(50);
      }
      MonitorStatus st = s.monitor().status();
      assertThat(st.frames()).isGreaterThanOrEqualTo(60);
      assertThat(st.latest()).isNotNull();
      assertThat(st.history().state()).isEqualTo(HistoryHealth.State.NOT_KEEPING);
      String block = StatusBlock.render(st);
      assertThat(block).contains("history     NOT KEEPING").contains(data.resolve("plateward.db").toString())
          .contains("hidden peak");
      // and an advisory alarm says so (on-delay 30 s of plant time, config/plateward.toml)
      assertThat(st.alarms()).anySatisfy(a -> {
        assertThat(a.kind()).isEqualTo(org.plateward.alarms.AlarmKind.HISTORY_NOT_KEPT);
        assertThat(a.state()).isEqualTo(org.plateward.alarms.AlarmState.UNACKNOWLEDGED);
      });
      assertThat(block).contains("ALARM NOTICE").contains("history_not_kept");
      assertThat(Files.exists(data.resolve("plateward.db"))).isFalse();
    }
  }

  @Test
  void watchWithoutAnOpcuaSectionExitsTwoAndSaysSo() {
    Cli c = Cli.run("watch", "--headless", "-c", "config/plateward.toml");
    assertThat(c.exit()).isEqualTo(2);
    assertThat(c.err()).contains("config/plateward.toml has no [opcua] section").contains("plateward demo");
  }

  @Test
  void watchOfAnUnreachableEndpointSaysSoWithoutAStackTrace() throws Exception {
    int port;
    try (ServerSocket s = new ServerSocket(0)) {
      port = s.getLocalPort(); // free once closed: nothing listens there
    }
    String unit = Files.readString(Path.of("config", "plateward.toml"));
    String map = Files.readString(Path.of("config", "opcua-demo.toml"))
        .replace("opc.tcp://127.0.0.1:4841/", "opc.tcp://127.0.0.1:" + port + "/");
    Path cfg = dir.resolve("site.toml");
    Files.writeString(cfg, unit + "\n" + map + "\n[history]\npath = \""
        + dir.resolve("h.db").toString().replace("\\", "/") + "\"\n");
    Cli c = Cli.run("watch", "--headless", "--duration", "5 s", "--publish-port", "0", "-c", cfg.toString());
    assertThat(c.exit()).as(c.out() + c.err()).isEqualTo(1);
    assertThat(c.err()).contains("cannot reach OPC UA endpoint opc.tcp://127.0.0.1:" + port).doesNotContain("\tat ");
    assertThat(c.out()).contains(Advisory.SHORT);
  }

  @Test
  void demoFromTheCommandLineRunsForItsDurationAndFlushesHistory() throws Exception {
    Path data = dir.resolve("demo-data");
    Cli c = Cli.run("demo", "--duration", "6 s", "--speed", "20", "--refresh", "2", "--data-dir", data.toString());
    assertThat(c.exit()).as(c.err()).isZero();
    assertThat(c.out()).contains(Advisory.SHORT).contains("window open; close it to stop")
        .contains("serving opc.tcp://127.0.0.1:").contains("soft-sensor values: opc.tcp://127.0.0.1:")
        .contains("== TM-PR1").contains("(simulated plant time, 20 x real time)")
        .contains("stopping (duration reached)").contains("history flushed to " + data.resolve("plateward.db"));
    assertThat(Files.size(data.resolve("plateward.db"))).isPositive();
  }
}
