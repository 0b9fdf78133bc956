package org.plateward.history;

import java.time.Instant;
import java.util.Objects;

/**
 * One fuel-trim suggestion as kept in history (table {@code advisor_suggestions}). Every
 * suggestion is advisory; {@code label} says so in the row itself.
 *
 * @param time when the suggestion was made (plant time)
 * @param verdict what the advisor concluded (no_trim_needed, trim, no_trim_suffices, held_back)
 * @param trimPercent the suggested fuel change, per cent (−2.0 is 2 % less fuel; 0 when none)
 * @param limitK the limit the forecast peak upper bound was held to, K
 * @param holdPeakUpperK forecast peak upper bound with the fuel held, K (NaN when held back)
 * @param trimPeakUpperK the same with the suggested trim, K (NaN when held back)
 * @param holdMaxMeltFraction highest cell melt fraction over the horizon when holding, 0..1
 * @param trimMaxMeltFraction the same with the trim, 0..1
 * @param holdConversion reforming methane conversion at the horizon when holding, 0..1
 * @param trimConversion the same with the trim, 0..1
 * @param horizonS forecast horizon, s (NaN when held back)
 * @param text the message as shown
 * @param label the advisory label (for example "ADVISORY")
 */
public record SuggestionRow(
    Instant time,
    String verdict,
    double trimPercent,
    double limitK,
    double holdPeakUpperK,
    double trimPeakUpperK,
    double holdMaxMeltFraction,
    double trimMaxMeltFraction,
    double holdConversion,
    double trimConversion,
    double horizonS,
    String text,
    String label) {
  public SuggestionRow {
    Objects.requireNonNull(time, "time");
    Objects.requireNonNull(verdict, "verdict");
    Objects.requireNonNull(text, "text");
    Objects.requireNonNull(label, "label");
  }
}
