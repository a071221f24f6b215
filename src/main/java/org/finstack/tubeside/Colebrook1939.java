package org.finstack.tubeside;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.ConvergenceException;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * The Colebrook (1939) equation for the Darcy friction factor of turbulent flow in round tubes:
 * <pre>
 *   1/sqrt(f) = -2 log10( (e/D)/3.7 + 2.51 / (Re sqrt(f)) )
 * </pre>
 * where Re [-] is the Reynolds number and e/D [-] the relative roughness. Solved for
 * y = 1/sqrt(f) by Newton's method from the smooth-tube start y = 7, at most
 * {@value #MAX_ITERATIONS} iterations to a relative step below {@value #TOLERANCE};
 * otherwise a {@link ConvergenceException}.
 *
 * <p>Validity: turbulent flow; a warning below Re = 4000 (where the Moody chart starts its
 * turbulent zone) or above e/D = 0.05. Colebrook gives no scatter; the equation is the basis
 * of the Moody (1944) chart, which Moody stated as accurate to about ±5 % for smooth pipes and
 * ±10 % for rough ones (Moody 1944, Trans. ASME 66:671, from memory); F.M. White's Fluid
 * Mechanics puts the chart at about ±15 % for design calculations.
 *
 * <p>Worked example: Re = 1e5, e/D = 1e-4 gives f = 0.0185139 (the same value as the
 * {@code fluids} library's {@code Clamond(1E5, 1E-4)} docstring).
 */
public final class Colebrook1939 {

    /** The paper. */
    public static final Citation SOURCE = Citation.of("Colebrook 1939",
            "Colebrook, C.F., 1939, \"Turbulent flow in pipes, with particular reference to the transition"
                    + " region between the smooth and rough pipe laws\", J. Inst. Civil Eng. 11(4):133-156");

    /** Turbulent range of the Moody (1944) chart. */
    public static final Validity VALIDITY = Validity.of(
            Limit.of("Re", 4000, 1e8), // Moody 1944 chart, turbulent zone
            Limit.of("e/D", 0, 0.05)); // Moody 1944 chart range of relative roughness

    /** A smooth tube. */
    public static final DarcyFriction SMOOTH = re -> darcy(re, 0, Warnings.discard());

    /** Iteration bound. */
    public static final int MAX_ITERATIONS = 50;
    /** Relative step at which the iteration stops. */
    public static final double TOLERANCE = 1e-13;

    private static final String METHOD = "Colebrook 1939";
    private static final double LN10 = Math.log(10);

    private Colebrook1939() {
    }

    /**
     * @param reynolds          Reynolds number [-], positive
     * @param relativeRoughness e/D [-], not negative
     * @param w                 where range warnings go
     * @return Darcy friction factor [-]
     * @throws ConvergenceException if Newton's method does not settle
     */
    public static double darcy(double reynolds, double relativeRoughness, Warnings w) {
        Check.positive("reynolds", reynolds);
        Check.nonNegative("relativeRoughness", relativeRoughness);
        VALIDITY.check(METHOD, "Re", reynolds, w);
        VALIDITY.check(METHOD, "e/D", relativeRoughness, w);
        double a = relativeRoughness / 3.7; // Colebrook 1939
        double b = 2.51 / reynolds; // Colebrook 1939
        double y = 7;
        double residual = Double.NaN;
        for (int i = 1; i <= MAX_ITERATIONS; i++) {
            double arg = a + b * y;
            double g = y + 2 * Math.log(arg) / LN10;
            double dg = 1 + 2 * b / (arg * LN10);
            double next = y - g / dg;
            if (!(next > 0)) {
                next = y / 2;
            }
            residual = Math.abs(next - y) / next;
            y = next;
            if (residual < TOLERANCE) {
                return 1 / (y * y);
            }
        }
        throw new ConvergenceException("Colebrook friction factor", MAX_ITERATIONS, residual);
    }
}
