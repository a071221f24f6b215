package org.finstack.core.math;

import org.finstack.core.Citation;

/**
 * Modified Bessel functions of the first kind, I<sub>0</sub> and I<sub>1</sub>, and of the second
 * kind, K<sub>0</sub> and K<sub>1</sub>, of real argument, with their exponentially scaled forms
 * (i0e(x) = e<sup>-|x|</sup> I<sub>0</sub>(x), i1e(x) = e<sup>-|x|</sup> I<sub>1</sub>(x),
 * k0e(x) = e<sup>x</sup> K<sub>0</sub>(x), k1e(x) = e<sup>x</sup> K<sub>1</sub>(x)) for arguments
 * where the plain functions overflow or underflow.
 *
 * <p>Method, by range of the argument x (all from the formulas in {@link #SOURCE}):
 * <ul>
 * <li>I<sub>0</sub>, I<sub>1</sub>, |x| &le; 20: ascending power series, A&amp;S 9.6.10 with
 * &nu; = 0, 1: I<sub>&nu;</sub>(x) = (x/2)<sup>&nu;</sup> &Sigma;<sub>k</sub>
 * (x&sup2;/4)<sup>k</sup> / (k! (k+&nu;)!). All terms are positive, so there is no
 * cancellation.</li>
 * <li>K<sub>0</sub>, K<sub>1</sub>, 0 &lt; x &le; 1: the logarithmic series A&amp;S 9.6.13
 * (K<sub>0</sub>) and 9.6.11 with n = 1 (K<sub>1</sub>).</li>
 * <li>K<sub>0</sub>, K<sub>1</sub>, 1 &lt; x &le; 20: the integral A&amp;S 9.6.24,
 * e<sup>x</sup> K<sub>&nu;</sub>(x) = &int;<sub>0</sub><sup>&infin;</sup>
 * exp(-x (cosh t - 1)) cosh(&nu; t) dt, by the trapezoidal rule with step 1/8; the integrand is
 * analytic in a strip about the real axis and decays double-exponentially, so the rule converges
 * geometrically ({@link #TRAPEZOID}); with this step its discretisation error is below
 * 1e-20 relative.</li>
 * <li>All four, x &gt; 20: the asymptotic expansions A&amp;S 9.7.1 and 9.7.2, summed to their
 * smallest term; at x = 20 the smallest term is below 1e-16 relative.</li>
 * </ul>
 * Accuracy: relative error below 1e-14 over 1e-3 &le; x &le; 50 against scipy.special (checked by
 * {@code BesselTest.matchesScipyReference}); the plain I functions are only accurate to the
 * relative accuracy of {@link Math#exp} for large x.
 *
 * <p>Domain: the K functions need x &gt; 0; every function needs a finite x; I<sub>0</sub> and
 * I<sub>1</sub> unscaled throw where the value overflows a double (|x| above about 713.98; use
 * the scaled forms). Violations throw {@link IllegalArgumentException} with a message naming the
 * function and the value. K<sub>0</sub> and K<sub>1</sub> unscaled underflow to 0 for x above
 * about 745, which is the correctly rounded value.
 *
 * <p>Example (A&amp;S Table 9.8, x = 1): i0e(1) = 0.4657596076, so I<sub>0</sub>(1) =
 * 1.266065878; k0(1) = 0.4210244382.
 */
public final class Bessel {

    /** The formulas used: series, integral and asymptotic expansions. */
    public static final Citation SOURCE = Citation.of("Abramowitz & Stegun 1964",
            "M. Abramowitz, I. A. Stegun (eds.), Handbook of Mathematical Functions with Formulas, "
                    + "Graphs, and Mathematical Tables, NBS Applied Mathematics Series 55, U.S. "
                    + "Government Printing Office, Washington, 1964; Ch. 9 (F. W. J. Olver), "
                    + "eqs. 9.6.10, 9.6.11, 9.6.13, 9.6.24, 9.7.1, 9.7.2; Table 9.8");

    /** Geometric convergence of the trapezoidal rule for analytic integrands. */
    public static final Citation TRAPEZOID = Citation.of("Trefethen & Weideman 2014",
            "L. N. Trefethen, J. A. C. Weideman, The exponentially convergent trapezoidal rule, "
                    + "SIAM Review 56(3) (2014) 385-458");

