package org.finstack.fluid.psychro;

import java.util.function.DoubleUnaryOperator;
import org.finstack.core.ConvergenceException;

/**
 * A bracketed root finder for the psychrometric inversions (dew point, wet bulb): regula falsi
 * with the Illinois modification, falling back to bisection when the secant step leaves the
 * bracket. The bracket always holds a sign change, so the iteration cannot wander off; it stops
 * when the bracket is narrower than the tolerance and throws after a fixed number of steps.
 */
final class Bracket {

    /** Width of the final bracket [K]. */
    static final double TOLERANCE = 1e-9;

    /** Most iterations spent on one root. */
    static final int MAX_ITERATIONS = 200;

    private Bracket() {
    }

    /**
     * Finds x in [lo, hi] with f(x) = 0, given f(lo) and f(hi) of opposite signs.
     *
     * @param f        the function
     * @param lo       lower end of the bracket
     * @param flo      f(lo)
     * @param hi       upper end of the bracket
     * @param fhi      f(hi)
     * @param quantity what is solved for, for the error message
     * @return the root, within {@link #TOLERANCE} (or the jump point, where f steps over zero)
     * @throws ConvergenceException if the bracket does not close in {@link #MAX_ITERATIONS}
     */
    static double solve(DoubleUnaryOperator f, double lo, double flo, double hi, double fhi,
            String quantity) {
        if (flo == 0) {
            return lo;
        }
        if (fhi == 0) {
            return hi;
        }
        if ((flo > 0) == (fhi > 0)) {
            throw new IllegalArgumentException("no sign change over the bracket for " + quantity);
        }
        double a = lo;
        double fa = flo;
        double b = hi;
        double fb = fhi;
        int lastKept = 0;
        double c = b;
        for (int i = 1; i <= MAX_ITERATIONS; i++) {
            c = (a * fb - b * fa) / (fb - fa);
            if (!(c > Math.min(a, b) && c < Math.max(a, b))) {
                c = 0.5 * (a + b);
            }
            double fc = f.applyAsDouble(c);
            if (fc == 0) {
                return c;
            }
            if ((fc > 0) == (fb > 0)) {
                b = c;
                fb = fc;
                if (lastKept == 1) {
                    fa *= 0.5;
                }
                lastKept = 1;
            } else {
                a = c;
                fa = fc;
                if (lastKept == -1) {
                    fb *= 0.5;
                }
                lastKept = -1;
            }
            if (Math.abs(b - a) <= TOLERANCE) {
                return c;
            }
        }
        throw new ConvergenceException(quantity, MAX_ITERATIONS, Math.abs(b - a));
    }
}
