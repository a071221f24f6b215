package org.finstack.tubeside;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Kandlikar's (1990) general correlation for saturated flow boiling in horizontal and vertical
 * tubes:
 * <pre>
 *   h   = max(h_NBD, h_CBD)
 *   h_i = h_l [ C1 Co^C2 (25 Fr_lo)^C5 + C3 Bo^C4 F_fl ]
 *         convective boiling dominant (CBD): C1 = 1.1360, C2 = -0.9, C3 = 667.2, C4 = 0.7, C5 = 0.3
 *         nucleate boiling dominant (NBD):   C1 = 0.6683, C2 = -0.2, C3 = 1058.0, C4 = 0.7, C5 = 0.3
 *         C5 = 0 when Fr_lo &ge; 0.04 (the Froude factor only acts on stratifying horizontal flow)
 *   h_l = 0.023 Re_l^0.8 Pr_l^0.4 k_l / D,   Re_l = G (1-x) D / mu_l
 *   Co  = ((1-x)/x)^0.8 (rho_v/rho_l)^0.5,   Bo = q / (G h_lv),   Fr_lo = G^2 / (rho_l^2 g D)
 * </pre>
 * F_fl [-] is the fluid-surface parameter, looked up by the fluid name of the properties in
 * {@link #FLUID_PARAMETERS}; an unlisted fluid gets F_fl = 1 with a warning. The tube is taken
 * as horizontal. Other symbols and units as in {@link GungorWinterton1987}.
 *
 * <p>Validity: the database of the paper (5246 data points from 24 experimental investigations,
 * Kandlikar 1990 abstract) covers qualities up to about 0.8 (from memory); a warning above that.
 * Published accuracy: mean deviation 15.9 % for water and 18.8 % for the refrigerants
 * (Kandlikar 1990 abstract). Above x = 0.9 the {@link Dryout} treatment applies.
 *
 * <p>Worked example (fixture R134a at about 5 °C, F_fl = 1.63): D = 8 mm, G = 200 kg/(m2 s),
 * x = 0.5, q = 10 kW/m2 give h = 3142.67 W/(m2 K).
 */
public final class Kandlikar1990 implements BoilingCorrelation {

    /** Identifier in {@link BoilingCorrelations}. */
    public static final String ID = "kandlikar-1990";

    /** The paper. */
    public static final Citation SOURCE = Citation.of("Kandlikar 1990",
            "Kandlikar, S.G., 1990, \"A general correlation for saturated two-phase flow boiling heat transfer"
                    + " inside horizontal and vertical tubes\", J. Heat Transfer 112:219-228");

    /** The source of the R134a parameter, not in the 1990 paper. */
    public static final Citation R134A_SOURCE = Citation.of("Kandlikar 1991",
            "Kandlikar, S.G., 1991, \"A model for correlating flow boiling heat transfer in augmented tubes and"
                    + " compact evaporators\", J. Heat Transfer 113:966-972");

    /** Published range (quality limit from memory). */
    public static final Validity VALIDITY = Validity.of(
            Limit.of("x", 0, 0.8)); // Kandlikar 1990 database, from memory

    /**
     * F_fl by normalised fluid name (upper case, without '-' or spaces): Kandlikar 1990, Table 3
     * (from memory), and R134a from Kandlikar 1991 (from memory).
     */
    public static final Map<String, Double> FLUID_PARAMETERS;

    static {
        Map<String, Double> m = new LinkedHashMap<>();
        m.put("WATER", 1.00); // Kandlikar 1990 Table 3
        m.put("R11", 1.30); // idem
        m.put("R12", 1.50); // idem
        m.put("R13B1", 1.31); // idem
        m.put("R22", 2.20); // idem
        m.put("R113", 1.30); // idem
        m.put("R114", 1.24); // idem
        m.put("R152A", 1.10); // idem
        m.put("NITROGEN", 4.70); // idem
        m.put("NEON", 3.50); // idem
        m.put("R134A", 1.63); // Kandlikar 1991
        FLUID_PARAMETERS = Map.copyOf(m);
    }

    private static final Map<String, String> ALIASES = Map.of("H2O", "WATER", "R718", "WATER", "N2", "NITROGEN",
            "R728", "NITROGEN", "NE", "NEON", "R720", "NEON");

    /** The single instance. */
    public static final Kandlikar1990 INSTANCE = new Kandlikar1990();

    private static final String METHOD = "Kandlikar 1990";

    private Kandlikar1990() {
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

    /**
     * @param fluid a fluid name, e.g. "R-134a", "r22", "water"
     * @param w     gets a warning when the fluid is not listed
     * @return F_fl [-], 1 for an unlisted fluid
     */
    public static double fluidParameter(String fluid, Warnings w) {
        String key = fluid == null ? "" : fluid.toUpperCase(Locale.ROOT).replace("-", "").replace(" ", "");
        key = ALIASES.getOrDefault(key, key);
        Double v = FLUID_PARAMETERS.get(key);
        if (v == null) {
            w.add(METHOD + ": no published fluid parameter F_fl for \"" + fluid + "\"; F_fl = 1 used");
            return 1.0;
        }
        return v;
    }

    @Override
    public double wetWall(SaturatedProperties p, TubeFlow f, Warnings w) {
        BoilingCorrelation.requireHeatFlux(f);
        Tube.requireLiquid(f, METHOD);
        VALIDITY.check(METHOD, "x", f.quality(), w);
        double ffl = fluidParameter(p.fluid(), w);
        double x = f.quality();
        double bo = f.heatFlux() / (f.massFlux() * p.latentHeat());
        double rel = Tube.reynolds(f.massFlux() * (1 - x), f.diameter(), p.liquidViscosity());
        double hl = Tube.dittusBoelter(rel, p.liquidPrandtl(), p.liquidConductivity(), f.diameter());
        double fr = Tube.liquidOnlyFroude(p, f);
        double c5 = fr < 0.04 ? 0.3 : 0; // Kandlikar 1990
        double frFactor = Math.pow(25 * fr, c5);
        double nucleate = Math.pow(bo, 0.7) * ffl; // C4 = 0.7 in both regions, Kandlikar 1990
        double ratio;
        if (x == 0) {
            ratio = 1058.0 * nucleate; // Co -> infinity: only the nucleate terms remain
        } else {
            double co = Math.pow((1 - x) / x, 0.8) * Math.sqrt(p.vapourDensity() / p.liquidDensity());
            double cbd = 1.1360 * Math.pow(co, -0.9) * frFactor + 667.2 * nucleate; // Kandlikar 1990
            double nbd = 0.6683 * Math.pow(co, -0.2) * frFactor + 1058.0 * nucleate; // Kandlikar 1990
            ratio = Math.max(cbd, nbd);
        }
        return Tube.finitePositive(ratio * hl, METHOD);
    }
}
