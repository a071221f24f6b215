package org.finstack.fluid.table;

import java.util.Objects;
import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.fluid.Fluid;
import org.finstack.fluid.FluidInfo;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.InputPair;
import org.finstack.fluid.SaturationState;
import org.finstack.fluid.TransportProperties;
import org.finstack.fluid.internal.TwoPhase;

/**
 * A fast stand-in for an exact {@link Fluid} (normally a {@link org.finstack.fluid.HelmholtzFluid}):
 * the same states, interpolated from tables built once from the exact fluid. Immutable and
 * thread-safe; the tables are built lazily on the first call that needs them (by one thread,
 * the others wait) and never change afterwards.
 *
 * <p>What is tabulated (see {@link Tables}):
 * <ul>
 * <li>the saturation line from the bubble pressure at the fluid's minimum temperature + 2 K up to
 * the dew pressure at 2 K below the critical temperature (5, 10, ... K if the exact fluid
 * refuses closer), as not-a-knot cubic splines over ln p of 1/T, ln rho, h, s, ln cp, ln cv and
 * w for each side, with ln p against 1/T for the inverse (saturation at a given T);</li>
 * <li>the subcooled liquid down to the fluid's minimum temperature and the superheated vapour up
 * to min(T_max, T_c + 100 K), on one bicubic grid per phase (64 pressures by 24 temperatures)
 * that starts on the saturation line, so no cell straddles it;</li>
 * <li>two-phase states of a pure fluid by the lever rule from the saturated states.</li>
 * </ul>
 *
 * <p>Outside the tables (supercritical and near-critical pressures, vapour above the top
 * temperature, pressures below the lowest row, temperatures between bubble and dew point of a
 * blend), and for two-phase states of a blend (a fluid whose dew and bubble temperatures
 * differ), every call goes to the exact fluid: a tabulated fluid never extrapolates, and
 * refuses exactly what the exact fluid refuses ({@link org.finstack.core.OutOfRangeException}).
 * Non-finite input throws {@link InputException} naming the field.
 *
 * <p>Accuracy over the coil's working range (saturation from -60 to +70 degC or to 8 K below the
 * critical temperature, subcooling to 40 K, superheat to 60 K), checked for every fluid against the
 * exact equation of state by {@code TabulatedFluidAccuracyTest}: density and cp within 0.1 %,
 * temperature from (p, h) within 0.01 K, enthalpy from (T, p) within 0.1 % of the latent heat,
 * saturation temperature within 0.01 K (the largest deviations found are some 100 times
 * smaller: density 7e-6, cp 5e-5, T(p, h) 3e-4 K). Building the tables costs some 3 000 exact
 * state evaluations, 0.02 to 0.6 s per fluid on a loaded two-core machine (see
 * {@link Coverage#buildSeconds()}); a (p, h) flash then costs about a microsecond, 30 to 300
 * times less than on the equation of state.
 *
 * <p>Example: {@code TabulatedFluid.of(Fluids.byName("R134a")).saturationAtTemperature(273.15)}
 * gives a vapour pressure of 292 803 Pa, like the exact fluid (Tillner-Roth &amp; Baehr 1994).
 */
public final class TabulatedFluid implements Fluid {

    /**
     * What the tables cover and what they cost.
     *
     * @param minPressure    lowest tabulated pressure [Pa]
     * @param maxPressure    highest tabulated pressure [Pa]
     * @param minTemperature lowest liquid temperature [K]
     * @param maxTemperature highest vapour temperature [K]
     * @param rows           pressures in the grids
     * @param columns        temperatures per phase in the grids
     * @param glide          whether the wrapped fluid is a blend (two-phase states go to it)
     * @param buildSeconds   time the tables took to build [s]
     */
    public record Coverage(double minPressure, double maxPressure, double minTemperature, double maxTemperature,
            int rows, int columns, boolean glide, double buildSeconds) {
    }

    private final Fluid exact;
    private final int rows;
    private final int cols;
    private volatile Tables tables;
    private volatile TabulatedTransport transport;

    private TabulatedFluid(Fluid exact, int rows, int cols) {
        this.exact = Objects.requireNonNull(exact, "exact");
        this.rows = rows;
        this.cols = cols;
    }

    /**
     * Wraps a fluid; the tables are built on first use.
     *
     * @param exact the fluid to tabulate
     * @return the tabulated fluid (a tabulated fluid is returned as it is)
     */
    public static TabulatedFluid of(Fluid exact) {
        if (exact instanceof TabulatedFluid t) {
            return t;
        }
        return new TabulatedFluid(exact, Tables.ROWS, Tables.COLS);
    }

    /**
     * Wraps a fluid with a grid of a chosen size (for studies of the table error).
     *
     * @param exact   the fluid to tabulate
     * @param rows    pressures, 8 to 2000
     * @param columns temperatures per phase, 8 to 2000
     * @return the tabulated fluid
     */
    public static TabulatedFluid of(Fluid exact, int rows, int columns) {
        Check.within("rows", rows, 8, 2000);
        Check.within("columns", columns, 8, 2000);
        return new TabulatedFluid(exact, rows, columns);
    }

    /** @return the wrapped exact fluid */
    public Fluid exact() {
        return exact;
    }

    /** @return what the tables cover (builds them if not yet built) */
    public Coverage coverage() {
        Tables t = tables();
        return new Coverage(t.pLow, t.pTop, t.tMin, t.tTop, t.rows, t.cols, t.glide, t.buildSeconds);
    }

    private Tables tables() {
        Tables t = tables;
        if (t == null) {
            synchronized (this) {
                t = tables;
                if (t == null) {
                    t = new Tables(exact, rows, cols);
                    tables = t;
                }
            }
        }
        return t;
    }

