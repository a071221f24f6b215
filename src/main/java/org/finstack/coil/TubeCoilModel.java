package org.finstack.coil;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleUnaryOperator;
import java.util.stream.IntStream;
import org.finstack.airside.fin.SchmidtFinEfficiency;
import org.finstack.core.Citation;
import org.finstack.core.ConvergenceException;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Warnings;
import org.finstack.fluid.InputPair;
import org.finstack.fluid.SaturationState;
import org.finstack.fluid.psychro.MoistAirState;
import org.finstack.fluid.psychro.Psychrometrics;

/**
 * The tube-by-tube model: every tube is cut into {@code segments} pieces along its length and the
 * refrigerant is marched through them, circuit by circuit, in the order the circuiting gives,
 * while the air crosses the rows.
 *
 * <p><b>Segments.</b> A segment is the share 1/(tubes x segments) of the coil's surfaces
 * ({@link SegmentExchange}: crossflow, refrigerant mixed, dry or wet). Its dry-air mass flow is
 * its share of the face, m_air / (tubesPerRow x segments), times the relative face velocity
 * v_j of its tube place j (the case's air profile, mean 1); the air-side coefficient of place j
 * is evaluated at that place's velocity, so a slow place also has a lower h_o. The air leaving
 * segment k of tube (row r, place j) enters segment k of tube (row r + 1, place j); for staggered
 * rows the half-pitch offset is ignored and the same place index is used.
 *
 * <p><b>Refrigerant.</b> Along a circuit the refrigerant runs through the tubes in their listed
 * order; inside a tube it runs along the segments, and each return bend reverses the direction,
 * so the segment order alternates from tube to tube (segment k of the first tube meets air
 * column k first, the second tube starts at column segments - 1). Pressure and enthalpy are
 * marched: per segment dp = (dp/dz)_friction x segment length, plus the acceleration change
 * between the segment's inlet and outlet quality while two-phase, plus one return-bend loss per
 * bend taken as {@link ZoneCoilModel#BEND_EQUIVALENT_DIAMETERS} diameters of straight tube at the
 * local state. The local saturation state follows the local pressure, so a pure fluid's
 * saturation temperature falls with the pressure drop and a blend's temperature glides. A
 * segment's refrigerant temperature is taken at its inlet; its capacity rate is m cp in a
 * single phase, infinite while a pure fluid is two-phase, and for a blend's two-phase segment
 * m (h'' - h') / (T_dew - T_bubble), the mean slope dh/dT across the dome at the local pressure.
 * Where a segment would carry the refrigerant across a phase boundary (the dew or the bubble
 * point) it is split at the point where it arrives there (a bounded Brent solve for the share of
 * the segment) and the rest is rated in the new phase with the same entering air; the parts'
 * leaving air is mixed. A two-phase film coefficient (flow boiling with the dryout treatment, or
 * condensation) is taken at the segment's mid quality and its own heat flux, found by a short
 * bounded iteration that starts from the same flux for every segment (so that a segment's result
 * depends only on what enters it).
 *
 * <p><b>Iteration.</b> One pass marches every circuit once with the air states of the previous
 * pass (Gauss-Seidel: a segment's leaving air is used at once by the row behind it). The circuits
 * start with the same flow per tube; each pass their shares of the total flow are scaled by
 * (mean dp / circuit dp)^(1/2) and normalised, until all see the same pressure drop within
 * 0.2 % (circuits joined at common headers). Evaporator circuits end at the common outlet header
 * at the reference pressure, so each one's inlet pressure is the reference pressure plus its own
 * drop (updated as the mean of the last two estimates: the drop falls as the inlet pressure
 * rises, and the plain update swings); condenser circuits start from the common inlet header at
 * the reference pressure. The passes end when the circuits' drops have settled (1 Pa or 1e-4 of
 * the drop), every circuit's outlet enthalpy has settled ({@value #OUTLET_TOLERANCE} J/kg), the
 * air-side and refrigerant-side duties agree within {@value #BALANCE_TOLERANCE}, and no
 * segment's leaving-air enthalpy moves by more than cp x {@value #AIR_TOLERANCE_K} K; at most
 * {@value #MAX_PASSES} passes, otherwise {@link ConvergenceException} with the last residual
 * (the largest of these changes over its tolerance).
 *
 * <p><b>Targets</b> as the zone model: a mass flow is rated as it is; a superheat or subcooling
 * is that of the circuits' outlets mixed by enthalpy at the header pressure, met to
 * {@value #ENTHALPY_ACCURACY} J/kg of outlet enthalpy. The flow is first updated inside the
 * passes themselves (a relaxed duty update after every pass, see {@code coupled}); where that
 * does not settle within {@value #COUPLED_PASSES} passes a bracketed root search on the total
 * mass flow takes over (Illinois regula falsi), each trial flow rated by its own passes, with
 * looser tolerances while the search is far from the root; the flow returned is always rated
 * with the tolerances above. A required
 * capacity is met by the same search on the saturation temperature, walking from the given
 * saturation temperature in {@value #CAPACITY_STEP_K} K steps to the nearest sign change (at very
 * low pressure the pressure drop makes the capacity fall again), with the outlet condition held.
 * Air properties are taken at the mean of entering and leaving air temperature, iterated around
 * the whole solve.
 *
 * <p><b>Saturation properties</b> are not recomputed per segment and pass: each rating keeps a
 * cache of the fluid's saturation states on a fine pressure grid (relative step
 * {@value #SATURATION_GRID_STEP}, nodes computed once when first reached) and interpolates
 * between nodes, so a pass costs a saturation computation only where the pressures have moved
 * onto new nodes. Single-phase states (p, h) are computed by the fluid for every segment.
 */
