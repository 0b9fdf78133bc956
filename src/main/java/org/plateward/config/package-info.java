/**
 * Reading the TOML configuration file: quantities written with their units
 * ({@link org.plateward.config.Quantity}), the reactor unit tables
 * ({@link org.plateward.config.UnitConfigLoader}) and the whole file
 * ({@link org.plateward.config.PlatewardConfig}). Every problem is reported as
 * {@code file:line: field: message}; reading never writes anything.
 */
package org.plateward.config;
