package org.finstack.tubeside;

import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Gungor &amp; Winterton's (1987) simplified correlation for saturated flow boiling in tubes (the
 * 1987 simplified form, not the 1986 superposition form with a separate pool-boiling term):
 * <pre>
 *   h   = E h_l
 *   E   = 1 + 3000 Bo^0.86 + 1.12 (x/(1-x))^0.75 (rho_l/rho_v)^0.41
 *   E  *= Fr_lo^(0.1 - 2 Fr_lo)                  horizontal tube with Fr_lo &lt; 0.05
 *   h_l = 0.023 Re_l^0.8 Pr_l^0.4 k_l / D,   Re_l = G (1-x) D / mu_l
 *   Bo  = q / (G h_lv),   Fr_lo = G^2 / (rho_l^2 g D)
 * </pre>
 * with q [W/m2] the heat flux, G [kg/(m2 s)] the mass flux, x [-] the quality, D [m] the inner
 * diameter, h_lv [J/kg] the latent heat, rho [kg/m3], mu [Pa s], k [W/(m K)] and Pr [-] of the
 * saturated phases, g [m/s2] standard gravity. The tube is taken as horizontal.
 *
 * <p>Validity (the Gungor &amp; Winterton database, as tabulated for this correlation by
 * Nanoscale Res. Lett. 8:130 (2013), Table 2): D 3 to 32 mm, saturation pressure 0.008 to
 * 203 bar, G 12 to 61 518 kg/(m2 s); water, R11, R12, R22, R113, R114 and ethylene glycol.
 * The paper reports its deviation against 3693 saturated-boiling data points; that figure was
 * not read here. Above x = 0.9 the {@link Dryout} treatment applies.
 *
 * <p>Worked example (fixture R134a at about 5 °C, see the package comment):
 * D = 8 mm, G = 200 kg/(m2 s), x = 0.5, q = 10 kW/m2 give h = 2798.60 W/(m2 K).
 */
public final class GungorWinterton1987 implements BoilingCorrelation {

    /** Identifier in {@link BoilingCorrelations}. */
    public static final String ID = "gungor-winterton-1987";

    /** The paper. */
    public static final Citation SOURCE = Citation.of("Gungor & Winterton 1987",
            "Gungor, K.E., Winterton, R.H.S., 1987, \"Simplified general correlation for saturated flow boiling"
                    + " and comparisons of correlations with data\", Chem. Eng. Res. Des. 65:148-156");

    /** Published range (see the class comment for its source). */
    public static final Validity VALIDITY = Validity.of(
            Limit.of("D", 3, 32, "mm"), // Gungor & Winterton database, Nanoscale Res. Lett. 8:130 Table 2
            Limit.of("p", 0.008, 203, "bar"), // idem
            Limit.of("G", 12, 61_518, "kg/(m2 s)")); // idem

    /** Froude number below which the stratification factor applies (the paper). */
    public static final double FROUDE_STRATIFIED = 0.05;

    /** The single instance. */
    public static final GungorWinterton1987 INSTANCE = new GungorWinterton1987();

    private static final String METHOD = "Gungor & Winterton 1987";

    private GungorWinterton1987() {
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
        VALIDITY.check(METHOD, "D", f.diameter() * 1e3, w);
        VALIDITY.check(METHOD, "p", p.pressure() / 1e5, w);
        VALIDITY.check(METHOD, "G", f.massFlux(), w);
        double x = f.quality();
        double bo = f.heatFlux() / (f.massFlux() * p.latentHeat());
        double rel = Tube.reynolds(f.massFlux() * (1 - x), f.diameter(), p.liquidViscosity());
        double hl = Tube.dittusBoelter(rel, p.liquidPrandtl(), p.liquidConductivity(), f.diameter());
        double e = 1 + 3000 * Math.pow(bo, 0.86) // Gungor & Winterton 1987
                + 1.12 * Math.pow(x / (1 - x), 0.75) * Math.pow(p.liquidDensity() / p.vapourDensity(), 0.41);
        double fr = Tube.liquidOnlyFroude(p, f);
        if (fr < FROUDE_STRATIFIED) {
            e *= Math.pow(fr, 0.1 - 2 * fr); // Gungor & Winterton 1987, horizontal tubes
        }
        return Tube.finitePositive(e * hl, METHOD);
    }
}
