package org.finstack.coil;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleUnaryOperator;
import org.finstack.core.Citation;
import org.finstack.core.ConvergenceException;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Warnings;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.InputPair;
import org.finstack.fluid.SaturationState;
import org.finstack.fluid.psychro.MoistAirState;
import org.finstack.fluid.psychro.Psychrometrics;
import org.finstack.tubeside.SaturatedProperties;

/**
 * The zone model: an evaporator is a two-phase zone followed by a superheat zone, a condenser a
 * desuperheating, a condensing and a subcooling zone. Each zone is a share of the coil's surface
 * and of its face (so every zone meets the entering air), found so that the zone's duty is what
 * the refrigerant needs to cross it; eps-NTU per zone (crossflow, refrigerant mixed), dry or wet.
 *
 * <p>Two-phase zones: with a blend's glide the refrigerant's temperature rises (evaporator) or
 * falls (condenser) through the zone, and the zone is treated as a stream of capacity rate
 * m (h_out - h_in) / (T_out - T_in); where the pressure drop outweighs the glide the zone is held
 * at its mean temperature (Cr = 0). The refrigerant film coefficient of a two-phase zone is the
 * mean over quality of the flow-boiling or condensing correlation. Pressure drops (friction,
 * acceleration, return bends) are summed along a mean circuit and fed back into the zone
 * temperatures until the inlet pressure settles.
 */
public final class ZoneCoilModel {

    /** Model name reported in ratings. */
    public static final String ID = "zones";

    private static final int MAX_OUTER = 40;
    private static final int QUALITY_POINTS = 8;
    private static final int MAX_DUTY_UPDATES = 16;

    /**
     * Share of the circuits' inlet pressure whose loss is refused: the condenser's outlet pressure
     * is held at no less than 0.3 of the inlet, where no fixed point of the drop exists.
     */
    private static final double LOSS_LIMIT = 0.7;

    /** Outlet miss returned for a trial flow that loses most of the pressure [J/kg]: far short of the target. */
    private static final double TOO_MUCH_FLOW_MISS = 1e5;

    /**
     * Outlet-enthalpy miss at which the outlet condition is met [J/kg] (about 0.005 K of vapour; the
     * pressure-drop iteration's tolerance alone moves the outlet by a few J/kg).
     */
    static final double OUTLET_ACCURACY = 5;

    /**
     * Rates a case.
     *
     * @param c the case
     * @return the rating
     */
    public Rating rate(CoilCase c) {
        CoilSetup s = CoilSetup.of(c);
        return new Run(s).rate();
    }

    /** One rating: the air side's state is held here while the refrigerant side is solved. */
    private static final class Run {
        private final CoilSetup s;
        private final CoilCase c;
        private final AirFlow air;
        private AirFlow.Side side;
        private CoilSurface surface;
        private final Warnings warnings = new Warnings();
        /** Refrigerant pressure drop of the last flow rated, the next one's start [Pa]. */
        private double lastDrop;
        /** Mass flow of the last outlet-condition solve, the next one's start [kg/s]. */
        private double lastMassFlow;

        Run(CoilSetup s) {
            this.s = s;
            this.c = s.c();
            this.air = AirFlow.of(c, s.derived());
            setAirMean(air.inlet().dryBulb());
        }

        private void setAirMean(double t) {
            side = air.at(t, Warnings.discard());
            surface = CoilSurface.of(c.coil(), c.fouling(), side.coefficient(),
                    org.finstack.airside.fin.SchmidtFinEfficiency.INSTANCE);
        }

        Rating rate() {
            Outcome o = null;
            double mean = air.inlet().dryBulb();
            for (int i = 0; i < 8; i++) {
                o = solveTarget();
                double next = 0.5 * (air.inlet().dryBulb() + o.airOut.dryBulb());
                if (Math.abs(next - mean) < 0.01) {
                    break;
                }
                mean = next;
                setAirMean(mean);
            }
            return assemble(o);
        }

        private Outcome solveTarget() {
            RefrigerantSide r = c.refrigerant();
            RefrigerantSide.Target t = r.target();
            if (t instanceof RefrigerantSide.Target.MassFlow m) {
                return evaluate(m.kgPerSecond(), s.referencePressure());
            }
            if (t instanceof RefrigerantSide.Target.Superheat sh) {
                return atOutletCondition(sh.kelvin(), s.referencePressure());
            }
            if (t instanceof RefrigerantSide.Target.Subcooling sc) {
                return atOutletCondition(sc.kelvin(), s.referencePressure());
            }
            if (t instanceof RefrigerantSide.Target.Capacity q) {
                return forCapacity(q);
            }
            throw new InputException("refrigerant.model", Msg.IMPOSSIBLE,
                    "the zone model needs superheat, subcooling, massFlow or requiredCapacity");
        }

