package org.finstack.tubeside;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * A published method for the frictional pressure gradient of adiabatic two-phase flow in a
 * round tube. Each is built on the single-phase gradients of the liquid or vapour flowing alone
 * at the total mass flux, with a {@link DarcyFriction} law the caller may choose.
 */
public interface TwoPhaseFriction {

    /** @return a stable identifier, e.g. {@code "friedel-1979"} */
    String id();

    /** @return the published source */
    Citation source();

    /** @return the published validity range */
    Validity validity();

    /** @return the single-phase Darcy friction law used for the liquid-only and vapour-only gradients */
    DarcyFriction friction();

    /**
     * @param p saturation properties
     * @param f the local flow (heat flux ignored)
     * @param w where range warnings go
     * @return frictional pressure gradient -dp/dz [Pa/m], positive
     */
    double gradient(SaturatedProperties p, TubeFlow f, Warnings w);

    /**
     * Single-phase frictional gradient f G^2 / (2 D rho) of one phase flowing alone at the total
     * mass flux (the Darcy-Weisbach equation).
     *
     * @param friction  friction law
     * @param massFlux  mass flux [kg/(m2 s)]
     * @param diameter  inner diameter [m]
     * @param density   density [kg/m3]
     * @param viscosity dynamic viscosity [Pa s]
     * @return gradient [Pa/m]
     */
    static double singlePhaseGradient(DarcyFriction friction, double massFlux, double diameter, double density,
            double viscosity) {
        Check.positive("massFlux", massFlux);
        Check.positive("diameter", diameter);
        double fd = friction.darcy(Tube.reynolds(massFlux, diameter, viscosity));
        return fd * massFlux * massFlux / (2 * diameter * density);
    }
}
