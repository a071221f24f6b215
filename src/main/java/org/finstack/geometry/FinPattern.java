package org.finstack.geometry;

import org.finstack.core.Check;

/**
 * Shape parameters of an enhanced fin; a plain fin has none ({@link #NONE}). Zero means "not
 * given".
 *
 * @param waveHeight    wavy fin: wave height, peak to valley [m]
 * @param waveLength    wavy fin: projected length of one wave [m]
 * @param louverPitch   louvered fin: louver pitch [m]
 * @param louverHeight  louvered fin: louver height [m]
 */
public record FinPattern(double waveHeight, double waveLength, double louverPitch, double louverHeight) {

    /** No pattern: a plain fin. */
    public static final FinPattern NONE = new FinPattern(0, 0, 0, 0);

    /** Validates that every given value is finite and not negative. */
    public FinPattern {
        Check.nonNegative("waveHeight", waveHeight);
        Check.nonNegative("waveLength", waveLength);
        Check.nonNegative("louverPitch", louverPitch);
        Check.nonNegative("louverHeight", louverHeight);
    }
}
