package org.finstack.tubeside;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Single-phase loss coefficient of a smooth round bend (Rennels &amp; Hudson 2012), built from
 * Ito's data:
 * <pre>
 *   K = f a (r/d) + (0.10 + 2.4 f) sin(a/2) + 6.6 f (sqrt(sin(a/2)) + sin(a/2)) / (r/d)^(4a/pi)
 * </pre>
 * with f [-] the Darcy friction factor of the straight tube at the flow's Reynolds number,
 * a [rad] the bend angle (pi for a return bend), r [m] the centre-line bend radius and d [m] the
 * inner diameter. The pressure loss is K G^2 / (2 rho). K includes the friction of the bend's
 * own developed length (the first term); the length of a return bend should therefore not also
 * be counted as straight tube.
 *
 * <p>Validity: r/d from 0.5 upward (a sharp inner edge) and bend angles from 0 to 180°, as
 * Rennels &amp; Hudson state for the formula, which they fitted to smooth-pipe data; restated in
 * the {@code fluids} library's {@code bend_rounded} notes. A warning below r/d = 0.5; the
 * authors give no upper limit. No scatter figure is restated here.
 *
 * <p>Worked example: f = 0.02, a = 180°, r/d = 1.5 give K = 0.294396 (the same formula as the
 * {@code fluids} library's {@code bend_rounded(method='Rennels')}).
 */
public final class Rennels2012Bend {

    /** The handbook. */
    public static final Citation SOURCE = Citation.of("Rennels & Hudson 2012",
            "Rennels, D.C., Hudson, H.M., 2012, Pipe Flow: A Practical and Comprehensive Guide, Wiley,"
                    + " chapter 15 (bends)");

    /** Published range (the angle range is enforced as an input check). */
    public static final Validity VALIDITY = Validity.of(
            Limit.of("r/d", 0.5, Double.MAX_VALUE)); // Rennels & Hudson 2012; fluids, bend_rounded notes

    private static final String METHOD = "Rennels & Hudson 2012 bend";

    private Rennels2012Bend() {
    }

    /**
     * @param darcy              Darcy friction factor of the straight tube [-]
     * @param angleDegrees       bend angle [degree], above 0 and at most 180
     * @param radiusOverDiameter centre-line radius over inner diameter r/d [-]
     * @param w                  where range warnings go
     * @return loss coefficient K [-]
     */
    public static double lossCoefficient(double darcy, double angleDegrees, double radiusOverDiameter, Warnings w) {
        Check.positive("darcy", darcy);
        Check.within("angle", angleDegrees, 1e-9, 180);
        Check.positive("radiusOverDiameter", radiusOverDiameter);
        VALIDITY.check(METHOD, "r/d", radiusOverDiameter, w);
        double a = Math.toRadians(angleDegrees);
        double s = Math.sin(a / 2);
        return darcy * a * radiusOverDiameter + (0.10 + 2.4 * darcy) * s // Rennels & Hudson 2012
                + 6.6 * darcy * (Math.sqrt(s) + s) / Math.pow(radiusOverDiameter, 4 * a / Math.PI);
    }
}
