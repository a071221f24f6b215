package org.finstack.study.frost;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Effective thermal conductivity of frost from its density, Yonko &amp; Sepsy (1967):
 * <pre>
 *   k_f = 0.02422 + 7.214e-4 rho_f + 1.1797e-6 rho_f^2
 * </pre>
 * with k_f [W/(m K)] and rho_f [kg/m3], fitted to frost grown on a flat horizontal plate. The
 * coefficients are quoted from memory as they are cited in the frost-modelling literature.
 *
 * <p>Validity: rho_f from 50 to 400 kg/m3 (from memory). Outside it the value is still returned
 * with a warning. Published scatter: not stated in the sources read.
 *
 * <p>Worked example: rho_f = 67.153 kg/m3 gives k_f = 0.077984 W/(m K).
 */
public final class YonkoSepsy1967FrostConductivity {

    /** The source. */
    public static final Citation SOURCE = Citation.of("Yonko & Sepsy 1967",
            "Yonko J.D., Sepsy C.F. (1967). An investigation of the thermal conductivity of frost while forming"
                    + " on a flat horizontal plate. ASHRAE Transactions 73(2), I1.1-I1.11.");

    /** The published range (from memory). */
    public static final Validity VALIDITY = Validity.of(Limit.of("rho_f", 50, 400, "kg/m3"));

    private YonkoSepsy1967FrostConductivity() {
    }

    /**
     * @param density  frost density [kg/m3]
     * @param warnings where a warning goes outside the published range
     * @return the frost conductivity [W/(m K)]
     */
    public static double conductivity(double density, Warnings warnings) {
        Check.within("frostDensity", density, 0, 917); // 917 kg/m3: solid ice at 0 C (common practice)
        VALIDITY.check(SOURCE.key(), "rho_f", density, warnings);
        return 0.02422 + 7.214e-4 * density + 1.1797e-6 * density * density; // Yonko & Sepsy 1967
    }
}
