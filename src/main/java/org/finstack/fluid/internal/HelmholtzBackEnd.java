package org.finstack.fluid.internal;

import org.finstack.core.Check;
import org.finstack.core.ConvergenceException;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Numbers;
import org.finstack.core.OutOfRangeException;
import org.finstack.fluid.Fluid;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.InputPair;
import org.finstack.fluid.SaturationState;
import org.finstack.fluid.TransportProperties;
import org.finstack.fluid.eos.HelmholtzEos;

/**
 * What the fluids computed from a Helmholtz-energy equation of state share (the pure fluids and
 * the pseudo-pure blends): the input-pair dispatch of {@link #at} with its argument and range
 * checks, the range messages, the two-phase mixing rule, the two-phase part of a (p, h) flash, the
 * bounded Newton iteration for the density at (T, p), and the transport properties built on first
 * use. A subclass supplies the single-phase and saturation algorithms.
 *
 * <p>Range checks throw {@link OutOfRangeException} naming the fluid, the property, the value and
 * the range: temperatures from {@link #tMin} to {@link #tMax}, pressures above 0 up to
 * {@link #pMax}.
 */
public abstract class HelmholtzBackEnd implements Fluid {

    /** Most steps of an iteration. */
    protected static final int MAX_ITER = 100;

    /** Lowest temperature of the equation's range [K]. */
    protected final double tMin;
    /** Highest temperature of the equation's range [K]. */
    protected final double tMax;
    /** Highest pressure of the equation's range [Pa]. */
    protected final double pMax;

    private final String name;
    /** Transport properties, built on first use (benign race: every build gives an equal object). */
    private volatile TransportProperties transport;

    /**
     * @param name the fluid's name
     * @param tMin lowest temperature of the range [K]
     * @param tMax highest temperature of the range [K]
     * @param pMax highest pressure of the range [Pa]
     */
    protected HelmholtzBackEnd(String name, double tMin, double tMax, double pMax) {
        this.name = name;
        this.tMin = tMin;
        this.tMax = tMax;
        this.pMax = pMax;
    }

    @Override
    public final String name() {
        return name;
    }

    @Override
    public final FluidState at(InputPair pair, double a, double b) {
        if (pair == null) {
            throw new InputException("inputPair", Msg.MISSING);
        }
        return switch (pair) {
            case TP -> {
                Check.finite("temperature", a);
                Check.finite("pressure", b);
                requireTemperature(a);
                requirePressure(b);
                yield atTP(a, b);
            }
            case PH -> {
                Check.finite("pressure", a);
                Check.finite("enthalpy", b);
                requirePressure(a);
                yield atPH(a, b);
            }
            case PQ -> {
                Check.finite("pressure", a);
                Check.within("quality", b, 0, 1);
                yield mix(saturationAtPressure(a), b);
            }
            case TQ -> {
                Check.finite("temperature", a);
                Check.within("quality", b, 0, 1);
                yield atTQ(a, b);
            }
        };
    }

    /**
     * @param temperature T [K], finite and inside the range
     * @param pressure    p [Pa], finite and inside the range
     * @return the state at (T, p)
     */
    protected abstract FluidState atTP(double temperature, double pressure);

    /**
     * @param pressure p [Pa], finite and inside the range
     * @param enthalpy h [J/kg], finite
     * @return the state at (p, h)
     */
    protected abstract FluidState atPH(double pressure, double enthalpy);

    /**
     * @param temperature T [K], finite
     * @param quality     q, 0 to 1
     * @return the state at (T, q)
     */
    protected abstract FluidState atTQ(double temperature, double quality);

    /**
     * Checks a saturation temperature: finite, from {@link #tMin} to below Tc.
     *
     * @param temperature T [K]
     * @param tc          critical (or pseudo-critical) temperature [K]
     */
    protected final void requireSaturationTemperature(double temperature, double tc) {
        Check.finite("temperature", temperature);
        if (temperature < tMin || temperature >= tc) {
            throw outOfRange("saturation temperature [K]", temperature,
                    plain(tMin) + " K to below " + plain(tc) + " K");
        }
    }

    /** @param t temperature [K], inside the range */
    protected final void requireTemperature(double t) {
        if (t < tMin || t > tMax) {
            throw outOfRange("T [K]", t, plain(tMin) + " K to " + plain(tMax) + " K");
        }
    }

