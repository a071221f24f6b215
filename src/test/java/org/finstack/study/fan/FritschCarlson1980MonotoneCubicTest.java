package org.finstack.study.fan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.apache.commons.math3.analysis.interpolation.SplineInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;
import org.finstack.core.InputException;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/** Checks of the monotone cubic interpolant against the equations of Fritsch &amp; Carlson (1980). */
class FritschCarlson1980MonotoneCubicTest {

    /**
     * Javadoc worked example, recomputed here by hand from the paper's steps: secants -40, -160,
     * -400; first-guess slopes -40, -100, -280, -400; (a, b) = (1, 2.5), (0.625, 1.75),
     * (0.7, 1) all inside the circle of radius 3, so no limiting; at t = 1/2 the Hermite basis
     * gives y = (y1 + y2)/2 + h (m1 - m2)/8.
     */
    @Test
    void workedExampleFromThePaperSteps() {
        FritschCarlson1980MonotoneCubic f = new FritschCarlson1980MonotoneCubic("t",
                new double[] {0, 0.5, 1.0, 1.5}, new double[] {300, 280, 200, 0});
        double byHand = (280 + 200) / 2.0 + 0.5 * (-100 - -280) / 8;
        Reference.assertRelative(byHand, f.value(0.75), 1e-14, "Fritsch-Carlson worked example");
        Reference.assertRelative(251.25, f.value(0.75), 1e-14, "Javadoc worked example value");
        assertThat(f.slopes()).containsExactly(-40, -100, -280, -400);
    }

    /** Step 4 of the paper: (a, b) outside the circle of radius 3 is pulled onto it. */
    @Test
    void slopesOutsideTheCircleOfRadiusThreeAreLimited() {
        // secants 0.1 and 10: first guesses 0.1, 5.05, 10; on the first interval a = 1, b = 50.5
        FritschCarlson1980MonotoneCubic f = new FritschCarlson1980MonotoneCubic("t",
                new double[] {0, 1, 2}, new double[] {0, 0.1, 10.1});
        double[] m = f.slopes();
        double a = m[0] / 0.1;
        double b = m[1] / 0.1;
        Reference.assertRelative(9, a * a + b * b, 1e-12, "a^2 + b^2 after limiting");
    }

    @Test
    void straightLineDataAreReproducedExactly() {
        FritschCarlson1980MonotoneCubic f = new FritschCarlson1980MonotoneCubic("t",
                new double[] {0, 0.3, 1.1, 2.0}, new double[] {250, 212.5, 112.5, 0});
        for (double q = 0; q <= 2.0; q += 0.01) {
            Reference.assertRelative(250 * (1 - q / 2), f.value(q), 1e-12, "line at " + q);
        }
    }

    @Test
    void passesThroughEveryPoint() {
        double[] x = {0, 0.4, 0.9, 1.3, 2.0};
        double[] y = {5, 5, 3, 2.9, 0};
        FritschCarlson1980MonotoneCubic f = new FritschCarlson1980MonotoneCubic("t", x, y);
        for (int i = 0; i < x.length; i++) {
            assertThat(f.value(x[i])).isEqualTo(y[i]);
        }
    }

    /**
     * Data with a sharp knee, on which an ordinary (natural) cubic spline overshoots: the same
     * check that passes for the monotone interpolant fails for the natural spline, so the check
     * can fail.
     */
    @Test
    void neverOvershootsWhereANaturalSplineDoes() {
        double[] x = {0, 1, 2, 3, 4};
        double[] y = {100, 99, 98, 10, 0};
        FritschCarlson1980MonotoneCubic f = new FritschCarlson1980MonotoneCubic("t", x, y);
        PolynomialSplineFunction natural = new SplineInterpolator().interpolate(x, y);
        boolean naturalOvershoots = false;
        for (int k = 0; k < x.length - 1; k++) {
            double lo = Math.min(y[k], y[k + 1]);
            double hi = Math.max(y[k], y[k + 1]);
            double previous = Double.POSITIVE_INFINITY;
            for (int j = 0; j <= 200; j++) {
                double at = x[k] + (x[k + 1] - x[k]) * j / 200.0;
                double v = f.value(at);
                assertThat(v).as("monotone interpolant at %s", at).isBetween(lo, hi);
                assertThat(v).as("non-increasing at %s", at).isLessThanOrEqualTo(previous);
                previous = v;
                double s = natural.value(at);
                naturalOvershoots |= s > hi + 1e-9 || s < lo - 1e-9;
            }
        }
        assertThat(naturalOvershoots).as("the natural spline overshoots these data").isTrue();
    }

    @Test
    void refusesToExtrapolate() {
        FritschCarlson1980MonotoneCubic f = new FritschCarlson1980MonotoneCubic("t",
                new double[] {0, 1}, new double[] {1, 0});
        assertThatThrownBy(() -> f.value(1.0001)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("t.at:");
        assertThatThrownBy(() -> f.value(-0.1)).isInstanceOf(InputException.class);
    }

    @Test
    void rejectsAbscissaeThatDoNotIncrease() {
        assertThatThrownBy(() -> new FritschCarlson1980MonotoneCubic("t", new double[] {0, 1, 1},
                new double[] {3, 2, 1})).isInstanceOf(InputException.class)
                .hasMessage("t[2].x: must be greater than 1, got 1");
        assertThatThrownBy(() -> new FritschCarlson1980MonotoneCubic("t", new double[] {0},
                new double[] {3})).isInstanceOf(InputException.class).hasMessageContaining("at least 2 points");
        assertThatThrownBy(() -> new FritschCarlson1980MonotoneCubic("t", new double[] {0, Double.NaN},
                new double[] {3, 2})).isInstanceOf(InputException.class).hasMessageStartingWith("t[1].x");
    }
}
