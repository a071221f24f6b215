package org.finstack.tubeside;

import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * A published flow-boiling (evaporation) correlation for saturated flow in horizontal round
 * tubes. {@link #wetWall} is the published equation; {@link #heatTransferCoefficient} adds the
 * stated dryout treatment of {@link Dryout} above its onset quality.
 */
public interface BoilingCorrelation {

    /** @return a stable identifier, e.g. {@code "gungor-winterton-1987"} */
    String id();

    /** @return the published source */
    Citation source();

    /** @return the published validity range */
    Validity validity();

    /**
     * The published correlation, for a wetted wall. Needs a positive heat flux.
     *
     * @param p saturation properties
     * @param f the local flow, quality below 1 and heat flux above zero
     * @param w where range warnings go
     * @return heat transfer coefficient [W/(m2 K)]
     */
    double wetWall(SaturatedProperties p, TubeFlow f, Warnings w);

    /**
     * The local coefficient over the whole quality range: {@link #wetWall} up to the dryout
     * onset quality of {@link Dryout}, the stated interpolation to the vapour-only coefficient
     * above it (with a warning).
     *
     * @param p saturation properties
     * @param f the local flow, heat flux above zero
     * @param w where warnings go
     * @return heat transfer coefficient [W/(m2 K)]
     */
    default double heatTransferCoefficient(SaturatedProperties p, TubeFlow f, Warnings w) {
        return Dryout.apply(this, p, f, w);
    }

    /**
     * Rejects an adiabatic flow, which no boiling correlation describes.
     *
     * @param f the flow
     */
    static void requireHeatFlux(TubeFlow f) {
        if (!(f.heatFlux() > 0)) {
            throw new InputException("flow.heatFlux", Msg.NOT_POSITIVE, f.heatFlux());
        }
    }
}
