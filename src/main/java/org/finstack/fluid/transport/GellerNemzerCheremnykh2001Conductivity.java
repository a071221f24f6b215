package org.finstack.fluid.transport;

import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;

/**
 * Thermal conductivity of the refrigerant blends R404A, R407C, R410A and R507A, Geller, Nemzer
 * &amp; Cheremnykh (2001): a dilute-gas term linear in temperature plus a residual term in density,
 * each blend with its own coefficients, without a critical enhancement:
 * <pre>
 *   lambda = 1e-3 (a_0 + a_1 T + sum_{j=1..4} b_j rho^j)        [W/(m K)]
 * </pre>
 * Parameters: T temperature [K], rho mass density [kg/m3] (from the blend's equation of state,
 * Lemmon 2003); the coefficients a_i [mW/(m K) / K^i] and b_j [mW/(m K) / (kg/m3)^j] as the paper
 * prints them. One formula covers liquid and vapour; at a blend's two-phase boundary it is
 * evaluated at the saturated liquid (bubble point) and saturated vapour (dew point) densities.
 * Without the critical enhancement the values near the pseudo-critical point (within a few kelvin)
 * are low; over the coil's range (to 60 degC, at least 10 K below Tc) that is not reached.
 *
 * <p>Scatter: the paper's own deviation statistics were not available to this implementation.
 * Validity: {@link #VALIDITY} is the range over which Finstack checked the values against CoolProp
 * 8.0.0 (saturation from -50 to +60 degC, compressed liquid and superheated vapour), not the
 * paper's data range, which was not read.
 *
 * <p>Worked example (R410A coefficients, {@code r410a.json}): T = 273.15 K, rho = 1170 kg/m3 (the
 * bubble-point liquid at 0 degC) gives lambda = 103.441 mW/(m K) (value repeated in
 * BlendTransportChecksTest).
 */
public final class GellerNemzerCheremnykh2001Conductivity {

    /** The correlation. */
    public static final Citation SOURCE = Citation.of("Geller, Nemzer & Cheremnykh 2001",
            "Geller, V.Z., Nemzer, B.V., Cheremnykh, U.V.: Thermal Conductivity of the Refrigerant Mixtures R404A, "
                    + "R407C, R410A, and R507A. Int. J. Thermophys. 22(4) (2001), doi:10.1023/A:1010691504352");

    /** The range checked against CoolProp 8.0.0 (the paper's data range was not read). */
    public static final Validity VALIDITY = Validity.assessed("checked against CoolProp 8.0.0 (paper's range not read)",
            Limit.of("T", 223.15, 333.15, "K"), Limit.of("rho", 0, 1500, "kg/m3"));

    private final double[] a;
    private final double[] b;

    /**
     * @param a dilute-gas coefficients a_0, a_1, ... [mW/(m K) / K^i]
     * @param b residual coefficients b_1, b_2, ... [mW/(m K) / (kg/m3)^j]
     */
    public GellerNemzerCheremnykh2001Conductivity(double[] a, double[] b) {
        this.a = Polynomials.checked("a", a);
        this.b = Polynomials.checked("b", b);
    }

    /**
     * @param temperature T [K]
     * @param density     rho [kg/m3]
     * @return thermal conductivity [W/(m K)]
     */
    public double at(double temperature, double density) {
        return 1e-3 * (Polynomials.fromZero(a, temperature) + Polynomials.fromOne(b, density));
    }
}
