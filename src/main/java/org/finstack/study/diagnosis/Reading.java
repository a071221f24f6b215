package org.finstack.study.diagnosis;

import org.finstack.core.Check;

/**
 * One measured value with the instrument's stated accuracy. The accuracy is the stated limit
 * of error, ±a, read as a rectangular distribution of half-width a, whose standard uncertainty
 * is a / sqrt(3) (JCGM 100:2008, the GUM, 4.3.7). An accuracy of zero treats the value as exact.
 *
 * @param value    the reading, SI [K, m3/s, kg/s or -]
 * @param accuracy the stated limit ±a, same unit as the value (a temperature's in kelvin), not negative
 */
public record Reading(double value, double accuracy) {

    /** Checks both numbers are finite and the accuracy not negative. */
    public Reading {
        Check.finite("value", value);
        Check.nonNegative("accuracy", accuracy);
    }

    /**
     * @param value the reading
     * @return an exact reading
     */
    public static Reading exact(double value) {
        return new Reading(value, 0);
    }

    /** @return the standard uncertainty a / sqrt(3) (GUM 4.3.7) */
    public double standardUncertainty() {
        return accuracy / Math.sqrt(3);
    }
}
