package org.finstack.fluid.table;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.SplittableRandom;
import org.finstack.core.Check;
import org.finstack.core.FinstackException;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.fluid.Fluid;
import org.finstack.fluid.FluidInfo;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.Fluids;
import org.finstack.fluid.InputPair;
import org.finstack.fluid.SaturationState;

/**
 * Measures property calls per second of the exact equation of state and of the tables, with the
 * mix of calls a coil model makes: for each query point one (p, h) flash and one saturation
 * call at that pressure (two calls). Query points are drawn (seeded, so repeatable) over a coil's
 * working range: saturation from -40 to +60 degC (within 5 K of the fluid's minimum and 10 K of
 * its critical temperature), 60 % two-phase, 25 % superheated vapour up to 15 % of the latent
 * heat above the dew point, 15 % subcooled liquid up to 10 % of the latent heat below the bubble
 * point. Points the exact fluid fails at are dropped (and counted). Each back end is warmed up
 * (the exact one with one pass over the points, the tables for 0.15 s, 0.6 s for the first
 * fluid) before it is timed for
 * a set time. A measurement, not a test: the numbers depend on the machine and its load.
 */
public final class TableBenchmark {

    /**
     * What to run.
     *
     * @param fluids  fluid names (empty for every known fluid)
     * @param points  query points per fluid, at least 1
     * @param seconds time each back end is measured per fluid [s], above 0
     * @param seed    random seed of the query points
     */
    public record Settings(List<String> fluids, int points, double seconds, long seed) {

        /** Checks the settings. */
        public Settings {
            fluids = List.copyOf(Objects.requireNonNull(fluids, "fluids"));
            Check.atLeastOne("points", points);
            Check.positive("seconds", seconds);
            if (seconds > 60) {
                throw new InputException("seconds", Msg.NOT_BELOW, seconds, 60.0);
            }
        }

        /** @return the default run: every fluid, 500 points, 0.25 s per back end, seed 1 */
        public static Settings defaults() {
            return new Settings(List.of(), 500, 0.25, 1);
        }
    }

    /**
     * One fluid's measurement.
     *
     * @param fluid         fluid name
     * @param points        query points used
     * @param dropped       points dropped because the exact fluid failed at them
     * @param buildSeconds  time to build the tables [s]
     * @param eosCalls      calls timed on the exact fluid
     * @param eosSeconds    their time [s]
     * @param tableCalls    calls timed on the tables
     * @param tableSeconds  their time [s]
     * @param maxDeviation  largest |T_table - T_eos| of the (p, h) flashes over the points [K]
     */
    public record FluidResult(String fluid, int points, int dropped, double buildSeconds, long eosCalls,
            double eosSeconds, long tableCalls, double tableSeconds, double maxDeviation) {

        /** @return exact calls per second [1/s] */
        public double eosCallsPerSecond() {
            return eosCalls / eosSeconds;
        }

        /** @return table calls per second [1/s] */
        public double tableCallsPerSecond() {
            return tableCalls / tableSeconds;
        }

        /** @return how many times faster the tables are [-] */
        public double speedup() {
            return tableCallsPerSecond() / eosCallsPerSecond();
        }
    }

    /**
     * The whole run.
     *
     * @param settings what was run
     * @param fluids   per fluid
     */
    public record Result(Settings settings, List<FluidResult> fluids) {

        /** Copies the list. */
        public Result {
            fluids = List.copyOf(fluids);
        }

        /** @return exact calls per second over all fluids (total calls over total time) [1/s] */
        public double eosCallsPerSecond() {
            return eosCalls() / fluids.stream().mapToDouble(FluidResult::eosSeconds).sum();
        }

        /** @return table calls per second over all fluids [1/s] */
        public double tableCallsPerSecond() {
            return tableCalls() / fluids.stream().mapToDouble(FluidResult::tableSeconds).sum();
        }

        /** @return the tables' speed-up over all fluids [-] */
        public double tableSpeedup() {
            return tableCallsPerSecond() / eosCallsPerSecond();
        }

        /** @return calls timed on the exact fluids */
        public long eosCalls() {
            return fluids.stream().mapToLong(FluidResult::eosCalls).sum();
        }

        /** @return calls timed on the tables */
        public long tableCalls() {
            return fluids.stream().mapToLong(FluidResult::tableCalls).sum();
        }

        /** @return total table build time [s] */
        public double buildSeconds() {
            return fluids.stream().mapToDouble(FluidResult::buildSeconds).sum();
        }
    }

