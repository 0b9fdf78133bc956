package org.plateward.history;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Duration;
import java.time.Instant;
import java.util.Arrays;
import java.util.Map;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;

/** Test data for history tests: synthetic frames and estimates (no physics), plain SQL access. */
final class HistoryFixtures {
  static final Instant T0 = Instant.parse("2026-03-02T06:00:00Z");

  private HistoryFixtures() {}

  /** A frame whose values encode time and signal, so a mismatch shows which is wrong. */
  static Frame frame(Instant t) {
    double[] v = new double[Signal.COUNT];
    Quality[] q = new Quality[Signal.COUNT];
    double s = (t.toEpochMilli() - T0.toEpochMilli()) / 1000.0;
    for (int i = 0; i < Signal.COUNT; i++) {
      v[i] = 300.0 + 10.0 * i + 0.001 * s + Math.sin(0.1 * s + i);
      q[i] = Quality.GOOD;
    }
    return new Frame(t, v, q);
  }

  /** A frame with one signal MISSING, one BAD with NaN and one UNCERTAIN. */
  static Frame mixedFrame(Instant t) {
    Frame f = frame(t);
    double[] v = f.valuesSi();
    Quality[] q = f.quality();
    v[Signal.REF_OUTLET_CH4.ordinal()] = Double.NaN;
    q[Signal.REF_OUTLET_CH4.ordinal()] = Quality.MISSING;
    v[Signal.FUEL_FLOW.ordinal()] = Double.NaN;
    q[Signal.FUEL_FLOW.ordinal()] = Quality.BAD;
    q[Signal.AIR_FLOW.ordinal()] = Quality.UNCERTAIN;
    return new Frame(t, v, q);
  }

  static EstimateRow estimate(Instant t, int cells) {
    double s = (t.toEpochMilli() - T0.toEpochMilli()) / 1000.0;
    double[] temp = new double[cells];
    double[] melt = new double[cells];
    for (int j = 0; j < cells; j++) {
      temp[j] = 1000.0 + 300.0 * Math.sin(Math.PI * (j + 0.5) / cells) + 1e-3 * s;
      melt[j] = Math.max(0.0, Math.min(1.0, 0.5 + 0.4 * Math.cos(0.37 * j + 1e-3 * s)));
    }
    return new EstimateRow(t, 1320.123456789 + 1e-3 * s, 4.25, 0.3125, 0.4375, 0.015625, 0.9,
        Double.NaN, Double.NaN, 1.7, "tracking", null,
        Map.of("ua_scale", 1.0625, "activity", 0.93), temp, melt);
  }

  static HistorySettings settings(Path file) {
    return HistorySettings.at(file).withRetryInterval(Duration.ofMillis(200));
  }

  static Connection plainConnection(Path file) throws SQLException {
    return DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath());
  }

  static long count(Path file, String sql) throws SQLException {
    try (Connection c = plainConnection(file);
        Statement s = c.createStatement();
        ResultSet r = s.executeQuery(sql)) {
      r.next();
      return r.getLong(1);
    }
  }

  static String text(Path file, String sql) throws SQLException {
    try (Connection c = plainConnection(file);
        Statement s = c.createStatement();
        ResultSet r = s.executeQuery(sql)) {
      r.next();
      return r.getString(1);
    }
  }

  static boolean sameValues(Frame a, Frame b) {
    return a.time().equals(b.time()) && Arrays.equals(a.valuesSi(), b.valuesSi())
        && Arrays.equals(a.quality(), b.quality());
  }
}
