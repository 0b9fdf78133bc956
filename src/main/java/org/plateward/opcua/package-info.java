/**
 * OPC UA I/O (Milo SDK 1.1).
 *
 * <ul>
 *   <li>{@link org.plateward.opcua.PlantConnection}: the read-only client to a plant's server —
 *       one session, a supervised subscription, samples copied out of Milo's callbacks into a
 *       {@link org.plateward.opcua.SampleQueue}, and {@link org.plateward.opcua.AlignedFrame}s on
 *       a fixed clock by {@link org.plateward.opcua.FrameAligner}; states, gaps and clear
 *       messages for the faults operators meet.
 *   <li>{@link org.plateward.opcua.PlantEndpoint}: the simulated plant as a read-only server on
 *       loopback, laid out by {@link org.plateward.opcua.PlantAddressLayout}; quality maps to
 *       StatusCode by {@link org.plateward.signals.StatusName#forQuality}.
 *   <li>{@link org.plateward.opcua.EstimatePublisher}: the soft-sensor estimates as a read-only
 *       server of their own.
 * </ul>
 *
 * <p>Both servers share one scaffold ({@code EmbeddedServer}).
 */
package org.plateward.opcua;
