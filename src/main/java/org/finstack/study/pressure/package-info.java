/**
 * Design-pressure and charge screening for replacement studies: the allowable working pressure
 * of a coil's round tubes by the ASME B31 straight-pipe formula with allowable stresses from a
 * named data file, the margin of that pressure over the saturation pressure at the highest
 * expected condensing temperature, and a screen of a refrigerant charge against the room-based
 * limits of EN 378-1 Annex C and IEC 60335-2-89.
 *
 * <p>Everything here is an estimate for a first look. The coil maker's rated design pressure,
 * the standards named in each result and local codes govern; every result says so. Pure
 * functions; pressures in pascal (gauge where the name says so), temperatures in kelvin,
 * lengths in metres, masses in kilograms. The package does not use the fluid layer: callers pass
 * saturation pressures and refrigerant safety data.
 */
package org.finstack.study.pressure;