public final class TubeCoilModel {

    /** Model name reported in ratings. */
    public static final String ID = "tubes";

    /** Largest number of passes over the circuits for one refrigerant flow. */
    static final int MAX_PASSES = 150;

    /**
     * Change of any segment's leaving-air enthalpy over cp below which the air has settled [K]. A
     * surface at the wet/dry switch of {@link SegmentExchange} can keep the passes cycling by a
     * few hundredths of a kelvin; the tighter tests are those on the refrigerant outlets and the
     * energy balance.
     */
    static final double AIR_TOLERANCE_K = 0.05;

    /** Change of every circuit's outlet enthalpy from one pass to the next below which it has settled [J/kg]. */
    static final double OUTLET_TOLERANCE = 1;

    /** Largest |air-side duty - refrigerant-side duty| / duty at convergence [-]. */
    static final double BALANCE_TOLERANCE = 1e-4;

    /**
     * Relative step of the per-rating saturation grid: nodes at p_ref (1 + step)^i, computed by the
     * fluid once each when first needed; between nodes the bubble and dew temperatures and
     * enthalpies are interpolated linearly in ln p (error of order (dT/d ln p) step^2 / 8, below
     * 1e-5 K).
     */
    static final double SATURATION_GRID_STEP = 1e-3;


    /** Mixed-outlet enthalpy miss small enough for the outlet condition [J/kg] (about 0.02 K of vapour). */
    static final double ENTHALPY_ACCURACY = 20;

    /** Outlet miss [J/kg] per unit of looseness, and the largest looseness, of the flows tried while solving. */
    private static final double LOOSE_MISS = 100;
    private static final double MAX_LOOSENESS = 20;

    /** Field of the refusal of a flow that loses most of the pressure; inside a solve, a flow far too large. */
    private static final double TOO_MUCH_FLOW_MISS = 1e5;

    /** Step of the saturation-temperature search for a required capacity [K]. */
    static final double CAPACITY_STEP_K = 3;
    private static final int MAX_AIR_MEAN_LOOPS = 6;

    /** Most passes of the coupled solve of the flow with the passes, before the bracketed search takes over. */
    static final int COUPLED_PASSES = 40;

    /**
     * Share of the duty update's step taken per pass: the air and the circuits' pressures answer a
     * change of flow over several passes, and the full step swings.
     */
    private static final double RELAX = 0.3;
    private static final double AIR_MEAN_TOLERANCE_K = 0.1;
    private static final double SPLIT_TOLERANCE = 0.002;
    private static final double CP_AIR = 1006; // ASHRAE Handbook - Fundamentals 2017 Ch. 1, dry-air term of moist-air enthalpy

    /**
     * Rates a case.
     *
     * @param c the case
     * @return the rating, with model id {@value #ID} and the per-tube table
     */
    public Rating rate(CoilCase c) {
        CoilSetup s = CoilSetup.of(c);
        checkDirection(c);
        return new TubeCoilRun(s).rate();
    }

    /** An evaporator's saturation temperature must be below the air, a condenser's above it. */
    private static void checkDirection(CoilCase c) {
        RefrigerantSide r = c.refrigerant();
        if (r.target() instanceof RefrigerantSide.Target.Capacity) {
            return;
        }
        double tSat = r.saturationTemperature();
        double tIn = c.air().temperature();
        boolean ok = r.duty() == Duty.CONDENSER ? tSat > tIn : tSat < tIn;
        if (!ok) {
            throw new InputException("refrigerant.saturationTemperature", Msg.DUTY_DIRECTION, r.duty().id(),
                    r.duty() == Duty.CONDENSER ? "above" : "below", tSat - 273.15, tIn - 273.15);
        }
    }

    /** One rating's working state; lives only for the duration of {@link #rate(CoilCase)}. */
    private static final class TubeCoilRun {
        private final CoilSetup s;
        private final CoilCase c;
        private final AirFlow air;
        private final boolean evaporator;
        private final int rows;
        private final int places;
        private final int segments;
        private final int tubes;
        private final double[] profile;
        private final double fraction;
        private final double segmentLength;
        private final double segmentInsideArea;
        private final double segmentVolume;
        private final List<List<Circuiting.Tube>> circuits;
        private final TubeCoilModelMarch march;

        /** Air-side surfaces of each tube place at the current mean air temperature. */
        private CoilSurface[] surfaces;
        private CoilSurface meanSurface;
        private AirFlow.Side side;
        /** Mean air temperature the air-side properties are taken at [K]. */
        private double airMean;

        /** air[r][j][k]: air entering row r at place j, segment column k; air[rows] leaves the coil. */
        private MoistAirState[][][] airState;
        /** The buffer a pass writes the leaving air of every tube into (row 0 always the entering air). */
        private MoistAirState[][][] airNext;
        /** Index of each circuit's first tube in the march's segment slots (tubes numbered circuit by circuit). */
        private final int[] firstTube;

        /** Per circuit: share of the total flow, and pressure drop of the last pass [Pa]. */
        private final double[] share;
        private final double[] drop;
        private double reference;
        private boolean primed;
        /**
         * Factor on all convergence tolerances of the passes: above 1 while the outlet-condition
         * solve is still far from its root (those flows need no tight convergence), 1 for the
         * flow returned.
         */
        private double looseness = 1;
        /** Mass flow of the last outlet-condition solve, the next one's start, and the estimate it went with [kg/s]. */
        private double lastMassFlow;
        private double lastEstimate;

