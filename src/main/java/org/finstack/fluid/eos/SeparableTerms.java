package org.finstack.fluid.eos;

import java.util.Arrays;

/**
 * Residual terms that separate into a density factor and a temperature factor,
 * {@code n * delta^d * exp(phi(delta)) * tau^t * exp(psi(tau))}. This one form covers the term
 * types of the reference equations of state used here:
 * <ul>
 * <li>{@link Kind#POWER}: {@code phi = -delta^l} (no exponential when l = 0), {@code psi = 0}
 * (polynomial and exponential terms, e.g. Tillner-Roth &amp; Baehr 1994);</li>
 * <li>{@link Kind#POWER_EXP_TAU}: {@code phi = -delta^l}, {@code psi = -tau^m} (when m &gt; 0;
 * Lemmon &amp; Jacobsen 2005);</li>
 * <li>{@link Kind#GAUSSIAN}: {@code phi = -eta (delta - epsilon)^2},
 * {@code psi = -beta (tau - gamma)^2} (bell-shaped terms, e.g. Span &amp; Wagner 1996);</li>
 * <li>{@link Kind#GAO_B}: {@code phi = eta (delta - epsilon)^2},
 * {@code psi = 1 / (beta (tau - gamma)^2 + b)} (Gao et al. 2020, ammonia).</li>
 * </ul>
 * Derivatives come from the logarithmic derivatives of each factor:
 * {@code F'/F = d/delta + phi'}, {@code F''/F = (F'/F)^2 - d/delta^2 + phi''}, likewise in tau.
 */
public final class SeparableTerms implements TermGroup {

    /** The functional form of the group. */
    public enum Kind {
        /** n delta^d tau^t exp(-delta^l). */
        POWER,
        /** n delta^d tau^t exp(-delta^l) exp(-tau^m). */
        POWER_EXP_TAU,
        /** n delta^d tau^t exp(-eta (delta - epsilon)^2 - beta (tau - gamma)^2). */
        GAUSSIAN,
        /** n delta^d tau^t exp(eta (delta - epsilon)^2 + 1 / (beta (tau - gamma)^2 + b)). */
        GAO_B
    }

    private final Kind kind;
    private final double[] n;
    private final double[] d;
    private final double[] t;
    private final double[] p1;
    private final double[] p2;
    private final double[] p3;
    private final double[] p4;
    private final double[] p5;

    private SeparableTerms(Kind kind, double[] n, double[] d, double[] t, double[] p1, double[] p2,
            double[] p3, double[] p4, double[] p5) {
        int len = n.length;
        for (double[] a : new double[][] {d, t, p1, p2, p3, p4, p5}) {
            if (a.length != len) {
                throw new IllegalArgumentException(kind + ": coefficient arrays differ in length");
            }
        }
        this.kind = kind;
        this.n = n.clone();
        this.d = d.clone();
        this.t = t.clone();
        this.p1 = p1.clone();
        this.p2 = p2.clone();
        this.p3 = p3.clone();
        this.p4 = p4.clone();
        this.p5 = p5.clone();
    }

    /**
     * Polynomial and exponential terms {@code n delta^d tau^t exp(-delta^l)}.
     *
     * @param n coefficients
     * @param d density exponents
     * @param t temperature exponents
     * @param l exponents in the exponential (0: none)
     * @return the group
     */
    public static SeparableTerms power(double[] n, double[] d, double[] t, double[] l) {
        double[] z = new double[n.length];
        return new SeparableTerms(Kind.POWER, n, d, t, l, z, z, z, z);
    }

    /**
     * Terms {@code n delta^d tau^t exp(-delta^l) exp(-tau^m)} (Lemmon &amp; Jacobsen 2005).
     *
     * @param n coefficients
     * @param d density exponents
     * @param t temperature exponents
     * @param l density exponents in the exponential (0: none)
     * @param m temperature exponents in the exponential (0: none)
     * @return the group
     */
    public static SeparableTerms powerExpTau(double[] n, double[] d, double[] t, double[] l, double[] m) {
        double[] z = new double[n.length];
        return new SeparableTerms(Kind.POWER_EXP_TAU, n, d, t, l, m, z, z, z);
    }

