package org.finstack.coil;

import java.util.Arrays;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicReferenceArray;
import org.finstack.core.Warnings;
import org.finstack.fluid.Fluid;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.InputPair;
import org.finstack.fluid.Phase;
import org.finstack.fluid.SaturationState;
import org.finstack.fluid.TransportProperties;
import org.finstack.fluid.psychro.MoistAirState;
import org.finstack.fluid.psychro.Psychrometrics;
import org.finstack.tubeside.SaturatedProperties;

/**
 * The refrigerant's step through one tube segment for {@link TubeCoilModel}: the local state at
 * (p, h) from a per-segment cache of saturation properties, the in-tube film coefficient,
 * friction and acceleration, the heat from {@link SegmentExchange}, and the split of a segment
 * where the refrigerant reaches a phase boundary. The in-tube methods are the package defaults
 * that {@link RefrigerantFlow} uses (Gungor &amp; Winterton 1987 boiling with the dryout
 * treatment, Shah 1979 condensation, Gnielinski 1976 and Churchill 1977 in a single phase,
 * Friedel 1979 two-phase friction, Rouhani &amp; Axelsson 1970 void fraction); they are called
 * here with the cached saturated properties so that a pass does not recompute them.
 *
 * <p>Working state of one rating only (the caches), not shared between ratings. The circuits of a
 * pass may be marched on separate threads at once: what a segment keeps is per segment slot or per
 * circuit, and the saturation grid holds immutable nodes made once each (an atomic array near the
 * reference pressure, a concurrent map beyond).
 */
final class TubeCoilModelMarch {

    /** ln(1 + step) of the saturation grid. */
    private static final double LN_GRID_STEP = Math.log1p(TubeCoilModel.SATURATION_GRID_STEP);

    /** Largest number of parts a segment is split into at phase boundaries (liquid, two-phase, vapour). */
    private static final int MAX_PARTS = 3;

    /** Glide below which a fluid is treated as pure (one saturation temperature at a pressure) [K]. */
    private static final double PURE_GLIDE_K = 1e-6;

    /**
     * Most re-evaluations of a two-phase segment's film coefficient with its own heat flux and
     * mid-segment quality, and the relative change of the coefficient that ends them.
     */
    private static final int FLUX_ITERATIONS = 6;
    private static final double FLUX_TOLERANCE = 1e-4;

    /** Window within which a segment's last single-phase inlet state is reused (see {@link #local}). */
    static final double REUSE_RELATIVE_PRESSURE = 1e-5;
    static final double REUSE_ENTHALPY = 0;

    /** Nodes on either side of the grid origin held in an array. */
    private static final int NEAR_NODES = 1700;

    private final Fluid fluid;
    private final RefrigerantFlow flow;
    private final boolean evaporator;
    /**
     * Grid nodes i in [-{@value #NEAR_NODES}, {@value #NEAR_NODES}] (p_ref / 5.5 to 5.5 p_ref), made
     * once each when first asked for.
     */
    private final AtomicReferenceArray<Node> nearNodes = new AtomicReferenceArray<>(2 * NEAR_NODES + 1);
    /** Nodes further out. */
    private final Map<Integer, Node> farNodes = new ConcurrentHashMap<>();
    private final double gridOrigin;
    /** Heat flux every segment's film-coefficient iteration starts from [W/m2]. */
    private double startFlux = 5000;
    /** Per circuit, the heat flux its next two-phase segment starts from [W/m2]. */
    private final double[] circuitFlux;
    private final boolean[] frost;
    /** Per segment, the last single-phase state the fluid computed at its inlet. */
    private final FluidState[] lastState;

    /** Where the refrigerant is relative to the dome. */
    enum Region {
        /** Subcooled liquid. */
        LIQUID,
        /** Liquid and vapour. */
        TWO_PHASE,
        /** Superheated vapour. */
        VAPOUR
    }

    /**
     * @param fluid      the refrigerant
     * @param flow       the in-tube model (diameter, override, duty)
     * @param evaporator whether the refrigerant takes heat up
     * @param slots      number of segments in the coil
     * @param circuits   number of circuits
     * @param gridOrigin a pressure on the saturation grid [Pa]
     */
    TubeCoilModelMarch(Fluid fluid, RefrigerantFlow flow, boolean evaporator, int slots, int circuits,
            double gridOrigin) {
        this.fluid = fluid;
        this.flow = flow;
        this.evaporator = evaporator;
        this.gridOrigin = gridOrigin;
        this.frost = new boolean[slots];
        this.lastState = new FluidState[slots];
        this.circuitFlux = new double[circuits];
        Arrays.fill(circuitFlux, startFlux);
    }

