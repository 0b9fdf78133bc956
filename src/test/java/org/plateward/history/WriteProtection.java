package org.plateward.history;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;

/**
 * Makes a file or folder unwritable for the test and undoes it. Permission bits do not stop
 * root, so when they have no effect the Linux immutable attribute ({@code chattr +i}, which
 * binds root too) is used instead; when neither works the test is skipped with the reason.
 */
public final class WriteProtection implements AutoCloseable {
  private final Path path;
  private final boolean immutable;
  private final String originalPerms;

  private WriteProtection(Path path, boolean immutable, String originalPerms) {
    this.path = path;
    this.immutable = immutable;
    this.originalPerms = originalPerms;
  }

  public static WriteProtection of(Path path) throws IOException, InterruptedException {
    String perms = PosixFilePermissions.toString(Files.getPosixFilePermissions(path));
    Files.setPosixFilePermissions(path, PosixFilePermissions.fromString(
        Files.isDirectory(path) ? "r-xr-xr-x" : "r--r--r--"));
    if (!writable(path)) {
      return new WriteProtection(path, false, perms);
    }
    Files.setPosixFilePermissions(path, PosixFilePermissions.fromString(perms));
    if (run("chattr", "+i", path.toString()) && !writable(path)) {
      return new WriteProtection(path, true, perms);
    }
    run("chattr", "-i", path.toString());
    Assumptions.abort("cannot make " + path + " unwritable: permission bits do not bind this"
        + " user and chattr +i is not available");
    return null;
  }

  private static boolean writable(Path p) {
    try {
      if (Files.isDirectory(p)) {
        Path probe = p.resolve(".write-probe");
        Files.writeString(probe, "x");
        Files.delete(probe);
      } else {
        Files.write(p, new byte[0], StandardOpenOption.APPEND);
      }
      return true;
    } catch (IOException e) {
      return false;
    }
  }

  private static boolean run(String... cmd) throws InterruptedException {
    try {
      Process p = new ProcessBuilder(cmd).redirectErrorStream(true)
          .redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
      return p.waitFor(10, TimeUnit.SECONDS) && p.exitValue() == 0;
    } catch (IOException e) {
      return false;
    }
  }

  @Override
  public void close() throws IOException {
    if (immutable) {
      try {
        run("chattr", "-i", path.toString());
      } catch (InterruptedException e) {
        Thread.currentThread().interrupt();
      }
    }
    Files.setPosixFilePermissions(path, PosixFilePermissions.fromString(originalPerms));
  }
}
