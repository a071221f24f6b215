/**
 * Transport properties of the pure refrigerants: viscosity and thermal conductivity of
 * single-phase and saturated states, and surface tension, each from the fluid's published
 * correlation ({@link org.finstack.fluid.transport.CorrelationTransport}). Coefficients live in
 * {@code org/finstack/fluid/transport/<fluid>.json}, each block naming its source paper. SI units:
 * Pa s, W/(m K), N/m; densities in kg/m3 unless a name says molar.
 */
package org.finstack.fluid.transport;
