package org.finstack.fluid;

import java.util.Objects;

/**
 * Liquid and vapour in equilibrium. For a pure fluid both share one temperature and pressure;
 * the record is shaped for blends too, where the liquid is the bubble point and the vapour the
 * dew point (at a given pressure they differ in temperature by the glide; at a given temperature
 * they differ in pressure). Immutable.
 *
 * @param liquid saturated liquid (bubble point), quality 0
 * @param vapour saturated vapour (dew point), quality 1
 */
public record SaturationState(FluidState liquid, FluidState vapour) {

    /** Checks the two states. */
    public SaturationState {
        Objects.requireNonNull(liquid, "liquid");
        Objects.requireNonNull(vapour, "vapour");
    }

    /** @return bubble-point temperature [K] */
    public double bubbleTemperature() {
        return liquid.temperature();
    }

    /** @return dew-point temperature [K] */
    public double dewTemperature() {
        return vapour.temperature();
    }

    /** @return bubble-point pressure [Pa] */
    public double bubblePressure() {
        return liquid.pressure();
    }

    /** @return dew-point pressure [Pa] */
    public double dewPressure() {
        return vapour.pressure();
    }

    /** @return temperature glide, dew minus bubble temperature [K] (0 for a pure fluid) */
    public double glide() {
        return dewTemperature() - bubbleTemperature();
    }

    /** @return latent heat of vaporisation h'' - h' [J/kg] */
    public double latentHeat() {
        return vapour.enthalpy() - liquid.enthalpy();
    }
}
