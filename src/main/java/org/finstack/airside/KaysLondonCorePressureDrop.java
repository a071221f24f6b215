package org.finstack.airside;

import org.finstack.core.Check;
import org.finstack.core.Citation;

/**
 * Core pressure drop of a compact heat exchanger (Kays &amp; London):
 * <pre>
 *   dp = G^2 / (2 rho_in) [ (Kc + 1 - sigma^2) + 2 (rho_in/rho_out - 1)
 *                           + f (A/Amin) (rho_in/rho_m) - (1 - sigma^2 - Ke) rho_in/rho_out ]
 * </pre>
 * entrance loss and contraction, flow acceleration, core friction, exit expansion and loss. The
 * mean density is taken on the mean specific volume, {@code 1/rho_m = (1/rho_in + 1/rho_out)/2}.
 *
 * <p>Wang, Chi &amp; Chang reduced their plate-fin-and-tube data with Kc = Ke = 0, so that the
 * entrance and exit losses are folded into their friction factor (Wang &amp; Chi 2000, part I,
 * data reduction; from memory); use {@link #withoutEndLosses} with f from those correlations.
 * With Kc = Ke = 0 the bracket reduces to {@code (1 + sigma^2)(rho_in/rho_out - 1)
 * + f (A/Amin) rho_in/rho_m}.
 *
 * <p>Worked example: G = 5 kg/(m2 s), rho_in = 1.20, rho_out = 1.10 kg/m3, sigma = 0.55,
 * f = 0.06, A/Amin = 20, Kc = 0.4, Ke = 0.1 give dp = 19.605 Pa.
 */
public final class KaysLondonCorePressureDrop {

    /** The equation's source. */
    public static final Citation SOURCE = Citation.of("Kays & London 1984",
            "Kays, W.M., London, A.L., 1984, Compact Heat Exchangers, 3rd ed., McGraw-Hill, New York,"
                    + " chapter 2, core pressure-drop equation with entrance and exit losses");

    /** Source of the choice Kc = Ke = 0 for the Wang et al. friction factors. */
    public static final Citation END_LOSS_SOURCE = Citation.of("Wang & Chi 2000",
            "Wang, C.-C., Chi, K.-Y., 2000, \"Heat transfer and friction characteristics of plain"
                    + " fin-and-tube heat exchangers, part I: new experimental data\", Int. J. Heat Mass"
                    + " Transfer 43:2681-2691");

    private KaysLondonCorePressureDrop() {
    }

    /**
     * Core pressure drop with entrance and exit loss coefficients.
     *
     * @param g         mass velocity in the minimum free-flow area [kg/(m2 s)]
     * @param rhoIn     air density at the core inlet [kg/m3]
     * @param rhoOut    air density at the core outlet [kg/m3]
     * @param sigma     minimum free-flow area over frontal area [-], in (0, 1]
     * @param f         Fanning friction factor [-]
     * @param areaRatio A/Amin, total air-side area over minimum free-flow area [-]
     * @param kc        entrance (contraction) loss coefficient [-]
     * @param ke        exit (expansion) loss coefficient [-]
     * @return pressure drop, inlet minus outlet [Pa]
     */
    public static double pressureDrop(double g, double rhoIn, double rhoOut, double sigma, double f,
            double areaRatio, double kc, double ke) {
        Check.nonNegative("massVelocity", g);
        Check.positive("rhoIn", rhoIn);
        Check.positive("rhoOut", rhoOut);
        Check.positive("sigma", sigma);
        Check.within("sigma", sigma, 0, 1);
        Check.nonNegative("f", f);
        Check.positive("areaRatio", areaRatio);
        Check.finite("kc", kc);
        Check.finite("ke", ke);
        double s2 = sigma * sigma;
        double r = rhoIn / rhoOut;
        double bracket = (kc + 1 - s2) + 2 * (r - 1) + f * areaRatio * rhoIn / meanDensity(rhoIn, rhoOut)
                - (1 - s2 - ke) * r;
        return g * g / (2 * rhoIn) * bracket;
    }

    /**
     * Core pressure drop with Kc = Ke = 0, for friction factors that include the end losses
     * (Wang et al.).
     *
     * @param g         mass velocity in the minimum free-flow area [kg/(m2 s)]
     * @param rhoIn     inlet density [kg/m3]
     * @param rhoOut    outlet density [kg/m3]
     * @param sigma     minimum free-flow area over frontal area [-]
     * @param f         Fanning friction factor [-]
     * @param areaRatio A/Amin [-]
     * @return pressure drop [Pa]
     */
    public static double withoutEndLosses(double g, double rhoIn, double rhoOut, double sigma, double f,
            double areaRatio) {
        return pressureDrop(g, rhoIn, rhoOut, sigma, f, areaRatio, 0, 0);
    }

    /**
     * Mean density on the mean specific volume.
     *
     * @param rhoIn  inlet density [kg/m3]
     * @param rhoOut outlet density [kg/m3]
     * @return rho_m with 1/rho_m = (1/rho_in + 1/rho_out)/2 [kg/m3]
     */
    public static double meanDensity(double rhoIn, double rhoOut) {
        Check.positive("rhoIn", rhoIn);
        Check.positive("rhoOut", rhoOut);
        return 2 / (1 / rhoIn + 1 / rhoOut);
    }
}