    /**
     * Sets the heat flux every segment's film-coefficient iteration starts from. The start is the
     * same for every segment and pass, so that a segment's result depends on its inlet states
     * only: where a wet and a dry solution both satisfy the flux-dependent boiling coefficient,
     * the same one is found every pass (a start carried over from the last pass lets the passes
     * cycle between the two).
     *
     * @param heatFlux [W/m2]
     */
    void primeFlux(double heatFlux) {
        startFlux = Math.max(100, heatFlux);
        Arrays.fill(circuitFlux, startFlux);
    }

    /**
     * Starts a circuit's march: its first two-phase segment's film-coefficient iteration starts
     * from the primed flux, every later one from the flux its predecessor in the circuit settled
     * at (so a segment's result depends only on what the march brings to it in this pass).
     *
     * @param circuit the circuit's index
     */
    void startCircuit(int circuit) {
        circuitFlux[circuit] = startFlux;
    }

    /** @return whether water froze on any segment in the last pass */
    boolean frost() {
        for (boolean f : frost) {
            if (f) {
                return true;
            }
        }
        return false;
    }

    /** Saturation computed by the fluid at one node of the pressure grid, with the correlations' properties made on demand. */
    private final class Node {
        private final double pressure;
        private final SaturationState sat;
        /** Made on demand; two threads may both make it, with the same result. */
        private volatile SaturatedProperties props;

        Node(double pressure) {
            this.pressure = pressure;
            this.sat = fluid.saturationAtPressure(pressure);
        }

        SaturatedProperties props() {
            SaturatedProperties made = props;
            if (made == null) {
                FluidState l = sat.liquid();
                FluidState v = sat.vapour();
                TransportProperties t = fluid.transport();
                made = new SaturatedProperties(fluid.name(), pressure, fluid.info().criticalPressure(),
                        fluid.info().molarMass(), l.density(), v.density(), t.viscosity(l), t.viscosity(v),
                        t.conductivity(l), t.conductivity(v), l.cp(), v.cp(), t.surfaceTension(l.temperature()),
                        v.enthalpy() - l.enthalpy());
                props = made;
            }
            return made;
        }
    }

    private Node node(int i) {
        if (Math.abs(i) > NEAR_NODES) {
            return farNodes.computeIfAbsent(i, this::newNode);
        }
        Node n = nearNodes.get(i + NEAR_NODES);
        if (n == null) {
            // two threads may make the same node; the first one stored is kept by both
            nearNodes.compareAndSet(i + NEAR_NODES, null, newNode(i));
            n = nearNodes.get(i + NEAR_NODES);
        }
        return n;
    }

    private Node newNode(int i) {
        return new Node(gridOrigin * Math.pow(1 + TubeCoilModel.SATURATION_GRID_STEP, i));
    }

    /**
     * Saturation at a local pressure: bubble and dew temperatures and enthalpies interpolated
     * linearly in ln p between the two grid nodes around it; the saturated phases' properties for
     * the in-tube correlations (densities, viscosities, conductivities, surface tension) from the
     * nearer node.
     */
    final class Saturation {
        final double pressure;
        final double bubbleTemperature;
        final double dewTemperature;
        final double liquidEnthalpy;
        final double vapourEnthalpy;
        private final Node near;

        Saturation(double pressure) {
            this.pressure = pressure;
            double u = Math.log(pressure / gridOrigin) / LN_GRID_STEP;
            int i = (int) Math.floor(u);
            double t = u - i;
            Node a = node(i);
            Node b = node(i + 1);
            this.bubbleTemperature = a.sat.bubbleTemperature() + t * (b.sat.bubbleTemperature() - a.sat.bubbleTemperature());
            this.dewTemperature = a.sat.dewTemperature() + t * (b.sat.dewTemperature() - a.sat.dewTemperature());
            this.liquidEnthalpy = a.sat.liquid().enthalpy() + t * (b.sat.liquid().enthalpy() - a.sat.liquid().enthalpy());
            this.vapourEnthalpy = a.sat.vapour().enthalpy() + t * (b.sat.vapour().enthalpy() - a.sat.vapour().enthalpy());
            this.near = t < 0.5 ? a : b;
        }

