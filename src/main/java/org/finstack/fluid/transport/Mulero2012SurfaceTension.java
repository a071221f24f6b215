package org.finstack.fluid.transport;

import com.fasterxml.jackson.databind.JsonNode;
import org.finstack.core.Citation;
import org.finstack.fluid.internal.JsonFields;

/**
 * Surface tension of a pure fluid along the saturation line, the correlations of Mulero,
 * Cachadina &amp; Parra (2012) (and Mulero &amp; Cachadina 2014 for R1234ze(E) and R143a):
 * <pre>
 *   sigma = sum sigma_i (1 - T / Tc)^n_i       [N/m],  T [K] up to the correlation's Tc
 * </pre>
 * with the correlation's own Tc (above it the value is 0). Validity: from the triple point (or
 * the lowest data) to Tc; the papers state mean absolute deviations below 1-3 % for these fluids
 * (e.g. R134a 1.1 %, Mulero et al. 2012, Table 3). Worked example: R134a (sigma_1 = 0.05801 N/m,
 * n_1 = 1.241, Tc = 374.21 K) at 273.15 K gives 0.011427 N/m (value repeated in
 * Mulero2012SurfaceTensionTest).
 */
public final class Mulero2012SurfaceTension {

    /** The correlations. */
    public static final Citation SOURCE = Citation.of("Mulero, Cachadina & Parra 2012",
            "Mulero, A., Cachadina, I., Parra, M.I.: Recommended Correlations for the Surface Tension of Common "
                    + "Fluids. J. Phys. Chem. Ref. Data 41(4), 043105 (2012)");

    private final double tc;
    private final double[] s;
    private final double[] n;
    private final Citation source;

    /**
     * @param criticalTemperature the correlation's Tc [K]
     * @param sigma               coefficients sigma_i [N/m]
     * @param exponents           exponents n_i [-]
     * @param source              the paper the coefficients come from
     */
    public Mulero2012SurfaceTension(double criticalTemperature, double[] sigma, double[] exponents, Citation source) {
        this.tc = criticalTemperature;
        this.s = sigma.clone();
        this.n = exponents.clone();
        this.source = source;
    }

    static Mulero2012SurfaceTension of(JsonNode node) {
        return new Mulero2012SurfaceTension(JsonFields.num(node, "criticalTemperature"), JsonFields.arr(node, "sigma"),
                JsonFields.arr(node, "n"), Data.citation(node));
    }

    /** @return the paper the coefficients come from */
    public Citation source() {
        return source;
    }

    /**
     * @param temperature T [K]
     * @return surface tension [N/m]; 0 at and above the correlation's Tc
     */
    public double at(double temperature) {
        if (temperature >= tc) {
            return 0;
        }
        double x = 1 - temperature / tc;
        double sum = 0;
        for (int i = 0; i < s.length; i++) {
            sum += s[i] * Math.pow(x, n[i]);
        }
        return Math.max(0, sum);
    }
}
