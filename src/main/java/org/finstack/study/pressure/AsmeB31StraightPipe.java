package org.finstack.study.pressure;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Limit;
import org.finstack.core.Msg;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Allowable internal pressure of a straight round tube by the pressure-design rule of the ASME
 * B31 piping codes (ASME B31.5, Refrigeration Piping, para. 504.1.2; the same rule stands in
 * ASME B31.1 and B31.3), in the form the Copper Development Association prints for copper tube.
 *
 * <p>The code gives the pressure-design thickness {@code t = P D / (2 (S E + P Y)) + c}; solved
 * for the pressure:
 *
 * <pre>
 *   P = 2 S E (t - c) / (D - 2 Y (t - c)),   Y = 0.4
 * </pre>
 *
 * which for copper ({@code E = 1}, {@code c = 0}) is the handbook's
 * {@code P = 2 S t / (D - 0.8 t)}.
 *
 * <ul>
 *   <li>{@code S} maximum allowable stress in tension at the design temperature [Pa];</li>
 *   <li>{@code E} longitudinal joint (quality) factor [-]: 1.0 for seamless tube;</li>
 *   <li>{@code D} outside diameter [m];</li>
 *   <li>{@code t} wall thickness [m]; the code uses the minimum wall (nominal less the mill
 *       tolerance) and the maximum outside diameter, so nominal dimensions give a rating higher
 *       by roughly the wall tolerance (about 10 % for ASTM copper tube);</li>
 *   <li>{@code c} corrosion, erosion and thread allowance [m]: zero for copper (the handbook
 *       notes the B31 codes permit it), to be chosen for steel;</li>
 *   <li>{@code Y} = 0.4, the coefficient the codes tabulate for ductile metals below 900 F
 *       (from memory).</li>
 * </ul>
 *
 * <p>Validity: the formula is the codes' thin-wall rule, for {@code t < D/6}; thicker walls need
 * the codes' special consideration (a warning is raised and the value is still returned). A
 * code design rule, not a fitted correlation: there is no scatter to state. The handbook warns
 * that the calculated rating underestimates the actual safe performance of thin-wall tube (D/t
 * above about 10), such as the tubes of finned coils; makers rate coils by pressure and burst
 * tests instead.
 *
 * <p>Worked example: 3/8 in (9.525 mm) outside diameter, 0.030 in (0.762 mm) wall, annealed copper
 * at 100 F (S = 6000 psi = 41.369 MPa), E = 1, c = 0:
 * P = 2 x 6000 x 0.030 / (0.375 - 0.8 x 0.030) = 1025.6 psi = 7.0715 MPa.
 */
public final class AsmeB31StraightPipe {

    /** The rule's sources. */
    public static final Citation SOURCE = Citation.of("ASME B31.5 para. 504.1.2",
            "ASME B31.5-2019, Refrigeration Piping and Heat Transfer Components, ASME Code for Pressure "
                    + "Piping B31, The American Society of Mechanical Engineers, New York, 2020, para. 504.1.2 "
                    + "(pressure design of straight pipe under internal pressure; paragraph number and "
                    + "coefficient Y = 0.4 from memory); printed as P = 2 S t_min / (D_max - 0.8 t_min) in "
                    + "Copper Development Association, The Copper Tube Handbook (CDA Publication A4015-14/16), "
                    + "'Pressure Ratings and Burst Strength' (read)");

    /** Thin-wall range of the rule: wall over outside diameter below one sixth. */
    public static final Validity VALIDITY = Validity.of(Limit.of("t/D", 0, 1.0 / 6));

    /** Coefficient Y of the thickness formula for ductile metals below 900 F (from memory). */
    public static final double Y = 0.4;

    private static final String METHOD = "ASME B31 straight-pipe pressure design";

    private AsmeB31StraightPipe() {
    }

    /**
     * Allowable internal gauge pressure of a straight tube.
     *
     * @param allowableStress    maximum allowable stress S at the design temperature [Pa]
     * @param jointFactor        longitudinal joint factor E, 0 &lt; E &lt;= 1 [-] (1 for seamless)
     * @param outsideDiameter    outside diameter D [m]
     * @param wall               wall thickness t [m], below D/2
     * @param corrosionAllowance allowance c [m], 0 &lt;= c &lt; t
     * @param warnings           receives a warning when t - c reaches D/6
     * @return the allowable internal gauge pressure [Pa]
     * @throws InputException naming the offending argument
     */
    public static double allowablePressure(double allowableStress, double jointFactor, double outsideDiameter,
            double wall, double corrosionAllowance, Warnings warnings) {
        Check.positive("allowableStress", allowableStress);
        Check.positive("jointFactor", jointFactor);
        if (jointFactor > 1) {
            throw new InputException("jointFactor", Msg.OUT_OF_BOUNDS, jointFactor, 0.0, 1.0);
        }
        Check.positive("outsideDiameter", outsideDiameter);
        Check.positive("wall", wall);
        if (wall >= outsideDiameter / 2) {
            throw new InputException("wall", Msg.WALL_NOT_BELOW_RADIUS, wall, outsideDiameter / 2);
        }
        Check.nonNegative("corrosionAllowance", corrosionAllowance);
        if (corrosionAllowance >= wall) {
            throw new InputException("corrosionAllowance", Msg.NOT_BELOW, corrosionAllowance, wall);
        }
        double t = wall - corrosionAllowance;
        VALIDITY.check(METHOD, "t/D", t / outsideDiameter, warnings);
        // t < D/2 and Y = 0.4 keep the denominator above 0.6 D
        return 2 * allowableStress * jointFactor * t / (outsideDiameter - 2 * Y * t);
    }
}
