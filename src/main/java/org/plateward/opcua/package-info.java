/**
 * OPC UA I/O. {@link org.plateward.opcua.PlantEndpoint} serves the simulated plant as a
 * read-only OPC UA server on loopback (Milo server SDK), laid out by {@link
 * org.plateward.opcua.PlantAddressLayout}; quality maps to StatusCode by {@link
 * org.plateward.signals.StatusName#forQuality}.
 */
package org.plateward.opcua;
