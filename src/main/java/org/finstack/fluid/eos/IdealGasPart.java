package org.finstack.fluid.eos;

/**
 * The reduced ideal-gas Helmholtz energy
 * <pre>
 *   alpha0 = ln(delta) + a1 + a2 tau + c ln(tau) + sum_i n_i tau^t_i
 *            + sum_k v_k ln(1 - exp(-u_k tau))
 * </pre>
 * (log, lead, power and Planck-Einstein terms). The constants a1 and a2 fix the reference state
 * of enthalpy and entropy only; {@link #withLead(double, double)} replaces them. Immutable.
 */
public final class IdealGasPart {

    private final double a1;
    private final double a2;
    private final double c;
    private final double[] n;
    private final double[] t;
    private final double[] v;
    private final double[] u;

    /**
     * @param a1 constant [-]
     * @param a2 coefficient of tau [-]
     * @param c  coefficient of ln(tau) [-]
     * @param n  power-term coefficients
     * @param t  power-term exponents
     * @param v  Planck-Einstein coefficients
     * @param u  Planck-Einstein characteristic temperatures divided by the reducing temperature
     */
    public IdealGasPart(double a1, double a2, double c, double[] n, double[] t, double[] v, double[] u) {
        if (n.length != t.length || v.length != u.length) {
            throw new IllegalArgumentException("ideal-gas part: coefficient arrays differ in length");
        }
        this.a1 = a1;
        this.a2 = a2;
        this.c = c;
        this.n = n.clone();
        this.t = t.clone();
        this.v = v.clone();
        this.u = u.clone();
    }

    /**
     * @param newA1 the new constant
     * @param newA2 the new coefficient of tau
     * @return the same ideal-gas part with another reference state
     */
    public IdealGasPart withLead(double newA1, double newA2) {
        return new IdealGasPart(newA1, newA2, c, n, t, v, u);
    }

    /** @return the constant a1 */
    public double a1() {
        return a1;
    }

    /** @return the coefficient a2 */
    public double a2() {
        return a2;
    }

    /**
     * The tau-dependent part of alpha0 and its tau derivatives (the density part is ln delta,
     * with d/d delta = 1/delta).
     *
     * @param tau inverse reduced temperature [-]
     * @return {alpha0 - ln(delta), d alpha0/d tau, d2 alpha0/d tau2}
     */
    public double[] tauPart(double tau) {
        double a = a1 + a2 * tau + c * Math.log(tau);
        double at = a2 + c / tau;
        double att = -c / (tau * tau);
        for (int i = 0; i < n.length; i++) {
            double p = n[i] * Math.pow(tau, t[i]);
            a += p;
            at += p * t[i] / tau;
            att += p * t[i] * (t[i] - 1) / (tau * tau);
        }
        for (int k = 0; k < v.length; k++) {
            double x = u[k] * tau;
            double em = Math.exp(-x);
            a += v[k] * Math.log1p(-em);
            double q = 1 / Math.expm1(x);
            at += v[k] * u[k] * q;
            att -= v[k] * u[k] * u[k] * q * (1 + q);
        }
        return new double[] {a, at, att};
    }
}
