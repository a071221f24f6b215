package org.finstack.study.frost;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Frost density from the frost surface temperature, Hayashi, Aoki, Adachi &amp; Hori (1977):
 * <pre>
 *   rho_f = 650 exp(0.227 Ts)
 * </pre>
 * with rho_f [kg/m3] the mean density of the frost layer and Ts [C] its surface temperature.
 * The relation was fitted to frost grown on a cold plate in forced flow; it depends on the surface
 * temperature alone.
 *
 * <p>Validity: Ts from -25 C to 0 C (the range of the experiments; from memory). Outside it the
 * value is still returned with a warning. Published scatter: not stated in the sources read.
 *
 * <p>Worked example: Ts = -10 C gives rho_f = 650 exp(-2.27) = 67.153 kg/m3.
 */
public final class Hayashi1977FrostDensity {

    /** The source. */
    public static final Citation SOURCE = Citation.of("Hayashi et al. 1977",
            "Hayashi Y., Aoki A., Adachi S., Hori K. (1977). Study of frost properties correlating with frost"
                    + " formation types. Journal of Heat Transfer 99(2), 239-245.");

    /** The published range (from memory). */
    public static final Validity VALIDITY = Validity.of(Limit.of("Ts", -25, 0, "C"));

    private static final double KELVIN_AT_0C = 273.15; // K at 0 C, exact by definition

    private Hayashi1977FrostDensity() {
    }

    /**
     * @param surfaceTemperature frost surface temperature Ts [K]
     * @param warnings           where a warning goes outside the published range
     * @return the frost density [kg/m3]
     */
    public static double density(double surfaceTemperature, Warnings warnings) {
        Check.within("frostSurfaceTemperature", surfaceTemperature, 173.15, 300);
        double tsC = surfaceTemperature - KELVIN_AT_0C;
        VALIDITY.check(SOURCE.key(), "Ts", tsC, warnings);
        return 650 * Math.exp(0.227 * tsC); // Hayashi et al. 1977, constants 650 kg/m3 and 0.227 1/C
    }
}
