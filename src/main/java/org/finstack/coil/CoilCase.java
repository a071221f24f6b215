package org.finstack.coil;

import java.util.Objects;
import org.finstack.geometry.CoilGeometry;

/**
 * Everything a rating needs: the coil, the air, the refrigerant side and the added resistances.
 *
 * @param coil        the coil
 * @param air         the entering air
 * @param refrigerant the refrigerant side
 * @param fouling     added resistances
 */
public record CoilCase(CoilGeometry coil, AirInlet air, RefrigerantSide refrigerant, FoulingResistances fouling) {

    /** Checks all parts are present. */
    public CoilCase {
        Objects.requireNonNull(coil, "coil");
        Objects.requireNonNull(air, "air");
        Objects.requireNonNull(refrigerant, "refrigerant");
        fouling = fouling == null ? FoulingResistances.NONE : fouling;
    }

    /**
     * @param geometry another coil
     * @return this case with another coil
     */
    public CoilCase withCoil(CoilGeometry geometry) {
        return new CoilCase(geometry, air, refrigerant, fouling);
    }

    /**
     * @param f other resistances
     * @return this case with other added resistances
     */
    public CoilCase withFouling(FoulingResistances f) {
        return new CoilCase(coil, air, refrigerant, f);
    }
}
