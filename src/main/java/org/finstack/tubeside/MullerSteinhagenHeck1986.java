package org.finstack.tubeside;

import java.util.Objects;

import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Müller-Steinhagen &amp; Heck's (1986) frictional pressure gradient, an interpolation between
 * the liquid-only and vapour-only gradients:
 * <pre>
 *   -dp/dz = Lambda (1-x)^(1/3) + B x^3,   Lambda = A + 2 (B - A) x
 *   A = f_lo G^2 / (2 D rho_l),   B = f_vo G^2 / (2 D rho_v)
 * </pre>
 * f_lo, f_vo [-] are the Darcy friction factors of liquid and vapour flowing alone at the total
 * mass flux G [kg/(m2 s)] (Re = G D / mu) from this instance's {@link DarcyFriction} law
 * ({@link Churchill1977#SMOOTH} by default; the paper used 64/Re and Blasius). x [-] quality,
 * D [m] inner diameter. At x = 0 it is A, at x = 1 it is B.
 *
 * <p>Validity: the paper's data bank (about 9300 points, many fluids and pipe sizes) is not
 * restated here; only the quality range is checked. Its accuracy figures were not read here.
 *
 * <p>Worked example (fixture R134a at about 5 °C, Churchill smooth-tube friction): D = 8 mm,
 * G = 200 kg/(m2 s), x = 0.5 give -dp/dz = 2220.99 Pa/m.
 */
public final class MullerSteinhagenHeck1986 implements TwoPhaseFriction {

    /** Identifier in {@link TwoPhaseFrictions}. */
    public static final String ID = "muller-steinhagen-heck-1986";

    /** The paper. */
    public static final Citation SOURCE = Citation.of("Müller-Steinhagen & Heck 1986",
            "Müller-Steinhagen, H., Heck, K., 1986, \"A simple friction pressure drop correlation for two-phase"
                    + " flow in pipes\", Chem. Eng. Process. 20(6):297-308");

    /** Range of the equation form (the paper's data-bank range is not restated). */
    public static final Validity VALIDITY = Validity.assessed("of the equation form", Limit.of("x", 0, 1));

    /** The default instance, with {@link Churchill1977#SMOOTH}. */
    public static final MullerSteinhagenHeck1986 INSTANCE = new MullerSteinhagenHeck1986(Churchill1977.SMOOTH);

    private static final String METHOD = "Müller-Steinhagen & Heck 1986";

    private final DarcyFriction friction;

    private MullerSteinhagenHeck1986(DarcyFriction friction) {
        this.friction = friction;
    }

    /**
     * @param friction the single-phase friction law
     * @return the method with that law
     */
    public static MullerSteinhagenHeck1986 withFriction(DarcyFriction friction) {
        return new MullerSteinhagenHeck1986(Objects.requireNonNull(friction, "friction"));
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
        double x = f.quality();
        double a = TwoPhaseFriction.singlePhaseGradient(friction, f.massFlux(), f.diameter(), p.liquidDensity(),
                p.liquidViscosity());
        double b = TwoPhaseFriction.singlePhaseGradient(friction, f.massFlux(), f.diameter(), p.vapourDensity(),
                p.vapourViscosity());
        double lambda = a + 2 * (b - a) * x; // Müller-Steinhagen & Heck 1986
        return Tube.finitePositive(lambda * Math.cbrt(1 - x) + b * x * x * x, METHOD);
    }
}
