package org.finstack.fluid.blend;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.ConvergenceException;
import org.finstack.core.Limit;
import org.finstack.core.Numbers;
import org.finstack.core.OutOfRangeException;
import org.finstack.core.Validity;
import org.finstack.fluid.FluidInfo;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.HelmholtzFluid;
import org.finstack.fluid.InputPair;
import org.finstack.fluid.Phase;
import org.finstack.fluid.SaturationState;
import org.finstack.fluid.TransportProperties;
import org.finstack.fluid.eos.Ancillary;
import org.finstack.fluid.eos.HelmholtzEos;
import org.finstack.fluid.internal.HelmholtzBackEnd;

/**
 * A refrigerant blend treated as a pseudo-pure fluid after Lemmon (2003): one Helmholtz-energy
 * equation of state for the blend at its fixed composition (same form and machinery as the pure
 * fluids, {@link HelmholtzFluid}) for single-phase states, plus the paper's separate bubble-point
 * and dew-point pressure equations, which carry the blend's temperature glide:
 * <pre>
 *   ln(p_bubble / pc) = (Tc / T) sum_i N_i theta^k_i,   theta = 1 - T / Tc   (likewise p_dew)
 * </pre>
 * with T [K], the blend's pseudo-critical temperature Tc [K] and pressure pc [Pa] and the
 * coefficients of the paper's table for each blend ({@link SaturationPressureEquation}).
 *
 * <p>Saturation:
 * <ul>
 * <li>at a temperature T: the bubble point is the liquid at (T, p_bubble(T)), the dew point the
 * vapour at (T, p_dew(T)), each from the equation of state;</li>
 * <li>at a pressure p: the bubble temperature solves p_bubble(T) = p, the dew temperature
 * p_dew(T) = p (bounded Newton iteration, {@link SaturationPressureEquation#temperature});
 * the dew temperature exceeds the bubble temperature by the glide.</li>
 * </ul>
 * Two-phase states (approximation, common practice for pseudo-pure treatments of zeotropic
 * blends, and the rule the reference library CoolProp applies to these equations): at a pressure
 * p the two-phase mixture of quality q has enthalpy, entropy and specific volume mixed linearly
 * between the bubble and dew states at p, and the temperature
 * <pre>
 *   T = T_bubble(p) + q (T_dew(p) - T_bubble(p)),
 * </pre>
 * which is the same as a temperature linear in enthalpy between the bubble and dew points at that
 * pressure. The real glide is slightly curved and the phases' compositions shift with q; the
 * pseudo-pure treatment ignores that. At a temperature T and quality q between 0 and 1 the
 * pressure is the one whose two-phase state of quality q has temperature T; a (T, p) pair inside
 * the glide gives the two-phase state with q = (T - T_bubble(p)) / (T_dew(p) - T_bubble(p)).
 *
 * <p>Reference state IIR: h = 200 kJ/kg and s = 1 kJ/(kg K) for the saturated liquid at the
 * bubble point at 0 degC (the equation's constant offsets in h and s are shifted to that).
 *
 * <p>Validity (the paper's range, {@link #VALIDITY}): 200 K to 500 K, pressures up to 50 MPa;
 * saturation from 200 K up to below the pseudo-critical temperature (for R-404A and R-407C the
 * paper's bubble-point equation rises slightly above pc within about 0.1 K of Tc, so there
 * {@code saturationAtPressure} covers pressures only up to pc). There is no triple point:
 * {@link FluidInfo#tripleTemperature()} holds the lower limit 200 K and
 * {@link FluidInfo#triplePressure()} the bubble-point pressure there. Outside the range the methods
 * throw {@link OutOfRangeException}. Stated uncertainty (Lemmon 2003, as quoted with the
 * equations' distributed data files): density 0.1 %, heat capacities and speed of sound 0.5 %,
 * bubble-point and dew-point pressures 0.5 %.
 *
 * <p>Worked example (R-407C): {@code Fluids.byName("R407C").saturationAtTemperature(273.15)}
 * gives a bubble-point pressure of 567 890 Pa and a dew-point pressure of 460 724 Pa; at that dew
 * pressure, {@code saturationAtPressure(460724)} gives a bubble temperature of 266.88 K, a glide
 * of 6.27 K (dew point 0 degC).
 */
