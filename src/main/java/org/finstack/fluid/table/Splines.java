package org.finstack.fluid.table;

import org.finstack.core.FinstackException;
import org.finstack.core.Msg;

/**
 * Piecewise cubic Hermite interpolation with the slopes of the not-a-knot cubic spline (de Boor,
 * C.: A Practical Guide to Splines, rev. ed., Springer 2001, ch. IV): the interpolant is twice
 * continuously differentiable and reproduces every cubic polynomial exactly, so its error falls
 * with the fourth power of the knot spacing, also in the end intervals (a natural spline's
 * zero-curvature ends would lose two orders there).
 *
 * <p>The slopes s<sub>i</sub> at knots x<sub>0</sub> &lt; ... &lt; x<sub>n-1</sub> (spacings
 * h<sub>i</sub> = x<sub>i+1</sub> - x<sub>i</sub>, divided differences d<sub>i</sub>) solve
 * <pre>
 *   h_i s_(i-1) + 2 (h_(i-1) + h_i) s_i + h_(i-1) s_(i+1) = 3 (h_i d_(i-1) + h_(i-1) d_i)   (interior)
 * </pre>
 * closed by requiring the third derivative to be continuous at x<sub>1</sub> and
 * x<sub>n-2</sub> (not-a-knot), a tridiagonal system solved by elimination.
 */
final class Splines {

    private Splines() {
    }

    /**
     * Not-a-knot spline slopes.
     *
     * @param x knots, strictly increasing, at least 4
     * @param y values at the knots
     * @return dy/dx at each knot
     */
    static double[] slopes(double[] x, double[] y) {
        int n = x.length;
        if (n < 4 || y.length != n) {
            throw new FinstackException(Msg.IMPOSSIBLE, "a spline needs at least 4 knots with one value each");
        }
        double[] h = new double[n - 1];
        double[] d = new double[n - 1];
        for (int i = 0; i < n - 1; i++) {
            h[i] = x[i + 1] - x[i];
            if (!(h[i] > 0)) {
                throw new FinstackException(Msg.IMPOSSIBLE, "spline knots must increase strictly");
            }
            d[i] = (y[i + 1] - y[i]) / h[i];
        }
        double[] a = new double[n];
        double[] b = new double[n];
        double[] c = new double[n];
        double[] r = new double[n];
        b[0] = h[1];
        c[0] = h[0] + h[1];
        r[0] = ((h[0] + 2 * (h[0] + h[1])) * h[1] * d[0] + h[0] * h[0] * d[1]) / (h[0] + h[1]);
        for (int i = 1; i < n - 1; i++) {
            a[i] = h[i];
            b[i] = 2 * (h[i - 1] + h[i]);
            c[i] = h[i - 1];
            r[i] = 3 * (h[i] * d[i - 1] + h[i - 1] * d[i]);
        }
        double hl = h[n - 2];
        double hm = h[n - 3];
        a[n - 1] = hl + hm;
        b[n - 1] = hm;
        r[n - 1] = (hl * hl * d[n - 3] + (2 * (hm + hl) + hl) * hm * d[n - 2]) / (hm + hl);
        return tridiagonal(a, b, c, r);
    }

    /**
     * Not-a-knot spline slopes for knots 0, 1, ..., n-1 (slopes per knot step).
     *
     * @param y values, at least 4
     * @return dy/di at each knot
     */
    static double[] slopesUniform(double[] y) {
        double[] x = new double[y.length];
        for (int i = 0; i < x.length; i++) {
            x[i] = i;
        }
        return slopes(x, y);
    }

    /** Thomas elimination for sub-diagonal a, diagonal b, super-diagonal c, right side r. */
    private static double[] tridiagonal(double[] a, double[] b, double[] c, double[] r) {
        int n = b.length;
        double[] cp = new double[n];
        double[] rp = new double[n];
        cp[0] = c[0] / b[0];
        rp[0] = r[0] / b[0];
        for (int i = 1; i < n; i++) {
            double m = b[i] - a[i] * cp[i - 1];
            cp[i] = i < n - 1 ? c[i] / m : 0;
            rp[i] = (r[i] - a[i] * rp[i - 1]) / m;
        }
        double[] s = new double[n];
        s[n - 1] = rp[n - 1];
        for (int i = n - 2; i >= 0; i--) {
            s[i] = rp[i] - cp[i] * s[i + 1];
        }
        return s;
    }

    /** Hermite basis h00(t) = 2t^3 - 3t^2 + 1 (weight of the left value). */
    static double h00(double t) {
        return (2 * t - 3) * t * t + 1;
    }

    /** Hermite basis h10(t) = t^3 - 2t^2 + t (weight of the left slope times the spacing). */
    static double h10(double t) {
        return ((t - 2) * t + 1) * t;
    }

    /** Hermite basis h01(t) = -2t^3 + 3t^2 (weight of the right value). */
    static double h01(double t) {
        return (3 - 2 * t) * t * t;
    }

    /** Hermite basis h11(t) = t^3 - t^2 (weight of the right slope times the spacing). */
    static double h11(double t) {
        return (t - 1) * t * t;
    }

    /**
     * Value of the cubic Hermite piece on [x_i, x_i + dx] at local coordinate t in [0, 1].
     *
     * @param y0 left value
     * @param m0 left slope times dx
     * @param y1 right value
     * @param m1 right slope times dx
     * @param t  local coordinate
     * @return the value
     */
    static double hermite(double y0, double m0, double y1, double m1, double t) {
        return h00(t) * y0 + h10(t) * m0 + h01(t) * y1 + h11(t) * m1;
    }

    /**
     * Derivative d/dt of {@link #hermite} (per unit of t).
     *
     * @param y0 left value
     * @param m0 left slope times dx
     * @param y1 right value
     * @param m1 right slope times dx
     * @param t  local coordinate
     * @return the derivative
     */
    static double hermiteSlope(double y0, double m0, double y1, double m1, double t) {
        double t2 = t * t;
        return (6 * t2 - 6 * t) * (y0 - y1) + (3 * t2 - 4 * t + 1) * m0 + (3 * t2 - 2 * t) * m1;
    }

    /**
     * Interval of a sorted knot array holding x (clamped to the first and last interval).
     *
     * @param x knots, increasing
     * @param v the abscissa
     * @return i with x[i] &lt;= v &lt;= x[i+1] when v is inside
     */
    static int interval(double[] x, double v) {
        int lo = 0;
        int hi = x.length - 1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (x[mid] > v) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return lo;
    }

    /** A not-a-knot spline through given points, evaluated anywhere inside its knots. */
    static final class Curve {
        private final double[] x;
        private final double[] y;
        private final double[] m;

        /**
         * @param x knots, strictly increasing, at least 4
         * @param y values
         */
        Curve(double[] x, double[] y) {
            this.x = x.clone();
            this.y = y.clone();
            this.m = slopes(this.x, this.y);
        }

        /** @return the first knot */
        double min() {
            return x[0];
        }

        /** @return the last knot */
        double max() {
            return x[x.length - 1];
        }

        /**
         * @param v abscissa (inside [min, max]; outside, the end cubic is extended)
         * @return the interpolated value
         */
        double at(double v) {
            int i = interval(x, v);
            double dx = x[i + 1] - x[i];
            return hermite(y[i], m[i] * dx, y[i + 1], m[i + 1] * dx, (v - x[i]) / dx);
        }
    }
}
