package org.finstack.fluid.transport;

import com.fasterxml.jackson.databind.JsonNode;
import org.finstack.core.Citation;
import org.finstack.fluid.eos.HelmholtzEos;
import org.finstack.fluid.eos.HelmholtzEos.Properties;
import org.finstack.fluid.internal.JsonFields;

/**
 * Critical enhancement of the thermal conductivity, simplified crossover model of Olchowy &amp;
 * Sengers (1989):
 * <pre>
 *   d_lambda_c = rho cp R0 k T / (6 pi eta xi) (Omega - Omega0)
 *   Omega  = 2/pi ((cp - cv)/cp arctan(qD xi) + cv/cp qD xi)
 *   Omega0 = 2/pi (1 - exp(-1 / (1/(qD xi) + (qD xi rho_c / rho)^2 / 3)))
 *   xi = xi0 (d_chi / Gamma)^(nu/gamma),
 *   d_chi = pc rho / rho_c^2 ((d rho/d p)_T(T, rho) - T_ref / T (d rho/d p)_T(T_ref, rho)),  0 if negative
 * </pre>
 * rho [kg/m3], cp, cv [J/(kg K)], eta [Pa s], k Boltzmann's constant, qD [1/m], xi0 [m], T_ref = 1.5
 * Tc unless the fluid's paper gives another. Universal constants R0 = 1.03, nu = 0.63, gamma =
 * 1.239, Gamma and xi0 from the fluid's paper.
 */
final class OlchowySengers1989 {

    /** The model. */
    static final Citation SOURCE = Citation.of("Olchowy & Sengers 1989",
            "Olchowy, G.A., Sengers, J.V.: A simplified representation for the thermal conductivity of fluids in "
                    + "the critical region. Int. J. Thermophys. 10(2), 417-426 (1989)");

    /** Boltzmann constant [J/K] (SI 2019 exact value). */
    private static final double BOLTZMANN = 1.380649e-23;

    private final HelmholtzEos eos;
    private final double tc;
    private final double pc;
    private final double rhoc;
    private final double qd;
    private final double xi0;
    private final double bigGamma;
    private final double r0;
    private final double gamma;
    private final double nu;
    private final double tRef;

    OlchowySengers1989(JsonNode n, HelmholtzEos eos, double tc, double pc, double rhoc) {
        this.eos = eos;
        this.tc = tc;
        this.pc = pc;
        this.rhoc = rhoc;
        this.qd = JsonFields.num(n, "qD");
        this.xi0 = JsonFields.num(n, "xi0");
        this.bigGamma = JsonFields.num(n, "Gamma");
        this.r0 = JsonFields.num(n, "R0");
        this.gamma = JsonFields.num(n, "gamma");
        this.nu = JsonFields.num(n, "nu");
        this.tRef = n.has("referenceTemperature") ? JsonFields.num(n, "referenceTemperature") : 1.5 * tc;
    }

    /**
     * @param temperature T [K]
     * @param density     rho [kg/m3]
     * @param viscosity   eta [Pa s] at that state
     * @return the critical enhancement [W/(m K)]
     */
    double enhancement(double temperature, double density, double viscosity) {
        Properties pr = eos.properties(temperature, density);
        double ref = eos.pressureAndSlope(tRef, density)[1];
        double chi = pc * density / (rhoc * rhoc) * (1 / pr.dpdrho() - tRef / temperature / ref);
        if (!(chi > 0)) {
            return 0;
        }
        double xi = xi0 * Math.pow(chi / bigGamma, nu / gamma);
        double y = qd * xi;
        double cp = pr.cp();
        double cv = pr.cv();
        double omega = 2 / Math.PI * ((cp - cv) / cp * Math.atan(y) + cv / cp * y);
        double yr = y * rhoc / density;
        double omega0 = 2 / Math.PI * (1 - Math.exp(-1 / (1 / y + yr * yr / 3)));
        return density * cp * r0 * BOLTZMANN * temperature / (6 * Math.PI * viscosity * xi) * (omega - omega0);
    }

    /** @return the critical temperature it was set up with [K] */
    double criticalTemperature() {
        return tc;
    }
}
