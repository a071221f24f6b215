package org.finstack.fluid.blend;

import org.finstack.core.ConvergenceException;
import org.finstack.core.Numbers;

/**
 * A saturation-pressure equation of the form Lemmon (2003) gives for a blend's bubble-point and
 * dew-point pressures,
 * <pre>
 *   ln(p / pc) = (Tc / T) sum_i N_i theta^k_i,   theta = 1 - T / Tc
 * </pre>
 * with the pseudo-critical temperature Tc [K] and pressure pc [Pa] of the blend's equation of
 * state. Immutable; every method is a pure function.
 *
 * @param criticalTemperature Tc [K]
 * @param criticalPressure    pc [Pa]
 * @param n                   coefficients N_i [-]
 * @param k                   exponents k_i [-]
 */
public record SaturationPressureEquation(double criticalTemperature, double criticalPressure, double[] n,
        double[] k) {

    private static final int MAX_ITER = 100;

    /** Copies the arrays and checks their lengths and the constants. */
    public SaturationPressureEquation {
        if (n.length != k.length || n.length == 0) {
            throw new IllegalArgumentException("saturation-pressure equation: coefficient arrays differ in length");
        }
        if (!(criticalTemperature > 0) || !(criticalPressure > 0)) {
            throw new IllegalArgumentException("saturation-pressure equation: Tc and pc must be positive");
        }
        n = n.clone();
        k = k.clone();
    }

    /**
     * @param temperature T [K], above 0 up to Tc
     * @return the saturation pressure p [Pa]
     */
    public double pressure(double temperature) {
        return criticalPressure * Math.exp(lnRatio(temperature));
    }

    /**
     * @param temperature T [K], above 0 up to Tc
     * @return d(ln p)/dT [1/K]
     */
    public double logSlope(double temperature) {
        double theta = Math.max(0, 1 - temperature / criticalTemperature);
        double s = 0;
        double ds = 0;
        for (int i = 0; i < n.length; i++) {
            s += n[i] * Math.pow(theta, k[i]);
            if (theta > 0) {
                ds += n[i] * k[i] * Math.pow(theta, k[i] - 1);
            }
        }
        // ln(p/pc) = (Tc/T) S(theta), dtheta/dT = -1/Tc
        return -criticalTemperature / (temperature * temperature) * s - ds / temperature;
    }

    /**
     * Inverts the equation: the temperature at which it gives p, by Newton iteration on ln p with
     * bisection safeguard inside [lo, hi] (at most 100 steps, to 1e-12 relative in ln p).
     *
     * @param pressure p [Pa], between the equation's values at lo and hi
     * @param lo       lowest temperature searched [K]
     * @param hi       highest temperature searched [K], at most Tc
     * @return T [K]
     * @throws ConvergenceException if the bounded iteration does not converge
     */
    public double temperature(double pressure, double lo, double hi) {
        double target = Math.log(pressure / criticalPressure);
        double fLo = lnRatio(lo) - target;
        double fHi = lnRatio(hi) - target;
        if (fLo >= 0) {
            return lo;
        }
        if (fHi <= 0) {
            return hi;
        }
        double t = lo + (hi - lo) * (-fLo) / (fHi - fLo);
        double f = Double.NaN;
        for (int it = 0; it < MAX_ITER; it++) {
            f = lnRatio(t) - target;
            if (Math.abs(f) <= 1e-12 * Math.max(1, Math.abs(target))) {
                return t;
            }
            if (f > 0) {
                hi = t;
            } else {
                lo = t;
            }
            double tn = t - f / logSlope(t);
            if (!(tn > lo && tn < hi)) {
                tn = 0.5 * (lo + hi);
            }
            if (Math.abs(tn - t) <= 1e-14 * t) {
                return tn;
            }
            t = tn;
        }
        throw new ConvergenceException("temperature at p = " + Numbers.brief(pressure) + " Pa", MAX_ITER, f);
    }

    private double lnRatio(double temperature) {
        double theta = Math.max(0, 1 - temperature / criticalTemperature);
        double s = 0;
        for (int i = 0; i < n.length; i++) {
            s += n[i] * Math.pow(theta, k[i]);
        }
        return criticalTemperature / temperature * s;
    }

    @Override
    public double[] n() {
        return n.clone();
    }

    @Override
    public double[] k() {
        return k.clone();
    }
}
