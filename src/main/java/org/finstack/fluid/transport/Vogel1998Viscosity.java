package org.finstack.fluid.transport;

import com.fasterxml.jackson.databind.JsonNode;
import org.finstack.core.Citation;
import org.finstack.fluid.internal.JsonFields;

/**
 * The residual-viscosity form of Vogel, Kuechenmeister, Bich &amp; Laesecke (1998), used with
 * fluid-specific coefficients by the dedicated correlations for R134a (Huber, Laesecke &amp;
 * Perkins 2003), R125 (Huber &amp; Laesecke 2006), propane (Vogel et al. 1998), isobutane (Vogel,
 * Kuechenmeister &amp; Bich 2000) and ammonia (Fenghour et al. 1995):
 * <pre>
 *   eta = eta0(T) + eta1(T) rho_m + d_eta_h(delta, tau)
 *   eta0 = Chapman-Enskog, with the fluid's own collision-integral fit
 *          C sqrt(M T) / (sigma^2 exp(sum a_i (ln T*)^t_i)) or Neufeld et al. (1972)
 *   eta1 = eta0 N_A sigma^3 sum b_i T*^t_i   (Rainwater-Friend second viscosity virial coefficient)
 *   d_eta_h = sum a_i delta^d1_i tau^t1_i exp(gamma_i delta^l_i)
 *             + F (1 / (delta0 - delta) - 1 / delta0),  F = sum f_i delta^d2_i tau^t2_i,
 *   delta0 = sum g_i tau^h_i / sum p_i tau^q_i
 * </pre>
 * with rho_m the molar density [mol/m3], delta = rho_m / rho_red, tau = T_red / T, T* = T / (epsilon/k).
 * Each fluid's paper states its range and scatter (e.g. R134a: 3 % in the liquid, 0.5 % in the
 * dilute gas, Huber et al. 2003).
 */
final class Vogel1998Viscosity implements ViscosityCorrelation {

    /** The form. */
    static final Citation FORM = Citation.of("Vogel et al. 1998",
            "Vogel, E., Kuechenmeister, C., Bich, E., Laesecke, A.: Reference Correlation of the Viscosity of "
                    + "Propane. J. Phys. Chem. Ref. Data 27(5), 947-970 (1998)");

    /** Avogadro constant [1/mol] (SI 2019 exact value). */
    static final double AVOGADRO = 6.02214076e23;

    private final double molarMass;
    private final double sigma;
    private final double epsilonOverK;
    private final boolean neufeld;
    private final double c;
    private final double[] ca;
    private final double[] ct;
    private final double ciMolarMass;
    private final double[] b;
    private final double[] bt;
    private final double tRed;
    private final double rhoRed;
    private final double[] a;
    private final double[] d1;
    private final double[] t1;
    private final double[] gamma;
    private final double[] l;
    private final double[] f;
    private final double[] d2;
    private final double[] t2;
    private final double[] g;
    private final double[] h;
    private final double[] p;
    private final double[] q;

    Vogel1998Viscosity(JsonNode n, double molarMass) {
        this.molarMass = molarMass;
        this.sigma = JsonFields.num(n, "sigma");
        this.epsilonOverK = JsonFields.num(n, "epsilonOverK");
        JsonNode dil = JsonFields.req(n, "dilute");
        this.neufeld = "neufeld".equals(JsonFields.text(dil, "type"));
        this.c = neufeld ? 0 : JsonFields.num(dil, "C");
        this.ca = neufeld ? new double[0] : JsonFields.arr(dil, "a");
        this.ct = neufeld ? new double[0] : JsonFields.arr(dil, "t");
        this.ciMolarMass = neufeld ? molarMass : JsonFields.num(dil, "molarMass");
        JsonNode id = JsonFields.req(n, "initialDensity");
        this.b = JsonFields.arr(id, "b");
        this.bt = JsonFields.arr(id, "t");
        JsonNode ho = JsonFields.req(n, "higherOrder");
        this.tRed = JsonFields.num(ho, "reducingTemperature");
        this.rhoRed = JsonFields.num(ho, "reducingMolarDensity");
        this.a = JsonFields.arr(ho, "a");
        this.d1 = JsonFields.arr(ho, "d1");
        this.t1 = JsonFields.arr(ho, "t1");
        this.gamma = JsonFields.arr(ho, "gamma");
        this.l = JsonFields.arr(ho, "l");
        this.f = JsonFields.arr(ho, "f");
        this.d2 = JsonFields.arr(ho, "d2");
        this.t2 = JsonFields.arr(ho, "t2");
        this.g = JsonFields.arr(ho, "g");
        this.h = JsonFields.arr(ho, "h");
        this.p = JsonFields.arr(ho, "p");
        this.q = JsonFields.arr(ho, "q");
    }

    @Override
    public double dilute(double temperature) {
        if (neufeld) {
            return ChapmanEnskog.viscosity(molarMass, temperature, sigma, epsilonOverK);
        }
        double lnT = Math.log(temperature / epsilonOverK);
        double s = 0;
        for (int i = 0; i < ca.length; i++) {
            s += ca[i] * Math.pow(lnT, ct[i]);
        }
        double sNm = sigma * 1e9;
        return c * Math.sqrt(ciMolarMass * 1000 * temperature) / (sNm * sNm * Math.exp(s));
    }

    @Override
    public double viscosity(double temperature, double density) {
        double eta0 = dilute(temperature);
        double rhoM = density / molarMass;
        double bStar = Data.powerSum(b, bt, temperature / epsilonOverK);
        double eta1 = eta0 * bStar * AVOGADRO * sigma * sigma * sigma * rhoM;
        double delta = rhoM / rhoRed;
        double tau = tRed / temperature;
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] * Math.pow(delta, d1[i]) * Math.pow(tau, t1[i]) * Math.exp(gamma[i] * Math.pow(delta, l[i]));
        }
        double ff = 0;
        for (int i = 0; i < f.length; i++) {
            ff += f[i] * Math.pow(delta, d2[i]) * Math.pow(tau, t2[i]);
        }
        double delta0 = Data.powerSum(g, h, tau) / Data.powerSum(p, q, tau);
        double high = s + (ff == 0 ? 0 : ff * (1 / (delta0 - delta) - 1 / delta0));
        return eta0 + eta1 + high;
    }
}
