package org.plateward.opcua;

import org.plateward.signals.Quality;

/**
 * OPC UA StatusCode → {@link Quality}. Severity is bits 31:30 of the code: 00 Good, 01
 * Uncertain, 10 (and the reserved 11) Bad (OPC 10000-4 §7.39; REFERENCES.md §8).
 */
public final class StatusQuality {
  private StatusQuality() {}

  /**
   * The quality class of a status code; a Good or Uncertain status without a numeric value is
   * BAD, since there is nothing to use.
   *
   * @param statusCode the 32-bit code (unsigned, held in a long)
   * @param hasNumericValue whether the DataValue carried a finite number
   */
  public static Quality of(long statusCode, boolean hasNumericValue) {
    long severity = (statusCode >>> 30) & 0x3L;
    Quality q = severity == 0L ? Quality.GOOD : severity == 1L ? Quality.UNCERTAIN : Quality.BAD;
    return q.usable() && !hasNumericValue ? Quality.BAD : q;
  }
}
