/**
 * Moist-air psychrometrics after the ASHRAE Handbook&mdash;Fundamentals (2017), Chapter 1
 * "Psychrometrics": perfect-gas relations for dry air and water vapour, with the saturation
 * pressure of water over liquid and ice from Hyland &amp; Wexler (1983).
 *
 * <p>Everything is SI: temperatures in kelvin [K], pressures in pascal [Pa], humidity ratio in
 * kilogram of water per kilogram of dry air [kg/kg], enthalpy in joule per kilogram of dry air
 * [J/kg]. Enthalpy is referred to dry air at 0 &deg;C and liquid water at 0 &deg;C (both zero).
 *
 * <p>{@link org.finstack.fluid.psychro.HylandWexler1983SaturationPressure} gives the saturation
 * pressure, {@link org.finstack.fluid.psychro.Psychrometrics} the static relations, and
 * {@link org.finstack.fluid.psychro.MoistAirState} an immutable state built from any two
 * independent properties at a given barometric pressure.
 */
package org.finstack.fluid.psychro;
