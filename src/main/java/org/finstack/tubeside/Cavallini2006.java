package org.finstack.tubeside;

import java.util.Locale;
import java.util.Set;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Cavallini et al.'s (2006) model for condensation in horizontal smooth tubes, with a
 * temperature-difference-independent regime (annular, shear-dominated) and a
 * temperature-difference-dependent regime (stratified, gravity-dominated):
 * <pre>
 *   J_G   = x G / sqrt(g D rho_v (rho_l - rho_v))
 *   X_tt  = (mu_l/mu_v)^0.1 (rho_v/rho_l)^0.5 ((1-x)/x)^0.9
 *   J_G^T = { [7.5 / (4.3 X_tt^1.111 + 1)]^-3 + C_T^-3 }^(-1/3),  C_T = 1.6 hydrocarbons, 2.6 other refrigerants
 *   h_LO  = 0.023 Re_LO^0.8 Pr_l^0.4 k_l / D,   Re_LO = G D / mu_l
 *   h_A   = h_LO [1 + 1.128 x^0.8170 (rho_l/rho_v)^0.3685 (mu_l/mu_v)^0.2363 (1 - mu_v/mu_l)^2.144 Pr_l^-0.100]
 *   J_G &gt; J_G^T (dT-independent):  h = h_A
 *   J_G &le; J_G^T (dT-dependent):   h = [h_A,T (J_G^T/J_G)^0.8 - h_STRAT] (J_G/J_G^T) + h_STRAT
 *   h_STRAT = 0.725 {1 + 0.741 [(1-x)/x]^0.3321}^-1 [k_l^3 rho_l (rho_l - rho_v) g h_lv / (mu_l D dT)]^0.25
 *             + (1 - x^0.087) h_LO
 * </pre>
 * h_A,T is h_A at the transition, evaluated here at the quality x_T where J_G equals the local
 * J_G^T (x_T = J_G^T sqrt(g D rho_v (rho_l - rho_v)) / G, at most 1). dT [K] is the
 * saturation-to-wall temperature difference, an input of the caller (the coil model iterates on
 * the wall temperature). C_T is chosen from the fluid name: the hydrocarbons in
 * {@link #HYDROCARBONS} get 1.6. Other symbols and units as in {@link Shah1979}. In the
 * dT-dependent regime h need not rise with quality: with a small dT the gravity-driven term
 * h_STRAT can exceed the annular value, and h then falls towards the transition, where it
 * joins h_A continuously; this is how the published equations behave.
 *
 * <p>Validity (from memory): pr below 0.75, rho_l/rho_v above 4, D 3 to 17 mm; the paper's
 * accuracy figures were not read here.
 *
 * <p>Worked example (fixture R134a at about 40 °C, see the package comment, dT = 5 K):
 * D = 8 mm, G = 400 kg/(m2 s), x = 0.6 give h = 3978.42 W/(m2 K) (dT-independent);
 * G = 50 kg/(m2 s), x = 0.2 give h = 1699.59 W/(m2 K) (dT-dependent).
 */
public final class Cavallini2006 implements CondensationCorrelation {

    /** Identifier in {@link CondensationCorrelations}. */
    public static final String ID = "cavallini-2006";

    /** The paper. */
    public static final Citation SOURCE = Citation.of("Cavallini et al. 2006",
            "Cavallini, A., Del Col, D., Doretti, L., Matkovic, M., Rossetto, L., Zilio, C., Censi, G., 2006,"
                    + " \"Condensation in horizontal smooth tubes: a new heat transfer model for heat exchanger"
                    + " design\", Heat Transfer Engineering 27(8):31-38");

    /** Published range (from memory). */
    public static final Validity VALIDITY = Validity.of(
            Limit.of("pr", 0, 0.75), // Cavallini et al. 2006, from memory
            Limit.of("rho_l/rho_v", 4, Double.MAX_VALUE), // idem
            Limit.of("D", 3, 17, "mm")); // idem

    /** Fluids (normalised names) that take C_T = 1.6 (hydrocarbons, Cavallini et al. 2006). */
    public static final Set<String> HYDROCARBONS = Set.of("R170", "ETHANE", "R290", "PROPANE", "R600", "BUTANE",
            "NBUTANE", "R600A", "ISOBUTANE", "R601", "PENTANE", "NPENTANE", "R601A", "ISOPENTANE", "R1270",
            "PROPYLENE", "PROPENE");

    /** The single instance. */
    public static final Cavallini2006 INSTANCE = new Cavallini2006();

    private static final String METHOD = "Cavallini et al. 2006";

    private Cavallini2006() {
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
     * @param fluid a fluid name
     * @return C_T: 1.6 for a hydrocarbon, 2.6 otherwise (Cavallini et al. 2006)
     */
    public static double transitionConstant(String fluid) {
        String key = fluid == null ? "" : fluid.toUpperCase(Locale.ROOT).replace("-", "").replace(" ", "");
        return HYDROCARBONS.contains(key) ? 1.6 : 2.6; // Cavallini et al. 2006
    }

    /**
     * @param p properties
     * @param f flow, quality above 0
     * @return the transition velocity J_G^T [-] at the flow's quality
     */
    public static double transitionVelocity(SaturatedProperties p, TubeFlow f) {
        double x = f.quality();
        double xtt = Math.pow(p.liquidViscosity() / p.vapourViscosity(), 0.1)
                * Math.sqrt(p.vapourDensity() / p.liquidDensity()) * Math.pow((1 - x) / x, 0.9);
        double ct = transitionConstant(p.fluid());
        double a = 7.5 / (4.3 * Math.pow(xtt, 1.111) + 1); // Cavallini et al. 2006
        return Math.pow(Math.pow(a, -3) + Math.pow(ct, -3), -1.0 / 3);
    }

    @Override
    public double heatTransferCoefficient(SaturatedProperties p, TubeFlow f, double wallSubcooling, Warnings w) {
        Check.positive("wallSubcooling", wallSubcooling);
        Tube.requireLiquid(f, METHOD);
        VALIDITY.check(METHOD, "pr", p.reducedPressure(), w);
        VALIDITY.check(METHOD, "rho_l/rho_v", p.liquidDensity() / p.vapourDensity(), w);
        VALIDITY.check(METHOD, "D", f.diameter() * 1e3, w);
        double relo = Tube.reynolds(f.massFlux(), f.diameter(), p.liquidViscosity());
        double hlo = Tube.dittusBoelter(relo, p.liquidPrandtl(), p.liquidConductivity(), f.diameter());
        double x = f.quality();
        if (x == 0) {
            return Tube.finitePositive(hlo, METHOD); // limit of h_STRAT as x -> 0
        }
        double jg = Tube.dimensionlessVapourVelocity(p, f);
        double jgt = transitionVelocity(p, f);
        if (jg > jgt) {
            return Tube.finitePositive(annular(p, x, hlo), METHOD);
        }
        double scale = Math.sqrt(Tube.GRAVITY * f.diameter() * p.vapourDensity()
                * (p.liquidDensity() - p.vapourDensity()));
        double xt = Math.min(1, jgt * scale / f.massFlux());
        double hat = annular(p, xt, hlo);
        double kl = p.liquidConductivity();
        double strat = 0.725 / (1 + 0.741 * Math.pow((1 - x) / x, 0.3321)) // Cavallini et al. 2006
                * Math.pow(kl * kl * kl * p.liquidDensity() * (p.liquidDensity() - p.vapourDensity()) * Tube.GRAVITY
                        * p.latentHeat() / (p.liquidViscosity() * f.diameter() * wallSubcooling), 0.25)
                + (1 - Math.pow(x, 0.087)) * hlo;
        double h = (hat * Math.pow(jgt / jg, 0.8) - strat) * (jg / jgt) + strat;
        return Tube.finitePositive(h, METHOD);
    }

    private static double annular(SaturatedProperties p, double x, double hlo) {
        double rv = p.vapourViscosity() / p.liquidViscosity();
        return hlo * (1 + 1.128 * Math.pow(x, 0.8170) // Cavallini et al. 2006
                * Math.pow(p.liquidDensity() / p.vapourDensity(), 0.3685)
                * Math.pow(1 / rv, 0.2363) * Math.pow(1 - rv, 2.144) * Math.pow(p.liquidPrandtl(), -0.100));
    }
}
