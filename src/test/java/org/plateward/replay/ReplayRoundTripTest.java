package org.plateward.replay;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plateward.signals.Frame;
import org.plateward.signals.Quality;
import org.plateward.signals.Signal;
import org.plateward.signals.StatusName;

/**
 * Frames written and read back agree within the writer's precision: 9 significant digits of the
 * edge-unit value, i.e. |edge' - edge| <= 5e-9 |edge|, which in SI is that times the unit's
 * scale factor.
 */
class ReplayRoundTripTest {
  @TempDir Path dir;

  private static final String ACTIVITY = "truth_reforming_activity";

  record Written(Frame frame, Map<String, Double> truth) {}

  static List<Written> frames(long seed, int n) {
    Random rnd = new Random(seed);
    List<Written> out = new ArrayList<>();
    Instant t = Instant.parse("2026-03-04T05:06:07Z");
    for (int k = 0; k < n; k++) {
      double[] si = new double[Signal.COUNT];
      Quality[] q = new Quality[Signal.COUNT];
      for (Signal s : Signal.values()) {
        double edge = switch (s.unit()) {
          case DEG_C -> 20 + 900 * rnd.nextDouble();
          case KPA_ABS -> 100 + 300 * rnd.nextDouble();
          case MOL_PCT_DRY -> 80 * rnd.nextDouble();
          default -> 0.5 + 20 * rnd.nextDouble();
        };
        double u = rnd.nextDouble();
        q[s.ordinal()] = u < 0.7 ? Quality.GOOD : u < 0.8 ? Quality.UNCERTAIN : u < 0.9 ? Quality.BAD : Quality.MISSING;
        si[s.ordinal()] = q[s.ordinal()] == Quality.MISSING ? Double.NaN : s.unit().toSi(edge);
      }
      Map<String, Double> truth = new HashMap<>();
      truth.put(ReplayColumns.TRUTH_PEAK_PLATE_TEMP_C, 900 + 100 * rnd.nextDouble());
      truth.put(ReplayColumns.TRUTH_PEAK_POSITION_M, 0.3 * rnd.nextDouble());
      truth.put(ReplayColumns.TRUTH_BUFFER_MELT_FRACTION, rnd.nextDouble());
      truth.put(ReplayColumns.TRUTH_MAX_CELL_MELT_FRACTION, rnd.nextDouble());
      if (rnd.nextBoolean()) {
        truth.put(ReplayColumns.TRUTH_TIME_TO_EXHAUST_S, 600 * rnd.nextDouble());
      }
      truth.put(ACTIVITY, 1 - 1e-6 * k);
      out.add(new Written(new Frame(t, si, q), truth));
      t = t.plusMillis(250 + rnd.nextInt(1000)); // fractional seconds too
    }
    return out;
  }

  static ReplayLayout layout() {
    Map<String, String> meta = new LinkedHashMap<>();
    meta.put("scenario", "round-trip");
    meta.put("seed", "7");
    meta.put("model", "0.1.0");
    return ReplayLayout.simulated(meta, List.of(ACTIVITY));
  }

  static void write(Path file, List<Written> frames) throws IOException {
    try (ReplayWriter w = ReplayWriter.create(file, layout())) {
      for (Written f : frames) {
        w.write(f.frame(), Map.of(), f.truth());
      }
    }
  }

