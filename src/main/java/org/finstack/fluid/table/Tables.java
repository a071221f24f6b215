package org.finstack.fluid.table;

import java.util.stream.IntStream;
import org.finstack.core.ConvergenceException;
import org.finstack.core.FinstackException;
import org.finstack.core.Msg;
import org.finstack.core.Numbers;
import org.finstack.fluid.Fluid;
import org.finstack.fluid.FluidInfo;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.InputPair;
import org.finstack.fluid.Phase;
import org.finstack.fluid.SaturationState;

/**
 * The tables of one fluid: the saturation line (bubble and dew side) as splines over a row
 * coordinate r of ln p, and one bicubic grid per single phase over (r, c), where the column
 * coordinate c runs from the saturation line (c = 0) to a fixed temperature bound (c = cols - 1):
 * T = T_sat(p) + (T_bound - T_sat(p)) (c / (cols - 1))^2, with T_bound the fluid's minimum
 * temperature for the liquid and a top temperature for the vapour. Each phase therefore has its
 * own grid that ends exactly on the saturation line, so no cell blends liquid and vapour; the
 * square in the column coordinate packs the columns near the saturation line, where cp changes
 * fastest.
 *
 * <p>Rows: ln p = x1 - (x1 - x0) (1 - r / (n - 1))^2 between x0 = ln p_low and x1 = ln p_top,
 * which packs rows towards the top, where the saturated properties approach the critical point.
 * The grids' row splines at c = 0 are the saturation splines themselves, so the phase boundary of
 * a (p, h) lookup is the same in the saturation line and in the grids.
 *
 * <p>Every node value comes from the wrapped fluid: saturated states from
 * {@link Fluid#saturationAtPressure}, single-phase states from {@link Fluid#at} with
 * {@link InputPair#TP}. Immutable after construction.
 */
final class Tables {

    /** Layers of the single-phase grids and of each side of the saturation line. */
    static final int LN_RHO = 0;
    /** Enthalpy [J/kg]. */
    static final int H = 1;
    /** Entropy [J/(kg K)]. */
    static final int S = 2;
    /** ln cp. */
    static final int LN_CP = 3;
    /** ln cv. */
    static final int LN_CV = 4;
    /** Speed of sound [m/s]. */
    static final int W = 5;
    /** 1/T [1/K], saturation line only. */
    static final int INV_T = 6;
    private static final int STATE_LAYERS = 6;

    /** Side index of the saturated liquid (bubble point). */
    static final int LIQUID = 0;
    /** Side index of the saturated vapour (dew point). */
    static final int VAPOUR = 1;

    /** Default rows (pressures) and columns (temperatures per phase). */
    static final int ROWS = 64;
    /** Default columns. */
    static final int COLS = 24;
    /** Margins below the critical temperature tried, in turn, for the top row [K]. */
    private static final double[] TOP_MARGINS = {2, 5, 10, 20, 40};
    /** The lowest row's bubble point lies this far above the minimum temperature [K]. */
    private static final double LOW_MARGIN = 2;
    /** The vapour grid reaches up to the critical temperature plus this [K], within the fluid's range. */
    private static final double VAPOUR_REACH = 100;
    /** A fluid whose dew and bubble temperatures differ by more than this is a blend [K]. */
    private static final double GLIDE = 1e-6;
    private static final int MAX_ITER = 60;
    /** Attempts at slightly shifted temperatures when the exact fluid does not converge at a node. */
    private static final int NODE_RETRIES = 10;

    final Fluid exact;
    final int rows;
    final int cols;
    final double x0;
    final double x1;
    final double pLow;
    final double pTop;
    final double tMin;
    final double tTop;
    final boolean glide;
    final double buildSeconds;
    /** [side][layer][row] values and slopes per row step. */
    private final double[][][] satY;
    private final double[][][] satM;
    /** ln p against 1/T (increasing 1/T) for the bubble and the dew line. */
    private final Splines.Curve[] lnpOfInvT;
    final FluidState[][] satNodes;
    final Grid liquid;
    final Grid vapour;
    final FluidState[] liquidNodes;
    final FluidState[] vapourNodes;

