package org.finstack.tubeside;

import org.finstack.core.Citation;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * A published correlation for film condensation of a saturated vapour inside horizontal round
 * tubes. The heat flux of the flow is not used; methods whose stratified regime depends on the
 * wall temperature take the saturation-to-wall temperature difference instead.
 */
public interface CondensationCorrelation {

    /** @return a stable identifier, e.g. {@code "shah-1979"} */
    String id();

    /** @return the published source */
    Citation source();

    /** @return the published validity range */
    Validity validity();

    /**
     * @param p              saturation properties
     * @param f              the local flow, quality below 1
     * @param wallSubcooling saturation temperature minus inner-wall temperature [K], positive
     *                       (ignored by methods that do not need it)
     * @param w              where range warnings go
     * @return heat transfer coefficient [W/(m2 K)]
     */
    double heatTransferCoefficient(SaturatedProperties p, TubeFlow f, double wallSubcooling, Warnings w);
}