    @Override
    public String name() {
        return exact.name();
    }

    @Override
    public FluidInfo info() {
        return exact.info();
    }

    @Override
    public SaturationState saturationAtPressure(double pressure) {
        Check.finite("pressure", pressure);
        Tables t = tables();
        double r = t.row(pressure);
        if (r < 0) {
            return exact.saturationAtPressure(pressure);
        }
        int i = t.interval(r);
        double a = r - i;
        double tl = 1 / t.sat(Tables.LIQUID, Tables.INV_T, i, a);
        double tv = t.glide ? 1 / t.sat(Tables.VAPOUR, Tables.INV_T, i, a) : tl;
        return new SaturationState(t.satState(Tables.LIQUID, i, a, tl, pressure),
                t.satState(Tables.VAPOUR, i, a, tv, pressure));
    }

    @Override
    public SaturationState saturationAtTemperature(double temperature) {
        Check.finite("temperature", temperature);
        Tables t = tables();
        double pl = t.satPressure(Tables.LIQUID, temperature);
        double pv = t.glide ? t.satPressure(Tables.VAPOUR, temperature) : pl;
        if (pl < 0 || pv < 0) {
            return exact.saturationAtTemperature(temperature);
        }
        double rl = t.row(pl);
        int il = t.interval(rl);
        double rv = t.row(pv);
        int iv = t.interval(rv);
        return new SaturationState(t.satState(Tables.LIQUID, il, rl - il, temperature, pl),
                t.satState(Tables.VAPOUR, iv, rv - iv, temperature, pv));
    }

    @Override
    public FluidState at(InputPair pair, double a, double b) {
        if (pair == null) {
            throw new InputException("inputPair", Msg.MISSING);
        }
        FluidState s = switch (pair) {
            case TP -> atTP(Check.finite("temperature", a), Check.finite("pressure", b));
            case PH -> atPH(Check.finite("pressure", a), Check.finite("enthalpy", b));
            case PQ -> tables().glide ? null
                    : mix(saturationAtPressure(Check.finite("pressure", a)), Check.within("quality", b, 0, 1));
            case TQ -> tables().glide ? null
                    : mix(saturationAtTemperature(Check.finite("temperature", a)), Check.within("quality", b, 0, 1));
        };
        return s != null ? s : exact.at(pair, a, b);
    }

    /** The state at (T, p) from a grid, or null where the tables do not reach. */
    private FluidState atTP(double temperature, double pressure) {
        Tables t = tables();
        double r = t.row(pressure);
        if (r < 0) {
            return null;
        }
        int i = t.interval(r);
        double a = r - i;
        double tb = 1 / t.sat(Tables.LIQUID, Tables.INV_T, i, a);
        double td = t.glide ? 1 / t.sat(Tables.VAPOUR, Tables.INV_T, i, a) : tb;
        if (temperature < tb) {
            return t.atTemperature(Tables.LIQUID, i, a, tb, temperature, pressure);
        }
        if (temperature > td) {
            return t.atTemperature(Tables.VAPOUR, i, a, td, temperature, pressure);
        }
        return null;
    }

    /** The state at (p, h) from the tables, or null where they do not reach. */
    private FluidState atPH(double pressure, double enthalpy) {
        Tables t = tables();
        double r = t.row(pressure);
        if (r < 0) {
            return null;
        }
        int i = t.interval(r);
        double a = r - i;
        double hl = t.sat(Tables.LIQUID, Tables.H, i, a);
        double hv = t.sat(Tables.VAPOUR, Tables.H, i, a);
        double edge = 1e-9 * (hv - hl);
        if (enthalpy < hl - edge) {
            double tb = 1 / t.sat(Tables.LIQUID, Tables.INV_T, i, a);
            return t.atEnthalpy(Tables.LIQUID, i, a, tb, enthalpy, pressure);
        }
        if (enthalpy > hv + edge) {
            double td = 1 / t.sat(Tables.VAPOUR, Tables.INV_T, i, a);
            return t.atEnthalpy(Tables.VAPOUR, i, a, td, enthalpy, pressure);
        }
        if (t.glide) {
            return null;
        }
        double ts = 1 / t.sat(Tables.LIQUID, Tables.INV_T, i, a);
        SaturationState sat = new SaturationState(t.satState(Tables.LIQUID, i, a, ts, pressure),
                t.satState(Tables.VAPOUR, i, a, ts, pressure));
        if (enthalpy <= hl + edge) {
            return sat.liquid();
        }
        if (enthalpy >= hv - edge) {
            return sat.vapour();
        }
        return mix(sat, (enthalpy - hl) / (hv - hl));
    }

    /** Two-phase state of a pure fluid by the lever rule (specific volume, h and s linear in q). */
    private static FluidState mix(SaturationState sat, double q) {
        return TwoPhase.mix(sat, q, sat.liquid().temperature());
    }

    /**
     * Transport properties, tabulated like the states on first use. If the wrapped fluid has
     * none, this throws what the wrapped fluid throws.
     *
     * @return tabulated viscosity, conductivity and surface tension
     */
    @Override
    public TransportProperties transport() {
        TransportProperties source = exact.transport();
        TabulatedTransport tt = transport;
        if (tt == null) {
            synchronized (this) {
                tt = transport;
                if (tt == null) {
                    tt = new TabulatedTransport(source, tables());
                    transport = tt;
                }
            }
        }
        return tt;
    }

    @Override
    public String toString() {
        return exact.name() + " (tables from " + exact + ")";
    }
}
