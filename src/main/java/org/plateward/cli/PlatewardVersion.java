package org.plateward.cli;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;
import picocli.CommandLine;

/** The version for {@code --version}, from the Maven metadata packed into the jar. */
final class PlatewardVersion implements CommandLine.IVersionProvider {
  private static final String POM_PROPERTIES =
      "/META-INF/maven/org.plateward/plateward/pom.properties";

  @Override
  public String[] getVersion() {
    return new String[] {"plateward " + version(), "Java " + System.getProperty("java.version")};
  }

  /** The project version, or "development build" when running from the class folders. */
  static String version() {
    try (InputStream in = PlatewardVersion.class.getResourceAsStream(POM_PROPERTIES)) {
      if (in != null) {
        Properties p = new Properties();
        p.load(in);
        return p.getProperty("version", "unknown");
      }
    } catch (IOException e) {
      // fall through: no packaged metadata
    }
    return "development build";
  }
}
