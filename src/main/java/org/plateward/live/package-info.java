/**
 * The live path: a plant's OPC UA server (or the demo's simulated plant) through the soft sensor
 * to history, the soft-sensor publisher and the console.
 *
 * <ul>
 *   <li>{@link org.plateward.live.LiveMonitor}: aligned frames from {@link
 *       org.plateward.opcua.PlantConnection} are handed to one estimator thread (never processed
 *       on a Milo or connection thread); each frame and estimate go to {@link
 *       org.plateward.history.HistoryRecorder}, the estimate to {@link
 *       org.plateward.opcua.EstimatePublisher}; connection gaps become gap rows. The estimator
 *       is never reset: across a reconnect the gap's frames are MISSING, so it predicts without
 *       correction (degraded, growing uncertainty) until data return.
 *   <li>{@link org.plateward.live.StatusBlock} and {@link org.plateward.live.ConsoleView}: the
 *       headless console (status block every few seconds, a line per status change).
 *   <li>{@link org.plateward.live.DemoSession} and {@link org.plateward.live.DemoPlant}: {@code
 *       plateward demo} — the simulated plant (invented data) on a loopback endpoint, the
 *       monitor connected to it over real OPC UA, the publisher, history in a local folder.
 *   <li>{@link org.plateward.live.TimeScale}: the demo runs faster than real time; frames
 *       travel with wall-clock timestamps (so stale and skew checks work as on a real plant)
 *       and are mapped back to plant time before the estimator and history see them.
 * </ul>
 */
package org.plateward.live;
