package org.finstack.fluid;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.ConvergenceException;
import org.finstack.core.Numbers;
import org.finstack.core.OutOfRangeException;
import org.finstack.fluid.eos.Ancillary;
import org.finstack.fluid.eos.Derivatives;
import org.finstack.fluid.eos.HelmholtzEos;
import org.finstack.fluid.eos.HelmholtzEos.Properties;
import org.finstack.fluid.internal.HelmholtzBackEnd;

/**
 * A pure fluid computed from its reference Helmholtz-energy equation of state
 * ({@link HelmholtzEos}). Immutable and thread-safe.
 *
 * <p>Algorithms (all iterations bounded; non-convergence throws
 * {@link ConvergenceException}):
 * <ul>
 * <li>Phase equilibrium at given T: Newton iteration on the reduced liquid and vapour densities
 * for equal pressure and equal Gibbs energy, in the reduced form of Akasaka (2008):
 * {@code J = delta (1 + delta alphar_d)} and {@code K = delta alphar_d + alphar + ln delta}
 * equal in both phases, with {@code dK/d delta = (dJ/d delta) / delta}; started from the
 * ancillary equations, steps damped to keep both densities positive and apart.</li>
 * <li>Phase equilibrium at given p: Newton on ln p(T) with the Clausius-Clapeyron slope
 * {@code d ln p / dT = (h'' - h') / (T p (v'' - v'))}, safeguarded by bisection.</li>
 * <li>(T, p): the phase follows from the vapour pressure at T; the density is then found by a
 * Newton iteration with bisection fallback inside the bracket of that phase (liquid: above the
 * saturated liquid density; vapour: below the saturated vapour density).</li>
 * <li>(p, h): the phase follows from the saturation state at p; in one phase, a Newton
 * iteration on T with slope cp and bisection fallback inside the phase's temperature bracket.</li>
 * </ul>
 * Reference for the saturation solver: {@link #SATURATION_METHOD}.
 *
 * <p>Validity: each fluid's equation is used only inside the range its paper states
 * ({@link FluidInfo#minTemperature()} to {@link FluidInfo#maxTemperature()}, pressures up to
 * {@link FluidInfo#maxPressure()}); outside it the fluid throws
 * {@link OutOfRangeException}. Saturation is solved from the triple point up to 0.01 K below the
 * critical temperature (closer to Tc it may throw {@link ConvergenceException}). Accuracy is that
 * of the equation (e.g. R134a: density within 0.05 %, vapour pressure within 0.02 %, heat
 * capacities within 1 %, as stated by Tillner-Roth &amp; Baehr 1994).
 *
 * <p>Worked example (R134a, Tillner-Roth &amp; Baehr 1994, IIR reference state):
 * {@code Fluids.byName("R134a").saturationAtTemperature(273.15)} gives a vapour pressure of
 * 292 803 Pa, saturated liquid density 1294.78 kg/m3, saturated vapour density 14.428 kg/m3 and
 * latent heat 198 603 J/kg.
 */
public final class HelmholtzFluid extends HelmholtzBackEnd {

    /** The phase-equilibrium method. */
    public static final Citation SATURATION_METHOD = Citation.of("Akasaka 2008",
            "Akasaka, R.: A Reliable and Useful Method to Determine the Saturation State from Helmholtz "
                    + "Energy Equations of State. J. Therm. Sci. Technol. 3(3), 442-451 (2008)");

    /** IIR reference state: saturated liquid at 0 degC [K]. */
    static final double IIR_TEMPERATURE = 273.15;
    /** IIR reference enthalpy [J/kg] (IIR convention, common practice). */
    static final double IIR_ENTHALPY = 200_000;
    /** IIR reference entropy [J/(kg K)] (IIR convention, common practice). */
    static final double IIR_ENTROPY = 1_000;

    /** Relative distance below Tc from which saturation starts from scaled values, not ancillaries. */
    private static final double NEAR_CRITICAL = 0.01;

    private final HelmholtzEos eos;
    private final Ancillary vapourPressure;
    private final Ancillary liquidDensity;
    private final Ancillary vapourDensity;
    private final double tc;
    private final double pc;
    private final double rhoc;
    private final double pMin;
    private final double rhoMax;
    private final FluidInfo info;