        /** Solve the mass flow that gives the outlet superheat (evaporator) or subcooling (condenser). */
        private Outcome atOutletCondition(double kelvin, double reference) {
            boolean evaporator = c.refrigerant().duty() == Duty.EVAPORATOR;
            Outcome quick = byDutyUpdate(kelvin, reference, evaporator);
            if (quick != null) {
                lastMassFlow = quick.massFlow;
                return quick;
            }
            DoubleUnaryOperator miss = m -> {
                Outcome o;
                try {
                    o = evaluate(m, reference);
                } catch (InputException e) {
                    if (!e.field().equals(CoilSetup.TOO_MUCH_FLOW)) {
                        throw e;
                    }
                    return -TOO_MUCH_FLOW_MISS;
                }
                double target = outletTargetEnthalpy(o.outletPressure, kelvin, evaporator);
                return evaporator ? o.outletEnthalpy - target : target - o.outletEnthalpy;
            };
            double guess = Math.max(1e-5, estimatedMassFlow(reference));
            double lo = guess;
            double hi = guess;
            double fLo = miss.applyAsDouble(lo);
            double fHi = fLo;
            int k = 0;
            if (fLo > 0) {
                hi = lo * 2;
                fHi = miss.applyAsDouble(hi);
                while (fHi > 0) {
                    lo = hi;
                    fLo = fHi;
                    hi *= 2;
                    fHi = miss.applyAsDouble(hi);
                    if (++k > 40) {
                        throw new ConvergenceException("refrigerant mass flow (bracket)", k, hi);
                    }
                }
            } else {
                lo = hi / 2;
                fLo = miss.applyAsDouble(lo);
                while (fLo < 0) {
                    hi = lo;
                    fHi = fLo;
                    lo /= 2;
                    fLo = miss.applyAsDouble(lo);
                    if (++k > 40) {
                        throw new InputException(evaporator ? "refrigerant.superheat" : "refrigerant.subcooling",
                                Msg.IMPOSSIBLE, String.format(Locale.ROOT, "%.1f K cannot be reached: even a tiny "
                                        + "refrigerant flow does not leave the coil that %s", kelvin,
                                        evaporator ? "superheated" : "subcooled"));
                    }
                }
            }
            // the ends' misses as found: a second rating of an end can differ by the pressure-drop tolerance
            double m = Roots.illinois(miss, lo, fLo, hi, fHi, 1e-10, OUTLET_ACCURACY, "refrigerant mass flow");
            lastMassFlow = m;
            return evaluate(m, reference);
        }

        /**
         * The outlet condition by the duty update m = Q(m) / (h_target - h_in), which converges
         * because the duty changes much less than the flow, with secant steps on the outlet miss
         * once two flows have been rated; starts from the last solve's flow.
         *
         * @return the outcome within {@value #OUTLET_ACCURACY} J/kg of the target outlet
         *         enthalpy, or {@code null} if the update does not settle (the bracketed search
         *         then takes over)
         */
        private Outcome byDutyUpdate(double kelvin, double reference, boolean evaporator) {
            double m = lastMassFlow > 0 ? lastMassFlow : Math.max(1e-5, estimatedMassFlow(reference));
            double lastM = Double.NaN;
            double lastF = Double.NaN;
            for (int k = 0; k < MAX_DUTY_UPDATES; k++) {
                Outcome o;
                try {
                    o = evaluate(m, reference);
                } catch (InputException | ConvergenceException e) {
                    return null;
                }
                double target = outletTargetEnthalpy(o.outletPressure, kelvin, evaporator);
                double f = evaporator ? o.outletEnthalpy - target : target - o.outletEnthalpy;
                if (Math.abs(f) <= OUTLET_ACCURACY) {
                    return o;
                }
                double next = o.duty / (target - o.inletEnthalpy);
                if (!Double.isNaN(lastF) && f != lastF) {
                    double secant = m - f * (m - lastM) / (f - lastF);
                    if (secant > 0.5 * m && secant < 2 * m) {
                        next = secant;
                    }
                }
                if (!(next > 0)) {
                    return null;
                }
                lastM = m;
                lastF = f;
                m = Math.max(0.5 * m, Math.min(2 * m, next));
            }
            return null;
        }