        TubeCoilRun(CoilSetup s) {
            this.s = s;
            this.c = s.c();
            this.air = AirFlow.of(c, s.derived());
            this.evaporator = c.refrigerant().duty() == Duty.EVAPORATOR;
            this.rows = c.coil().rows();
            this.places = c.coil().tubesPerRow();
            this.segments = c.refrigerant().segments();
            this.tubes = rows * places;
            this.profile = new double[places];
            for (int j = 0; j < places; j++) {
                profile[j] = c.airProfile().isEmpty() ? 1.0 : c.airProfile().get(j);
            }
            this.fraction = 1.0 / ((double) tubes * segments);
            this.segmentLength = c.coil().finnedLength() / segments;
            this.segmentInsideArea = s.derived().insideArea() * fraction;
            this.segmentVolume = s.derived().internalVolume() * fraction;
            this.circuits = s.circuiting().circuits();
            this.march = new TubeCoilModelMarch(s.fluid(), s.flow(), evaporator, tubes * segments,
                    circuits.size(), s.referencePressure());
            this.firstTube = new int[circuits.size()];
            for (int i = 1; i < firstTube.length; i++) {
                firstTube[i] = firstTube[i - 1] + circuits.get(i - 1).size();
            }
            this.airState = enteringAirEverywhere();
            this.airNext = enteringAirEverywhere();
            this.share = new double[circuits.size()];
            this.drop = new double[circuits.size()];
            resetSplit();
            this.reference = s.referencePressure();
            setAirMean(air.inlet().dryBulb());
        }

        private MoistAirState[][][] enteringAirEverywhere() {
            MoistAirState[][][] a = new MoistAirState[rows + 1][places][segments];
            for (MoistAirState[][] layer : a) {
                for (MoistAirState[] place : layer) {
                    Arrays.fill(place, air.inlet());
                }
            }
            return a;
        }

        private void resetSplit() {
            double total = 0;
            for (int i = 0; i < share.length; i++) {
                total += circuits.get(i).size();
            }
            for (int i = 0; i < share.length; i++) {
                share[i] = circuits.get(i).size() / total; // equal flow per tube to start with
                drop[i] = 0;
            }
        }

        private void setAirMean(double t) {
            airMean = t;
            side = air.at(t, Warnings.discard());
            meanSurface = CoilSurface.of(c.coil(), c.fouling(), side.coefficient(), SchmidtFinEfficiency.INSTANCE);
            surfaces = new CoilSurface[places];
            for (int j = 0; j < places; j++) {
                if (Math.abs(profile[j] - 1) < 1e-12) {
                    surfaces[j] = meanSurface;
                    continue;
                }
                AirFlow placeAir = new AirFlow(air.inlet(), air.massFlow() * profile[j], air.volumeFlow() * profile[j],
                        air.derived(), air.correlation(), air.surface());
                surfaces[j] = CoilSurface.of(c.coil(), c.fouling(), placeAir.at(t, Warnings.discard()).coefficient(),
                        SchmidtFinEfficiency.INSTANCE);
            }
        }

        Rating rate() {
            Outcome o = null;
            double mean = estimatedMeanAirTemperature();
            setAirMean(mean);
            for (int i = 0; i < MAX_AIR_MEAN_LOOPS; i++) {
                o = solveTarget();
                double next = 0.5 * (air.inlet().dryBulb() + o.airOut.dryBulb());
                if (Math.abs(next - airMean) < AIR_MEAN_TOLERANCE_K) {
                    break;
                }
                mean = next;
                setAirMean(mean);
            }
            return assemble(o);
        }

        private Outcome solveTarget() {
            RefrigerantSide.Target t = c.refrigerant().target();
            if (t instanceof RefrigerantSide.Target.MassFlow m) {
                return evaluate(m.kgPerSecond());
            }
            if (t instanceof RefrigerantSide.Target.Superheat sh) {
                return atOutletCondition(sh.kelvin());
            }
            if (t instanceof RefrigerantSide.Target.Subcooling sc) {
                return atOutletCondition(sc.kelvin());
            }
            if (t instanceof RefrigerantSide.Target.Capacity q) {
                return forCapacity(q);
            }
            throw new InputException("refrigerant.model", Msg.IMPOSSIBLE,
                    "the tube-by-tube model needs superheat, subcooling, massFlow or requiredCapacity");
        }

        /** Total mass flow that gives the mixed outlet's superheat (evaporator) or subcooling (condenser). */
        private Outcome atOutletCondition(double kelvin) {
            java.util.Map<Double, Outcome> rated = new java.util.HashMap<>();
            double[] closest = {Double.POSITIVE_INFINITY};
            DoubleUnaryOperator miss = m -> {
                looseness = Math.max(1, Math.min(MAX_LOOSENESS, closest[0] / LOOSE_MISS));
                Outcome o;
                try {
                    o = rated.computeIfAbsent(m, this::evaluate);
                } catch (InputException e) {
                    if (!e.field().equals(CoilSetup.TOO_MUCH_FLOW)) {
                        throw e;
                    }
                    return -TOO_MUCH_FLOW_MISS; // far too much flow: the outlet is far short of the target
                } finally {
                    looseness = 1;
                }
                double target = outletTargetEnthalpy(o.outletPressure, kelvin);
                double f = evaporator ? o.outletEnthalpy - target : target - o.outletEnthalpy;
                closest[0] = Math.min(closest[0], Math.abs(f));
                return f;
            };
            double estimate = Math.max(1e-6, estimatedMassFlow());
            boolean warm = lastMassFlow > 0 && Math.abs(estimate / lastEstimate - 1) < 0.02;
            double guess = lastMassFlow > 0 ? lastMassFlow * estimate / lastEstimate : estimate;
            double step = warm ? 1.005 : 1.3;
            lastEstimate = estimate;
            Outcome coupled = coupled(kelvin, guess);
            if (coupled != null) {
                lastMassFlow = coupled.massFlow;
                return coupled;
            }
            double a = guess;
            double fa = miss.applyAsDouble(a);
            if (Math.abs(fa) <= ENTHALPY_ACCURACY) {
                lastMassFlow = a;
                return evaluate(a);
            }
            // the miss falls as the flow rises: step towards the sign change, widening the step
            double b = fa > 0 ? a * step : a / step;
            double fb = miss.applyAsDouble(b);
            for (int k = 0; fa * fb > 0; k++) {
                if (k > 60) {
                    if (fb > 0) {
                        throw new ConvergenceException("refrigerant mass flow (bracket)", k, b);
                    }
                    throw new InputException(evaporator ? "refrigerant.superheat" : "refrigerant.subcooling",
                            Msg.IMPOSSIBLE, String.format(Locale.ROOT, "%.1f K cannot be reached: even a tiny "
                                    + "refrigerant flow does not leave the coil that %s", kelvin,
                                    evaporator ? "superheated" : "subcooled"));
                }
                step = Math.min(2, step * step);
                a = b;
                fa = fb;
                b = fa > 0 ? a * step : a / step;
                fb = miss.applyAsDouble(b);
            }
            double m = Roots.illinois(miss, a, fa, b, fb, 1e-7, ENTHALPY_ACCURACY, "refrigerant mass flow");
            lastMassFlow = m;
            return evaluate(m);
        }

