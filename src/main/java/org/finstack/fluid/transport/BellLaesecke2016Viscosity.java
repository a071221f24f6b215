package org.finstack.fluid.transport;

import com.fasterxml.jackson.databind.JsonNode;
import org.finstack.core.Citation;
import org.finstack.fluid.eos.Derivatives;
import org.finstack.fluid.eos.HelmholtzEos;
import org.finstack.fluid.internal.JsonFields;

/**
 * Viscosity from residual-entropy scaling, Bell &amp; Laesecke (2016): the viscosity over the
 * dilute-gas value is a function of the residual entropy density scaled by its critical value,
 * the same for all refrigerants up to one fluid-specific factor C:
 * <pre>
 *   x = rho_m s_r / (rho_m s_r)_c,   s_r = R (tau alphar_tau - alphar)      (from the EOS)
 *   psi = 1 / (1 + exp(-100 (x - 2)))
 *   eta*_ref = exp(psi (c_L0 + c_L1 x + c_L2 x^2 + c_L3 x^3) + (1 - psi)(c_V0 + c_V1 x + c_V2 x^2 + c_V3 x^3))
 *   eta = eta0(T) (1 + C (eta*_ref - 1))
 * </pre>
 * eta0 is the Chapman-Enskog dilute-gas viscosity with Lennard-Jones parameters estimated from the
 * critical point (Chung et al. 1988). The critical value (rho_m s_r)_c is evaluated from
 * Finstack's equation of state at its critical point. The paper states average absolute
 * deviations within 10 % for the refrigerants studied (Bell &amp; Laesecke 2016).
 */
final class BellLaesecke2016Viscosity implements ViscosityCorrelation {

    /** The method. */
    static final Citation SOURCE = Citation.of("Bell & Laesecke 2016",
            "Bell, I.H., Laesecke, A.: Viscosity of refrigerants and other working fluids from residual entropy "
                    + "scaling. 16th International Refrigeration and Air Conditioning Conference at Purdue, paper "
                    + "1692 (2016)");

    private final HelmholtzEos eos;
    private final double molarGasConstant;
    private final double c;
    private final double[] cl;
    private final double[] cv;
    private final double crossover;
    private final double sigma;
    private final double epsilonOverK;
    private final double rhoSrCritical;

    /**
     * @param n                   the coefficient block
     * @param eos                 the fluid's equation of state
     * @param molarGasConstant    the equation's molar gas constant [J/(mol K)]
     * @param criticalTemperature Tc [K]
     * @param criticalDensity     rho_c [kg/m3]
     */
    BellLaesecke2016Viscosity(JsonNode n, HelmholtzEos eos, double molarGasConstant, double criticalTemperature,
            double criticalDensity) {
        this.eos = eos;
        this.molarGasConstant = molarGasConstant;
        this.c = JsonFields.num(n, "C");
        this.cl = JsonFields.arr(n, "cLiquid");
        this.cv = JsonFields.arr(n, "cVapour");
        this.crossover = JsonFields.num(n, "crossover");
        double[] lj = ChapmanEnskog.chungParameters(criticalTemperature, eos.molarMass() / criticalDensity);
        this.sigma = lj[0];
        this.epsilonOverK = lj[1];
        this.rhoSrCritical = rhoSr(criticalTemperature, criticalDensity);
    }

    private double rhoSr(double temperature, double density) {
        double delta = density / eos.reducingDensity();
        double tau = eos.reducingTemperature() / temperature;
        Derivatives r = eos.residual(delta, tau);
        return density / eos.molarMass() * molarGasConstant * (tau * r.at() - r.a());
    }

    @Override
    public double dilute(double temperature) {
        return ChapmanEnskog.viscosity(eos.molarMass(), temperature, sigma, epsilonOverK);
    }

    @Override
    public double viscosity(double temperature, double density) {
        double x = rhoSr(temperature, density) / rhoSrCritical;
        double psi = 1 / (1 + Math.exp(-100 * (x - crossover)));
        double fl = cl[0] + x * (cl[1] + x * (cl[2] + x * cl[3]));
        double fv = cv[0] + x * (cv[1] + x * (cv[2] + x * cv[3]));
        double etaRef = Math.exp(psi * fl + (1 - psi) * fv);
        return dilute(temperature) * (1 + c * (etaRef - 1));
    }
}
