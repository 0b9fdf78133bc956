/**
 * Ideal-gas thermochemistry and transport properties of the reformer gases.
 *
 * <ul>
 *   <li>{@link org.plateward.thermo.Species}: the seven species and their fixed index order.
 *   <li>{@link org.plateward.thermo.IdealGasThermo}: cp, h, s°, g° per species.
 *   <li>{@link org.plateward.thermo.Reaction}: ΔH°, ΔG° and K of the reforming, shift and
 *       combustion reactions.
 *   <li>{@link org.plateward.thermo.MixtureProperties}: mixture cp, viscosity, conductivity and
 *       diffusivities.
 * </ul>
 *
 * <p>Sources:
 * <ul>
 *   <li>Chase, M.W. Jr. (1998). NIST-JANAF Thermochemical Tables, 4th ed. J. Phys. Chem. Ref.
 *       Data, Monograph 9 — through the NIST Chemistry WebBook (SRD 69) Shomate fits.
 *   <li>Poling, B.E.; Prausnitz, J.M.; O'Connell, J.P. (2001). The Properties of Gases and
 *       Liquids, 5th ed., McGraw-Hill: Chapman–Enskog viscosity, Neufeld collision integral,
 *       modified Eucken conductivity, Wilke and Mason–Saxena mixing, Fuller diffusivity.
 *   <li>Neufeld, P.D.; Janzen, A.R.; Aziz, R.A. (1972). J. Chem. Phys. 57, 1100.
 *   <li>Svehla, R.A. (1962). NASA Technical Report R-132 (Lennard-Jones parameters).
 *   <li>Wilke, C.R. (1950). J. Chem. Phys. 18, 517 (viscosity mixing rule) and Chem. Eng.
 *       Prog. 46, 95 (diffusion in gas mixtures).
 *   <li>Mason, E.A.; Saxena, S.C. (1958). Phys. Fluids 1, 361.
 *   <li>Fuller, E.N.; Schettler, P.D.; Giddings, J.C. (1966). Ind. Eng. Chem. 58(5), 18.
 *   <li>Huber, M.L. et al. (2009), J. Phys. Chem. Ref. Data 38, 101 (IAPWS 2008 viscosity) and
 *       (2012), J. Phys. Chem. Ref. Data 41, 033102 (IAPWS 2011 thermal conductivity).
 * </ul>
 *
 * <p>This package does no I/O. SI units throughout; the unit is in every name.
 */
package org.plateward.thermo;