public final class Lemmon2003PseudoPureBlend extends HelmholtzBackEnd {

    /** The equations of state and the bubble/dew pressure equations. */
    public static final Citation SOURCE = Citation.of("Lemmon 2003",
            "Lemmon, E.W.: Pseudo-Pure Fluid Equations of State for the Refrigerant Blends R-410A, R-404A, "
                    + "R-507A, and R-407C. Int. J. Thermophys. 24(4), 991-1006 (2003)");

    /** The paper's range: 200 K to 500 K, up to 50 MPa (Lemmon 2003). */
    public static final Validity VALIDITY = Validity.of(Limit.of("T", 200, 500, "K"),
            Limit.of("p", 0, 50e6, "Pa"));

    /** IIR reference state: bubble point at 0 degC [K]. */
    private static final double IIR_TEMPERATURE = 273.15;
    /** IIR reference enthalpy [J/kg] (IIR convention, common practice). */
    private static final double IIR_ENTHALPY = 200_000;
    /** IIR reference entropy [J/(kg K)] (IIR convention, common practice). */
    private static final double IIR_ENTROPY = 1_000;

    /** Most steps when bracketing a density root. */
    private static final int MARCH = 400;

    private final HelmholtzFluid eos;
    private final HelmholtzEos helmholtz;
    private final Ancillary liquidStart;
    private final double rhoMax;
    private final SaturationPressureEquation bubble;
    private final SaturationPressureEquation dew;
    private final double dh;
    private final double ds;
    private final double tc;
    private final double pc;
    private final double rhoc;
    /** Bubble pressure at tMin: the lowest pressure with both saturation states in range [Pa]. */
    private final double pMinSat;
    /** Dew pressure at tMin: below it every state in range is vapour [Pa]. */
    private final double pMinDew;
    private final FluidInfo info;

    /**
     * @param info   the blend's constants; its composition must be given
     * @param eos    the blend's equation of state as a fluid (its own phase equilibrium is used only
     *               to pick the density root; its reference state is replaced)
     * @param bubble bubble-point pressure equation
     * @param dew    dew-point pressure equation
     * @param liquidStart ancillary saturated liquid density [mol/m3], a start value only
     */
    Lemmon2003PseudoPureBlend(FluidInfo info, HelmholtzFluid eos, SaturationPressureEquation bubble,
            SaturationPressureEquation dew, Ancillary liquidStart) {
        super(info.name(), eos.info().minTemperature(), eos.info().maxTemperature(), eos.info().maxPressure());
        if (!info.isBlend()) {
            throw new IllegalArgumentException(info.name() + ": a blend needs its composition");
        }
        this.eos = eos;
        this.bubble = bubble;
        this.dew = dew;
        this.helmholtz = eos.equationOfState();
        this.liquidStart = liquidStart;
        FluidInfo e = eos.info();
        this.tc = e.criticalTemperature();
        this.pc = e.criticalPressure();
        this.rhoc = e.criticalDensity();
        this.rhoMax = 1.5 * liquidStart.at(tMin) * helmholtz.molarMass();
        double rhoRef = liquidDensity(IIR_TEMPERATURE, bubble.pressure(IIR_TEMPERATURE));
        HelmholtzEos.Properties ref = helmholtz.properties(IIR_TEMPERATURE, rhoRef);
        this.dh = IIR_ENTHALPY - ref.enthalpy();
        this.ds = IIR_ENTROPY - ref.entropy();
        this.pMinSat = bubble.pressure(tMin);
        this.pMinDew = dew.pressure(tMin);
        this.info = new FluidInfo(name(), info.aliases(), info.chemicalName(), info.safetyClass(), info.gwp100(),
                info.gwpBasis(), tc, pc, e.criticalDensity(), e.molarMass(), tMin, pMinSat, tMin, tMax, pMax,
                info.equationOfState(), "IIR: h = 200 kJ/kg and s = 1 kJ/(kg K) for the saturated liquid at the "
                        + "bubble point at 0 degC", info.composition());
    }

    @Override
    public FluidInfo info() {
        return info;
    }

    /** @return the bubble-point pressure equation */
    public SaturationPressureEquation bubblePressureEquation() {
        return bubble;
    }

    /** @return the dew-point pressure equation */
    public SaturationPressureEquation dewPressureEquation() {
        return dew;
    }