    /**
     * Builds the tables of a fluid.
     *
     * @param exact the wrapped fluid
     * @param rows  rows (pressures), at least 8
     * @param cols  columns per phase (temperatures), at least 8
     */
    Tables(Fluid exact, int rows, int cols) {
        long start = System.nanoTime();
        this.exact = exact;
        this.rows = rows;
        this.cols = cols;
        FluidInfo info = exact.info();
        this.tMin = info.minTemperature();
        double tc = info.criticalTemperature();
        this.pTop = topPressure(exact, tc);
        this.pLow = exact.saturationAtTemperature(tMin + LOW_MARGIN).bubblePressure();
        if (!(pLow < pTop)) {
            throw new FinstackException(Msg.IMPOSSIBLE, "no saturation range to tabulate for " + exact.name());
        }
        this.x0 = Math.log(pLow);
        this.x1 = Math.log(pTop);
        this.tTop = Math.min(info.maxTemperature(), tc + VAPOUR_REACH);

        satNodes = new FluidState[2][rows];
        SaturationState[] sats = IntStream.range(0, rows).parallel()
                .mapToObj(i -> exact.saturationAtPressure(rowPressure(i))).toArray(SaturationState[]::new);
        double maxGlide = 0;
        for (int i = 0; i < rows; i++) {
            satNodes[LIQUID][i] = sats[i].liquid();
            satNodes[VAPOUR][i] = sats[i].vapour();
            maxGlide = Math.max(maxGlide, Math.abs(sats[i].glide()));
        }
        this.glide = maxGlide > GLIDE;
        if (!(tTop > satNodes[VAPOUR][rows - 1].temperature() + 1)) {
            throw new FinstackException(Msg.IMPOSSIBLE, "no vapour range to tabulate for " + exact.name());
        }
        satY = new double[2][][];
        satM = new double[2][][];
        lnpOfInvT = new Splines.Curve[2];
        for (int side = 0; side < 2; side++) {
            satY[side] = new double[STATE_LAYERS + 1][rows];
            satM[side] = new double[STATE_LAYERS + 1][];
            double[] w = new double[rows];
            double[] x = new double[rows];
            for (int i = 0; i < rows; i++) {
                FluidState st = satNodes[side][i];
                layers(st, satY[side], i);
                satY[side][INV_T][i] = 1 / st.temperature();
                w[rows - 1 - i] = 1 / st.temperature();
                x[rows - 1 - i] = Math.log(st.pressure());
            }
            for (int k = 0; k <= STATE_LAYERS; k++) {
                satM[side][k] = Splines.slopesUniform(satY[side][k]);
            }
            lnpOfInvT[side] = new Splines.Curve(w, x);
        }
        liquidNodes = nodes(LIQUID, tMin);
        vapourNodes = nodes(VAPOUR, tTop);
        liquid = grid(liquidNodes);
        vapour = grid(vapourNodes);
        this.buildSeconds = (System.nanoTime() - start) * 1e-9;
    }

    private static double topPressure(Fluid f, double tc) {
        FinstackException last = null;
        for (double margin : TOP_MARGINS) {
            try {
                return f.saturationAtTemperature(tc - margin).dewPressure();
            } catch (FinstackException e) {
                last = e;
            }
        }
        throw last;
    }

    /** Pressure of row i [Pa]. */
    double rowPressure(int i) {
        if (i == rows - 1) {
            return pTop;
        }
        double y = 1 - (double) i / (rows - 1);
        return Math.exp(x1 - (x1 - x0) * y * y);
    }

    /**
     * @param p pressure [Pa]
     * @return the row coordinate r in [0, rows - 1], or -1 outside the tabulated pressures
     *         (NaN included)
     */
    double row(double p) {
        if (!(p >= pLow && p <= pTop)) {
            return -1;
        }
        double y = (x1 - Math.log(p)) / (x1 - x0);
        double r = (rows - 1) * (1 - Math.sqrt(Math.max(0, Math.min(1, y))));
        return r;
    }

