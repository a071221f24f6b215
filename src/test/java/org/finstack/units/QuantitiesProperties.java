package org.finstack.units;

import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;
import org.finstack.testing.Reference;

/**
 * Invariants of reading and writing, over every unit of every dimension: conversions invert
 * each other; text written by {@code format} reads back to the same value (to 1e-9, for any
 * value that the display precision represents: four significant figures, temperatures one
 * decimal); writing is idempotent; conversion preserves order.
 */
class QuantitiesProperties {

    /** A unit of a dimension. */
    record DimUnit(Dimension dim, String unit) {
        boolean reciprocal() {
            return dim == Dimension.FIN_PITCH && (unit.equals("fpi") || unit.equals("fins/m"));
        }
    }

    @Provide
    Arbitrary<DimUnit> units() {
        List<DimUnit> all = new ArrayList<>();
        for (Dimension d : Dimension.values()) {
            for (String u : Quantities.accepted(d)) {
                all.add(new DimUnit(d, u));
            }
        }
        return Arbitraries.of(all);
    }

    @Provide
    Arbitrary<DimUnit> defaults() {
        List<DimUnit> all = new ArrayList<>();
        for (Dimension d : Dimension.values()) {
            for (UnitSystem s : UnitSystem.values()) {
                all.add(new DimUnit(d, Quantities.defaultUnit(d, s)));
            }
        }
        return Arbitraries.of(all);
    }

    /** A display value: four significant figures (temperatures: whole tenths), positive for fin densities. */
    private static double displayValue(DimUnit du, int mantissa, int exponent, boolean negative) {
        if (du.dim() == Dimension.TEMPERATURE) {
            return BigDecimal.valueOf((long) mantissa * (negative ? -1 : 1), 1).doubleValue();
        }
        double d = BigDecimal.valueOf(mantissa, 3 - exponent).doubleValue();
        return negative && !du.reciprocal() ? -d : d;
    }

    @Property
    void toUnitInvertsFromUnit(@ForAll("units") DimUnit du, @ForAll @IntRange(min = 1000, max = 9999) int mantissa,
            @ForAll @IntRange(min = -6, max = 8) int exponent, @ForAll boolean negative) {
        double d = displayValue(du, mantissa, exponent, negative);
        double si = Quantities.fromUnit(d, du.dim(), du.unit());
        // compared in SI: units with an offset (°C, °F, psig) lose relative precision near their zero
        Reference.assertRelative(si, Quantities.fromUnit(Quantities.toUnit(si, du.dim(), du.unit()), du.dim(),
                du.unit()), 1e-12, "fromUnit(toUnit(" + si + " " + du.dim().siUnit() + ")) in " + du.unit());
        // a unit without offset inverts to the display value itself
        if (Quantities.fromUnit(0, du.dim(), du.reciprocal() ? "m" : du.unit()) == 0) {
            Reference.assertRelative(d, Quantities.toUnit(si, du.dim(), du.unit()), 1e-12,
                    "toUnit(fromUnit(" + d + " " + du.unit() + "))");
        }
    }

    @Property
    void parseReadsBackWhatFormatWrites(@ForAll("units") DimUnit du,
            @ForAll @IntRange(min = 1000, max = 9999) int mantissa, @ForAll @IntRange(min = -6, max = 8) int exponent,
            @ForAll boolean negative) {
        double si = Quantities.fromUnit(displayValue(du, mantissa, exponent, negative), du.dim(), du.unit());
        for (UnitSystem sys : UnitSystem.values()) {
            String text = Quantities.format(si, du.dim(), sys, du.unit());
            Reference.assertRelative(si, Quantities.parse("p", text, du.dim()), 1e-9,
                    "parse(format(" + si + ")) via \"" + text + "\"");
        }
    }

    @Property
    void parseReadsBackTheDefaultDisplay(@ForAll("defaults") DimUnit du,
            @ForAll @IntRange(min = 1000, max = 9999) int mantissa, @ForAll @IntRange(min = -6, max = 8) int exponent,
            @ForAll boolean negative) {
        double si = Quantities.fromUnit(displayValue(du, mantissa, exponent, negative), du.dim(), du.unit());
        UnitSystem sys = Quantities.defaultUnit(du.dim(), UnitSystem.US).equals(du.unit()) ? UnitSystem.US : UnitSystem.SI;
        String text = Quantities.format(si, du.dim(), sys);
        assertThat(text).endsWith("-".equals(du.unit()) ? "" : " " + du.unit());
        Reference.assertRelative(si, Quantities.parse("p", text, du.dim()), 1e-9,
                "parse(format(" + si + ", " + sys + ")) via \"" + text + "\"");
    }

    @Property
    void formatIsIdempotent(@ForAll("units") DimUnit du, @ForAll @DoubleRange(min = 1e-5, max = 1e7) @Scale(9) double x,
            @ForAll boolean negative) {
        double si = Quantities.fromUnit(negative && !du.reciprocal() ? -x : x, du.dim(), du.unit());
        String once = Quantities.format(si, du.dim(), UnitSystem.SI, du.unit());
        String twice = Quantities.format(Quantities.parse("p", once, du.dim()), du.dim(), UnitSystem.SI, du.unit());
        assertThat(twice).isEqualTo(once);
    }

    @Property
    void conversionPreservesOrder(@ForAll("units") DimUnit du, @ForAll @DoubleRange(min = 1e-3, max = 1e6) @Scale(6) double a,
            @ForAll @DoubleRange(min = 1e-3, max = 1e6) @Scale(6) double b) {
        double sa = Quantities.fromUnit(a, du.dim(), du.unit());
        double sb = Quantities.fromUnit(b, du.dim(), du.unit());
        if (a < b) {
            // a larger fin density is a smaller pitch; every other unit is an increasing function
            if (du.reciprocal()) {
                assertThat(sa).isGreaterThan(sb);
            } else {
                assertThat(sa).isLessThan(sb);
            }
        }
    }

    @Property
    void everyCanonicalSpellingAndItsDisplayFormAreRead(@ForAll("units") DimUnit du) {
        double si = Quantities.fromUnit(2.5, du.dim(), du.unit());
        Reference.assertRelative(si, Quantities.parse("p", "2.5 " + du.unit(), du.dim()), 1e-15, "2.5 " + du.unit());
        Reference.assertRelative(si, Quantities.parse("p", "2.5" + du.unit(), du.dim()), 1e-15, "2.5" + du.unit());
    }
}
