/**
 * Several units in one process.
 *
 * <ul>
 *   <li>{@link org.plateward.fleet.UnitPool}: a fixed set of estimator threads shared by many
 *       units; each unit gets a {@link org.plateward.fleet.UnitLane}, a serial queue whose
 *       frames are estimated strictly in order by one task at a time (back-pressure on {@code
 *       put}, drop-oldest with a count on {@code offer}, failure isolated to the lane).
 *   <li>{@link org.plateward.fleet.LaneStatus} and {@link org.plateward.fleet.LaneState}: what a
 *       lane has done, and why it stopped if it failed.
 *   <li>{@link org.plateward.fleet.UnitPublishing}: each unit's estimates to its own folder on
 *       the soft-sensor publisher.
 * </ul>
 *
 * <p>Everything estimated here is advisory, as everywhere in Plateward.
 */
package org.plateward.fleet;
