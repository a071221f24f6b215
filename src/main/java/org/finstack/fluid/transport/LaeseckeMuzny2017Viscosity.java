package org.finstack.fluid.transport;

import com.fasterxml.jackson.databind.JsonNode;
import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.fluid.internal.JsonFields;

/**
 * Viscosity of carbon dioxide (R744), reference correlation of Laesecke &amp; Muzny (2017):
 * <pre>
 *   eta = eta0(T) + eta1(T) rho_m + d_eta_r(T, rho)
 *   eta0 = 1.0055 sqrt(T) / (a0 + a1 T^(1/6) + a2 exp(a3 T^(1/3)) + (a4 + a5 T^(1/3)) / exp(T^(1/3))
 *          + a6 sqrt(T))                                                        [mPa s], T [K]
 *   eta1 = eta0 N_A sigma^3 sum b_i T*^t_i,  T* = T / (epsilon/k)
 *   d_eta_r = eta_tL (c1 Tr rho_r^3 + (rho_r^2 + rho_r^gamma) / (Tr - c2))
 *   eta_tL = rho_tL^(2/3) sqrt(R T_t) / (M^(1/6) N_A^(1/3)),  Tr = T / T_t,  rho_r = rho / rho_tL
 * </pre>
 * T [K], rho [kg/m3]. Published range: triple point (216.592 K) to 2000 K, up to 8 GPa in the
 * liquid; stated uncertainty (k = 2) 2.5 % in the dilute gas at 300 K up to 5 % at 1000 K, 3.5 %
 * in the liquid up to 1 GPa (Laesecke &amp; Muzny 2017). Worked example: T = 300 K, rho = 1.7730 kg/m3
 * (0.1 MPa) gives 1.5003e-5 Pa s (value repeated in LaeseckeMuzny2017ViscosityTest).
 */
final class LaeseckeMuzny2017Viscosity implements ViscosityCorrelation {

    /** The correlation. */
    static final Citation SOURCE = Citation.of("Laesecke & Muzny 2017",
            "Laesecke, A., Muzny, C.D.: Reference Correlation for the Viscosity of Carbon Dioxide. J. Phys. Chem. "
                    + "Ref. Data 46(1), 013107 (2017)");

    /** Published range. */
    static final Validity VALIDITY = Validity.of(Limit.of("T", 216.592, 2000, "K"));

    // Laesecke & Muzny 2017, eq. 4 and Table 3: dilute-gas coefficients (from memory; checked against
    // CoolProp 8.0.0 to 1e-9, see LaeseckeMuzny2017ViscosityTest)
    private static final double[] A = {1749.354893188350, -369.069300007128, 5423856.34887691, -2.21283852168356,
        -269503.247933569, 73145.021531826, 5.34368649509278};
    // Laesecke & Muzny 2017, eq. 9-10: residual constants (from memory, checked as above)
    private static final double C1 = 0.360603235428487;
    private static final double C2 = 0.121550806591497;
    private static final double GAMMA = 8.06282737481277;
    /** Triple-point temperature [K] and saturated-liquid density there [kg/m3] (Laesecke & Muzny 2017). */
    private static final double T_TRIPLE = 216.592;
    private static final double RHO_TRIPLE_LIQUID = 1178.53;
    /** Molar mass [kg/mol] and gas constant [J/(mol K)] as used by the paper (from memory). */
    private static final double M = 0.0440098;
    private static final double R = 8.3144598;

    private final double sigma;
    private final double epsilonOverK;
    private final double[] b;
    private final double[] bt;

    /**
     * @param n the coefficient block (Lennard-Jones parameters and Rainwater-Friend coefficients of
     *          the initial-density term)
     */
    LaeseckeMuzny2017Viscosity(JsonNode n) {
        this.sigma = JsonFields.num(n, "sigma");
        this.epsilonOverK = JsonFields.num(n, "epsilonOverK");
        JsonNode id = JsonFields.req(n, "initialDensity");
        this.b = JsonFields.arr(id, "b");
        this.bt = JsonFields.arr(id, "t");
    }

    @Override
    public double dilute(double temperature) {
        double t = temperature;
        double t3 = Math.cbrt(t);
        double den = A[0] + A[1] * Math.pow(t, 1.0 / 6) + A[2] * Math.exp(A[3] * t3) + (A[4] + A[5] * t3) / Math.exp(t3)
                + A[6] * Math.sqrt(t);
        return 1.0055 * Math.sqrt(t) / den * 1e-3;
    }

    @Override
    public double viscosity(double temperature, double density) {
        double eta0 = dilute(temperature);
        double bStar = Data.powerSum(b, bt, temperature / epsilonOverK);
        double eta1 = eta0 * bStar * Vogel1998Viscosity.AVOGADRO * sigma * sigma * sigma * density / M;
        double etaTl = Math.pow(RHO_TRIPLE_LIQUID, 2.0 / 3) * Math.sqrt(R * T_TRIPLE)
                / (Math.pow(M, 1.0 / 6) * Math.cbrt(Vogel1998Viscosity.AVOGADRO));
        double tr = temperature / T_TRIPLE;
        double rr = density / RHO_TRIPLE_LIQUID;
        double res = etaTl * (C1 * tr * rr * rr * rr + (rr * rr + Math.pow(rr, GAMMA)) / (tr - C2));
        return eta0 + eta1 + res;
    }
}
