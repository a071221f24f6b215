package org.finstack.airside.fin;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.finstack.testing.Reference.assertRelative;

import java.util.List;
import java.util.Locale;
import org.finstack.core.InputException;
import org.finstack.core.Warnings;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/** Checks of {@link AnnularFinEfficiency}. */
class AnnularFinEfficiencyTest {

    /** The Javadoc example of {@link AnnularFinEfficiency}, repeated verbatim (values from scipy). */
    @Test
    void javadocExample() {
        assertRelative(0.908751, AnnularFinEfficiency.efficiency(5e-3, 12e-3, 0.2e-3, 80, 200, false),
                1e-6, "AnnularFinEfficiency Javadoc example");
        PlateFinCell cell = new PlateFinCell(10.23e-3, 0.13e-3, 25.4e-3, 22e-3, true);
        assertRelative(0.852720, AnnularFinEfficiency.INSTANCE.efficiency(cell, 60, 200, new Warnings()),
                1e-6, "AnnularFinEfficiency Javadoc example, plate-fin cell");
    }

    /**
     * Against the same formula evaluated with scipy.special iv/kv over 720 cases:
     * reference/fin_annular_scipy.csv (scripts/gen_fin_reference.py), tolerance 1e-12.
     */
    @Test
    void matchesScipyReference() {
        List<double[]> rows = Reference.csv("/reference/fin_annular_scipy.csv");
        assertThat(rows).hasSize(720);
        for (double[] r : rows) {
            double eta = AnnularFinEfficiency.efficiency(r[0], r[1], r[2], r[3], r[4], r[5] != 0);
            assertRelative(r[6], eta, 1e-12, String.format(Locale.ROOT,
                    "annular fin r1=%g r2=%g t=%g h=%g k=%g tip=%g (scipy)", r[0], r[1], r[2], r[3],
                    r[4], r[5]));
        }
    }

    /**
     * Against an independent numerical solution of the fin equation (1/r) d/dr(r dθ/dr) = m² θ,
     * θ'(r2c) = 0, integrated by classical Runge-Kutta from the tip to the root; tolerance 1e-9.
     */
    @Test
    void matchesRungeKuttaSolutionOfTheFinEquation() {
        double[][] cases = {
            // r1, r2, t, h, k, tip
            {5e-3, 12e-3, 0.2e-3, 80, 200, 0},
            {3.5e-3, 4.5e-3, 0.1e-3, 40, 200, 1},
            {8e-3, 30e-3, 1e-3, 250, 15, 0},
            {5e-3, 25e-3, 0.1e-3, 500, 200, 1},
            {4e-3, 10e-3, 0.12e-3, 5, 380, 0},
        };
        for (double[] c : cases) {
            double expected = shooting(c[0], c[1] + (c[5] != 0 ? c[2] / 2 : 0), Math.sqrt(2 * c[3] / (c[4] * c[2])));
            double eta = AnnularFinEfficiency.efficiency(c[0], c[1], c[2], c[3], c[4], c[5] != 0);
            assertRelative(expected, eta, 1e-9, String.format(Locale.ROOT,
                    "annular fin r1=%g r2=%g t=%g h=%g k=%g tip=%g vs Runge-Kutta", c[0], c[1], c[2],
                    c[3], c[4], c[5]));
        }
    }

    /**
     * Efficiency from the fin equation with u = r dθ/dr: dθ/dr = u/r, du/dr = m² r θ; from
     * θ = 1, u = 0 at the tip inward to r1; eta = 2 (-u(r1)) / (m² θ(r1) (r2² - r1²)).
     */
    private static double shooting(double r1, double r2, double m) {
        int n = 20000;
        double dr = -(r2 - r1) / n;
        double r = r2;
        double th = 1;
        double u = 0;
        double m2 = m * m;
        for (int i = 0; i < n; i++) {
            double k1t = u / r;
            double k1u = m2 * r * th;
            double rh = r + dr / 2;
            double k2t = (u + dr / 2 * k1u) / rh;
            double k2u = m2 * rh * (th + dr / 2 * k1t);
            double k3t = (u + dr / 2 * k2u) / rh;
            double k3u = m2 * rh * (th + dr / 2 * k2t);
            double re = r + dr;
            double k4t = (u + dr * k3u) / re;
            double k4u = m2 * re * (th + dr * k3t);
            th += dr / 6 * (k1t + 2 * k2t + 2 * k3t + k4t);
            u += dr / 6 * (k1u + 2 * k2u + 2 * k3u + k4u);
            r = re;
        }
        return 2 * -u / (m2 * th * (r2 * r2 - r1 * r1));
    }

    /**
     * The equivalent-radius plate-fin method against a two-dimensional finite-difference solution
     * of the continuous plate fin (reference/fin_plate2d_fd.csv, scripts/gen_fin_reference.py):
     * within 2.5 % where the fin efficiency is at least 0.5 (largest deviation found 1.9 %), and
     * within 7 % below that (largest found 6.3 %, always low).
     */
    @Test
    void equivalentRadiusMethodAgreesWithTwoDimensionalPlateFinSolution() {
        List<double[]> rows = Reference.csv("/reference/fin_plate2d_fd.csv");
        assertThat(rows).hasSize(24);
        for (double[] r : rows) {
            PlateFinCell cell = new PlateFinCell(r[0], r[1], r[2], r[3], r[4] != 0);
            double eta = AnnularFinEfficiency.INSTANCE.efficiency(cell, r[5], r[6], Warnings.discard());
            assertRelative(r[7], eta, r[7] >= 0.5 ? 0.025 : 0.07, String.format(Locale.ROOT,
                    "equivalent annulus vs 2-D plate fin, %s h=%g k=%g", cell, r[5], r[6]));
        }
    }

