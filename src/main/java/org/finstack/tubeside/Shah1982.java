package org.finstack.tubeside;

import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Shah's (1982) chart correlation for saturated flow boiling, in its equation form:
 * <pre>
 *   h    = psi h_l,   h_l = 0.023 Re_l^0.8 Pr_l^0.4 k_l / D,   Re_l = G (1-x) D / mu_l
 *   Co   = ((1-x)/x)^0.8 (rho_v/rho_l)^0.5,   Bo = q / (G h_lv),   Fr_l = G^2 / (rho_l^2 g D)
 *   N    = Co                          (Fr_l &ge; 0.04)
 *   N    = 0.38 Fr_l^-0.3 Co           (horizontal tube, Fr_l &lt; 0.04)
 *   F    = 14.7 (Bo &ge; 11e-4),  15.43 (Bo &lt; 11e-4)
 *   psi_cb = 1.8 / N^0.8
 *   N &gt; 1:        psi_nb = 230 Bo^0.5 (Bo &gt; 0.3e-4), 1 + 46 Bo^0.5 (otherwise); psi = max(psi_nb, psi_cb)
 *   0.1 &lt; N &le; 1: psi_bs = F Bo^0.5 exp(2.74 N^-0.1);  psi = max(psi_bs, psi_cb)
 *   N &le; 0.1:      psi_bs = F Bo^0.5 exp(2.47 N^-0.15); psi = max(psi_bs, psi_cb)
 * </pre>
 * Symbols and units as in {@link GungorWinterton1987}. The tube is taken as horizontal. Where the
 * bubble-suppression branch governs, the step of F at Bo = 11e-4 makes h drop by about 5 % as
 * the heat flux crosses it: a property of the published equations, kept as published.
 *
 * <p>Validity: the paper's database ranges and its mean deviation were not read here; the
 * equations are as commonly restated from the paper (from memory). Only the quality range of
 * the form is checked. Above x = 0.9 the {@link Dryout} treatment applies.
 *
 * <p>Worked example (fixture R134a at about 5 °C): D = 8 mm, G = 200 kg/(m2 s), x = 0.5,
 * q = 10 kW/m2 give h = 2823.72 W/(m2 K).
 */
public final class Shah1982 implements BoilingCorrelation {

    /** Identifier in {@link BoilingCorrelations}. */
    public static final String ID = "shah-1982";

    /** The paper. */
    public static final Citation SOURCE = Citation.of("Shah 1982",
            "Shah, M.M., 1982, \"Chart correlation for saturated boiling heat transfer: equations and further"
                    + " study\", ASHRAE Transactions 88(1):185-196");

    /** Range of the equation form only (the paper's database range was not read). */
    public static final Validity VALIDITY = Validity.assessed("of the equation form (database range not read)",
            Limit.of("x", 0, 1));

    /** The single instance. */
    public static final Shah1982 INSTANCE = new Shah1982();

    private static final String METHOD = "Shah 1982";

    private Shah1982() {
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public Citation source() {
        return SOURCE;
    }

    @Override
    public Validity validity() {
        return VALIDITY;
    }

    @Override
    public double wetWall(SaturatedProperties p, TubeFlow f, Warnings w) {
        BoilingCorrelation.requireHeatFlux(f);
        Tube.requireLiquid(f, METHOD);
        double x = f.quality();
        double bo = f.heatFlux() / (f.massFlux() * p.latentHeat());
        double rel = Tube.reynolds(f.massFlux() * (1 - x), f.diameter(), p.liquidViscosity());
        double hl = Tube.dittusBoelter(rel, p.liquidPrandtl(), p.liquidConductivity(), f.diameter());
        double fr = Tube.liquidOnlyFroude(p, f);
        double psi;
        if (x == 0) {
            psi = bo > 0.3e-4 ? 230 * Math.sqrt(bo) : 1 + 46 * Math.sqrt(bo); // Shah 1982, N -> infinity
        } else {
            double co = Math.pow((1 - x) / x, 0.8) * Math.sqrt(p.vapourDensity() / p.liquidDensity());
            double n = fr >= 0.04 ? co : 0.38 * Math.pow(fr, -0.3) * co; // Shah 1982
            double ff = bo >= 11e-4 ? 14.7 : 15.43; // Shah 1982
            double psiCb = 1.8 / Math.pow(n, 0.8); // Shah 1982
            double psiOther;
            if (n > 1) {
                psiOther = bo > 0.3e-4 ? 230 * Math.sqrt(bo) : 1 + 46 * Math.sqrt(bo); // Shah 1982
            } else if (n > 0.1) {
                psiOther = ff * Math.sqrt(bo) * Math.exp(2.74 * Math.pow(n, -0.1)); // Shah 1982
            } else {
                psiOther = ff * Math.sqrt(bo) * Math.exp(2.47 * Math.pow(n, -0.15)); // Shah 1982
            }
            psi = Math.max(psiOther, psiCb);
        }
        return Tube.finitePositive(psi * hl, METHOD);
    }
}
