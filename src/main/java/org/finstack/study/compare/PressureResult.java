package org.finstack.study.compare;

import org.finstack.study.pressure.DesignPressureMargin;
import org.finstack.study.pressure.PressureRating;

/**
 * The margin of a coil's tubes over the refrigerant's saturation pressure at the design
 * temperature, or the reason it could not be worked out.
 *
 * @param designTemperature  highest expected saturation temperature used [K]
 * @param saturationPressure bubble-point pressure there [Pa absolute]
 * @param tube               the tubes' allowable pressure (ASME B31.5 straight-pipe rule), or null
 * @param margin             allowable over required, with its verdict, or null
 * @param error              why there is no margin, or null
 */
public record PressureResult(double designTemperature, double saturationPressure, PressureRating tube,
        DesignPressureMargin margin, String error) {

    /** @return whether a margin was worked out */
    public boolean known() {
        return margin != null;
    }
}
