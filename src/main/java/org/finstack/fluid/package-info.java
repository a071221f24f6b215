/**
 * Refrigerant properties: the {@link org.finstack.fluid.Fluid} interface, its states and
 * saturation states, and the registry {@link org.finstack.fluid.Fluids} of the refrigerants
 * Finstack knows, each computed from its reference Helmholtz-energy equation of state
 * ({@link org.finstack.fluid.HelmholtzFluid}, data files under
 * {@code org/finstack/fluid/*.json}). SI units throughout: K, Pa, kg/m3, J/kg, J/(kg K), m/s.
 * Enthalpy and entropy follow the IIR reference state (h = 200 kJ/kg and s = 1 kJ/(kg K) for
 * saturated liquid at 0 degC) for every fluid.
 */
package org.finstack.fluid;