    /**
     * @param info           constants (the triple pressure is recomputed from the equation)
     * @param eos            the equation of state (its ideal-gas constants are replaced to give the
     *                       IIR reference state)
     * @param vapourPressure ancillary vapour pressure [Pa]
     * @param liquidDensity  ancillary saturated liquid density [mol/m3]
     * @param vapourDensity  ancillary saturated vapour density [mol/m3]
     */
    HelmholtzFluid(FluidInfo info, HelmholtzEos eos, Ancillary vapourPressure, Ancillary liquidDensity,
            Ancillary vapourDensity) {
        super(info.name(), info.minTemperature(), info.maxTemperature(), info.maxPressure());
        this.vapourPressure = vapourPressure;
        this.liquidDensity = liquidDensity;
        this.vapourDensity = vapourDensity;
        this.tc = info.criticalTemperature();
        this.pc = info.criticalPressure();
        this.rhoc = info.criticalDensity();
        // IIR reference state: shift a1 and a2 so that h' = 200 kJ/kg, s' = 1 kJ/(kg K) at 0 degC
        double[] raw = saturationDensities(eos, IIR_TEMPERATURE, null);
        Properties ref = eos.properties(IIR_TEMPERATURE, raw[0]);
        double rs = eos.specificGasConstant();
        double a2 = eos.ideal().a2() + (IIR_ENTHALPY - ref.enthalpy()) / (rs * eos.reducingTemperature());
        double a1 = eos.ideal().a1() - (IIR_ENTROPY - ref.entropy()) / rs;
        this.eos = eos.withIdeal(eos.ideal().withLead(a1, a2));
        double[] triple = saturationDensities(this.eos, tMin, null);
        this.pMin = this.eos.pressure(tMin, triple[1]);
        this.rhoMax = 1.5 * triple[0];
        this.info = new FluidInfo(info.name(), info.aliases(), info.chemicalName(), info.safetyClass(),
                info.gwp100(), info.gwpBasis(), tc, pc, rhoc, info.molarMass(), info.tripleTemperature(),
                pMin, tMin, tMax, pMax, info.equationOfState(), info.referenceState());
    }

    @Override
    public FluidInfo info() {
        return info;
    }

    /** @return the equation of state, with the IIR reference state applied */
    public HelmholtzEos equationOfState() {
        return eos;
    }

    /**
     * The state at a given temperature and density, straight from the equation of state (no
     * phase-equilibrium check: inside the two-phase region it gives the metastable or unstable
     * homogeneous state).
     *
     * @param temperature T [K]
     * @param density     rho [kg/m3]
     * @return the homogeneous state, phase by comparison with the critical point
     */
    public FluidState atTemperatureDensity(double temperature, double density) {
        Check.positive("temperature", temperature);
        Check.positive("density", density);
        requireTemperature(temperature);
        Properties pr = eos.properties(temperature, density);
        Phase ph = temperature >= tc ? (pr.pressure() >= pc ? Phase.SUPERCRITICAL : Phase.VAPOUR)
                : density >= rhoc ? Phase.LIQUID : Phase.VAPOUR;
        return single(pr, ph, FluidState.NO_QUALITY);
    }

    @Override
    public SaturationState saturationAtTemperature(double temperature) {
        requireSaturationTemperature(temperature, tc);
        double[] d = saturationDensities(eos, temperature, null);
        return saturation(temperature, d);
    }