    /** Euler's constant (A&S 6.1.3). */
    private static final double EULER_GAMMA = 0.57721566490153286061;
    /** Boundary between the power series and the asymptotic expansion. */
    private static final double ASYMPTOTIC_FROM = 20.0;
    /** Boundary between the logarithmic series and the integral for K. */
    private static final double K_SERIES_UP_TO = 1.0;
    /** Trapezoidal step for the K integral. */
    private static final double STEP = 0.125;
    /** Relative size of the last term kept in every sum. */
    private static final double EPS = 1e-17;
    /** Bound on the terms of every sum; the sums converge well before it. */
    private static final int MAX_TERMS = 500;
    /** Largest |x| for which I0(x) and I1(x) are finite doubles. */
    private static final double I_OVERFLOW = 713.98;

    private Bessel() {
    }

    /**
     * Modified Bessel function of the first kind, order 0.
     *
     * @param x argument (finite, |x| &le; 713.98)
     * @return I<sub>0</sub>(x)
     */
    public static double i0(double x) {
        finite("i0", x);
        double a = Math.abs(x);
        if (a <= ASYMPTOTIC_FROM) {
            return seriesI(0, a);
        }
        if (a > I_OVERFLOW) {
            throw new IllegalArgumentException("i0(x) overflows a double for |x| > " + I_OVERFLOW
                    + "; got x = " + x + " (use i0e)");
        }
        return asymptoticI(0, a) * Math.exp(a);
    }

    /**
     * Modified Bessel function of the first kind, order 1 (an odd function).
     *
     * @param x argument (finite, |x| &le; 713.98)
     * @return I<sub>1</sub>(x)
     */
    public static double i1(double x) {
        finite("i1", x);
        double a = Math.abs(x);
        double v;
        if (a <= ASYMPTOTIC_FROM) {
            v = seriesI(1, a);
        } else if (a > I_OVERFLOW) {
            throw new IllegalArgumentException("i1(x) overflows a double for |x| > " + I_OVERFLOW
                    + "; got x = " + x + " (use i1e)");
        } else {
            v = asymptoticI(1, a) * Math.exp(a);
        }
        return x < 0 ? -v : v;
    }

    /**
     * Exponentially scaled I<sub>0</sub>: e<sup>-|x|</sup> I<sub>0</sub>(x).
     *
     * @param x argument (finite)
     * @return i0e(x)
     */
    public static double i0e(double x) {
        finite("i0e", x);
        double a = Math.abs(x);
        return a <= ASYMPTOTIC_FROM ? seriesI(0, a) * Math.exp(-a) : asymptoticI(0, a);
    }

    /**
     * Exponentially scaled I<sub>1</sub>: e<sup>-|x|</sup> I<sub>1</sub>(x) (an odd function).
     *
     * @param x argument (finite)
     * @return i1e(x)
     */
    public static double i1e(double x) {
        finite("i1e", x);
        double a = Math.abs(x);
        double v = a <= ASYMPTOTIC_FROM ? seriesI(1, a) * Math.exp(-a) : asymptoticI(1, a);
        return x < 0 ? -v : v;
    }

    /**
     * Modified Bessel function of the second kind, order 0.
     *
     * @param x argument (finite, &gt; 0)
     * @return K<sub>0</sub>(x)
     */
    public static double k0(double x) {
        positive("k0", x);
        return x <= K_SERIES_UP_TO ? seriesK0(x) : scaledK(0, x) * Math.exp(-x);
    }

    /**
     * Modified Bessel function of the second kind, order 1.
     *
     * @param x argument (finite, &gt; 0)
     * @return K<sub>1</sub>(x)
     */
    public static double k1(double x) {
        positive("k1", x);
        return x <= K_SERIES_UP_TO ? seriesK1(x) : scaledK(1, x) * Math.exp(-x);
    }

    /**
     * Exponentially scaled K<sub>0</sub>: e<sup>x</sup> K<sub>0</sub>(x).
     *
     * @param x argument (finite, &gt; 0)
     * @return k0e(x)
     */
    public static double k0e(double x) {
        positive("k0e", x);
        return x <= K_SERIES_UP_TO ? seriesK0(x) * Math.exp(x) : scaledK(0, x);
    }

    /**
     * Exponentially scaled K<sub>1</sub>: e<sup>x</sup> K<sub>1</sub>(x).
     *
     * @param x argument (finite, &gt; 0)
     * @return k1e(x)
     */
    public static double k1e(double x) {
        positive("k1e", x);
        return x <= K_SERIES_UP_TO ? seriesK1(x) * Math.exp(x) : scaledK(1, x);
    }

    private static void finite(String f, double x) {
        if (!Double.isFinite(x)) {
            throw new IllegalArgumentException(f + "(x) needs a finite argument; got x = " + x);
        }
    }

