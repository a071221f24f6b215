package org.finstack.fluid;

/** Which phase a {@link FluidState} is in. */
public enum Phase {
    /** Liquid (subcooled or compressed; below the critical temperature above the vapour pressure). */
    LIQUID,
    /** Vapour or gas (below the vapour pressure, or above the critical temperature below the critical pressure). */
    VAPOUR,
    /** Liquid and vapour in equilibrium; {@link FluidState#quality()} gives the vapour mass fraction. */
    TWO_PHASE,
    /** At or above both the critical temperature and the critical pressure. */
    SUPERCRITICAL
}
