package org.plateward.advisor;

import java.util.Locale;
import org.plateward.Advisory;

/**
 * One issued fuel-trim suggestion: the forecast when holding and when trimming, and its text.
 *
 * @param timeS time the suggestion was made, s (the caller's clock)
 * @param verdict what the advisor concluded
 * @param trim the suggested relative fuel change (0 when none is needed; the bound when none
 *     suffices)
 * @param limitK the limit the trim was sized against, K
 * @param hold forecast with the fuel held
 * @param trimmed forecast with the suggested trim (the same as hold when no trim is needed)
 */
public record TrimSuggestion(
    double timeS, TrimVerdict verdict, double trim, double limitK, TrimOutlook hold, TrimOutlook trimmed) {

  /** Plain-text message: verdict, numbers for hold versus trim, and the advisory caution. */
  public String message() {
    String head = switch (verdict) {
      case NO_TRIM_NEEDED -> "ADVISORY: no fuel trim needed";
      case TRIM -> String.format(Locale.ROOT, "ADVISORY: trim combustion fuel by %+.1f %%", 100 * trim);
      case NO_TRIM_SUFFICES -> String.format(Locale.ROOT,
          "ADVISORY: no trim within bounds suffices (even %+.1f %% fuel exceeds the limit)", 100 * trim);
    };
    StringBuilder b = new StringBuilder(head).append('\n');
    b.append(String.format(Locale.ROOT, "  limit on forecast peak (upper bound) %.1f degC over %.0f min%n",
        limitK - 273.15, hold.horizonS() / 60));
    b.append(line("hold", hold));
    if (verdict != TrimVerdict.NO_TRIM_NEEDED) {
      b.append(line(String.format(Locale.ROOT, "trim %+.1f %%", 100 * trim), trimmed));
    }
    b.append("  ").append(Advisory.SHORT);
    return b.toString();
  }

  private static String line(String label, TrimOutlook o) {
    return String.format(Locale.ROOT,
        "  %-12s peak %.1f degC (upper %.1f degC), max cell melt %.0f %%, CH4 conversion %.1f %%%n",
        label, o.peakTempK() - 273.15, o.peakUpperK() - 273.15, 100 * o.maxCellMeltFraction(),
        100 * o.methaneConversion());
  }
}
