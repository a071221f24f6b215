package org.finstack.exchanger;

/**
 * Independent numerical models of the exchangers, written for the tests from the energy balances
 * alone (no effectiveness relation is used): ODE integration for counterflow and parallel flow, a
 * cell-by-cell grid for single-pass crossflow, and a row-by-row march for counter-crossflow. All
 * work in scaled temperatures (hot inlet 1, cold inlet 0) and return q / (C<sub>min</sub> * 1).
 * They are the independent reference the effectiveness relations are checked against.
 */
final class NumericalExchanger {

    private NumericalExchanger() {
    }

    /**
     * Counterflow or parallel flow by classical Runge-Kutta on the two stream temperatures along
     * the exchanger, the hot fluid taken as C<sub>min</sub>. Counterflow closes its split boundary
     * condition by two shots (the problem is linear in the unknown cold outlet).
     */
    static double twoStream(boolean counter, double ntu, double cr, int steps) {
        if (!counter) {
            return 1 - march(false, ntu, cr, 0, steps)[0];
        }
        double[] shot0 = march(true, ntu, cr, 0, steps);
        double[] shot1 = march(true, ntu, cr, 1, steps);
        // cold temperature at x = 1 (its inlet) must be 0: linear in the guessed cold outlet g
        double g = -shot0[1] / (shot1[1] - shot0[1]);
        double hotOut = shot0[0] + g * (shot1[0] - shot0[0]);
        return 1 - hotOut;
    }

    /** Returns {hot, cold} at x = 1 starting from hot = 1, cold = cold0 at x = 0. */
    private static double[] march(boolean counter, double ntu, double cr, double cold0, int steps) {
        double h = 1.0 / steps;
        double th = 1;
        double tc = cold0;
        double sign = counter ? -1 : 1;
        for (int i = 0; i < steps; i++) {
            double k1h = -ntu * (th - tc);
            double k1c = sign * ntu * cr * (th - tc);
            double th2 = th + h / 2 * k1h;
            double tc2 = tc + h / 2 * k1c;
            double k2h = -ntu * (th2 - tc2);
            double k2c = sign * ntu * cr * (th2 - tc2);
            double th3 = th + h / 2 * k2h;
            double tc3 = tc + h / 2 * k2c;
            double k3h = -ntu * (th3 - tc3);
            double k3c = sign * ntu * cr * (th3 - tc3);
            double th4 = th + h * k3h;
            double tc4 = tc + h * k3c;
            double k4h = -ntu * (th4 - tc4);
            double k4c = sign * ntu * cr * (th4 - tc4);
            th += h / 6 * (k1h + 2 * k2h + 2 * k3h + k4h);
            tc += h / 6 * (k1c + 2 * k2c + 2 * k3c + k4c);
        }
        return new double[] {th, tc};
    }

    /**
     * Single-pass crossflow on an m x m grid of cells. Fluid 1 (C<sub>min</sub> = 1, inlet 1)
     * flows along x, fluid 2 (C<sub>max</sub> = 1/cr, inlet 0) along y. Each cell exchanges
     * q = u (mean of its fluid-1 temperatures - mean of its fluid-2 temperatures), solved exactly
     * for the cell (second order in the cell size). A mixed fluid has one temperature across its
     * passage at each station along its path: across a whole strip of cells it is taken at its
     * strip mean (inlet plus half the strip's heat over its capacity), found from the strip's
     * heat, which is affine in that mean.
     */
    static double crossflowGrid(double ntu, double cr, int m, boolean mix1, boolean mix2) {
        double u = ntu / ((double) m * m);
        double c1 = 1.0 / m;
        double c2 = 1.0 / cr / m;
        if (mix1) {
            // column by column: fluid 1 (capacity 1) has one temperature per column
            double t1 = 1;
            double q = 0;
            for (int i = 0; i < m; i++) {
                double q0 = mixedStrip(0, u, c2, m, false);
                double q1 = mixedStrip(1, u, c2, m, false);
                double mean = (t1 - q0 / 2) / (1 + (q1 - q0) / 2);
                double dq = mixedStrip(mean, u, c2, m, false);
                t1 -= dq;
                q += dq;
            }
            return q;
        }
        if (mix2) {
            // row by row: fluid 2 (capacity 1/cr) has one temperature per row
            double t2 = 0;
            double q = 0;
            double cap2 = 1 / cr;
            for (int j = 0; j < m; j++) {
                double q0 = mixedStrip(0, u, c1, m, true);
                double q1 = mixedStrip(1, u, c1, m, true);
                // mean = t2 + Q(mean) / (2 cap2), Q affine: Q(T) = q0 + T (q1 - q0)
                double mean = (t2 + q0 / (2 * cap2)) / (1 - (q1 - q0) / (2 * cap2));
                double dq = mixedStrip(mean, u, c1, m, true);
                t2 += dq / cap2;
                q += dq;
            }
            return q;
        }
        double denom = 1 + u / (2 * c1) + u / (2 * c2);
        double q = 0;
        double[] t2 = new double[m];
        for (int j = 0; j < m; j++) {
            double t1 = 1;
            for (int i = 0; i < m; i++) {
                double dq = u * (t1 - t2[i]) / denom;
                t1 -= dq / c1;
                t2[i] += dq / c2;
                q += dq;
            }
        }
        return q;
    }

