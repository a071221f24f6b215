package org.finstack.coil;

import org.finstack.core.Check;

/**
 * Added resistances. Each has its own area basis:
 * <ul>
 * <li>air-side fouling per unit air-side area, acting through the surface effectiveness,
 *     R/(eta_o A_o);</li>
 * <li>inside fouling per unit inside area, R/A_i;</li>
 * <li>fin-collar contact per unit tube outer surface, R/(pi D_o L). The air-side correlations are
 *     fitted to measured coils and already contain their collars' contact resistance, so this
 *     defaults to zero and is for a damaged or corroded bond only.</li>
 * </ul>
 *
 * @param airSide air-side fouling resistance [m2 K/W]
 * @param inside  inside fouling resistance [m2 K/W]
 * @param contact fin-collar contact resistance [m2 K/W]
 */
public record FoulingResistances(double airSide, double inside, double contact) {

    /** Clean surfaces, sound bond. */
    public static final FoulingResistances NONE = new FoulingResistances(0, 0, 0);

    /** Validates the values. */
    public FoulingResistances {
        Check.within("airSide", airSide, 0, 0.1);
        Check.within("inside", inside, 0, 0.1);
        Check.within("contact", contact, 0, 0.1);
    }
}
