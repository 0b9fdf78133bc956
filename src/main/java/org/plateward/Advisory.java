package org.plateward;

/** The cautions every output of Plateward carries (README, UI, reports, command output). */
public final class Advisory {
  /** One-line form for status lines and file headers. */
  public static final String SHORT =
      "ADVISORY ONLY - not a safety or control system; never writes to the plant; "
          + "site safety systems, procedures, local codes and licensed engineering practice take precedence.";

  /** Full form for summaries and reports. */
  public static final String FULL =
      "Every estimate, alarm and suggestion from Plateward is advisory. Plateward is not a safety\n"
          + "instrumented system, not a basic process control system and not an alarm system of record;\n"
          + "it never writes to the plant. Site safety systems, operating procedures, local codes and\n"
          + "licensed engineering practice take precedence. An estimate is only as good as the model and\n"
          + "the measurements behind it.";

  private Advisory() {}
}
