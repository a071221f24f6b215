package org.finstack.tubeside;

import java.util.Objects;

import org.finstack.core.Check;
import org.finstack.core.Warnings;

/**
 * The acceleration (momentum) pressure change of a separated two-phase flow between two
 * qualities, from the momentum flux of the separated-flow model (e.g. Collier &amp; Thome 1994,
 * Convective Boiling and Condensation, 3rd ed., chapter 2):
 * <pre>
 *   M(x)      = x^2 / (rho_v alpha) + (1-x)^2 / (rho_l (1-alpha))       [m3/kg]
 *   p_in - p_out = G^2 [ M(x_out) - M(x_in) ]                           [Pa]
 * </pre>
 * with G [kg/(m2 s)] the mass flux and alpha [-] the void fraction from a chosen
 * {@link VoidFraction} method. The vapour term is taken as 0 at x = 0 and the liquid term as 0
 * at x = 1 (their limits). Positive when the quality rises (evaporation costs pressure),
 * negative when it falls (condensation recovers some).
 *
 * <p>Worked example ({@link #fromVoidFractions}): mass flow 1 kg/s in D = 0.1 m, x from 0.372
 * to 0.557, alpha from 0.992 to 0.996, rho_l = 827.1 and rho_v = 3.919 kg/m3 give 706.856 Pa
 * (the {@code fluids} library's {@code two_phase_dP_acceleration} docstring gives
 * 706.8560377214725).
 */
public final class AccelerationPressureChange {

    private AccelerationPressureChange() {
    }

    /**
     * Momentum flux per unit G^2 at one state.
     *
     * @param method void-fraction method
     * @param p      properties
     * @param f      flow
     * @param w      where warnings go
     * @return M [m3/kg]
     */
    public static double specificMomentum(VoidFraction method, SaturatedProperties p, TubeFlow f, Warnings w) {
        double x = f.quality();
        return momentum(x, method.voidFraction(p, f, w), p.liquidDensity(), p.vapourDensity());
    }

    /**
     * The pressure change from given void fractions, one set of densities.
     *
     * @param massFlux   mass flux [kg/(m2 s)]
     * @param qualityIn  inlet quality [-]
     * @param alphaIn    inlet void fraction [-]
     * @param qualityOut outlet quality [-]
     * @param alphaOut   outlet void fraction [-]
     * @param rhoL       liquid density [kg/m3]
     * @param rhoV       vapour density [kg/m3]
     * @return inlet minus outlet pressure due to acceleration [Pa]
     */
    public static double fromVoidFractions(double massFlux, double qualityIn, double alphaIn, double qualityOut,
            double alphaOut, double rhoL, double rhoV) {
        Check.positive("massFlux", massFlux);
        Check.positive("rhoL", rhoL);
        Check.positive("rhoV", rhoV);
        double out = momentum(qualityOut, alphaOut, rhoL, rhoV);
        return massFlux * massFlux * (out - momentum(qualityIn, alphaIn, rhoL, rhoV));
    }

    private static double momentum(double x, double a, double rhoL, double rhoV) {
        Check.within("quality", x, 0, 1);
        Check.within("voidFraction", a, 0, 1);
        double vapour = x == 0 ? 0 : x * x / (rhoV * a);
        double liquid = x == 1 ? 0 : (1 - x) * (1 - x) / (rhoL * (1 - a));
        return Tube.finitePositive(vapour + liquid, "acceleration pressure change");
    }

    /**
     * @param method    void-fraction method
     * @param in        properties at the inlet
     * @param out       properties at the outlet
     * @param diameter  inner diameter [m]
     * @param massFlux  mass flux [kg/(m2 s)]
     * @param qualityIn inlet quality [-]
     * @param qualityOut outlet quality [-]
     * @param w         where warnings go
     * @return inlet minus outlet pressure due to acceleration [Pa]
     */
    public static double between(VoidFraction method, SaturatedProperties in, SaturatedProperties out,
            double diameter, double massFlux, double qualityIn, double qualityOut, Warnings w) {
        Objects.requireNonNull(method, "method");
        Check.positive("massFlux", massFlux);
        double mIn = specificMomentum(method, in, TubeFlow.adiabatic(diameter, massFlux, qualityIn), w);
        double mOut = specificMomentum(method, out, TubeFlow.adiabatic(diameter, massFlux, qualityOut), w);
        return massFlux * massFlux * (mOut - mIn);
    }

    /**
     * The same with one set of properties for both ends.
     *
     * @param method     void-fraction method
     * @param p          properties
     * @param diameter   inner diameter [m]
     * @param massFlux   mass flux [kg/(m2 s)]
     * @param qualityIn  inlet quality [-]
     * @param qualityOut outlet quality [-]
     * @param w          where warnings go
     * @return inlet minus outlet pressure due to acceleration [Pa]
     */
    public static double between(VoidFraction method, SaturatedProperties p, double diameter, double massFlux,
            double qualityIn, double qualityOut, Warnings w) {
        return between(method, p, p, diameter, massFlux, qualityIn, qualityOut, w);
    }
}