        private double outletTargetEnthalpy(double pOut, double kelvin, boolean evaporator) {
            SaturationState sat = s.fluid().saturationAtPressure(pOut);
            if (kelvin == 0) {
                return evaporator ? sat.vapour().enthalpy() : sat.liquid().enthalpy();
            }
            double t = evaporator ? sat.dewTemperature() + kelvin : sat.bubbleTemperature() - kelvin;
            return s.fluid().at(InputPair.TP, t, evaporator ? pOut * (1 - 1e-9) : pOut * (1 + 1e-9)).enthalpy();
        }

        /** Mean air temperature of a coil that is two-phase throughout at the reference pressure [K]. */
        private double estimatedMeanAirTemperature() {
            SaturationState sat = s.fluid().saturationAtPressure(s.referencePressure());
            double t = 0.5 * (sat.bubbleTemperature() + sat.dewTemperature());
            SegmentExchange.Result x = SegmentExchange.exchange(surface, 1, air.inlet(), air.massFlow(), t,
                    Double.POSITIVE_INFINITY, 2000, Warnings.discard());
            return 0.5 * (air.inlet().dryBulb() + x.airOut().dryBulb());
        }

        /** The flow that a fully two-phase coil would carry: duty of an isothermal coil over the latent heat. */
        private double estimatedMassFlow(double reference) {
            SaturationState sat = s.fluid().saturationAtPressure(reference);
            double t = 0.5 * (sat.bubbleTemperature() + sat.dewTemperature());
            SegmentExchange.Result x = SegmentExchange.exchange(surface, 1, air.inlet(), air.massFlow(), t,
                    Double.POSITIVE_INFINITY, 2000, Warnings.discard());
            return Math.abs(x.heat()) / sat.latentHeat();
        }

        /** Solve the saturation temperature at which the coil delivers a capacity, with the outlet condition held. */
        private Outcome forCapacity(RefrigerantSide.Target.Capacity q) {
            boolean evaporator = c.refrigerant().duty() == Duty.EVAPORATOR;
            double tAir = air.inlet().dryBulb();
            double tc = s.fluid().info().criticalTemperature();
            // a held superheat or subcooling needs at least that much temperature difference to the air
            double lo = evaporator ? Math.max(tAir - 40, s.fluid().info().minTemperature() + 3) : tAir + q.outletK() + 1;
            double hi = evaporator ? tAir - q.outletK() - 1 : Math.min(tAir + 40, tc - 3);
            DoubleUnaryOperator miss = t -> {
                double p = CoilSetup.referencePressure(s.fluid(), withSaturation(t));
                try {
                    return Math.abs(atOutletCondition(q.outletK(), p).duty) - q.watts();
                } catch (InputException e) {
                    if (!e.field().equals(CoilSetup.TOO_MUCH_FLOW)) {
                        throw e;
                    }
                    // the flow the outlet condition asks for here loses most of the pressure: this
                    // lies beyond the required capacity (further from the air), whatever the start
                    return q.watts();
                }
            };
            // the far end of the range may be unreachable (e.g. the liquid no longer flashes): step inwards
            double fLo = Double.NaN;
            double fHi = Double.NaN;
            for (int i = 0; i < 8 && Double.isNaN(fLo); i++) {
                try {
                    fLo = miss.applyAsDouble(lo);
                } catch (InputException | ConvergenceException e) {
                    lo += evaporator ? 4 : 2;
                }
            }
            for (int i = 0; i < 8 && Double.isNaN(fHi); i++) {
                try {
                    fHi = miss.applyAsDouble(hi);
                } catch (InputException | ConvergenceException e) {
                    hi -= evaporator ? 2 : 4;
                }
            }
            if (Double.isNaN(fLo) || Double.isNaN(fHi) || fLo * fHi > 0) {
                throw new InputException("refrigerant.requiredCapacity", Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                        "%.0f W is outside what this coil delivers between saturation temperatures %.1f C and %.1f C",
                        q.watts(), lo - 273.15, hi - 273.15));
            }
            double t = Roots.solve(miss, lo, hi, "saturation temperature for the required capacity", 1e-7);
            return atOutletCondition(q.outletK(), CoilSetup.referencePressure(s.fluid(), withSaturation(t)));
        }

        private RefrigerantSide withSaturation(double t) {
            RefrigerantSide r = c.refrigerant();
            return new RefrigerantSide(r.fluid(), r.duty(), t, r.convention(), r.insideCoefficient(),
                    r.liquidTemperature(), r.inletTemperature(), r.target(), r.model(), r.segments());
        }

