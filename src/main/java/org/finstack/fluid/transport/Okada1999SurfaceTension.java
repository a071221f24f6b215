package org.finstack.fluid.transport;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Limit;
import org.finstack.core.Msg;
import org.finstack.core.Validity;

/**
 * Surface tension of an HFC refrigerant blend of fixed composition, Okada, Shibata, Sato &amp;
 * Higashi (1999): the van der Waals form in the reduced temperature,
 * <pre>
 *   sigma = sum_i sigma_i (1 - T / Tc)^n_i        [N/m]
 * </pre>
 * Parameters: T temperature of the liquid at its bubble point [K]; the correlation's own critical
 * temperature Tc [K] (above it the value is 0); sigma_i [N/m] and n_i [-] per blend (one term
 * each for R404A, R407C, R410A and R507A). Validity: the paper measured from 273 K to 323 K
 * (differential capillary rise; paper's abstract); below and above, the correlation is
 * extrapolated along the van der Waals form. Scatter: not available to this implementation (the
 * same group states +-0.2 mN/m uncertainty for its capillary-rise measurements of pure HFCs: Okada,
 * M., Higashi, Y., Int. J. Thermophys. 16(3), 791-800 (1995), abstract).
 *
 * <p>Worked example (R410A: sigma_1 = 0.06238 N/m, n_1 = 1.246, Tc = 344.56 K): at 273.15 K,
 * sigma = 0.00877803 N/m (value repeated in BlendTransportChecksTest).
 */
public final class Okada1999SurfaceTension {

    /** The correlation. */
    public static final Citation SOURCE = Citation.of("Okada et al. 1999",
            "Okada, M., Shibata, T., Sato, Y., Higashi, Y.: Surface Tension of HFC Refrigerant Mixtures. Int. J. "
                    + "Thermophys. 20(1), 119-127 (1999)");

    /** The paper's measured range (abstract): 273 K to 323 K. */
    public static final Validity VALIDITY = Validity.of(Limit.of("T", 273, 323, "K"));

    private final double tc;
    private final double[] sigma;
    private final double[] n;

    /**
     * @param criticalTemperature the correlation's Tc [K]
     * @param sigma               coefficients sigma_i [N/m]
     * @param n                   exponents n_i [-], as many as sigma
     */
    public Okada1999SurfaceTension(double criticalTemperature, double[] sigma, double[] n) {
        this.tc = Check.positive("criticalTemperature", criticalTemperature);
        this.sigma = Polynomials.checked("sigma", sigma);
        this.n = Polynomials.checked("n", n);
        if (sigma.length != n.length || sigma.length == 0) {
            throw new InputException("n", Msg.IMPOSSIBLE, "one exponent per coefficient is needed");
        }
    }

    /** @return the correlation's critical temperature [K] */
    public double criticalTemperature() {
        return tc;
    }

    /**
     * @param temperature T [K]
     * @return surface tension [N/m]; 0 at and above the correlation's Tc
     */
    public double at(double temperature) {
        Check.finite("temperature", temperature);
        if (temperature >= tc) {
            return 0;
        }
        double x = 1 - temperature / tc;
        double s = 0;
        for (int i = 0; i < sigma.length; i++) {
            s += sigma[i] * Math.pow(x, n[i]);
        }
        return Math.max(0, s);
    }
}
