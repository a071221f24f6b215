package org.finstack.study.pressure;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Refrigerant charge limits for a room of EN 378-1 Annex C: the practical-limit rule, the flammability
 * thresholds m1, m2, m3 and the room formula for flammable refrigerants (the same room formula
 * stands in IEC 60335-2-40 Annex GG, from memory).
 *
 * <pre>
 *   m_PL = PL x V                                        (practical limit, every class)
 *   m1 = 4 m3 x LFL,  m2 = 26 m3 x LFL,  m3 = 130 m3 x LFL
 *   m_max = 2.5 x LFL^(5/4) x h0 x A^(1/2)               (room formula, for m1 &lt; m &lt;= m2)
 * </pre>
 *
 * <ul>
 *   <li>{@code PL} practical limit [kg/m3]; {@code V} room volume [m3];</li>
 *   <li>{@code LFL} lower flammability limit [kg/m3];</li>
 *   <li>{@code h0} release height [m]: 0.6 floor-standing, 1.0 window-mounted, 1.8
 *       wall-mounted, 2.2 ceiling-mounted ({@link ReleaseHeight}, from memory);</li>
 *   <li>{@code A} room floor area [m2]; {@code m_max} [kg] (the constant 2.5 carries the unit
 *       m^(7/4) kg^(-1/4) that makes the formula come out in kg).</li>
 * </ul>
 *
 * <p>Validity: the room formula serves charges between m1 and m2 and the tabulated release
 * heights 0.6 m to 2.2 m (warning outside). Below m1 the flammability of the charge sets no room
 * size; above m2 the installation needs the further measures of EN 378 (outside this screen). A
 * standard's rule, not a fitted correlation: no scatter to state. The factors 4, 26, 130 and 2.5
 * and the heights are recalled (from memory); two checks were read: the R290 split-system limit
 * of 988 g under IEC 60335-2-40 equals m2 = 26 x 0.038 (ASERCOM 2019), and the 150 g threshold
 * of a manual quoting EN 378 equals m1 = 4 x 0.038 = 0.152 kg within rounding.
 *
 * <p>Worked example: R290 (LFL 0.038 kg/m3), wall-mounted (h0 = 1.8 m), room of 20 m2:
 * m_max = 2.5 x 0.038^1.25 x 1.8 x 20^0.5 = 0.33764 kg; m1 = 0.152 kg, m2 = 0.988 kg.
 */
public final class En378Part1AnnexC {

    /** The standard. */
    public static final Citation SOURCE = Citation.of("EN 378-1 Annex C",
            "EN 378-1:2016+A1:2020, Refrigerating systems and heat pumps - Safety and environmental "
                    + "requirements - Part 1: Basic requirements, definitions, classification and selection "
                    + "criteria, Annex C (normative), Requirements for refrigerant charge limits in occupied "
                    + "spaces (formulas and factors from memory); the room formula as in IEC 60335-2-40:2018 "
                    + "Annex GG (from memory)");

    /** Range of the room formula's release height [m], the tabulated heights (from memory). */
    public static final Validity VALIDITY = Validity.of(Limit.of("h0", 0.6, 2.2, "m"));

    /** Volume factor of m1 [m3] (from memory). */
    public static final double M1_VOLUME = 4;
    /** Volume factor of m2 [m3] (from memory). */
    public static final double M2_VOLUME = 26;
    /** Volume factor of m3 [m3] (from memory). */
    public static final double M3_VOLUME = 130;
    /** Constant of the room formula [m^(7/4) kg^(-1/4)] (from memory). */
    public static final double ROOM_CONSTANT = 2.5;

    private static final String METHOD = "EN 378-1 Annex C room formula";

    /** Release heights h0 tabulated with the room formula (from memory). */
    public enum ReleaseHeight {
        /** Floor-standing unit: 0.6 m. */
        FLOOR(0.6),
        /** Window-mounted unit: 1.0 m. */
        WINDOW(1.0),
        /** Wall-mounted unit: 1.8 m. */
        WALL(1.8),
        /** Ceiling-mounted unit: 2.2 m. */
        CEILING(2.2);

        private final double height;

        ReleaseHeight(double height) {
            this.height = height;
        }

        /** @return the release height h0 [m] */
        public double height() {
            return height;
        }
    }

    private En378Part1AnnexC() {
    }

    /**
     * @param lfl lower flammability limit [kg/m3]
     * @return m1 = 4 m3 x LFL [kg]: up to it, flammability sets no room size
     */
    public static double m1(double lfl) {
        return M1_VOLUME * Check.positive("refrigerant.lfl", lfl);
    }

    /**
     * @param lfl lower flammability limit [kg/m3]
     * @return m2 = 26 m3 x LFL [kg]: the largest charge the room formula covers
     */
    public static double m2(double lfl) {
        return M2_VOLUME * Check.positive("refrigerant.lfl", lfl);
    }

    /**
     * @param lfl lower flammability limit [kg/m3]
     * @return m3 = 130 m3 x LFL [kg]
     */
    public static double m3(double lfl) {
        return M3_VOLUME * Check.positive("refrigerant.lfl", lfl);
    }

    /**
     * Largest charge of a flammable refrigerant for a room by the room formula.
     *
     * @param lfl           lower flammability limit [kg/m3]
     * @param releaseHeight release height h0 [m]
     * @param floorArea     room floor area A [m2]
     * @param warnings      receives a warning for h0 outside 0.6 m to 2.2 m
     * @return m_max [kg]
     */
    public static double roomFormulaMaxCharge(double lfl, double releaseHeight, double floorArea, Warnings warnings) {
        Check.positive("refrigerant.lfl", lfl);
        Check.positive("room.releaseHeight", releaseHeight);
        Check.positive("room.floorArea", floorArea);
        VALIDITY.check(METHOD, "h0", releaseHeight, warnings);
        return ROOM_CONSTANT * Math.pow(lfl, 1.25) * releaseHeight * Math.sqrt(floorArea);
    }

    /**
     * Smallest floor area for a charge by the room formula solved for A.
     *
     * @param charge        refrigerant charge [kg]
     * @param lfl           lower flammability limit [kg/m3]
     * @param releaseHeight release height h0 [m]
     * @return A_min = (m / (2.5 x LFL^(5/4) x h0))^2 [m2]
     */
    public static double minimumFloorArea(double charge, double lfl, double releaseHeight) {
        Check.positive("charge", charge);
        Check.positive("refrigerant.lfl", lfl);
        Check.positive("room.releaseHeight", releaseHeight);
        double r = charge / (ROOM_CONSTANT * Math.pow(lfl, 1.25) * releaseHeight);
        return r * r;
    }

    /**
     * Largest charge by the practical limit (set by toxicity or, for many flammable refrigerants,
     * by flammability).
     *
     * @param practicalLimit practical limit [kg/m3]
     * @param roomVolume     room volume [m3]
     * @return PL x V [kg]
     */
    public static double practicalLimitMaxCharge(double practicalLimit, double roomVolume) {
        return Check.positive("refrigerant.practicalLimit", practicalLimit) * Check.positive("room.volume", roomVolume);
    }
}