        /**
         * Rates at a given refrigerant mass flow; iterates the pressure drop dp until the drop the
         * zones produce, F(dp), equals it. Starts from the last flow's drop; secant steps through
         * the last two iterates (plain substitution for the first) until both signs of F(dp) - dp
         * have been seen (it is positive at dp = 0), then Illinois
         * regula falsi inside that bracket (bisection where a step would leave it), which also
         * settles where a zone appears or vanishes and F jumps: the bracket then closes on the
         * jump.
         */
        private Outcome evaluate(double massFlow, double reference) {
            boolean evaporating = c.refrigerant().duty() == Duty.EVAPORATOR;
            double below = 0;
            double gBelow = Double.NaN;
            double above = Double.POSITIVE_INFINITY;
            double gAbove = Double.NaN;
            int kept = 0;
            double lastDp = Double.NaN;
            double lastG = Double.NaN;
            double dp = lastDrop;
            Outcome o = null;
            for (int i = 0; i < MAX_OUTER; i++) {
                o = evaporating ? evaporator(massFlow, reference + dp, reference)
                        : condenser(massFlow, reference, Math.max(reference - dp, 0.3 * reference));
                double next = o.pressureDrop;
                if (next > (evaporating ? LOSS_LIMIT / (1 - LOSS_LIMIT) : LOSS_LIMIT) * reference) {
                    throw CoilSetup.tooMuchFlow(massFlow, s.circuits(), (int) Math.round(100 * LOSS_LIMIT));
                }
                double g = next - dp;
                double tolerance = 1 + 1e-4 * next;
                if (Math.abs(g) <= tolerance || above - below <= tolerance) {
                    lastDrop = dp;
                    return o;
                }
                if (g > 0) {
                    kept = kept < 0 ? 0 : kept + 1;
                    below = dp;
                    gBelow = g;
                    if (kept > 1) {
                        gAbove /= 2;
                    }
                } else {
                    kept = kept > 0 ? 0 : kept - 1;
                    above = dp;
                    gAbove = g;
                    if (kept < -1) {
                        gBelow /= 2;
                    }
                }
                double step;
                if (Double.isNaN(gBelow) || Double.isNaN(gAbove)) {
                    // one side only: secant through the last two iterates (substitution creeps where
                    // F's slope is near 1), at most a hundred substitution steps far
                    step = next;
                    if (!Double.isNaN(lastG) && g != lastG) {
                        double secant = dp - g * (dp - lastDp) / (g - lastG);
                        if (Math.abs(secant - dp) <= 100 * Math.abs(g) && (secant - dp) * g > 0) {
                            step = secant;
                        } else if ((dp - lastDp) * g > 0) {
                            // |F(dp) - dp| grows on: the root lies further on, so the steps widen
                            step = dp + Math.copySign(Math.max(Math.abs(g), 2 * Math.abs(dp - lastDp)), g);
                        }
                    }
                } else {
                    step = (below * gAbove - above * gBelow) / (gAbove - gBelow);
                }
                if (!(step > below && step < above)) {
                    step = Double.isInfinite(above) ? Math.max(next, 2 * below) : 0.5 * (below + above);
                }
                lastDp = dp;
                lastG = g;
                dp = step;
            }
            throw new ConvergenceException("refrigerant pressure drop", MAX_OUTER, Math.abs(o.pressureDrop - dp));
        }

