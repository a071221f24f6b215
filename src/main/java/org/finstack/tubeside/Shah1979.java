package org.finstack.tubeside;

import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Shah's (1979) general correlation for film condensation inside tubes:
 * <pre>
 *   h    = h_lo [ (1-x)^0.8 + 3.8 x^0.76 (1-x)^0.04 / pr^0.38 ]
 *   h_lo = 0.023 Re_lo^0.8 Pr_l^0.4 k_l / D,   Re_lo = G D / mu_l  (all the flow as liquid)
 * </pre>
 * with x [-] the quality, pr = p/pc [-] the reduced pressure, G [kg/(m2 s)] the mass flux,
 * D [m] the inner diameter and the saturated-liquid mu_l [Pa s], k_l [W/(m K)], Pr_l [-].
 *
 * <p>Validity (Shah 1979, as restated in "Design and Operation of Heat Exchangers and their
 * Networks", Academic Press 2020, section 4.2.3): D 7 to 40 mm, pr 0.002 to 0.44, saturation
 * temperature 21 to 310 °C, vapour velocity 3 to 300 m/s, 0 &le; x &lt; 1, G 10.8 to
 * 210.6 kg/(m2 s), q 158 to 1.893e6 W/m2, Re_lo 100 to 63 000, Pr_l 1 to 13. Published
 * accuracy: mean deviation 15.4 % over 474 data points (from memory). Shah (1981) warned that
 * it fails at low flow rates; {@link Shah2009} extends it there.
 *
 * <p>Worked example (fixture R134a at about 40 °C, see the package comment): D = 8 mm,
 * G = 200 kg/(m2 s), x = 0.5 give h = 2309.62 W/(m2 K).
 */
public final class Shah1979 implements CondensationCorrelation {

    /** Identifier in {@link CondensationCorrelations}. */
    public static final String ID = "shah-1979";

    /** The paper. */
    public static final Citation SOURCE = Citation.of("Shah 1979",
            "Shah, M.M., 1979, \"A general correlation for heat transfer during film condensation inside pipes\","
                    + " Int. J. Heat Mass Transfer 22:547-556");

    /** Published range. */
    public static final Validity VALIDITY = Validity.of(
            Limit.of("D", 7, 40, "mm"), // Shah 1979, as restated (class comment)
            Limit.of("pr", 0.002, 0.44), // idem
            Limit.of("G", 10.8, 210.6, "kg/(m2 s)"), // idem
            Limit.of("Re_lo", 100, 63_000), // idem
            Limit.of("Pr_l", 1, 13)); // idem

    /** The single instance. */
    public static final Shah1979 INSTANCE = new Shah1979();

    private static final String METHOD = "Shah 1979";

    private Shah1979() {
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
    public double heatTransferCoefficient(SaturatedProperties p, TubeFlow f, double wallSubcooling, Warnings w) {
        Tube.requireLiquid(f, METHOD);
        double relo = Tube.reynolds(f.massFlux(), f.diameter(), p.liquidViscosity());
        double pr = p.reducedPressure();
        VALIDITY.check(METHOD, "D", f.diameter() * 1e3, w);
        VALIDITY.check(METHOD, "pr", pr, w);
        VALIDITY.check(METHOD, "G", f.massFlux(), w);
        VALIDITY.check(METHOD, "Re_lo", relo, w);
        VALIDITY.check(METHOD, "Pr_l", p.liquidPrandtl(), w);
        double hlo = Tube.dittusBoelter(relo, p.liquidPrandtl(), p.liquidConductivity(), f.diameter());
        return Tube.finitePositive(hlo * factor(f.quality(), pr), METHOD);
    }

    /**
     * The two-phase factor of Shah 1979, shared with {@link Shah2009}.
     *
     * @param x  quality [-]
     * @param pr reduced pressure [-]
     * @return (1-x)^0.8 + 3.8 x^0.76 (1-x)^0.04 / pr^0.38
     */
    static double factor(double x, double pr) {
        return Math.pow(1 - x, 0.8) + 3.8 * Math.pow(x, 0.76) * Math.pow(1 - x, 0.04) / Math.pow(pr, 0.38); // Shah 1979
    }
}
