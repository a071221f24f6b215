/**
 * Dry air: density, heat capacity, viscosity, thermal conductivity and Prandtl number near
 * atmospheric pressure, each from a published formulation, in SI units.
 */
package org.finstack.fluid.air;
