package org.finstack.tubeside;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Chisholm's (1983) two-phase pressure drop of a bend: the liquid-only bend loss times a
 * two-phase multiplier of his B-coefficient form with the homogeneous exponent (n = 0):
 * <pre>
 *   dp    = phi_lo^2 K_lo G^2 / (2 rho_l)
 *   phi_lo^2 = 1 + (rho_l/rho_v - 1) [ B x (1-x) + x^2 ]
 *   B     = 1 + 2.2 / (K_lo (2 + r/d))
 * </pre>
 * K_lo [-] is the single-phase loss coefficient of the bend with all the flow as liquid,
 * from {@link Rennels2012Bend} with the Churchill (1977) smooth-tube Darcy factor at
 * Re_lo = G d / mu_l; x [-] quality, G [kg/(m2 s)] mass flux, r [m] centre-line radius,
 * d [m] inner diameter. Chisholm states B for 90° bends with K_90 and extends it to other
 * angles by using that bend's own K, which is what the formula above does (from memory). For
 * B &gt; 2 (tight bends with small K_lo) the multiplier peaks at x = B / (2 (B - 1)) and falls
 * towards rho_l/rho_v at x = 1, as the form gives it.
 *
 * <p>Validity: r/d as for {@link Rennels2012Bend}. Chisholm gives no scatter for bends
 * (from memory); return-bend data for refrigerants (e.g. Domanski &amp; Hermes 2008) scatter
 * widely about any such method.
 *
 * <p>Worked example (fixture R134a at about 5 °C): d = 8 mm, r = 12 mm (r/d = 1.5), 180°,
 * G = 200 kg/(m2 s), x = 0.5 give dp = 442.612 Pa.
 */
public final class Chisholm1983Bend {

    /** The book. */
    public static final Citation SOURCE = Citation.of("Chisholm 1983",
            "Chisholm, D., 1983, Two-Phase Flow in Pipelines and Heat Exchangers, George Godwin, London,"
                    + " chapter on bends and fittings");

    /** Range of r/d, as for the single-phase coefficient. */
    public static final Validity VALIDITY = Rennels2012Bend.VALIDITY;

    private Chisholm1983Bend() {
    }

    /**
     * @param p            properties
     * @param f            flow at the bend (heat flux ignored)
     * @param bendRadius   centre-line radius r [m]
     * @param angleDegrees bend angle [degree] (180 for a return bend)
     * @param w            where range warnings go
     * @return pressure drop across the bend [Pa]
     */
    public static double pressureDrop(SaturatedProperties p, TubeFlow f, double bendRadius, double angleDegrees,
            Warnings w) {
        Check.positive("bendRadius", bendRadius);
        double rd = bendRadius / f.diameter();
        double relo = Tube.reynolds(f.massFlux(), f.diameter(), p.liquidViscosity());
        double klo = Rennels2012Bend.lossCoefficient(Churchill1977.darcy(relo, 0, w), angleDegrees, rd, w);
        double g = f.massFlux();
        return multiplier(p, f.quality(), klo, rd) * klo * g * g / (2 * p.liquidDensity());
    }

    /**
     * @param p                  properties
     * @param quality            quality [-]
     * @param liquidOnlyK        liquid-only loss coefficient of the bend [-]
     * @param radiusOverDiameter r/d [-]
     * @return the two-phase multiplier phi_lo^2 [-]
     */
    public static double multiplier(SaturatedProperties p, double quality, double liquidOnlyK,
            double radiusOverDiameter) {
        Check.within("quality", quality, 0, 1);
        Check.positive("liquidOnlyK", liquidOnlyK);
        Check.positive("radiusOverDiameter", radiusOverDiameter);
        double b = 1 + 2.2 / (liquidOnlyK * (2 + radiusOverDiameter)); // Chisholm 1983
        double x = quality;
        return 1 + (p.liquidDensity() / p.vapourDensity() - 1) * (b * x * (1 - x) + x * x); // Chisholm 1983
    }
}