        SaturatedProperties props() {
            return near.props();
        }

        FluidState liquid() {
            return near.sat.liquid();
        }

        FluidState vapour() {
            return near.sat.vapour();
        }

        double glide() {
            return dewTemperature - bubbleTemperature;
        }

        double latentHeat() {
            return vapourEnthalpy - liquidEnthalpy;
        }

        boolean pure() {
            return glide() < PURE_GLIDE_K;
        }
    }

    /**
     * @param pressure [Pa]
     * @return saturation at that pressure, from the grid
     */
    Saturation saturation(double pressure) {
        return new Saturation(pressure);
    }

    /**
     * A local refrigerant state.
     *
     * @param sat         saturation at the local pressure
     * @param enthalpy    [J/kg]
     * @param region      place relative to the dome
     * @param quality     thermodynamic quality by enthalpy (outside [0, 1] in a single phase)
     * @param temperature [K]
     * @param state       the single-phase state, or {@code null} while two-phase
     */
    record Point(Saturation sat, double enthalpy, Region region, double quality, double temperature,
            FluidState state) {

        /** @return the quality inside the dome, -1 in a single phase (the per-tube table's convention) */
        double reportedQuality() {
            return region == Region.TWO_PHASE ? quality : -1;
        }
    }

    /**
     * @param pressure [Pa]
     * @param enthalpy [J/kg]
     * @return the local state
     */
    Point point(double pressure, double enthalpy) {
        return local(saturation(pressure), enthalpy, -1);
    }

    /**
     * Classifies by the direction of the heat: a state exactly on a boundary belongs to the region
     * ahead. A single-phase state is computed by the fluid, or, where the segment's last one lies
     * within {@value #REUSE_RELATIVE_PRESSURE} of the pressure and {@value #REUSE_ENTHALPY} J/kg,
     * taken from it with T = T0 + (h - h0) / cp (the pressure's effect at constant enthalpy there
     * is below 1e-4 K).
     */
    private Point local(Saturation s, double h, int slot) {
        double hl = s.liquidEnthalpy;
        double hv = s.vapourEnthalpy;
        double x = (h - hl) / (hv - hl);
        Region region;
        if (evaporator) {
            region = h < hl ? Region.LIQUID : h < hv ? Region.TWO_PHASE : Region.VAPOUR;
        } else {
            region = h > hv ? Region.VAPOUR : h > hl ? Region.TWO_PHASE : Region.LIQUID;
        }
        if (region == Region.TWO_PHASE) {
            double t = s.pure() ? s.dewTemperature : fluid.at(InputPair.PH, s.pressure, h).temperature();
            return new Point(s, h, region, x, t, null);
        }
        double edgeEnthalpy = region == Region.VAPOUR ? hv : hl;
        if (Math.abs(h - edgeEnthalpy) <= 1e-9 * Math.abs(hv - hl)) {
            // on the boundary: the saturated phase, at the interpolated temperature
            return new Point(s, h, region, x, region == Region.VAPOUR ? s.dewTemperature : s.bubbleTemperature,
                    region == Region.VAPOUR ? s.vapour() : s.liquid());
        }
        if (slot >= 0 && lastState[slot] != null) {
            FluidState last = lastState[slot];
            if (Math.abs(last.pressure() - s.pressure) <= REUSE_RELATIVE_PRESSURE * s.pressure
                    && Math.abs(last.enthalpy() - h) <= REUSE_ENTHALPY && last.phase() != Phase.TWO_PHASE) {
                return new Point(s, h, region, x, last.temperature() + (h - last.enthalpy()) / last.cp(), last);
            }
        }
        FluidState st = fluid.at(InputPair.PH, s.pressure, h);
        if (slot >= 0) {
            lastState[slot] = st;
        }
        if (st.phase() == Phase.TWO_PHASE) {
            // the grid's boundary and the fluid's differ by the interpolation error: a state just across it
            return new Point(s, h, region, x, region == Region.VAPOUR ? s.dewTemperature : s.bubbleTemperature,
                    region == Region.VAPOUR ? s.vapour() : s.liquid());
        }
        return new Point(s, h, region, x, st.temperature(), st);
    }

