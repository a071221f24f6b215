package org.finstack.exchanger;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.special.Gamma;
import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.ConvergenceException;
import org.finstack.core.InputException;
import org.finstack.core.Limit;
import org.finstack.core.Msg;
import org.finstack.core.Validity;

/**
 * Effectiveness-NTU relations and their inverses for the arrangements of {@link Arrangement}.
 *
 * <p>Notation: NTU = UA / C<sub>min</sub> [-]; C<sub>r</sub> = C<sub>min</sub> / C<sub>max</sub>
 * [-]; eps = q / (C<sub>min</sub> &Delta;T<sub>max</sub>) [-]. With C<sub>r</sub> = 0 (one fluid
 * changing phase) every arrangement gives eps = 1 - exp(-NTU).
 *
 * <ul>
 * <li>Counterflow (Kays &amp; London 1984): eps = [1 - exp(-NTU(1 - C<sub>r</sub>))] /
 * [1 - C<sub>r</sub> exp(-NTU(1 - C<sub>r</sub>))]; at C<sub>r</sub> = 1, eps = NTU / (1 + NTU).</li>
 * <li>Parallel flow (Kays &amp; London 1984): eps = [1 - exp(-NTU(1 + C<sub>r</sub>))] /
 * (1 + C<sub>r</sub>); it cannot exceed 1 / (1 + C<sub>r</sub>).</li>
 * <li>Crossflow, both unmixed, exact (Mason 1954; Baclic 1990): eps = 1 / (C<sub>r</sub> NTU)
 * &Sigma;<sub>n&ge;0</sub> P(n+1, NTU) P(n+1, C<sub>r</sub> NTU), with P(n+1, x) = 1 - e<sup>-x</sup>
 * &Sigma;<sub>m=0..n</sub> x<sup>m</sup>/m! (the regularised incomplete gamma function), summed
 * until the terms fall below 1e-16 of the sum.</li>
 * <li>Crossflow, both unmixed, approximation (Incropera &amp; DeWitt 2002, Table 11.3): eps = 1 -
 * exp[(NTU<sup>0.22</sup> / C<sub>r</sub>)(exp(-C<sub>r</sub> NTU<sup>0.78</sup>) - 1)].</li>
 * <li>Crossflow, C<sub>max</sub> mixed (Kays &amp; London 1984): eps = (1 / C<sub>r</sub>)(1 -
 * exp[-C<sub>r</sub>(1 - exp(-NTU))]).</li>
 * <li>Crossflow, C<sub>min</sub> mixed (Kays &amp; London 1984): eps = 1 - exp[-(1 / C<sub>r</sub>)(1
 * - exp(-C<sub>r</sub> NTU))].</li>
 * <li>Counter-crossflow, N rows (ESDU 86018), air unmixed, tube fluid mixed between rows and
 * reversing direction from row to row. With K = 1 - exp(-NTU<sub>air</sub> / N), where
 * NTU<sub>air</sub> = UA / C<sub>air</sub>, c = K C<sub>air</sub> / C<sub>tube</sub> and h = 1 - K/2,
 * the tube-side temperature effectiveness is P<sub>tube</sub> = 1 - 1/D with
 * <br>N = 1: D = e<sup>c</sup>;
 * <br>N = 2: D = K/2 + h e<sup>2c</sup>;
 * <br>N = 3: D = K (1 - K/4 - c h) e<sup>c</sup> + h<sup>2</sup> e<sup>3c</sup>;
 * <br>N = 4: D = (K/2)(1 - K/2 + K<sup>2</sup>/4) + K h (1 - 2 c h) e<sup>2c</sup> + h<sup>3</sup>
 * e<sup>4c</sup>;
 * <br>and eps = P<sub>tube</sub> / C<sub>r</sub> when the air has C<sub>min</sub>, eps =
 * P<sub>tube</sub> when the tube fluid has it. N = 1 coincides with the one-fluid-mixed crossflow
 * relations. The 1- to 3-row forms are ESDU 86018's; the 4-row form was derived for this project
 * from the same model by integrating row by row, and all four agree with a numerical solution of
 * that model to 1e-8 (see the tests). Beyond 4 rows pure counterflow is used: multipass counter-crossflow tends to
 * counterflow as the passes increase (Pignotti &amp; Cordero 1983; Kays &amp; London 1984). It is an
 * upper bound. At 4 rows the gap to counterflow is up to 2.2 % for NTU &le; 3, 3.8 % for NTU &le;
 * 5 and 6.7 % for NTU &le; 10 (largest at C<sub>r</sub> = 1); numerical integration of 5 and 6
 * rows (in the tests) lies between the 4-row form and counterflow, so the step from 4 to 5 rows
 * overstates by less than that gap.</li>
 * </ul>
 *
 * <p>The relations are exact solutions of their idealised models, except the closed-form
 * crossflow approximation, which differs from the exact series by up to 3.8 % (largest near NTU =
 * 0.3, C<sub>r</sub> = 1) for NTU &le; 5; this figure comes from this project's comparison with the
 * series, not from a paper. Validity: NTU &ge; 0, 0 &le; C<sub>r</sub> &le; 1; inputs outside are
 * rejected.
 *
 * <p>Worked example (Nellis &amp; Klein's parallel-flow example, UA = 75 W/K, C = 50 and 30 W/K):
 * {@code effectiveness(FlowArrangement.PARALLEL_FLOW, 2.5, 0.6)} = 0.6136.
 */
