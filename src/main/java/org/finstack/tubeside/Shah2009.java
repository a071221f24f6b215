package org.finstack.tubeside;

import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Shah's (2009) improved and extended correlation for condensation in plain tubes, horizontal
 * tube form (regimes I and II; regime III is for vertical tubes only):
 * <pre>
 *   Regime I,  J_g &ge; 0.98 (Z + 0.263)^-0.62:  h = h_I
 *   Regime II, otherwise:                    h = h_I + h_Nu
 *   h_I  = h_LO (mu_l / (14 mu_v))^n [ (1-x)^0.8 + 3.8 x^0.76 (1-x)^0.04 / pr^0.38 ],  n = 0.0058 + 0.557 pr
 *   h_Nu = 1.32 Re_LS^(-1/3) [ rho_l (rho_l - rho_v) g k_l^3 / mu_l^2 ]^(1/3),   Re_LS = G (1-x) D / mu_l
 *   h_LO = 0.023 Re_LO^0.8 Pr_l^0.4 k_l / D,   Re_LO = G D / mu_l  (all the flow as liquid)
 *   J_g  = x G / sqrt(g D rho_v (rho_l - rho_v)),   Z = (1/x - 1)^0.8 pr^0.4
 * </pre>
 * Symbols and units as in {@link Shah1979}; g [m/s2] standard gravity. As published, h steps
 * down by h_Nu where the flow passes from regime II into regime I.
 *
 * <p>Validity (abstract of the paper): D 2 to 49 mm, pr 0.0008 to 0.9, G 4 to 820 kg/(m2 s),
 * all-liquid Reynolds number 68 to 85 000, Pr_l 1 to 18. Published accuracy: 1189 data
 * points from 39 sources with a mean deviation of 14.4 % (abstract). Z and the regime I boundary
 * J_g &ge; 0.98 (Z + 0.263)^-0.62 are printed in "Design and Operation of Heat Exchangers and
 * their Networks", Academic Press 2020, section 4.2.3, for horizontal channels in Shah's later
 * (2016) form, which adds We_l &gt; 100 (not applied here); that the 2009 paper uses the same
 * boundary, and the forms of h_I and h_Nu, are as commonly restated from the paper (from memory).
 *
 * <p>Worked example (fixture R134a at about 40 °C): D = 8 mm, G = 200 kg/(m2 s), x = 0.5
 * give h = 2281.84 W/(m2 K) (regime I); G = 50 kg/(m2 s), x = 0.2 give h = 1090.89 W/(m2 K)
 * (regime II).
 */
public final class Shah2009 implements CondensationCorrelation {

    /** Identifier in {@link CondensationCorrelations}. */
    public static final String ID = "shah-2009";

    /** The paper. */
    public static final Citation SOURCE = Citation.of("Shah 2009",
            "Shah, M.M., 2009, \"An improved and extended general correlation for heat transfer during"
                    + " condensation in plain tubes\", HVAC&R Research 15(5):889-913");

    /** Published range (abstract of the paper). */
    public static final Validity VALIDITY = Validity.of(
            Limit.of("D", 2, 49, "mm"), // Shah 2009 abstract
            Limit.of("pr", 0.0008, 0.9), // idem
            Limit.of("G", 4, 820, "kg/(m2 s)"), // idem
            Limit.of("Re_lo", 68, 85_000), // idem
            Limit.of("Pr_l", 1, 18)); // idem

    /** The single instance. */
    public static final Shah2009 INSTANCE = new Shah2009();

    private static final String METHOD = "Shah 2009";

    private Shah2009() {
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

    /**
     * @param p properties
     * @param f flow
     * @return whether the flow is in regime I (h = h_I alone)
     */
    public static boolean regimeOne(SaturatedProperties p, TubeFlow f) {
        double x = f.quality();
        if (x == 0) {
            return false;
        }
        double z = Math.pow(1 / x - 1, 0.8) * Math.pow(p.reducedPressure(), 0.4); // Shah 2009
        return Tube.dimensionlessVapourVelocity(p, f) >= 0.98 * Math.pow(z + 0.263, -0.62); // Shah 2009
    }

    @Override
    public double heatTransferCoefficient(SaturatedProperties p, TubeFlow f, double wallSubcooling, Warnings w) {
        Tube.requireLiquid(f, METHOD);
        double x = f.quality();
        double pr = p.reducedPressure();
        double relo = Tube.reynolds(f.massFlux(), f.diameter(), p.liquidViscosity());
        VALIDITY.check(METHOD, "D", f.diameter() * 1e3, w);
        VALIDITY.check(METHOD, "pr", pr, w);
        VALIDITY.check(METHOD, "G", f.massFlux(), w);
        VALIDITY.check(METHOD, "Re_lo", relo, w);
        VALIDITY.check(METHOD, "Pr_l", p.liquidPrandtl(), w);
        double rels = relo * (1 - x);
        double hlo = Tube.dittusBoelter(relo, p.liquidPrandtl(), p.liquidConductivity(), f.diameter());
        double n = 0.0058 + 0.557 * pr; // Shah 2009
        double hI = hlo * Math.pow(p.liquidViscosity() / (14 * p.vapourViscosity()), n) * Shah1979.factor(x, pr);
        if (regimeOne(p, f)) {
            return Tube.finitePositive(hI, METHOD);
        }
        double kl = p.liquidConductivity();
        double mul = p.liquidViscosity();
        double hNu = 1.32 * Math.pow(rels, -1.0 / 3) // Shah 2009
                * Math.cbrt(p.liquidDensity() * (p.liquidDensity() - p.vapourDensity()) * Tube.GRAVITY * kl * kl * kl
                        / (mul * mul));
        return Tube.finitePositive(hI + hNu, METHOD);
    }
}