    /** Enthalpy of the next phase boundary in the direction of the heat, or NaN. */
    private double boundary(Point p) {
        Saturation sat = p.sat;
        return switch (p.region) {
            case LIQUID -> evaporator ? sat.liquidEnthalpy : Double.NaN;
            case TWO_PHASE -> evaporator ? sat.vapourEnthalpy : sat.liquidEnthalpy;
            case VAPOUR -> evaporator ? Double.NaN : sat.vapourEnthalpy;
        };
    }

    /** Capacity rate of the refrigerant [W/K]: m cp, infinite for a pure two-phase fluid, m dh/dT across a blend's dome. */
    private static double capacity(Point p, double m) {
        if (p.region != Region.TWO_PHASE) {
            return m * p.state.cp();
        }
        if (p.sat.glide() < 1e-3) {
            return Double.POSITIVE_INFINITY;
        }
        return m * p.sat.latentHeat() / p.sat.glide();
    }

    private boolean fluxDependent(Point p) {
        return flow.override() <= 0 && p.region == Region.TWO_PHASE;
    }

    private double insideCoefficient(Point p, double quality, double g, double q, Warnings w) {
        if (p.region == Region.TWO_PHASE) {
            return flow.twoPhaseCoefficient(p.sat.props(), quality, g, q, w);
        }
        return flow.insideCoefficient(new RefrigerantFlow.Local(p.state, false, p.quality), g, q, w);
    }

    /** Friction gradient [Pa/m] at a state; two-phase at the given quality. */
    private double frictionGradient(Point p, double quality, double g, Warnings w) {
        if (p.region == Region.TWO_PHASE) {
            return flow.twoPhaseFrictionGradient(p.sat.props(), quality, g, w);
        }
        return flow.frictionGradient(new RefrigerantFlow.Local(p.state, false, p.quality), g, w);
    }

    private double chargeDensity(Point p, double quality, double g, Warnings w) {
        if (p.region != Region.TWO_PHASE) {
            return p.state.density();
        }
        return flow.twoPhaseChargeDensity(p.sat.props(), quality, g, w);
    }

    /**
     * Pressure drop of one return bend: the friction gradient at the state leaving the tube
     * times an equivalent length.
     *
     * @param p                the state at the bend
     * @param g                mass flux [kg/(m2 s)]
     * @param equivalentLength [m]
     * @return [Pa]
     */
    double bendDrop(Point p, double g, double equivalentLength) {
        return frictionGradient(p, p.quality, g, Warnings.discard()) * equivalentLength;
    }

    /**
     * What one segment did.
     *
     * @param heat              heat from the air to the refrigerant [W]
     * @param airOut            leaving air (the parts' air mixed)
     * @param enthalpyOut       refrigerant enthalpy leaving [J/kg]
     * @param pressureDrop      friction and acceleration [Pa]
     * @param chargeDensity     mean refrigerant density for the charge [kg/m3]
     * @param insideCoefficient share-weighted film coefficient (harmonic mean of the parts) [W/(m2 K)]
     */
    record Result(double heat, MoistAirState airOut, double enthalpyOut, double pressureDrop, double chargeDensity,
            double insideCoefficient) {
    }

