package org.plateward.signals;

import java.util.HashMap;
import java.util.Map;

/**
 * The OPC UA StatusCodes Plateward reads and writes for measured values, by their standard
 * symbolic name and 32-bit code. The codes are those of the OPC Foundation's
 * {@code Schema/StatusCode.csv} (IEC 62541; copied in REFERENCES.md §8). Severity is bits 31:30
 * of the code: 00 Good, 01 Uncertain, 10 Bad.
 *
 * <p>Both the plant's OPC UA endpoint and the replay file use this table, so a value recorded
 * from the plant carries the same status name it was served with.
 */
public enum StatusName {
  GOOD("Good", 0x00000000L),
  GOOD_CLAMPED("Good_Clamped", 0x00300000L),
  GOOD_LOCAL_OVERRIDE("Good_LocalOverride", 0x00960000L),
  UNCERTAIN("Uncertain", 0x40000000L),
  UNCERTAIN_NO_COMMUNICATION_LAST_USABLE_VALUE("Uncertain_NoCommunicationLastUsableValue", 0x408F0000L),
  UNCERTAIN_LAST_USABLE_VALUE("Uncertain_LastUsableValue", 0x40900000L),
  UNCERTAIN_SUBSTITUTE_VALUE("Uncertain_SubstituteValue", 0x40910000L),
  UNCERTAIN_INITIAL_VALUE("Uncertain_InitialValue", 0x40920000L),
  UNCERTAIN_SENSOR_NOT_ACCURATE("Uncertain_SensorNotAccurate", 0x40930000L),
  UNCERTAIN_ENGINEERING_UNITS_EXCEEDED("Uncertain_EngineeringUnitsExceeded", 0x40940000L),
  UNCERTAIN_SUB_NORMAL("Uncertain_SubNormal", 0x40950000L),
  UNCERTAIN_SIMULATED_VALUE("Uncertain_SimulatedValue", 0x42090000L),
  BAD("Bad", 0x80000000L),
  BAD_UNEXPECTED_ERROR("Bad_UnexpectedError", 0x80010000L),
  BAD_INTERNAL_ERROR("Bad_InternalError", 0x80020000L),
  BAD_COMMUNICATION_ERROR("Bad_CommunicationError", 0x80050000L),
  BAD_TIMEOUT("Bad_Timeout", 0x800A0000L),
  BAD_NO_COMMUNICATION("Bad_NoCommunication", 0x80310000L),
  BAD_WAITING_FOR_INITIAL_DATA("Bad_WaitingForInitialData", 0x80320000L),
  BAD_NODE_ID_UNKNOWN("Bad_NodeIdUnknown", 0x80340000L),
  BAD_OUT_OF_RANGE("Bad_OutOfRange", 0x803C0000L),
  BAD_CONFIGURATION_ERROR("Bad_ConfigurationError", 0x80890000L),
  BAD_NOT_CONNECTED("Bad_NotConnected", 0x808A0000L),
  BAD_DEVICE_FAILURE("Bad_DeviceFailure", 0x808B0000L),
  BAD_SENSOR_FAILURE("Bad_SensorFailure", 0x808C0000L),
  BAD_OUT_OF_SERVICE("Bad_OutOfService", 0x808D0000L);

  private static final Map<String, StatusName> BY_TEXT = new HashMap<>();

  static {
    for (StatusName s : values()) {
      BY_TEXT.put(s.text, s);
    }
  }

  private final String text;
  private final long code;

  StatusName(String text, long code) {
    this.text = text;
    this.code = code;
  }

  /** The standard symbolic name, e.g. {@code Bad_SensorFailure}. */
  public String text() {
    return text;
  }

  /** The 32-bit StatusCode value (flags bits 15:0 zero). */
  public long code() {
    return code;
  }

  /** Quality class from the severity bits 31:30 of the code. */
  public Quality quality() {
    long severity = code & 0xC0000000L;
    if (severity == 0L) {
      return Quality.GOOD;
    }
    return severity == 0x40000000L ? Quality.UNCERTAIN : Quality.BAD;
  }

  /** The status with this standard name (case-sensitive), or null. */
  public static StatusName byText(String text) {
    return BY_TEXT.get(text);
  }

  /**
   * The status Plateward serves and records for a value of the given quality.
   *
   * <ul>
   *   <li>GOOD → Good;
   *   <li>UNCERTAIN → Uncertain_SensorNotAccurate (the sensor model says the value is off);
   *   <li>BAD → Bad_SensorFailure (dropout, failed sensor);
   *   <li>MISSING → Bad_WaitingForInitialData before the signal's first value, afterwards
   *       Bad_NoCommunication.
   * </ul>
   *
   * @param quality the frame quality of the signal
   * @param hadValue whether the signal has carried a non-MISSING value earlier in this run
   */
  public static StatusName forQuality(Quality quality, boolean hadValue) {
    return switch (quality) {
      case GOOD -> GOOD;
      case UNCERTAIN -> UNCERTAIN_SENSOR_NOT_ACCURATE;
      case BAD -> BAD_SENSOR_FAILURE;
      case MISSING -> hadValue ? BAD_NO_COMMUNICATION : BAD_WAITING_FOR_INITIAL_DATA;
    };
  }
}