        /**
         * The outlet condition met in the passes themselves: after every pass the flow moves a
         * share {@value #RELAX} of the way to the refrigerant-side duty over the enthalpy rise the
         * target asks for, m = Q / (h_target - h_in) (a fixed point that converges because the
         * duty changes much less than the flow), and the air-side properties follow the mean air
         * temperature; the passes end when every pass tolerance and the outlet condition are met.
         *
         * @return the converged outcome, or {@code null} when this does not settle within
         *         {@value #COUPLED_PASSES} passes (the bracketed search then takes over)
         */
        private Outcome coupled(double kelvin, double guess) {
            double hIn = inletEnthalpy();
            primeOnce();
            double m = guess;
            double[] lastOutlet = null;
            for (int pass = 0; pass < COUPLED_PASSES; pass++) {
                Pass p;
                try {
                    p = pass(m, hIn);
                } catch (InputException e) {
                    if (e.field().equals(CoilSetup.TOO_MUCH_FLOW)) {
                        return null;
                    }
                    throw e;
                }
                double residual = residual(p, rebalance(p, pass), lastOutlet);
                lastOutlet = p.outletEnthalpy.clone();
                Outcome o = outcome(m, hIn, p);
                double target = outletTargetEnthalpy(o.outletPressure, kelvin);
                double f = evaporator ? o.outletEnthalpy - target : target - o.outletEnthalpy;
                if (residual <= 1 && Math.abs(f) <= ENTHALPY_ACCURACY) {
                    return o;
                }
                double mean = 0.5 * (air.inlet().dryBulb() + o.airOut.dryBulb());
                if (Math.abs(mean - airMean) > 0.5 * AIR_MEAN_TOLERANCE_K) {
                    setAirMean(mean);
                }
                double next = m + RELAX * (o.duty / (target - hIn) - m);
                if (!(next > 0)) {
                    return null;
                }
                m = Math.max(0.7 * m, Math.min(1.4 * m, next));
            }
            return null;
        }

        private double outletTargetEnthalpy(double pOut, double kelvin) {
            SaturationState sat = s.fluid().saturationAtPressure(pOut);
            if (kelvin == 0) {
                return evaporator ? sat.vapour().enthalpy() : sat.liquid().enthalpy();
            }
            double t = evaporator ? sat.dewTemperature() + kelvin : sat.bubbleTemperature() - kelvin;
            return s.fluid().at(InputPair.TP, t, evaporator ? pOut * (1 - 1e-9) : pOut * (1 + 1e-9)).enthalpy();
        }

        /** Mean air temperature of a coil that is two-phase throughout at the reference pressure [K]. */
        private double estimatedMeanAirTemperature() {
            SaturationState sat = s.fluid().saturationAtPressure(reference);
            double t = 0.5 * (sat.bubbleTemperature() + sat.dewTemperature());
            SegmentExchange.Result x = SegmentExchange.exchange(meanSurface, 1, air.inlet(), air.massFlow(), t,
                    Double.POSITIVE_INFINITY, 2000, Warnings.discard());
            return 0.5 * (air.inlet().dryBulb() + x.airOut().dryBulb());
        }

        /** The flow a fully two-phase coil would carry: an isothermal coil's duty over the latent heat. */
        private double estimatedMassFlow() {
            SaturationState sat = s.fluid().saturationAtPressure(reference);
            double t = 0.5 * (sat.bubbleTemperature() + sat.dewTemperature());
            SegmentExchange.Result x = SegmentExchange.exchange(meanSurface, 1, air.inlet(), air.massFlow(), t,
                    Double.POSITIVE_INFINITY, 2000, Warnings.discard());
            return Math.abs(x.heat()) / sat.latentHeat();
        }

