package org.finstack.tubeside;

import java.util.Objects;

import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Limit;
import org.finstack.core.Msg;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Friedel's (1979) two-phase multiplier for the frictional pressure gradient in horizontal and
 * vertical upward flow:
 * <pre>
 *   -dp/dz  = phi_lo^2 (-dp/dz)_lo,   (-dp/dz)_lo = f_lo G^2 / (2 D rho_l)
 *   phi_lo^2 = E + 3.24 F H / (Fr^0.045 We^0.035)
 *   E  = (1-x)^2 + x^2 (rho_l f_vo) / (rho_v f_lo)
 *   F  = x^0.78 (1-x)^0.224
 *   H  = (rho_l/rho_v)^0.91 (mu_v/mu_l)^0.19 (1 - mu_v/mu_l)^0.7
 *   Fr = G^2 / (g D rho_H^2),  We = G^2 D / (sigma rho_H),  rho_H = (x/rho_v + (1-x)/rho_l)^-1
 * </pre>
 * f_lo, f_vo [-] are the Darcy friction factors of liquid and vapour flowing alone at the total
 * mass flux G [kg/(m2 s)] (Re = G D / mu), from the {@link DarcyFriction} law of this instance
 * ({@link Churchill1977#SMOOTH} by default). x [-] quality, D [m] inner diameter, sigma [N/m]
 * surface tension, g [m/s2] standard gravity. At x = 0 it gives the liquid-only gradient, at
 * x = 1 the vapour-only gradient.
 *
 * <p>The Froude exponent is 0.045 as restated in Thome's Engineering Data Book III (2004); the
 * {@code fluids} library's {@code Friedel} notes list that book among the sources printing 0.045
 * and use 0.0454, which they find in Whalley (1987) and Ghiaasiaan (2007) and take to be the
 * original. The two differ by under 0.3 % for 1e-3 &lt; Fr &lt; 1e3.
 *
 * <p>Validity: mu_l/mu_v below 1000 (the {@code fluids} library's {@code Friedel} notes: known to
 * work poorly above that). Published scatter: a standard deviation of about 30 % for
 * one-component flows over a data bank of some 25 000 points (from memory); the same notes give
 * mean errors on the order of 40 %.
 *
 * <p>Worked example (fixture R134a at about 5 °C, Churchill smooth-tube friction): D = 8 mm,
 * G = 200 kg/(m2 s), x = 0.5 give -dp/dz = 2429.03 Pa/m.
 */
public final class Friedel1979 implements TwoPhaseFriction {

    /** Identifier in {@link TwoPhaseFrictions}. */
    public static final String ID = "friedel-1979";

    /** The paper. */
    public static final Citation SOURCE = Citation.of("Friedel 1979",
            "Friedel, L., 1979, \"Improved friction pressure drop correlations for horizontal and vertical two-phase"
                    + " pipe flow\", European Two-Phase Flow Group Meeting, Ispra, paper E2");

    /** Recommended range. */
    public static final Validity VALIDITY = Validity.of(
            Limit.of("mu_l/mu_v", 1, 1000)); // fluids library, Friedel notes

    /** The default instance, with {@link Churchill1977#SMOOTH}. */
    public static final Friedel1979 INSTANCE = new Friedel1979(Churchill1977.SMOOTH);

    private static final String METHOD = "Friedel 1979";

    private final DarcyFriction friction;

    private Friedel1979(DarcyFriction friction) {
        this.friction = friction;
    }

    /**
     * @param friction the single-phase friction law for f_lo and f_vo
     * @return Friedel's method with that law
     */
    public static Friedel1979 withFriction(DarcyFriction friction) {
        return new Friedel1979(Objects.requireNonNull(friction, "friction"));
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public Citation source() {
        return SOURCE;
    }

    @Override
    public Validity validity() {
        return VALIDITY;
    }

    @Override
    public DarcyFriction friction() {
        return friction;
    }

    @Override
    public double gradient(SaturatedProperties p, TubeFlow f, Warnings w) {
        double rl = p.liquidDensity();
        double rv = p.vapourDensity();
        double ml = p.liquidViscosity();
        double mv = p.vapourViscosity();
        if (!(mv < ml)) {
            throw new InputException("vapourViscosity", Msg.NOT_BELOW, mv, ml);
        }
        VALIDITY.check(METHOD, "mu_l/mu_v", ml / mv, w);
        double g = f.massFlux();
        double d = f.diameter();
        double x = f.quality();
        double flo = friction.darcy(Tube.reynolds(g, d, ml));
        double fvo = friction.darcy(Tube.reynolds(g, d, mv));
        double dplo = flo * g * g / (2 * d * rl);
        double e = (1 - x) * (1 - x) + x * x * rl * fvo / (rv * flo); // Friedel 1979
        double ff = Math.pow(x, 0.78) * Math.pow(1 - x, 0.224); // Friedel 1979
        double h = Math.pow(rl / rv, 0.91) * Math.pow(mv / ml, 0.19) * Math.pow(1 - mv / ml, 0.7); // Friedel 1979
        double rh = 1 / (x / rv + (1 - x) / rl);
        double fr = g * g / (Tube.GRAVITY * d * rh * rh);
        double we = g * g * d / (p.surfaceTension() * rh);
        double phi2 = e + 3.24 * ff * h / (Math.pow(fr, 0.045) * Math.pow(we, 0.035)); // Friedel 1979
        return Tube.finitePositive(phi2 * dplo, METHOD);
    }
}