    private static void positive(String f, double x) {
        finite(f, x);
        if (!(x > 0)) {
            throw new IllegalArgumentException(f + "(x) is defined only for x > 0; got x = " + x);
        }
    }

    /** A&S 9.6.10: I_nu(x) for nu = 0, 1 and 0 <= x <= 20. */
    private static double seriesI(int nu, double x) {
        double q = 0.25 * x * x;
        double term = nu == 0 ? 1.0 : 0.5 * x;
        double sum = term;
        for (int k = 1; k < MAX_TERMS; k++) {
            term *= q / (k * (double) (k + nu));
            sum += term;
            if (term <= EPS * sum) {
                return sum;
            }
        }
        return sum;
    }

    /**
     * A&S 9.7.1: e^-x I_nu(x) ~ (2 pi x)^-1/2 sum_k (-1)^k a_k(nu) / x^k, with mu = 4 nu^2 and
     * a_k / a_(k-1) = (mu - (2k-1)^2) / (8k); summed until the terms stop falling.
     */
    private static double asymptoticI(int nu, double x) {
        return asymptoticSum(nu, x, -1.0) / Math.sqrt(2.0 * Math.PI * x);
    }

    /** A&S 9.7.2: e^x K_nu(x) ~ (pi / 2x)^1/2 sum_k a_k(nu) / x^k. */
    private static double asymptoticK(int nu, double x) {
        return asymptoticSum(nu, x, 1.0) * Math.sqrt(Math.PI / (2.0 * x));
    }

    private static double asymptoticSum(int nu, double x, double sign) {
        double mu = 4.0 * nu * nu;
        double term = 1.0;
        double sum = 1.0;
        for (int k = 1; k < MAX_TERMS; k++) {
            double odd = 2.0 * k - 1.0;
            double next = term * sign * (mu - odd * odd) / (8.0 * k * x);
            if (Math.abs(next) >= Math.abs(term)) {
                return sum;
            }
            term = next;
            sum += term;
            if (Math.abs(term) <= EPS * Math.abs(sum)) {
                return sum;
            }
        }
        return sum;
    }

    /**
     * A&S 9.6.13: K0(x) = -(ln(x/2) + gamma) I0(x) + sum_{k>=1} H_k (x^2/4)^k / (k!)^2, with H_k
     * the harmonic number 1 + 1/2 + ... + 1/k.
     */
    private static double seriesK0(double x) {
        double q = 0.25 * x * x;
        double term = 1.0;
        double harmonic = 0.0;
        double sum = 0.0;
        for (int k = 1; k < MAX_TERMS; k++) {
            term *= q / ((double) k * k);
            harmonic += 1.0 / k;
            double add = harmonic * term;
            sum += add;
            if (add <= EPS * sum) {
                break;
            }
        }
        return -(Math.log(0.5 * x) + EULER_GAMMA) * seriesI(0, x) + sum;
    }

    /**
     * A&S 9.6.11 with n = 1: K1(x) = 1/x + ln(x/2) I1(x) - (x/4) sum_{k>=0} (psi(k+1) + psi(k+2))
     * (x^2/4)^k / (k! (k+1)!), with psi(k+1) = -gamma + H_k.
     */
    private static double seriesK1(double x) {
        double q = 0.25 * x * x;
        double term = 1.0;
        double hk = 0.0;
        double sum = 1.0 - 2.0 * EULER_GAMMA;
        for (int k = 1; k < MAX_TERMS; k++) {
            term *= q / (k * (double) (k + 1));
            hk += 1.0 / k;
            double add = (2.0 * hk + 1.0 / (k + 1) - 2.0 * EULER_GAMMA) * term;
            sum += add;
            if (Math.abs(add) <= EPS * Math.abs(sum)) {
                break;
            }
        }
        return 1.0 / x + Math.log(0.5 * x) * seriesI(1, x) - 0.25 * x * sum;
    }

    /**
     * e^x K_nu(x) for x > 1: the trapezoidal rule on A&S 9.6.24 up to x = 20, the asymptotic
     * expansion beyond.
     */
    private static double scaledK(int nu, double x) {
        if (x > ASYMPTOTIC_FROM) {
            return asymptoticK(nu, x);
        }
        double sum = 0.5;
        for (int j = 1; j < MAX_TERMS; j++) {
            double t = j * STEP;
            double f = Math.exp(-x * (Math.cosh(t) - 1.0));
            if (nu == 1) {
                f *= Math.cosh(t);
            }
            sum += f;
            if (f <= EPS * sum) {
                break;
            }
        }
        return STEP * sum;
    }
}
