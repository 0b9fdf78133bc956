package org.plateward.fleet;

import java.lang.reflect.Array;
import java.lang.reflect.RecordComponent;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import org.plateward.estimation.FilterSettings;
import org.plateward.reactor.DemoUnitFixture;
import org.plateward.reactor.UnitSpec;
import org.plateward.softsensor.Estimate;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.SoftSensorSettings;

/** Short cuts of the committed recordings and an exact fingerprint of estimates. */
final class FleetFixtures {
  static final List<String> RECORDINGS =
      List.of("feed-drop", "fuel-surge", "analyzer-outage", "catalyst-ageing");

  private FleetFixtures() {}

  /** The demo unit on the 30-cell uniform grid. */
  static UnitSpec unit30() {
    return DemoUnitFixture.spec(30);
  }

  static ReactorSoftSensor sensor(UnitSpec unit) {
    return new ReactorSoftSensor(unit, SoftSensorSettings.defaults(), FilterSettings.defaults());
  }

  /**
   * A replay file holding the header of {@code recording} and its data rows {@code from} to
   * {@code from + rows - 1} (a later start gives another operating history).
   */
  static Path slice(Path dir, String recording, int from, int rows, String name) throws Exception {
    List<String> lines = Files.readAllLines(Path.of("replay-data", recording + ".csv"));
    List<String> out = new ArrayList<>();
    int data = 0;
    for (String l : lines) {
      boolean isData = !l.startsWith("#") && !l.startsWith("timestamp");
      if (!isData) {
        out.add(l);
        continue;
      }
      if (data >= from && data < from + rows) {
        out.add(l);
      }
      if (++data >= from + rows) {
        break;
      }
    }
    Path p = dir.resolve(name + ".csv");
    Files.write(p, out);
    return p;
  }

  /**
   * Folds every component of an estimate, bit for bit (doubles by their raw IEEE 754 bits,
   * arrays element by element, texts as UTF-8, maps in order), into a running SHA-256.
   */
  static final class Fingerprint {
    private final MessageDigest md;
    private long count;

    Fingerprint() {
      try {
        md = MessageDigest.getInstance("SHA-256");
      } catch (Exception e) {
        throw new IllegalStateException(e);
      }
    }

    void add(Estimate e) {
      count++;
      try {
        for (RecordComponent c : Estimate.class.getRecordComponents()) {
          fold(c.getAccessor().invoke(e));
        }
      } catch (ReflectiveOperationException ex) {
        throw new IllegalStateException(ex);
      }
    }

    private void fold(Object v) {
      ByteBuffer b = ByteBuffer.allocate(8);
      if (v == null) {
        md.update((byte) 0);
      } else if (v instanceof Double d) {
        md.update(b.putLong(Double.doubleToRawLongBits(d)).array());
      } else if (v instanceof Integer i) {
        md.update(b.putLong(i).array());
      } else if (v instanceof Long l) {
        md.update(b.putLong(l).array());
      } else if (v.getClass().isArray()) {
        for (int i = 0; i < Array.getLength(v); i++) {
          fold(Array.get(v, i));
        }
        md.update((byte) 1);
      } else if (v instanceof Map<?, ?> m) {
        for (Map.Entry<?, ?> en : m.entrySet()) {
          fold(en.getKey());
          fold(en.getValue());
        }
      } else {
        md.update(v.toString().getBytes(StandardCharsets.UTF_8));
        md.update((byte) 2);
      }
    }

    long count() {
      return count;
    }

    String hex() {
      try {
        return count + ":" + HexFormat.of().formatHex(((MessageDigest) md.clone()).digest());
      } catch (CloneNotSupportedException e) {
        throw new IllegalStateException(e);
      }
    }
  }
}
