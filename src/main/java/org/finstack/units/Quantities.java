package org.finstack.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * Reads quantities written as text into SI values, and writes SI values as text in SI or US
 * customary units ("units at the edges").
 *
 * <p><b>Reading.</b> A quantity is a number, optionally followed by a unit, with or without a
 * space between: {@code "9.52 mm"}, {@code "9.52mm"}, {@code "1e-4 m2 K/W"}. A bare number is in
 * the SI unit of its {@link Dimension} ({@link Dimension#siUnit()}; e.g. kelvin for a
 * temperature). Unit spellings are compared after dropping spaces, middle dots, hyphens,
 * periods, asterisks, carets, parentheses and degree signs and words, and after reading
 * superscript digits as digits, "µ" as "u", "hr" as "h", "sec" as "s" and "lbm"/"lbs" as "lb";
 * so {@code W/(m2 K)}, {@code W/m²K}, {@code W/m2-K} and {@code W/(m^2*K)} are one unit. If no
 * spelling matches exactly, letter case is ignored, except that a leading m is never read as
 * M (milli as mega) or back.
 *
 * <p><b>Conventions.</b>
 * <ul>
 * <li>{@link Dimension#PRESSURE} is absolute. Plain units (Pa, kPa, MPa, bar, mbar, psi, atm) and
 * the absolute forms (psia, kPa(a), bar(a), bara) are read as absolute; gauge units (psig,
 * barg, bar(g), kPa(g), kPag, MPa(g)) add the standard atmosphere, 101 325 Pa (NIST SP 811,
 * Appendix B.8, exact). {@link Dimension#PRESSURE_DIFFERENCE} refuses gauge units.</li>
 * <li>Inches of water are inches of water at 39.2 °F (4 °C), 1 in. w.c. = 249.082 Pa (NIST SP
 * 811, Appendix B.8); millimetres of water likewise at 4 °C, 9.80638 Pa.</li>
 * <li>A {@link Dimension#TEMPERATURE_DIFFERENCE} has no offset: 1 K = 1 °C and 1 °F = 1 °R =
 * 5/9 K. A {@link Dimension#TEMPERATURE} in °C or °F is read with its offset, and "5 K" as a
 * temperature is 5 kelvin absolute.</li>
 * <li>{@link Dimension#FIN_PITCH} accepts a length (the distance between fins) or a fin density:
 * n fpi gives a pitch of 0.0254/n m, n fins/m a pitch of 1/n m.</li>
 * <li>Btu is the International Table Btu, 1055.05585262 J; MBH is 1000 Btu/h; a ton of
 * refrigeration (TR, ton, tons) is 12 000 Btu/h.</li>
 * </ul>
 *
 * <p><b>Writing.</b> {@link #format(double, Dimension, UnitSystem)} writes four significant
 * figures without trailing zeros (temperatures with one decimal instead), in plain notation from
 * 1e-4 to 1e9 and in e-notation outside; the display unit comes from {@link #defaultUnit}.
 *
 * <p>Worked example (repeated in {@code QuantitiesTest.javadocExample}): {@code parse("coil.finPitch",
 * "12 fpi", Dimension.FIN_PITCH)} = 0.00211666667 m, and {@code format(0.00211666667,
 * Dimension.FIN_PITCH, UnitSystem.SI)} = {@code "2.117 mm"}.
 */
public final class Quantities {

    /** The source of the conversion factors. */
    public static final Citation SOURCE = Citation.of("NIST SP 811 (2008)",
            "Thompson, A. and Taylor, B. N., Guide for the Use of the International System of Units (SI), "
                    + "NIST Special Publication 811, 2008 edition, National Institute of Standards and "
                    + "Technology, Gaithersburg, MD, Appendix B.8 (factors for units listed alphabetically) "
                    + "and B.9 (factors for units listed by kind of quantity)");

    /** Significant figures written by {@link #format}. */
    private static final int SIGNIFICANT = 4;

    private static final Pattern QUANTITY = Pattern.compile(
            "([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)(\\s*)(.*)", Pattern.DOTALL);

    private Quantities() {
    }

    /**
     * Reads a quantity.
     *
     * @param field the field the text came from, named in errors (e.g. {@code coil.finPitch})
     * @param text  a number with an optional unit, e.g. {@code "9.52 mm"}, {@code "12 fpi"},
     *              {@code "3 psig"}; a bare number is in the SI unit of {@code dim}
     * @param dim   what the quantity is
     * @return its SI value, in the unit of {@link Dimension#siUnit()}
     * @throws InputException {@link Msg#MISSING} for null or blank text; {@link
     *                        Msg#MALFORMED_QUANTITY} when no number can be read; {@link
     *                        Msg#UNKNOWN_UNIT} (with the accepted units) for a unit that is not one of
     *                        {@code dim}'s; {@link Msg#NOT_A_NUMBER} for a value beyond the range of a
     *                        double; {@link Msg#NOT_POSITIVE} for a fin density that is not positive
     */
    public static double parse(String field, String text, Dimension dim) {
        Objects.requireNonNull(dim, "dim");
        if (text == null || text.isBlank()) {
            throw new InputException(field, Msg.MISSING);
        }
        String t = text.strip().replace('\u2212', '-');
        Matcher m = QUANTITY.matcher(t);
        if (!m.matches()) {
            throw new InputException(field, Msg.MALFORMED_QUANTITY, text);
        }
        String rest = m.group(3);
        if (!rest.isEmpty() && m.group(2).isEmpty() && ".,".indexOf(rest.charAt(0)) >= 0
                || !rest.isEmpty() && Character.isDigit(rest.charAt(0))) {
            throw new InputException(field, Msg.MALFORMED_QUANTITY, text);
        }
        double value = Double.parseDouble(m.group(1));
        if (!Double.isFinite(value)) {
            throw new InputException(field, Msg.NOT_A_NUMBER, text);
        }
        Unit unit = Catalogue.of(dim).find(rest);
        if (unit == null) {
            throw new InputException(field, Msg.UNKNOWN_UNIT, text, acceptedText(dim));
        }
        if (unit.isReciprocal() && !(value > 0)) {
            throw new InputException(field, Msg.NOT_POSITIVE, value);
        }
        double si = unit.toSi(value);
        if (!Double.isFinite(si)) {
            throw new InputException(field, Msg.NOT_A_NUMBER, text);
        }
        return si;
    }

    /**
     * Writes an SI value in the default display unit of a unit system, e.g. 0.00952 m as
     * {@code "9.52 mm"} (SI) or {@code "0.3748 in"} (US), 318.15 K as {@code "45.0 °C"} or
     * {@code "113.0 °F"}.
     *
     * @param si  the value, in the unit of {@link Dimension#siUnit()}
     * @param dim what it is
     * @param sys the unit system to write in
     * @return the text, which {@link #parse} reads back
     * @throws InputException {@link Msg#NOT_A_NUMBER} (field {@code value}) for a non-finite value
     */
    public static String format(double si, Dimension dim, UnitSystem sys) {
        return format(si, dim, sys, null);
    }

    /**
     * Writes an SI value in a given unit; four significant figures without trailing zeros
     * (temperatures: one decimal), e.g. 12 300 W in kW as {@code "12.3 kW"}.
     *
     * @param si   the value, in the unit of {@link Dimension#siUnit()}
     * @param dim  what it is
     * @param sys  the unit system whose default unit is used when {@code unit} is null or blank
     * @param unit the unit to write in (any accepted spelling; the canonical spelling is written)
     * @return the text, which {@link #parse} reads back
     * @throws InputException {@link Msg#UNKNOWN_UNIT} (field {@code unit}) for a unit that is not
     *                        one of {@code dim}'s; {@link Msg#NOT_A_NUMBER} (field {@code value}) for
     *                        a non-finite value; {@link Msg#NOT_POSITIVE} for a fin pitch written as
     *                        a density that is not positive
     */
    public static String format(double si, Dimension dim, UnitSystem sys, String unit) {
        Objects.requireNonNull(dim, "dim");
        Objects.requireNonNull(sys, "sys");
        Unit u = unit == null || unit.isBlank() ? Catalogue.of(dim).display(sys) : unitOf(dim, unit);
        double v = convertFromSi(si, u);
        String number = dim == Dimension.TEMPERATURE ? oneDecimal(v) : significant(v);
        return "-".equals(u.symbol()) ? number : number + " " + u.symbol();
    }

    /**
     * The unit {@link #format(double, Dimension, UnitSystem)} writes in. SI: LENGTH and
     * FIN_PITCH mm, TEMPERATURE °C, TEMPERATURE_DIFFERENCE K, VELOCITY m/s, VOLUME_FLOW m3/h,
     * HEAT_FLOW and POWER kW, PRESSURE kPa, PRESSURE_DIFFERENCE Pa, the others their SI unit or
     * its kilo multiple (kJ/kg, kJ/(kg·K), kJ). US: in, °F (also for differences), ft/min, cfm,
     * Btu/h, psia, in. w.c., fpi, hp, and the Btu-based units.
     *
     * @param dim what the quantity is
     * @param sys the unit system
     * @return the canonical spelling of the display unit
     */
    public static String defaultUnit(Dimension dim, UnitSystem sys) {
        Objects.requireNonNull(dim, "dim");
        Objects.requireNonNull(sys, "sys");
        return Catalogue.of(dim).display(sys).symbol();
    }

    /**
     * Converts an SI value to a unit, e.g. {@code toUnit(0.0254 / 12, FIN_PITCH, "fpi")} = 12.
     *
     * @param si   the value, in the unit of {@link Dimension#siUnit()}
     * @param dim  what it is
     * @param unit the target unit (any accepted spelling)
     * @return the value in {@code unit}
     * @throws InputException {@link Msg#UNKNOWN_UNIT} (field {@code unit}); {@link Msg#NOT_A_NUMBER}
     *                        or, for a fin density, {@link Msg#NOT_POSITIVE} (field {@code value})
     */
    public static double toUnit(double si, Dimension dim, String unit) {
        Objects.requireNonNull(dim, "dim");
        return convertFromSi(si, unitOf(dim, unit));
    }

    /**
     * Converts a value in a unit to SI, e.g. {@code fromUnit(32, TEMPERATURE, "°F")} = 273.15.
     *
     * @param value the value in {@code unit}
     * @param dim   what it is
     * @param unit  its unit (any accepted spelling)
     * @return the value in the unit of {@link Dimension#siUnit()}
     * @throws InputException {@link Msg#UNKNOWN_UNIT} (field {@code unit}); {@link Msg#NOT_A_NUMBER}
     *                        or, for a fin density, {@link Msg#NOT_POSITIVE} (field {@code value})
     */
    public static double fromUnit(double value, Dimension dim, String unit) {
        Objects.requireNonNull(dim, "dim");
        Unit u = unitOf(dim, unit);
        if (!Double.isFinite(value)) {
            throw new InputException("value", Msg.NOT_A_NUMBER, value);
        }
        if (u.isReciprocal() && !(value > 0)) {
            throw new InputException("value", Msg.NOT_POSITIVE, value);
        }
        double si = u.toSi(value);
        if (!Double.isFinite(si)) {
            throw new InputException("value", Msg.NOT_A_NUMBER, si);
        }
        return si;
    }

    /**
     * The canonical spellings of the units of a dimension, SI unit first (other spellings of
     * each are also read).
     *
     * @param dim a dimension
     * @return its units' canonical spellings
     */
    public static List<String> accepted(Dimension dim) {
        Objects.requireNonNull(dim, "dim");
        List<String> out = new ArrayList<>();
        for (Unit u : Catalogue.of(dim).units()) {
            out.add(u.symbol());
        }
        return List.copyOf(out);
    }

    private static String acceptedText(Dimension dim) {
        return String.join(", ", accepted(dim));
    }

    private static Unit unitOf(Dimension dim, String unit) {
        if (unit == null) {
            throw new InputException("unit", Msg.MISSING);
        }
        Unit u = Catalogue.of(dim).find(unit);
        if (u == null) {
            throw new InputException("unit", Msg.UNKNOWN_UNIT, unit, acceptedText(dim));
        }
        return u;
    }

    private static double convertFromSi(double si, Unit u) {
        if (!Double.isFinite(si)) {
            throw new InputException("value", Msg.NOT_A_NUMBER, si);
        }
        if (u.isReciprocal() && !(si > 0)) {
            throw new InputException("value", Msg.NOT_POSITIVE, si);
        }
        double v = u.fromSi(si);
        if (!Double.isFinite(v)) {
            throw new InputException("value", Msg.NOT_A_NUMBER, v);
        }
        return v;
    }

    /** Four significant figures, no trailing zeros; e-notation below 1e-4 and from 1e9. */
    static String significant(double v) {
        if (v == 0) {
            return "0";
        }
        BigDecimal r = BigDecimal.valueOf(v).round(new MathContext(SIGNIFICANT, RoundingMode.HALF_UP))
                .stripTrailingZeros();
        double a = Math.abs(r.doubleValue());
        if (a >= 1e-4 && a < 1e9) {
            return r.toPlainString();
        }
        int exponent = r.precision() - r.scale() - 1;
        return r.movePointLeft(exponent).stripTrailingZeros().toPlainString() + "e" + exponent;
    }

    /** One decimal, as temperatures are written. */
    static String oneDecimal(double v) {
        String s = BigDecimal.valueOf(v).setScale(1, RoundingMode.HALF_UP).toPlainString();
        return "-0.0".equals(s) ? "0.0" : s;
    }
}
