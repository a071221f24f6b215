package org.finstack.airside;

import org.finstack.core.Check;

/**
 * Colburn j factor and Fanning friction factor of an air-side surface at one Reynolds number.
 *
 * <p>{@code j = St Pr^(2/3) = h Pr^(2/3) / (G cp)}, with G the mass velocity in the minimum
 * free-flow area; {@code f} is the Fanning friction factor of the core pressure-drop equation
 * (see {@link KaysLondonCorePressureDrop}).
 *
 * @param j Colburn factor [-], finite and above zero
 * @param f Fanning friction factor [-], finite and above zero
 */
public record JF(double j, double f) {

    /** Validates both factors. */
    public JF {
        Check.positive("j", j);
        Check.positive("f", f);
    }
}
