package org.finstack.study.uncertainty;

import org.finstack.core.Check;

/**
 * Standard uncertainties (one standard deviation) of a rating's inputs, for the Monte Carlo band.
 * Each input is drawn from a normal distribution about its stated value.
 *
 * @param airTemperature        entering dry bulb [K]
 * @param relativeHumidity      entering relative humidity [-] (absolute, e.g. 0.03 for ±3 % RH)
 * @param airflowRelative       airflow (face velocity or volume flow), relative [-]
 * @param saturationTemperature refrigerant saturation temperature [K]
 * @param outletCondition       superheat (evaporator) or subcooling (condenser) [K]
 */
public record InputTolerances(double airTemperature, double relativeHumidity, double airflowRelative,
        double saturationTemperature, double outletCondition) {

    /** Exact inputs: only the correlations' scatter remains. */
    public static final InputTolerances NONE = new InputTolerances(0, 0, 0, 0, 0);

    /** Validates: none negative, relative airflow below one half. */
    public InputTolerances {
        Check.within("airTemperature", airTemperature, 0, 20);
        Check.within("relativeHumidity", relativeHumidity, 0, 0.5);
        Check.within("airflowRelative", airflowRelative, 0, 0.5);
        Check.within("saturationTemperature", saturationTemperature, 0, 20);
        Check.within("outletCondition", outletCondition, 0, 20);
    }

    /**
     * @param factor multiplier [-], not negative
     * @return every tolerance times the factor
     */
    public InputTolerances scaled(double factor) {
        Check.nonNegative("factor", factor);
        return new InputTolerances(airTemperature * factor, relativeHumidity * factor, airflowRelative * factor,
                saturationTemperature * factor, outletCondition * factor);
    }
}