        /** Saturation temperature at which the coil delivers a capacity, with the outlet condition held. */
        private Outcome forCapacity(RefrigerantSide.Target.Capacity q) {
            double tAir = air.inlet().dryBulb();
            double tc = s.fluid().info().criticalTemperature();
            // the held superheat (subcooling) needs the saturation that far below (above) the air, and some more
            double near = evaporator ? tAir - q.outletK() - 2 : tAir + q.outletK() + 2;
            double far = evaporator ? Math.max(tAir - 60, s.fluid().info().minTemperature() + 1) : Math.min(tAir + 60, tc - 2);
            if (evaporator ? near <= far : near >= far) {
                throw new InputException("refrigerant.requiredCapacity", Msg.IMPOSSIBLE,
                        "the held outlet condition leaves no saturation temperature to search");
            }
            DoubleUnaryOperator miss = t -> {
                reference = CoilSetup.referencePressure(s.fluid(), withSaturation(t));
                return Math.abs(atOutletCondition(q.outletK()).duty) - q.watts();
            };
            // walk from the given saturation temperature (the starting guess) in steps of 3 K: the
            // capacity grows with the temperature difference until the pressure drop at low pressure
            // takes over, so the nearest sign change is searched, not the ends of a wide range
            double a = Math.max(Math.min(c.refrigerant().saturationTemperature(), Math.max(near, far)), Math.min(near, far));
            double fa = miss.applyAsDouble(a);
            double away = evaporator ? -1 : 1;
            double direction = fa < 0 ? away : -away;
            double b = a;
            double fb = fa;
            for (int k = 0; fa * fb > 0; k++) {
                double next = b + direction * CAPACITY_STEP_K;
                double limit = direction == away ? far : near;
                if (k > 40 || (next - limit) * direction > 0 && Math.abs(b - limit) < 1e-9) {
                    throw new InputException("refrigerant.requiredCapacity", Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                            "%.0f W is outside what this coil delivers at saturation temperatures between %.1f C and "
                                    + "%.1f C (%.0f W at %.1f C)", q.watts(), Math.min(near, far) - 273.15,
                            Math.max(near, far) - 273.15, fb + q.watts(), b - 273.15));
                }
                if ((next - limit) * direction > 0) {
                    next = limit;
                }
                a = b;
                fa = fb;
                b = next;
                fb = miss.applyAsDouble(b);
            }
            double t = Roots.illinois(miss, a, fa, b, fb, 1e-9, 1e-4 * q.watts(),
                    "saturation temperature for the required capacity");
            reference = CoilSetup.referencePressure(s.fluid(), withSaturation(t));
            return atOutletCondition(q.outletK());
        }

        private RefrigerantSide withSaturation(double t) {
            RefrigerantSide r = c.refrigerant();
            return new RefrigerantSide(r.fluid(), r.duty(), t, r.convention(), r.insideCoefficient(),
                    r.liquidTemperature(), r.inletTemperature(), r.target(), r.model(), r.segments());
        }