        private Outcome evaporator(double m, double pIn, double pOut) {
            RefrigerantSide r = c.refrigerant();
            double hIn = s.fluid().saturationAtTemperature(r.liquidTemperature()).liquid().enthalpy();
            RefrigerantFlow.Local in = s.flow().at(pIn, hIn);
            if (!in.twoPhase()) {
                throw new InputException("refrigerant.liquidTemperature", Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                        "liquid at %.1f C does not flash into the evaporator's two-phase region at its inlet "
                                + "(saturation %.1f C there, after the refrigerant pressure drop)",
                        r.liquidTemperature() - 273.15, s.fluid().saturationAtPressure(pIn).bubbleTemperature() - 273.15));
            }
            SaturationState satOut = s.fluid().saturationAtPressure(pOut);
            double hDew = satOut.vapour().enthalpy();
            List<Zone> zones = new ArrayList<>();
            Zone tp = twoPhaseZone("two-phase", m, in, pOut, hDew, 1.0);
            zones.add(tp);
            double hOut = tp.hOut;
            if (tp.fraction < 1) {
                Zone sh = singlePhaseZone("superheat", m, satOut.vapour(), 1 - tp.fraction);
                zones.add(sh);
                hOut = sh.hOut;
            }
            return outcome(m, pIn, pOut, hIn, hOut, zones);
        }

        private Outcome condenser(double m, double pIn, double pOut) {
            RefrigerantSide r = c.refrigerant();
            SaturationState satIn = s.fluid().saturationAtPressure(pIn);
            if (r.inletTemperature() <= satIn.dewTemperature()) {
                throw new InputException("refrigerant.inletTemperature", Msg.NOT_ABOVE, r.inletTemperature() - 273.15,
                        satIn.dewTemperature() - 273.15);
            }
            FluidState gas = s.fluid().at(InputPair.TP, r.inletTemperature(), pIn);
            double hIn = gas.enthalpy();
            List<Zone> zones = new ArrayList<>();
            double left = 1.0;
            Zone ds = singlePhaseZoneTo("desuperheat", m, gas, satIn.vapour().enthalpy(), left);
            zones.add(ds);
            left -= ds.fraction;
            double hOut = ds.hOut;
            if (left > 0) {
                SaturationState satOut = s.fluid().saturationAtPressure(pOut);
                Zone cond = twoPhaseZone("condensing", m, s.flow().at(pIn, satIn.vapour().enthalpy()), pOut,
                        satOut.liquid().enthalpy(), left);
                zones.add(cond);
                left -= cond.fraction;
                hOut = cond.hOut;
                if (left > 1e-12) {
                    Zone sc = singlePhaseZone("subcool", m, satOut.liquid(), left);
                    zones.add(sc);
                    hOut = sc.hOut;
                }
            }
            return outcome(m, pIn, pOut, hIn, hOut, zones);
        }

        /** A two-phase zone from a local state to an end enthalpy, using at most {@code available} of the coil. */
        private Zone twoPhaseZone(String name, double m, RefrigerantFlow.Local in, double pOut, double hEnd,
                double available) {
            RefrigerantFlow.Local end = s.flow().at(pOut, hEnd);
            double tIn = in.temperature();
            double tEnd = end.temperature();
            double dh = hEnd - in.state().enthalpy();
            double dt = tEnd - tIn;
            boolean glide = Math.abs(dt) > 0.05 && dh / dt > 0;
            double capacity = glide ? m * dh / dt : Double.POSITIVE_INFINITY;
            double tRef = glide ? tIn : 0.5 * (tIn + tEnd);
            double g = m / s.circuits() / s.tubeFlowArea();
            double hi = meanTwoPhaseCoefficient(in, end, g, Math.abs(dh) * m / (available * s.derived().insideArea()));
            double need = Math.abs(dh) * m;
            SegmentExchange.Result full = SegmentExchange.exchange(surface, available, air.inlet(),
                    available * air.massFlow(), tRef, capacity, hi, Warnings.discard());
            if (Math.abs(full.heat()) <= need) {
                double hOut = in.state().enthalpy() + full.heat() / m;
                return new Zone(name, available, full, hi, in.state().enthalpy(), hOut, in, s.flow().at(pOut, hOut));
            }
            double f = Roots.solve(x -> Math.abs(SegmentExchange.exchange(surface, x, air.inlet(), x * air.massFlow(), tRef,
                    capacity, hi, Warnings.discard()).heat()) - need, 1e-9 * available, available, name + " zone share", 1e-13);
            SegmentExchange.Result x = SegmentExchange.exchange(surface, f, air.inlet(), f * air.massFlow(), tRef,
                    capacity, hi, Warnings.discard());
            return new Zone(name, f, x, hi, in.state().enthalpy(), in.state().enthalpy() + x.heat() / m, in, end);
        }

        /** Mean film coefficient over quality between two two-phase states (trapezoid over quality points). */
        private double meanTwoPhaseCoefficient(RefrigerantFlow.Local a, RefrigerantFlow.Local b, double g, double flux) {
            if (s.flow().override() > 0) {
                return s.flow().override();
            }
            double xa = Math.max(0, Math.min(1, a.quality()));
            double xb = Math.max(0, Math.min(1, b.quality()));
            double p = 0.5 * (a.state().pressure() + b.state().pressure());
            SaturatedProperties sp = s.flow().saturated(p);
            double sum = 0;
            for (int i = 0; i < QUALITY_POINTS; i++) {
                double x = xa + (xb - xa) * (i + 0.5) / QUALITY_POINTS;
                sum += s.flow().twoPhaseCoefficient(sp, x, g, flux, Warnings.discard());
            }
            return sum / QUALITY_POINTS;
        }

        /** A single-phase zone that takes the whole given share. */
        private Zone singlePhaseZone(String name, double m, FluidState start, double fraction) {
            RefrigerantFlow.Local in = s.flow().at(start.pressure(), start.enthalpy());
            double g = m / s.circuits() / s.tubeFlowArea();
            double hi = s.flow().insideCoefficient(in, g, 0, Warnings.discard());
            SegmentExchange.Result x = SegmentExchange.exchange(surface, fraction, air.inlet(), fraction * air.massFlow(),
                    start.temperature(), m * start.cp(), hi, Warnings.discard());
            double hOut = start.enthalpy() + x.heat() / m;
            return new Zone(name, fraction, x, hi, start.enthalpy(), hOut, in, s.flow().at(start.pressure(), hOut));
        }

        /** A single-phase zone that ends at a given enthalpy, if the share available suffices. */
        private Zone singlePhaseZoneTo(String name, double m, FluidState start, double hEnd, double available) {
            RefrigerantFlow.Local in = s.flow().at(start.pressure(), start.enthalpy());
            double g = m / s.circuits() / s.tubeFlowArea();
            double hi = s.flow().insideCoefficient(in, g, 0, Warnings.discard());
            double cp = m * 0.5 * (start.cp() + s.fluid().at(InputPair.PH, start.pressure(), hEnd * (1 + 1e-9)).cp());
            double need = Math.abs(hEnd - start.enthalpy()) * m;
            SegmentExchange.Result full = SegmentExchange.exchange(surface, available, air.inlet(),
                    available * air.massFlow(), start.temperature(), cp, hi, Warnings.discard());
            if (Math.abs(full.heat()) <= need) {
                double hOut = start.enthalpy() + full.heat() / m;
                return new Zone(name, available, full, hi, start.enthalpy(), hOut, in, s.flow().at(start.pressure(), hOut));
            }
            double f = Roots.solve(x -> Math.abs(SegmentExchange.exchange(surface, x, air.inlet(), x * air.massFlow(),
                    start.temperature(), cp, hi, Warnings.discard()).heat()) - need, 1e-9, available, name + " zone share", 1e-13);
            SegmentExchange.Result x = SegmentExchange.exchange(surface, f, air.inlet(), f * air.massFlow(),
                    start.temperature(), cp, hi, Warnings.discard());
            double hOut = start.enthalpy() + x.heat() / m;
            return new Zone(name, f, x, hi, start.enthalpy(), hOut, in, s.flow().at(start.pressure(), hOut));
        }

        /** Pressure drop and mixed leaving air of a set of zones. */
        private Outcome outcome(double m, double pIn, double pOut, double hIn, double hOut, List<Zone> zones) {
            double g = m / s.circuits() / s.tubeFlowArea();
            double length = s.circuitLength();
            double bends = s.bendsPerCircuit();
            double dp = 0;
            Warnings w = Warnings.discard();
            for (Zone z : zones) {
                double p = 0.5 * (z.in.state().pressure() + z.out.state().pressure());
                ZonePoints points = new ZonePoints(z, p);
                double grad = 0;
                for (int i = 0; i < QUALITY_POINTS; i++) {
                    grad += points.frictionGradient(i, g, w) / QUALITY_POINTS;
                }
                double zoneLength = z.fraction * length;
                dp += grad * zoneLength * (1 + bends * BEND_EQUIVALENT_DIAMETERS * s.flow().diameter() / length);
                if (z.in.twoPhase() || z.out.twoPhase()) {
                    dp += s.flow().accelerationDrop(points.props(), g, z.in.quality(), z.out.quality(), w);
                }
            }
            double mAir = air.massFlow();
            double hAir = 0;
            double wAir = 0;
            double duty = 0;
            for (Zone z : zones) {
                hAir += z.fraction * z.x.airOut().enthalpy();
                wAir += z.fraction * z.x.airOut().humidityRatio();
                duty += z.x.heat();
            }
            double fSum = zones.stream().mapToDouble(z -> z.fraction).sum();
            hAir = (hAir + (1 - fSum) * air.inlet().enthalpy());
            wAir = (wAir + (1 - fSum) * air.inlet().humidityRatio());
            double tAir = Psychrometrics.dryBulbFromEnthalpy(hAir, wAir);
            MoistAirState out = new MoistAirState(tAir, Math.min(wAir,
                    Psychrometrics.saturationHumidityRatio(tAir, air.inlet().pressure())), air.inlet().pressure());
            return new Outcome(m, pIn, pOut, hIn, hOut, zones, Math.max(0, dp), duty, out,
                    mAir * (air.inlet().humidityRatio() - out.humidityRatio()));
        }

        /** Refrigerant in the coil: each zone's share of the internal volume at its mean density over its points. */
        private double charge(Outcome o) {
            double g = o.massFlow / s.circuits() / s.tubeFlowArea();
            double charge = 0;
            Warnings w = Warnings.discard();
            for (Zone z : o.zones) {
                ZonePoints points = new ZonePoints(z, 0.5 * (z.in.state().pressure() + z.out.state().pressure()));
                double rho = 0;
                for (int i = 0; i < QUALITY_POINTS; i++) {
                    rho += points.chargeDensity(i, g, w) / QUALITY_POINTS;
                }
                charge += rho * z.fraction * s.derived().internalVolume();
            }
            return charge;
        }

        /**
         * The points a zone is averaged over, at the zone's mean pressure and enthalpies spaced
         * evenly from its inlet to its outlet: inside the dome from one set of saturated
         * properties, outside it from the fluid's state at (p, h).
         */
        private final class ZonePoints {
            private final Zone z;
            private final double pressure;
            private final SaturationState sat;
            private SaturatedProperties props;

            ZonePoints(Zone z, double pressure) {
                this.z = z;
                this.pressure = pressure;
                this.sat = s.fluid().saturationAtPressure(pressure);
            }

            SaturatedProperties props() {
                if (props == null) {
                    props = s.flow().saturated(pressure);
                }
                return props;
            }

            private double enthalpy(int i) {
                return z.hIn + (z.hOut - z.hIn) * (i + 0.5) / QUALITY_POINTS;
            }

            /** @return the quality of point i inside the dome, or NaN outside it */
            private double quality(int i) {
                double x = (enthalpy(i) - sat.liquid().enthalpy()) / sat.latentHeat();
                return x > 0 && x < 1 ? x : Double.NaN;
            }

            double frictionGradient(int i, double g, Warnings w) {
                double x = quality(i);
                return Double.isNaN(x) ? s.flow().frictionGradient(s.flow().at(pressure, enthalpy(i)), g, w)
                        : s.flow().twoPhaseFrictionGradient(props(), x, g, w);
            }

            double chargeDensity(int i, double g, Warnings w) {
                double x = quality(i);
                return Double.isNaN(x) ? s.flow().chargeDensity(s.flow().at(pressure, enthalpy(i)), g, w)
                        : s.flow().twoPhaseChargeDensity(props(), x, g, w);
            }
        }

        private Rating assemble(Outcome o) {
            Warnings w = warnings;
            AirFlow.Side finalSide = air.at(0.5 * (air.inlet().dryBulb() + o.airOut.dryBulb()), w);
            double pOut = o.outletPressure;
            RefrigerantFlow.Local out = s.flow().at(pOut, o.outletEnthalpy);
            RefrigerantFlow.Local in = s.flow().at(o.inletPressure, o.inletEnthalpy);
            SaturationState satOut = s.fluid().saturationAtPressure(pOut);
            SaturationState satIn = s.fluid().saturationAtPressure(o.inletPressure);
            boolean evaporator = c.refrigerant().duty() == Duty.EVAPORATOR;
            double superheat = evaporator && !out.twoPhase() && out.quality() > 1
                    ? out.temperature() - satOut.dewTemperature() : 0;
            double subcool = !evaporator && !out.twoPhase() && out.quality() < 0
                    ? satOut.bubbleTemperature() - out.temperature() : 0;
            double refrigerantDuty = o.massFlow * (o.outletEnthalpy - o.inletEnthalpy);
            double airDuty = air.massFlow() * (air.inlet().enthalpy() - o.airOut.enthalpy());
            double balance = (airDuty - refrigerantDuty) / Math.max(Math.abs(refrigerantDuty), 1e-12);
            double g = o.massFlow / s.circuits() / s.tubeFlowArea();
            // representative film-coefficient and friction checks at the mean state, for the validity warnings
            RefrigerantFlow.Local mid = s.flow().at(0.5 * (o.inletPressure + pOut), 0.5 * (o.inletEnthalpy + o.outletEnthalpy));
            s.flow().insideCoefficient(mid, g, Math.abs(o.duty) / s.derived().insideArea(), w);
            s.flow().frictionGradient(mid, g, w);
            double dtSat = satIn.dewTemperature() - satOut.dewTemperature();
            List<Rating.CircuitResult> circuits = new ArrayList<>();
            for (int i = 0; i < s.circuits(); i++) {
                circuits.add(new Rating.CircuitResult(i, o.massFlow / s.circuits(), o.duty / s.circuits(),
                        out.temperature(), superheat, subcool, out.twoPhase() ? out.quality() : -1, o.pressureDrop));
            }
            Rating.RefrigerantResult ref = new Rating.RefrigerantResult(s.fluid().name(), o.massFlow, o.inletPressure,
                    pOut, in.temperature(), out.temperature(), o.inletEnthalpy, o.outletEnthalpy,
                    out.twoPhase() ? out.quality() : -1, superheat, subcool, dtSat, charge(o), balance,
                    circuits, satIn.dewTemperature(), satOut.dewTemperature());
            List<Rating.ZoneResult> zones = o.zones.stream().map(z -> new Rating.ZoneResult(z.name, z.fraction,
                    Math.abs(z.x.heat()), z.insideCoefficient, z.x.wet())).toList();
            boolean frost = o.zones.stream().anyMatch(z -> z.x.frost());
            double capacity = Math.abs(airDuty);
            double cpA = 1006 + 1860 * air.inlet().humidityRatio(); // ASHRAE moist-air enthalpy relation
            double sensible = Math.abs(air.massFlow() * cpA * (air.inlet().dryBulb() - o.airOut.dryBulb()));
            double latent = o.condensate > 0 ? Math.max(0, capacity - sensible) : 0;
            sensible = o.condensate > 0 ? sensible : capacity;
            if (frost) {
                w.add(String.format(Locale.ROOT, "the fin surface runs below 0 C in humid air: frost forms at about "
                        + "%.3f kg/h and will narrow the air passages until the coil is defrosted", o.condensate * 3600));
            }
            if (out.twoPhase() && evaporator) {
                w.add(String.format(Locale.ROOT, "the refrigerant leaves the evaporator still two-phase (quality %.2f): "
                        + "liquid returns towards the compressor", out.quality()));
            }
            Rating.Moisture moisture = new Rating.Moisture(Math.min(sensible, capacity), latent, o.condensate, frost,
                    o.airOut.humidityRatio(), Math.min(1, o.airOut.relativeHumidity()));
            Resistances res = surface.dryResistances(meanInside(o), Warnings.discard());
            double ntu = 1 / (res.total() * air.massFlow() * cpA);
            List<Citation> methods = new ArrayList<>(air.methods());
            methods.add(surface.fin().source());
            methods.addAll(s.flow().methods());
            methods.add(SegmentExchange.WET_SOURCE);
            methods.add(s.fluid().info().equationOfState());
            return new Rating(ID, c.refrigerant().duty(), capacity, air.inlet().dryBulb(), o.airOut.dryBulb(),
                    air.massFlow(), air.volumeFlow(), air.volumeFlow() / s.derived().faceArea(),
                    air.pressureDrop(finalSide, o.airOut.dryBulb()), s.derived(), finalSide.maxVelocity(),
                    finalSide.reynoldsDc(), finalSide.jf().j(), finalSide.jf().f(), finalSide.coefficient(),
                    surface.finEfficiency(side.coefficient(), Warnings.discard()),
                    surface.surfaceEffectiveness(side.coefficient(), Warnings.discard()), res, ntu,
                    capacity / (air.massFlow() * cpA * Math.abs(air.inlet().dryBulb() - o.outletTemperatureForEps())),
                    finalSide.properties(), w.list(), methods, moisture, ref, zones, List.of());
        }

        /** Area-weighted refrigerant film coefficient, for the resistance breakdown. */
        private double meanInside(Outcome o) {
            double sum = 0;
            double f = 0;
            for (Zone z : o.zones) {
                sum += z.fraction / z.insideCoefficient;
                f += z.fraction;
            }
            return f / sum;
        }
    }

    /** Equivalent length of one 180-degree return bend in diameters (common practice for close-radius bends). */
    static final double BEND_EQUIVALENT_DIAMETERS = 30;


    private record Zone(String name, double fraction, SegmentExchange.Result x, double insideCoefficient, double hIn,
            double hOut, RefrigerantFlow.Local in, RefrigerantFlow.Local out) {
    }

    private record Outcome(double massFlow, double inletPressure, double outletPressure, double inletEnthalpy,
            double outletEnthalpy, List<Zone> zones, double pressureDrop, double duty,
            MoistAirState airOut, double condensate) {

        double outletTemperatureForEps() {
            return zones.get(0).in.temperature();
        }
    }
}