    /**
     * Gaussian bell-shaped terms.
     *
     * @param n       coefficients
     * @param d       density exponents
     * @param t       temperature exponents
     * @param eta     density widths
     * @param epsilon density centres
     * @param beta    temperature widths
     * @param gamma   temperature centres
     * @return the group
     */
    public static SeparableTerms gaussian(double[] n, double[] d, double[] t, double[] eta,
            double[] epsilon, double[] beta, double[] gamma) {
        double[] z = new double[n.length];
        return new SeparableTerms(Kind.GAUSSIAN, n, d, t, eta, epsilon, beta, gamma, z);
    }

    /**
     * The modified Gaussian terms of Gao et al. (2020) for ammonia.
     *
     * @param n       coefficients
     * @param d       density exponents
     * @param t       temperature exponents
     * @param eta     density coefficients (as published, negative)
     * @param epsilon density centres
     * @param beta    temperature coefficients
     * @param gamma   temperature centres
     * @param b       temperature offsets
     * @return the group
     */
    public static SeparableTerms gaoB(double[] n, double[] d, double[] t, double[] eta, double[] epsilon,
            double[] beta, double[] gamma, double[] b) {
        return new SeparableTerms(Kind.GAO_B, n, d, t, eta, epsilon, beta, gamma, b);
    }

    /** @return the functional form */
    public Kind kind() {
        return kind;
    }

    /** @return the number of terms */
    public int size() {
        return n.length;
    }

    @Override
    public void addTo(double delta, double tau, double[] acc) {
        double lnDelta = Math.log(delta);
        double lnTau = Math.log(tau);
        for (int i = 0; i < n.length; i++) {
            double phi;
            double phi1;
            double phi2;
            double psi = 0;
            double psi1 = 0;
            double psi2 = 0;
            switch (kind) {
                case POWER, POWER_EXP_TAU -> {
                    double l = p1[i];
                    if (l > 0) {
                        double dl = Math.pow(delta, l);
                        phi = -dl;
                        phi1 = -l * dl / delta;
                        phi2 = -l * (l - 1) * dl / (delta * delta);
                    } else {
                        phi = 0;
                        phi1 = 0;
                        phi2 = 0;
                    }
                    double m = p2[i];
                    if (kind == Kind.POWER_EXP_TAU && m > 0) {
                        double tm = Math.pow(tau, m);
                        psi = -tm;
                        psi1 = -m * tm / tau;
                        psi2 = -m * (m - 1) * tm / (tau * tau);
                    }
                }
                case GAUSSIAN -> {
                    double dd = delta - p2[i];
                    double dt = tau - p4[i];
                    phi = -p1[i] * dd * dd;
                    phi1 = -2 * p1[i] * dd;
                    phi2 = -2 * p1[i];
                    psi = -p3[i] * dt * dt;
                    psi1 = -2 * p3[i] * dt;
                    psi2 = -2 * p3[i];
                }
                case GAO_B -> {
                    double dd = delta - p2[i];
                    double dt = tau - p4[i];
                    phi = p1[i] * dd * dd;
                    phi1 = 2 * p1[i] * dd;
                    phi2 = 2 * p1[i];
                    double q = p3[i] * dt * dt + p5[i];
                    double q1 = 2 * p3[i] * dt;
                    double q2 = 2 * p3[i];
                    psi = 1 / q;
                    psi1 = -q1 / (q * q);
                    psi2 = -q2 / (q * q) + 2 * q1 * q1 / (q * q * q);
                }
                default -> throw new IllegalStateException(kind.name());
            }
            double v = n[i] * Math.exp(d[i] * lnDelta + t[i] * lnTau + phi + psi);
            double f1 = d[i] / delta + phi1;
            double f2 = f1 * f1 - d[i] / (delta * delta) + phi2;
            double g1 = t[i] / tau + psi1;
            double g2 = g1 * g1 - t[i] / (tau * tau) + psi2;
            acc[0] += v;
            acc[1] += v * f1;
            acc[2] += v * f2;
            acc[3] += v * g1;
            acc[4] += v * g2;
            acc[5] += v * f1 * g1;
        }
    }

    @Override
    public String toString() {
        return kind + Arrays.toString(n);
    }
}