        /** Inlet enthalpy of every circuit [J/kg]. */
        private double inletEnthalpy() {
            RefrigerantSide r = c.refrigerant();
            if (evaporator) {
                double h = s.fluid().saturationAtTemperature(r.liquidTemperature()).liquid().enthalpy();
                SaturationState sat = s.fluid().saturationAtPressure(reference);
                if (h <= sat.liquid().enthalpy()) {
                    throw new InputException("refrigerant.liquidTemperature", Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                            "liquid at %.1f C does not flash into the evaporator's two-phase region at %.1f C saturation",
                            r.liquidTemperature() - 273.15, sat.bubbleTemperature() - 273.15));
                }
                return h;
            }
            SaturationState sat = s.fluid().saturationAtPressure(reference);
            if (r.inletTemperature() <= sat.dewTemperature()) {
                throw new InputException("refrigerant.inletTemperature", Msg.NOT_ABOVE, r.inletTemperature() - 273.15,
                        sat.dewTemperature() - 273.15);
            }
            return s.fluid().at(InputPair.TP, r.inletTemperature(), reference).enthalpy();
        }

        /**
         * Rates the coil at a total refrigerant mass flow: passes over the circuits until the air,
         * the circuits' pressures and the flow split have settled.
         */
        private Outcome evaluate(double massFlow) {
            double hIn = inletEnthalpy();
            primeOnce();
            double residual = Double.POSITIVE_INFINITY;
            double[] lastOutlet = null;
            for (int pass = 0; pass < MAX_PASSES; pass++) {
                Pass p = pass(massFlow, hIn);
                residual = residual(p, rebalance(p, pass), lastOutlet) / looseness;
                lastOutlet = p.outletEnthalpy.clone();
                if (residual <= 1) {
                    return outcome(massFlow, hIn, p);
                }
            }
            throw new ConvergenceException("tube-by-tube passes (air, circuit pressures and flow split)", MAX_PASSES,
                    residual);
        }

        /** Sets the film-coefficient iteration's starting flux from the first estimate of the duty. */
        private void primeOnce() {
            if (!primed) {
                march.primeFlux(Math.abs(estimatedMassFlow() * s.fluid().saturationAtPressure(reference).latentHeat())
                        / s.derived().insideArea());
                primed = true;
            }
        }

        /**
         * @param p             the pass
         * @param split         the flow split's deviation after it
         * @param lastOutlet    the circuits' outlet enthalpies of the pass before, or null
         * @return the largest of the passes' changes over its tolerance (at most 1 when settled)
         */
        private double residual(Pass p, double split, double[] lastOutlet) {
            return Math.max(settling(p, split), outletChange(p, lastOutlet) / OUTLET_TOLERANCE);
        }

        /** @return the largest change of a circuit's outlet enthalpy since the pass before [J/kg] */
        private static double outletChange(Pass p, double[] lastOutlet) {
            if (lastOutlet == null) {
                return Double.POSITIVE_INFINITY;
            }
            double change = 0;
            for (int i = 0; i < lastOutlet.length; i++) {
                change = Math.max(change, Math.abs(p.outletEnthalpy[i] - lastOutlet[i]));
            }
            return change;
        }

        /**
         * @return the largest over its tolerance of the air's change, the circuits' pressure
         *         changes, the split's deviation and the energy balance (the outlets aside)
         */
        private double settling(Pass p, double split) {
            double refrigerantDuty = 0;
            for (double d : p.duty) {
                refrigerantDuty += d;
            }
            double balance = Math.abs(faceAirDuty() - refrigerantDuty) / Math.max(Math.abs(refrigerantDuty), 1e-9);
            return Math.max(Math.max(p.airChange / AIR_TOLERANCE_K, p.pressureChange),
                    Math.max(split / SPLIT_TOLERANCE, balance / BALANCE_TOLERANCE));
        }

        /**
         * Adjusts the circuits' shares of the flow towards equal pressure drops.
         *
         * @return largest relative deviation of a circuit's drop from the flow-weighted mean
         */
        private double rebalance(Pass p, int pass) {
            if (share.length == 1) {
                return 0;
            }
            double mean = 0;
            for (int i = 0; i < share.length; i++) {
                mean += share[i] * p.drop[i];
            }
            if (mean <= 0) {
                return 0;
            }
            double worst = 0;
            for (int i = 0; i < share.length; i++) {
                worst = Math.max(worst, Math.abs(p.drop[i] - mean) / mean);
            }
            if (worst <= SPLIT_TOLERANCE || pass < 1) {
                return worst;
            }
            double sum = 0;
            for (int i = 0; i < share.length; i++) {
                share[i] *= Math.sqrt(mean / Math.max(p.drop[i], 1e-9 * mean));
                sum += share[i];
            }
            for (int i = 0; i < share.length; i++) {
                share[i] /= sum;
            }
            return worst;
        }

        /** What one pass over all circuits produced. */
        private record Pass(double airChange, double pressureChange, double[] drop, double[] outletPressure,
                double[] outletEnthalpy, double[] inletPressure, double[] duty, double charge, TubeState[] tubeStates,
                double meanInsideCoefficient) {
        }

        /** One tube's figures in a pass. */
        private record TubeState(int circuit, Circuiting.Tube tube, double tIn, double tOut, double xIn, double xOut,
                double airIn, double airOut, double duty) {
        }

        /** One circuit's march in a pass. */
        private record CircuitPass(double drop, double inletPressure, double outletPressure, double outletEnthalpy,
                double duty, double airChange, double charge, double resistanceSum, List<TubeState> tubeStates) {
        }

        /**
         * Marches every circuit once through the air of the last pass. Each tube reads the air
         * that entered its row in the last pass and writes the air that leaves it into the next
         * buffer, so the circuits do not depend on one another within a pass and are marched in
         * parallel; the result does not depend on the order or the threads (the default circuits
         * run from the leaving row to the entering row and read last-pass air in any case).
         */
        private Pass pass(double massFlow, double hIn) {
            int n = circuits.size();
            List<Object> marched = IntStream.range(0, n).parallel().mapToObj(ci -> {
                try {
                    return (Object) marchCircuit(ci, massFlow, hIn);
                } catch (RuntimeException e) {
                    return e; // rethrown below as itself: a pool thread's exception would come back wrapped
                }
            }).toList();
            double[] newDrop = new double[n];
            double[] pOutAll = new double[n];
            double[] hOutAll = new double[n];
            double[] pInAll = new double[n];
            double[] dutyAll = new double[n];
            double airChange = 0;
            double pressureChange = 0;
            double charge = 0;
            double resistanceSum = 0;
            List<TubeState> tubeStates = new ArrayList<>(tubes);
            for (int ci = 0; ci < n; ci++) {
                if (marched.get(ci) instanceof RuntimeException e) {
                    throw e;
                }
                CircuitPass cp = (CircuitPass) marched.get(ci);
                newDrop[ci] = cp.drop;
                pInAll[ci] = cp.inletPressure;
                pOutAll[ci] = cp.outletPressure;
                hOutAll[ci] = cp.outletEnthalpy;
                dutyAll[ci] = cp.duty;
                airChange = Math.max(airChange, cp.airChange);
                charge += cp.charge;
                resistanceSum += cp.resistanceSum;
                tubeStates.addAll(cp.tubeStates);
                double change = Math.abs(newDrop[ci] - drop[ci]) / Math.max(1.0, 1e-4 * newDrop[ci]);
                pressureChange = Math.max(pressureChange, change);
                // averaged with the last estimate: the drop falls as the inlet pressure (and so the
                // saturation temperature) rises, and the plain update can swing from pass to pass
                drop[ci] = drop[ci] == 0 || !evaporator ? newDrop[ci] : 0.5 * (drop[ci] + newDrop[ci]);
            }
            MoistAirState[][][] last = airState;
            airState = airNext;
            airNext = last;
            return new Pass(airChange, pressureChange, newDrop, pOutAll, hOutAll, pInAll, dutyAll, charge,
                    tubeStates.toArray(TubeState[]::new), tubes * segments / resistanceSum);
        }

        private CircuitPass marchCircuit(int ci, double massFlow, double hIn) {
            List<Circuiting.Tube> path = circuits.get(ci);
            double m = massFlow * share[ci];
            double g = m / s.tubeFlowArea();
            double pIn = evaporator ? reference + drop[ci] : reference;
            march.startCircuit(ci);
            double p = pIn;
            double h = hIn;
            double duty = 0;
            double airChange = 0;
            double charge = 0;
            double resistanceSum = 0;
            List<TubeState> states = new ArrayList<>(path.size());
            for (int ti = 0, tubeIndex = firstTube[ci]; ti < path.size(); ti++, tubeIndex++) {
                Circuiting.Tube t = path.get(ti);
                boolean forward = ti % 2 == 0;
                TubeCoilModelMarch.Point start = march.point(p, h);
                double tubeDuty = 0;
                double airInSum = 0;
                double airOutSum = 0;
                double massSum = 0;
                double mAirSegment = air.massFlow() * profile[t.position()] / ((double) places * segments);
                for (int step = 0; step < segments; step++) {
                    int k = forward ? step : segments - 1 - step;
                    int slot = tubeIndex * segments + step;
                    MoistAirState in = airState[t.row()][t.position()][k];
                    TubeCoilModelMarch.Result r = march.segment(ci, slot, surfaces[t.position()], fraction, in,
                            mAirSegment, p, h, m, g, segmentLength, segmentInsideArea);
                    MoistAirState old = airState[t.row() + 1][t.position()][k];
                    MoistAirState next = r.airOut();
                    // on enthalpy: a surface switching between wet and dry moves the leaving air's
                    // dry bulb and humidity by a step but its enthalpy (the heat) hardly at all
                    airChange = Math.max(airChange, Math.abs(old.enthalpy() - next.enthalpy()) / CP_AIR);
                    airNext[t.row() + 1][t.position()][k] = next;
                    airInSum += mAirSegment * in.dryBulb();
                    airOutSum += mAirSegment * next.dryBulb();
                    massSum += mAirSegment;
                    tubeDuty += r.heat();
                    charge += r.chargeDensity() * segmentVolume;
                    resistanceSum += 1 / r.insideCoefficient();
                    p -= r.pressureDrop();
                    h = r.enthalpyOut();
                    if (p <= 0.2 * reference) {
                        throw CoilSetup.tooMuchFlow(massFlow, circuits.size(), 80);
                    }
                }
                TubeCoilModelMarch.Point end = march.point(p, h);
                if (ti < path.size() - 1) {
                    p -= march.bendDrop(end, g, s.flow().diameter() * ZoneCoilModel.BEND_EQUIVALENT_DIAMETERS);
                }
                states.add(new TubeState(ci, t, start.temperature(), end.temperature(), start.reportedQuality(),
                        end.reportedQuality(), airInSum / massSum, airOutSum / massSum, tubeDuty));
                duty += tubeDuty;
            }
            return new CircuitPass(pIn - p, pIn, p, h, duty, airChange, charge, resistanceSum, states);
        }

        /** @return heat given up by the air, from the entering and the leaving face [W] */
        private double faceAirDuty() {
            double duty = 0;
            double hIn = air.inlet().enthalpy();
            for (int j = 0; j < places; j++) {
                double mSeg = air.massFlow() * profile[j] / ((double) places * segments);
                for (int k = 0; k < segments; k++) {
                    duty += mSeg * (hIn - airState[rows][j][k].enthalpy());
                }
            }
            return duty;
        }

        /** Mixes the circuits' outlets and the leaving air. */
        private Outcome outcome(double massFlow, double hIn, Pass p) {
            int n = circuits.size();
            double pOut = 0;
            double pIn = 0;
            double hOut = 0;
            double duty = 0;
            for (int i = 0; i < n; i++) {
                pOut += share[i] * p.outletPressure[i];
                pIn += share[i] * p.inletPressure[i];
                hOut += share[i] * p.outletEnthalpy[i];
                duty += p.duty[i];
            }
            if (evaporator) {
                pOut = reference;
            } else {
                pIn = reference;
            }
            double hAir = 0;
            double wAir = 0;
            double mAir = 0;
            double airDuty = 0;
            for (int j = 0; j < places; j++) {
                double mSeg = air.massFlow() * profile[j] / ((double) places * segments);
                for (int k = 0; k < segments; k++) {
                    MoistAirState out = airState[rows][j][k];
                    hAir += mSeg * out.enthalpy();
                    wAir += mSeg * out.humidityRatio();
                    mAir += mSeg;
                    airDuty += mSeg * (air.inlet().enthalpy() - out.enthalpy());
                }
            }
            hAir /= mAir;
            wAir /= mAir;
            double pa = air.inlet().pressure();
            double tAir = Psychrometrics.dryBulbFromEnthalpy(hAir, wAir);
            double wSat = Psychrometrics.saturationHumidityRatio(tAir, pa);
            if (wAir > wSat) {
                tAir = SegmentExchange.temperatureOfSaturatedEnthalpy(hAir, pa, tAir - 30, tAir + 30, tAir);
                wAir = Psychrometrics.saturationHumidityRatio(tAir, pa);
            }
            MoistAirState out = new MoistAirState(tAir, wAir, pa);
            double condensate = mAir * (air.inlet().humidityRatio() - wAir);
            return new Outcome(massFlow, share.clone(), pIn, pOut, hIn, hOut, duty, airDuty, out, condensate, p);
        }

        private Rating assemble(Outcome o) {
            Warnings w = new Warnings();
            AirFlow.Side finalSide = air.at(0.5 * (air.inlet().dryBulb() + o.airOut.dryBulb()), w);
            double pOut = o.outletPressure;
            SaturationState satOut = s.fluid().saturationAtPressure(pOut);
            SaturationState satIn = s.fluid().saturationAtPressure(o.inletPressure);
            RefrigerantFlow.Local out = s.flow().at(pOut, o.outletEnthalpy);
            RefrigerantFlow.Local in = s.flow().at(o.inletPressure, o.inletEnthalpy);
            double superheat = evaporator && !out.twoPhase() && out.quality() > 1
                    ? out.temperature() - satOut.dewTemperature() : 0;
            double subcool = !evaporator && !out.twoPhase() && out.quality() < 0
                    ? satOut.bubbleTemperature() - out.temperature() : 0;
            double refrigerantDuty = o.massFlow * (o.outletEnthalpy - o.inletEnthalpy);
            double balance = (o.airDuty - refrigerantDuty) / Math.max(Math.abs(refrigerantDuty), 1e-12);
            double g = o.massFlow / s.circuits() / s.tubeFlowArea();
            RefrigerantFlow.Local mid = s.flow().at(0.5 * (o.inletPressure + pOut), 0.5 * (o.inletEnthalpy + o.outletEnthalpy));
            s.flow().insideCoefficient(mid, g, Math.abs(o.duty) / s.derived().insideArea(), w);
            s.flow().frictionGradient(mid, g, w);
            List<Rating.CircuitResult> circuitResults = new ArrayList<>();
            List<String> starved = new ArrayList<>();
            for (int i = 0; i < s.circuits(); i++) {
                double pc = o.pass.outletPressure[i];
                RefrigerantFlow.Local co = s.flow().at(pc, o.pass.outletEnthalpy[i]);
                SaturationState sc = s.fluid().saturationAtPressure(pc);
                double sh = evaporator && !co.twoPhase() && co.quality() > 1 ? co.temperature() - sc.dewTemperature() : 0;
                double sub = !evaporator && !co.twoPhase() && co.quality() < 0 ? sc.bubbleTemperature() - co.temperature() : 0;
                circuitResults.add(new Rating.CircuitResult(i, o.massFlow * o.share[i], o.pass.duty[i], co.temperature(),
                        sh, sub, co.twoPhase() ? co.quality() : -1, o.pass.drop[i]));
                if (evaporator && co.twoPhase()) {
                    starved.add(Integer.toString(i + 1));
                }
            }
            Rating.RefrigerantResult ref = new Rating.RefrigerantResult(s.fluid().name(), o.massFlow, o.inletPressure,
                    pOut, in.temperature(), out.temperature(), o.inletEnthalpy, o.outletEnthalpy,
                    out.twoPhase() ? out.quality() : -1, superheat, subcool,
                    satIn.dewTemperature() - satOut.dewTemperature(), o.pass.charge, balance, circuitResults,
                    satIn.dewTemperature(), satOut.dewTemperature());
            List<Rating.TubeResult> tubeResults = new ArrayList<>();
            for (TubeState t : o.pass.tubeStates) {
                tubeResults.add(new Rating.TubeResult(t.circuit, t.tube.row(), t.tube.position(), t.tIn, t.tOut, t.xIn,
                        t.xOut, t.airIn, t.airOut, Math.abs(t.duty)));
            }
            boolean frost = march.frost();
            double capacity = Math.abs(o.airDuty);
            double cpA = 1006 + 1860 * air.inlet().humidityRatio(); // ASHRAE Handbook - Fundamentals 2017 Ch. 1 moist-air enthalpy
            double sensible = Math.abs(air.massFlow() * cpA * (air.inlet().dryBulb() - o.airOut.dryBulb()));
            double latent = Math.max(0, capacity - sensible);
            if (frost) {
                w.add(String.format(Locale.ROOT, "the fin surface runs below 0 C in humid air: frost forms at about "
                        + "%.3f kg/h and will narrow the air passages until the coil is defrosted", o.condensate * 3600));
            }
            if (out.twoPhase() && evaporator) {
                w.add(String.format(Locale.ROOT, "the refrigerant leaves the evaporator still two-phase (quality %.2f): "
                        + "liquid returns towards the compressor", out.quality()));
            } else if (!starved.isEmpty()) {
                w.add("circuit(s) " + String.join(", ", starved) + " leave still two-phase and are made up by the "
                        + "others' superheat in the outlet header: the circuits are unevenly loaded");
            }
            Rating.Moisture moisture = new Rating.Moisture(Math.min(sensible, capacity), latent, Math.max(0, o.condensate),
                    frost, o.airOut.humidityRatio(), Math.min(1, o.airOut.relativeHumidity()));
            double meanInside = o.pass.meanInsideCoefficient;
            Resistances res = meanSurface.dryResistances(meanInside, Warnings.discard());
            double ntu = 1 / (res.total() * air.massFlow() * cpA);
            double dtMax = Math.abs(air.inlet().dryBulb() - in.temperature());
            List<Citation> methods = new ArrayList<>(air.methods());
            methods.add(meanSurface.fin().source());
            methods.addAll(s.flow().methods());
            methods.add(SegmentExchange.WET_SOURCE);
            methods.add(s.fluid().info().equationOfState());
            return new Rating(ID, c.refrigerant().duty(), capacity, air.inlet().dryBulb(), o.airOut.dryBulb(),
                    air.massFlow(), air.volumeFlow(), air.volumeFlow() / s.derived().faceArea(),
                    air.pressureDrop(finalSide, o.airOut.dryBulb()), s.derived(), finalSide.maxVelocity(),
                    finalSide.reynoldsDc(), finalSide.jf().j(), finalSide.jf().f(), finalSide.coefficient(),
                    meanSurface.finEfficiency(side.coefficient(), Warnings.discard()),
                    meanSurface.surfaceEffectiveness(side.coefficient(), Warnings.discard()), res, ntu,
                    dtMax > 1e-9 ? Math.min(1, capacity / (air.massFlow() * cpA * dtMax)) : 0,
                    finalSide.properties(), w.list(), methods, moisture, ref, List.of(), tubeResults);
        }
    }

    /** A converged rating at one refrigerant mass flow. */
    private record Outcome(double massFlow, double[] share, double inletPressure, double outletPressure,
            double inletEnthalpy, double outletEnthalpy, double duty, double airDuty, MoistAirState airOut,
            double condensate, TubeCoilRun.Pass pass) {
    }
}
