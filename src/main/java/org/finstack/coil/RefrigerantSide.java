package org.finstack.coil;

import java.util.Objects;
import org.finstack.core.Check;

/**
 * The refrigerant side for a rating at a fixed saturation temperature with a given inside
 * film coefficient (the two-phase refrigerant held at one temperature along the whole coil).
 *
 * @param fluid                 refrigerant name as the user wrote it
 * @param duty                  condenser or evaporator
 * @param saturationTemperature saturation temperature [K]
 * @param insideCoefficient     inside (refrigerant film) heat-transfer coefficient [W/(m2 K)]
 */
public record RefrigerantSide(String fluid, Duty duty, double saturationTemperature, double insideCoefficient) {

    /** Validates the values. */
    public RefrigerantSide {
        Objects.requireNonNull(fluid, "fluid");
        Objects.requireNonNull(duty, "duty");
        Check.within("saturationTemperature", saturationTemperature, 173.15, 373.15);
        Check.positive("insideCoefficient", insideCoefficient);
    }
}
