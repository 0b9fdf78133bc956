package org.plateward.history;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.util.Map;
import java.util.TreeMap;

/**
 * Column encodings of the estimates table.
 *
 * <ul>
 *   <li>A per-cell profile is a BLOB of IEEE 754 single-precision floats, little-endian, one
 *       per cell (4 bytes a cell). Single precision resolves 1e-4 K at 1000 K and 6e-8 in a
 *       melt fraction, far finer than the estimate's own uncertainty, and halves the largest
 *       part of a stored estimate.
 *   <li>The parameters are text {@code name=value;name=value} sorted by name, each value in
 *       {@link Double#toString} form, which reads back to the same double.
 * </ul>
 */
final class ProfileCodec {
  private ProfileCodec() {}

  static byte[] encodeProfile(double[] values) {
    ByteBuffer b = ByteBuffer.allocate(values.length * Float.BYTES).order(ByteOrder.LITTLE_ENDIAN);
    for (double v : values) {
      b.putFloat((float) v);
    }
    return b.array();
  }

  static double[] decodeProfile(byte[] blob) {
    if (blob == null) {
      return new double[0];
    }
    ByteBuffer b = ByteBuffer.wrap(blob).order(ByteOrder.LITTLE_ENDIAN);
    double[] out = new double[blob.length / Float.BYTES];
    for (int i = 0; i < out.length; i++) {
      out[i] = b.getFloat();
    }
    return out;
  }

  static String encodeParameters(Map<String, Double> parameters) {
    StringBuilder s = new StringBuilder();
    for (Map.Entry<String, Double> e : parameters.entrySet()) {
      if (s.length() > 0) {
        s.append(';');
      }
      s.append(e.getKey()).append('=').append(e.getValue().doubleValue());
    }
    return s.toString();
  }

  static Map<String, Double> decodeParameters(String text) {
    Map<String, Double> out = new TreeMap<>();
    if (text == null || text.isEmpty()) {
      return out;
    }
    for (String pair : text.split(";")) {
      int eq = pair.indexOf('=');
      out.put(pair.substring(0, eq), Double.parseDouble(pair.substring(eq + 1)));
    }
    return out;
  }
}
