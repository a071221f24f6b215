package org.finstack.study.cost;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Limit;
import org.finstack.core.Msg;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Coefficient of performance of a vapour-compression plant approximated as a fraction of the
 * Carnot refrigeration cycle between the saturation temperatures:
 * <pre>
 *   COP_Carnot = T_evap / (T_cond - T_evap)
 *   COP        = eta_II COP_Carnot
 *   W          = Q_evap / COP
 * </pre>
 * with T_evap and T_cond the evaporating and condensing temperatures [K], eta_II [-] the
 * plant's second-law (Carnot) efficiency, Q_evap the refrigerating duty [W] and W the compressor
 * power [W]. With eta_II held constant, a higher condensing temperature raises the compressor
 * power by dW/W = dT_cond / (T_cond - T_evap) per kelvin, about 2 to 2.5 % per K at usual lifts
 * of 40 to 50 K (the trade's rule of thumb is 2 to 4 % per K; common practice).
 *
 * <p>Validity: the approximation states no published range. The range checked is that of
 * single-stage vapour-compression plant (common practice): lift T_cond - T_evap 10 to 80 K and
 * eta_II 0.3 to 0.7; outside it a warning is added.
 *
 * <p>Worked example: T_evap = 268.15 K (-5 °C), T_cond = 313.15 K (40 °C), eta_II = 0.5 give
 * COP = 2.97944 and, for 10 kW of refrigeration, W = 3356.33 W.
 */
public final class CarnotCop {

    /** The source of the Carnot cycle's COP. */
    public static final Citation SOURCE = Citation.of("Stoecker & Jones 1982",
            "Stoecker, W.F., Jones, J.W., 1982, Refrigeration and Air Conditioning, 2nd ed.,"
                    + " McGraw-Hill, New York, chapter 3 (Carnot refrigeration cycle and its coefficient"
                    + " of performance; chapter from memory)");

    /** Range of single-stage vapour-compression plant (common practice). */
    public static final Validity VALIDITY = Validity.assessed("of single-stage vapour compression (common practice)",
            Limit.of("lift", 10, 80, "K"), // common practice
            Limit.of("etaII", 0.3, 0.7)); // common practice

    private static final String METHOD = "Carnot COP approximation";

    private CarnotCop() {
    }

    /**
     * @param evaporatingTemperature evaporating saturation temperature [K]
     * @param condensingTemperature  condensing saturation temperature [K], above the evaporating one
     * @param secondLawEfficiency    eta_II [-], in (0, 1]
     * @param warnings               where a warning goes outside the checked range
     * @return COP = eta_II T_evap / (T_cond - T_evap) [-]
     */
    public static double cop(double evaporatingTemperature, double condensingTemperature,
            double secondLawEfficiency, Warnings warnings) {
        Check.positive("evaporatingTemperature", evaporatingTemperature);
        Check.finite("condensingTemperature", condensingTemperature);
        if (!(condensingTemperature > evaporatingTemperature)) {
            throw new InputException("condensingTemperature", Msg.NOT_ABOVE, condensingTemperature,
                    evaporatingTemperature);
        }
        Check.positive("secondLawEfficiency", secondLawEfficiency);
        Check.within("secondLawEfficiency", secondLawEfficiency, 0, 1);
        double lift = condensingTemperature - evaporatingTemperature;
        VALIDITY.check(METHOD, "lift", lift, warnings);
        VALIDITY.check(METHOD, "etaII", secondLawEfficiency, warnings);
        return secondLawEfficiency * evaporatingTemperature / lift;
    }

    /**
     * @param duty                   refrigerating duty [W]
     * @param evaporatingTemperature evaporating saturation temperature [K]
     * @param condensingTemperature  condensing saturation temperature [K]
     * @param secondLawEfficiency    eta_II [-]
     * @param warnings               where warnings go
     * @return compressor power W = Q / COP [W]
     */
    public static double compressorPower(double duty, double evaporatingTemperature, double condensingTemperature,
            double secondLawEfficiency, Warnings warnings) {
        Check.nonNegative("duty", duty);
        return duty / cop(evaporatingTemperature, condensingTemperature, secondLawEfficiency, warnings);
    }
}
