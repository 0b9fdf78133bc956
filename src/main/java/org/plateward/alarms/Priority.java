package org.plateward.alarms;

import java.util.Locale;

/**
 * How soon the operator is expected to respond. Four levels, most urgent first; the names are
 * ours. ISA-18.2 / IEC 62682 and EEMUA 191 suggest most annunciations fall in the least urgent
 * level (~80 % low, ~15 % medium, ~5 % high, &lt;~1 % for a fourth level; REFERENCES.md §7 [V2]/[M]).
 */
public enum Priority {
  /** Act now. */
  IMMEDIATE,
  /** Act within minutes. */
  PROMPT,
  /** Act within the shift. */
  ROUTINE,
  /** For awareness. */
  NOTICE;

  /** The name written in configuration and stored in the audit trail, e.g. {@code prompt}. */
  public String key() {
    return name().toLowerCase(Locale.ROOT);
  }

  /** The priority written as {@code key}, or null. */
  public static Priority ofKey(String key) {
    for (Priority p : values()) {
      if (p.key().equals(key.strip().toLowerCase(Locale.ROOT))) {
        return p;
      }
    }
    return null;
  }
}
