/**
 * Reaction-rate expressions of the reforming and combustion washcoats.
 *
 * <ul>
 *   <li>{@link org.plateward.kinetics.XuFromentKinetics}: steam reforming and water-gas shift
 *       on nickel — Xu, J.; Froment, G.F. (1989). AIChE J. 35(1), 88–96,
 *       doi:10.1002/aic.690350109 (Table 6 parameters), with equilibrium constants from
 *       NIST-JANAF thermochemistry (Chase 1998) via {@link org.plateward.thermo.Reaction}.
 *   <li>{@link org.plateward.kinetics.CatalyticCombustion}: first-order methane combustion on
 *       platinum from the CH4 sticking coefficient of Deutschmann, O.; Schmidt, R.; Behrendt,
 *       F.; Warnatz, J. (1996). Proc. Combust. Inst. 26, 1747–1754.
 * </ul>
 *
 * <p>Catalyst activity multipliers are parameters of the caller (they drift as the catalyst
 * ages) and are never applied inside this package. The hot-path methods are static and
 * allocation-free; results go into caller-owned arrays. No I/O.
 */
package org.plateward.kinetics;