    @Override
    public SaturationState saturationAtTemperature(double temperature) {
        requireSaturationTemperature(temperature, tc);
        FluidState liquid = onPhase(temperature, bubble.pressure(temperature), Phase.LIQUID, 0);
        FluidState vapour = onPhase(temperature, dew.pressure(temperature), Phase.VAPOUR, 1);
        return new SaturationState(liquid, vapour);
    }

    @Override
    public SaturationState saturationAtPressure(double pressure) {
        Check.finite("pressure", pressure);
        if (pressure < pMinSat * (1 - 1e-12) || pressure >= pc) {
            throw outOfRange("saturation pressure [Pa]", pressure,
                    Numbers.brief(pMinSat) + " Pa (bubble point at " + plain(tMin) + " K) to below "
                            + Numbers.brief(pc) + " Pa");
        }
        double tb = bubble.temperature(pressure, tMin, tc);
        double td = dew.temperature(pressure, tb, tc);
        return new SaturationState(onPhase(tb, pressure, Phase.LIQUID, 0), onPhase(td, pressure, Phase.VAPOUR, 1));
    }

    @Override
    protected FluidState atTQ(double temperature, double quality) {
        SaturationState sat = saturationAtTemperature(temperature);
        if (quality == 0) {
            return sat.liquid();
        }
        if (quality == 1) {
            return sat.vapour();
        }
        // the pressure whose two-phase state of this quality has this temperature:
        // g(p) = T_b(p) + q (T_d(p) - T_b(p)) - T rises with p, g(p_dew(T)) <= 0 <= g(p_bubble(T))
        double lo = Math.log(Math.max(sat.dewPressure(), pMinSat));
        double hi = Math.log(sat.bubblePressure());
        double gLo = glideTemperature(Math.exp(lo), quality) - temperature;
        double gHi = glideTemperature(Math.exp(hi), quality) - temperature;
        if (gLo > 0) {
            // the pressure lies below the bubble point at the lowest temperature of the range
            throw outOfRange("T [K] at quality " + Numbers.brief(quality), temperature,
                    "two-phase states with both saturation states at or above " + plain(tMin) + " K");
        }
        double x = lo;
        double g = gLo;
        for (int it = 0; it < MAX_ITER; it++) {
            if (gHi == gLo) {
                break;
            }
            x = hi - gHi * (hi - lo) / (gHi - gLo);
            if (!(x > lo && x < hi)) {
                x = 0.5 * (lo + hi);
            }
            g = glideTemperature(Math.exp(x), quality) - temperature;
            if (Math.abs(g) <= 1e-12 * temperature || hi - lo <= 1e-14) {
                return mix(saturationAtPressure(Math.exp(x)), quality);
            }
            // Illinois modification of regula falsi keeps both ends moving
            if (g > 0) {
                hi = x;
                gHi = g;
                gLo *= 0.5;
            } else {
                lo = x;
                gLo = g;
                gHi *= 0.5;
            }
        }
        if (Math.abs(g) <= 1e-12 * temperature) {
            return mix(saturationAtPressure(Math.exp(x)), quality);
        }
        throw new ConvergenceException(name() + " pressure at T = " + Numbers.brief(temperature) + " K, q = "
                + Numbers.brief(quality), MAX_ITER, g);
    }

    /** Temperature of the two-phase state of quality q at p [K]. */
    private double glideTemperature(double pressure, double quality) {
        if (pressure < pMinSat * (1 - 1e-12)) {
            throw outOfRange("saturation pressure [Pa]", pressure,
                    Numbers.brief(pMinSat) + " Pa (bubble point at " + plain(tMin) + " K) to below "
                            + Numbers.brief(pc) + " Pa");
        }
        double tb = bubble.temperature(pressure, tMin, tc);
        double td = dew.temperature(pressure, tb, tc);
        return tb + quality * (td - tb);
    }

    @Override
    protected FluidState atTP(double temperature, double pressure) {
        if (temperature < tc) {
            double pb = bubble.pressure(temperature);
            double pd = dew.pressure(temperature);
            if (pressure >= pb) {
                return onPhase(temperature, pressure, Phase.LIQUID, FluidState.NO_QUALITY);
            }
            if (pressure <= pd) {
                return onPhase(temperature, pressure, Phase.VAPOUR, FluidState.NO_QUALITY);
            }
            SaturationState sat = saturationAtPressure(pressure);
            double q = (temperature - sat.bubbleTemperature()) / (sat.dewTemperature() - sat.bubbleTemperature());
            return mix(sat, Math.max(0, Math.min(1, q)));
        }
        return shifted(eos.at(InputPair.TP, temperature, pressure), FluidState.NO_QUALITY);
    }

