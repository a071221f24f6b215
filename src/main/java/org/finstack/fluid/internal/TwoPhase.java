package org.finstack.fluid.internal;

import org.finstack.fluid.FluidState;
import org.finstack.fluid.Phase;
import org.finstack.fluid.SaturationState;

/** The lever rule for two-phase states, shared by the equation-of-state and table back ends. */
public final class TwoPhase {

    private TwoPhase() {
    }

    /**
     * The two-phase state of quality q between the saturated liquid and vapour (or bubble and dew
     * points) of {@code sat}: specific volume, enthalpy and entropy linear in q, the pressure the
     * vapour's, heat capacities and speed of sound zero (not defined); q = 0 and q = 1 give the
     * saturated states themselves.
     *
     * @param sat         the saturation state
     * @param q           quality, 0 to 1
     * @param temperature the mixture's temperature [K], as the caller's model gives it
     * @return the state
     */
    public static FluidState mix(SaturationState sat, double q, double temperature) {
        if (q == 0) {
            return sat.liquid();
        }
        if (q == 1) {
            return sat.vapour();
        }
        FluidState l = sat.liquid();
        FluidState v = sat.vapour();
        double vol = (1 - q) / l.density() + q / v.density();
        return new FluidState(temperature, v.pressure(), 1 / vol, l.enthalpy() + q * (v.enthalpy() - l.enthalpy()),
                l.entropy() + q * (v.entropy() - l.entropy()), 0, 0, 0, Phase.TWO_PHASE, q);
    }
}
