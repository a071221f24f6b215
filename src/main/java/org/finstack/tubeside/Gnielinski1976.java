package org.finstack.tubeside;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Gnielinski's (1976) Nusselt number for fully developed single-phase flow in a round tube, with
 * the laminar value below Re = 2300 and Gnielinski's (2013) linear interpolation through the
 * transition region.
 *
 * <p>Turbulent (Re &ge; 10^4), with the Filonenko (1954) friction factor the equation was fitted with:
 * <pre>
 *   Nu_turb = (f/8)(Re - 1000) Pr / (1 + 12.7 sqrt(f/8) (Pr^(2/3) - 1))
 *   f = (1.82 log10 Re - 1.64)^-2
 * </pre>
 * Laminar (Re &le; 2300), fully developed: Nu_lam = 3.66 for a uniform wall temperature and
 * 4.36 for a uniform wall heat flux (Shah &amp; London 1978, Laminar Flow Forced Convection in
 * Ducts, Academic Press). Transition (2300 &lt; Re &lt; 10^4), Gnielinski (2013):
 * <pre>
 *   Nu = (1 - g) Nu_lam + g Nu_turb(10^4),   g = (Re - 2300) / (10^4 - 2300)
 * </pre>
 * which is continuous at both ends. Re [-] is the Reynolds number on the inner diameter and
 * Pr [-] the bulk Prandtl number. Entrance effects, the (d/L)^(2/3) factor and the wall-to-bulk
 * property correction of Gnielinski's paper are left out (long tubes, moderate temperature
 * differences); for a refrigerant coil the tube length is hundreds of diameters.
 *
 * <p>Validity (Gnielinski 1976, as restated in Rohsenow, Hartnett &amp; Cho, Handbook of Heat
 * Transfer, 3rd ed., 1998, and in the {@code ht} library's {@code turbulent_Gnielinski} notes):
 * 0.5 &le; Pr &le; 2000 and 2300 &le; Re &le; 5e6; outside, a warning (except below Re = 2300,
 * where the laminar value is returned without one). Published accuracy: most of the 800 data
 * points within ±20 % (Gnielinski 1976, from memory).
 *
 * <p>Worked example: Re = 50 000, Pr = 0.8 gives Nu = 112.676; Re = 5000, Pr = 3, uniform heat
 * flux gives Nu = 22.8346 (transition interpolation).
 */
public final class Gnielinski1976 {

    /** The turbulent correlation. */
    public static final Citation SOURCE = Citation.of("Gnielinski 1976",
            "Gnielinski, V., 1976, \"New equations for heat and mass transfer in turbulent pipe and channel"
                    + " flow\", Int. Chem. Eng. 16(2):359-368");

    /** The transition interpolation. */
    public static final Citation TRANSITION_SOURCE = Citation.of("Gnielinski 2013",
            "Gnielinski, V., 2013, \"On heat transfer in tubes\", Int. J. Heat Mass Transfer 63:134-140");

    /** Published range. */
    public static final Validity VALIDITY = Validity.of(
            Limit.of("Re", 2300, 5e6), // Gnielinski 1976; Handbook of Heat Transfer 1998; ht turbulent_Gnielinski
            Limit.of("Pr", 0.5, 2000)); // idem

    /** Upper end of laminar flow [-] (Gnielinski 2013). */
    public static final double RE_LAMINAR = 2300;
    /** Start of fully turbulent flow [-] (Gnielinski 2013). */
    public static final double RE_TURBULENT = 1e4;

    private static final String METHOD = "Gnielinski 1976";

    /** The thermal boundary condition that sets the laminar Nusselt number. */
    public enum Wall {
        /** Uniform wall temperature, Nu = 3.66 (Shah &amp; London 1978). */
        UNIFORM_TEMPERATURE(3.66),
        /** Uniform wall heat flux, Nu = 4.36 (Shah &amp; London 1978). */
        UNIFORM_HEAT_FLUX(4.36);

        private final double laminarNusselt;

        Wall(double laminarNusselt) {
            this.laminarNusselt = laminarNusselt;
        }

        /** @return fully developed laminar Nusselt number [-] */
        public double laminarNusselt() {
            return laminarNusselt;
        }
    }

    private Gnielinski1976() {
    }

    /**
     * @param reynolds Reynolds number on the inner diameter [-], positive
     * @param prandtl  Prandtl number [-], positive
     * @param wall     thermal boundary condition (used for Re below 10^4)
     * @param w        where range warnings go
     * @return Nusselt number h D / k [-]
     */
    public static double nusselt(double reynolds, double prandtl, Wall wall, Warnings w) {
        Check.positive("reynolds", reynolds);
        Check.positive("prandtl", prandtl);
        VALIDITY.check(METHOD, "Pr", prandtl, w);
        if (reynolds > VALIDITY.limit("Re").max()) {
            VALIDITY.check(METHOD, "Re", reynolds, w);
        }
        if (reynolds <= RE_LAMINAR) {
            return wall.laminarNusselt();
        }
        if (reynolds >= RE_TURBULENT) {
            return turbulent(reynolds, prandtl);
        }
        double g = (reynolds - RE_LAMINAR) / (RE_TURBULENT - RE_LAMINAR); // Gnielinski 2013
        return (1 - g) * wall.laminarNusselt() + g * turbulent(RE_TURBULENT, prandtl);
    }

    /**
     * @param reynolds     Reynolds number [-]
     * @param prandtl      Prandtl number [-]
     * @param conductivity fluid conductivity [W/(m K)]
     * @param diameter     inner diameter [m]
     * @param wall         thermal boundary condition
     * @param w            where range warnings go
     * @return heat transfer coefficient Nu k / D [W/(m2 K)]
     */
    public static double heatTransferCoefficient(double reynolds, double prandtl, double conductivity,
            double diameter, Wall wall, Warnings w) {
        Check.positive("conductivity", conductivity);
        Check.positive("diameter", diameter);
        return nusselt(reynolds, prandtl, wall, w) * conductivity / diameter;
    }

    /**
     * The Filonenko friction factor that the turbulent equation uses.
     *
     * @param reynolds Reynolds number [-], above 1000
     * @return Darcy friction factor [-]
     */
    public static double filonenko(double reynolds) {
        double d = 1.82 * Math.log10(reynolds) - 1.64; // Filonenko 1954, as used by Gnielinski 1976
        return 1 / (d * d);
    }

    private static double turbulent(double re, double pr) {
        double f8 = filonenko(re) / 8;
        return f8 * (re - 1000) * pr / (1 + 12.7 * Math.sqrt(f8) * (Math.pow(pr, 2.0 / 3) - 1)); // Gnielinski 1976
    }
}
