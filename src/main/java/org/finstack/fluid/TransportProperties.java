package org.finstack.fluid;

import org.finstack.core.Citation;

/**
 * Transport properties of a fluid: viscosity and thermal conductivity of single-phase or
 * saturated states, and surface tension along the saturation line. Immutable and thread-safe.
 */
public interface TransportProperties {

    /**
     * @param state a single-phase state, or a saturated liquid or vapour (quality 0 or 1)
     * @return dynamic viscosity [Pa s]
     * @throws org.finstack.core.FinstackException for a two-phase state (take the saturated phases)
     */
    double viscosity(FluidState state);

    /**
     * @param state a single-phase state, or a saturated liquid or vapour (quality 0 or 1)
     * @return thermal conductivity [W/(m K)]
     * @throws org.finstack.core.FinstackException for a two-phase state (take the saturated phases)
     */
    double conductivity(FluidState state);

    /**
     * @param temperature saturation temperature [K] (for a blend: the bubble-point temperature)
     * @return liquid-vapour surface tension [N/m]
     */
    double surfaceTension(double temperature);

    /** @return the published methods the values come from, with their stated accuracy */
    java.util.List<Citation> sources();

    /**
     * @return a sentence stating the accuracy of these values (e.g. "viscosity within 3 % of the
     *         reference correlation over the coil's range")
     */
    String accuracy();
}