  @Test
  void framesStatusesAndTruthSurviveARoundTrip() throws IOException {
    List<Written> frames = frames(11, 3_000);
    Path file = dir.resolve("rt.csv");
    write(file, frames);

    boolean[] hadValue = new boolean[Signal.COUNT];
    try (ReplayReader r = ReplayReader.open(file)) {
      assertThat(r.header().metadata()).containsEntry("scenario", "round-trip").containsEntry("seed", "7");
      assertThat(r.header().columns()).isEqualTo(layout().columnNames());
      for (Written w : frames) {
        assertThat(r.hasNext()).isTrue();
        ReplayRecord rec = r.next();
        Frame in = w.frame();
        Frame out = rec.frame();
        assertThat(out.time()).isEqualTo(in.time());
        for (Signal s : Signal.values()) {
          Quality q = in.quality(s);
          assertThat(out.quality(s)).as("%s line %d", s.id(), rec.line()).isEqualTo(q);
          if (q == Quality.MISSING) {
            assertThat(out.valueSi(s)).isNaN();
            // OPC UA: Bad_WaitingForInitialData before the first value, then Bad_NoCommunication
            assertThat(rec.status().get(s)).isEqualTo(hadValue[s.ordinal()]
                ? StatusName.BAD_NO_COMMUNICATION : StatusName.BAD_WAITING_FOR_INITIAL_DATA);
          } else {
            double edge = s.unit().fromSi(in.valueSi(s));
            double scale = s.unit().toSi(1.0) - s.unit().toSi(0.0);
            double tol = 5e-9 * Math.abs(edge) * scale + 4 * Math.ulp(in.valueSi(s));
            assertThat(Math.abs(out.valueSi(s) - in.valueSi(s))).as(s.id()).isLessThanOrEqualTo(tol);
            assertThat(rec.status().get(s).quality()).isEqualTo(q);
            hadValue[s.ordinal()] = true;
          }
        }
        for (String c : layout().truthColumns()) {
          Double v = w.truth().get(c);
          if (v == null) {
            assertThat(rec.truth(c)).isNaN();
          } else {
            assertThat(Math.abs(rec.truth(c) - v)).as(c).isLessThanOrEqualTo(5e-9 * Math.abs(v));
          }
        }
      }
      assertThat(r.hasNext()).isFalse();
      assertThat(r.partialRowCount()).isZero();
    }
  }

  @Test
  void explicitStatusNamesAreWrittenAsGiven() throws IOException {
    Path file = dir.resolve("status.csv");
    Written w = frames(3, 1).get(0);
    Map<Signal, StatusName> status = Map.of(Signal.REF_OUTLET_CO2, StatusName.UNCERTAIN_LAST_USABLE_VALUE);
    try (ReplayWriter out = ReplayWriter.create(file, layout())) {
      out.write(w.frame(), status, Map.of());
    }
    try (ReplayReader r = ReplayReader.open(file)) {
      assertThat(r.next().status().get(Signal.REF_OUTLET_CO2)).isEqualTo(StatusName.UNCERTAIN_LAST_USABLE_VALUE);
    }
  }

  @Test
  void sameFramesGiveByteIdenticalFiles() throws IOException {
    Path a = dir.resolve("a.csv");
    Path b = dir.resolve("b.csv");
    write(a, frames(5, 2_000));
    write(b, frames(5, 2_000));
    assertThat(Files.mismatch(a, b)).isEqualTo(-1L);
    String text = Files.readString(a);
    assertThat(text).startsWith(
        "# Plateward replay file, generated by the Plateward simulated plant (invented data)\n"
            + "# scenario=round-trip seed=7 model=0.1.0\n"
            + "timestamp,ref_gas_flow_nm3_h,status_ref_gas_flow_nm3_h,");
    assertThat(text.lines().skip(3).findFirst().orElseThrow()).startsWith("2026-03-04T05:06:07Z,");
  }

  @Test
  void subsetWithoutStatusColumnsWritesBadValuesAsEmpty() throws IOException {
    Path file = dir.resolve("subset.csv");
    var layout = new ReplayLayout(List.of(Signal.FUEL_FLOW, Signal.REF_OUTLET_TEMP), false, List.of(), List.of(), Map.of());
    double[] si = new double[Signal.COUNT];
    Quality[] q = new Quality[Signal.COUNT];
    java.util.Arrays.fill(q, Quality.GOOD);
    si[Signal.REF_OUTLET_TEMP.ordinal()] = 1123.15;
    q[Signal.FUEL_FLOW.ordinal()] = Quality.BAD;
    Instant t = Instant.parse("2026-03-04T00:00:00Z");
    try (ReplayWriter w = ReplayWriter.create(file, layout)) {
      w.write(new Frame(t, si, q));
      assertThatThrownBy(() -> w.write(new Frame(t, si, q))).isInstanceOf(IllegalArgumentException.class);
    }
    assertThat(Files.readAllLines(file)).containsExactly(
        "timestamp,fuel_flow_nm3_h,ref_outlet_temp_c", "2026-03-04T00:00:00Z,,850");
  }
}
