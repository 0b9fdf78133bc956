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
 * @param reason why the advisor held back ({@link TrimVerdict#HELD_BACK}: the estimate's own
 *     reason); empty otherwise. When held back, {@code hold} and {@code trimmed} are null.
 */
public record TrimSuggestion(
    double timeS, TrimVerdict verdict, double trim, double limitK, TrimOutlook hold, TrimOutlook trimmed,
    String reason) {

  public TrimSuggestion {
    reason = reason == null ? "" : reason;
    if (verdict != TrimVerdict.HELD_BACK && (hold == null || trimmed == null)) {
      throw new IllegalArgumentException("a " + verdict + " suggestion needs both forecasts");
    }
  }

  /** A suggestion with forecasts (no reason). */
  public TrimSuggestion(double timeS, TrimVerdict verdict, double trim, double limitK, TrimOutlook hold,
      TrimOutlook trimmed) {
    this(timeS, verdict, trim, limitK, hold, trimmed, "");
  }

  /** No suggestion at {@code timeS} because the estimate is untrustworthy for {@code reason}. */
  public static TrimSuggestion heldBack(double timeS, double limitK, String reason) {
    return new TrimSuggestion(timeS, TrimVerdict.HELD_BACK, 0.0, limitK, null, null,
        reason == null || reason.isBlank() ? "no reason given" : reason.strip());
  }

  /** Plain-text message: verdict, numbers for hold versus trim, and the advisory caution. */
  public String message() {
    if (verdict == TrimVerdict.HELD_BACK) {
      return "ADVISORY: no fuel-trim suggestion while the estimate is untrustworthy (" + reason + ")\n  "
          + Advisory.SHORT;
    }
    String head = switch (verdict) {
      case NO_TRIM_NEEDED -> "ADVISORY: no fuel trim needed";
      case TRIM -> String.format(Locale.ROOT, "ADVISORY: trim combustion fuel by %+.1f %%", 100 * trim);
      case NO_TRIM_SUFFICES -> String.format(Locale.ROOT,
          "ADVISORY: no trim within bounds suffices (even %+.1f %% fuel exceeds the limit)", 100 * trim);
      case HELD_BACK -> throw new AssertionError("handled above");
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
        "  %-12s peak %.1f degC (upper %.1f degC, sigma %.1f K), max cell melt %.0f %%, CH4 conversion %.1f %%%n",
        label, o.peakTempK() - 273.15, o.peakUpperK() - 273.15, o.peakSdK(), 100 * o.maxCellMeltFraction(),
        100 * o.methaneConversion());
  }
}