    /**
     * Heat passed across one strip of m cells in which the mixed fluid has the fixed temperature
     * {@code mixed} and the unmixed fluid (capacity c per cell stream) marches along the strip.
     *
     * @param unmixedIsHot whether the unmixed fluid is the hot one (inlet 1) or the cold one (inlet 0)
     */
    private static double mixedStrip(double mixed, double u, double c, int m, boolean unmixedIsHot) {
        double t = unmixedIsHot ? 1 : 0;
        double q = 0;
        for (int k = 0; k < m; k++) {
            // hot-to-cold heat of the cell with the unmixed fluid at its cell mean
            double dq = unmixedIsHot
                    ? u * (t - mixed) / (1 + u / (2 * c))
                    : u * (mixed - t) / (1 + u / (2 * c));
            t += unmixedIsHot ? -dq / c : dq / c;
            q += dq;
        }
        return q;
    }

    /** Richardson extrapolation of the crossflow grid (second-order scheme, m and 2m). */
    static double crossflowGridExtrapolated(double ntu, double cr, int m, boolean mix1, boolean mix2) {
        double coarse = crossflowGrid(ntu, cr, m, mix1, mix2);
        double fine = crossflowGrid(ntu, cr, 2 * m, mix1, mix2);
        return (4 * fine - coarse) / 3;
    }

    /**
     * Counter-crossflow with {@code rows} tube rows: the air (inlet 0) crosses row 1 first and
     * is unmixed (one stream per cell along the tube); the tube fluid (inlet 1) enters the last
     * row, runs row by row towards row 1 and reverses direction in each row. Each of the m cells
     * of a row sees one tube temperature across the row depth, so the air leaving a cell is
     * T + (A - T) exp(-n) with n the air NTU of one row; the tube temperature along the row follows
     * by the trapezoidal rule. The counterflow coupling is closed by marching backwards from a
     * tube outlet of 1 and scaling (the problem is linear).
     */
    static double counterCrossflow(int rows, double ntu, double cr, boolean airIsCmin, int m) {
        double cAir = airIsCmin ? 1 : 1 / cr;
        double cTube = airIsCmin ? 1 / cr : 1;
        double ua = ntu;                      // NTU * Cmin with Cmin = 1
        double nRow = ua / rows / cAir;       // air NTU of one row
        double k = 1 - Math.exp(-nRow);
        double ca = cAir / m;                 // air capacity through one cell
        double[] air = new double[m];
        double tube = 1;                      // tube outlet of row 1 (scaled later)
        double firstOutlet = tube;
        for (int r = 0; r < rows; r++) {
            boolean forward = r % 2 == 0;     // row 1 flows towards +x, row 2 back, ...
            for (int step = 0; step < m; step++) {
                int i = forward ? m - 1 - step : step; // walk against the tube flow
                double tOut = tube;
                double dq = ca * k * (tOut - air[i]) / (1 - ca * k / (2 * cTube));
                double tIn = tOut + dq / cTube;
                air[i] += dq / ca;
                tube = tIn;
            }
        }
        double scale = tube;                  // tube inlet of the last row for outlet 1
        double q = cTube * (1 - firstOutlet / scale);
        return q / Math.min(cAir, cTube);
    }

    /** Richardson extrapolation of the row march (second order, m and 2m). */
    static double counterCrossflowExtrapolated(int rows, double ntu, double cr, boolean airIsCmin, int m) {
        double coarse = counterCrossflow(rows, ntu, cr, airIsCmin, m);
        double fine = counterCrossflow(rows, ntu, cr, airIsCmin, 2 * m);
        return (4 * fine - coarse) / 3;
    }
}