    /**
     * Rates one segment.
     *
     * @param circuit      index of the circuit the segment belongs to
     * @param slot         segment index
     * @param surface      the coil's surfaces at this tube place's air-side coefficient
     * @param fraction     the segment's share of the coil's surfaces
     * @param airIn        entering air
     * @param airMassFlow  dry-air mass flow through the segment [kg/s]
     * @param pressure     refrigerant pressure entering [Pa]
     * @param enthalpy     refrigerant enthalpy entering [J/kg]
     * @param massFlow     refrigerant mass flow in the circuit [kg/s]
     * @param massFlux     refrigerant mass flux [kg/(m2 s)]
     * @param length       segment length [m]
     * @param insideArea   segment inside area [m2]
     * @return the result
     */
    Result segment(int circuit, int slot, CoilSurface surface, double fraction, MoistAirState airIn, double airMassFlow,
            double pressure, double enthalpy, double massFlow, double massFlux, double length, double insideArea) {
        Warnings w = Warnings.discard();
        Saturation s = saturation(pressure);
        Point cur = local(s, enthalpy, slot);
        double remaining = 1;
        double heat = 0;
        double dp = 0;
        double rho = 0;
        double resistance = 0;
        double hAir = 0;
        double wAir = 0;
        boolean frosted = false;
        MoistAirState single = null;
        double hOut = enthalpy;
        for (int part = 0; part < MAX_PARTS && remaining > 1e-12; part++) {
            double cap = capacity(cur, massFlow);
            double share = remaining;
            double hi = insideCoefficient(cur, cur.quality(), massFlux, fluxDependent(cur) ? circuitFlux[circuit] : startFlux, w);
            SegmentExchange.Result x = SegmentExchange.exchange(surface, fraction * share, airIn, airMassFlow * share,
                    cur.temperature(), cap, hi, w);
            for (int i = 0; i < FLUX_ITERATIONS && fluxDependent(cur); i++) {
                // the boiling or condensing coefficient depends on the heat flux it helps to set, and
                // is taken at the quality halfway through the segment (within the dome)
                double q = Math.abs(x.heat()) / (insideArea * share);
                double xMid = Math.min(1, Math.max(0, cur.quality() + 0.5 * x.heat() / (massFlow * s.latentHeat())));
                double next = insideCoefficient(cur, xMid, massFlux, q, w);
                circuitFlux[circuit] = Math.max(100, q);
                if (Math.abs(next - hi) <= FLUX_TOLERANCE * hi) {
                    break;
                }
                hi = next;
                x = SegmentExchange.exchange(surface, fraction * share, airIn, airMassFlow * share, cur.temperature(),
                        cap, hi, w);
            }
            double hEnd = cur.enthalpy() + x.heat() / massFlow;
            double hb = boundary(cur);
            boolean crosses = !Double.isNaN(hb) && (evaporator ? hEnd > hb : hEnd < hb);
            if (crosses && part < MAX_PARTS - 1) {
                double need = Math.abs(massFlow * (hb - cur.enthalpy()));
                Point from = cur;
                double film = hi;
                double lo = 1e-12 * remaining;
                DoubleFunction heatOf = f -> Math.abs(SegmentExchange.exchange(surface, fraction * f, airIn,
                        airMassFlow * f, from.temperature(), cap, film, Warnings.discard()).heat()) - need;
                share = heatOf.apply(lo) >= 0 ? lo
                        : Roots.solve(heatOf::apply, lo, remaining, "share of a segment up to a phase boundary",
                                1e-10);
                x = SegmentExchange.exchange(surface, fraction * share, airIn, airMassFlow * share, cur.temperature(),
                        cap, hi, w);
                hEnd = hb;
            }
            double xEnd = cur.region == Region.TWO_PHASE ? (hEnd - s.liquidEnthalpy) / s.latentHeat()
                    : cur.quality();
            double xMid = 0.5 * (cur.quality() + xEnd);
            heat += x.heat();
            single = part == 0 && share == remaining ? x.airOut() : null;
            hAir += share * x.airOut().enthalpy();
            wAir += share * x.airOut().humidityRatio();
            resistance += share / hi;
            frosted |= x.frost();
            dp += frictionGradient(cur, xMid, massFlux, w) * length * share;
            if (cur.region == Region.TWO_PHASE) {
                dp += flow.accelerationDrop(s.props(), massFlux, cur.quality(), xEnd, w);
            }
            rho += share * chargeDensity(cur, xMid, massFlux, w);
            remaining -= share;
            hOut = hEnd;
            if (!crosses) {
                break;
            }
            cur = local(s, hEnd, -1);
        }
        frost[slot] = frosted;
        MoistAirState airOut = single != null ? single : mix(hAir, wAir, airIn.pressure());
        return new Result(heat, airOut, hOut, dp, rho, 1 / resistance);
    }

    /** Air of a given enthalpy and humidity; held at saturation if the mix would be supersaturated. */
    static MoistAirState mix(double h, double w, double p) {
        double t = Psychrometrics.dryBulbFromEnthalpy(h, w);
        if (w > Psychrometrics.saturationHumidityRatio(t, p)) {
            t = SegmentExchange.temperatureOfSaturatedEnthalpy(h, p, t - 30, t + 30, t);
            w = Psychrometrics.saturationHumidityRatio(t, p);
        }
        return new MoistAirState(t, w, p);
    }

    /** A function of the segment share. */
    @FunctionalInterface
    private interface DoubleFunction {
        double apply(double share);
    }
}
