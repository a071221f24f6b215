package org.finstack.units;

import java.util.List;

/**
 * One unit of one dimension: its canonical spelling, the spellings it is also read from, and
 * its conversion to SI. A linear unit converts as {@code si = (value + offset) × factor + add};
 * a reciprocal unit (a fin density) as {@code si = factor / value}.
 */
final class Unit {

    private final String symbol;
    private final double factor;
    private final double offset;
    private final double add;
    private final boolean reciprocal;
    private final List<String> aliases;

    private Unit(String symbol, double factor, double offset, double add, boolean reciprocal, String... aliases) {
        this.symbol = symbol;
        this.factor = factor;
        this.offset = offset;
        this.add = add;
        this.reciprocal = reciprocal;
        this.aliases = List.of(aliases);
    }

    /** A unit that is a multiple of the SI unit. */
    static Unit linear(String symbol, double factor, String... aliases) {
        return new Unit(symbol, factor, 0, 0, false, aliases);
    }

    /** A temperature scale: {@code si = (value + offset) × factor}. */
    static Unit scale(String symbol, double offset, double factor, String... aliases) {
        return new Unit(symbol, factor, offset, 0, false, aliases);
    }

    /** A gauge pressure: {@code si = value × factor + standard atmosphere}. */
    static Unit gauge(String symbol, double factor, String... aliases) {
        return new Unit(symbol, factor, 0, Factors.STANDARD_ATMOSPHERE, false, aliases);
    }

    /** A density of items per length: {@code si = length / value}. */
    static Unit reciprocal(String symbol, double length, String... aliases) {
        return new Unit(symbol, length, 0, 0, true, aliases);
    }

    String symbol() {
        return symbol;
    }

    List<String> aliases() {
        return aliases;
    }

    boolean isReciprocal() {
        return reciprocal;
    }

    /** The SI value of {@code value} in this unit (a reciprocal unit needs a positive value). */
    double toSi(double value) {
        return reciprocal ? factor / value : (value + offset) * factor + add;
    }

    /** The value in this unit of an SI value (a reciprocal unit needs a positive SI value). */
    double fromSi(double si) {
        return reciprocal ? factor / si : (si - add) / factor - offset;
    }
}
