/**
 * Transport properties of the refrigerants: viscosity and thermal conductivity of single-phase and
 * saturated states, and surface tension. Pure fluids: each fluid's published correlation
 * ({@link org.finstack.fluid.transport.CorrelationTransport}). Pseudo-pure blends R410A, R404A,
 * R407C and R507A: the blend correlations of Geller et al. and Okada et al.
 * ({@link org.finstack.fluid.transport.BlendTransport}). Coefficients live in
 * {@code org/finstack/fluid/transport/<fluid>.json}, each block naming its source paper. SI units:
 * Pa s, W/(m K), N/m; densities in kg/m3 unless a name says molar.
 */
package org.finstack.fluid.transport;
