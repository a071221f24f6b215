package org.finstack.core.math;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.finstack.testing.Reference.assertRelative;

import java.util.List;
import java.util.Locale;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/** Checks of {@link Bessel} against published tables, scipy.special and identities. */
class BesselTest {

    /**
     * Abramowitz &amp; Stegun 1964, Table 9.8 (columns e<sup>-x</sup>I<sub>0</sub>,
     * e<sup>-x</sup>I<sub>1</sub>, e<sup>x</sup>K<sub>0</sub>, e<sup>x</sup>K<sub>1</sub>),
     * values from memory, kept to nine decimals; tolerance 3e-9 (half a unit in the ninth decimal).
     */
    @Test
    void abramowitzStegunTable98() {
        double tol = 3e-9; // half a unit in the ninth decimal of values near 0.18
        // x = 1, A&S Table 9.8 (from memory)
        assertRelative(0.465759608, Bessel.i0e(1), tol, "A&S Table 9.8 exp(-x)I0(1)");
        assertRelative(0.207910415, Bessel.i1e(1), tol, "A&S Table 9.8 exp(-x)I1(1)");
        assertRelative(1.144463080, Bessel.k0e(1), tol, "A&S Table 9.8 exp(x)K0(1)");
        assertRelative(1.636153486, Bessel.k1e(1), tol, "A&S Table 9.8 exp(x)K1(1)");
        // x = 2, A&S Table 9.8 (from memory)
        assertRelative(0.308508323, Bessel.i0e(2), tol, "A&S Table 9.8 exp(-x)I0(2)");
        assertRelative(0.215269289, Bessel.i1e(2), tol, "A&S Table 9.8 exp(-x)I1(2)");
        assertRelative(0.841568215, Bessel.k0e(2), tol, "A&S Table 9.8 exp(x)K0(2)");
        assertRelative(1.033476847, Bessel.k1e(2), tol, "A&S Table 9.8 exp(x)K1(2)");
        // x = 5, A&S Table 9.8 (from memory)
        assertRelative(0.183540813, Bessel.i0e(5), tol, "A&S Table 9.8 exp(-x)I0(5)");
        assertRelative(0.163972267, Bessel.i1e(5), tol, "A&S Table 9.8 exp(-x)I1(5)");
        assertRelative(0.600273859, Bessel.k1e(5), tol, "A&S Table 9.8 exp(x)K1(5)");
        // unscaled at x = 1, A&S Table 9.8 (from memory)
        assertRelative(1.266065878, Bessel.i0(1), tol, "A&S Table 9.8 I0(1)");
        assertRelative(0.565159104, Bessel.i1(1), tol, "A&S Table 9.8 I1(1)");
        assertRelative(0.421024438, Bessel.k0(1), tol, "A&S Table 9.8 K0(1)");
        assertRelative(0.601907230, Bessel.k1(1), tol, "A&S Table 9.8 K1(1)");
    }

    /** Against scipy.special over [1e-3, 50]: reference/bessel_scipy.csv (its header gives 1e-14). */
    @Test
    void matchesScipyReference() {
        List<double[]> rows = Reference.csv("/reference/bessel_scipy.csv");
        assertThat(rows).hasSizeGreaterThan(150);
        double tol = 1e-14;
        for (double[] r : rows) {
            double x = r[0];
            String at = String.format(Locale.ROOT, " at x = %.17g (scipy.special)", x);
            assertRelative(r[1], Bessel.i0(x), tol, "i0" + at);
            assertRelative(r[2], Bessel.i1(x), tol, "i1" + at);
            assertRelative(r[3], Bessel.k0(x), tol, "k0" + at);
            assertRelative(r[4], Bessel.k1(x), tol, "k1" + at);
            assertRelative(r[5], Bessel.i0e(x), tol, "i0e" + at);
            assertRelative(r[6], Bessel.i1e(x), tol, "i1e" + at);
            assertRelative(r[7], Bessel.k0e(x), tol, "k0e" + at);
            assertRelative(r[8], Bessel.k1e(x), tol, "k1e" + at);
        }
    }

    /** The Javadoc example of {@link Bessel}, repeated verbatim. */
    @Test
    void javadocExample() {
        assertRelative(0.4657596076, Bessel.i0e(1), 3e-10, "Bessel Javadoc example i0e(1)");
        assertRelative(1.266065878, Bessel.i0(1), 1e-9, "Bessel Javadoc example I0(1)");
        assertRelative(0.4210244382, Bessel.k0(1), 1e-9, "Bessel Javadoc example K0(1)");
    }