    /** @param p pressure [Pa], inside the range */
    protected final void requirePressure(double p) {
        if (!(p > 0) || p > pMax) {
            throw outOfRange("p [Pa]", p, "above 0 Pa up to " + plain(pMax) + " Pa");
        }
    }

    /**
     * @param v a range bound
     * @return the bound as stated, without rounding (e.g. 169.85, not 169.9)
     */
    protected static String plain(double v) {
        return java.math.BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }

    /**
     * @param property the property and its unit, e.g. {@code T [K]}
     * @param value    the value asked for
     * @param range    the range, in words
     * @return the exception naming this fluid
     */
    protected final OutOfRangeException outOfRange(String property, double value, String range) {
        return new OutOfRangeException(Msg.FLUID_OUT_OF_RANGE, name, property, value, range);
    }

    /**
     * The two-phase state of quality q by the lever rule ({@link TwoPhase#mix}), its temperature
     * linear in q between the two saturated states' temperatures (equal for a pure fluid, the
     * bubble and dew points for a blend).
     *
     * @param sat the saturation state
     * @param q   quality, 0 to 1
     * @return the state
     */
    protected static FluidState mix(SaturationState sat, double q) {
        double tl = sat.liquid().temperature();
        return TwoPhase.mix(sat, q, tl + q * (sat.vapour().temperature() - tl));
    }

    /**
     * The two-phase part of a (p, h) flash: a saturated state when h is within 1e-9 of the latent
     * heat of it, the mixture when h lies between the saturated enthalpies.
     *
     * @param sat      the saturation state at p
     * @param enthalpy h [J/kg]
     * @return the state, or null when h is below the liquid's or above the vapour's enthalpy
     */
    protected static FluidState inSaturation(SaturationState sat, double enthalpy) {
        double hl = sat.liquid().enthalpy();
        double hv = sat.vapour().enthalpy();
        double edge = 1e-9 * (hv - hl);
        if (Math.abs(enthalpy - hl) <= edge) {
            return sat.liquid();
        }
        if (Math.abs(enthalpy - hv) <= edge) {
            return sat.vapour();
        }
        if (enthalpy > hl && enthalpy < hv) {
            return mix(sat, (enthalpy - hl) / (hv - hl));
        }
        return null;
    }

    /**
     * Newton iteration with bisection fallback for p(T, rho) = p with rho in [lo, hi] (at most
     * {@link #MAX_ITER} steps; a step with a non-positive slope or leaving the bracket bisects).
     *
     * @param eos         the equation of state
     * @param temperature T [K]
     * @param pressure    p [Pa]
     * @param lo          lower end of the bracket [kg/m3]
     * @param hi          upper end of the bracket [kg/m3]
     * @param start       start density [kg/m3]
     * @return the density [kg/m3]
     * @throws ConvergenceException if it does not converge
     */
    protected final double solveDensity(HelmholtzEos eos, double temperature, double pressure, double lo,
            double hi, double start) {
        double x = start;
        double f = Double.NaN;
        for (int it = 0; it < MAX_ITER; it++) {
            double[] ps = eos.pressureAndSlope(temperature, x);
            f = ps[0] - pressure;
            if (f == 0) {
                return x;
            }
            if (f > 0) {
                hi = x;
            } else {
                lo = x;
            }
            double xn = x - f / ps[1];
            if (ps[1] > 0 && (Math.abs(xn - x) <= 1e-13 * x || Math.abs(f) <= 1e-13 * pressure)) {
                return xn;
            }
            if (!(ps[1] > 0) || !(xn > lo && xn < hi)) {
                xn = 0.5 * (lo + hi);
            }
            x = xn;
        }
        throw new ConvergenceException(name + " density at T = " + Numbers.brief(temperature) + " K, p = "
                + Numbers.brief(pressure) + " Pa", MAX_ITER, f / pressure);
    }

    /**
     * @return viscosity, conductivity and surface tension, built by {@link #buildTransport()} on
     *         first use
     */
    @Override
    public final TransportProperties transport() {
        TransportProperties t = transport;
        if (t == null) {
            t = buildTransport();
            transport = t;
        }
        return t;
    }

    /** @return this fluid's transport properties (called once, on first use) */
    protected abstract TransportProperties buildTransport();
}