public final class EpsilonNtu {

    /** Primary source of the single-pass relations. */
    public static final Citation SOURCE = Refs.KAYS_LONDON;

    /** The domain of the relations: NTU from 0 upwards and C<sub>r</sub> from 0 to 1. */
    public static final Validity VALIDITY = Validity.of(
            Limit.of("NTU", 0, Double.POSITIVE_INFINITY),
            Limit.of("Cr", 0, 1));

    /** Most terms of Mason's series (enough for NTU beyond 10^4). */
    static final int SERIES_MAX_TERMS = 100_000;

    /** Most function evaluations for one inverse (Brent) solve. */
    static final int SOLVER_MAX_EVALUATIONS = 200;

    /** Largest NTU the inverse searches up to before declaring the effectiveness unreachable. */
    static final double NTU_SEARCH_MAX = 1.0e4;

    private EpsilonNtu() {
    }

    /**
     * Effectiveness of an arrangement.
     *
     * @param a   the flow arrangement
     * @param ntu number of transfer units UA / C<sub>min</sub> [-], at least 0
     * @param cr  capacity-rate ratio C<sub>min</sub> / C<sub>max</sub> [-], from 0 to 1
     * @return the effectiveness [-], from 0 to 1
     * @throws InputException (fields {@code arrangement}, {@code ntu}, {@code cr}) on bad input
     */
    public static double effectiveness(Arrangement a, double ntu, double cr) {
        checkArrangement(a);
        Check.nonNegative("ntu", ntu);
        Check.within("cr", cr, 0, 1);
        if (ntu == 0) {
            return 0;
        }
        if (cr == 0) {
            return -Math.expm1(-ntu);
        }
        // round-off in the series and closed forms can land a few ulps above the limit at large NTU
        return Math.min(Math.min(raw(a, ntu, cr), maxEffectiveness(a, cr)), 1);
    }

    private static double raw(Arrangement a, double ntu, double cr) {
        if (a instanceof CounterCrossflow cc) {
            return counterCrossflow(cc, ntu, cr);
        }
        return switch ((FlowArrangement) a) {
            case COUNTERFLOW -> counterflow(ntu, cr);
            case PARALLEL_FLOW -> -Math.expm1(-ntu * (1 + cr)) / (1 + cr);
            case CROSSFLOW_BOTH_UNMIXED -> crossflowUnmixedSeries(ntu, cr);
            // exponents 0.22 and 0.78: Incropera & DeWitt 2002, Table 11.3
            case CROSSFLOW_BOTH_UNMIXED_APPROX ->
                    -Math.expm1(Math.pow(ntu, 0.22) / cr * Math.expm1(-cr * Math.pow(ntu, 0.78)));
            case CROSSFLOW_CMAX_MIXED -> -Math.expm1(cr * Math.expm1(-ntu)) / cr;
            case CROSSFLOW_CMIN_MIXED -> -Math.expm1(Math.expm1(-cr * ntu) / cr);
        };
    }

    /**
     * The effectiveness an arrangement approaches as NTU grows without bound; no NTU reaches it.
     *
     * @param a  the flow arrangement
     * @param cr capacity-rate ratio C<sub>min</sub> / C<sub>max</sub> [-], from 0 to 1
     * @return the limiting effectiveness [-]
     */
    public static double maxEffectiveness(Arrangement a, double cr) {
        checkArrangement(a);
        Check.within("cr", cr, 0, 1);
        if (cr == 0) {
            return 1;
        }
        if (a instanceof CounterCrossflow cc) {
            if (!cc.exact()) {
                return 1;
            }
            double ratio = cc.airIsCmin() ? cr : 1 / cr;
            double p = tubeEffectiveness(cc.rows(), 1, ratio);
            // dividing by C_r can land one ulp above 1 when the rows' limit is counterflow's
            return Math.min(1, cc.airIsCmin() ? p / cr : p);
        }
        return switch ((FlowArrangement) a) {
            case COUNTERFLOW, CROSSFLOW_BOTH_UNMIXED, CROSSFLOW_BOTH_UNMIXED_APPROX -> 1;
            case PARALLEL_FLOW -> 1 / (1 + cr);
            case CROSSFLOW_CMAX_MIXED -> -Math.expm1(-cr) / cr;
            case CROSSFLOW_CMIN_MIXED -> -Math.expm1(-1 / cr);
        };
    }

