/**
 * The Helmholtz-energy machinery shared by every pure fluid: the reduced Helmholtz energy
 * {@code alpha(delta, tau) = alpha0(delta, tau) + alphar(delta, tau)} of a multiparameter
 * equation of state, split into its ideal-gas part ({@link org.finstack.fluid.eos.IdealGasPart})
 * and its residual part (a list of {@link org.finstack.fluid.eos.TermGroup}s), with the
 * derivatives needed for pressure, enthalpy, entropy, heat capacities and speed of sound, and
 * the ancillary equations that give starting values for the phase-equilibrium solver.
 *
 * <p>Reduced variables: {@code delta = rho / rho_r} (molar densities), {@code tau = T_r / T}.
 * The coefficient tables live in the fluid data files, not here.
 */
package org.finstack.fluid.eos;
