package org.finstack.core;

import java.util.Objects;

/**
 * The published range of one input of a method, inclusive at both ends.
 *
 * @param variable the variable's name as the method documents it (e.g. {@code "ReDc"})
 * @param min      lower bound, in the variable's own unit
 * @param max      upper bound, in the variable's own unit
 * @param unit     the unit the bounds are stated in, for messages (may be empty)
 */
public record Limit(String variable, double min, double max, String unit) {

    /** Validates the bounds. */
    public Limit {
        Objects.requireNonNull(variable, "variable");
        Objects.requireNonNull(unit, "unit");
        if (!(min <= max)) {
            throw new IllegalArgumentException("limit of " + variable + ": min above max");
        }
    }

    /**
     * A dimensionless limit.
     *
     * @param variable name
     * @param min      lower bound
     * @param max      upper bound
     * @return the limit
     */
    public static Limit of(String variable, double min, double max) {
        return new Limit(variable, min, max, "");
    }

    /**
     * A limit with a unit.
     *
     * @param variable name
     * @param min      lower bound
     * @param max      upper bound
     * @param unit     unit of the bounds, e.g. {@code "mm"}
     * @return the limit
     */
    public static Limit of(String variable, double min, double max, String unit) {
        return new Limit(variable, min, max, unit);
    }

    /**
     * @param value a value in the limit's unit
     * @return whether it lies within the range (NaN never does)
     */
    public boolean contains(double value) {
        return value >= min && value <= max;
    }
}