    /** The corrected tip is, by definition, an insulated fin longer by t/2. */
    @Test
    void tipCorrectionIsALongerInsulatedFin() {
        double a = AnnularFinEfficiency.efficiency(5e-3, 11e-3, 0.4e-3, 70, 160, true);
        double b = AnnularFinEfficiency.efficiency(5e-3, 11.2e-3, 0.4e-3, 70, 160, false);
        assertThat(a).isEqualTo(b);
    }

    /** Invariants: falls as h rises and as the fin gets taller or thinner; tends to 1 as h -> 0. */
    @Test
    void trendsAndLimits() {
        double prev = 1.0;
        for (double h = 1; h < 1e5; h *= 1.3) {
            double eta = AnnularFinEfficiency.efficiency(5e-3, 12e-3, 0.15e-3, h, 200, false);
            assertThat(eta).as("eta at h = %s", h).isLessThan(prev).isPositive();
            prev = eta;
        }
        prev = 1.0;
        for (double r2 = 5.5e-3; r2 < 60e-3; r2 += 1e-3) {
            double eta = AnnularFinEfficiency.efficiency(5e-3, r2, 0.15e-3, 60, 200, false);
            assertThat(eta).as("eta at r2 = %s", r2).isLessThan(prev);
            prev = eta;
        }
        prev = 0.0;
        for (double t = 0.05e-3; t < 3e-3; t *= 1.2) {
            double eta = AnnularFinEfficiency.efficiency(5e-3, 12e-3, t, 60, 200, false);
            assertThat(eta).as("eta at t = %s", t).isGreaterThan(prev);
            prev = eta;
        }
        assertThat(AnnularFinEfficiency.efficiency(5e-3, 12e-3, 0.15e-3, 1e-8, 200, false))
                .isLessThanOrEqualTo(1.0).isGreaterThan(1 - 1e-9);
        assertThat(AnnularFinEfficiency.efficiency(5e-3, 12e-3, 0.15e-3, 1e-300, 200, false)).isEqualTo(1.0);
    }

    /**
     * Very large m r: no overflow, and eta tends to the long-fin limit 2 r1 K1(m r1) /
     * (m (r2² - r1²) K0(m r1)) with K1/K0 -> 1 + 1/(2 m r1) (A&amp;S 9.7.2).
     */
    @Test
    void largeArgumentsDoNotOverflow() {
        double r1 = 5e-3;
        double r2 = 40e-3;
        double m = Math.sqrt(2 * 1e5 / (15 * 0.05e-3));
        double eta = AnnularFinEfficiency.efficiency(r1, r2, 0.05e-3, 1e5, 15, false);
        double limit = 2 * r1 / (m * (r2 * r2 - r1 * r1)) * (1 + 1 / (2 * m * r1));
        assertRelative(limit, eta, 1e-3, "long-fin limit (A&S 9.7.2)");
    }

    /** Invalid input is refused with the field named. */
    @Test
    void rejectsInvalidInputNamingTheField() {
        assertField(() -> AnnularFinEfficiency.efficiency(0, 12e-3, 1e-4, 50, 200, false), "r1");
        assertField(() -> AnnularFinEfficiency.efficiency(5e-3, 5e-3, 1e-4, 50, 200, false), "r2");
        assertField(() -> AnnularFinEfficiency.efficiency(5e-3, Double.NaN, 1e-4, 50, 200, false), "r2");
        assertField(() -> AnnularFinEfficiency.efficiency(5e-3, 12e-3, -1e-4, 50, 200, false), "t");
        assertField(() -> AnnularFinEfficiency.efficiency(5e-3, 12e-3, 1e-4, 0, 200, false), "h");
        assertField(() -> AnnularFinEfficiency.efficiency(5e-3, 12e-3, 1e-4, 50, Double.POSITIVE_INFINITY, false), "k");
        PlateFinCell cell = new PlateFinCell(10e-3, 0.1e-3, 25e-3, 22e-3, true);
        assertField(() -> AnnularFinEfficiency.INSTANCE.efficiency(cell, -5, 200, new Warnings()), "h");
        assertField(() -> AnnularFinEfficiency.INSTANCE.efficiency(cell, 50, 0, new Warnings()), "kFin");
    }

    /** A thick, poorly conducting fin (Bi above 0.1) is computed but warned about. */
    @Test
    void warnsWhenBiotNumberIsLarge() {
        PlateFinCell cell = new PlateFinCell(10e-3, 1e-3, 25e-3, 22e-3, true);
        Warnings w = new Warnings();
        double eta = AnnularFinEfficiency.INSTANCE.efficiency(cell, 5000, 10, w);
        assertThat(eta).isBetween(0.0, 1.0);
        assertThat(w.list()).singleElement().asString().contains("Bi");
        Warnings quiet = new Warnings();
        AnnularFinEfficiency.INSTANCE.efficiency(cell, 60, 200, quiet);
        assertThat(quiet.isEmpty()).isTrue();
    }

    private static void assertField(Runnable r, String field) {
        assertThatThrownBy(r::run).isInstanceOf(InputException.class)
                .extracting(e -> ((InputException) e).field()).isEqualTo(field);
    }
}
