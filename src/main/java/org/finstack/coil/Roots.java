package org.finstack.coil;

import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.NoBracketingException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.finstack.core.ConvergenceException;

/** The bounded root searches the rating models share. */
final class Roots {

    private static final int MAX_EVALUATIONS = 200;

    private Roots() {
    }

    /**
     * Bounded Brent solve.
     *
     * @param f      function with a sign change on [lo, hi]
     * @param lo     lower end
     * @param hi     upper end
     * @param what   quantity, for the exception
     * @param relTol relative tolerance on the root
     * @return the root
     */
    static double solve(DoubleUnaryOperator f, double lo, double hi, String what, double relTol) {
        try {
            return new BrentSolver(relTol, relTol * Math.max(1e-12, Math.abs(hi)), 1e-14).solve(MAX_EVALUATIONS,
                    f::applyAsDouble, lo, hi);
        } catch (TooManyEvaluationsException e) {
            throw new ConvergenceException(what, MAX_EVALUATIONS, hi - lo);
        } catch (NoBracketingException e) {
            throw new ConvergenceException(what + " (no sign change between " + lo + " and " + hi + ")", 0,
                    Math.min(Math.abs(e.getFLo()), Math.abs(e.getFHi())));
        }
    }

    /**
     * Root of a function between two points where it has opposite signs, by the Illinois variant
     * of regula falsi (Dowell &amp; Jarratt 1971), stopping when |f| or the bracket is small enough.
     *
     * @param f         the function
     * @param a         one end
     * @param fa        f(a)
     * @param b         the other end
     * @param fb        f(b), of the other sign
     * @param relTol    bracket width, relative to |b|, small enough to stop
     * @param fTol      |f| small enough to stop
     * @param what      quantity, for the exception
     * @return the root
     */
    static double illinois(DoubleUnaryOperator f, double a, double fa, double b, double fb, double relTol,
            double fTol, String what) {
        int side = 0;
        for (int i = 0; i < MAX_EVALUATIONS; i++) {
            double c = (a * fb - b * fa) / (fb - fa);
            double fc = f.applyAsDouble(c);
            if (Math.abs(fc) <= fTol || Math.abs(b - a) <= relTol * Math.abs(b)) {
                return c;
            }
            if (fc * fb > 0) {
                b = c;
                fb = fc;
                if (side == -1) {
                    fa /= 2;
                }
                side = -1;
            } else {
                a = c;
                fa = fc;
                if (side == 1) {
                    fb /= 2;
                }
                side = 1;
            }
        }
        throw new ConvergenceException(what, MAX_EVALUATIONS, Math.abs(b - a));
    }
}
