/**
 * Heat-exchanger effectiveness relations for coil models: the flow arrangements
 * ({@link org.finstack.exchanger.FlowArrangement}, {@link org.finstack.exchanger.CounterCrossflow}),
 * the effectiveness-NTU relations and their inverses ({@link org.finstack.exchanger.EpsilonNtu}),
 * and the logarithmic mean temperature difference with its correction factor
 * ({@link org.finstack.exchanger.Lmtd}).
 *
 * <p>Conventions: NTU = UA / C<sub>min</sub> [-], C<sub>r</sub> = C<sub>min</sub> / C<sub>max</sub>
 * [-], effectiveness = q / (C<sub>min</sub> (T<sub>hot,in</sub> - T<sub>cold,in</sub>)) [-]. All
 * relations assume steady state, constant U and specific heats, no heat loss and no longitudinal
 * conduction. A fluid changing phase has C<sub>r</sub> = 0.
 */
package org.finstack.exchanger;