    @Override
    public SaturationState saturationAtPressure(double pressure) {
        Check.finite("pressure", pressure);
        if (pressure < pMin * (1 - 1e-9) || pressure >= pc) {
            throw outOfRange("saturation pressure [Pa]", pressure,
                    Numbers.brief(pMin) + " Pa to below " + Numbers.brief(pc) + " Pa");
        }
        if (pressure <= pMin) {
            return saturationAtTemperature(tMin);
        }
        double t = ancillaryTemperature(pressure);
        double lo = tMin;
        double hi = tc;
        double[] d = null;
        double f = Double.NaN;
        for (int it = 0; it < MAX_ITER; it++) {
            d = saturationDensities(eos, t, d);
            Properties l = eos.properties(t, d[0]);
            Properties v = eos.properties(t, d[1]);
            double ps = v.pressure();
            f = Math.log(ps / pressure);
            if (Math.abs(f) < 1e-12) {
                return saturation(t, d);
            }
            if (f > 0) {
                hi = t;
            } else {
                lo = t;
            }
            double slope = (v.enthalpy() - l.enthalpy()) / (t * ps * (1 / d[1] - 1 / d[0]));
            double tn = t - f / slope;
            if (!(tn > lo && tn < hi)) {
                tn = 0.5 * (lo + hi);
                d = null;
            }
            if (Math.abs(tn - t) < 1e-12 * t) {
                return saturation(tn, saturationDensities(eos, tn, d));
            }
            t = tn;
        }
        throw new ConvergenceException(name() + " saturation temperature at p = " + Numbers.brief(pressure) + " Pa",
                MAX_ITER, f);
    }

    @Override
    protected FluidState atTP(double temperature, double pressure) {
        return singleTP(temperature, pressure, null);
    }

    @Override
    protected FluidState atTQ(double temperature, double quality) {
        return mix(saturationAtTemperature(temperature), quality);
    }

    /** Single-phase state at (T, p); {@code sat} is the saturation densities at T if known. */
    private FluidState singleTP(double temperature, double pressure, double[] satStart) {
        double rho;
        Phase phase;
        if (temperature >= tc) {
            double guess = Math.min(pressure / (eos.specificGasConstant() * temperature), 2 * rhoc);
            rho = densityInPhase(temperature, pressure, 0, Double.POSITIVE_INFINITY, guess);
            phase = pressure >= pc ? Phase.SUPERCRITICAL : Phase.VAPOUR;
        } else {
            double[] d = saturationDensities(eos, temperature, satStart);
            double ps = eos.pressure(temperature, d[1]);
            if (pressure >= ps) {
                rho = densityInPhase(temperature, pressure, d[0], Double.POSITIVE_INFINITY, d[0]);
                phase = Phase.LIQUID;
            } else {
                double guess = Math.min(pressure / (eos.specificGasConstant() * temperature), d[1]);
                rho = densityInPhase(temperature, pressure, 0, d[1], guess);
                phase = Phase.VAPOUR;
            }
        }
        return single(eos.properties(temperature, rho), phase, FluidState.NO_QUALITY);
    }

    @Override
    protected FluidState atPH(double pressure, double enthalpy) {
        if (pressure >= pMin && pressure < pc) {
            SaturationState sat = saturationAtPressure(pressure);
            FluidState twoPhase = inSaturation(sat, enthalpy);
            if (twoPhase != null) {
                return twoPhase;
            }
            double ts = sat.liquid().temperature();
            if (enthalpy < sat.liquid().enthalpy()) {
                return temperatureFromEnthalpy(pressure, enthalpy, tMin, ts, null, sat.liquid());
            }
            return temperatureFromEnthalpy(pressure, enthalpy, ts, tMax, sat.vapour(), null);
        }
        return temperatureFromEnthalpy(pressure, enthalpy, tMin, tMax, null, null);
    }

