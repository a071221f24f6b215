/**
 * Refrigerant-side (in-tube) heat transfer and pressure drop for horizontal, round, smooth
 * tubes: single-phase Nusselt number and Darcy friction factor, flow boiling, condensation,
 * two-phase frictional pressure gradient, void fraction with the acceleration pressure change,
 * and return-bend losses.
 *
 * <p>The methods take plain SI property values ({@link org.finstack.tubeside.SaturatedProperties})
 * and the local flow ({@link org.finstack.tubeside.TubeFlow}); they do not look properties up.
 * One published method per class, each with its {@code SOURCE} and {@code VALIDITY}; the
 * registries {@link org.finstack.tubeside.BoilingCorrelations},
 * {@link org.finstack.tubeside.CondensationCorrelations},
 * {@link org.finstack.tubeside.TwoPhaseFrictions} and {@link org.finstack.tubeside.VoidFractions}
 * list the interchangeable ones by id, the first of each being the default.
 *
 * <p>Worked examples in the class comments use two fixture property sets, rounded R134a
 * saturation values (from memory; they only need to be plausible): near 5 °C, p = 349.9 kPa,
 * pc = 4059.3 kPa, rho_l = 1277.8 and rho_v = 17.13 kg/m3, mu_l = 2.503e-4 and
 * mu_v = 1.104e-5 Pa s, k_l = 0.0898 and k_v = 0.01167 W/(m K), cp_l = 1355 and
 * cp_v = 903 J/(kg K), sigma = 0.01078 N/m, h_lv = 194.9 kJ/kg; near 40 °C, p = 1016.6 kPa,
 * rho_l = 1146.7 and rho_v = 50.09 kg/m3, mu_l = 1.614e-4 and mu_v = 1.253e-5 Pa s,
 * k_l = 0.0748 and k_v = 0.0152 W/(m K), cp_l = 1498 and cp_v = 1145 J/(kg K),
 * sigma = 0.00608 N/m, h_lv = 163.0 kJ/kg.
 *
 * <p>Out of scope: microfin (internally grooved) and other enhanced tubes, vertical and
 * inclined tubes, mini- and microchannels, subcooled boiling, zeotropic-mixture (glide)
 * corrections and oil effects.
 */
package org.finstack.tubeside;