    /**
     * Number of transfer units that gives an effectiveness: the closed-form inverse where one
     * exists (counterflow, parallel flow, one fluid mixed, one row, C<sub>r</sub> = 0), otherwise a
     * bracketed Brent solve of {@link #effectiveness} (at most {@value #SOLVER_MAX_EVALUATIONS}
     * evaluations, NTU to about 1e-13 relative).
     *
     * @param a             the flow arrangement
     * @param effectiveness the effectiveness [-], from 0 to just below
     *                      {@link #maxEffectiveness(Arrangement, double)}
     * @param cr            capacity-rate ratio C<sub>min</sub> / C<sub>max</sub> [-], from 0 to 1
     * @return NTU [-]
     * @throws InputException       (fields {@code arrangement}, {@code effectiveness}, {@code cr})
     *                              on bad input or an effectiveness the arrangement cannot reach at
     *                              this C<sub>r</sub>
     * @throws ConvergenceException if the solve does not converge
     */
    public static double ntu(Arrangement a, double effectiveness, double cr) {
        checkArrangement(a);
        double eps = Check.within("effectiveness", effectiveness, 0, 1);
        Check.within("cr", cr, 0, 1);
        double max = maxEffectiveness(a, cr);
        if (eps >= max) {
            throw new InputException("effectiveness", Msg.NOT_BELOW, eps, max);
        }
        if (eps == 0) {
            return 0;
        }
        if (cr == 0) {
            return -Math.log1p(-eps);
        }
        if (a instanceof CounterCrossflow cc) {
            if (!cc.exact()) {
                return counterflowNtu(eps, cr);
            }
            if (cc.rows() == 1) {
                return cc.airIsCmin() ? cmaxMixedNtu(eps, cr) : cminMixedNtu(eps, cr);
            }
            return solve(a, eps, cr);
        }
        return switch ((FlowArrangement) a) {
            case COUNTERFLOW -> counterflowNtu(eps, cr);
            case PARALLEL_FLOW -> -Math.log1p(-eps * (1 + cr)) / (1 + cr);
            case CROSSFLOW_CMAX_MIXED -> cmaxMixedNtu(eps, cr);
            case CROSSFLOW_CMIN_MIXED -> cminMixedNtu(eps, cr);
            case CROSSFLOW_BOTH_UNMIXED, CROSSFLOW_BOTH_UNMIXED_APPROX -> solve(a, eps, cr);
        };
    }

    private static void checkArrangement(Arrangement a) {
        if (a == null) {
            throw new InputException("arrangement", Msg.MISSING);
        }
    }

    private static double counterflow(double ntu, double cr) {
        if (cr == 1) {
            return ntu / (1 + ntu);
        }
        double x = ntu * (1 - cr);
        double oneMinusE = -Math.expm1(-x);
        // 1 - cr e^-x written as (1 - e^-x) + (1 - cr) e^-x to keep precision near cr = 1
        return oneMinusE / (oneMinusE + (1 - cr) * Math.exp(-x));
    }

    private static double counterflowNtu(double eps, double cr) {
        if (cr == 1) {
            return eps / (1 - eps);
        }
        // ln[(1 - eps cr) / (1 - eps)] / (1 - cr), as ln(1 + eps (1 - cr) / (1 - eps)) / (1 - cr)
        return Math.log1p(eps * (1 - cr) / (1 - eps)) / (1 - cr);
    }

    private static double cmaxMixedNtu(double eps, double cr) {
        return -Math.log1p(Math.log1p(-eps * cr) / cr);
    }

    private static double cminMixedNtu(double eps, double cr) {
        return -Math.log1p(cr * Math.log1p(-eps)) / cr;
    }

    private static double counterCrossflow(CounterCrossflow cc, double ntu, double cr) {
        if (!cc.exact()) {
            return counterflow(ntu, cr);
        }
        int n = cc.rows();
        double ntuAir = cc.airIsCmin() ? ntu : ntu * cr;
        double k = -Math.expm1(-ntuAir / n);
        double ratio = cc.airIsCmin() ? cr : 1 / cr;
        double p = tubeEffectiveness(n, k, ratio);
        return cc.airIsCmin() ? p / cr : p;
    }

