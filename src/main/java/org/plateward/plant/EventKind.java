package org.plateward.plant;

/** What a scenario event does; the id is the {@code kind} written in scenario files. */
public enum EventKind {
  /** Reforming feed (gas and steam together, steam-to-carbon held) drops by a percentage. */
  FEED_DROP("feed_drop", true),
  /** Combustion fuel flow rises by a percentage. */
  FUEL_SURGE("fuel_surge", true),
  /** Steam flow moves so that the steam-to-carbon ratio reaches a new value. */
  STEAM_TO_CARBON("steam_to_carbon", true),
  /** An inlet temperature (reforming or combustion, by target) steps by a temperature difference. */
  INLET_TEMP_STEP("inlet_temp_step", true),
  /** A catalyst's activity declines exponentially towards a lower level. */
  CATALYST_AGEING("catalyst_ageing", true),
  /** A sensor reading drifts at a constant rate. */
  DRIFT("drift", false),
  /** A sensor reading freezes at its value when the fault begins. */
  STUCK("stuck", false),
  /** Single-frame spikes at random times on a sensor reading. */
  SPIKES("spikes", false),
  /** A sensor delivers no value: quality BAD, value missing. */
  DROPOUT("dropout", false);

  private final String id;
  private final boolean upset;

  EventKind(String id, boolean upset) {
    this.id = id;
    this.upset = upset;
  }

  public String id() {
    return id;
  }

  /** True for changes of the process (inputs, catalyst); false for sensor faults. */
  public boolean isUpset() {
    return upset;
  }

  /** The kind with this id, or null. */
  public static EventKind byId(String id) {
    for (EventKind k : values()) {
      if (k.id.equals(id)) {
        return k;
      }
    }
    return null;
  }
}
