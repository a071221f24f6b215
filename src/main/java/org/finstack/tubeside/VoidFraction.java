package org.finstack.tubeside;

import org.finstack.core.Citation;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/** A published method for the cross-sectional void fraction of two-phase flow in a tube. */
public interface VoidFraction {

    /** @return a stable identifier, e.g. {@code "zivi-1964"} */
    String id();

    /** @return the published source */
    Citation source();

    /** @return the published validity range */
    Validity validity();

    /**
     * @param p saturation properties
     * @param f the local flow (heat flux ignored)
     * @param w where range warnings go
     * @return void fraction (vapour share of the cross-section) [-], 0 at x = 0 and 1 at x = 1
     */
    double voidFraction(SaturatedProperties p, TubeFlow f, Warnings w);
}
