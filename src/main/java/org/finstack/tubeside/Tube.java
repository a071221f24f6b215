package org.finstack.tubeside;

import org.finstack.core.InputException;
import org.finstack.core.Msg;

/** Shared dimensionless groups of the in-tube methods (package-private helpers). */
final class Tube {

    /** Standard acceleration of gravity [m/s2] (3rd CGPM 1901; NIST SP 330). */
    static final double GRAVITY = 9.80665;

    private Tube() {
    }

    /**
     * @param massFlux  mass flux [kg/(m2 s)]
     * @param diameter  diameter [m]
     * @param viscosity dynamic viscosity [Pa s]
     * @return Reynolds number G D / mu [-]
     */
    static double reynolds(double massFlux, double diameter, double viscosity) {
        return massFlux * diameter / viscosity;
    }

    /**
     * Dittus-Boelter form with the heating exponent, as the two-phase correlations use it for
     * their single-phase reference: h = 0.023 Re^0.8 Pr^0.4 k / D (Dittus &amp; Boelter 1930,
     * Univ. Calif. Publ. Eng. 2:443).
     *
     * @param re Reynolds number [-]
     * @param pr Prandtl number [-]
     * @param k  conductivity [W/(m K)]
     * @param d  diameter [m]
     * @return heat transfer coefficient [W/(m2 K)]
     */
    static double dittusBoelter(double re, double pr, double k, double d) {
        return 0.023 * Math.pow(re, 0.8) * Math.pow(pr, 0.4) * k / d; // Dittus & Boelter 1930
    }

    /**
     * Liquid-only Froude number G^2 / (rho_l^2 g D) [-].
     *
     * @param p properties
     * @param f flow
     * @return the Froude number
     */
    static double liquidOnlyFroude(SaturatedProperties p, TubeFlow f) {
        double rl = p.liquidDensity();
        return f.massFlux() * f.massFlux() / (rl * rl * GRAVITY * f.diameter());
    }

    /**
     * Dimensionless vapour velocity J_G = x G / sqrt(g D rho_v (rho_l - rho_v)) [-].
     *
     * @param p properties
     * @param f flow
     * @return J_G
     */
    static double dimensionlessVapourVelocity(SaturatedProperties p, TubeFlow f) {
        return f.quality() * f.massFlux()
                / Math.sqrt(GRAVITY * f.diameter() * p.vapourDensity() * (p.liquidDensity() - p.vapourDensity()));
    }

    /**
     * Rejects a quality of exactly 1, where a liquid-film method has no liquid left.
     *
     * @param f      flow
     * @param method method name for the message
     */
    static void requireLiquid(TubeFlow f, String method) {
        if (!(f.quality() < 1)) {
            throw new InputException("flow.quality", Msg.IMPOSSIBLE,
                    method + " needs some liquid: quality must be less than 1, got " + f.quality());
        }
    }

    /**
     * Throws if a result is not a finite, positive number (a guard against silent NaN).
     *
     * @param value  result
     * @param method method name for the message
     * @return value
     */
    static double finitePositive(double value, String method) {
        if (!(Double.isFinite(value) && value > 0)) {
            throw new InputException("flow", Msg.IMPOSSIBLE, method + " cannot be evaluated for these inputs");
        }
        return value;
    }
}
