package org.plateward.live;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;

/**
 * Makes a folder unwritable for a test and undoes it, as the history tests do: permission bits,
 * and where they do not bind (root) the Linux immutable attribute ({@code chattr +i}); when
 * neither works the test is skipped with the reason.
 */
final class Unwritable implements AutoCloseable {
  private final Path dir;
  private final boolean immutable;

  private Unwritable(Path dir, boolean immutable) {
    this.dir = dir;
    this.immutable = immutable;
  }

  static Unwritable folder(Path dir) throws IOException, InterruptedException {
    Files.setPosixFilePermissions(dir, PosixFilePermissions.fromString("r-xr-xr-x"));
    if (!writable(dir)) {
      return new Unwritable(dir, false);
    }
    Files.setPosixFilePermissions(dir, PosixFilePermissions.fromString("rwxr-xr-x"));
    if (run("chattr", "+i", dir.toString()) && !writable(dir)) {
      return new Unwritable(dir, true);
    }
    run("chattr", "-i", dir.toString());
    Assumptions.abort("cannot make " + dir + " unwritable (permission bits do not bind, no chattr)");
    return null;
  }

  private static boolean writable(Path dir) {
    try {
      Path probe = dir.resolve(".probe");
      Files.writeString(probe, "x");
      Files.delete(probe);
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
        run("chattr", "-i", dir.toString());
      } catch (InterruptedException e) {
        Thread.currentThread().interrupt();
      }
    }
    Files.setPosixFilePermissions(dir, PosixFilePermissions.fromString("rwxr-xr-x"));
  }
}