    /**
     * The Wronskian I<sub>0</sub>(x) K<sub>1</sub>(x) + I<sub>1</sub>(x) K<sub>0</sub>(x) = 1/x
     * (A&amp;S 9.6.15), in scaled form, far beyond the tabulated range.
     */
    @Test
    void wronskianHoldsFromTinyToHugeArguments() {
        for (double x : new double[] {1e-8, 1e-3, 0.3, 0.999999, 1.000001, 3.7, 19.9999, 20.0001,
                60, 500, 1e4, 1e8}) {
            double w = Bessel.i0e(x) * Bessel.k1e(x) + Bessel.i1e(x) * Bessel.k0e(x);
            assertRelative(1.0 / x, w, 1e-14, "Wronskian A&S 9.6.15 at x = " + x);
        }
    }

    /** Small-argument limits (A&S 9.6.7, 9.6.8, 9.6.9): I0 -> 1, I1 ~ x/2, K0 ~ -ln x, K1 ~ 1/x. */
    @Test
    void smallArgumentLimits() {
        assertThat(Bessel.i0(0)).isEqualTo(1.0);
        assertThat(Bessel.i1(0)).isEqualTo(0.0);
        assertRelative(5e-11, Bessel.i1(1e-10), 1e-15, "I1 ~ x/2 (A&S 9.6.7)");
        assertRelative(1e10, Bessel.k1(1e-10), 1e-15, "K1 ~ 1/x (A&S 9.6.9)");
        double x = 1e-12;
        assertRelative(-Math.log(x / 2) - 0.5772156649015329, Bessel.k0(x), 1e-14,
                "K0 ~ -ln(x/2) - gamma (A&S 9.6.13 leading terms)");
    }

    /** Parity: I0 even, I1 odd (A&S 9.6.30 with integer order). */
    @Test
    void parityOfTheFirstKind() {
        for (double x : new double[] {0.2, 7.5, 33}) {
            assertThat(Bessel.i0(-x)).isEqualTo(Bessel.i0(x));
            assertThat(Bessel.i1(-x)).isEqualTo(-Bessel.i1(x));
            assertThat(Bessel.i0e(-x)).isEqualTo(Bessel.i0e(x));
            assertThat(Bessel.i1e(-x)).isEqualTo(-Bessel.i1e(x));
        }
    }

    /** Monotonic trends over a fine grid: I0, I1 rise; K0, K1 fall; scaled forms stay finite. */
    @Test
    void monotonicAndFinite() {
        double prevI0 = 0;
        double prevI1 = -1;
        double prevK0 = Double.MAX_VALUE;
        double prevK1 = Double.MAX_VALUE;
        for (double x = 0.01; x < 700; x *= 1.01) {
            double i0 = Bessel.i0(x);
            double i1 = Bessel.i1(x);
            double k0 = Bessel.k0(x);
            double k1 = Bessel.k1(x);
            assertThat(i0).as("I0 rises at %s", x).isGreaterThan(prevI0);
            assertThat(i1).as("I1 rises at %s", x).isGreaterThan(prevI1);
            assertThat(k0).as("K0 falls at %s", x).isLessThan(prevK0);
            assertThat(k1).as("K1 falls at %s", x).isLessThan(prevK1);
            assertThat(Double.isFinite(Bessel.i0e(x) + Bessel.k1e(x))).isTrue();
            prevI0 = i0;
            prevI1 = i1;
            prevK0 = k0;
            prevK1 = k1;
        }
    }

    /** Domain errors are refused with a message naming the function and the value. */
    @Test
    void domainErrorsAreRefused() {
        assertThatThrownBy(() -> Bessel.k0(0)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("k0").hasMessageContaining("x > 0");
        assertThatThrownBy(() -> Bessel.k1(-1)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("k1");
        assertThatThrownBy(() -> Bessel.k0e(-2)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> Bessel.k1e(0)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> Bessel.i0(Double.NaN)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("finite");
        assertThatThrownBy(() -> Bessel.i1e(Double.POSITIVE_INFINITY))
                .isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> Bessel.i0(800)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("i0e");
        assertThatThrownBy(() -> Bessel.i1(-800)).isInstanceOf(IllegalArgumentException.class);
        assertThat(Bessel.i0e(800)).isPositive();
        assertThat(Bessel.k0(800)).isZero();
    }
}
