package org.finstack.tubeside;

import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Rouhani &amp; Axelsson's (1970) drift-flux void fraction, in the form with the distribution
 * parameter C0 = 1 + 0.2 (1-x):
 * <pre>
 *   alpha = (x/rho_v) [ C0 (x/rho_v + (1-x)/rho_l) + 1.18 (1-x) [g sigma (rho_l - rho_v)]^0.25 / (G rho_l^0.5) ]^-1
 * </pre>
 * with x [-] the quality, rho [kg/m3] the saturated densities, sigma [N/m] the surface tension,
 * g [m/s2] standard gravity and G [kg/(m2 s)] the mass flux. For horizontal tubes Steiner (1993)
 * replaced 0.2 by 0.12 ({@link Steiner1993}).
 *
 * <p>Validity: the form holds for 0 &le; x &le; 1. The {@code fluids} documentation notes that
 * this expression, as quoted by later reviews, could not be found verbatim in the 1970 paper;
 * the paper's accuracy figures were not read here.
 *
 * <p>Worked example: x = 0.4, rho_l = 800, rho_v = 2.5 kg/m3, sigma = 0.02 N/m, mass flow
 * 1 kg/s in D = 0.3 m give alpha = 0.858842 (the {@code fluids} library's {@code Rouhani_1}
 * docstring gives 0.8588420244136714).
 */
public final class RouhaniAxelsson1970 implements VoidFraction {

    /** Identifier in {@link VoidFractions}. */
    public static final String ID = "rouhani-axelsson-1970";

    /** The paper. */
    public static final Citation SOURCE = Citation.of("Rouhani & Axelsson 1970",
            "Rouhani, S.Z., Axelsson, E., 1970, \"Calculation of void volume fraction in the subcooled and"
                    + " quality boiling regions\", Int. J. Heat Mass Transfer 13(2):383-393");

    /** Range of the form. */
    public static final Validity VALIDITY = Validity.assessed("of the equation form", Limit.of("x", 0, 1));

    /** The single instance. */
    public static final RouhaniAxelsson1970 INSTANCE = new RouhaniAxelsson1970(0.2, ID, SOURCE, VALIDITY);

    private final double c0Slope;
    private final String id;
    private final Citation source;
    private final Validity validity;

    RouhaniAxelsson1970(double c0Slope, String id, Citation source, Validity validity) {
        this.c0Slope = c0Slope;
        this.id = id;
        this.source = source;
        this.validity = validity;
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public Citation source() {
        return source;
    }

    @Override
    public Validity validity() {
        return validity;
    }

    @Override
    public double voidFraction(SaturatedProperties p, TubeFlow f, Warnings w) {
        double x = f.quality();
        if (x == 0) {
            return 0;
        }
        double rl = p.liquidDensity();
        double rv = p.vapourDensity();
        double c0 = 1 + c0Slope * (1 - x); // Rouhani & Axelsson 1970 (0.2) or Steiner 1993 (0.12)
        double drift = 1.18 * (1 - x) * Math.pow(Tube.GRAVITY * p.surfaceTension() * (rl - rv), 0.25) // idem
                / (f.massFlux() * Math.sqrt(rl));
        return x / rv / (c0 * (x / rv + (1 - x) / rl) + drift);
    }
}
