package org.finstack.tubeside;

/**
 * A single-phase Darcy friction factor as a function of the Reynolds number, for the tube the
 * caller has in mind (smooth, or of a fixed relative roughness). The two-phase methods take one
 * to compute their liquid-only and vapour-only gradients.
 */
@FunctionalInterface
public interface DarcyFriction {

    /**
     * @param reynolds Reynolds number [-], positive
     * @return Darcy friction factor [-] (four times the Fanning factor)
     */
    double darcy(double reynolds);
}
