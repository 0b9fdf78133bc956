package org.plateward.opcua;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.eclipse.milo.opcua.sdk.server.identity.UsernameIdentityValidator;
import org.eclipse.milo.opcua.stack.core.security.CertificateValidator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.config.OpcuaSettings;

/** Certificate trust and user identity against test servers on loopback. */
@Timeout(40)
class PlantConnectionSecurityTest {
  /** Test servers accept any client certificate: the client's own check is under test here. */
  private static final CertificateValidator ACCEPT_ANY_CLIENT = (chain, uri, hosts) -> {};

  @Test
  void anUntrustedServerCertificateIsRefusedWithWhereToMoveIt(@TempDir Path pki) throws Exception {
    try (PlantEndpoint secure =
        PlantEndpoint.start(
            PlantEndpointConfig.defaults().withPort(0),
            spec -> spec.withSecurity(true, null, ACCEPT_ANY_CLIENT))) {
      OpcuaSettings settings =
          TestSettings.plant(secure.endpointUrl(), pki, "Basic256Sha256", "SignAndEncrypt",
              OpcuaSettings.Authentication.anonymous(), Map.of());
      assertThatThrownBy(() -> PlantConnection.open(settings, f -> {}))
          .isInstanceOf(PlantConnectionException.class)
          .hasMessageContaining("is not trusted")
          .hasMessageContaining(pki.resolve("rejected").toString())
          .hasMessageContaining(pki.resolve("trusted").resolve("certs").toString());

      // the certificate waits in rejected/; following the message makes the next connect work
      List<Path> rejected;
      try (Stream<Path> s = Files.list(pki.resolve("rejected"))) {
        rejected = s.filter(Files::isRegularFile).toList();
      }
      assertThat(rejected).hasSize(1);
      Path moved = pki.resolve("trusted").resolve("certs").resolve(rejected.get(0).getFileName());
      Files.move(rejected.get(0), moved);
      try (PlantConnection c = PlantConnection.open(settings, f -> {})) {
        assertThat(c.state()).isEqualTo(ConnectionState.CONNECTED);
      }
    }
  }

  @Test
  void aWrongPasswordGivesAClearMessage(@TempDir Path dir) throws Exception {
    var validator =
        new UsernameIdentityValidator(
            c -> c.getUsername().equals("operator") && c.getPassword().equals("right-one"));
    try (PlantEndpoint plant =
        PlantEndpoint.start(
            PlantEndpointConfig.defaults().withPort(0),
            spec -> spec.withSecurity(false, validator, null))) {
      Path wrong = dir.resolve("wrong-password");
      Files.writeString(wrong, "not-the-one\n", StandardCharsets.UTF_8);
      var auth = new OpcuaSettings.Authentication(
          OpcuaSettings.Authentication.Kind.USERNAME, "operator", null, wrong);
      OpcuaSettings settings =
          TestSettings.plant(plant.endpointUrl(), dir.resolve("pki"), "None", "None", auth, Map.of());
      assertThatThrownBy(() -> PlantConnection.open(settings, f -> {}))
          .isInstanceOf(PlantConnectionException.class)
          .hasMessageContaining("refused the identity username operator")
          .hasMessageContaining("file " + wrong);

      Path right = dir.resolve("right-password");
      Files.writeString(right, "right-one\n", StandardCharsets.UTF_8);
      var good = new OpcuaSettings.Authentication(
          OpcuaSettings.Authentication.Kind.USERNAME, "operator", null, right);
      try (PlantConnection c = PlantConnection.open(
          TestSettings.plant(plant.endpointUrl(), dir.resolve("pki"), "None", "None", good, Map.of()),
          f -> {})) {
        assertThat(c.state()).isEqualTo(ConnectionState.CONNECTED);
      }
    }
  }
}