    /** Row interval of a row coordinate. */
    int interval(double r) {
        return Math.min((int) r, rows - 2);
    }

    /**
     * @param side  {@link #LIQUID} or {@link #VAPOUR}
     * @param layer a layer
     * @param i     row interval
     * @param a     local coordinate in it
     * @return the saturated value
     */
    double sat(int side, int layer, int i, double a) {
        double[] y = satY[side][layer];
        double[] m = satM[side][layer];
        return Splines.hermite(y[i], m[i], y[i + 1], m[i + 1], a);
    }

    /**
     * Pressure on the bubble (liquid side) or dew (vapour side) line at a temperature.
     *
     * @param side side
     * @param t    temperature [K]
     * @return pressure [Pa], or -1 outside the tabulated range
     */
    double satPressure(int side, double t) {
        Splines.Curve c = lnpOfInvT[side];
        double w = 1 / t;
        if (!(w >= c.min() && w <= c.max())) {
            return -1;
        }
        return Math.min(pTop, Math.max(pLow, Math.exp(c.at(w))));
    }

    /** The saturated state of one side at a row position, at a given temperature [K]. */
    FluidState satState(int side, int i, double a, double t, double p) {
        return new FluidState(t, p, Math.exp(sat(side, LN_RHO, i, a)), sat(side, H, i, a), sat(side, S, i, a),
                Math.exp(sat(side, LN_CP, i, a)), Math.exp(sat(side, LN_CV, i, a)), sat(side, W, i, a),
                side == LIQUID ? Phase.LIQUID : Phase.VAPOUR, side == LIQUID ? 0 : 1);
    }

    /** @return the grid of a side */
    Grid grid(int side) {
        return side == LIQUID ? liquid : vapour;
    }

    /** @return the temperature bound of a side's grid [K] */
    double bound(int side) {
        return side == LIQUID ? tMin : tTop;
    }

    /**
     * A single-phase state from a grid at a given temperature.
     *
     * @param side side
     * @param i    row interval
     * @param a    local row coordinate
     * @param ts   saturation temperature of that side at p [K]
     * @param t    temperature [K]
     * @param p    pressure [Pa]
     * @return the state, or null outside the grid
     */
    FluidState atTemperature(int side, int i, double a, double ts, double t, double p) {
        double c = column(side, ts, t);
        if (c < 0) {
            return null;
        }
        int j = Math.min((int) c, cols - 2);
        double[] w = Grid.weights(a, c - j);
        Grid g = grid(side);
        return state(g, i, j, w, t, p, g.value(H, i, j, w), side);
    }

    /**
     * Column coordinate of a temperature in a side's grid.
     *
     * @return c in [0, cols - 1], or -1 outside the grid
     */
    double column(int side, double ts, double t) {
        double theta = (t - ts) / (bound(side) - ts);
        if (!(theta >= 0 && theta <= 1)) {
            return -1;
        }
        return Math.sqrt(theta) * (cols - 1);
    }

    /**
     * A single-phase state from a grid at a given enthalpy: the column is found by bisection over
     * the grid columns, then Newton's method (safeguarded by bisection) on the cubic of the cell.
     *
     * @return the state, or null if h lies beyond the grid's far edge
     */
    FluidState atEnthalpy(int side, int i, double a, double ts, double h, double p) {
        Grid g = grid(side);
        int last = cols - 1;
        double hFirst = g.onColumn(H, i, a, 0);
        double hLast = g.onColumn(H, i, a, last);
        double dir = Math.signum(hLast - hFirst);
        if (!((h - hFirst) * dir >= 0 && (hLast - h) * dir >= 0)) {
            return null;
        }
        int lo = 0;
        int hi = last;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if ((g.onColumn(H, i, a, mid) - h) * dir > 0) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        double y0 = g.onColumn(H, i, a, lo);
        double y1 = g.onColumn(H, i, a, lo + 1);
        double m0 = g.slopeOnColumn(H, i, a, lo);
        double m1 = g.slopeOnColumn(H, i, a, lo + 1);
        double b = cellRoot(y0, m0, y1, m1, h);
        double c = lo + b;
        double u = c / last;
        double t = ts + (bound(side) - ts) * u * u;
        return state(g, i, lo, Grid.weights(a, b), t, p, h, side);
    }

