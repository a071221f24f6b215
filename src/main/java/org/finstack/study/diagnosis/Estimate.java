package org.finstack.study.diagnosis;

/**
 * An inferred value with its combined standard uncertainty and the central 80 % range
 * value ∓ 1.2816 u (the 10th and 90th percentiles of a normal distribution; JCGM 100:2008
 * Table G.1 for the coverage factor), held at zero where the quantity cannot be negative.
 *
 * @param value               the best estimate
 * @param standardUncertainty combined standard uncertainty u, same unit
 * @param low                 10th percentile, same unit
 * @param high                90th percentile, same unit
 */
public record Estimate(double value, double standardUncertainty, double low, double high) {

    /** Phi^-1(0.9), the standard normal's 90th percentile (JCGM 100:2008 Table G.1; scipy.stats.norm.ppf(0.9)). */
    static final double P90 = 1.2815515655446004;

    /**
     * @param value       the best estimate
     * @param u           its standard uncertainty
     * @param nonNegative whether the range is held at zero
     * @return the estimate with its range
     */
    static Estimate of(double value, double u, boolean nonNegative) {
        double low = value - P90 * u;
        double high = value + P90 * u;
        return new Estimate(value, u, nonNegative ? Math.max(0, low) : low, nonNegative ? Math.max(0, high) : high);
    }
}
