package org.finstack.study;

import org.finstack.coil.AirInlet;
import org.finstack.coil.FoulingResistances;
import org.finstack.coil.RefrigerantSide;

/**
 * Parts of the project's conditions that one option replaces. Each part present replaces the
 * whole of the project's part (a pasted {@code air} object is taken as it stands, so its face
 * velocity or volume flow never mixes with the project's); a null part keeps the project's.
 *
 * @param air         replacement air, or null
 * @param refrigerant replacement refrigerant side, or null
 * @param fouling     replacement added resistances, or null
 */
public record Overrides(AirInlet air, RefrigerantSide refrigerant, FoulingResistances fouling) {

    /** No overrides: the option is rated at the project's conditions. */
    public static final Overrides NONE = new Overrides(null, null, null);

    /** @return whether nothing is overridden */
    public boolean isEmpty() {
        return air == null && refrigerant == null && fouling == null;
    }

    /**
     * @param base the project's conditions
     * @return the conditions with this option's parts in place of the project's
     */
    public Conditions applyTo(Conditions base) {
        return new Conditions(air == null ? base.air() : air, refrigerant == null ? base.refrigerant() : refrigerant,
                fouling == null ? base.fouling() : fouling);
    }
}