    @Override
    protected FluidState atPH(double pressure, double enthalpy) {
        if (pressure >= pc) {
            return temperatureFromEnthalpy(pressure, enthalpy, tMin, tMax, null, null, Phase.LIQUID);
        }
        if (pressure < pMinDew) {
            return temperatureFromEnthalpy(pressure, enthalpy, tMin, tMax, null, null, Phase.VAPOUR);
        }
        if (pressure < pMinSat) {
            double td = dew.temperature(pressure, tMin, tc);
            FluidState v = onPhase(td, pressure, Phase.VAPOUR, 1);
            return temperatureFromEnthalpy(pressure, enthalpy, td, tMax, v, null, Phase.VAPOUR);
        }
        SaturationState sat = saturationAtPressure(pressure);
        FluidState twoPhase = inSaturation(sat, enthalpy);
        if (twoPhase != null) {
            return twoPhase;
        }
        if (enthalpy < sat.liquid().enthalpy()) {
            return temperatureFromEnthalpy(pressure, enthalpy, tMin, sat.bubbleTemperature(), null, sat.liquid(),
                    Phase.LIQUID);
        }
        return temperatureFromEnthalpy(pressure, enthalpy, sat.dewTemperature(), tMax, sat.vapour(), null,
                Phase.VAPOUR);
    }

    /**
     * Solves h(T, p) = h for T in [lo, hi] within one phase: Newton on T with slope cp, safeguarded
     * by regula falsi and bisection inside the bracket (at most 100 steps). Below Tc the states
     * are of the phase {@code below}.
     */
    private FluidState temperatureFromEnthalpy(double p, double h, double lo, double hi, FluidState loState,
            FluidState hiState, Phase below) {
        FluidState a = loState != null ? loState : single(lo, p, below);
        FluidState b = hiState != null ? hiState : single(hi, p, below);
        if (h < a.enthalpy() || h > b.enthalpy()) {
            throw outOfRange("h [J/kg] at p = " + Numbers.brief(p) + " Pa", h,
                    Numbers.brief(a.enthalpy()) + " to " + Numbers.brief(b.enthalpy()) + " J/kg");
        }
        double tLo = lo;
        double tHi = hi;
        double hLo = a.enthalpy();
        double hHi = b.enthalpy();
        double t = tLo + (h - hLo) / (hHi - hLo) * (tHi - tLo);
        double f = Double.NaN;
        for (int it = 0; it < MAX_ITER; it++) {
            FluidState s = single(t, p, below);
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
            if (!(tn > tLo && tn < tHi)) {
                tn = tLo + (h - hLo) / (hHi - hLo) * (tHi - tLo);
                if (!(tn > tLo && tn < tHi)) {
                    tn = 0.5 * (tLo + tHi);
                }
            }
            if (Math.abs(tn - t) < 1e-13 * t) {
                return single(tn, p, below);
            }
            t = tn;
        }
        throw new ConvergenceException(name() + " temperature at p = " + Numbers.brief(p) + " Pa, h = "
                + Numbers.brief(h) + " J/kg", MAX_ITER, f);
    }

    /**
     * A single-phase state at (T, p) outside the glide: below Tc of the given phase, at or above
     * Tc the equation's only root.
     */
    private FluidState single(double temperature, double pressure, Phase below) {
        if (temperature < tc) {
            return onPhase(temperature, pressure, below, FluidState.NO_QUALITY);
        }
        return shifted(eos.at(InputPair.TP, temperature, pressure), FluidState.NO_QUALITY);
    }

