package org.finstack.fluid.table;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * The interpolation building blocks against their defining property (de Boor, A Practical Guide
 * to Splines, ch. IV and XVII): a not-a-knot cubic spline reproduces every cubic polynomial, the
 * tensor-product spline every bicubic one, and the error of a smooth function falls with the
 * fourth power of the spacing.
 */
class SplinesTest {

    private static double cubic(double x) {
        return 2 - 3 * x + 0.5 * x * x - 0.25 * x * x * x;
    }

    @Test
    void notAKnotSplineReproducesACubicOnUnevenKnots() {
        double[] x = {-1, -0.7, 0.1, 0.3, 1.4, 2.0, 3.7};
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = cubic(x[i]);
        }
        Splines.Curve c = new Splines.Curve(x, y);
        for (double v = -1; v <= 3.7; v += 0.0137) {
            assertEquals(cubic(v), c.at(v), 1e-12, "at " + v);
        }
        double[] m = Splines.slopes(x, y);
        for (int i = 0; i < x.length; i++) {
            assertEquals(-3 + x[i] - 0.75 * x[i] * x[i], m[i], 1e-12, "slope at " + x[i]);
        }
    }

    @Test
    void gridReproducesABicubic() {
        int rows = 7;
        int cols = 5;
        double[][] v = new double[1][rows * cols];
        for (int i = 0; i < rows; i++) {
            for (int j = 0; j < cols; j++) {
                v[0][i * cols + j] = cubic(i) * (1 + j - 0.3 * j * j * j) + i * j;
            }
        }
        Grid g = new Grid(rows, cols, v);
        for (double r = 0; r <= rows - 1; r += 0.173) {
            for (double c = 0; c <= cols - 1; c += 0.219) {
                int i = Math.min((int) r, rows - 2);
                int j = Math.min((int) c, cols - 2);
                double expected = cubic(r) * (1 + c - 0.3 * c * c * c) + r * c;
                assertEquals(expected, g.value(0, i, j, Grid.weights(r - i, c - j)), 1e-10, r + ", " + c);
            }
        }
    }

    @Test
    void errorFallsWithTheFourthPowerOfTheSpacing() {
        double coarse = maxError(11);
        double fine = maxError(21);
        assertThat(coarse / fine).isBetween(12.0, 20.0);
    }

    private static double maxError(int n) {
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = (double) i / (n - 1);
            y[i] = Math.exp(2 * x[i]);
        }
        Splines.Curve c = new Splines.Curve(x, y);
        double err = 0;
        for (double v = 0; v <= 1; v += 1e-3) {
            err = Math.max(err, Math.abs(c.at(v) - Math.exp(2 * v)));
        }
        return err;
    }
}
