package org.finstack.study.fan;

import java.util.Arrays;
import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * Monotone piecewise cubic Hermite interpolation after Fritsch &amp; Carlson (1980).
 *
 * <p>On each interval [x_k, x_k+1] of width h_k the interpolant is the cubic Hermite polynomial
 * through (x_k, y_k) and (x_k+1, y_k+1) with end slopes m_k and m_k+1:
 * <pre>
 *   t = (x - x_k) / h_k
 *   y(x) = (2t^3 - 3t^2 + 1) y_k + (t^3 - 2t^2 + t) h_k m_k
 *        + (-2t^3 + 3t^2) y_k+1 + (t^3 - t^2) h_k m_k+1
 * </pre>
 * The slopes are chosen so that the interpolant is monotone wherever the data are:
 * <ol>
 *   <li>secants d_k = (y_k+1 - y_k) / h_k;</li>
 *   <li>first guess m_k = (d_k-1 + d_k)/2 inside, m_0 = d_0 and m_n-1 = d_n-2 at the ends;
 *       m_k = 0 where d_k-1 and d_k differ in sign or one of them is zero (a local extremum or a
 *       flat step of the data);</li>
 *   <li>on an interval with d_k = 0 both end slopes are set to zero;</li>
 *   <li>otherwise, with a = m_k/d_k and b = m_k+1/d_k, if a^2 + b^2 &gt; 9 both slopes are scaled
 *       by 3/sqrt(a^2 + b^2), which brings (a, b) onto the circle of radius 3 inside the
 *       paper's region of monotonicity.</li>
 * </ol>
 * The result is continuous with a continuous first derivative, passes through every point,
 * reproduces straight-line data exactly, and never leaves [min(y_k, y_k+1), max(y_k, y_k+1)]
 * on an interval (no overshoot).
 *
 * <p>Validity: the interpolant is defined on [x_0, x_n-1] only; values outside are refused
 * (no extrapolation). Interpolation has no published scatter.
 *
 * <p>Worked example: points (0, 300), (0.5, 280), (1.0, 200), (1.5, 0) give y(0.75) = 251.25.
 */
public final class FritschCarlson1980MonotoneCubic {

    /** The method's source. */
    public static final Citation SOURCE = Citation.of("Fritsch & Carlson 1980",
            "Fritsch, F.N., Carlson, R.E., 1980, \"Monotone piecewise cubic interpolation\","
                    + " SIAM Journal on Numerical Analysis 17(2):238-246");

    private final double[] x;
    private final double[] y;
    private final double[] m;
    private final String field;

    /**
     * Builds the interpolant.
     *
     * @param field name of the data for error messages (e.g. {@code "fan.curve"}); entries are
     *              named {@code field[i].x} and {@code field[i].y}
     * @param x     abscissae, strictly increasing, at least two
     * @param y     ordinates, finite, as many as x
     * @throws InputException naming the offending entry
     */
    public FritschCarlson1980MonotoneCubic(String field, double[] x, double[] y) {
        this.field = field;
        if (x.length != y.length) {
            throw new InputException(field, Msg.IMPOSSIBLE,
                    "needs as many ordinates as abscissae, got " + x.length + " and " + y.length);
        }
        if (x.length < 2) {
            throw new InputException(field, Msg.IMPOSSIBLE, "needs at least 2 points, got " + x.length);
        }
        for (int i = 0; i < x.length; i++) {
            Check.finite(field + "[" + i + "].x", x[i]);
            Check.finite(field + "[" + i + "].y", y[i]);
            if (i > 0 && !(x[i] > x[i - 1])) {
                throw new InputException(field + "[" + i + "].x", Msg.NOT_ABOVE, x[i], x[i - 1]);
            }
        }
        this.x = x.clone();
        this.y = y.clone();
        this.m = slopes(this.x, this.y);
    }

    private static double[] slopes(double[] x, double[] y) {
        int n = x.length;
        double[] d = new double[n - 1];
        for (int k = 0; k < n - 1; k++) {
            d[k] = (y[k + 1] - y[k]) / (x[k + 1] - x[k]);
        }
        double[] m = new double[n];
        m[0] = d[0];
        m[n - 1] = d[n - 2];
        for (int k = 1; k < n - 1; k++) {
            m[k] = d[k - 1] * d[k] > 0 ? 0.5 * (d[k - 1] + d[k]) : 0.0;
        }
        for (int k = 0; k < n - 1; k++) {
            if (d[k] == 0) {
                m[k] = 0;
                m[k + 1] = 0;
                continue;
            }
            double a = m[k] / d[k];
            double b = m[k + 1] / d[k];
            double s = a * a + b * b;
            if (s > 9) {
                double tau = 3 / Math.sqrt(s);
                m[k] = tau * a * d[k];
                m[k + 1] = tau * b * d[k];
            }
        }
        return m;
    }

    /** @return the first abscissa */
    public double min() {
        return x[0];
    }

    /** @return the last abscissa */
    public double max() {
        return x[x.length - 1];
    }

    /**
     * @param at abscissa, within [{@link #min()}, {@link #max()}]
     * @return the interpolated ordinate
     * @throws InputException if {@code at} lies outside the data (no extrapolation)
     */
    public double value(double at) {
        Check.within(field + ".at", at, x[0], x[x.length - 1]);
        int k = Arrays.binarySearch(x, at);
        if (k >= 0) {
            return y[k];
        }
        k = -k - 2;
        double h = x[k + 1] - x[k];
        double t = (at - x[k]) / h;
        double t2 = t * t;
        double t3 = t2 * t;
        return (2 * t3 - 3 * t2 + 1) * y[k] + (t3 - 2 * t2 + t) * h * m[k]
                + (-2 * t3 + 3 * t2) * y[k + 1] + (t3 - t2) * h * m[k + 1];
    }

    /** @return a copy of the slopes m_k at the data points, after the monotonicity limiting */
    public double[] slopes() {
        return m.clone();
    }
}