    /**
     * The state of the given phase at (T, p), for T below Tc: the liquid root (largest density on
     * the liquid branch) or the vapour root (smallest density) of p(T, rho) = p. The blend's
     * bubble pressure can lie below, and its dew pressure above, the equation's own
     * phase-equilibrium pressure, so the root is chosen by branch, not by that pressure.
     */
    private FluidState onPhase(double temperature, double pressure, Phase phase, double quality) {
        double rho = phase == Phase.LIQUID ? liquidDensity(temperature, pressure) : vapourDensity(temperature, pressure);
        HelmholtzEos.Properties pr = helmholtz.properties(temperature, rho);
        // the state carries the pressure it was solved for (the equation's pressure at the solved
        // density agrees to the solver's tolerance)
        return new FluidState(temperature, pressure, rho, pr.enthalpy() + dh, pr.entropy() + ds, pr.cp(), pr.cv(),
                pr.speedOfSound(), phase, quality);
    }

    /**
     * Liquid root: from the ancillary liquid density, up until the pressure exceeds p on the
     * stable branch, then down in steps of at most 2 % (shortened where a step would cross the
     * spinodal) until it falls below p; Newton with bisection inside that bracket.
     */
    private double liquidDensity(double t, double p) {
        double hi = liquidStart.at(Math.min(t, tc)) * helmholtz.molarMass();
        int guard = 0;
        double[] ps = helmholtz.pressureAndSlope(t, hi);
        while (!(ps[1] > 0) || ps[0] < p) {
            hi *= 1.05;
            if (hi > rhoMax || ++guard > MARCH) {
                throw outOfRange("p [Pa] at T = " + Numbers.brief(t) + " K", p,
                        "below the pressure at " + Numbers.brief(rhoMax) + " kg/m3");
            }
            ps = helmholtz.pressureAndSlope(t, hi);
        }
        double step = 0.02;
        double lo;
        for (int it = 0; ; it++) {
            double next = hi / (1 + step);
            double[] pn = helmholtz.pressureAndSlope(t, next);
            if (it > MARCH || step < 1e-10) {
                throw new ConvergenceException(name() + " liquid density at T = " + Numbers.brief(t) + " K, p = "
                        + Numbers.brief(p) + " Pa (no liquid root above the spinodal)", it, pn[0] / p - 1);
            }
            if (!(pn[1] > 0)) {
                step /= 4;
                continue;
            }
            if (pn[0] <= p) {
                lo = next;
                break;
            }
            hi = next;
        }
        return solveDensity(helmholtz, t, p, lo, hi, 0.5 * (lo + hi));
    }

    /**
     * Vapour root: from a low density, up in steps of at most 5 % (shortened where a step would
     * cross the spinodal) until the pressure exceeds p; Newton with bisection inside that bracket.
     */
    private double vapourDensity(double t, double p) {
        double lo = 0;
        double hi = Math.min(p / (helmholtz.specificGasConstant() * t), 0.1 * rhoc);
        double step = 0.05;
        for (int it = 0; ; it++) {
            double[] ps = helmholtz.pressureAndSlope(t, hi);
            if (it > MARCH || step < 1e-10) {
                throw new ConvergenceException(name() + " vapour density at T = " + Numbers.brief(t) + " K, p = "
                        + Numbers.brief(p) + " Pa (no vapour root below the spinodal)", it, ps[0] / p - 1);
            }
            if (!(ps[1] > 0)) {
                step /= 4;
                hi = lo > 0 ? lo * (1 + step) : 0.5 * hi;
                continue;
            }
            if (ps[0] >= p) {
                break;
            }
            lo = hi;
            hi = lo * (1 + step);
        }
        return solveDensity(helmholtz, t, p, lo, hi, hi);
    }

    private FluidState shifted(FluidState s, double quality) {
        return new FluidState(s.temperature(), s.pressure(), s.density(), s.enthalpy() + dh, s.entropy() + ds,
                s.cp(), s.cv(), s.speedOfSound(), s.phase(), quality);
    }

    /**
     * @return viscosity, conductivity and surface tension from the blend correlations of Geller et
     *         al. (2000, 2001) and Okada et al. (1999), evaluated at this equation's densities
     *         ({@link org.finstack.fluid.transport.BlendTransport}); for the saturated liquid and
     *         vapour take the bubble and dew points of {@link #saturationAtTemperature} or
     *         {@link #saturationAtPressure}
     */
    @Override
    protected TransportProperties buildTransport() {
        return org.finstack.fluid.transport.BlendTransport.forBlend(this);
    }

    @Override
    public String toString() {
        return name() + " (" + info.equationOfState().key() + ", pseudo-pure)";
    }
}