    /**
     * Solves h(T, p) = h for T in [lo, hi] within one phase. Known end states (the saturated
     * states) may be passed to save their evaluation.
     */
    private FluidState temperatureFromEnthalpy(double p, double h, double lo, double hi, FluidState loState,
            FluidState hiState) {
        FluidState a = loState != null ? loState : singleTP(lo, p, null);
        FluidState b = hiState != null ? hiState : singleTP(hi, p, null);
        if (h < a.enthalpy() || h > b.enthalpy()) {
            throw outOfRange("h [J/kg] at p = " + Numbers.brief(p) + " Pa", h,
                    Numbers.brief(a.enthalpy()) + " to " + Numbers.brief(b.enthalpy()) + " J/kg");
        }
        if (h == a.enthalpy() && loState == null) {
            return a;
        }
        if (h == b.enthalpy() && hiState == null) {
            return b;
        }
        double tLo = lo;
        double tHi = hi;
        double hLo = a.enthalpy();
        double hHi = b.enthalpy();
        double t = tLo + (h - hLo) / (hHi - hLo) * (tHi - tLo);
        double f = Double.NaN;
        for (int it = 0; it < MAX_ITER; it++) {
            FluidState s = singleTP(t, p, null);
            f = s.enthalpy() - h;
            if (Math.abs(f) <= 1e-12 * Math.max(Math.abs(h), 1e4)) {
                return s;
            }
            if (f > 0) {
                tHi = t;
                hHi = s.enthalpy();
            } else {
                tLo = t;
                hLo = s.enthalpy();
            }
            double tn = t - f / s.cp();
            if (Math.abs(tn - t) < 1e-13 * t) {
                return s;
            }
            if (!(tn > tLo && tn < tHi)) {
                tn = tLo + (h - hLo) / (hHi - hLo) * (tHi - tLo);
                if (!(tn > tLo && tn < tHi)) {
                    tn = 0.5 * (tLo + tHi);
                }
            }
            if (Math.abs(tn - t) < 1e-13 * t) {
                return singleTP(tn, p, null);
            }
            t = tn;
        }
        throw new ConvergenceException(name() + " temperature at p = " + Numbers.brief(p) + " Pa, h = "
                + Numbers.brief(h) + " J/kg", MAX_ITER, f);
    }

    /**
     * Newton iteration with bisection fallback for p(T, rho) = p with rho in (lo, hi); hi may be
     * infinite (then it is found by expansion up to 1.5 times the triple-point liquid density).
     */
    private double densityInPhase(double temperature, double pressure, double lo, double hi, double guess) {
        if (Double.isInfinite(hi)) {
            double top = Math.max(guess, Math.max(lo, rhoc)) * 1.05;
            while (eos.pressure(temperature, top) < pressure) {
                lo = top;
                top *= 1.2;
                if (top > rhoMax) {
                    throw outOfRange("pressure at T = " + Numbers.brief(temperature) + " K", pressure,
                            "below the pressure at " + Numbers.brief(rhoMax) + " kg/m3");
                }
            }
            hi = top;
        }
        double x = guess > lo && guess < hi ? guess : 0.5 * (lo + hi);
        return solveDensity(eos, temperature, pressure, lo, hi, x);
    }