    /** Warm-up time of the tables before they are timed [s] (the JIT needs some 10^5 calls). */
    private static final double TABLE_WARM_UP = 0.15;
    /** Warm-up of the tables for the first fluid, until the JIT has compiled the table code [s]. */
    private static final double FIRST_WARM_UP = 0.6;

    private TableBenchmark() {
    }

    /**
     * Runs the benchmark.
     *
     * @param settings what to run
     * @return the measurements
     * @throws InputException ({@code refrigerant.fluid}) for an unknown fluid name
     */
    public static Result run(Settings settings) {
        List<String> names = settings.fluids().isEmpty() ? Fluids.names() : settings.fluids();
        List<FluidResult> out = new ArrayList<>();
        for (String name : names) {
            out.add(runOne(Fluids.byName(name), settings, out.isEmpty() ? FIRST_WARM_UP : TABLE_WARM_UP));
        }
        return new Result(settings, out);
    }

    private static FluidResult runOne(Fluid exact, Settings settings, double warmUp) {
        TabulatedFluid table = TabulatedFluid.of(exact, Tables.ROWS, Tables.COLS);
        double build = table.coverage().buildSeconds();
        double[][] drawn = points(table, settings.points(), settings.seed());
        List<double[]> kept = new ArrayList<>();
        double maxDev = 0;
        for (double[] q : drawn) {
            try {
                double te = exact.at(InputPair.PH, q[0], q[1]).temperature();
                exact.saturationAtPressure(q[0]);
                double tt = table.at(InputPair.PH, q[0], q[1]).temperature();
                maxDev = Math.max(maxDev, Math.abs(tt - te));
                kept.add(q);
            } catch (FinstackException e) {
                // the exact fluid failed at this point: it is dropped and counted
            }
        }
        if (kept.isEmpty()) {
            throw new FinstackException(Msg.IMPOSSIBLE, "no benchmark point could be computed for " + exact.name());
        }
        double[][] pts = kept.toArray(new double[0][]);
        time(table, pts, warmUp);
        long[] eos = time(exact, pts, settings.seconds());
        long[] tab = time(table, pts, settings.seconds());
        return new FluidResult(exact.name(), pts.length, drawn.length - pts.length, build, eos[0], eos[1] * 1e-9,
                tab[0], tab[1] * 1e-9, maxDev);
    }

    /**
     * Calls the fluid over the points, cycling through them, until the time is spent (at least
     * one point).
     *
     * @return calls made and nanoseconds spent
     */
    private static long[] time(Fluid f, double[][] pts, double seconds) {
        long budget = (long) (seconds * 1e9);
        long start = System.nanoTime();
        long calls = 0;
        double sink = 0;
        long elapsed;
        int k = 0;
        do {
            double[] q = pts[k];
            FluidState s = f.at(InputPair.PH, q[0], q[1]);
            SaturationState sat = f.saturationAtPressure(q[0]);
            sink += s.temperature() + sat.liquid().temperature();
            calls += 2;
            k = k + 1 == pts.length ? 0 : k + 1;
            elapsed = System.nanoTime() - start;
        } while (elapsed < budget);
        if (!(sink > 0)) {
            throw new FinstackException(Msg.IMPOSSIBLE, "benchmark states without temperature");
        }
        return new long[] {calls, Math.max(1, elapsed)};
    }

    /** Query points {p [Pa], h [J/kg]} over the working range, from the tables (cheap). */
    private static double[][] points(TabulatedFluid f, int n, long seed) {
        FluidInfo info = f.info();
        double lo = Math.max(233.15, info.minTemperature() + 5);
        double hi = Math.min(333.15, info.criticalTemperature() - 10);
        SplittableRandom rnd = new SplittableRandom(seed);
        double[][] out = new double[n][];
        for (int k = 0; k < n; k++) {
            SaturationState sat = f.saturationAtTemperature(lo + (hi - lo) * rnd.nextDouble());
            double hl = sat.liquid().enthalpy();
            double hv = sat.vapour().enthalpy();
            double latent = hv - hl;
            double kind = rnd.nextDouble();
            double h = kind < 0.6 ? hl + latent * (0.02 + 0.96 * rnd.nextDouble())
                    : kind < 0.85 ? hv + 0.15 * latent * rnd.nextDouble()
                    : hl - 0.10 * latent * rnd.nextDouble();
            out[k] = new double[] {sat.liquid().pressure(), h};
        }
        return out;
    }
}
