/**
 * The simulated plant: the reactor physics on a fine grid (the truth), what the estimator does
 * not know exactly (true heat loss, a Nusselt-number mismatch, catalyst deactivation), the
 * sensors between the truth and the boundary signals (noise, thermocouple lag, the sampling
 * composition analyzer with dead time, quantisation), scripted faults and upsets, and the run
 * loop that yields one {@link org.plateward.plant.PlantSample} per sample period.
 *
 * <p>Everything here is deterministic: the same scenario, unit and seed give the same samples.
 * Only {@link org.plateward.plant.PlantRecorder} does I/O (it writes replay files).
 */
package org.plateward.plant;