    /**
     * Liquid and vapour densities [kg/m3] in equilibrium at T (below Tc).
     *
     * @param e     the equation
     * @param t     temperature [K]
     * @param start start densities, or null for the ancillary equations
     */
    private double[] saturationDensities(HelmholtzEos e, double t, double[] start) {
        double rr = e.reducingDensity();
        double tau = e.reducingTemperature() / t;
        double m = e.molarMass();
        double dl;
        double dv;
        double tNear = tc * (1 - NEAR_CRITICAL);
        if (start != null) {
            dl = start[0] / rr;
            dv = start[1] / rr;
        } else if (t > tNear) {
            // close to Tc the ancillaries are too coarse to keep Newton off the trivial solution:
            // start from the solution at tNear, scaled with the critical exponent of the width
            // (beta about 0.35, common practice) and a linear rectilinear diameter
            double[] ref = saturationDensities(e, tNear, null);
            double x = (1 - t / tc) / NEAR_CRITICAL;
            double half = 0.5 * (ref[0] - ref[1]) * Math.pow(x, 0.35);
            double mid = rhoc + (0.5 * (ref[0] + ref[1]) - rhoc) * x;
            dl = (mid + half) / rr;
            dv = (mid - half) / rr;
        } else {
            dl = liquidDensity.at(t) * m / rr;
            dv = vapourDensity.at(t) * m / rr;
        }
        if (!(dl > dv) || !(dv > 0)) {
            dl = Math.max(dl, rhoc / rr * 1.01);
            dv = Math.min(Math.max(dv, 1e-12), rhoc / rr * 0.99);
        }
        double err = Double.NaN;
        for (int it = 0; it < MAX_ITER; it++) {
            Derivatives l = e.residual(dl, tau);
            Derivatives v = e.residual(dv, tau);
            double jl = dl * (1 + dl * l.ad());
            double jv = dv * (1 + dv * v.ad());
            double kl = dl * l.ad() + l.a() + Math.log(dl);
            double kv = dv * v.ad() + v.a() + Math.log(dv);
            double jld = 1 + 2 * dl * l.ad() + dl * dl * l.add();
            double jvd = 1 + 2 * dv * v.ad() + dv * dv * v.add();
            double f1 = jv - jl;
            double f2 = kv - kl;
            err = Math.abs(f1) / Math.max(Math.abs(jv), 1e-300) + Math.abs(f2);
            if (err < 1e-12) {
                return accepted(t, dl * rr, dv * rr, err);
            }
            double stepL = (f1 - f2 * dv) / (jld * (1 - dv / dl));
            double stepV = (f2 * dl - f1) / (jvd * (1 - dl / dv));
            if (!Double.isFinite(stepL) || !Double.isFinite(stepV)) {
                break;
            }
            // the vapour step is taken in ln(delta''): K is nearly linear in it at low density
            double lnStepV = Math.max(-5, Math.min(5, stepV / dv));
            double gamma = 1;
            for (int k = 0; k < 40; k++) {
                double nl = dl + gamma * stepL;
                double nv = dv * Math.exp(gamma * lnStepV);
                if (nl > nv && Math.abs(gamma * stepL) <= 0.5 * dl) {
                    break;
                }
                gamma *= 0.5;
            }
            double ndl = dl + gamma * stepL;
            double ndv = dv * Math.exp(gamma * lnStepV);
            // near the triple point p' is a small difference of large terms: accept when the steps
            // have shrunk to the rounding level
            if (Math.abs(f2) < 1e-10 && Math.abs(ndl - dl) <= 1e-13 * dl && Math.abs(ndv - dv) <= 1e-9 * dv) {
                return accepted(t, ndl * rr, ndv * rr, err);
            }
            dl = ndl;
            dv = ndv;
        }
        throw new ConvergenceException(name() + " saturation at T = " + Numbers.brief(t) + " K", MAX_ITER, err);
    }

    /** Rejects the trivial solution (both densities equal) that Newton can fall into near Tc. */
    private double[] accepted(double t, double rhoL, double rhoV, double err) {
        if (!(rhoL > rhoc && rhoV < rhoc)) {
            throw new ConvergenceException(name() + " saturation at T = " + Numbers.brief(t)
                    + " K (converged to equal densities)", MAX_ITER, err);
        }
        return new double[] {rhoL, rhoV};
    }

    /** Inverts the ancillary vapour pressure by bisection (start value only). */
    private double ancillaryTemperature(double pressure) {
        double lo = tMin;
        double hi = tc;
        for (int it = 0; it < 60; it++) {
            double mid = 0.5 * (lo + hi);
            if (vapourPressure.at(mid) > pressure) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return Math.min(0.5 * (lo + hi), tc * (1 - 1e-6));
    }

    private SaturationState saturation(double t, double[] d) {
        Properties l = eos.properties(t, d[0]);
        Properties v = eos.properties(t, d[1]);
        double p = v.pressure();
        FluidState liquid = new FluidState(t, p, d[0], l.enthalpy(), l.entropy(), l.cp(), l.cv(),
                l.speedOfSound(), Phase.LIQUID, 0);
        FluidState vapour = new FluidState(t, p, d[1], v.enthalpy(), v.entropy(), v.cp(), v.cv(),
                v.speedOfSound(), Phase.VAPOUR, 1);
        return new SaturationState(liquid, vapour);
    }

    private static FluidState single(Properties p, Phase phase, double quality) {
        return new FluidState(p.temperature(), p.pressure(), p.density(), p.enthalpy(), p.entropy(), p.cp(),
                p.cv(), p.speedOfSound(), phase, quality);
    }

    /**
     * @return viscosity, conductivity and surface tension from the fluid's published correlations
     *         ({@link org.finstack.fluid.transport.CorrelationTransport})
     */
    @Override
    protected TransportProperties buildTransport() {
        return org.finstack.fluid.transport.CorrelationTransport.forFluid(this);
    }

    @Override
    public String toString() {
        return name() + " (" + info.equationOfState().key() + ")";
    }
}
