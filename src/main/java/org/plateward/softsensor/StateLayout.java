package org.plateward.softsensor;

/**
 * Where each quantity sits in the soft sensor's augmented state vector.
 *
 * <pre>
 *   [0, N)            plate enthalpy of each cell, as e_j / C (K; e is J/m2, C the sensible
 *                     areal heat capacity, so away from melting x_j = T_j - Tref)
 *   N                 reforming activity (multiplier on the Xu-Froment rates)
 *   N+1               combustion activity (multiplier on the surface rate constant)
 *   N+2               heat-loss coefficient, W/(m2 K)
 *   N+3               gas-wall heat-transfer multiplier (on the Nusselt number)
 *   N+4, N+5          bias of the plate-end thermocouples at z = 0 and z = L, K
 *   N+6 .. N+9        first-order sensor lags: reformed gas outlet, flue gas outlet, plate end
 *                     z = 0, plate end z = L, K
 *   N+10 .. N+15      systematic input errors (first-order Gauss-Markov): relative error of the
 *                     reforming gas, steam, fuel and air meters, and the error of the two inlet
 *                     thermocouples (K), in the order of {@link #ERROR_INPUTS}
 *   N+16 ..            analyzer clones: {@link #cloneSlots()} slots of five dry mole fractions
 *                     (mol%), held from the time a sample is drawn until its result is published
 * </pre>
 */
public final class StateLayout {
  /** Number of analyzer channels (CH4, CO, CO2, H2 in reformed gas; O2 in flue gas). */
  public static final int ANALYZER_CHANNELS = 5;
  /** Number of lagged temperature sensors. */
  public static final int LAGS = 4;
  /** Number of augmented parameters (activities and heat loss). */
  public static final int PARAMETERS = 4;

  /** Inputs (indices into the {@code OperatingPoint} order) that carry an error state. */
  public static final int[] ERROR_INPUTS = {0, 1, 2, 4, 5, 6};
  /** Number of input-error states. */
  public static final int INPUT_ERRORS = ERROR_INPUTS.length;

  private final int cells;
  private final int slots;

  /**
   * @param cells number of model cells N
   * @param cloneSlots number of analyzer samples that can be in flight at once
   */
  public StateLayout(int cells, int cloneSlots) {
    this.cells = cells;
    this.slots = cloneSlots;
  }

  public int cells() {
    return cells;
  }

  public int cloneSlots() {
    return slots;
  }

  public int reformingActivity() {
    return cells;
  }

  public int combustionActivity() {
    return cells + 1;
  }

  public int heatLoss() {
    return cells + 2;
  }

  public int heatTransfer() {
    return cells + 3;
  }

  /** Bias state of plate-end thermocouple {@code end} (0: z = 0, 1: z = L). */
  public int bias(int end) {
    return cells + 4 + end;
  }

  /** Lag state {@code k} (0 reformed gas outlet, 1 flue gas outlet, 2 plate end z=0, 3 z=L). */
  public int lag(int k) {
    return cells + 6 + k;
  }

  /** Error state {@code q} of input {@code ERROR_INPUTS[q]}. */
  public int inputError(int q) {
    return cells + 6 + LAGS + q;
  }

  /** Whether input {@code i} ({@code OperatingPoint} order) is a temperature (absolute error, K). */
  public static boolean temperatureInput(int i) {
    return i == 2 || i == 6;
  }

  /** First state of clone slot {@code s}. */
  public int clone(int s) {
    return cells + 6 + LAGS + INPUT_ERRORS + s * ANALYZER_CHANNELS;
  }

  /** Total state size n. */
  public int size() {
    return cells + 6 + LAGS + INPUT_ERRORS + slots * ANALYZER_CHANNELS;
  }
}
