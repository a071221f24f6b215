package org.finstack.fluid.transport;

import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;

/**
 * Viscosity of the refrigerant blends R404A, R407C, R410A and R507A, Geller, Bivens &amp; Yokozeki
 * (2000): the residual concept, a dilute-gas term in temperature plus a residual term in density,
 * each blend with its own coefficients:
 * <pre>
 *   eta = 1e-6 (a_0 + a_1 T + a_2 T^2 + sum_{j=1..6} b_j rho^j)        [Pa s]
 * </pre>
 * Parameters: T temperature [K], rho mass density [kg/m3] (from the blend's equation of state,
 * Lemmon 2003); the coefficients a_i [micro-Pa s / K^i] and b_j [micro-Pa s / (kg/m3)^j] as the
 * paper prints them. One formula covers liquid and vapour; at a blend's two-phase boundary it is
 * evaluated at the saturated liquid (bubble point) and saturated vapour (dew point) densities.
 *
 * <p>Scatter: the paper's measurements (saturated liquid and vapour, superheated vapour, capillary
 * viscometer) carry an uncertainty of at most 1.2 % (paper's abstract); its deviation statistics
 * of the fit were not available to this implementation. Validity: {@link #VALIDITY} is the range
 * over which Finstack checked the values against CoolProp 8.0.0 (saturation from -50 to +60 degC,
 * compressed liquid and superheated vapour), not the paper's data range, which was not read.
 *
 * <p>Worked example (R410A coefficients, {@code r410a.json}): T = 273.15 K, rho = 1170 kg/m3 (the
 * bubble-point liquid at 0 degC) gives eta = 164.758 micro-Pa s (value repeated in
 * BlendTransportChecksTest).
 */
public final class GellerBivensYokozeki2000Viscosity {

    /** The correlation. */
    public static final Citation SOURCE = Citation.of("Geller, Bivens & Yokozeki 2000",
            "Geller, V.Z., Bivens, D.B., Yokozeki, A.: Viscosity of Mixed Refrigerants, R404A, R407C, R410A, and "
                    + "R507C. International Refrigeration and Air Conditioning Conference at Purdue, paper 508 (2000)");

    /** The range checked against CoolProp 8.0.0 (the paper's data range was not read). */
    public static final Validity VALIDITY = Validity.assessed("checked against CoolProp 8.0.0 (paper's range not read)",
            Limit.of("T", 223.15, 333.15, "K"), Limit.of("rho", 0, 1500, "kg/m3"));

    private final double[] a;
    private final double[] b;

    /**
     * @param a dilute-gas coefficients a_0, a_1, ... [micro-Pa s / K^i]
     * @param b residual coefficients b_1, b_2, ... [micro-Pa s / (kg/m3)^j]
     */
    public GellerBivensYokozeki2000Viscosity(double[] a, double[] b) {
        this.a = Polynomials.checked("a", a);
        this.b = Polynomials.checked("b", b);
    }

    /**
     * @param temperature T [K]
     * @return dilute-gas viscosity [Pa s]
     */
    public double dilute(double temperature) {
        return 1e-6 * Polynomials.fromZero(a, temperature);
    }

    /**
     * @param temperature T [K]
     * @param density     rho [kg/m3]
     * @return dynamic viscosity [Pa s]
     */
    public double at(double temperature, double density) {
        return dilute(temperature) + 1e-6 * Polynomials.fromOne(b, density);
    }
}
