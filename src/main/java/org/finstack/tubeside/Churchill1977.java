package org.finstack.tubeside;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Churchill's (1977) single equation for the Darcy friction factor of round tubes, spanning the
 * laminar, transition and turbulent regimes:
 * <pre>
 *   f = 8 [ (8/Re)^12 + (A + B)^-1.5 ]^(1/12)
 *   A = { 2.457 ln[ 1 / ((7/Re)^0.9 + 0.27 e/D) ] }^16
 *   B = (37530 / Re)^16
 * </pre>
 * where Re [-] is the Reynolds number and e/D [-] the relative roughness (0 for a smooth tube).
 * It reproduces 64/Re in laminar flow and the Colebrook equation in turbulent flow; in between
 * it is an interpolation (Churchill gives no accuracy for the transition region).
 *
 * <p>Validity: the equation is defined for every Re &gt; 0; no range or scatter is published.
 * A warning is raised for e/D above 0.05, the largest roughness of the Colebrook-Moody data
 * it is built on.
 *
 * <p>Worked example: Re = 1e5, e/D = 1e-4 gives f = 0.0184626 (the same value as the
 * {@code fluids} library's {@code Churchill_1977(1E5, 1E-4)} docstring).
 */
public final class Churchill1977 {

    /** The paper. */
    public static final Citation SOURCE = Citation.of("Churchill 1977",
            "Churchill, S.W., 1977, \"Friction-factor equation spans all fluid-flow regimes\","
                    + " Chemical Engineering 84(24):91-92");

    /** Roughness range of the underlying Moody-chart data (Moody 1944, Trans. ASME 66:671). */
    public static final Validity VALIDITY = Validity.of(
            Limit.of("e/D", 0, 0.05)); // Moody 1944 chart range of relative roughness

    /** A smooth tube. */
    public static final DarcyFriction SMOOTH = re -> darcy(re, 0, Warnings.discard());

    private static final String METHOD = "Churchill 1977";

    private Churchill1977() {
    }

    /**
     * @param reynolds           Reynolds number [-], positive
     * @param relativeRoughness  e/D [-], not negative
     * @param w                  where range warnings go
     * @return Darcy friction factor [-]
     */
    public static double darcy(double reynolds, double relativeRoughness, Warnings w) {
        Check.positive("reynolds", reynolds);
        Check.nonNegative("relativeRoughness", relativeRoughness);
        VALIDITY.check(METHOD, "e/D", relativeRoughness, w);
        double a = Math.pow(2.457 * Math.log(1 / (Math.pow(7 / reynolds, 0.9) + 0.27 * relativeRoughness)), 16);
        double b = Math.pow(37530 / reynolds, 16); // Churchill 1977
        return 8 * Math.pow(Math.pow(8 / reynolds, 12) + Math.pow(a + b, -1.5), 1.0 / 12);
    }
}
