package org.plateward.bench;

import java.lang.reflect.RecordComponent;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.plateward.config.UnitConfigLoader;
import org.plateward.estimation.FilterSettings;
import org.plateward.replay.ReplayFrameSource;
import org.plateward.softsensor.EstimationLoop;
import org.plateward.softsensor.ReactorSoftSensor;
import org.plateward.softsensor.SoftSensorSettings;
import org.plateward.softsensor.TwinScore;

/**
 * Twin experiments on every committed recording with tuning overrides, for studying the
 * estimator (not a test): {@code -Dss.<component>=value} overrides a {@link SoftSensorSettings}
 * component and {@code -Dfs.<component>=value} a {@link FilterSettings} one (numbers and
 * booleans; arrays as comma lists); {@code -Ddata=DIR} reads the recordings from another
 * folder. Prints each recording's {@link TwinScore} summary. Arguments name the recordings
 * (default: all four).
 */
public final class TwinSweep {
  private TwinSweep() {}

  public static void main(String[] args) throws Exception {
    var unit = UnitConfigLoader.load(Path.of(System.getProperty("config", "config/plateward.toml")));
    SoftSensorSettings ss = override(SoftSensorSettings.defaults(), "ss.");
    FilterSettings fs = override(FilterSettings.defaults(), "fs.");
    String[] recs = args.length > 0 ? args
        : new String[] {"analyzer-outage", "catalyst-ageing", "feed-drop", "fuel-surge"};
    ExecutorService pool = Executors.newFixedThreadPool(Integer.getInteger("threads", 2));
    List<Future<String>> out = new ArrayList<>();
    for (String rec : recs) {
      out.add(pool.submit(() -> {
        ReactorSoftSensor sensor = new ReactorSoftSensor(unit, ss, fs);
        TwinScore score = new TwinScore(600.0);
        String dumpDir = System.getProperty("dump");
        java.io.PrintWriter dump = dumpDir == null ? null
            : new java.io.PrintWriter(java.nio.file.Files.newBufferedWriter(Path.of(dumpDir, rec + ".tsv")));
        if (dump != null) {
          dump.println("t\ttruePeakC\testPeakC\tsdK\ttrueMaxMelt\testMaxMelt\ttrueTte\testTte\ttteSd\tnis\tstatus\tkr\tkc\thl\thtm\terrGas\terrSteam\terrRefT\terrFuel\terrAir\terrCombT");
        }
        long[] t0 = {Long.MIN_VALUE};
        try (var src = ReplayFrameSource.open(Path.of(System.getProperty("data", "replay-data"), rec + ".csv"))) {
          var stats = EstimationLoop.run(src, sensor,
              (f, e, truth) -> {
                score.add(f.time().getEpochSecond(), e, truth);
                if (dump != null) {
                  if (t0[0] == Long.MIN_VALUE) {
                    t0[0] = f.time().getEpochSecond();
                  }
                  dump.printf(Locale.ROOT, "%n%d\t%.2f\t%.2f\t%.2f\t%.3f\t%.3f\t%.0f\t%.0f\t%.0f\t%.2f\t%s\t%.4f\t%.4f\t%.3f\t%.4f",
                      f.time().getEpochSecond() - t0[0], truth.getOrDefault("truth_peak_plate_temp_c", Double.NaN),
                      e.peakPlateTempK() - 273.15, e.peakPlateTempSdK(),
                      truth.getOrDefault("truth_max_cell_melt_fraction", Double.NaN), e.maxCellMeltFraction(),
                      truth.getOrDefault("truth_time_to_exhaust_s", Double.NaN), e.timeToExhaustS(), e.timeToExhaustSdS(),
                      e.nis() / Math.max(1, e.nisDof()), e.status(), e.reformingActivity(), e.combustionActivity(), e.heatLossWPerM2K(),
                      e.heatTransferMultiplier());
                  double[] x = sensor.state();
                  if (x != null) {
                    StringBuilder sb = new StringBuilder();
                    for (int q = 0; q < org.plateward.softsensor.StateLayout.INPUT_ERRORS; q++) {
                      sb.append(String.format(Locale.ROOT, "\t%.4f", x[sensor.layout().inputError(q)]));
                    }
                    dump.print(sb);
                  }
                }
              }, null);
          if (dump != null) {
            dump.close();
          }
          return String.format(Locale.ROOT, "== %s (%.0f x)%n%s", rec, stats.timesRealTime(), score.summary());
        }
      }));
    }
    try {
      for (Future<String> f : out) {
        System.out.print(f.get());
      }
    } finally {
      pool.shutdownNow();
    }
  }

  @SuppressWarnings("unchecked")
  public static <R extends Record> R override(R base, String prefix) throws Exception {
    RecordComponent[] comps = base.getClass().getRecordComponents();
    Object[] values = new Object[comps.length];
    Class<?>[] types = new Class<?>[comps.length];
    for (int i = 0; i < comps.length; i++) {
      types[i] = comps[i].getType();
      values[i] = comps[i].getAccessor().invoke(base);
      String v = System.getProperty(prefix + comps[i].getName());
      if (v == null) {
        continue;
      }
      System.out.println("override " + prefix + comps[i].getName() + " = " + v);
      if (types[i] == double.class) {
        values[i] = Double.parseDouble(v);
      } else if (types[i] == int.class) {
        values[i] = Integer.parseInt(v);
      } else if (types[i] == boolean.class) {
        values[i] = Boolean.parseBoolean(v);
      } else if (types[i] == double[].class) {
        String[] parts = v.split(",");
        double[] a = new double[parts.length];
        for (int k = 0; k < a.length; k++) {
          a[k] = Double.parseDouble(parts[k]);
        }
        values[i] = a;
      } else {
        throw new IllegalArgumentException("cannot override " + comps[i].getName());
      }
    }
    var ctor = base.getClass().getDeclaredConstructor(types);
    ctor.setAccessible(true);
    return (R) ctor.newInstance(values);
  }
}
