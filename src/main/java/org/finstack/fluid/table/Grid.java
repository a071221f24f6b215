package org.finstack.fluid.table;

/**
 * Values of several properties ("layers") on a rectangular grid of unit spacing in two index
 * coordinates (r along the rows, c along the columns), interpolated by bicubic Hermite patches
 * whose node derivatives f_r, f_c and f_rc come from not-a-knot splines along the grid lines
 * ({@link Splines}): the tensor-product cubic spline of de Boor (A Practical Guide to Splines,
 * ch. XVII). The surface is continuously differentiable and exact for bicubic polynomials.
 * Immutable after construction.
 */
final class Grid {

    private final int rows;
    private final int cols;
    /** Per layer: for node (i, j) at 4 (i cols + j): f, f_r, f_c, f_rc. */
    private final double[][] data;

    /**
     * @param rows   number of rows (at least 4)
     * @param cols   number of columns (at least 4)
     * @param values per layer, the node values at index i cols + j
     */
    Grid(int rows, int cols, double[][] values) {
        this.rows = rows;
        this.cols = cols;
        this.data = new double[values.length][];
        for (int k = 0; k < values.length; k++) {
            data[k] = layer(values[k]);
        }
    }

    private double[] layer(double[] f) {
        double[] out = new double[4 * rows * cols];
        double[] fc = new double[rows * cols];
        double[] col = new double[rows];
        double[] row = new double[cols];
        for (int i = 0; i < rows; i++) {
            System.arraycopy(f, i * cols, row, 0, cols);
            double[] m = Splines.slopesUniform(row);
            System.arraycopy(m, 0, fc, i * cols, cols);
        }
        for (int j = 0; j < cols; j++) {
            for (int i = 0; i < rows; i++) {
                col[i] = f[i * cols + j];
            }
            double[] fr = Splines.slopesUniform(col);
            for (int i = 0; i < rows; i++) {
                col[i] = fc[i * cols + j];
            }
            double[] frc = Splines.slopesUniform(col);
            for (int i = 0; i < rows; i++) {
                int n = i * cols + j;
                out[4 * n] = f[n];
                out[4 * n + 1] = fr[i];
                out[4 * n + 2] = fc[n];
                out[4 * n + 3] = frc[i];
            }
        }
        return out;
    }

    /** @return number of rows */
    int rows() {
        return rows;
    }

    /** @return number of columns */
    int cols() {
        return cols;
    }

    /**
     * Value of a layer along grid column j at a row position between rows i and i+1.
     *
     * @param k layer
     * @param i row interval
     * @param a local row coordinate in [0, 1]
     * @param j column
     * @return the value
     */
    double onColumn(int k, int i, double a, int j) {
        double[] d = data[k];
        int n0 = 4 * (i * cols + j);
        int n1 = n0 + 4 * cols;
        return Splines.hermite(d[n0], d[n0 + 1], d[n1], d[n1 + 1], a);
    }

    /**
     * Column derivative f_c of a layer along grid column j at a row position.
     *
     * @param k layer
     * @param i row interval
     * @param a local row coordinate in [0, 1]
     * @param j column
     * @return df/dc
     */
    double slopeOnColumn(int k, int i, double a, int j) {
        double[] d = data[k];
        int n0 = 4 * (i * cols + j);
        int n1 = n0 + 4 * cols;
        return Splines.hermite(d[n0 + 2], d[n0 + 3], d[n1 + 2], d[n1 + 3], a);
    }

    /**
     * The 16 weights of a point in cell (i, j) at local coordinates (a, b), for {@link #value}.
     *
     * @param a local row coordinate in [0, 1]
     * @param b local column coordinate in [0, 1]
     * @return weights
     */
    static double[] weights(double a, double b) {
        double a0 = Splines.h00(a);
        double a1 = Splines.h10(a);
        double a2 = Splines.h01(a);
        double a3 = Splines.h11(a);
        double b0 = Splines.h00(b);
        double b1 = Splines.h10(b);
        double b2 = Splines.h01(b);
        double b3 = Splines.h11(b);
        return new double[] {
            a0 * b0, a1 * b0, a0 * b1, a1 * b1,
            a2 * b0, a3 * b0, a2 * b1, a3 * b1,
            a0 * b2, a1 * b2, a0 * b3, a1 * b3,
            a2 * b2, a3 * b2, a2 * b3, a3 * b3,
        };
    }

    /**
     * @param k layer
     * @param i row interval (0 to rows - 2)
     * @param j column interval (0 to cols - 2)
     * @param w weights from {@link #weights}
     * @return the interpolated value
     */
    double value(int k, int i, int j, double[] w) {
        double[] d = data[k];
        int p = 4 * (i * cols + j);
        int q = p + 4 * cols;
        return w[0] * d[p] + w[1] * d[p + 1] + w[2] * d[p + 2] + w[3] * d[p + 3]
                + w[4] * d[q] + w[5] * d[q + 1] + w[6] * d[q + 2] + w[7] * d[q + 3]
                + w[8] * d[p + 4] + w[9] * d[p + 5] + w[10] * d[p + 6] + w[11] * d[p + 7]
                + w[12] * d[q + 4] + w[13] * d[q + 5] + w[14] * d[q + 6] + w[15] * d[q + 7];
    }
}
