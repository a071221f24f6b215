package org.finstack.tubeside;

import org.finstack.core.Check;

/**
 * The local flow in a round tube: inner diameter, mass flux of both phases together, vapour
 * quality and wall heat flux. Validated on construction.
 *
 * @param diameter inner diameter [m]
 * @param massFlux total mass flux G = mass flow / (pi D^2 / 4) [kg/(m2 s)]
 * @param quality  thermodynamic vapour quality x [-], 0 (saturated liquid) to 1 (saturated vapour)
 * @param heatFlux wall heat flux magnitude [W/m2], not negative (zero for adiabatic flow)
 */
public record TubeFlow(double diameter, double massFlux, double quality, double heatFlux) {

    /** Checks the values. */
    public TubeFlow {
        Check.positive("diameter", diameter);
        Check.positive("massFlux", massFlux);
        Check.within("quality", quality, 0, 1);
        Check.nonNegative("heatFlux", heatFlux);
    }

    /**
     * An adiabatic flow (for pressure-drop and void-fraction methods).
     *
     * @param diameter inner diameter [m]
     * @param massFlux mass flux [kg/(m2 s)]
     * @param quality  vapour quality [-]
     * @return the flow with zero heat flux
     */
    public static TubeFlow adiabatic(double diameter, double massFlux, double quality) {
        return new TubeFlow(diameter, massFlux, quality, 0);
    }

    /**
     * @param x another quality [-]
     * @return the same flow at that quality
     */
    public TubeFlow withQuality(double x) {
        return new TubeFlow(diameter, massFlux, x, heatFlux);
    }

    /** @return flow cross-section pi D^2 / 4 [m2] */
    public double area() {
        return Math.PI * diameter * diameter / 4;
    }
}