    /** Solves hermite(y0, m0, y1, m1, b) = h for b in [0, 1] (y0, y1 bracket h). */
    private double cellRoot(double y0, double m0, double y1, double m1, double h) {
        double lo = 0;
        double hi = 1;
        double dir = Math.signum(y1 - y0);
        if (dir == 0) {
            return 0;
        }
        double b = Math.max(0, Math.min(1, (h - y0) / (y1 - y0)));
        double tol = 1e-13 * (Math.abs(y0) + Math.abs(y1) + 1);
        double f = Double.NaN;
        for (int it = 0; it < MAX_ITER; it++) {
            f = Splines.hermite(y0, m0, y1, m1, b) - h;
            if (Math.abs(f) <= tol) {
                return b;
            }
            if (f * dir > 0) {
                hi = b;
            } else {
                lo = b;
            }
            double slope = Splines.hermiteSlope(y0, m0, y1, m1, b);
            double next = b - f / slope;
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - b) <= 1e-15) {
                return next;
            }
            b = next;
        }
        throw new ConvergenceException(exact.name() + " table column at h = " + Numbers.brief(h) + " J/kg",
                MAX_ITER, f);
    }

    private static FluidState state(Grid g, int i, int j, double[] w, double t, double p, double h, int side) {
        return new FluidState(t, p, Math.exp(g.value(LN_RHO, i, j, w)), h, g.value(S, i, j, w),
                Math.exp(g.value(LN_CP, i, j, w)), Math.exp(g.value(LN_CV, i, j, w)), g.value(W, i, j, w),
                side == LIQUID ? Phase.LIQUID : Phase.VAPOUR, FluidState.NO_QUALITY);
    }

    /** Exact states at the grid nodes of one side; rows are computed in parallel. */
    private FluidState[] nodes(int side, double bound) {
        FluidState[] out = new FluidState[rows * cols];
        IntStream.range(0, rows).parallel().forEach(i -> {
            FluidState sat = satNodes[side][i];
            double ts = sat.temperature();
            double p = sat.pressure();
            out[i * cols] = sat;
            for (int j = 1; j < cols; j++) {
                double u = (double) j / (cols - 1);
                double t = j == cols - 1 ? bound : ts + (bound - ts) * u * u;
                out[i * cols + j] = node(t, p, Math.signum(bound - ts));
            }
        });
        return out;
    }

    /**
     * The exact state at (T, p). Should the exact fluid's iteration stall at this point (it can,
     * at the rounding level, close to the critical point), the state is taken up to 1e-6 K closer to
     * the saturation line: a shift far below the interpolation error.
     */
    private FluidState node(double t, double p, double outward) {
        ConvergenceException failure = null;
        for (int k = 0; k <= NODE_RETRIES; k++) {
            double shift = k * 1e-7 * outward;
            try {
                return exact.at(InputPair.TP, t - shift, p);
            } catch (ConvergenceException e) {
                failure = e;
            }
        }
        throw failure;
    }

    private Grid grid(FluidState[] nodes) {
        double[][] v = new double[STATE_LAYERS][nodes.length];
        for (int n = 0; n < nodes.length; n++) {
            layers(nodes[n], v, n);
        }
        return new Grid(rows, cols, v);
    }

    private static void layers(FluidState st, double[][] into, int n) {
        into[LN_RHO][n] = Math.log(st.density());
        into[H][n] = st.enthalpy();
        into[S][n] = st.entropy();
        into[LN_CP][n] = Math.log(st.cp());
        into[LN_CV][n] = Math.log(st.cv());
        into[W][n] = st.speedOfSound();
    }
}
