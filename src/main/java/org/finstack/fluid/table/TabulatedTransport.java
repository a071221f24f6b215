package org.finstack.fluid.table;

import java.util.List;
import org.finstack.core.Citation;
import org.finstack.core.FinstackException;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.Phase;
import org.finstack.fluid.TransportProperties;

/**
 * Transport properties of a {@link TabulatedFluid}: ln(viscosity) and ln(conductivity) on the same
 * saturation splines and single-phase grids as the states, and the surface tension along the
 * bubble line, all taken from the wrapped fluid's transport properties at the table nodes.
 * States the tables do not cover (two-phase, supercritical, outside the tabulated pressures or
 * temperatures) go to the wrapped properties, which also decide what to refuse. If the wrapped
 * properties refuse a node state, nothing is tabulated and every call goes to them. Immutable.
 */
final class TabulatedTransport implements TransportProperties {

    private static final int MU = 0;
    private static final int K = 1;

    private final TransportProperties source;
    private final Tables tables;
    /** [side][MU, K, sigma][row] and slopes. */
    private final double[][][] satY;
    private final double[][][] satM;
    private final Grid liquid;
    private final Grid vapour;

    /**
     * @param source the wrapped fluid's transport properties
     * @param tables the state tables whose nodes are used
     */
    TabulatedTransport(TransportProperties source, Tables tables) {
        this.source = source;
        double[][][] y = null;
        double[][][] m = null;
        Grid l = null;
        Grid v = null;
        try {
            int n = tables.rows;
            y = new double[2][3][n];
            m = new double[2][3][];
            for (int side = 0; side < 2; side++) {
                for (int i = 0; i < n; i++) {
                    FluidState s = tables.satNodes[side][i];
                    y[side][MU][i] = Math.log(source.viscosity(s));
                    y[side][K][i] = Math.log(source.conductivity(s));
                    y[side][2][i] = side == Tables.LIQUID ? source.surfaceTension(s.temperature()) : 0;
                }
                for (int k = 0; k < 3; k++) {
                    m[side][k] = Splines.slopesUniform(y[side][k]);
                }
            }
            l = grid(source, tables, tables.liquidNodes);
            v = grid(source, tables, tables.vapourNodes);
        } catch (FinstackException e) {
            y = null;
        }
        boolean ok = y != null;
        this.tables = ok ? tables : null;
        this.satY = ok ? y : null;
        this.satM = ok ? m : null;
        this.liquid = ok ? l : null;
        this.vapour = ok ? v : null;
    }

    private static Grid grid(TransportProperties source, Tables tables, FluidState[] nodes) {
        double[][] v = new double[2][nodes.length];
        for (int n = 0; n < nodes.length; n++) {
            v[MU][n] = Math.log(source.viscosity(nodes[n]));
            v[K][n] = Math.log(source.conductivity(nodes[n]));
        }
        return new Grid(tables.rows, tables.cols, v);
    }

    @Override
    public double viscosity(FluidState state) {
        double v = lookup(state, MU);
        return Double.isNaN(v) ? source.viscosity(state) : Math.exp(v);
    }

    @Override
    public double conductivity(FluidState state) {
        double v = lookup(state, K);
        return Double.isNaN(v) ? source.conductivity(state) : Math.exp(v);
    }

    @Override
    public double surfaceTension(double temperature) {
        if (tables == null) {
            return source.surfaceTension(temperature);
        }
        double p = tables.satPressure(Tables.LIQUID, temperature);
        if (p < 0) {
            return source.surfaceTension(temperature);
        }
        double r = tables.row(p);
        int i = tables.interval(r);
        return sat(Tables.LIQUID, 2, i, r - i);
    }

    @Override
    public List<Citation> sources() {
        return source.sources();
    }

    @Override
    public String accuracy() {
        return source.accuracy() + "; tabulated, within about 0.1 % of these values over the tables' range";
    }

    private double sat(int side, int layer, int i, double a) {
        double[] y = satY[side][layer];
        double[] m = satM[side][layer];
        return Splines.hermite(y[i], m[i], y[i + 1], m[i + 1], a);
    }

    /** ln of the property from the tables, or NaN where they do not cover the state. */
    private double lookup(FluidState state, int layer) {
        if (tables == null || state.phase() == Phase.TWO_PHASE || state.phase() == Phase.SUPERCRITICAL) {
            return Double.NaN;
        }
        double r = tables.row(state.pressure());
        if (r < 0) {
            return Double.NaN;
        }
        int i = tables.interval(r);
        double a = r - i;
        int side = state.phase() == Phase.LIQUID ? Tables.LIQUID : Tables.VAPOUR;
        if (state.quality() == 0 || state.quality() == 1) {
            return sat(state.quality() == 0 ? Tables.LIQUID : Tables.VAPOUR, layer, i, a);
        }
        double ts = 1 / tables.sat(side, Tables.INV_T, i, a);
        double c = tables.column(side, ts, state.temperature());
        if (c < 0) {
            return Double.NaN;
        }
        int j = Math.min((int) c, tables.cols - 2);
        Grid g = side == Tables.LIQUID ? liquid : vapour;
        return g.value(layer, i, j, Grid.weights(a, c - j));
    }
}