    /**
     * Tube-side temperature effectiveness of counter-crossflow with 1 to 4 rows (ESDU 86018),
     * P = 1 - 1/D. For small exponents D - 1 is formed with expm1 so that small NTU keeps its
     * precision; for large ones D is scaled by exp(-N c) to avoid overflow.
     *
     * @param n     rows, 1 to 4
     * @param k     air-side effectiveness of one row, 1 - exp(-NTU_air / n)
     * @param ratio C_air / C_tube
     */
    static double tubeEffectiveness(int n, double k, double ratio) {
        // coefficients of D for 1 to 4 rows: ESDU 86018 (see the class Javadoc); the 4-row form as
        // re-derived for this project from the same model and checked by numerical integration
        double c = k * ratio;
        double h = 1 - k / 2;
        if (n == 1) {
            return -Math.expm1(-c);
        }
        if (n * c <= 1) {
            double dMinusOne = switch (n) {
                case 2 -> h * Math.expm1(2 * c);
                case 3 -> h * h * Math.expm1(3 * c) + k * (1 - k / 4) * Math.expm1(c)
                        - k * c * h * Math.exp(c);
                case 4 -> k * h * Math.expm1(2 * c) - 2 * k * c * h * h * Math.exp(2 * c)
                        + h * h * h * Math.expm1(4 * c);
                default -> throw new IllegalArgumentException("rows " + n);
            };
            return dMinusOne / (1 + dMinusOne);
        }
        double scaled = switch (n) {
            case 2 -> k / 2 * Math.exp(-2 * c) + h;
            case 3 -> h * h + k * (1 - k / 4 - c * h) * Math.exp(-2 * c);
            case 4 -> k / 2 * (1 - k / 2 + k * k / 4) * Math.exp(-4 * c)
                    + k * h * (1 - 2 * c * h) * Math.exp(-2 * c) + h * h * h;
            default -> throw new IllegalArgumentException("rows " + n);
        };
        return 1 - Math.exp(-n * c) / scaled;
    }

    /**
     * Mason's series for crossflow with both fluids unmixed. Each factor P(n+1, x) is the Poisson
     * probability of more than n events at mean x: for n+1 &le; 2x it is 1 minus the running sum of
     * the first n+1 Poisson terms, beyond that the tail series, whose terms shrink by at least half
     * each step.
     */
    static double crossflowUnmixedSeries(double ntu, double cr) {
        double a = ntu;
        double b = cr * ntu;
        if (!(b > 0)) {
            return -Math.expm1(-ntu);
        }
        double lnA = Math.log(a);
        double lnB = Math.log(b);
        double headA = 0;
        double headB = 0;
        double sum = 0;
        double term = Double.NaN;
        for (int n = 0; n < SERIES_MAX_TERMS; n++) {
            double lnFactorial = Gamma.logGamma(n + 1.0);
            headA += Math.exp(n * lnA - a - lnFactorial);
            headB += Math.exp(n * lnB - b - lnFactorial);
            double pa = poissonAbove(n, a, lnA, headA);
            double pb = poissonAbove(n, b, lnB, headB);
            term = pa * pb;
            sum += term;
            if (n + 1 > a && term <= 1e-16 * sum) {
                return sum / b;
            }
        }
        throw new ConvergenceException("crossflow series", SERIES_MAX_TERMS, term);
    }

    /**
     * P(X &gt; n) for X Poisson with mean x, i.e. the regularised lower incomplete gamma
     * function P(n+1, x).
     *
     * @param n    the count
     * @param x    the mean, above zero
     * @param lnX  ln x
     * @param head P(X &le; n), summed by the caller
     */
    private static double poissonAbove(int n, double x, double lnX, double head) {
        int s = n + 1;
        if (s <= 2 * x) {
            return Math.max(0, 1 - head);
        }
        double first = Math.exp(s * lnX - x - Gamma.logGamma(s + 1.0));
        double tail = 1;
        double t = 1;
        for (int k = 1; k < 200; k++) {
            t *= x / (s + k);
            tail += t;
            if (t <= 1e-17 * tail) {
                break;
            }
        }
        return first * tail;
    }

    private static double solve(Arrangement a, double eps, double cr) {
        UnivariateFunction f = x -> effectiveness(a, x, cr) - eps;
        double hi = Math.max(1, -Math.log1p(-eps));
        int doublings = 0;
        while (f.value(hi) < 0) {
            if (hi >= NTU_SEARCH_MAX) {
                throw new ConvergenceException("NTU", doublings, f.value(hi));
            }
            hi = Math.min(2 * hi, NTU_SEARCH_MAX);
            doublings++;
        }
        double[] last = {Double.NaN};
        UnivariateFunction tracked = x -> {
            last[0] = f.value(x);
            return last[0];
        };
        BrentSolver solver = new BrentSolver(1e-14, 1e-15, 1e-16);
        try {
            return solver.solve(SOLVER_MAX_EVALUATIONS, tracked, 0, hi);
        } catch (TooManyEvaluationsException e) {
            throw new ConvergenceException("NTU", SOLVER_MAX_EVALUATIONS, last[0]);
        }
    }
}
